import type { FabricationOperationCode, FabricationRemedy, PartRemedy } from '../types/finding';
import { describeAttribute, describeAttributeList } from './attribute-words';
import { combineFabricationRemedies } from './fabrication-operations';
import { missedRequirements, type PartAttributes } from './part-attributes';
import { fitSpecKindOf, PART_CATEGORY_LABELS } from './part-categories';
import {
  isPlanSlot,
  PLAN_SLOTS,
  type FittedPart,
  type PlanInput,
  type PlanPart,
  type PlanShortfall,
  type PlanSlot,
} from './plan-types';

/** One binary column of the model. */
export interface PlanColumn {
  name: string;
  kind: 'keep' | 'part' | 'fabrication' | 'unresolved' | 'rule-slack' | 'kit';
  slot: PlanSlot | null;
  part?: PlanPart;
  fitted?: FittedPart;
  operation?: { operation: string; laborHours: number; operationCode?: FabricationOperationCode };
  shortfallIndex?: number;
  ruleId?: string;
  attributes: PartAttributes;
  laborCents: number;
  costCents: number;
  fabricationHours: number;
}

export interface PlanRow {
  name: string;
  terms: Array<[number, number]>;
  sense: '<=' | '>=' | '=';
  rhs: number;
}

/** An agreement between the parts of two slots, by a key computed from each side's attributes. */
export interface AgreementRule {
  id: string;
  a: PlanSlot;
  b: PlanSlot;
  keysA(attributes: PartAttributes): string[] | null;
  keyB(attributes: PartAttributes): string | null;
  /** A newly bought `a` part needs a `b` part that agrees (kept or bought). */
  newANeedsB: boolean;
  /** Attribute names compared, for explanations. */
  attributes: string[];
}

function text(value: unknown): string | null {
  return typeof value === 'string' && value !== '' ? value : null;
}

function joined(attributes: PartAttributes, names: string[]): string | null {
  const values = names.map((name) => text(attributes[name]));
  return values.every((value) => value !== null) ? values.join('|') : null;
}

export const AGREEMENT_RULES: AgreementRule[] = [
  {
    id: 'pan-pickup',
    a: 'oil-pan',
    b: 'oil-pickup',
    keysA: (attrs) => {
      const key = joined(attrs, ['sumpPosition', 'pickupMount']);
      return key ? [key] : null;
    },
    keyB: (attrs) => joined(attrs, ['sumpPosition', 'pickupMount']),
    newANeedsB: true,
    attributes: ['sumpPosition', 'pickupMount'],
  },
  {
    id: 'pickup-pump',
    a: 'oil-pickup',
    b: 'oil-pump',
    keysA: (attrs) => {
      const key = text(attrs.pumpInlet);
      return key ? [key] : null;
    },
    keyB: (attrs) => text(attrs.pumpInlet),
    newANeedsB: true,
    attributes: ['pumpInlet'],
  },
  {
    id: 'pan-windage-tray',
    a: 'oil-pan',
    b: 'windage-tray',
    keysA: (attrs) => {
      const key = joined(attrs, ['railPattern', 'sumpPosition']);
      return key ? [key] : null;
    },
    keyB: (attrs) => joined(attrs, ['railPattern', 'sumpPosition']),
    newANeedsB: false,
    attributes: ['railPattern', 'sumpPosition'],
  },
  {
    id: 'pan-dipstick',
    a: 'oil-pan',
    b: 'dipstick',
    keysA: (attrs) => (Array.isArray(attrs.dipstickProvision) ? attrs.dipstickProvision : null),
    keyB: (attrs) => text(attrs.location),
    newANeedsB: false,
    attributes: ['dipstickProvision', 'location'],
  },
];

/** Categories whose remedies in one finding are needed together, not as alternatives. */
export const KITS: PartRemedy['category'][][] = [['fuel-pump', 'fuel-regulator']];

export interface ResolvableShortfall {
  index: number;
  shortfall: PlanShortfall;
  resolvers: number[];
  partRemedies: PartRemedy[];
}

