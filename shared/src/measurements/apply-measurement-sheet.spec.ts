import { runFitCheck } from '../fit-report/fit-report';
import { DEMO_FIT_SPEC } from '../fixtures/demo-fit-spec';
import type { FitSpec } from '../types/fit-spec';
import { applyMeasurementSheet, crossmemberBox, DEFAULT_DEVIATION_LIMITS, missingPoints, type MeasuredValue } from './apply-measurement-sheet';
import { parseMeasurementEntry } from './measurement-entry';
import type { MeasurementPoint } from './measurement-points';
import { generateMeasurementTemplate, railUndersideAt } from './measurement-template';

const CHASSIS = DEMO_FIT_SPEC.chassis;
const TEMPLATE = generateMeasurementTemplate(CHASSIS);
const BY = 'Tamsin Okafor';
const AT = '2026-12-02T09:30:00.000Z';
const m = (pointId: string, value: number): MeasuredValue => ({ pointId, value, measuredBy: BY, measuredAt: AT });
const finding = (spec: FitSpec, id: string) => runFitCheck(spec).findings.find((f) => f.checkId === id)!;

describe('generateMeasurementTemplate', () => {
  it('names every point the fit engine needs, with the catalog reading', () => {
    const ids = TEMPLATE.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toEqual(
      expect.arrayContaining([
        'ride-height.front-left',
        'ride-height.rear-right',
        'front-crossmember.top',
        'front-crossmember.bottom',
        'front-crossmember.front-face',
        'front-crossmember.rear-face',
        'center-link.bottom',
        'firewall.front-face',
        'rail.width@300',
        'mount-pad.left.height',
        'mount-pad.spacing',
        'radiator.core-face',
        'hood@400',
        'transmission-crossmember.setback',
        'pinion.height',
        'pinion.angle',
      ]),
    );
    const byId = new Map(TEMPLATE.map((p) => [p.id, p]));
    // Derived from the demo outline: top z 355 over x 90–290 (station 190), bottom z 252 over x 100–280 (190).
    expect(byId.get('front-crossmember.top')).toMatchObject({ catalogValue: 355, atX: 190 });
    expect(byId.get('front-crossmember.bottom')).toMatchObject({ catalogValue: 252, atX: 190 });
    expect(byId.get('front-crossmember.front-face')?.catalogValue).toBe(90);
    // Pads at y ∓305: 610 centre to centre; radiator core face at x −190: 190 ahead of the axle.
    expect(byId.get('mount-pad.spacing')?.catalogValue).toBe(610);
    expect(byId.get('radiator.core-face')?.catalogValue).toBe(190);
    // Rail underside at the front axle (station x 0) is 340; at the rear axle the last station (370) holds.
    expect(byId.get('ride-height.front-left')?.catalogValue).toBe(340);
    expect(byId.get('ride-height.rear-left')?.catalogValue).toBe(railUndersideAt(CHASSIS, 900));
  });
});

