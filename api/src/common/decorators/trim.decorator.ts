import { Transform } from 'class-transformer';

/** Trims a string body field before validation, so "   " fails `IsNotEmpty`; other values pass through for the type checks. */
export function Trim(): PropertyDecorator {
  return Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
}
