/** What every check returns. Lengths are millimetres and angles degrees inside the engine. */

import type { CheckGroup, CheckStatus, FigureUnit, PlacementAxis } from './value-lists';

export type { CheckGroup, CheckStatus, FigureUnit } from './value-lists';

export type PartCategory =
  | 'oil-pan'
  | 'oil-pickup'
  | 'oil-pump'
  | 'mount-adapter'
  | 'bellhousing-adapter'
  | 'transmission-mount'
  | 'driveshaft'
  | 'fuel-pump'
  | 'fuel-regulator'
  | 'injector'
  | 'accessory-drive'
  | 'belt'
  | 'radiator'
  | 'engine-controller'
  | 'throttle-pedal'
  | 'cam-timing-set'
  | 'dipstick'
  | 'exhaust-manifold';

export interface PartRemedy {
  kind: 'part';
  category: PartCategory;
  /** The attributes the part must have, e.g. `{ sumpPosition: 'rear' }` or `{ minFlowLph: 160 }`. */
  requires: Record<string, string | number | boolean>;
  /** Catalog ids (from the spec's candidates) known to satisfy the requirement, best first. */
  partIds: string[];
  note: string;
}

export interface PlacementRemedy {
  kind: 'placement';
  /** setback: engine origin moves rearward (+) or forward (−); height: up (+) or down (−); tilt: front up (+). */
  axis: PlacementAxis;
  changeBy: number;
  unit: 'mm' | 'deg';
  note: string;
}

export interface FabricationRemedy {
  kind: 'fabrication';
  operation: string;
  laborHours: number;
  note: string;
  /**
   * The kind of shop labor operation this work is (a labor operation's stable `code`, see `FABRICATION_OPERATION_CODES`),
   * when it is one: a quote links the shop's operation (its hazards, torques and checks) by this code only, never by
   * words in `operation`.
   */
  operationCode?: FabricationOperationCode;
}

/** Kinds of fabrication work a shop keeps as labor operations (their `code`). */
export const FABRICATION_OPERATION_CODES = ['crossmember-modify', 'mount-adapters', 'transmission-crossmember'] as const;
export type FabricationOperationCode = (typeof FABRICATION_OPERATION_CODES)[number];

export type Remedy = PartRemedy | PlacementRemedy | FabricationRemedy;

export interface Finding {
  /** Stable id, `group.name`, e.g. `envelope.sump-crossmember`. */
  checkId: string;
  group: CheckGroup;
  title: string;
  status: CheckStatus;
  /** The figure found (null when unknown). */
  measured: number | null;
  /** The figure the rule asks for (a minimum or maximum; see `limit`). */
  required: number | null;
  /** How far inside the limit the measured figure is: positive is good, negative fails. */
  margin: number | null;
  /** `min`: measured must be at least required; `max`: at most; `match`: must equal (margin 0 or −1). */
  limit: 'min' | 'max' | 'match';
  unit: FigureUnit;
  /** One sentence a person understands. */
  message: string;
  /** Inputs that were missing when status is `unknown`. */
  missing: string[];
  remedies: Remedy[];
  /** Where the threshold comes from: a published source or "common practice". */
  thresholdSource: string;
  /** The obstacle or part the check was made against, when there is one. */
  against?: string;
}

export const STATUS_SEVERITY: Record<CheckStatus, number> = { fails: 3, tight: 2, unknown: 1, ok: 0 };
