import { DEMO_CENTER_SUMP_PAN, DEMO_CENTER_SUMP_PICKUP, DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import type { Finding } from '../types/finding';
import type { FitSpec } from '../types/fit-spec';
import { formatFigure, mmRangeWithInches, mmWithInches } from '../units/figure-format';
import { runFitCheck } from './fit-report';

/** Every sentence a person reads from a finding: the message and each remedy note. */
function sentences(findings: readonly Finding[]): { checkId: string; text: string }[] {
  return findings.flatMap((f) => [f.message, ...f.remedies.map((r) => r.note)].map((text) => ({ checkId: f.checkId, text })));
}

const CAMEL_CASE = /\b[a-z]+[A-Z][a-zA-Z]*\b/g;
/** Unit symbols that look like camelCase but are how people write the unit. */
const UNIT_SYMBOLS = new Set(['kW']);
// A dotted field path such as `chassis.mountPads.left` or `oilPan.bottomProfile`; decimals start with a digit and never match.
const DOTTED_PATH = /\b[A-Za-z_]\w*\.[A-Za-z_]\w*/;
const MM_FIGURE = /[-+]?\d+(?:\.\d+)?\s*mm\b/g;
const INCHES_AFTER = /^ \([-+]?\d+(?:\.\d+)? in\)/;

/** What is wrong with a sentence's wording, empty when it reads right. */
function wordingProblems(text: string): string[] {
  const problems: string[] = [];
  for (const [word] of text.matchAll(CAMEL_CASE)) if (!UNIT_SYMBOLS.has(word)) problems.push(`internal name "${word}"`);
  const dotted = DOTTED_PATH.exec(text);
  if (dotted) problems.push(`field path "${dotted[0]}"`);
  for (const match of text.matchAll(MM_FIGURE)) {
    if (!INCHES_AFTER.test(text.slice(match.index + match[0].length))) problems.push(`"${match[0]}" without inches after it`);
  }
  if (/\bmm\b/.test(text.replace(MM_FIGURE, ''))) problems.push('"mm" without a figure');
  if (text.includes('\u2212')) problems.push('a typographic minus sign');
  return problems;
}

function problemsIn(spec: FitSpec): string[] {
  return sentences(runFitCheck(spec).findings).flatMap(({ checkId, text }) => wordingProblems(text).map((p) => `${checkId}: ${p} in "${text}"`));
}

describe('finding wording', () => {
  it('the checker itself flags internal names, paths, bare millimetres and the typographic minus', () => {
    expect(wordingProblems('pad sits 11.6 mm rearward')).toEqual(['"11.6 mm" without inches after it']);
    expect(wordingProblems('(setting minGapBelowMm)')).toEqual(['internal name "minGapBelowMm"']);
    expect(wordingProblems('see chassis.transmissionCrossmember.adjustableXMm')).toContain('field path "chassis.transmissionCrossmember"');
    expect(wordingProblems('moves \u22125 mm (\u22120.20 in)')).toContain('a typographic minus sign');
    expect(wordingProblems('At 260 kW the pump must deliver 137.5 L/h.')).toEqual([]);
    expect(wordingProblems('Kestrel 5.3 stock pan, 11.6 mm (0.46 in) rearward, -2.0 mm (-0.08 in) lower.')).toEqual([]);
  });

  it('the demo report reads in plain words, with inches after every millimetre figure', () => {
    expect(problemsIn(DEMO_FIT_SPEC)).toEqual([]);
  });

  it('so does the demo with the rear-sump pan', () => {
    expect(problemsIn({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN })).toEqual([]);
  });

  it('so do the pan remedies that name the pans left out and why', () => {
    const spec: FitSpec = {
      ...DEMO_FIT_SPEC,
      oilPan: DEMO_REAR_SUMP_PAN,
      oilPickup: DEMO_CENTER_SUMP_PICKUP,
      candidates: { ...DEMO_FIT_SPEC.candidates, oilPans: [...DEMO_FIT_SPEC.candidates!.oilPans!, DEMO_CENTER_SUMP_PAN] },
    };
    const agreement = runFitCheck(spec).findings.find((f) => f.checkId === 'oiling.pan-pickup-pump')!;
    expect(agreement.remedies.map((r) => r.note).join(' ')).toContain('Left out at this placement: Kestrel centre-sump tow pan runs');
    expect(problemsIn(spec)).toEqual([]);
  });

  it('findings that cannot be checked name the missing inputs in words, while `missing` keeps the field paths', () => {
    const spec: FitSpec = structuredClone(DEMO_FIT_SPEC);
    delete spec.oilPan;
    delete spec.controller;
    delete spec.chassis.steeringBox;
    spec.chassis.hoodLine = [];
    const report = runFitCheck(spec);
    expect(report.findings.some((f) => f.status === 'unknown' && f.missing.some((m) => m.includes('.')))).toBe(true);
    expect(problemsIn(spec)).toEqual([]);
    const steering = report.findings.find((f) => f.checkId === 'envelope.steering-box')!;
    expect(steering).toMatchObject({ status: 'unknown', missing: ['chassis.steeringBox'] });
    expect(steering.message).toContain("the steering box's position");
  });

  it('the mount adapter sentence reads right for a plural part name', () => {
    const mount = runFitCheck(DEMO_FIT_SPEC).findings.find((f) => f.checkId === 'mounts.engine-mount-left')!;
    expect(mount.message).toMatch(/the catalog's .+ would cover that offset\./);
  });

  it('the fuel pump flow is rounded once: the message and the pump remedy print the same figure', () => {
    const flow = runFitCheck(DEMO_FIT_SPEC).findings.find((f) => f.checkId === 'fuel.pump-flow')!;
    // The first flow of each sentence is the required one (the message goes on to quote the chassis pump's own).
    const figures = sentences([flow]).flatMap(({ text }) => /(\d+(?:\.\d+)?) L\/h/.exec(text)?.slice(1, 2) ?? []);
    expect(figures.length).toBeGreaterThanOrEqual(2);
    expect(new Set(figures).size).toBe(1);
    expect(figures[0]).toMatch(/^\d+\.\d$/);
  });
});

describe('figure formatting', () => {
  it('millimetres to 0.1 with decimal inches to 0.01, a plain minus and no negative zero', () => {
    expect(mmWithInches(11.6)).toBe('11.6 mm (0.46 in)');
    expect(mmWithInches(1270)).toBe('1270.0 mm (50.00 in)');
    expect(mmWithInches(-25.4)).toBe('-25.4 mm (-1.00 in)');
    expect(mmWithInches(-0.01)).toBe('0.0 mm (0.00 in)');
    expect(mmWithInches(1.6, { signed: true })).toBe('+1.6 mm (+0.06 in)');
    expect(mmWithInches(2.11, { decimals: 2 })).toBe('2.11 mm (0.083 in)');
    expect(mmRangeWithInches(6, 10)).toBe('6.0 mm (0.24 in) to 10.0 mm (0.39 in)');
  });

  it('other figures: one decimal, rounded up when asked, signed when asked', () => {
    expect(formatFigure(137.46, 'L/h', { roundUp: true })).toBe('137.5 L/h');
    expect(formatFigure(31.25, 'lb/h', { roundUp: true })).toBe('31.3 lb/h');
    expect(formatFigure(58, 'psi')).toBe('58.0 psi');
    expect(formatFigure(-1.5, 'psi', { signed: true })).toBe('-1.5 psi');
    expect(formatFigure(0, 'psi', { signed: true })).toBe('0.0 psi');
  });
});
