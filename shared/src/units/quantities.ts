/**
 * Exact conversion factors. Source: NIST SP 811 (2008), Appendix B.8/B.9; NIST Handbook 44, Appendix C.
 * The inch and the avoirdupois pound are exact by definition (1959); the rest follow from them and g_n.
 */
export const KG_PER_LB = 0.45359237;
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** lbf = lb × g_n = 4.4482216152605 N. */
export const N_PER_LBF = KG_PER_LB * STANDARD_GRAVITY_M_PER_S2;
/** lbf·ft = lbf × 0.3048 m = 1.3558179483314004 N·m. */
export const NM_PER_LBF_FT = N_PER_LBF * 0.3048;
/** US gallon = 231 in³ = 3.785411784 L. */
export const L_PER_US_GAL = 3.785411784;
/** psi = lbf / in² = 6894.757293168361 Pa. */
export const PA_PER_PSI = N_PER_LBF / (0.0254 * 0.0254);
export const KPA_PER_PSI = PA_PER_PSI / 1000;
/** Mechanical horsepower = 550 ft·lbf/s = 745.69987158227022 W. */
export const W_PER_HP = 550 * NM_PER_LBF_FT;
export const KW_PER_HP = W_PER_HP / 1000;

export const lbFtToNm = (lbFt: number): number => lbFt * NM_PER_LBF_FT;
export const nmToLbFt = (nm: number): number => nm / NM_PER_LBF_FT;
export const gallonsToLiters = (gal: number): number => gal * L_PER_US_GAL;
export const litersToGallons = (liters: number): number => liters / L_PER_US_GAL;
export const psiToKpa = (psi: number): number => psi * KPA_PER_PSI;
export const kpaToPsi = (kpa: number): number => kpa / KPA_PER_PSI;
export const hpToKw = (hp: number): number => hp * KW_PER_HP;
export const kwToHp = (kw: number): number => kw / KW_PER_HP;
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