export interface PlanModel {
  columns: PlanColumn[];
  rows: PlanRow[];
  /** Why a part was left out before solving (unary rules, stock, supersession, missing requirements). */
  filtered: Map<string, string>;
  /** Parts that agree with no part the plan can use in a slot they must agree with. */
  disagreeing: Map<string, string>;
  /** Dominated parts: another part of the slot fits at least as well for no more. */
  dominated: Map<string, string>;
  /** Every catalog part by category (for explanations). */
  byCategory: Map<string, PlanPart[]>;
  shortfalls: ResolvableShortfall[];
  /** Shortfalls the shop wants resolved that no catalog part or operation can resolve. */
  hopeless: Array<{ shortfall: PlanShortfall; partRemedies: PartRemedy[]; reason: string }>;
  /** Shortfalls the shop chose to leave. */
  skipped: PlanShortfall[];
  slotColumns: Map<PlanSlot, number[]>;
  slotExactlyOne: Set<PlanSlot>;
  /** Upper bound of any plan's cost: the weight of one unresolved shortfall. */
  penalty: number;
  /** Fitted parts that break a rule on their own (e.g. a controller that cannot read the engine's signals). */
  refusedFitted: Array<{ slot: PlanSlot; name: string; reason: string }>;
}

export function laborCentsOf(hours: number, rateCents: number): number {
  return Math.round(hours * rateCents);
}

function numberAttr(attributes: PartAttributes, name: string): number {
  const value = attributes[name];
  return typeof value === 'number' && Number.isFinite(value) ? value : 0;
}

/** The figures the target power asks of a fuel pump, from the fuel shortfalls' remedies. */
export function fuelNeed(shortfalls: PlanShortfall[]): { minFlowLph: number; minPressurePsi: number } | null {
  const remedies = shortfalls.flatMap((s) => s.remedies).filter((r): r is PartRemedy => r.kind === 'part' && r.category === 'fuel-pump');
  if (remedies.length === 0) return null;
  return {
    minFlowLph: Math.max(...remedies.map((r) => Number(r.requires.minFlowLph ?? 0))),
    minPressurePsi: Math.max(...remedies.map((r) => Number(r.requires.minPressurePsi ?? 0))),
  };
}

/** A rule that one part must meet on its own (engine, transmission, target power), or null when it does. */
export function unaryRefusal(input: PlanInput, slot: PlanSlot | null, attributes: PartAttributes, fuel: ReturnType<typeof fuelNeed>): string | null {
  const engine = input.engine;
  if ((slot === 'oil-pan' || slot === 'windage-tray') && text(attributes.railPattern) && attributes.railPattern !== engine.railPattern) {
    return `made for the ${String(attributes.railPattern)} pan rail, the engine has ${engine.railPattern}`;
  }
  if (slot === 'engine-controller') {
    const crank = attributes.crankSignals;
    const cam = attributes.camSignals;
    if (Array.isArray(crank) && !crank.includes(engine.crankSignal)) return `cannot read the engine's ${engine.crankSignal} crank signal (reads ${crank.join(', ') || 'none'})`;
    if (Array.isArray(cam) && !cam.includes(engine.camSignal)) return `cannot read the engine's ${engine.camSignal} cam signal (reads ${cam.join(', ') || 'none'})`;
    const throttles = attributes.throttles;
    if (Array.isArray(throttles) && throttles.length > 0 && !throttles.includes(engine.throttle)) return `does not drive ${engine.throttle === 'electronic' ? 'an' : 'a'} ${engine.throttle} throttle`;
    if (typeof attributes.maxCylinders === 'number' && attributes.maxCylinders < engine.cylinders) return `runs at most ${attributes.maxCylinders} cylinders, the engine has ${engine.cylinders}`;
  }
  if (slot === 'bellhousing-adapter') {
    if (text(attributes.enginePattern) && attributes.enginePattern !== engine.bellPattern) return `fits the ${String(attributes.enginePattern)} bell pattern, the engine has ${engine.bellPattern}`;
    const transmission = input.transmissionBellPattern;
    if (transmission && text(attributes.transmissionPattern) && attributes.transmissionPattern !== transmission) {
      return `takes the ${String(attributes.transmissionPattern)} transmission pattern, the transmission has ${transmission}`;
    }
  }
  if (slot === 'fuel-pump' && fuel) {
    const flow = numberAttr(attributes, 'flowLph');
    const pressure = numberAttr(attributes, 'pressurePsi');
    if (flow < fuel.minFlowLph) return `delivers ${flow} L/h, the target power needs ${fuel.minFlowLph} L/h`;
    if (pressure < fuel.minPressurePsi) return `is rated for ${pressure} psi, the engine's injection needs ${fuel.minPressurePsi} psi`;
  }
  return null;
}

