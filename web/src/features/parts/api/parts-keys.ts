import type { PartListQuery } from './get-parts';

export const partsKeys = {
  all: ['parts'] as const,
  list: (query: PartListQuery) => [...partsKeys.all, 'list', query] as const,
};
