import { placeEnginePoint } from '../../geometry/placement';
import type { Finding, Remedy } from '../../types/finding';
import type { ChassisPoint3, FitSpec, MountAdapterSpec, SideName } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition, FindingFields } from '../check-definition';
import { measuredFinding, statusFromMargin, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE } from '../envelope/envelope-common';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export interface MountOffset {
  side: SideName;
  boss: ChassisPoint3;
  pad: ChassisPoint3;
  /** pad − placed boss, chassis frame. */
  dx: number;
  dy: number;
  dz: number;
  /** Straight-line offset. */
  distance: number;
}

/** The engine's mount boss on one side after placement (y = v: the engine sits on the vehicle centreline). */
export function mountOffset(spec: FitSpec, side: SideName): MountOffset {
  const b = spec.engine.mountBosses[side];
  const p = placeEnginePoint({ u: b.u, w: b.w }, spec.placement);
  const boss = { x: p.x, y: b.v, z: p.z };
  const pad = spec.chassis.mountPads[side];
  const dx = pad.x - boss.x;
  const dy = pad.y - boss.y;
  const dz = pad.z - boss.z;
  return { side, boss, pad, dx, dy, dz, distance: Math.hypot(dx, dy, dz) };
}

export function adapterCovers(adapter: MountAdapterSpec, o: Pick<MountOffset, 'dx' | 'dy' | 'dz'>): boolean {
  return Math.abs(o.dx) <= adapter.maxDxMm && Math.abs(o.dy) <= adapter.maxDyMm && Math.abs(o.dz) <= adapter.maxDzMm;
}

/** Adapters that bridge the offset, cheapest first, then the smallest (the closest fit). */
export function coveringAdapters(spec: FitSpec, o: MountOffset): MountAdapterSpec[] {
  return (spec.candidates?.mountAdapters ?? [])
    .filter((a) => adapterCovers(a, o))
    .sort((a, b) => (a.price ?? Infinity) - (b.price ?? Infinity) || a.maxDxMm + a.maxDyMm + a.maxDzMm - (b.maxDxMm + b.maxDyMm + b.maxDzMm));
}

function describe(o: MountOffset): string {
  const part = (v: number, plus: string, minus: string): string => `${mmWithInches(Math.abs(v))} ${v >= 0 ? plus : minus}`;
  return `${part(o.dx, 'rearward', 'forward')}, ${part(o.dz, 'up', 'down')}, ${part(o.dy, 'to the right', 'to the left')}`;
}

export interface AdapterAxisSlack {
  axis: 'dx' | 'dz' | 'dy';
  /** Plain words for the axis in messages. */
  words: string;
  /** |offset| along the axis. */
  offsetMm: number;
  /** The adapter's reach along the axis. */
  limitMm: number;
  /** limit − |offset|: negative where the offset is too large for the adapter. */
  slackMm: number;
}

/** The adapter's slack on each axis, tightest first (the most negative when it does not cover). */
export function adapterSlack(adapter: MountAdapterSpec, o: Pick<MountOffset, 'dx' | 'dy' | 'dz'>): AdapterAxisSlack[] {
  const axes: Array<[AdapterAxisSlack['axis'], string, number]> = [
    ['dx', 'fore-aft', adapter.maxDxMm],
    ['dz', 'vertical', adapter.maxDzMm],
    ['dy', 'sideways', adapter.maxDyMm],
  ];
  return axes
    .map(([axis, words, limitMm]) => ({ axis, words, offsetMm: Math.abs(o[axis]), limitMm, slackMm: limitMm - Math.abs(o[axis]) }))
    .sort((a, b) => a.slackMm - b.slackMm);
}

/** Catalog adapters that cover the offset (a part remedy), then fabrication. */
function mountRemedies(spec: FitSpec, settings: CheckContext['settings'], o: MountOffset, adapters: MountAdapterSpec[]): Remedy[] {
  const remedies: Remedy[] = [];
  if (adapters.length) {
    const need = { maxDxMm: Math.ceil(Math.abs(o.dx)), maxDzMm: Math.ceil(Math.abs(o.dz)), maxDyMm: Math.ceil(Math.abs(o.dy)) };
    remedies.push({
      kind: 'part',
      category: 'mount-adapter',
      requires: need,
      partIds: adapters.map((a) => a.id),
      note: `A mount adapter that covers ${describe(o)}.`,
    });
  }
  remedies.push({
    kind: 'fabrication',
    operation: `Fabricate and weld ${o.side} engine mount brackets`,
    laborHours: settings.mountFabricationHours,
    operationCode: 'mount-adapters',
    note: 'Support the engine on a hoist or stand while fitting, never work under a hanging engine, and have frame welding done by a qualified welder.',
  });
  return remedies;
}

