import { DEFAULT_FIT_SETTINGS } from '../settings/fit-settings';
import { STATUS_SEVERITY } from '../types/finding';
import { specWith, systemFitSpec } from './drivetrain/system-spec.fixture';
import { SYSTEM_CHECKS } from './system-checks';

describe('SYSTEM_CHECKS', () => {
  it('has unique ids in group.name form, matching what each check returns', () => {
    const ids = SYSTEM_CHECKS.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const check of SYSTEM_CHECKS) {
      expect(check.id.startsWith(`${check.group}.`)).toBe(true);
      const finding = check.run({ spec: systemFitSpec(), settings: DEFAULT_FIT_SETTINGS });
      expect(finding).toMatchObject({ checkId: check.id, group: check.group });
    }
  });

  it('every check passes on the fixture swap', () => {
    const results = SYSTEM_CHECKS.map((c) => c.run({ spec: systemFitSpec(), settings: DEFAULT_FIT_SETTINGS }));
    expect(results.filter((f) => f.status !== 'ok').map((f) => `${f.checkId}: ${f.message}`)).toEqual([]);
  });

  it('a bare spec gives unknowns that name their inputs, and never throws', () => {
    const bare = specWith((s) => {
      delete s.transmission;
      delete s.oilPan;
      delete s.oilPickup;
      delete s.oilPump;
      delete s.controller;
      delete s.driveshaft;
      delete s.candidates;
    });
    for (const check of SYSTEM_CHECKS) {
      const finding = check.run({ spec: bare, settings: DEFAULT_FIT_SETTINGS });
      if (finding.status === 'unknown') expect(finding.missing.length).toBeGreaterThan(0);
      expect(STATUS_SEVERITY[finding.status]).toBeDefined();
    }
  });

  it('only drivetrain geometry, and the oiling checks that offer pans (a pan must clear what is below it there), depend on placement', () => {
    expect(SYSTEM_CHECKS.filter((c) => c.dependsOnPlacement).map((c) => c.id).sort()).toEqual([
      'drivetrain.critical-speed',
      'drivetrain.driveshaft-length',
      'drivetrain.u-joint-angles',
      'oiling.dipstick',
      'oiling.pan-pickup-pump',
    ]);
  });

  it('ok findings carry no remedies; failing ones carry at least one', () => {
    const failing = specWith((s) => {
      s.transmission!.bellPattern = 'bell-b';
      s.engine.dipstickLocation = 'pan-right';
      s.chassis.fuelSystem.kind = 'carburetor';
    });
    for (const check of SYSTEM_CHECKS) {
      const finding = check.run({ spec: failing, settings: DEFAULT_FIT_SETTINGS });
      if (finding.status === 'ok') expect(finding.remedies).toEqual([]);
      if (finding.status === 'fails') expect(finding.remedies.length).toBeGreaterThan(0);
    }
  });
});
