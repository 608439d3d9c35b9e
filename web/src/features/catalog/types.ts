export { CATALOG_KIND_NAMES as catalogKinds, type CatalogKind } from '@swapwright/shared';

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