describe('parseMeasurementEntry', () => {
  // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly, so 12.5 in = 317.5 mm.
  it.each(['12 1/2"', '12.5 in', '317.5 mm', '12-1/2 in'])('reads %s as 317.5 mm', (text) => {
    expect(parseMeasurementEntry(text, 'obstacle-top')).toEqual({ ok: true, value: 317.5, unit: 'mm' });
  });
  it('reads a bare number in the default unit', () => {
    expect(parseMeasurementEntry('12.5', 'obstacle-top', 'in')).toEqual({ ok: true, value: 317.5, unit: 'mm' });
  });
  it('reads angles in degrees and refuses lengths there', () => {
    expect(parseMeasurementEntry('-1.5°', 'pinion-angle')).toEqual({ ok: true, value: -1.5, unit: 'deg' });
    expect(parseMeasurementEntry('3 deg', 'pinion-angle')).toEqual({ ok: true, value: 3, unit: 'deg' });
    expect(parseMeasurementEntry('3 in', 'pinion-angle').ok).toBe(false);
    expect(parseMeasurementEntry('60', 'pinion-angle').ok).toBe(false);
  });
  it('refuses nonsense with a message', () => {
    const r = parseMeasurementEntry('abc', 'obstacle-top');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/not a length/);
    expect(parseMeasurementEntry('-20 mm', 'obstacle-top').ok).toBe(false);
    expect(parseMeasurementEntry('40 ft', 'obstacle-top').ok).toBe(false);
  });
  it('says the range in the unit the person reads in', () => {
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly, so the 10 m bound is 10000 / 25.4 = 393.70 in.
    const inches = parseMeasurementEntry('999 in', 'obstacle-top', 'in');
    expect(inches).toEqual({ ok: false, message: 'A reading here is between 0 and 393.70 in; "999 in" is not.' });
    expect(!inches.ok && inches.message).not.toMatch(/\d m\b/);
    expect(parseMeasurementEntry('11000', 'obstacle-top', 'mm')).toEqual({ ok: false, message: 'A reading here is between 0 and 10 m; "11000" is not.' });
  });
});

