import type { PartCategory } from '../types/finding';

/**
 * Every category of the shop's parts catalog: the categories the fit engine names in its remedies, the
 * kinds that carry a fit spec (engine, transmission), and the rest of what a swap buys.
 */
export const PART_CATEGORIES = [
  'engine',
  'transmission',
  'oil-pan',
  'oil-pickup',
  'oil-pump',
  'windage-tray',
  'dipstick',
  'engine-controller',
  'harness',
  'throttle-pedal',
  'mount-adapter',
  'transmission-mount',
  'transmission-crossmember',
  'bellhousing-adapter',
  'flexplate-flywheel',
  'crank-spacer',
  'pilot-bearing',
  'driveshaft',
  'driveshaft-service',
  'fuel-pump',
  'fuel-regulator',
  'fuel-lines',
  'injector',
  'accessory-drive',
  'belt',
  'tensioner',
  'cam-timing-set',
  'timing-chain-damper',
  'radiator',
  'fan',
  'hoses',
  'exhaust-manifold',
  'exhaust',
  'other',
] as const;

export type CatalogPartCategory = (typeof PART_CATEGORIES)[number];

/** Every category a fit remedy can name is a catalog category. */
const _remedyCategoriesAreCatalogCategories: PartCategory extends CatalogPartCategory ? true : never = true;
void _remedyCategoriesAreCatalogCategories;

export const PART_CATEGORY_LABELS: Record<CatalogPartCategory, string> = {
  engine: 'Engine',
  transmission: 'Transmission',
  'oil-pan': 'Oil pan',
  'oil-pickup': 'Oil pickup',
  'oil-pump': 'Oil pump',
  'windage-tray': 'Windage tray',
  dipstick: 'Dipstick and tube',
  'engine-controller': 'Engine controller',
  harness: 'Wiring harness',
  'throttle-pedal': 'Throttle pedal',
  'mount-adapter': 'Engine mount adapter',
  'transmission-mount': 'Transmission mount',
  'transmission-crossmember': 'Transmission crossmember',
  'bellhousing-adapter': 'Bellhousing adapter',
  'flexplate-flywheel': 'Flexplate or flywheel',
  'crank-spacer': 'Crank spacer',
  'pilot-bearing': 'Pilot bearing',
  driveshaft: 'Driveshaft',
  'driveshaft-service': 'Driveshaft service',
  'fuel-pump': 'Fuel pump',
  'fuel-regulator': 'Fuel pressure regulator',
  'fuel-lines': 'Fuel lines',
  injector: 'Injectors',
  'accessory-drive': 'Accessory drive kit',
  belt: 'Serpentine belt',
  tensioner: 'Belt tensioner',
  'cam-timing-set': 'Timing set',
  'timing-chain-damper': 'Timing-chain damper',
  radiator: 'Radiator',
  fan: 'Fan',
  hoses: 'Coolant hoses',
  'exhaust-manifold': 'Exhaust manifold',
  exhaust: 'Exhaust',
  other: 'Other',
};

/** The shop catalog kind whose fit spec a part of this category may carry (the fit check reads that spec). */
export const FIT_SPEC_KIND_OF_CATEGORY = {
  engine: 'engines',
  transmission: 'transmissions',
  'oil-pan': 'oil-pans',
  'oil-pickup': 'oil-pickups',
  'oil-pump': 'oil-pumps',
  'engine-controller': 'controllers',
  'mount-adapter': 'mount-adapters',
  'bellhousing-adapter': 'bellhousing-adapters',
  belt: 'belts',
} as const satisfies Partial<Record<CatalogPartCategory, string>>;

export type FitSpecKind = (typeof FIT_SPEC_KIND_OF_CATEGORY)[keyof typeof FIT_SPEC_KIND_OF_CATEGORY];

export function fitSpecKindOf(category: CatalogPartCategory): FitSpecKind | null {
  return (FIT_SPEC_KIND_OF_CATEGORY as Partial<Record<CatalogPartCategory, FitSpecKind>>)[category] ?? null;
}

export function isPartCategory(value: unknown): value is CatalogPartCategory {
  return typeof value === 'string' && (PART_CATEGORIES as readonly string[]).includes(value);
}

/** Lower case, trimmed, inner runs of spaces as one: how a typed category is compared. */
const categoryKey = (text: string) => text.trim().replace(/\s+/g, ' ').toLowerCase();

const CATEGORY_BY_TYPED_TEXT: ReadonlyMap<string, CatalogPartCategory> = new Map(
  PART_CATEGORIES.flatMap((category) => [
    [category, category],
    [categoryKey(PART_CATEGORY_LABELS[category]), category],
  ]),
);

/**
 * A category as a person writes it in a file or a box: its name ("Oil pan", "oil PAN ") or its short form
 * ("oil-pan"), without regard to case or surrounding spaces; null when it is neither.
 */
export function partCategoryFromText(text: string): CatalogPartCategory | null {
  return CATEGORY_BY_TYPED_TEXT.get(categoryKey(text)) ?? null;
}
