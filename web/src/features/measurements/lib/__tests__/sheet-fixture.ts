import type { MeasurementPoint, MeasurementSheet } from '../../types';

const point = (id: string, kind: MeasurementPoint['kind'], label: string, catalogValue: number | null, required: boolean, extra: Partial<MeasurementPoint> = {}): MeasurementPoint => ({
  id,
  kind,
  label,
  howTo: `Measure ${label.toLowerCase()}.`,
  catalogValue,
  required,
  view: 'side',
  unit: kind === 'pinion-angle' ? 'deg' : 'mm',
  reference: kind === 'pinion-angle' ? 'level' : kind.endsWith('face') ? 'front-axle-behind' : 'floor',
  ...extra,
});

export const POINTS: MeasurementPoint[] = [
  point('front-crossmember.top', 'obstacle-top', 'Front crossmember: top', 355, true, { target: 'front-crossmember', atX: 190 }),
  point('front-crossmember.front-face', 'obstacle-front-face', 'Front crossmember: front face', 90, true, { target: 'front-crossmember' }),
  point('pinion.angle', 'pinion-angle', 'Pinion: angle', 3, true),
  point('hood@400', 'hood-line', 'Hood underside 400 mm behind the front axle line', 1140, false, { atX: 400 }),
];

/** A sheet with the crossmember's face measured (and flagged), the top and the pinion angle still missing. */
export function sheetStub(overrides: Partial<MeasurementSheet> = {}): MeasurementSheet {
  return {
    projectId: 'project-1',
    chassisId: 'chassis-1',
    signedOffAt: null,
    points: POINTS,
    values: [
      {
        pointId: 'front-crossmember.front-face',
        value: 110,
        tolerance: null,
        note: null,
        measuredBy: 'Sefa Lindqvist-Moro',
        measuredAt: '2026-11-30T08:14:00.000Z',
        version: 2,
        deviation: 20,
        flagged: true,
      },
    ],
    missing: ['front-crossmember.top', 'pinion.angle'],
    photos: [],
    history: [
      { kind: 'value', pointId: 'front-crossmember.front-face', oldValue: 90, newValue: 110, reason: null, by: 'Sefa Lindqvist-Moro', at: '2026-11-30T08:14:00.000Z' },
      { kind: 'value', pointId: 'front-crossmember.front-face', oldValue: null, newValue: 90, reason: null, by: 'Sefa Lindqvist-Moro', at: '2026-11-30T08:10:00.000Z' },
    ],
    ground: { zAtFrontAxleMm: 0, zAtRearAxleMm: 0, pitchDeg: 0 },
    ...overrides,
  };
}
