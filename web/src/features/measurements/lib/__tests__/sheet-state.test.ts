import { describe, expect, it } from 'vitest';
import { formatLength } from '@/lib/units';
import { compareReading, filterRows, formatTolerance, generalPhotos, initialFilter, needsReason, readEntry, reasonProblem, sheetCounts, sheetRows, signOffEvent, unitSlip, valueBody } from '../sheet-state';
import type { MeasurementPhoto } from '../../types';
import { POINTS, sheetStub } from './sheet-fixture';

const length = POINTS[0];
const angle = POINTS[2];

describe('reading what was typed at the truck', () => {
  it('takes fractions, decimal inches and millimetres to the same value', () => {
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly, so 12 1/2 in = 317.5 mm.
    for (const text of ['12 1/2"', '12.5 in', '317.5 mm', '12 1/2']) {
      expect(readEntry(text, length, 'in')).toEqual({ ok: true, value: 317.5, unit: 'mm' });
    }
    // A bare number is in the person's unit.
    expect(readEntry('318', length, 'mm')).toEqual({ ok: true, value: 318, unit: 'mm' });
    // Source: NIST SP 811 (2008) B.8: 12.5 in × 25.4 = 317.5 mm; a decimal comma reads as a point.
    expect(readEntry('317,5', length, 'mm')).toEqual({ ok: true, value: 317.5, unit: 'mm' });
  });

  it('notices a reading that is most likely in the wrong unit before it is saved', () => {
    const top = { catalogValue: 355 };
    // Source: NIST SP 811 (2008) B.8: 1 ft = 12 in = 304.8 mm and 1 in = 25.4 mm exactly.
    // 12 1/2 ft = 3810 mm: over ten times the catalog's 355 mm.
    expect(unitSlip(readEntry('12 1/2 ft', length, 'in'), top)).toBe(true);
    // 355 typed with the inch setting = 9017 mm; 14 typed with the millimetre setting = 14 mm.
    expect(unitSlip(readEntry('355', length, 'in'), top)).toBe(true);
    expect(unitSlip(readEntry('14', length, 'mm'), top)).toBe(true);
    // Common practice (no published source): within a fifth to five times the catalog is a real truck, not a slip,
    // even a setback of 90 mm read as 200 mm.
    expect(unitSlip(readEntry('14', length, 'in'), top)).toBe(false);
    expect(unitSlip(readEntry('180 mm', length, 'in'), top)).toBe(false);
    expect(unitSlip(readEntry('1700 mm', length, 'in'), top)).toBe(false);
    expect(unitSlip(readEntry('200 mm', length, 'in'), { catalogValue: 90 })).toBe(false);
    expect(unitSlip(readEntry('3°', angle, 'in'), { catalogValue: 1 })).toBe(false);
    expect(unitSlip(readEntry('355', length, 'in'), { catalogValue: null })).toBe(false);
  });

  it('reads angles in degrees and refuses what it cannot read, with a sentence', () => {
    expect(readEntry('-1.5°', angle, 'in')).toEqual({ ok: true, value: -1.5, unit: 'deg' });
    expect(readEntry('3 in', angle, 'in')).toMatchObject({ ok: false, message: expect.stringMatching(/not an angle/) });
    expect(readEntry('abc', length, 'in')).toMatchObject({ ok: false, message: expect.any(String) });
    // A floor height cannot be negative or longer than the truck.
    expect(readEntry('-3 mm', length, 'mm').ok).toBe(false);
    expect(readEntry('20000 mm', length, 'mm').ok).toBe(false);
    expect(readEntry('  ', length, 'mm')).toEqual({ ok: null });
  });

  it('sends the figure in millimetres, with the tolerance, note and reason when given', () => {
    expect(valueBody({ value: 317.5 })).toEqual({ value: '317.5', unit: 'mm' });
    expect(valueBody({ value: 317.5 }, { toleranceMm: 3.18, note: ' yoke centre ', reason: '  re-measured ' })).toEqual({
      value: '317.5',
      unit: 'mm',
      tolerance: '3.18',
      note: 'yoke centre',
      reason: 're-measured',
    });
    // the version typed over goes along, 0 included (a point that showed no reading)
    expect(valueBody({ value: 317.5 }, { seenVersion: 0 })).toEqual({ value: '317.5', unit: 'mm', seenVersion: 0 });
    expect(valueBody({ value: 317.5 }, { seenVersion: 4 })).toMatchObject({ seenVersion: 4 });
  });
});

