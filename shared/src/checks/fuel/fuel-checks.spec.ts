import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { hpToKw } from '../../units/quantities';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkFuelSystemPressure } from './fuel-pressure';
import { checkFuelPumpFlow } from './fuel-pump-flow';
import { checkInjectorSize } from './injector-size';

const context = (spec: FitSpec) => ({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('fuel.injector-size', () => {
  // Source: published EFI sizing note: 400 hp × 0.50 / (8 × 0.80) = 31.25 lb/h; 31.25 lb/h at 43.5 psi gives 36.08 at 58 psi.
  it('ok: 31.25 lb/h injectors rated at 43.5 psi run at 58 psi', () => {
    const finding = checkInjectorSize(context(systemFitSpec()));
    expect(finding.status).toBe('ok');
    expect(finding.required).toBeCloseTo(31.25, 6);
    expect(finding.measured).toBeCloseTo(36.08, 2);
    // Source: lb/h × 453.59237 / 60 / SG 0.74: 31.25 lb/h = 319.25 cc/min.
    expect(finding.message).toContain('at least 31.3 lb/h (320 cc/min)');
  });

  it('tight within 5 % and fails below the requirement', () => {
    // Derived: at 43.5 psi the injectors give exactly 31.25 lb/h (margin 0 → tight); at 40 psi 29.97 lb/h (fails).
    expect(checkInjectorSize(context(specWith((s) => (s.engine.fuelPressurePsi = 43.5)))).status).toBe('tight');
    const low = checkInjectorSize(context(specWith((s) => (s.engine.fuelPressurePsi = 40))));
    expect(low.status).toBe('fails');
    expect(low.remedies[0]).toMatchObject({ category: 'injector', requires: { minFlowLbh: 31.3, atPsi: 40, count: 8 } });
    expect((low.remedies[0] as { note: string }).note).toContain('fire risk');
  });

  it('unknown without injector data', () => {
    expect(checkInjectorSize(context(specWith((s) => delete s.engine.injectorFlowLbh)))).toMatchObject({
      status: 'unknown',
      missing: ['engine.injectorFlowLbh'],
    });
  });
});

describe('fuel.pump-flow', () => {
  // Source: 200 lb/h at 6.0 lb/gal = 126.18 L/h (US DOE AFDC density); Common practice: 25 % margin → 157.73 L/h.
  it('ok: 190 L/h against 157.7 L/h', () => {
    const finding = checkFuelPumpFlow(context(systemFitSpec()));
    expect(finding.status).toBe('ok');
    expect(finding.required).toBeCloseTo(157.73, 2);
  });

  it('tight at 160 L/h, fails at 150 L/h', () => {
    expect(checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem.pumpFlowLph = 160)))).status).toBe('tight');
    expect(checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem.pumpFlowLph = 150)))).status).toBe('fails');
  });

  it('fails on a carburetor system with pump and regulator remedies and a fire caution', () => {
    const finding = checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 300, pumpRatedPsi: 6, regulatorPsi: 6 }))));
    expect(finding.status).toBe('fails');
    expect(finding.remedies.map((r) => r.kind === 'part' && r.category)).toEqual(['fuel-pump', 'fuel-regulator']);
    expect(finding.remedies[0]).toMatchObject({ requires: { minFlowLph: 158, minPressurePsi: 58 } });
    expect((finding.remedies[0] as { note: string }).note).toMatch(/local codes/);
  });

  it('fails when the pump is rated below the injection pressure', () => {
    expect(checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem.pumpRatedPsi = 43.5)))).status).toBe('fails');
  });

  it('never prints a made-up zero flow: a pump that cannot reach injection pressure has no "found" figure', () => {
    // Source: SAE J1832 (port injectors at their rated pressure; 400 kPa = 58.0 psi). From memory: a carburetor
    // pump gives about 4–8 psi, so it has no flow at 58 psi to compare. Its own figures are quoted as entered.
    const carb = checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 150, pumpRatedPsi: 8, regulatorPsi: 0 }))));
    expect(carb).toMatchObject({ status: 'fails', measured: null, margin: null });
    expect(carb.message).toContain('low-pressure pump (150.0 L/h at 8.0 psi) cannot feed injection');
    expect(carb.message).not.toMatch(/\b0\.0 (L\/h|psi)/);
    const low = checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem.pumpRatedPsi = 43.5))));
    expect(low).toMatchObject({ status: 'fails', measured: null, margin: null });
    expect(low.message).toContain('rated at only 43.5 psi, so its 190.0 L/h is not available at 58.0 psi');
  });

  it('a pump flow or pressure not entered is not given: unknown, naming what to enter', () => {
    // Common practice (no published source): a pump's flow of 0 is a figure nobody entered, not a pump giving nothing.
    const flow = checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem.pumpFlowLph = 0))));
    expect(flow).toMatchObject({ status: 'unknown', measured: null, missing: ['chassis.fuelSystem.pumpFlowLph'] });
    expect(flow.message).toMatch(/^Cannot check the fuel pump flow: the chassis fuel pump's rated flow is not given\./);
    expect(flow.message).toMatch(/enter it under the chassis model's fuel system/);
    const both = checkFuelPumpFlow(context(specWith((s) => Object.assign(s.chassis.fuelSystem, { pumpFlowLph: 0, pumpRatedPsi: 0 }))));
    expect(both.missing).toEqual(['chassis.fuelSystem.pumpFlowLph', 'chassis.fuelSystem.pumpRatedPsi']);
    expect(both.message).toMatch(/rated flow and the chassis fuel pump's rated pressure are not given/);
    expect(both.message).not.toMatch(/\b0\.0 (L\/h|psi)/);
    const carbUnknown = checkFuelPumpFlow(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 0, pumpRatedPsi: 0, regulatorPsi: 0 }))));
    expect(carbUnknown.message).toContain('low-pressure pump (flow and pressure not given) cannot feed injection');
  });

  it('scales with power given in kW', () => {
    // Derived: 500 hp → 250 lb/h → 197.16 L/h with margin.
    const finding = checkFuelPumpFlow(context(specWith((s) => (s.goals.targetPowerKw = hpToKw(500)))));
    expect(finding.required).toBeCloseTo(197.16, 2);
    expect(finding.status).toBe('fails');
  });
});