/** Resolves a remedy: parts carrying a fit spec the fit engine found clearing, or parts whose attributes meet the requirement. */
export function partMeetsRemedy(part: PlanPart, remedy: PartRemedy): boolean {
  if (part.category !== remedy.category) return false;
  // A part carrying a fit spec was judged by the fit engine itself: only the ones it named resolve.
  if (fitSpecKindOf(part.category) && part.fitSpecId) return remedy.partIds.includes(part.fitSpecId);
  return Object.keys(remedy.requires).length > 0 && missedRequirements(part.attributes, remedy.requires).length === 0;
}

/** What a part remedy asks for, as one readable line: "Oil pan: sump at the rear, pickup bolted to the pump". */
export function describeRemedyNeed(remedy: PartRemedy): string {
  const needs = describeAttributeList(Object.entries(remedy.requires));
  return `${PART_CATEGORY_LABELS[remedy.category]}${needs ? `: ${needs}` : ''}`;
}

/** The named attributes of a part in plain words ("sump at the rear, pickup bolted to the pump"). */
export function describeAttributes(attributes: PartAttributes, names: string[]): string {
  return describeAttributeList(names.filter((name) => attributes[name] !== undefined).map((name) => [name, attributes[name]]));
}

function fittedWithEngineDipstick(input: PlanInput): Partial<Record<PlanSlot, FittedPart>> {
  const fitted = { ...input.fitted };
  if (!fitted.dipstick) fitted.dipstick = { name: `the engine's ${describeAttribute('location', input.engine.dipstickLocation)}`, attributes: { location: input.engine.dipstickLocation } };
  return fitted;
}

/**
 * Builds the plan's binary model: one column per kept part, catalog candidate and fabrication operation; one
 * choice row per slot, agreement rows per key, `requires` and `excludes` rows, and a covering row per shortfall
 * with an `unresolved` column whose weight is larger than any plan's cost.
 */
