import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { QueryOf, Schemas } from '@/lib/api-types';
import { partsKeys } from './parts-keys';

export type Supplier = Schemas['SupplierResponseDto'];
export type SupplierPage = Schemas['SupplierPageResponseDto'];
export type SupplierListQuery = QueryOf<'/api/suppliers', 'get'> & { page: number; pageSize: number };

export async function getSuppliers(query: SupplierListQuery, signal?: AbortSignal): Promise<SupplierPage> {
  const { data } = await apiClient.get<SupplierPage>('/suppliers', { params: query, signal });
  return data;
}

export const suppliersQueryOptions = (query: SupplierListQuery) =>
  queryOptions({ queryKey: partsKeys.supplierList(query), queryFn: ({ signal }) => getSuppliers(query, signal), placeholderData: keepPreviousData });

export function useSuppliers(query: SupplierListQuery) {
  return useQuery(suppliersQueryOptions(query));
}
