import Ajv, { type AnySchema, type ValidateFunction } from 'ajv';
import { getMetadataStorage, type ValidationArguments } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata';

/**
 * A compiled JSON-schema check (ajv) for large request bodies, generated from the DTO's own class-validator
 * decorators — the same decorators (NumberIn, OneOf, Nested, …) that write the OpenAPI document's properties.
 *
 * It is a fast path only: the validation pipe accepts a body that passes it as it is, and sends any body that fails
 * it through the full class-validator run, so every refusal keeps the exact messages and 400 shape of the rest of
 * the API. That is safe because the schema is at least as strict as the decorators: every rule maps to a JSON-schema
 * keyword that refuses at least what the rule refuses (a field without `@IsOptional()` is required; null is never
 * accepted; unknown fields are refused), custom rules run their own validate function, and a rule the generator does
 * not know stops the generation (a test compiles every marked DTO), so a new decorator cannot loosen it silently.
 */

// class-transformer keeps its @Type() records in a module its entry point does not re-export.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { defaultMetadataStorage } = require('class-transformer/cjs/storage') as typeof import('class-transformer/types/storage');

const COMPILED = Symbol('compiledValidation');

type ClassType = abstract new (...args: never[]) => unknown;

const marked: ClassType[] = [];

/** Marks a body DTO for the compiled fast path (worth it for large nested bodies such as a full fit spec). */
export function CompiledValidation(): ClassDecorator {
  return (target) => {
    Reflect.defineMetadata(COMPILED, true, target);
    marked.push(target as unknown as ClassType);
  };
}

/** Compiles every marked DTO's check now (at start-up), so the first request does not pay ajv's code generation. */
export function compileMarkedValidators(): void {
  for (const type of marked) compiledValidatorFor(type);
}

export function hasCompiledValidation(type: unknown): type is ClassType {
  return typeof type === 'function' && Reflect.getMetadata(COMPILED, type) === true;
}

type Schema = Record<string, unknown>;

/** Each known rule's JSON-schema equivalent (refusing at least what class-validator refuses). */
const KNOWN_RULES: Record<string, (constraints: unknown[]) => Schema> = {
  isNumber: ([options]) => {
    const { allowNaN, allowInfinity, maxDecimalPlaces, ...rest } = (options ?? {}) as Record<string, unknown>;
    if (maxDecimalPlaces !== undefined || Object.keys(rest).length > 0) throw new Error('isNumber options not supported');
    void allowNaN;
    void allowInfinity; // JSON has no NaN or Infinity
    return { type: 'number' };
  },
  isInt: () => ({ type: 'integer' }),
  isString: () => ({ type: 'string' }),
  isBoolean: () => ({ type: 'boolean' }),
  isObject: () => ({ type: 'object' }),
  isArray: () => ({ type: 'array' }),
  isNotEmpty: () => ({ not: { enum: ['', null] } }),
  min: ([min]) => ({ type: 'number', minimum: min }),
  max: ([max]) => ({ type: 'number', maximum: max }),
  isPositive: () => ({ type: 'number', exclusiveMinimum: 0 }),
  isNegative: () => ({ type: 'number', exclusiveMaximum: 0 }),
  minLength: ([min]) => ({ type: 'string', minLength: min }),
  // ajv counts a surrogate pair as one character and a variation selector as one; class-validator skips both, so
  // this is never looser.
  maxLength: ([max]) => ({ type: 'string', maxLength: max }),
  isIn: ([values]) => ({ enum: values as unknown[] }),
  arrayMinSize: ([min]) => ({ type: 'array', minItems: min }),
  arrayMaxSize: ([max]) => ({ type: 'array', maxItems: max }),
};

interface CustomRule {
  validate(value: unknown, args: ValidationArguments): boolean | Promise<boolean>;
}

class SchemaBuilder {
  private readonly defs: Record<string, Schema> = {};
  private readonly names = new Map<ClassType, string>();
  readonly customRules: CustomRule[] = [];

  refTo(type: ClassType): Schema {
    let name = this.names.get(type);
    if (!name) {
      name = `${type.name || 'Anonymous'}_${this.names.size}`;
      this.names.set(type, name);
      this.defs[name] = {}; // placeholder for cycles
      this.defs[name] = this.objectSchema(type);
    }
    return { $ref: `#/$defs/${name}` };
  }

