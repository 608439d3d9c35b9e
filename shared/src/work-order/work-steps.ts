import type { Finding } from '../types/finding';
import type { CheckStatus, WorkHazard } from '../types/value-lists';
import { type CheckRange, describeRange } from './check-result';
import { torqueInBothUnits } from './torque';

/** One of the shop's labor operations as the work order reads it. */
export interface WorkOperationInput {
  /** null for a labor line without a shop operation (e.g. a fabrication remedy's own words). */
  id: string | null;
  code: string;
  name: string;
  buildOrder: number;
  hours: number;
  /** Words of part categories and remedies the operation answers (see the labor operations). */
  matches: string[];
  hazards: WorkHazard[];
  /** `joint`: the stable name of the joint a figure tightens (see `WorkTorque.joint`). */
  torqueSpecs: { joint?: string | null; fastener: string; lbfFt: number; sequence: string | null }[];
  checks: { key: string; label: string; unit: string | null; min: number | null; max: number | null; fitCheckId?: string | null }[];
}

/** A part the job installs, with the tightening data of its catalog row. */
export interface WorkPartInput {
  sku: string;
  description: string;
  category: string;
  quantity: number;
  torqueSpecs: { joint?: string | null; fastener: string; newtonMetres: number; sequence?: string | null }[];
  instructions: string | null;
  /** A part may narrow a check's range: `<check key>.min` / `<check key>.max` numbers in its attributes. */
  attributes: Record<string, unknown>;
}

export interface WorkTorque {
  /**
   * The stable name of the joint it tightens (`oil-pan-to-block`), null when the data names none. A work order gives
   * each joint one figure: the part's own when the job installs a part that gives it, else the operation's.
   */
  joint: string | null;
  fastener: string;
  lbfFt: number;
  newtonMetres: number;
  sequence: string | null;
  /** The part's SKU whose data gives it, or null for the operation's own figure. */
  partSku: string | null;
}

export interface WorkCheck {
  /** `<step key>.<check key>`, unique in the work order. */
  key: string;
  label: string;
  /** Measured checks have a unit and a range; the others are confirmed done or not. */
  measured: boolean;
  unit: string | null;
  min: number | null;
  max: number | null;
  /** The range in words ("6–10 mm"), null for a confirmation. */
  range: string | null;
  /** Where the range comes from: a part's SKU, or null for the operation's default. */
  rangeFrom: string | null;
  /** The fit check's result this check confirms on the vehicle (e.g. the cam timing), when there is one. */
  fitFinding: WorkFitFinding | null;
}

export interface WorkFitFinding {
  checkId: string;
  title: string;
  status: CheckStatus;
  message: string;
  /**
   * For a shortfall (tight or does not fit) the locked parts plan resolves: what resolves it, in the plan's words
   * ("the part RS-1 Rear-sump oil pan", "the operation Notch the crossmember"); null otherwise. The finding is the
   * fit check of the truck as it came in, so the bay measures the fitted result instead of reading it as the verdict.
   * Absent on work orders opened before it was kept.
   */
  resolvedBy?: string | null;
}

/** What resolves a shortfall in a parts plan: its picked parts and planned operations, by the fit check they resolve. */
export interface PlanResolutionInput {
  picks: readonly { sku: string; description: string; resolves: readonly { checkId: string }[] }[];
  operations: readonly { operation: string; resolves: readonly { checkId: string }[] }[];
}

/** Per fit check id, what in the plan resolves it, in words (parts first, then operations, joined by "and"). */
export function planResolutions(plan: PlanResolutionInput | null | undefined): Map<string, string> {
  const words = new Map<string, string[]>();
  const add = (checkId: string, what: string) => words.set(checkId, [...(words.get(checkId) ?? []), what]);
  for (const pick of plan?.picks ?? []) for (const ref of pick.resolves) add(ref.checkId, `the part ${[pick.sku, pick.description].filter(Boolean).join(' ')}`);
  for (const op of plan?.operations ?? []) for (const ref of op.resolves) add(ref.checkId, `the operation ${op.operation}`);
  return new Map([...words].map(([checkId, list]) => [checkId, [...new Set(list)].join(' and ')]));
}

export interface WorkStep {
  key: string;
  operationId: string | null;
  name: string;
  buildOrder: number;
  hours: number;
  hazards: WorkHazard[];
  parts: { sku: string; description: string; quantity: number }[];
  torque: WorkTorque[];
  instructions: string[];
  checks: WorkCheck[];
}

/** A joint's stable name in torque data: lower-case words joined by hyphens (`oil-pan-to-block`). */
export const TORQUE_JOINT_PATTERN = /^[a-z0-9]+(-[a-z0-9]+)*$/;

export const OTHER_PARTS_STEP = { code: 'other-parts', name: 'Fit the other parts of the plan' } as const;

/**
 * The first operation (in the order given: build order) that installs a part of this category: an operation listing the
 * category itself first, then one listing a word the category is made of (`fuel` for `fuel-pump`). Matched on the part's
 * category only, never on a description's words; the quote draws its install labor and the work order its steps by it.
 */
export function installerOfCategory<T extends { matches: readonly string[] }>(operations: readonly T[], category: string): T | null {
  const exact = operations.find((operation) => operation.matches.some((word) => word.toLowerCase() === category));
  if (exact) return exact;
  return operations.find((operation) => operation.matches.some((word) => word && category.includes(word.toLowerCase()))) ?? null;
}

