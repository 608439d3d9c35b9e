import { lbFtToNm, nmToLbFt } from '../units/quantities';

/** A tightening torque in both units a bay's wrenches read, each to a tenth. */
export interface TorqueFigure {
  lbfFt: number;
  newtonMetres: number;
}

const tenth = (value: number): number => Math.round(value * 10) / 10;

/**
 * A torque as the part's or operation's data gives it (in lbf·ft or in N·m), shown in both units to a tenth; the unit
 * given is kept as given, the other converted with the exact factor (see NM_PER_LBF_FT).
 */
export function torqueInBothUnits(given: { lbfFt: number } | { newtonMetres: number }): TorqueFigure {
  if ('lbfFt' in given) return { lbfFt: tenth(given.lbfFt), newtonMetres: tenth(lbFtToNm(given.lbfFt)) };
  return { lbfFt: tenth(nmToLbFt(given.newtonMetres)), newtonMetres: tenth(given.newtonMetres) };
}
