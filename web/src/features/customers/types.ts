import type { PagedQueryOf, RequestBodyOf, ResponseOf, Schemas } from '@/lib/api-types';

export type Customer = Schemas['CustomerResponseDto'];
export type CustomerPage = ResponseOf<'/api/customers', 'get'>;
export type CustomerListQuery = PagedQueryOf<'/api/customers'>;
export type CustomerSort = NonNullable<CustomerListQuery['sort']>;
export type CustomerInput = RequestBodyOf<'/api/customers', 'post'>;
export type CustomerChanges = RequestBodyOf<'/api/customers/{id}', 'patch'>;

/** The columns the table lets a person sort by (all of them the API sorts by). */
export const customerSortFields: readonly CustomerSort[] = ['name', 'email', 'createdAt', 'updatedAt'];