export function buildPlanModel(input: PlanInput, options: { ruleSlack?: boolean } = {}): PlanModel {
  const wanted = input.resolve ? new Set(input.resolve) : null;
  const targeted = input.shortfalls.filter((s) => !wanted || wanted.has(s.checkId));
  const skipped = input.shortfalls.filter((s) => wanted && !wanted.has(s.checkId));
  const fuel = fuelNeed(input.shortfalls);
  const fitted = fittedWithEngineDipstick(input);
  const filtered = new Map<string, string>();
  const dominated = new Map<string, string>();
  const disagreeing = new Map<string, string>();

  const remediesOf = (s: PlanShortfall) => ({
    parts: s.remedies.filter((r): r is PartRemedy => r.kind === 'part'),
    fabrication: s.remedies.filter((r): r is FabricationRemedy => r.kind === 'fabrication'),
  });
  const remedyCategories = new Set<string>();
  for (const s of targeted) for (const r of remediesOf(s).parts) remedyCategories.add(r.category);

  // Slots in play: a remedy names them, or an agreement ties them to one that is.
  const inPlay = new Set<PlanSlot>(PLAN_SLOTS.filter((slot) => remedyCategories.has(slot) || fitted[slot] !== undefined));
  for (let changed = true; changed; ) {
    changed = false;
    for (const rule of AGREEMENT_RULES) {
      if (inPlay.has(rule.a) && !inPlay.has(rule.b)) {
        inPlay.add(rule.b);
        changed = true;
      }
    }
  }

  // One pass over the catalog: SKUs, supersession, which SKUs the rules name, and the parts by category.
  const bySku = new Map<string, PlanPart>();
  const replacedBy = new Map<string, PlanPart>();
  const requiredSkus = new Set<string>();
  const excludedSkus = new Set<string>();
  const byCategory = new Map<string, PlanPart[]>();
  for (const part of input.parts) {
    if (part.replaces.length > 0) for (const sku of part.replaces) replacedBy.set(sku, part);
    if (part.requires.length > 0) for (const sku of part.requires) requiredSkus.add(sku);
    if (part.excludes.length > 0) for (const sku of part.excludes) excludedSkus.add(sku);
    const same = byCategory.get(part.category);
    if (same) same.push(part);
    else byCategory.set(part.category, [part]);
  }
  // Only the SKUs a rule names are ever looked up.
  if (requiredSkus.size > 0) for (const part of input.parts) if (requiredSkus.has(part.sku)) bySku.set(part.sku, part);

  const fittedSpecIds = new Set(Object.values(fitted).map((f) => f?.fitSpecId).filter((id): id is string => !!id));
  const eligible = new Map<string, PlanPart>();
  // Supersession, the rules a part must meet on its own, and stock: why a part cannot be used at all.
  const ruleOrStockRefusal = (part: PlanPart, slot: PlanSlot | null): string | null =>
    unaryRefusal(input, slot, part.attributes, fuel) ??
    (part.fitSpecId ? input.clearanceRefusals?.[part.fitSpecId] : undefined) ??
    (input.objective === 'in-stock' && part.available < 1 ? 'not in stock now' : null);
  const ownRefusal = (part: PlanPart, slot: PlanSlot | null): string | null => {
    const superseding = replacedBy.get(part.sku);
    if (superseding && superseding.id !== part.id) return `superseded by ${superseding.sku}`;
    return ruleOrStockRefusal(part, slot);
  };
  for (const [category, parts] of byCategory) {
    const slot = isPlanSlot(category) ? category : null;
    if (slot ? !inPlay.has(slot) : !remedyCategories.has(category)) continue;
    for (const part of parts) {
      if (slot && part.fitSpecId && fittedSpecIds.has(part.fitSpecId) && fitted[slot]?.fitSpecId === part.fitSpecId) {
        filtered.set(part.id, 'already fitted: kept at no cost');
        continue;
      }
      const refusal = ownRefusal(part, slot);
      if (refusal) filtered.set(part.id, refusal);
      else eligible.set(part.id, part);
    }
  }
  // Parts that `requires` brings in, whatever their category.
  const queue = [...eligible.values()].filter((part) => part.requires.length > 0);
  while (queue.length > 0) {
    const part = queue.pop()!;
    for (const sku of part.requires) {
      const needed = bySku.get(sku);
      if (!needed || eligible.has(needed.id) || filtered.has(needed.id)) continue;
      const slot = isPlanSlot(needed.category) ? needed.category : null;
      const refusal = ruleOrStockRefusal(needed, slot);
      if (refusal) {
        filtered.set(needed.id, refusal);
        continue;
      }
      if (slot) inPlay.add(slot);
      eligible.set(needed.id, needed);
      if (needed.requires.length > 0) queue.push(needed);
    }
  }

  // Fitted parts the plan may keep: in play and meeting the rules on their own.
  const keptFitted = new Map<PlanSlot, FittedPart>();
  const refusedFitted: PlanModel['refusedFitted'] = [];
  for (const slot of PLAN_SLOTS) {
    const part = fitted[slot];
    if (!part || !inPlay.has(slot)) continue;
    const refusal = unaryRefusal(input, slot, part.attributes, fuel);
    // A fitted part that breaks a rule must go: the slot takes exactly one replacement when the catalog has one.
    if (refusal) refusedFitted.push({ slot, name: part.name, reason: refusal });
    else keptFitted.set(slot, part);
  }

  // Which shortfalls each part resolves.
  const targetedInfo = targeted.map((shortfall) => ({ shortfall, ...remediesOf(shortfall) }));
  const resolvesOf = (part: PlanPart): number[] =>
    remedyCategories.has(part.category)
      ? targetedInfo.flatMap((info, index) => (info.parts.some((remedy) => partMeetsRemedy(part, remedy)) ? [index] : []))
      : [];

  // Dominance: in a slot, among parts with the same agreement keys, a part is dropped when another costs no more,
  // resolves every shortfall it resolves (and, for the fewest-fabrication plan, needs no more fabrication hours),
  // and carries no rules of its own. A part another part requires always stays.
  const rate = input.laborRateCents;
  const costOf = (part: PlanPart) => part.priceCents + laborCentsOf(part.laborHours, rate);
  const fabricationOf = (part: PlanPart) => (input.objective === 'least-fabrication' ? numberAttr(part.attributes, 'fabricationHours') : 0);
  const free = (part: PlanPart) => part.requires.length === 0 && part.excludes.length === 0 && !excludedSkus.has(part.sku);
  const groups = new Map<string, PlanPart[]>();
  for (const part of eligible.values()) {
    const slot = isPlanSlot(part.category) ? part.category : null;
    if (!slot) continue;
    let signature: string = slot;
    for (const rule of AGREEMENT_RULES) {
      if (rule.a === slot) signature += `#${(rule.keysA(part.attributes) ?? []).join('/')}`;
      if (rule.b === slot) signature += `#${rule.keyB(part.attributes) ?? ''}`;
    }
    const group = groups.get(signature);
    if (group) group.push(part);
    else groups.set(signature, [part]);
  }
  for (const group of groups.values()) {
    if (group.length < 2) continue;
    const ranked = group
      .map((part) => ({ part, cost: costOf(part), fabrication: fabricationOf(part), resolves: resolvesOf(part) }))
      .sort((a, b) => a.cost - b.cost || a.fabrication - b.fabrication || (a.part.sku < b.part.sku ? -1 : a.part.sku > b.part.sku ? 1 : 0));
    const leaders: typeof ranked = [];
    for (const entry of ranked) {
      const leader = requiredSkus.has(entry.part.sku)
        ? undefined
        : leaders.find((l) => l.fabrication <= entry.fabrication && entry.resolves.every((s) => l.resolves.includes(s)));
      if (leader) {
        eligible.delete(entry.part.id);
        dominated.set(entry.part.id, `fits no better than ${leader.part.sku}, which costs ${leader.cost < entry.cost ? 'less' : 'the same'}`);
      } else if (free(entry.part)) {
        leaders.push(entry);
      }
    }
  }

  // Prune until nothing changes: a part whose every required SKU is out of the model, and a part that agrees with
  // no part the plan can use in a slot it must agree with (a pickup no pan takes, a pan no pickup fits), cannot be chosen.
  const keptSkus = new Set([...keptFitted.values()].map((f) => f.sku).filter((sku): sku is string => !!sku));
  const label = (slot: PlanSlot) => PART_CATEGORY_LABELS[slot].toLowerCase();
  for (let changed = true; changed; ) {
    changed = false;
    const eligibleSkus = new Set([...eligible.values()].map((part) => part.sku));
    for (const part of eligible.values()) {
      if (part.requires.length === 0 || part.requires.some((sku) => keptSkus.has(sku) || eligibleSkus.has(sku))) continue;
      eligible.delete(part.id);
      const sku = part.requires[0];
      filtered.set(part.id, `needs ${part.requires.join(' or ')}, and ${bySku.has(sku) ? `${sku} ${filtered.get(bySku.get(sku)!.id) ?? disagreeing.get(bySku.get(sku)!.id) ?? 'cannot be used'}` : `${sku} is not in the catalog`}`);
      changed = true;
    }
    for (const rule of AGREEMENT_RULES) {
      const aValues = new Set<string>();
      const bValues = new Set<string>();
      const keptA = keptFitted.get(rule.a);
      const keptB = keptFitted.get(rule.b);
      for (const key of keptA ? rule.keysA(keptA.attributes) ?? [] : []) aValues.add(key);
      const keptKeyB = keptB ? rule.keyB(keptB.attributes) : null;
      if (keptKeyB !== null) bValues.add(keptKeyB);
      for (const part of eligible.values()) {
        if (part.category === rule.a) for (const key of rule.keysA(part.attributes) ?? []) aValues.add(key);
        if (part.category === rule.b) {
          const key = rule.keyB(part.attributes);
          if (key !== null) bValues.add(key);
        }
      }
      for (const part of eligible.values()) {
        let reason: string | null = null;
        if (part.category === rule.b) {
          const key = rule.keyB(part.attributes);
          if (key !== null && !aValues.has(key)) reason = `does not agree with any ${label(rule.a)} the plan can use (${describeAttributes(part.attributes, rule.attributes)})`;
        }
        if (rule.newANeedsB && part.category === rule.a && (rule.keysA(part.attributes) ?? []).some((key) => !bValues.has(key))) {
          reason = `no ${label(rule.b)} the plan can use agrees with it (${describeAttributes(part.attributes, rule.attributes)})`;
        }
        if (!reason) continue;
        eligible.delete(part.id);
        disagreeing.set(part.id, reason);
        changed = true;
      }
    }
  }

  const columns: PlanColumn[] = [];
  const add = (column: Omit<PlanColumn, 'name'>): number => {
    columns.push({ ...column, name: `c${columns.length}` });
    return columns.length - 1;
  };
  const slotColumns = new Map<PlanSlot, number[]>();
  const pushSlot = (slot: PlanSlot, index: number) => slotColumns.set(slot, [...(slotColumns.get(slot) ?? []), index]);
  const slotExactlyOne = new Set<PlanSlot>();
  for (const [slot, part] of keptFitted) {
    pushSlot(slot, add({ kind: 'keep', slot, fitted: part, attributes: part.attributes, laborCents: 0, costCents: 0, fabricationHours: 0 }));
    slotExactlyOne.add(slot);
  }
  const partColumn = new Map<string, number>();
  for (const part of eligible.values()) {
    const slot = isPlanSlot(part.category) ? part.category : null;
    const laborCents = laborCentsOf(part.laborHours, rate);
    const fabricationHours = numberAttr(part.attributes, 'fabricationHours');
    const index = add({ kind: 'part', slot, part, attributes: part.attributes, laborCents, costCents: part.priceCents + laborCents, fabricationHours });
    partColumn.set(part.id, index);
    if (slot) pushSlot(slot, index);
  }
  for (const refused of refusedFitted) if ((slotColumns.get(refused.slot) ?? []).length > 0) slotExactlyOne.add(refused.slot);
  // One column per fabrication operation: remedies of one operation code for several shortfalls are one operation.
  const fabrication = combineFabricationRemedies(targetedInfo.map((info) => info.fabrication));
  const operationColumns = fabrication.operations.map((operation) => {
    const laborCents = laborCentsOf(operation.laborHours, rate);
    return add({
      kind: 'fabrication',
      slot: null,
      operation: { operation: operation.operation, laborHours: operation.laborHours, ...(operation.operationCode && { operationCode: operation.operationCode }) },
      attributes: {},
      laborCents,
      costCents: laborCents,
      fabricationHours: operation.laborHours,
    });
  });

  const rows: PlanRow[] = [];
  const row = (name: string, terms: Array<[number, number]>, sense: PlanRow['sense'], rhs: number) => rows.push({ name, terms, sense, rhs });

  // One part per slot: exactly one where a part is fitted (keep or replace), at most one elsewhere.
  for (const [slot, indices] of slotColumns) {
    if (indices.length === 0) continue;
    row(`slot_${slot}`, indices.map((i) => [1, i]), slotExactlyOne.has(slot) ? '=' : '<=', 1);
  }

  // Agreements, aggregated per key value (a slot holds at most one part, so the sums are 0 or 1).
  const agreementRows = (rule: AgreementRule, slack: boolean) => {
    const aCols = slotColumns.get(rule.a) ?? [];
    const bCols = slotColumns.get(rule.b) ?? [];
    const keysA = new Map<number, string[]>();
    for (const i of aCols) keysA.set(i, columns[i].attributes ? rule.keysA(columns[i].attributes) ?? [] : []);
    const keyB = new Map<number, string | null>();
    for (const i of bCols) keyB.set(i, rule.keyB(columns[i].attributes));
    const bValues = new Set([...keyB.values()].filter((k): k is string => k !== null));
    for (const value of bValues) {
      const terms: Array<[number, number]> = [];
      for (const i of bCols) if (keyB.get(i) === value) terms.push([1, i]);
      for (const i of aCols) if (keysA.get(i)!.includes(value)) terms.push([-1, i]);
      if (slack) terms.push([-1, add({ kind: 'rule-slack', slot: null, ruleId: rule.id, attributes: {}, laborCents: 0, costCents: 0, fabricationHours: 0 })]);
      row(`agree_${rule.id}_b_${rows.length}`, terms, '<=', 0);
    }
    if (!rule.newANeedsB) return;
    const aValues = new Set<string>();
    for (const i of aCols) if (columns[i].kind === 'part') for (const k of keysA.get(i)!) aValues.add(k);
    for (const value of aValues) {
      const terms: Array<[number, number]> = [];
      for (const i of aCols) if (columns[i].kind === 'part' && keysA.get(i)!.includes(value)) terms.push([1, i]);
      for (const i of bCols) if (keyB.get(i) === value) terms.push([-1, i]);
      if (slack) terms.push([-1, add({ kind: 'rule-slack', slot: null, ruleId: rule.id, attributes: {}, laborCents: 0, costCents: 0, fabricationHours: 0 })]);
      row(`agree_${rule.id}_a_${rows.length}`, terms, '<=', 0);
    }
  };
  for (const rule of AGREEMENT_RULES) agreementRows(rule, !!options.ruleSlack);

  // requires: a chosen part needs one of its listed SKUs (a kept part with that SKU counts).
  const columnsBySku = new Map<string, number[]>();
  columns.forEach((column, index) => {
    const sku = column.part?.sku ?? column.fitted?.sku;
    if (sku) columnsBySku.set(sku, [...(columnsBySku.get(sku) ?? []), index]);
  });
  for (const part of eligible.values()) {
    if (part.requires.length === 0) continue;
    const supporters = part.requires.flatMap((sku) => columnsBySku.get(sku) ?? []);
    row(`requires_${partColumn.get(part.id)}`, [[1, partColumn.get(part.id)!], ...supporters.map((i): [number, number] => [-1, i])], '<=', 0);
  }
  // excludes: the two never together.
  const excluded = new Set<string>();
  for (const part of eligible.values()) {
    for (const sku of part.excludes) {
      for (const other of columnsBySku.get(sku) ?? []) {
        const a = partColumn.get(part.id)!;
        const key = [Math.min(a, other), Math.max(a, other)].join('-');
        if (a === other || excluded.has(key)) continue;
        excluded.add(key);
        row(`excludes_${key}`, [[1, a], [1, other]], '<=', 1);
      }
    }
  }

  // Covering rows: each wanted shortfall is resolved by a part or an operation, or marked unresolved.
  const shortfalls: ResolvableShortfall[] = [];
  const hopeless: PlanModel['hopeless'] = [];
  targetedInfo.forEach((info, index) => {
    const meeting = (remedy: PartRemedy) =>
      [...eligible.values()].filter((part) => partMeetsRemedy(part, remedy)).map((part) => partColumn.get(part.id)!);
    // Remedies of a kit's categories are needed together (a pump and its regulator); the others are alternatives.
    const kit = KITS.find((categories) => categories.every((category) => info.parts.some((r) => r.category === category)));
    const single = info.parts.filter((remedy) => !kit?.includes(remedy.category));
    const kitGroups = kit ? kit.map((category) => info.parts.filter((r) => r.category === category).flatMap(meeting)) : [];
    const cover = [...single.flatMap(meeting), ...fabrication.coveredBy[index].map((operation) => operationColumns[operation])];
    if (kit && kitGroups.every((group) => group.length > 0)) {
      const both = add({ kind: 'kit', slot: null, attributes: {}, laborCents: 0, costCents: 0, fabricationHours: 0 });
      for (const group of kitGroups) row(`kit_${both}`, [[1, both], ...group.map((i): [number, number] => [-1, i])], '<=', 0);
      cover.push(both);
    }
    const resolvers = [...new Set([...cover.filter((i) => columns[i].kind !== 'kit'), ...(cover.some((i) => columns[i].kind === 'kit') ? kitGroups.flat() : [])])];
    if (cover.length === 0) {
      // A part the fit engine left out where the engine sits (a pan into the crossmember) is named with its reason too.
      const refusedHere = (part: PlanPart, remedy: PartRemedy) =>
        !!part.fitSpecId && !!input.clearanceRefusals?.[part.fitSpecId] && Object.keys(remedy.requires).length > 0 && missedRequirements(part.attributes, remedy.requires).length === 0;
      const blocked = info.parts.flatMap((remedy) =>
        (byCategory.get(remedy.category) ?? []).filter((part) => partMeetsRemedy(part, remedy) || refusedHere(part, remedy)),
      );
      const reason =
        info.parts.length === 0 && info.fabrication.length === 0
          ? 'no part or fabrication remedy: see the placement changes in the fit report'
          : blocked.length > 0
            ? `the catalog's candidates cannot be used: ${blocked.slice(0, 3).map((part) => `${part.sku} ${filtered.get(part.id) ?? disagreeing.get(part.id) ?? dominated.get(part.id) ?? 'is refused by a rule'}`).join('; ')}`
            : 'no catalog part meets it';
      hopeless.push({ shortfall: info.shortfall, partRemedies: info.parts, reason });
      return;
    }
    const unresolved = add({ kind: 'unresolved', slot: null, shortfallIndex: shortfalls.length, attributes: {}, laborCents: 0, costCents: 0, fabricationHours: 0 });
    row(`resolve_${index}`, [...cover.map((i): [number, number] => [1, i]), [1, unresolved]], '>=', 1);
    shortfalls.push({ index: shortfalls.length, shortfall: info.shortfall, resolvers, partRemedies: info.parts });
  });

  // The weight of one unresolved shortfall: above any plan's cost (the dearest choice in every slot, plus everything else).
  let bound = 0;
  const slotMax = new Map<PlanSlot, number>();
  for (const column of columns) {
    if (column.slot) slotMax.set(column.slot, Math.max(slotMax.get(column.slot) ?? 0, column.costCents));
    else bound += column.costCents;
  }
  for (const value of slotMax.values()) bound += value;
  return { columns, rows, filtered, disagreeing, dominated, byCategory, shortfalls, hopeless, skipped, slotColumns, slotExactlyOne, penalty: bound + 1, refusedFitted };
}

