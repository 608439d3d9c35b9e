export type CatalogKind =
  | 'engines'
  | 'oil-pans'
  | 'oil-pickups'
  | 'oil-pumps'
  | 'transmissions'
  | 'chassis'
  | 'controllers'
  | 'mount-adapters'
  | 'bellhousing-adapters'
  | 'belts';

export const catalogKinds: readonly CatalogKind[] = [
  'engines',
  'chassis',
  'transmissions',
  'oil-pans',
  'oil-pickups',
  'oil-pumps',
  'controllers',
  'mount-adapters',
  'bellhousing-adapters',
  'belts',
];

export type CatalogSpec = Record<string, unknown>;

/** One catalog entry: `spec` is the shared fit-spec type of its kind. */
export type CatalogItem<S = CatalogSpec> = {
  id: string;
  name: string;
  spec: S;
  createdAt?: string;
  updatedAt?: string;
};

export type CatalogListQuery = { page: number; pageSize: number; search?: string };

/** The body of a create or update: the spec itself without its id (the server assigns it). */
export type CatalogItemInput = CatalogSpec & { name: string };
