import { applyDecorators, Type as ClassType } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { NoRepeatedPoints } from '../../common/validation/form-values';

/**
 * Reusable validation decorators for the part-spec DTOs: each pairs the OpenAPI description with the
 * class-validator rules, so the documented range is the enforced one.
 */

const FINITE = { allowNaN: false, allowInfinity: false };

export function NumberIn(min: number, max: number, description?: string) {
  return applyDecorators(ApiProperty({ minimum: min, maximum: max, description }), IsNumber(FINITE), Min(min), Max(max));
}

export function OptionalNumberIn(min: number, max: number, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ minimum: min, maximum: max, description }),
    IsOptional(),
    IsNumber(FINITE),
    Min(min),
    Max(max),
  );
}

export function OptionalIntIn(min: number, max: number, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ type: 'integer', minimum: min, maximum: max, description }),
    IsOptional(),
    IsInt(),
    Min(min),
    Max(max),
  );
}

export function IntIn(min: number, max: number, description?: string) {
  return applyDecorators(ApiProperty({ type: 'integer', minimum: min, maximum: max, description }), IsInt(), Min(min), Max(max));
}

export function Text(maxLength = 120, description?: string) {
  return applyDecorators(
    ApiProperty({ maxLength, description }),
    IsString(),
    IsNotEmpty({ message: '$property must not be empty' }),
    MaxLength(maxLength),
  );
}

export function OptionalText(maxLength = 120, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ maxLength, description }),
    IsOptional(),
    IsString(),
    IsNotEmpty({ message: '$property must not be empty' }),
    MaxLength(maxLength),
  );
}

export function Flag(description?: string) {
  return applyDecorators(ApiProperty({ description }), IsBoolean());
}

export function OneOf<T extends string>(values: readonly T[], description?: string) {
  return applyDecorators(
    ApiProperty({ enum: values, description }),
    IsIn(values as T[], { message: `$property must be one of: ${values.join(', ')}` }),
  );
}

export function ListOf<T extends string>(values: readonly T[], min: number, max: number, description?: string) {
  return applyDecorators(
    ApiProperty({ enum: values, isArray: true, minItems: min, maxItems: max, description }),
    IsArray(),
    ArrayMinSize(min),
    ArrayMaxSize(max),
    IsIn(values as T[], { each: true, message: `each of $property must be one of: ${values.join(', ')}` }),
  );
}

export function NumberList(min: number, max: number, itemMin: number, itemMax: number, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ type: [Number], minItems: min, maxItems: max, description }),
    IsOptional(),
    IsArray(),
    ArrayMinSize(min),
    ArrayMaxSize(max),
    IsNumber(FINITE, { each: true }),
    Min(itemMin, { each: true }),
    Max(itemMax, { each: true }),
  );
}

/**
 * @nestjs/swagger resolves a thunk only when the function is named `type` (as an inline `type: () => X` is);
 * a thunk handed through a helper is anonymous and would end up as an empty `$ref`.
 */
function lazy(type: () => ClassType): () => ClassType {
  return { type: () => type() }.type;
}

export function Nested(type: () => ClassType, description?: string) {
  return applyDecorators(
    ApiProperty({ type: lazy(type), description }),
    IsObject({ message: '$property must be an object' }),
    ValidateNested(),
    Type(type),
  );
}

export function OptionalNested(type: () => ClassType, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ type: lazy(type), description }),
    IsOptional(),
    IsObject({ message: '$property must be an object' }),
    ValidateNested(),
    Type(type),
  );
}

export function NestedList(type: () => ClassType, min: number, max: number, description?: string) {
  return applyDecorators(
    ApiProperty({ type: lazy(type), isArray: true, minItems: min, maxItems: max, description }),
    IsArray(),
    ArrayMinSize(min, { message: `$property must have at least ${min} item${min === 1 ? '' : 's'}` }),
    ArrayMaxSize(max),
    ValidateNested({ each: true }),
    Type(type),
  );
}

/** A list of outline points: NestedList, and no two consecutive points the same (a zero-length edge is a slip). */
export function PointList(type: () => ClassType, min: number, max: number, description?: string) {
  return applyDecorators(NestedList(type, min, max, description), NoRepeatedPoints());
}

export function OptionalNestedList(type: () => ClassType, min: number, max: number, description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ type: lazy(type), isArray: true, minItems: min, maxItems: max, description }),
    IsOptional(),
    IsArray(),
    ArrayMinSize(min),
    ArrayMaxSize(max),
    ValidateNested({ each: true }),
    Type(type),
  );
}
