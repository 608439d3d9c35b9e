import { ValidationError, ValidationPipe } from '@nestjs/common';
import { CommonErrors } from '../errors/app-error';

function flatten(errors: ValidationError[], parent = ''): string[] {
  return errors.flatMap((error) => {
    const path = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) =>
      parent && message.startsWith(error.property) ? `${parent}.${message}` : message,
    );
    return [...own, ...flatten(error.children ?? [], path)];
  });
}

/** Unknown fields refused, types converted, every message listed in `details`. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    validationError: { target: false, value: false },
    exceptionFactory: (errors) => CommonErrors.validation(flatten(errors)),
  });
}