describe('what is still missing', () => {
  it('counts required points measured, missing and flagged, and opens on the missing list', () => {
    const rows = sheetRows(sheetStub());
    const counts = sheetCounts(rows);
    expect(counts).toEqual({ total: 4, required: 3, requiredMeasured: 1, missing: 2, measured: 1, flagged: 1 });
    expect(initialFilter(counts)).toBe('missing');
    expect(filterRows(rows, 'missing').map((r) => r.point.id)).toEqual(['front-crossmember.top', 'pinion.angle']);
    expect(filterRows(rows, 'flagged').map((r) => r.point.id)).toEqual(['front-crossmember.front-face']);
    expect(filterRows(rows, 'measured').map((r) => r.point.id)).toEqual(['front-crossmember.front-face']);
    expect(filterRows(rows, 'all')).toHaveLength(4);
    // an optional point without a value is not missing
    expect(rows.find((r) => r.point.id === 'hood@400')).toMatchObject({ missing: false, value: null });
  });

  it('a point saved under Missing stays listed, in its place, until the list is changed', () => {
    // the crossmember top has just been measured: it is no longer missing, but the list keeps it for its photo
    const sheet = sheetStub();
    const saved = sheetRows({
      ...sheet,
      values: [...sheet.values, { ...sheet.values[0], pointId: 'front-crossmember.top', value: 355, version: 1, deviation: 0, flagged: false }],
      missing: ['pinion.angle'],
    });
    expect(filterRows(saved, 'missing').map((r) => r.point.id)).toEqual(['pinion.angle']);
    expect(filterRows(saved, 'missing', new Set(['front-crossmember.top'])).map((r) => r.point.id)).toEqual(['front-crossmember.top', 'pinion.angle']);
    // kept in a list it already belongs to: listed once
    expect(filterRows(saved, 'measured', new Set(['front-crossmember.top'])).map((r) => r.point.id)).toEqual(['front-crossmember.top', 'front-crossmember.front-face']);
  });

  it('keeps each point its own history, newest first, and its own photos', () => {
    const photo: MeasurementPhoto = { id: 'ph-1', pointId: 'pinion.angle', contentType: 'image/jpeg', bytes: 10, widthPx: 4, heightPx: 3, status: 'accepted', uploadedBy: 'A', uploadedById: 'u', createdAt: '2026-11-30T08:00:00.000Z', url: '/x' };
    const loose: MeasurementPhoto = { ...photo, id: 'ph-2', pointId: null };
    const sheet = sheetStub({ photos: [photo, loose] });
    const rows = sheetRows(sheet);
    expect(rows.find((r) => r.point.id === 'front-crossmember.front-face')!.history.map((e) => e.newValue)).toEqual([110, 90]);
    expect(rows.find((r) => r.point.id === 'pinion.angle')!.photos.map((p) => p.id)).toEqual(['ph-1']);
    expect(generalPhotos(sheet).map((p) => p.id)).toEqual(['ph-2']);
  });

  it('opens on every point once nothing is missing', () => {
    const rows = sheetRows(sheetStub({ missing: [] }));
    expect(initialFilter(sheetCounts(rows))).toBe('all');
  });
});

describe('sign-off', () => {
  it('after sign-off a change needs a reason of a few words', () => {
    expect(needsReason(sheetStub())).toBe(false);
    const signed = sheetStub({
      signedOffAt: '2026-11-30T10:00:00.000Z',
      history: [{ kind: 'sign-off', pointId: null, oldValue: null, newValue: null, reason: null, by: 'Sefa Lindqvist-Moro', at: '2026-11-30T10:00:00.000Z' }],
    });
    expect(needsReason(signed)).toBe(true);
    expect(signOffEvent(signed)?.by).toBe('Sefa Lindqvist-Moro');
    expect(reasonProblem('  ')).toMatch(/why/);
    expect(reasonProblem('ok')).not.toBeNull();
    expect(reasonProblem('re-measured at ride height')).toBeNull();
  });
});

