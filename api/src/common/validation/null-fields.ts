/**
 * One rule for `null` in request bodies: a field accepts null only where its DTO documents it as nullable
 * (`@ApiProperty({ nullable: true })`), so the OpenAPI document and the validation say the same thing.
 *
 * class-validator's `@IsOptional()` (also added to every field by `PartialType`) skips a field that is null
 * as well as one that is missing; without this rule a PATCH with `{ "name": null }` skipped validation and
 * stored null over a required value.
 */
const API_MODEL_PROPERTIES = 'swagger/apiModelProperties';
const API_MODEL_PROPERTIES_ARRAY = 'swagger/apiModelPropertiesArray';

interface PropertyMetadata {
  nullable?: boolean;
  type?: unknown;
}

type ClassType = abstract new (...args: never[]) => unknown;

function documentedProperties(type: ClassType): string[] | undefined {
  const names = Reflect.getMetadata(API_MODEL_PROPERTIES_ARRAY, type.prototype) as string[] | undefined;
  return names?.map((name) => name.replace(/^:/, ''));
}

function propertyMetadata(type: ClassType, key: string): PropertyMetadata | undefined {
  return Reflect.getMetadata(API_MODEL_PROPERTIES, type.prototype, key) as PropertyMetadata | undefined;
}

/** The DTO class behind a documented `type`: a class, `[Class]`, or a thunk `() => Class`. */
function nestedClass(type: unknown): ClassType | undefined {
  const candidate = Array.isArray(type) ? type[0] : type;
  if (typeof candidate !== 'function') return undefined;
  if (candidate.prototype && documentedProperties(candidate as ClassType)) return candidate as ClassType;
  if (!candidate.prototype && candidate.length === 0) {
    try {
      const resolved: unknown = (candidate as () => unknown)();
      return typeof resolved === 'function' && documentedProperties(resolved as ClassType) ? (resolved as ClassType) : undefined;
    } catch {
      return undefined;
    }
  }
  return undefined;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** A message per field that holds null without being nullable, nested objects and lists included. */
export function nullFieldProblems(type: ClassType, value: unknown, prefix = ''): string[] {
  if (!isPlainObject(value) || !documentedProperties(type)) return [];
  const problems: string[] = [];
  for (const [key, field] of Object.entries(value)) {
    const metadata = propertyMetadata(type, key);
    if (!metadata) continue; // unknown fields are refused by the whitelist
    const path = `${prefix}${key}`;
    if (field === null) {
      if (!metadata.nullable) problems.push(`${path} must not be null: give a value, or leave the field out to keep the current one`);
      continue;
    }
    const inner = nestedClass(metadata.type);
    if (!inner) continue;
    if (Array.isArray(field)) {
      field.forEach((item, index) => {
        if (item === null) problems.push(`${path}.${index} must not be null`);
        else problems.push(...nullFieldProblems(inner, item, `${path}.${index}.`));
      });
    } else {
      problems.push(...nullFieldProblems(inner, field, `${path}.`));
    }
  }
  return problems;
}