describe('applyMeasurementSheet', () => {
  it('changes nothing without values, and every input names the catalog as its source', () => {
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, []);
    expect(applied.chassis).toEqual(CHASSIS);
    expect(applied.ground).toEqual({ zAtFrontAxleMm: 0, zAtRearAxleMm: 0, pitchDeg: 0 });
    expect(applied.inputs.every((i) => i.source.kind === 'catalog' && !i.flagged)).toBe(true);
  });

  it('a measured crossmember top moves the outline so its top sits where the tape says (shape kept)', () => {
    // Derived: top read 335 mm on a truck at catalog ride height: every outline point moves down 355 − 335 = 20 mm.
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, [m('front-crossmember.top', 335)]);
    const outline = applied.chassis.obstacles.find((o) => o.id === 'front-crossmember')!.outline;
    const before = CHASSIS.obstacles.find((o) => o.id === 'front-crossmember')!.outline;
    expect(outline).toEqual(before.map((p) => ({ x: p.x, z: p.z - 20 })));
    const input = applied.inputs.find((i) => i.pointId === 'front-crossmember.top')!;
    expect(input).toMatchObject({ catalogValue: 355, measuredValue: 335, deviation: -20, flagged: true, source: { kind: 'sheet', measuredBy: BY, measuredAt: AT } });
    expect(input.checks).toContain('envelope.sump-crossmember');
  });

  it('top and bottom both measured map the outline linearly between them; faces do the same fore and aft', () => {
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, [
      m('front-crossmember.top', 350),
      m('front-crossmember.bottom', 250),
      m('front-crossmember.front-face', 95),
      m('front-crossmember.rear-face', 300),
    ]);
    const outline = applied.chassis.obstacles.find((o) => o.id === 'front-crossmember')!.outline;
    // Derived: z' = 250 + (z − 252)·100/103, so z 262 → 259.71; x' = 95 + (x − 90)·205/200, so x 100 → 105.25, x 280 → 289.75.
    expect(outline).toEqual([
      { x: 95, z: 259.71 },
      { x: 105.25, z: 250 },
      { x: 289.75, z: 250 },
      { x: 300, z: 259.71 },
      { x: 300, z: 350 },
      { x: 95, z: 350 },
    ]);
  });

  it('ride heights move the ground line, not the frame; floor readings enter the frame through it', () => {
    // Hand-worked example (docs/fit-spec.md, "Measured chassis"):
    // front datum 340: read 365 and 375 → mean 370 → ground under the front axle at 340 − 370 = −30;
    // rear datum 370: read 380 and 390 → mean 385 → ground under the rear axle at 370 − 385 = −15;
    // pitch = atan(15 / 2921) = 0.29422° nose up.
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, [
      m('ride-height.front-left', 365),
      m('ride-height.front-right', 375),
      m('ride-height.rear-left', 380),
      m('ride-height.rear-right', 390),
      m('front-crossmember.top', 390),
      m('pinion.angle', 3.5),
    ]);
    expect(applied.ground.zAtFrontAxleMm).toBe(-30);
    expect(applied.ground.zAtRearAxleMm).toBe(-15);
    expect(applied.ground.pitchDeg).toBeCloseTo(0.294222, 5);
    expect(applied.chassis.groundLine).toEqual({ zAtFrontAxleMm: -30, zAtRearAxleMm: -15 });
    // Crossmember top read 390 at station 190: ground there −30 + 15·190/2921 = −29.0243; frame z 360.98 (+5.98).
    const outline = applied.chassis.obstacles.find((o) => o.id === 'front-crossmember')!.outline;
    expect(Math.max(...outline.map((p) => p.z))).toBeCloseTo(360.98, 2);
    const top = applied.inputs.find((i) => i.pointId === 'front-crossmember.top')!;
    // Expected reading on this truck 355 + 29.02 = 384.02; 390 is 5.98 above it: within 15 mm, not flagged.
    expect(top.deviation).toBeCloseTo(5.98, 2);
    expect(top.flagged).toBe(false);
    // The rails, pads and everything unmeasured keep their frame coordinates.
    expect(applied.chassis.mountPads).toEqual(CHASSIS.mountPads);
    // Pinion read 3.5° against level; the frame is 0.29° nose up: 3.5 − 0.29 = 3.21° in the frame.
    expect(applied.chassis.pinion.angleDeg).toBeCloseTo(3.21, 2);
    // Ride heights 30 and 15 mm above the catalog's datums: 30 is flagged at the default 15 mm limit.
    expect(applied.inputs.find((i) => i.pointId === 'ride-height.front-left')!.flagged).toBe(true);
    expect(DEFAULT_DEVIATION_LIMITS.lengthMm).toBe(15);
  });

  it('a truck sitting 40 mm higher all round gains exactly 40 mm of ground clearance; the frame gaps stay', () => {
    const spec: FitSpec = { ...DEMO_FIT_SPEC, oilPan: DEMO_FIT_SPEC.candidates!.oilPans![1] };
    const before = finding(spec, 'envelope.ground-clearance');
    // Derived: every corner reads its datum + 40 mm, so the ground lies at z −40 under both axles.
    const raised = TEMPLATE.filter((p) => p.kind === 'ride-height').map((p) => m(p.id, p.catalogValue! + 40));
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, raised);
    expect(applied.ground).toEqual({ zAtFrontAxleMm: -40, zAtRearAxleMm: -40, pitchDeg: 0 });
    const measuredSpec = { ...spec, chassis: applied.chassis };
    expect(finding(measuredSpec, 'envelope.ground-clearance').measured! - before.measured!).toBeCloseTo(40, 9);
    expect(finding(measuredSpec, 'envelope.sump-crossmember').measured).toBeCloseTo(finding(spec, 'envelope.sump-crossmember').measured!, 9);
    // Only the front raised 40: the ground falls from −40 at the axle to 0 at the rear axle, so the gain is between.
    const frontOnly = applyMeasurementSheet(CHASSIS, TEMPLATE, raised.filter((v) => v.pointId.includes('front')));
    const gain = finding({ ...spec, chassis: frontOnly.chassis }, 'envelope.ground-clearance').measured! - before.measured!;
    expect(gain).toBeGreaterThan(0);
    expect(gain).toBeLessThan(40);
  });

  it('crossmember 20 mm lower: the stock pan reads 20 mm less into it', () => {
    // Derived: the overlap gap is minus the vertical lift that separates the outlines; moving the obstacle down
    // 20 mm takes 20 mm off that lift while they still overlap.
    const before = finding(DEMO_FIT_SPEC, 'envelope.sump-crossmember');
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, [m('front-crossmember.top', 335)]);
    const after = finding({ ...DEMO_FIT_SPEC, chassis: applied.chassis }, 'envelope.sump-crossmember');
    expect(before.measured!).toBeLessThan(-20);
    expect(after.measured! - before.measured!).toBeCloseTo(20, 6);
  });

  it('rails, pads, radiator, hood, transmission crossmember and pinion take the reading', () => {
    const applied = applyMeasurementSheet(CHASSIS, TEMPLATE, [
      m('rail.width@300', 735),
      m('rail.bottom@300', 360),
      m('mount-pad.left.height', 470),
      m('mount-pad.right.setback', 320),
      m('mount-pad.spacing', 600),
      m('radiator.core-face', 200),
      m('hood@400', 1130),
      m('transmission-crossmember.setback', 1420),
      m('transmission-crossmember.height', 330),
      m('pinion.height', 380),
    ]);
    const c = applied.chassis;
    expect(c.railStations.find((s) => s.x === 300)).toEqual({ x: 300, insideWidthMm: 735, zBottom: 360, zTop: 520 });
    expect(c.mountPads.left).toEqual({ x: 310, y: -300, z: 470 });
    expect(c.mountPads.right).toEqual({ x: 320, y: 300, z: 440 });
    expect(c.radiatorCore.x).toBe(-200);
    expect(c.hoodLine.find((p) => p.x === 400)).toEqual({ x: 400, z: 1130 });
    expect(c.transmissionCrossmember).toEqual({ x: 1420, z: 330, adjustableXMm: 50 });
    expect(c.pinion.z).toBe(380);
    // 470 against 440 is 30 mm off the book: flagged at 15 mm, not at a shop limit of 40 mm.
    expect(applied.inputs.find((i) => i.pointId === 'mount-pad.left.height')!.flagged).toBe(true);
    const lenient = applyMeasurementSheet(CHASSIS, TEMPLATE, [m('mount-pad.left.height', 470)], { lengthMm: 40, angleDeg: 1 });
    expect(lenient.inputs.find((i) => i.pointId === 'mount-pad.left.height')!.flagged).toBe(false);
  });

  it('a crossmember the catalog lacks is a box from its four faces', () => {
    const extra = (['top', 'bottom', 'front-face', 'rear-face'] as const).map((suffix): MeasurementPoint => ({
      id: `added-xm.${suffix}`,
      kind: `obstacle-${suffix}`,
      target: 'added-xm',
      label: 'Added crossmember: ' + suffix,
      howTo: '',
      catalogValue: null,
      required: false,
      ...(suffix === 'top' || suffix === 'bottom' ? { atX: 500 } : {}),
    }));
    const applied = applyMeasurementSheet(CHASSIS, [...TEMPLATE, ...extra], [
      m('added-xm.top', 300),
      m('added-xm.bottom', 220),
      m('added-xm.front-face', 450),
      m('added-xm.rear-face', 550),
    ]);
    expect(applied.chassis.obstacles.find((o) => o.id === 'added-xm')).toEqual(
      crossmemberBox('added-xm', 'Added crossmember', { frontX: 450, rearX: 550, bottomZ: 220, topZ: 300 }),
    );
    expect(crossmemberBox('b', 'B', { frontX: 450, rearX: 550, bottomZ: 220, topZ: 300 }).outline).toEqual([
      { x: 450, z: 220 },
      { x: 550, z: 220 },
      { x: 550, z: 300 },
      { x: 450, z: 300 },
    ]);
  });

  it('lists the required points still missing', () => {
    const missing = missingPoints(TEMPLATE, new Set(['front-crossmember.top']));
    expect(missing.map((p) => p.id)).not.toContain('front-crossmember.top');
    expect(missing.map((p) => p.id)).toContain('front-crossmember.bottom');
    expect(missing.every((p) => p.required)).toBe(true);
  });
});
