import { U_JOINT_ANGLES_ID, uJointRoom } from '../checks/drivetrain/u-joint-angles';
import { withPlacement } from '../checks/envelope/placed-engine';
import { goldenSectionMax } from '../geometry/golden-section';
import { resolveFitSettings, type FitSettings } from '../settings/fit-settings';
import type { CheckStatus } from '../types/finding';
import type { FitSpec, Placement } from '../types/fit-spec';
import { boundedByChecks, columnWithModel, envelopeMargins, newWarmStart, scoreAt, type ColumnModel, type WindowBound, type WindowContext } from './fit-window';

/**
 * The best placement over setback, height AND tilt, weighing the driveline as well as the clearances: tilt
 * moves the pan, the hood gap and the tunnel gap, and it sets the transmission's angle, so the U-joint
 * operating angles change with it. A placement whose pan clears but whose U-joints fail is not proposed
 * over one where both pass.
 *
 * Objective (largest wins): the smaller of
 * - the smallest envelope margin in mm divided by the envelope tight band (`tightBandMm`), and
 * - the U-joint margin in degrees divided by the U-joint tight band (`uJointTightBandDeg`),
 * so one "tight band" of room counts the same on either side. Without a transmission the driveline is left
 * out and the objective is the envelope alone.
 */

export interface PlacementProposalOptions {
  /** Tilts searched, degrees (front up positive); default −2 to 6 in 1° steps. */
  tiltsDeg?: number[];
  /** Setback range and grid step of the coarse search; default the current setback ±150 mm at 10 mm. */
  setbackFromMm?: number;
  setbackToMm?: number;
  stepMm?: number;
  /** Heights searched (crank centreline above the ground). */
  lowestHeightMm?: number;
  highestHeightMm?: number;
}

/** One check's room at the proposed placement. */
export interface ProposalBound {
  checkId: string;
  /** The obstacle or part it was measured against ('' when none). */
  against: string;
  /** Margin to the rule's limit, in `unit` (negative fails). */
  margin: number;
  unit: 'mm' | 'deg';
  /** The side of the limit: `min` (a clearance at least so much), `max` (an angle at most so much); see marginWords. */
  limit: 'min' | 'max';
  status: CheckStatus;
  /** The margin in tight bands (margin ÷ the check's tight band): how the search compares mm with degrees. */
  normalizedMargin: number;
}

export interface PlacementProposal {
  placement: Placement;
  /** True when every envelope check and the U-joint check pass at the proposal. */
  allPass: boolean;
  /** The objective at the proposal: the smallest normalized margin (see the module notes). */
  score: number;
  /**
   * What bounds the proposal, tightest first: the limiting checks whose margin is within one tight band of
   * the smallest (the first is the one that limits it). Each states the check, what it was measured
   * against, the room left and its status.
   */
  boundedBy: ProposalBound[];
  /** Every envelope margin and the U-joint margin at the proposal, tightest first. */
  margins: ProposalBound[];
  /** The tilts that were searched and, for each, the best objective found there (null: nothing fits). */
  tilts: Array<{ tiltDeg: number; score: number | null }>;
}

export const DEFAULT_PROPOSAL_TILTS_DEG = [-2, -1, 0, 1, 2, 3, 4, 5, 6];

interface DrivelineRoom {
  marginDeg: number;
  status: CheckStatus;
  limit: 'min' | 'max';
}

function drivelineRoom(spec: FitSpec, settings: FitSettings, placement: Placement): DrivelineRoom | null {
  return uJointRoom(withPlacement(spec, placement), settings);
}

interface Candidate {
  tiltDeg: number;
  setbackMm: number;
  /** The passing interval of heights it came from. */
  lowMm: number;
  highMm: number;
  model: ColumnModel;
  score: number;
  heightMm: number;
}

/**
 * Proposes the placement with the most room over the given tilts (see {@link PlacementProposal}); null when no
 * placement in the searched range passes every clearance.
 */
