/**
 * Choosing a stock belt and naming it. Source: ISO 9982:2019 (PK ribbed belts designated ribs × profile ×
 * effective length, e.g. 6PK2120; rib pitch 3.56 mm); ISO 155 (centre-distance allowance taken up by the
 * tensioner); ISO 9981:2020 (PK pulleys: minimum effective diameter 45 mm).
 */
export const PK_RIB_PITCH_MM = 3.56;
export const PK_MIN_PULLEY_DIAMETER_MM = 45;

export interface TensionerTakeUp {
  /** How much shorter than the computed length a belt may be, and how much longer. */
  shorterMm: number;
  longerMm: number;
}

export interface StockBeltChoice {
  lengthMm: number;
  /** Stock length minus computed length: negative when the belt is shorter. */
  differenceMm: number;
  /** Room left to the nearer end of the tensioner's range; negative when outside it. */
  marginMm: number;
  withinTakeUp: boolean;
}

/** The accepted stock belt lengths, from the shortest to the longest belt the tensioner accepts. */
export function beltLengthWindow(computedLengthMm: number, takeUp: TensionerTakeUp): { minMm: number; maxMm: number } {
  return { minMm: computedLengthMm - takeUp.shorterMm, maxMm: computedLengthMm + takeUp.longerMm };
}

/**
 * The stock belt nearest the computed length among those the tensioner accepts; when none fits, the one
 * closest to the window (marginMm negative). Null when no stock lengths are given.
 */
export function nearestStockBelt(
  computedLengthMm: number,
  takeUp: TensionerTakeUp,
  stockLengthsMm: readonly number[],
): StockBeltChoice | null {
  const window = beltLengthWindow(computedLengthMm, takeUp);
  const choices = stockLengthsMm
    .filter((length) => Number.isFinite(length) && length > 0)
    .map((lengthMm): StockBeltChoice => {
      const marginMm = Math.min(lengthMm - window.minMm, window.maxMm - lengthMm);
      return { lengthMm, differenceMm: lengthMm - computedLengthMm, marginMm, withinTakeUp: marginMm >= 0 };
    });
  if (choices.length === 0) return null;
  const fitting = choices.filter((choice) => choice.withinTakeUp);
  const pool = fitting.length > 0 ? fitting : choices;
  return pool.reduce((best, choice) => {
    if (fitting.length > 0) {
      return Math.abs(choice.differenceMm) < Math.abs(best.differenceMm) ? choice : best;
    }
    return choice.marginMm > best.marginMm ? choice : best;
  });
}

export interface BeltDesignation {
  ribs: number;
  profile: 'PK';
  effectiveLengthMm: number;
}

/** `6PK1225`: ribs, profile, effective length rounded to the millimetre. */
export function formatBeltDesignation(ribs: number, effectiveLengthMm: number): string {
  if (!Number.isInteger(ribs) || ribs < 1) throw new RangeError('A ribbed belt needs a whole number of ribs, at least one.');
  if (!(effectiveLengthMm > 0)) throw new RangeError('A belt length must be positive.');
  return `${ribs}PK${Math.round(effectiveLengthMm)}`;
}

export function parseBeltDesignation(text: string): BeltDesignation {
  const match = /^\s*(\d{1,2})\s*PK\s*(\d{2,5})\s*$/i.exec(text);
  if (!match || Number(match[1]) < 1) {
    throw new RangeError(`"${text}" is not a ribbed belt designation: expected ribs, PK and the effective length in mm, for example 6PK1225.`);
  }
  return { ribs: Number(match[1]), profile: 'PK', effectiveLengthMm: Number(match[2]) };
}

/** Belt width across the ribs, ribs × rib pitch. */
export function ribbedBeltWidthMm(ribs: number): number {
  return ribs * PK_RIB_PITCH_MM;
}
