import fc from 'fast-check';
import { SYSTEM_CHECKS } from '../checks/system-checks';
import { specWith, systemFitSpec } from '../checks/drivetrain/system-spec.fixture';
import { U_JOINT_ANGLES_ID } from '../checks/drivetrain/u-joint-angles';
import { formatFindingFigure } from '../units/unit-format';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { STATUS_SEVERITY, type Finding } from '../types/finding';
import { allChecks, compareFitReports, FIT_ENGINE_VERSION, GEOMETRIC_CHECKS, runFitCheck, worstStatus } from './fit-report';
import { frontViewGeometry, sideViewGeometry } from './view-geometry';

describe('runFitCheck', () => {
  const report = runFitCheck(DEMO_FIT_SPEC);

  it('runs every envelope, mount and transmission-mount check plus the system checks', () => {
    expect(report.engineVersion).toBe(FIT_ENGINE_VERSION);
    expect(report.findings.map((f) => f.checkId)).toEqual(allChecks().map((c) => c.id));
    expect(report.findings.length).toBe(GEOMETRIC_CHECKS.length + SYSTEM_CHECKS.length);
    expect(report.placement).toEqual(DEMO_FIT_SPEC.placement);
    expect(report.summary.total).toBe(report.findings.length);
    expect(report.summary.ok + report.summary.tight + report.summary.fails + report.summary.unknown).toBe(report.summary.total);
  });

  it('lists shortfalls worst first: fails before tight, then by relative margin', () => {
    const s = report.shortfalls;
    expect(s.every((f) => f.status === 'fails' || f.status === 'tight')).toBe(true);
    expect(s.length).toBe(report.summary.fails + report.summary.tight);
    for (let i = 1; i < s.length; i++) {
      expect(STATUS_SEVERITY[s[i - 1].status]).toBeGreaterThanOrEqual(STATUS_SEVERITY[s[i].status]);
    }
    expect(s.some((f) => f.checkId === 'envelope.sump-crossmember')).toBe(true);
  });

  it('carries the planning-aid and safety cautions', () => {
    expect(report.caution).toMatch(/planning aid/);
    expect(report.caution).toMatch(/measure the vehicle/i);
    expect(report.caution).toMatch(/stands/);
    expect(report.safety.join(' ')).toMatch(/hoist/);
  });

  it('the rear-sump pan clears the crossmember; compareFitReports reports the change', () => {
    const after = runFitCheck({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN });
    const delta = compareFitReports(report, after).find((d) => d.checkId === 'envelope.sump-crossmember')!;
    expect(delta.before?.status).toBe('fails');
    expect(delta.after?.status).toBe('ok');
    expect(delta.change).toBe('improved');
    expect(delta.statusChanged).toBe(true);
    expect(delta.marginDelta).toBeGreaterThan(100);
    expect(delta.unit).toBe('mm');
    const same = compareFitReports(report, report);
    expect(same.every((d) => d.change === 'same')).toBe(true);
  });

  it('settings overrides reach the checks', () => {
    const r = runFitCheck({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN }, { minGapBelowMm: 40 });
    expect(r.settings.minGapBelowMm).toBe(40);
    expect(r.findings.find((f) => f.checkId === 'envelope.sump-crossmember')!.status).toBe('fails');
  });

  it('property: moving the engine never changes a check that does not depend on placement', () => {
    const independent = new Set(allChecks().filter((c) => !c.dependsOnPlacement).map((c) => c.id));
    const base = runFitCheck(DEMO_FIT_SPEC).findings.filter((f) => independent.has(f.checkId));
    fc.assert(
      fc.property(
        fc.record({
          setbackMm: fc.double({ min: 300, max: 1100, noNaN: true }),
          heightMm: fc.double({ min: 200, max: 900, noNaN: true }),
          tiltDeg: fc.double({ min: -5, max: 8, noNaN: true }),
        }),
        (placement) => {
          const moved = runFitCheck({ ...DEMO_FIT_SPEC, placement }).findings.filter((f) => independent.has(f.checkId));
          expect(moved).toEqual(base);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('compareFitReports: each change in its check\'s own unit', () => {
  it('a U-joint angle comparison stays in degrees in both unit systems', () => {
    // Source: published driveline-maker guidance, worked example (4.0 in drop over 50.0 in, 3° tilt, pinion
    // parallel: both joints 1.5886°, the 0° difference against the 1° maximum governs with 1° of margin).
    const before = runFitCheck(systemFitSpec());
    // Derived: the pinion pointing 1.5° down makes the rear joint |−1.5 − 4.5886| = 6.0886°, a 4.5° difference
    // against the 1° maximum: margin −3.5°, so the margin moves by −4.5°.
    const after = runFitCheck(specWith((s) => (s.chassis.pinion.angleDeg = -1.5)));
    const delta = compareFitReports(before, after).find((d) => d.checkId === U_JOINT_ANGLES_ID)!;
    expect(delta.unit).toBe('deg');
    expect(delta).toMatchObject({ change: 'worse', before: { status: 'ok' }, after: { status: 'fails' } });
    expect(delta.marginDelta).toBeCloseTo(-4.5, 9);
    // Angles read the same in both systems: never a length, never inches.
    expect(formatFindingFigure(delta.marginDelta!, delta.unit, 'in', { signed: true })).toBe('\u22124.50°');
    expect(formatFindingFigure(delta.marginDelta!, delta.unit, 'mm', { signed: true })).toBe('\u22124.50°');
  });

  it('every compared check carries the unit its findings carry', () => {
    const before = runFitCheck(systemFitSpec());
    const after = runFitCheck(specWith((s) => (s.chassis.pinion.angleDeg = -1.5)));
    const units = new Map(after.findings.map((f) => [f.checkId, f.unit]));
    for (const delta of compareFitReports(before, after)) expect(delta.unit).toBe(units.get(delta.checkId));
    expect(new Set(compareFitReports(before, after).map((d) => d.unit)).size).toBeGreaterThan(3);
  });

  it('states no margin change for a must-match rule or when the two reports measure a check in different units', () => {
    const before = runFitCheck(systemFitSpec());
    const matchRule = before.findings.find((f) => f.limit === 'match')!;
    const swap = (report: typeof before, checkId: string, change: Partial<Finding>) => ({
      ...report,
      findings: report.findings.map((f) => (f.checkId === checkId ? { ...f, ...change } : f)),
    });
    // A must-match rule's margin is 0 (matches) or −1 (does not): a flag, not a figure; the change is still judged.
    const mismatch = compareFitReports(swap(before, matchRule.checkId, { margin: -1, status: 'fails' }), swap(before, matchRule.checkId, { margin: 0, status: 'ok' }));
    expect(mismatch.find((d) => d.checkId === matchRule.checkId)).toMatchObject({ change: 'improved', marginDelta: null, unit: matchRule.unit });
    // A check that changed unit between engine versions: the two margins cannot be subtracted.
    const lengthCheck = before.findings.find((f) => f.unit === 'mm' && f.margin !== null && f.limit !== 'match')!;
    const changedUnit = compareFitReports(before, swap(before, lengthCheck.checkId, { unit: 'deg', margin: (lengthCheck.margin ?? 0) + 1 }));
    expect(changedUnit.find((d) => d.checkId === lengthCheck.checkId)).toMatchObject({ unit: 'deg', marginDelta: null });
  });
});

describe('sideViewGeometry and frontViewGeometry', () => {
  it('returns placed outlines and dimension segments whose length is the gap', () => {
    const g = sideViewGeometry({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN });
    expect(g.pan?.length).toBe(DEMO_REAR_SUMP_PAN.bottomProfile.length);
    expect(g.obstacles.length).toBe(DEMO_FIT_SPEC.chassis.obstacles.length);
    expect(g.ground.z).toBe(0);
    const report = runFitCheck({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN });
    for (const d of g.dimensions) {
      const f = report.findings.find((x) => x.checkId === d.checkId)!;
      expect(d.valueMm).toBeCloseTo(f.measured as number, 6);
      if (d.valueMm > 0) expect(Math.hypot(d.to.x - d.from.x, d.to.z - d.from.z)).toBeCloseTo(d.valueMm, 6);
    }
    // tightest first (by margin)
    const margins = g.dimensions.map((d) => d.valueMm - d.requiredMm);
    expect([...margins].sort((a, b) => a - b)).toEqual(margins);
    expect(g.bounds.xMin).toBeLessThan(g.bounds.xMax);
  });

  it('an overlap is drawn as the vertical lift', () => {
    const g = sideViewGeometry(DEMO_FIT_SPEC);
    const d = g.dimensions.find((x) => x.checkId === 'envelope.sump-crossmember')!;
    expect(d.short).toBe(true);
    expect(d.valueMm).toBeLessThan(0);
    expect(d.from.x).toBeCloseTo(d.to.x, 9);
    expect(d.to.z - d.from.z).toBeCloseTo(-d.valueMm, 6);
  });

  it('front view: widths and the rail gap', () => {
    const g = frontViewGeometry(DEMO_FIT_SPEC);
    expect(g.features.length).toBe(DEMO_FIT_SPEC.engine.widthFeatures.length + 1);
    const rail = g.dimensions.find((d) => d.checkId === 'envelope.rail-width')!;
    expect(rail.valueMm).toBeCloseTo(Math.abs(rail.to.y - rail.from.y), 9);
    expect(g.steeringBox?.side).toBe('left');
  });
});

describe('worstStatus', () => {
  it('takes the most severe status present, fails over tight over unknown over ok', () => {
    // Derived: severity order fails > tight > unknown > ok.
    expect(worstStatus({ total: 3, ok: 1, tight: 1, fails: 0, unknown: 1 })).toBe('tight');
    expect(worstStatus({ total: 2, ok: 1, tight: 0, fails: 1, unknown: 0 })).toBe('fails');
    expect(worstStatus({ total: 1, ok: 0, tight: 0, fails: 0, unknown: 1 })).toBe('unknown');
    expect(worstStatus({ total: 0, ok: 0, tight: 0, fails: 0, unknown: 0 })).toBe('ok');
  });
});