export function proposePlacement(spec: FitSpec, options: PlacementProposalOptions = {}, settingsOverrides: Partial<FitSettings> = {}): PlacementProposal | null {
  const settings = resolveFitSettings(settingsOverrides);
  const tilts = options.tiltsDeg ?? DEFAULT_PROPOSAL_TILTS_DEG;
  const stepMm = options.stepMm ?? 10;
  const fromMm = options.setbackFromMm ?? spec.placement.setbackMm - 150;
  const toMm = options.setbackToMm ?? spec.placement.setbackMm + 150;
  const lowestMm = options.lowestHeightMm ?? 0;
  const highestMm = options.highestHeightMm ?? 2000;
  const envelopeBand = settings.tightBandMm;
  const drivelineBand = settings.uJointTightBandDeg;
  const hasDriveline = Boolean(spec.transmission);

  const objective = (tiltDeg: number, setbackMm: number, model: ColumnModel, heightMm: number): number => {
    const envelope = scoreAt(model, heightMm).score / envelopeBand;
    if (!hasDriveline) return envelope;
    const room = drivelineRoom(spec, settings, { setbackMm, heightMm, tiltDeg });
    return room ? Math.min(envelope, room.marginDeg / drivelineBand) : envelope;
  };

  // Coarse: every tilt × setback column of the window, each passing interval scored at its middle.
  const candidates: Candidate[] = [];
  const tiltScores = new Map<number, number | null>();
  const steps = Math.max(0, Math.floor((toMm - fromMm) / stepMm + 1e-9));
  for (const tiltDeg of tilts) {
    const context: WindowContext = { spec, settings, tiltDeg, lowestMm, highestMm };
    const warm = newWarmStart();
    let bestHere: number | null = null;
    for (let step = 0; step <= steps; step++) {
      const setbackMm = fromMm + step * stepMm;
      const { column, model } = columnWithModel(context, setbackMm, warm);
      if (!column.feasible) continue;
      // Without a driveline to weigh, an interval the searched range ends proposes that edge (see computeFitWindow).
      for (const interval of hasDriveline ? column.intervals : column.intervals.filter(boundedByChecks)) {
        const heightMm = (interval.lowMm + interval.highMm) / 2;
        const score = objective(tiltDeg, setbackMm, model, heightMm);
        candidates.push({ tiltDeg, setbackMm, lowMm: interval.lowMm, highMm: interval.highMm, model, score, heightMm });
        if (bestHere === null || score > bestHere) bestHere = score;
      }
    }
    tiltScores.set(tiltDeg, bestHere);
  }
  if (candidates.length === 0) return null;

  // Fine: the most promising few, height refined by golden-section search on the same objective.
  const here = spec.placement;
  candidates.sort(
    (a, b) =>
      b.score - a.score ||
      Math.abs(a.tiltDeg - here.tiltDeg) - Math.abs(b.tiltDeg - here.tiltDeg) ||
      Math.abs(a.setbackMm - here.setbackMm) - Math.abs(b.setbackMm - here.setbackMm),
  );
  let best = candidates[0];
  for (const candidate of candidates.slice(0, 6)) {
    const refined = goldenSectionMax((heightMm) => objective(candidate.tiltDeg, candidate.setbackMm, candidate.model, heightMm), candidate.lowMm, candidate.highMm);
    if (refined.score > best.score + 1e-9) best = { ...candidate, heightMm: refined.at, score: refined.score };
  }

  const placement: Placement = { setbackMm: best.setbackMm, heightMm: Math.round(best.heightMm * 10) / 10, tiltDeg: best.tiltDeg };
  const margins = boundsAt(spec, settings, placement);
  const score = margins.length ? Math.min(...margins.map((bound) => bound.normalizedMargin)) : best.score;
  return {
    placement,
    allPass: margins.every((bound) => bound.margin >= 0),
    score,
    boundedBy: margins.filter((bound) => bound.normalizedMargin <= score + 1),
    margins,
    tilts: tilts.map((tiltDeg) => ({ tiltDeg, score: tiltScores.get(tiltDeg) ?? null })),
  };
}

/** The envelope margins and the U-joint margin at a placement, from the checks themselves, tightest first. */
function boundsAt(spec: FitSpec, settings: FitSettings, placement: Placement): ProposalBound[] {
  const out: ProposalBound[] = envelopeMargins(spec, settings, placement).map((margin) => ({
    checkId: margin.checkId,
    against: margin.against,
    margin: margin.marginMm,
    unit: 'mm' as const,
    limit: 'min' as const,
    status: margin.status,
    normalizedMargin: margin.marginMm / settings.tightBandMm,
  }));
  if (spec.transmission) {
    const room = drivelineRoom(spec, settings, placement);
    if (room) {
      out.push({
        checkId: U_JOINT_ANGLES_ID,
        against: 'driveline',
        margin: room.marginDeg,
        unit: 'deg',
        limit: room.limit,
        status: room.status,
        normalizedMargin: room.marginDeg / settings.uJointTightBandDeg,
      });
    }
  }
  return out.sort((a, b) => a.normalizedMargin - b.normalizedMargin);
}