describe('fuel.system-pressure', () => {
  it('ok at the rated pressure, tight a little off, fails far off', () => {
    expect(checkFuelSystemPressure(context(systemFitSpec())).status).toBe('ok');
    expect(checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem.regulatorPsi = 56)))).status).toBe('tight');
    const off = checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem.regulatorPsi = 43.5))));
    expect(off).toMatchObject({ status: 'fails', measured: 43.5, required: 58 });
    expect(off.remedies[0]).toMatchObject({ category: 'fuel-regulator', requires: { pressurePsi: 58 } });
  });

  it('a carburetor system without a regulator says so, never "at 0.0 psi"', () => {
    // Common practice (no published source): a carburetor system runs at its pump's pressure when it has no regulator.
    const carb = checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 150, pumpRatedPsi: 8, regulatorPsi: 0 }))));
    expect(carb).toMatchObject({ status: 'fails', measured: 8, required: 58 });
    expect(carb.message).toContain('carburetor fuel system (pump 150.0 L/h at 8.0 psi, no regulator)');
    expect(carb.message).not.toMatch(/\b0\.0 psi/);
    const bare = checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 0, pumpRatedPsi: 0, regulatorPsi: 0 }))));
    expect(bare).toMatchObject({ status: 'fails', measured: null, margin: null });
  });

  it('an injection regulator pressure not entered is not given: unknown, naming what to enter', () => {
    const f = checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem.regulatorPsi = 0))));
    expect(f).toMatchObject({ status: 'unknown', measured: null, missing: ['chassis.fuelSystem.regulatorPsi'] });
    expect(f.message).toBe(
      "Cannot check the fuel system pressure: the pressure the chassis fuel regulator holds is not given. The engine is rated at 58.0 psi; enter it under the chassis model's fuel system (from the pump's label or data sheet, or a flow and pressure test).",
    );
  });

  it('fails on a carburetor system', () => {
    const finding = checkFuelSystemPressure(context(specWith((s) => (s.chassis.fuelSystem = { kind: 'carburetor', pumpFlowLph: 300, pumpRatedPsi: 6, regulatorPsi: 6 }))));
    expect(finding.status).toBe('fails');
    expect(finding.remedies.map((r) => r.kind === 'part' && r.category)).toEqual(['fuel-pump', 'fuel-regulator']);
  });
});