  schemaFor(root: ClassType): AnySchema {
    const ref = this.refTo(root);
    return { $defs: this.defs, ...ref };
  }

  private objectSchema(type: ClassType): Schema {
    const metadata = getMetadataStorage().getTargetValidationMetadatas(type, '', true, false);
    const byProperty = new Map<string, ValidationMetadata[]>();
    for (const rule of metadata) {
      if (rule.groups?.length) throw new Error(`${type.name}.${rule.propertyName}: validation groups are not supported`);
      byProperty.set(rule.propertyName, [...(byProperty.get(rule.propertyName) ?? []), rule]);
    }
    const properties: Record<string, Schema> = {};
    const required: string[] = [];
    for (const [property, rules] of byProperty) {
      const { schema, optional } = this.propertySchema(type, property, rules);
      properties[property] = schema;
      if (!optional) required.push(property);
    }
    return { type: 'object', properties, required, additionalProperties: false };
  }

  private propertySchema(type: ClassType, property: string, rules: ValidationMetadata[]): { schema: Schema; optional: boolean } {
    const where = `${type.name}.${property}`;
    const own: Schema[] = [];
    const items: Schema[] = [];
    let optional = false;
    for (const rule of rules) {
      const target = rule.each ? items : own;
      if (rule.type === 'conditionalValidation') {
        if (rule.name !== 'isOptional') throw new Error(`${where}: conditional validation other than @IsOptional() is not supported`);
        optional = true;
      } else if (rule.type === 'isDefined') {
        // required unless optional: nothing more to add
      } else if (rule.type === 'nestedValidation') {
        const nested = defaultMetadataStorage.findTypeMetadata(type, property)?.typeFunction() as ClassType | undefined;
        if (!nested) throw new Error(`${where}: @ValidateNested() without @Type()`);
        target.push(this.refTo(nested));
      } else if (rule.type === 'customValidation') {
        const known = rule.name ? KNOWN_RULES[rule.name] : undefined;
        if (known) target.push(known(rule.constraints ?? []));
        else target.push({ classValidatorRule: this.customRule(rule, where) });
      } else {
        throw new Error(`${where}: validation of type ${rule.type} is not supported by the compiled validator`);
      }
    }
    if (items.length > 0) {
      if (!own.some((schema) => schema.type === 'array')) throw new Error(`${where}: rules with { each: true } need @IsArray()`);
      own.push({ items: items.length === 1 ? items[0] : { allOf: items } });
    }
    return { schema: own.length === 1 ? own[0] : { allOf: own }, optional };
  }

  private customRule(rule: ValidationMetadata, where: string): { index: number; property: string; constraints: unknown[] } {
    const Constraint = rule.constraintCls as unknown as new () => CustomRule;
    if (typeof Constraint !== 'function') throw new Error(`${where}: a custom rule without a constraint class`);
    this.customRules.push(new Constraint());
    return { index: this.customRules.length - 1, property: rule.propertyName, constraints: rule.constraints ?? [] };
  }
}

const compiled = new WeakMap<ClassType, ValidateFunction>();

/** The compiled check for a DTO class (built once per class; throws when a rule of the DTO has no safe mapping). */
export function compiledValidatorFor(type: ClassType): ValidateFunction {
  const existing = compiled.get(type);
  if (existing) return existing;
  const builder = new SchemaBuilder();
  const schema = builder.schemaFor(type);
  const ajv = new Ajv({ allErrors: false, strict: true, strictTypes: false, strictTuples: false });
  ajv.addKeyword({
    keyword: 'classValidatorRule',
    schemaType: 'object',
    errors: false,
    validate: (rule: { index: number; property: string; constraints: unknown[] }, value: unknown, _schema, context) => {
      const result = builder.customRules[rule.index].validate(value, {
        value,
        constraints: rule.constraints,
        targetName: '',
        object: (context?.parentData ?? {}) as object,
        property: rule.property,
      });
      return result === true; // a pending (async) answer falls back to the full run
    },
  });
  const check = ajv.compile(schema);
  compiled.set(type, check);
  return check;
}