export function runEngineMount({ spec, settings }: CheckContext, side: SideName): Finding {
  const fields = {
    checkId: `mounts.engine-mount-${side}`,
    group: 'mounts' as const,
    title: `Engine mount, ${side} side`,
    unit: 'mm' as const,
    limit: 'max' as const,
    thresholdSource: `${COMMON_PRACTICE}: slotted holes and rubber isolators take up about ${mmWithInches(settings.mountDirectFitToleranceMm)} (the shop's direct-fit tolerance for mounts).`,
    against: `mount-pad-${side}`,
  };
  const missing: string[] = [];
  if (!spec.engine.mountBosses?.[side]) missing.push(`engine.mountBosses.${side}`);
  if (!spec.chassis.mountPads?.[side]) missing.push(`chassis.mountPads.${side}`);
  if (missing.length) return unknownFinding(fields, missing);
  const o = mountOffset(spec, side);
  if (spec.mountAdapterId !== undefined) return runWithChosenAdapter(spec, settings, fields, o);
  const required = settings.mountDirectFitToleranceMm;
  const margin = required - o.distance;
  const status = margin >= 0 ? 'ok' : 'fails';
  let remedies: Remedy[] = [];
  let message: string;
  if (status === 'ok') {
    message = `The ${side} engine mount boss lands ${mmWithInches(o.distance)} from the chassis pad, ${describe(o)}; it bolts up directly, since up to ${mmWithInches(required)} is taken up.`;
  } else {
    // Blocked as chosen: without an adapter the mount does not bolt up. A catalog adapter that would bridge the
    // offset is a way out (its remedy), not the state of the build, so the sentence says it would, once chosen.
    const adapters = coveringAdapters(spec, o);
    message = `The chassis pad sits ${describe(o)} of the ${side} engine mount boss, ${mmWithInches(o.distance)} in all, ${mmWithInches(-margin)} more than the ${mmWithInches(required)} the mounts take up, so it does not bolt up directly; ${
      adapters.length
        ? `choose a mount adapter: the catalog's ${adapters[0].name} would cover that offset.`
        : 'no listed adapter covers that offset, so the mounts must be fabricated.'
    }`;
    remedies = mountRemedies(spec, settings, o, adapters);
  }
  return measuredFinding(fields, { measured: o.distance, required, margin, status }, message, remedies);
}

/**
 * With an adapter chosen, the figure is the tightest axis: its offset against the adapter's reach there.
 * Tight within the tight band of that reach; fails on the axis whose offset is past it.
 */
function runWithChosenAdapter(spec: FitSpec, settings: CheckContext['settings'], fields: FindingFields, o: MountOffset): Finding {
  const adapter = (spec.candidates?.mountAdapters ?? []).find((a) => a.id === spec.mountAdapterId);
  if (!adapter) {
    return unknownFinding(fields, ['mountAdapter'], `Cannot check ${fields.title.toLowerCase()}: the chosen mount adapter "${spec.mountAdapterId}" is not among the catalog's mount adapters.`);
  }
  const [tightest] = adapterSlack(adapter, o);
  const status = statusFromMargin(tightest.slackMm, settings.tightBandMm);
  const figures = { measured: tightest.offsetMm, required: tightest.limitMm, margin: tightest.slackMm, status };
  const offset = `the chassis pad sits ${describe(o)} of the ${o.side} engine mount boss, ${mmWithInches(o.distance)} in all`;
  if (status !== 'fails') {
    const reach = `${mmWithInches(adapter.maxDxMm)} fore-aft, ${mmWithInches(adapter.maxDzMm)} vertical and ${mmWithInches(adapter.maxDyMm)} sideways`;
    const message = `The chosen adapter ${adapter.name} takes up the ${o.side} offset: ${offset}, within its reach of ${reach}; tightest ${tightest.words}: ${marginWords(tightest.slackMm, mmWithInches, 'max')}.`;
    // Tight: name only roomier adapters (clear of the tight band on every axis); fabrication is not needed.
    const roomier = coveringAdapters(spec, o).filter((a) => a.id !== adapter.id && adapterSlack(a, o)[0].slackMm >= settings.tightBandMm);
    return measuredFinding(fields, figures, message, roomier.length ? mountRemedies(spec, settings, o, roomier).slice(0, 1) : []);
  }
  const adapters = coveringAdapters(spec, o);
  const message = `The chosen adapter ${adapter.name} does not cover the ${o.side} offset: the ${tightest.words} offset of ${mmWithInches(tightest.offsetMm)} is ${mmWithInches(-tightest.slackMm)} past its ${mmWithInches(tightest.limitMm)} reach (${offset}); ${
    adapters.length ? `the catalog's ${adapters[0].name} would cover it instead.` : 'no listed adapter covers that offset, so the mounts must be fabricated.'
  }`;
  return measuredFinding(fields, figures, message, mountRemedies(spec, settings, o, adapters));
}

export const ENGINE_MOUNT_LEFT_CHECK: CheckDefinition = {
  id: 'mounts.engine-mount-left',
  group: 'mounts',
  title: 'Engine mount, left side',
  dependsOnPlacement: true,
  run: (c) => runEngineMount(c, 'left'),
};

export const ENGINE_MOUNT_RIGHT_CHECK: CheckDefinition = {
  id: 'mounts.engine-mount-right',
  group: 'mounts',
  title: 'Engine mount, right side',
  dependsOnPlacement: true,
  run: (c) => runEngineMount(c, 'right'),
};

export const MOUNT_CHECKS: CheckDefinition[] = [ENGINE_MOUNT_LEFT_CHECK, ENGINE_MOUNT_RIGHT_CHECK];
