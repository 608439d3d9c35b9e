import 'reflect-metadata';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { WhatIfDto } from '../../fit-reports/dto/what-if.dto';
import { compiledValidatorFor, hasCompiledValidation } from './compiled-body-validator';
import { nullFieldProblems } from './null-fields';

/** The full run the validation pipe makes (class-validator with the whitelist, plus the null rule): true when valid. */
function fullRunAccepts(body: unknown): boolean {
  if (nullFieldProblems(WhatIfDto, body).length > 0) return false;
  if (typeof body !== 'object' || body === null) return false;
  const errors = validateSync(plainToInstance(WhatIfDto, body) as object, { whitelist: true, forbidNonWhitelisted: true });
  return errors.length === 0;
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a value in the body (objects, lists and leaves; the first two items of a list), as key lists. */
function pathsOf(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const here = prefix.length ? [prefix] : [];
  if (Array.isArray(value)) return [...here, ...value.slice(0, 2).flatMap((item, index) => pathsOf(item, [...prefix, index]))];
  if (value && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([key, item]) => pathsOf(item, [...prefix, key]))];
  return here;
}

function withChange(body: Json, path: (string | number)[], change: (parent: Record<string | number, Json>, key: string | number) => void): Json {
  const copy = JSON.parse(JSON.stringify(body)) as Json;
  let parent = copy as Record<string | number, Json>;
  for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, Json>;
  change(parent, path[path.length - 1]);
  return copy;
}

const REPLACEMENTS: Json[] = [null, '', -1e9, 1e9, 0.5, true, {}];

describe('the compiled what-if body check (ajv, generated from the DTO decorators)', () => {
  const body = { spec: DEMO_FIT_SPEC } as unknown as Json;
  const check = compiledValidatorFor(WhatIfDto);

  it('is built for the marked DTO: every rule of the fit spec has a mapping', () => {
    expect(hasCompiledValidation(WhatIfDto)).toBe(true);
    expect(typeof check).toBe('function');
  });

  it('accepts the demo fit spec, as the full class-validator run does', () => {
    expect(fullRunAccepts(body)).toBe(true);
    expect(check(body)).toBe(true);
    expect(check({ spec: DEMO_FIT_SPEC, settings: {} })).toBe(true);
  });

  // Reference: class-validator itself (the library the API's 400 answers come from) judges every changed body; the
  // compiled check may refuse more (the full run then decides), never accept what the full run refuses.
  // Source: JSON Schema Validation 2020-12, §6 (type, enum, minimum/maximum, minLength/maxLength, minItems/maxItems,
  // required, additionalProperties).
  it('never accepts a body the full run refuses: every field removed, emptied, retyped, pushed out of range, or joined by an unknown one', () => {
    const paths = pathsOf(body);
    expect(paths.length).toBeGreaterThan(100);
    let refused = 0;
    let checked = 0;
    const disagreements: string[] = [];
    for (const path of paths) {
      const variants: Json[] = [
        withChange(body, path, (parent, key) => {
          if (Array.isArray(parent)) parent.splice(Number(key), 1);
          else delete parent[key];
        }),
        ...REPLACEMENTS.map((replacement) => withChange(body, path, (parent, key) => (parent[key] = replacement))),
        withChange(body, path, (parent, key) => {
          const value = parent[key];
          if (value && typeof value === 'object' && !Array.isArray(value)) (value as Record<string, Json>).unexpected = 1;
        }),
      ];
      for (const variant of variants) {
        checked += 1;
        const fast = check(variant);
        if (!fast) refused += 1;
        if (fast && !fullRunAccepts(variant)) disagreements.push(`${path.join('.')}: accepted by the compiled check only`);
      }
    }
    expect(disagreements).toEqual([]);
    // Most of these changes break a rule: the fast path is not accepting everything.
    expect(refused / checked).toBeGreaterThan(0.5);
  });
});
