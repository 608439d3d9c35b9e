import { ValidateIf } from 'class-validator';

/** May be left out, but not sent as null: a null is validated like any value (and refused with the field's message). */
export const IsOptionalDefined = () => ValidateIf((_object, value) => value !== undefined);