/** The joint a figure tightens: its stable name, or (for data that names none) the fastener's own words. */
function jointKey(spec: { joint?: string | null; fastener: string }): string {
  return spec.joint ? `joint:${spec.joint}` : `fastener:${spec.fastener.trim().toLowerCase()}`;
}

function rangeFor(check: WorkOperationInput['checks'][number], parts: readonly WorkPartInput[]): CheckRange & { from: string | null } {
  for (const part of parts) {
    const min = part.attributes[`${check.key}.min`];
    const max = part.attributes[`${check.key}.max`];
    if (typeof min === 'number' || typeof max === 'number') {
      return { min: typeof min === 'number' ? min : check.min, max: typeof max === 'number' ? max : check.max, from: part.sku };
    }
  }
  return { min: check.min, max: check.max, from: null };
}

/**
 * The work order's steps: the quoted operations in build order, each with the parts it installs, the tightening
 * torques (the operation's and its parts', in lbf·ft and N·m) with their sequences, its hazards and the checks the bay
 * records (a part's data may narrow a measured check's range; a check tied to a fit check carries that result, and what in the
 * locked parts plan resolves it when it is a shortfall: `resolutions`, from {@link planResolutions}).
 * Parts no quoted operation installs go to a last step of their own. Each joint has one figure in the whole work order:
 * a part's own figure replaces the operation's general one for the same joint, and a joint is listed where it is
 * first tightened.
 */
export function buildWorkSteps(
  operations: readonly WorkOperationInput[],
  parts: readonly WorkPartInput[],
  findings: readonly Finding[] = [],
  resolutions: ReadonlyMap<string, string> = new Map(),
): WorkStep[] {
  const ordered = [...operations].sort((a, b) => a.buildOrder - b.buildOrder);
  const partsOf = new Map<WorkOperationInput | null, WorkPartInput[]>();
  for (const part of parts) {
    const installer = installerOfCategory(ordered.filter((operation) => operation.id !== null), part.category);
    partsOf.set(installer, [...(partsOf.get(installer) ?? []), part]);
  }
  // A joint a part of the job gives a figure for is tightened to the part's figure: the operation's general one goes.
  const partJoints = new Set(parts.flatMap((part) => part.torqueSpecs.map(jointKey)));
  const step = (operation: WorkOperationInput, installed: WorkPartInput[]): WorkStep => ({
    key: operation.code,
    operationId: operation.id,
    name: operation.name,
    buildOrder: operation.buildOrder,
    hours: operation.hours,
    hazards: [...operation.hazards],
    parts: installed.map((part) => ({ sku: part.sku, description: part.description, quantity: part.quantity })),
    torque: [
      ...operation.torqueSpecs
        .filter((spec) => !partJoints.has(jointKey(spec)))
        .map((spec) => ({ joint: spec.joint ?? null, fastener: spec.fastener, ...torqueInBothUnits({ lbfFt: spec.lbfFt }), sequence: spec.sequence, partSku: null })),
      ...installed.flatMap((part) =>
        part.torqueSpecs.map((spec) => ({
          joint: spec.joint ?? null,
          fastener: spec.fastener,
          ...torqueInBothUnits({ newtonMetres: spec.newtonMetres }),
          sequence: spec.sequence ?? null,
          partSku: part.sku,
        })),
      ),
    ],
    instructions: installed.filter((part) => part.instructions).map((part) => `${part.sku}: ${part.instructions}`),
    checks: operation.checks.map((check) => {
      const range = rangeFor(check, installed);
      const measured = range.min !== null || range.max !== null;
      const finding = check.fitCheckId ? findings.find((candidate) => candidate.checkId === check.fitCheckId) : undefined;
      return {
        key: `${operation.code}.${check.key}`,
        label: check.label,
        measured,
        unit: check.unit,
        min: range.min,
        max: range.max,
        range: measured ? describeRange(range, check.unit) : null,
        rangeFrom: measured ? range.from : null,
        fitFinding: finding
          ? {
              checkId: finding.checkId,
              title: finding.title,
              status: finding.status,
              message: finding.message,
              resolvedBy: finding.status === 'fails' || finding.status === 'tight' ? (resolutions.get(finding.checkId) ?? null) : null,
            }
          : null,
      };
    }),
  });
  const steps = ordered.map((operation) => step(operation, partsOf.get(operation) ?? []));
  const leftOver = partsOf.get(null) ?? [];
  if (leftOver.length > 0) {
    const last = steps.reduce((max, s) => Math.max(max, s.buildOrder), 0);
    steps.push(step({ id: null, code: OTHER_PARTS_STEP.code, name: OTHER_PARTS_STEP.name, buildOrder: last + 10, hours: 0, matches: [], hazards: [], torqueSpecs: [], checks: [] }, leftOver));
  }
  // Each joint once in the whole work order: where it is first tightened.
  const tightened = new Set<string>();
  for (const built of steps) {
    built.torque = built.torque.filter((spec) => {
      const key = jointKey(spec);
      if (tightened.has(key)) return false;
      tightened.add(key);
      return true;
    });
  }
  return steps;
}
