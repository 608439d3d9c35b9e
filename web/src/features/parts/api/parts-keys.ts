import type { PartListQuery } from './get-parts';
import type { SupplierListQuery } from './get-suppliers';

export const partsKeys = {
  all: ['parts'] as const,
  list: (query: PartListQuery) => [...partsKeys.all, 'list', query] as const,
  suppliers: ['suppliers'] as const,
  supplierList: (query: SupplierListQuery) => [...partsKeys.suppliers, 'list', query] as const,
};