describe('a reading’s tolerance', () => {
  // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly; 1/8 in = 3.175 mm, kept to 0.01 mm as 3.18 mm.
  const inches = (mm: number) => formatLength(mm, 'in');
  const mm = (v: number) => formatLength(v, 'mm');

  it('typed as 1/8 in inch mode reads 1/8 in, never 0.13 in', () => {
    const typed = readEntry('1/8', { kind: 'obstacle-top' }, 'in');
    expect(typed).toEqual({ ok: true, value: 3.18, unit: 'mm' });
    expect(formatTolerance(3.18, 'mm', 'in', inches)).toBe('1/8 in');
    expect(formatTolerance(1.59, 'mm', 'in', inches)).toBe('1/16 in');
    expect(formatTolerance(31.75, 'mm', 'in', inches)).toBe('1 1/4 in');
  });

  it('a tolerance that is no tape fraction reads to 0.001 in; in millimetres as any reading', () => {
    // Derived: 3 mm / 25.4 = 0.1181 in; 2.54 mm = 0.100 in.
    expect(formatTolerance(3, 'mm', 'in', inches)).toBe('0.118 in');
    expect(formatTolerance(2.54, 'mm', 'in', inches)).toBe('0.100 in');
    expect(formatTolerance(3.18, 'mm', 'mm', mm)).toBe('3.2 mm');
    expect(formatTolerance(0.5, 'deg', 'in', inches)).toBe('0.5°');
  });
});

describe('a reading beside the catalog, as a reader checks it', () => {
  const inches = (mm: number) => formatLength(mm, 'in');
  const mm = (v: number) => formatLength(v, 'mm');
  const lengthPoint = { unit: 'mm' as const, catalogValue: 355 };

  it('gives the difference of the two figures shown, not the rounded difference of the stored ones', () => {
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly.
    // 355.35 mm = 13.990 in (shown 13.99), catalog 355 mm = 13.976 in (shown 13.98): the sheet says +0.01 in,
    // although 0.35 mm alone would round to 0.02 in.
    const c = compareReading({ value: 355.35, deviation: 0.35 }, lengthPoint, 'in', inches);
    expect(inches(355.35)).toBe('13.99 in');
    expect(inches(355)).toBe('13.98 in');
    expect(c).toMatchObject({ movedByRideHeight: false, difference: '+0.01 in' });
    // 13.98 in typed = 355.092 mm, kept as 355.09; beside a catalog of 355 mm both read 13.98 in: no difference shown.
    expect(compareReading({ value: 355.09, deviation: 0.09 }, lengthPoint, 'in', inches)?.difference).toBe('±0.00 in');
    // In millimetres to the 0.1 mm shown: 355.35 reads 355.4 (half away from zero), 355 reads 355.0: +0.4 mm.
    expect(compareReading({ value: 355.35, deviation: 0.35 }, lengthPoint, 'mm', mm)?.difference).toBe('+0.4 mm');
  });

  it('names the figure a floor height is compared with when the measured ride height moved it', () => {
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly. A reading of 13.98 in (355.09 mm) against a catalog of
    // 13.98 in that the measured ride height raises by 1.27 mm (0.05 in) to 356.36 mm = 14.03 in: −0.05 in from 14.03 in.
    const c = compareReading({ value: 355.09, deviation: -1.27 }, { unit: 'mm', catalogValue: 355.09 }, 'in', inches);
    expect(c?.movedByRideHeight).toBe(true);
    expect(inches(c!.expected)).toBe('14.03 in');
    expect(c?.difference).toBe('−0.05 in');
  });

  it('compares angles to the 0.01° shown', () => {
    // Common practice (no published source): angle finders read to 0.1°; the sheet shows 0.01°.
    // 2.456° shows 2.46°, catalog 1.5° shows 1.5°: +0.96°.
    expect(compareReading({ value: 2.456, deviation: 0.956 }, { unit: 'deg', catalogValue: 1.5 }, 'in', inches)).toMatchObject({
      movedByRideHeight: false,
      difference: '+0.96°',
    });
    expect(compareReading({ value: 2, deviation: null }, { unit: 'deg', catalogValue: 1.5 }, 'in', inches)).toBeNull();
  });
});
