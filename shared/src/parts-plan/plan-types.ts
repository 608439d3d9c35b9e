import type { FabricationOperationCode, Finding } from '../types/finding';
import type { PartAttributes } from './part-attributes';
import type { CatalogPartCategory } from './part-categories';

/** lowest-cost: parts price plus labor at the shop rate; least-fabrication: fewest fabrication hours first; in-stock: only parts on the shelf now. */
export const PLAN_OBJECTIVES = ['lowest-cost', 'least-fabrication', 'in-stock'] as const;
export type PlanObjective = (typeof PLAN_OBJECTIVES)[number];

/** Categories where the vehicle carries one part at a time: the plan keeps the fitted one or picks one replacement. */
export const PLAN_SLOTS = [
  'oil-pan',
  'oil-pickup',
  'oil-pump',
  'windage-tray',
  'dipstick',
  'engine-controller',
  'throttle-pedal',
  'mount-adapter',
  'bellhousing-adapter',
  'fuel-pump',
  'fuel-regulator',
  'radiator',
  'accessory-drive',
  'cam-timing-set',
] as const satisfies readonly CatalogPartCategory[];
export type PlanSlot = (typeof PLAN_SLOTS)[number];

export function isPlanSlot(category: string): category is PlanSlot {
  return (PLAN_SLOTS as readonly string[]).includes(category);
}

/** A catalog part as the planner sees it. Money in integer cents. */
export interface PlanPart {
  id: string;
  sku: string;
  description: string;
  category: CatalogPartCategory;
  priceCents: number;
  /** Install labor, hours to a tenth. */
  laborHours: number;
  attributes: PartAttributes;
  /** SKUs: this part needs one of them in the plan as well. */
  requires: string[];
  /** SKUs that may not be in the same plan. */
  excludes: string[];
  /** SKUs this part supersedes (they are not offered while it is in the catalog). */
  replaces: string[];
  /** Units free to reserve now: on hand minus reserved, every location. */
  available: number;
  /** The shop catalog fit spec the part carries, when it has one. */
  fitSpecId?: string | null;
}

/** A part already on the vehicle (or chosen in the project's fit selections) that can be kept at no cost. */
export interface FittedPart {
  name: string;
  attributes: PartAttributes;
  fitSpecId?: string | null;
  sku?: string | null;
}

/** The engine facts the rules read. */
export interface PlanEngine {
  name: string;
  railPattern: string;
  bellPattern: string;
  crankSignal: string;
  camSignal: string;
  throttle: 'cable' | 'electronic';
  cylinders: number;
  dipstickLocation: string;
}

export type PlanShortfall = Pick<Finding, 'checkId' | 'title' | 'status' | 'message' | 'remedies'>;

export interface PlanInput {
  engine: PlanEngine;
  /** The chosen transmission's bell pattern; a bellhousing adapter must match it and the engine's. */
  transmissionBellPattern?: string | null;
  fitted: Partial<Record<PlanSlot, FittedPart>>;
  /** The fit report's shortfalls (tight or fails), worst first. */
  shortfalls: PlanShortfall[];
  /** Check ids the shop wants resolved; every shortfall when absent. */
  resolve?: string[];
  parts: PlanPart[];
  /**
   * Fit-spec ids of catalog parts the fit engine found not fitting where the engine sits (a pan that runs into the
   * crossmember), with the reason in words (see `panClearanceRefusals`). Such a part is never picked, not even to
   * make the pan agree with a pickup.
   */
  clearanceRefusals?: Record<string, string>;
  /** Shop labor rate, cents per hour. */
  laborRateCents: number;
  objective: PlanObjective;
}

export interface PlanCandidateRejection {
  partId: string;
  sku: string;
  description: string;
  totalCents: number;
  reason: string;
}

export interface PlanShortfallRef {
  checkId: string;
  title: string;
}

export interface PlanPartPick {
  partId: string;
  sku: string;
  description: string;
  category: CatalogPartCategory;
  quantity: number;
  priceCents: number;
  laborHours: number;
  laborCents: number;
  totalCents: number;
  fabricationHours: number;
  available: number;
  fitSpecId: string | null;
  /** The shortfalls this part resolves. */
  resolves: PlanShortfallRef[];
  /** The rules that brought it in (agreement with another pick, a `requires` of another part). */
  broughtInBy: string[];
  /** Cheaper parts of the same kind and why each was not chosen. */
  rejected: PlanCandidateRejection[];
  explanation: string;
}

export interface PlanOperationPick {
  operation: string;
  laborHours: number;
  /** The kind of shop labor operation it is (from the fit remedy), null when none; absent on plans saved before it was kept. */
  operationCode?: FabricationOperationCode | null;
  laborCents: number;
  resolves: PlanShortfallRef[];
  explanation: string;
}

export interface PlanKeptPart {
  slot: PlanSlot;
  name: string;
  note: string;
}

export interface PlanUnresolved {
  checkId: string;
  title: string;
  message: string;
  /** What the catalog would need to hold for the plan to resolve it. */
  catalogNeeds: string[];
  reason: string;
}

export interface PlanTotals {
  partsCents: number;
  laborHours: number;
  laborCents: number;
  fabricationHours: number;
  totalCents: number;
}

export interface PartsPlanResult {
  objective: PlanObjective;
  /** optimal: the solver proved the lowest total; feasible: stopped at its time or gap limit with a good plan; infeasible: no consistent set. */
  status: 'optimal' | 'feasible' | 'infeasible';
  picks: PlanPartPick[];
  operations: PlanOperationPick[];
  kept: PlanKeptPart[];
  unresolved: PlanUnresolved[];
  totals: PlanTotals;
  notes: string[];
  model: { columns: number; rows: number; solves: number };
}
