import { MM_PER_INCH } from '../units/length';

/**
 * First bending critical speed of a driveshaft tube, simply supported at the U-joints.
 * Source: Machinery's Handbook, 31st ed., "Critical Speeds": solid steel shaft N = 4,760,000·d/L² rpm, d and L in
 * inches. Derived: for a tube the radius of gyration gives √(D² + d²) in place of d.
 */
export const HANDBOOK_CRITICAL_SPEED_CONSTANT = 4_760_000;

export type ShaftMaterial = 'steel' | 'aluminum';

/**
 * Elastic modulus and density, stored in SI.
 * Aluminium — Source: R. C. Hibbeler, Mechanics of Materials, table "Average Mechanical Properties of Typical
 * Engineering Materials", 6061-T6: E = 10.0 Msi, specific weight 0.098 lb/in³.
 * Steel — From memory: 29 Msi, 0.283 lb/in³; used only for the first-principles cross-check of the handbook
 * formula (the same table gives 29.0 Msi and 0.284 lb/in³ for A-36 structural steel).
 */
export const SHAFT_MATERIALS: Record<ShaftMaterial, { elasticModulusPa: number; densityKgPerM3: number }> = {
  steel: { elasticModulusPa: 29e6 * 6894.757293168361, densityKgPerM3: (0.283 * 0.45359237) / 0.0254 ** 3 },
  aluminum: { elasticModulusPa: 10e6 * 6894.757293168361, densityKgPerM3: (0.098 * 0.45359237) / 0.0254 ** 3 },
};

function assertTube(outerDiameterMm: number, wallMm: number, lengthMm: number): void {
  if (!(outerDiameterMm > 0 && lengthMm > 0 && wallMm > 0 && 2 * wallMm <= outerDiameterMm)) {
    throw new RangeError('A driveshaft tube needs a positive length and diameter and a wall no thicker than its radius.');
  }
}

/** Machinery's Handbook form, steel: N = 4,760,000·√(D² + d²)/L² rpm with inches. */
export function criticalSpeedHandbookRpm(outerDiameterMm: number, wallMm: number, lengthMm: number): number {
  assertTube(outerDiameterMm, wallMm, lengthMm);
  const outer = outerDiameterMm / MM_PER_INCH;
  const inner = outer - (2 * wallMm) / MM_PER_INCH;
  const length = lengthMm / MM_PER_INCH;
  return (HANDBOOK_CRITICAL_SPEED_CONSTANT * Math.sqrt(outer * outer + inner * inner)) / (length * length);
}

/** Euler–Bernoulli beam, pinned ends: ω = (π²/L²)·√(E·I/(ρ·A)), I/A = (D² + d²)/16. */
export function criticalSpeedFirstPrinciplesRpm(
  outerDiameterMm: number,
  wallMm: number,
  lengthMm: number,
  material: ShaftMaterial = 'steel',
): number {
  assertTube(outerDiameterMm, wallMm, lengthMm);
  const { elasticModulusPa, densityKgPerM3 } = SHAFT_MATERIALS[material];
  const outer = outerDiameterMm / 1000;
  const inner = outer - (2 * wallMm) / 1000;
  const length = lengthMm / 1000;
  const radiusOfGyrationSquared = (outer * outer + inner * inner) / 16;
  const omega = ((Math.PI * Math.PI) / (length * length)) * Math.sqrt((elasticModulusPa * radiusOfGyrationSquared) / densityKgPerM3);
  return (omega * 60) / (2 * Math.PI);
}

/**
 * The figure the fit check uses: for steel the handbook formula it cites, N = 4,760,000·√(D² + d²)/L²; for
 * aluminium the first-principles form with the published 6061-T6 constants, since the handbook constant is
 * for steel.
 */
export function driveshaftCriticalSpeedRpm(outerDiameterMm: number, wallMm: number, lengthMm: number, material: ShaftMaterial = 'steel'): number {
  if (material === 'steel') return criticalSpeedHandbookRpm(outerDiameterMm, wallMm, lengthMm);
  return criticalSpeedFirstPrinciplesRpm(outerDiameterMm, wallMm, lengthMm, material);
}

/** Where the critical speed of each material comes from, for the finding's threshold source. */
export const CRITICAL_SPEED_SOURCES: Record<ShaftMaterial, string> = {
  steel: "Machinery's Handbook, 31st ed., \"Critical Speeds\": N = 4,760,000·√(D² + d²)/L² rpm, inches, simply supported steel tube",
  aluminum:
    'Euler–Bernoulli beam with pinned ends, ω = (π²/L²)·√(E·I/(ρ·A)), with 6061-T6 E = 10.0 Msi and 0.098 lb/in³ (R. C. Hibbeler, Mechanics of Materials, "Average Mechanical Properties of Typical Engineering Materials")',
};