function formatTerms(terms: Array<[number, string]>): string {
  if (terms.length === 0) return '0 c_zero';
  const parts: string[] = [];
  terms.forEach(([coef, name], i) => {
    const sign = coef < 0 ? '-' : '+';
    const magnitude = Math.abs(coef);
    parts.push(i === 0 && sign === '+' ? `${magnitude} ${name}` : `${sign} ${magnitude} ${name}`);
  });
  // LP lines are kept short: a term list may continue on the next line.
  const lines: string[] = [];
  for (let i = 0; i < parts.length; i += 40) lines.push(parts.slice(i, i + 40).join(' '));
  return lines.join('\n ');
}

function rowLines(model: Pick<PlanModel, 'columns'>, rows: PlanRow[], from: number): string[] {
  // Row names stay plain (r0, r1, ...): LP readers refuse some characters in names.
  return rows.map((r, k) => ` r${from + k}: ${formatTerms(r.terms.map(([coef, i]) => [coef, model.columns[i].name]))} ${r.sense} ${r.rhs}`);
}

/** The constraint rows and the Binary section of a model as LP text, written once per model and reused by each solve. */
const lpTextOfModel = new WeakMap<object, { rows: string; binary: string; usesZero: boolean }>();

function modelText(model: Pick<PlanModel, 'columns' | 'rows'>): { rows: string; binary: string; usesZero: boolean } {
  const cached = lpTextOfModel.get(model);
  if (cached) return cached;
  const names = model.columns.map((c) => c.name);
  const binary: string[] = [];
  for (let i = 0; i < names.length; i += 40) binary.push(` ${names.slice(i, i + 40).join(' ')}`);
  const text = {
    rows: rowLines(model, model.rows, 0).join('\n'),
    binary: binary.join('\n'),
    usesZero: model.columns.length === 0 || model.rows.some((r) => r.terms.length === 0),
  };
  lpTextOfModel.set(model, text);
  return text;
}

/** The model as CPLEX LP text with a Binary section, for a MIP solver. */
export function toLpText(model: Pick<PlanModel, 'columns' | 'rows'>, objective: number[], extraRows: PlanRow[] = []): string {
  const text = modelText(model);
  const out: string[] = ['Minimize', ` obj: ${formatTerms(model.columns.map((c, i) => [objective[i] ?? 0, c.name]))}`, 'Subject To'];
  if (text.rows) out.push(text.rows);
  out.push(...rowLines(model, extraRows, model.rows.length));
  out.push('Bounds');
  if (text.usesZero || extraRows.some((r) => r.terms.length === 0)) out.push(' c_zero = 0');
  out.push('Binary');
  if (text.binary) out.push(text.binary);
  out.push('End');
  return out.join('\n');
}
