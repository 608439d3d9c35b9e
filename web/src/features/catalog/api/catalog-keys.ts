import type { CatalogKind, CatalogListQuery } from '../types';

export const catalogKeys = {
  all: ['catalog'] as const,
  kind: (kind: CatalogKind) => [...catalogKeys.all, kind] as const,
  lists: (kind: CatalogKind) => [...catalogKeys.kind(kind), 'list'] as const,
  list: (kind: CatalogKind, query: CatalogListQuery) => [...catalogKeys.lists(kind), query] as const,
  details: (kind: CatalogKind) => [...catalogKeys.kind(kind), 'detail'] as const,
  detail: (kind: CatalogKind, id: string) => [...catalogKeys.details(kind), id] as const,
};
