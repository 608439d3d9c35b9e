import { DEMO_CATALOG, DEMO_SHOP_ID } from '@swapwright/seed-data';
import { createHash } from 'node:crypto';
import type { CatalogKind } from './catalog-kinds';

/** One record of Swapwright's sample catalog: the spec (its `id` is the sample's own) and the fields kept beside it. */
export type SampleCatalogRow = { spec: { id: string; name: string }; extras: Record<string, unknown> };

const plain = (specs: Array<{ id: string; name: string }>): SampleCatalogRow[] => specs.map((spec) => ({ spec, extras: {} }));

/** The invented sample records of each kind (the demo shop's catalog), with their fixed ids. */
const SAMPLE_ROWS: Record<CatalogKind, SampleCatalogRow[]> = {
  engines: plain(DEMO_CATALOG.engines),
  'oil-pans': plain(DEMO_CATALOG.oilPans),
  'oil-pickups': plain(DEMO_CATALOG.oilPickups),
  'oil-pumps': plain(DEMO_CATALOG.oilPumps),
  transmissions: plain(DEMO_CATALOG.transmissions),
  chassis: DEMO_CATALOG.chassis.map((item) => ({ spec: item.spec, extras: { defaultPlacement: item.defaultPlacement } })),
  controllers: plain(DEMO_CATALOG.controllers),
  'mount-adapters': plain(DEMO_CATALOG.mountAdapters),
  'bellhousing-adapters': plain(DEMO_CATALOG.bellhousingAdapters),
  belts: plain(DEMO_CATALOG.belts),
};

/** The invented sample records of one kind (the demo shop's catalog), with their fixed ids. */
export function sampleCatalogRows(kind: CatalogKind): SampleCatalogRow[] {
  return SAMPLE_ROWS[kind];
}

/**
 * The id a sample record gets in a shop's catalog: a name-based UUID (version 5 layout, SHA-1 of the shop id and
 * the sample id), so the same sample record lands on the same row in that shop however often it is copied.
 */
export function sampleIdInShop(shopId: string, sampleId: string): string {
  const bytes = createHash('sha1').update(`swapwright-sample-catalog:${shopId}:${sampleId}`).digest().subarray(0, 16);
  bytes[6] = (bytes[6] & 0x0f) | 0x50;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/**
 * A sample record as it goes into another shop: its own id, and no shelf count (the sample's belts on hand are the
 * demo shop's stock, not theirs, so a belt is named by what it is rather than as the demo shop's stock). The demo
 * shop's catalog is the sample itself, so there it is the record as it stands (already there: nothing to add).
 */
export function sampleRecordForShop(kind: CatalogKind, row: SampleCatalogRow, shopId: string): SampleCatalogRow {
  if (shopId === DEMO_SHOP_ID) return row;
  const id = sampleIdInShop(shopId, row.spec.id);
  const spec: Record<string, unknown> & { id: string; name: string } = { ...row.spec, id };
  if (kind === 'belts') {
    delete spec.stockOnHand;
    spec.name = `${String(spec.designation)} serpentine belt`;
  }
  return { spec, extras: row.extras };
}
