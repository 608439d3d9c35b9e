import fc from 'fast-check';
import { allChecks, runFitCheck } from '../fit-report/fit-report';
import { boxFitSpec, DEMO_FIT_SPEC } from '../fixtures';
import { resolveFitSettings } from '../settings/fit-settings';
import type { Finding } from '../types/finding';
import type { FitSpec } from '../types/fit-spec';

/**
 * Property tests over every registered check (fast-check, fixed seed): for any spec in range, made by moving every
 * figure of the demo and box specs within half to one and a half times its value, dropping optional parts, and any
 * placement the API accepts (setback −1500…5000 mm, height 0…2500 mm, tilt −20…20°), no check throws and no finding
 * carries NaN or an infinite figure, in its own fields or in a remedy.
 */
const SEED = 20_261_202;
const RUNS = 100;

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Optional top-level parts of a spec a person may leave out (each check then answers `unknown` for what it lacks). */
const OPTIONAL_PARTS = ['oilPan', 'oilPickup', 'oilPump', 'transmission', 'controller', 'driveshaft', 'candidates', 'bellhousingAdapter', 'accessoryDriveId', 'mountAdapterId'];

/** The same shape with every number scaled by a factor drawn per figure; integers stay integers, signs stay. */
function scaledArbitrary(value: Json): fc.Arbitrary<Json> {
  if (typeof value === 'number') {
    if (value === 0) return fc.constant(0);
    return fc.double({ min: 0.5, max: 1.5, noNaN: true }).map((factor) => (Number.isInteger(value) ? Math.max(1, Math.round(Math.abs(value) * factor)) * Math.sign(value) : value * factor));
  }
  if (Array.isArray(value)) return fc.tuple(...value.map(scaledArbitrary)) as fc.Arbitrary<Json>;
  if (value && typeof value === 'object') return fc.record(Object.fromEntries(Object.entries(value).map(([key, inner]) => [key, scaledArbitrary(inner)]))) as fc.Arbitrary<Json>;
  return fc.constant(value);
}

const placementArbitrary = fc.record({
  setbackMm: fc.double({ min: -1500, max: 5000, noNaN: true }),
  heightMm: fc.double({ min: 0, max: 2500, noNaN: true }),
  tiltDeg: fc.double({ min: -20, max: 20, noNaN: true }),
});

function specArbitrary(base: FitSpec): fc.Arbitrary<FitSpec> {
  const present = OPTIONAL_PARTS.filter((part) => part in base);
  return fc
    .tuple(scaledArbitrary(base as unknown as Json), placementArbitrary, fc.subarray(present))
    .map(([scaled, placement, dropped]) => {
      const spec = { ...(scaled as unknown as FitSpec), placement } as FitSpec & Record<string, unknown>;
      for (const part of dropped) delete spec[part];
      return spec;
    });
}

function badFigures(finding: Finding): string[] {
  const figures: Array<[string, unknown]> = [
    ['measured', finding.measured],
    ['required', finding.required],
    ['margin', finding.margin],
    ...finding.remedies.flatMap((remedy, index): Array<[string, unknown]> => {
      if (remedy.kind === 'placement') return [[`remedies[${index}].changeBy`, remedy.changeBy]];
      if (remedy.kind === 'fabrication') return [[`remedies[${index}].laborHours`, remedy.laborHours]];
      return Object.entries(remedy.requires).filter(([, v]) => typeof v === 'number').map(([k, v]): [string, unknown] => [`remedies[${index}].requires.${k}`, v]);
    }),
  ];
  return figures.filter(([, value]) => value !== null && (typeof value !== 'number' || !Number.isFinite(value))).map(([name, value]) => `${finding.checkId} ${name} = ${value}`);
}

describe('every check, for any spec in range (property tests)', () => {
  const settings = resolveFitSettings();
  const checks = allChecks();

  it('covers every registered check', () => {
    expect(checks.length).toBeGreaterThan(20);
    expect(new Set(checks.map((check) => check.id)).size).toBe(checks.length);
  });

  describe.each([
    ['the demo spec', DEMO_FIT_SPEC],
    ['the box spec', boxFitSpec()],
  ])('around %s', (_name, base) => {
    it.each(checks.map((check) => [check.id, check] as const))('%s never throws and gives only finite figures', (_id, check) => {
      fc.assert(
        fc.property(specArbitrary(base), (spec) => {
          const finding = check.run({ spec, settings });
          expect(['ok', 'tight', 'fails', 'unknown']).toContain(finding.status);
          expect(badFigures(finding)).toEqual([]);
          expect(typeof finding.message).toBe('string');
        }),
        { seed: SEED, numRuns: RUNS },
      );
    });
  });

  it('a whole report on any spec in range has no finding that could not be computed', () => {
    fc.assert(
      fc.property(specArbitrary(DEMO_FIT_SPEC), (spec) => {
        const report = runFitCheck(spec);
        expect(report.findings.filter((f) => f.message.startsWith('This check could not be computed')).map((f) => f.message)).toEqual([]);
        expect(report.findings.flatMap(badFigures)).toEqual([]);
      }),
      { seed: SEED, numRuns: 100 },
    );
  });
});
