import { ArgumentMetadata, ValidationError, ValidationPipe } from '@nestjs/common';
import { AppError, CommonErrors } from '../errors/app-error';
import { compiledValidatorFor, hasCompiledValidation } from '../validation/compiled-body-validator';
import { itemName } from '../validation/item-names';
import { nullFieldProblems } from '../validation/null-fields';

interface Problem {
  constraint: string;
  message: string;
}

/** Missing or refused fields first, then wrong types; length, range and format problems after them. */
const CONSTRAINT_RANK: Record<string, number> = {
  isDefined: 0,
  isNotEmpty: 0,
  whitelistValidation: 0,
  isString: 1,
  isNumber: 1,
  isInt: 1,
  isBoolean: 1,
  isEmail: 1,
  isUuid: 1,
  isIn: 1,
  isEnum: 1,
  isArray: 1,
  isObject: 1,
  nestedValidation: 1,
};
const OTHER_RANK = 2;

/**
 * Each problem with the path of its field. Inside a list item whose class names it (`@NamedInMessages`), the path
 * up to the item becomes its name in words: "Line 1 (Notch crossmember): Hours must be 0 or more".
 */
function flatten(errors: ValidationError[], parent = '', named = ''): Problem[] {
  return errors.flatMap((error) => {
    const name = itemName(error.value, error.property);
    if (name) return flatten(error.children ?? [], '', name);
    const path = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.entries(error.constraints ?? {}).map(([constraint, message]) => {
      const placed = parent && message.startsWith(error.property) ? `${parent}.${message}` : message;
      return { constraint, message: named ? `${named}: ${placed}` : placed };
    });
    return [...own, ...flatten(error.children ?? [], path, named)];
  });
}

/** Every message, the most telling first (stable within a rank), so the headline names the real problem. */
export function validationMessages(errors: ValidationError[]): string[] {
  const rank = (problem: Problem) => CONSTRAINT_RANK[problem.constraint] ?? OTHER_RANK;
  return flatten(errors)
    .map((problem, index) => ({ problem, index }))
    .sort((a, b) => rank(a.problem) - rank(b.problem) || a.index - b.index)
    .map(({ problem }) => problem.message);
}

/**
 * The global pipe: unknown fields refused, types converted, every message listed in `details` (`message` is the
 * first of them), and null refused wherever the DTO does not document the field as nullable (see null-fields.ts).
 */
class AppValidationPipe extends ValidationPipe {
  async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    // Large bodies marked @CompiledValidation(): a body the compiled schema accepts is valid by construction and goes
    // on as the plain JSON it is; anything else takes the full run below for its messages.
    if (metadata.type === 'body' && hasCompiledValidation(metadata.metatype) && compiledValidatorFor(metadata.metatype)(value)) {
      return value;
    }
    const nullProblems = metadata.type === 'body' && metadata.metatype ? nullFieldProblems(metadata.metatype, value) : [];
    let result: unknown;
    try {
      result = await super.transform(value, metadata);
    } catch (error) {
      if (nullProblems.length > 0 && error instanceof AppError && error.code === 'validation_failed') {
        throw CommonErrors.validation([...nullProblems, ...error.details.filter((detail) => !nullProblems.includes(detail))]);
      }
      throw error;
    }
    if (nullProblems.length > 0) throw CommonErrors.validation(nullProblems);
    return result;
  }
}

export function createValidationPipe(): ValidationPipe {
  return new AppValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    // values are kept for naming list items in messages (never echoed back)
    validationError: { target: false, value: true },
    exceptionFactory: (errors) => CommonErrors.validation(validationMessages(errors)),
  });
}
