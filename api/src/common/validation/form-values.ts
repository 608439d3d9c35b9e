import { ValidateBy, ValidationArguments } from 'class-validator';

/**
 * A phone number as people write it: it starts with a digit, `+` or `(`, holds 6 to 15 digits before an optional
 * extension (`x123`). Source: ITU-T Recommendation E.164, "The international public telecommunication
 * numbering plan" (an international number has at most 15 digits).
 */
export const PHONE_MAX_DIGITS = 15;
export const PHONE_MIN_DIGITS = 6;

export function phoneProblem(value: string): string | null {
  const text = value.trim();
  if (text === '') return null;
  const [main] = text.split(/\s*(?:x|ext\.?)\s*(?=\d+$)/i);
  if (!/^[+(0-9]/.test(main)) return 'phone must start with a digit, + or ( (a leading minus sign is not part of a phone number)';
  if (/[+]/.test(main.slice(1))) return 'phone may have a + only at the start';
  const digits = main.replace(/\D/g, '').length;
  if (digits < PHONE_MIN_DIGITS || digits > PHONE_MAX_DIGITS) {
    return `phone must have ${PHONE_MIN_DIGITS} to ${PHONE_MAX_DIGITS} digits (the longest international number has 15), e.g. +1 555 0142`;
  }
  return null;
}

export function IsPhoneText() {
  return ValidateBy({
    name: 'isPhoneText',
    validator: {
      validate: (value: unknown) => typeof value !== 'string' || phoneProblem(value) === null,
      defaultMessage: (args?: ValidationArguments) => phoneProblem(String(args?.value ?? '')) ?? 'phone is not a phone number',
    },
  });
}

interface PointLike {
  [axis: string]: unknown;
}

function samePoint(a: unknown, b: unknown): boolean {
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  const keys = Object.keys(a as PointLike);
  return keys.length > 0 && keys.every((key) => (a as PointLike)[key] === (b as PointLike)[key]) && keys.length === Object.keys(b).length;
}

/** 1-based positions of the first two consecutive identical points, or null. */
export function repeatedPointAt(points: unknown): [number, number] | null {
  if (!Array.isArray(points)) return null;
  for (let index = 1; index < points.length; index++) {
    if (samePoint(points[index - 1], points[index])) return [index, index + 1];
  }
  return null;
}

/** An outline whose consecutive points are identical has a zero-length edge (a typing slip): refuse it. */
export function NoRepeatedPoints() {
  return ValidateBy({
    name: 'noRepeatedPoints',
    validator: {
      validate: (value: unknown) => repeatedPointAt(value) === null,
      defaultMessage: (args?: ValidationArguments) => {
        const [first, second] = repeatedPointAt(args?.value) ?? [0, 0];
        return `${args?.property} repeats the same point at positions ${first} and ${second}: remove one or correct it`;
      },
    },
  });
}

/** The value (an engine-frame u) must lie within the u range of the outline named `outlineKey`, when both are given. */
export function WithinOutlineLength(outlineKey: string, what: string) {
  const range = (args: ValidationArguments): [number, number] | null => {
    const outline = (args.object as Record<string, unknown>)[outlineKey];
    if (!Array.isArray(outline) || outline.length === 0) return null;
    const us = outline.map((point: { u?: unknown }) => point?.u).filter((u): u is number => typeof u === 'number');
    return us.length ? [Math.min(...us), Math.max(...us)] : null;
  };
  return ValidateBy({
    name: 'withinOutlineLength',
    validator: {
      validate: (value: unknown, args?: ValidationArguments) => {
        const bounds = args ? range(args) : null;
        return typeof value !== 'number' || !bounds || (value >= bounds[0] && value <= bounds[1]);
      },
      defaultMessage: (args?: ValidationArguments) => {
        const [from, to] = (args && range(args)) ?? [0, 0];
        return `${args?.property} must lie along the ${outlineKey} (u from ${from} to ${to} mm): ${what}`;
      },
    },
  });
}
