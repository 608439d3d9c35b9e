import type { CatalogKind } from '@swapwright/shared';
import type { PagedQueryOf, RequestBodyOf, ResponseOf } from '@/lib/api-types';

export { CATALOG_KIND_NAMES as catalogKinds, type CatalogKind } from '@swapwright/shared';

/** One catalog entry of a kind as the API answers it (`/api/catalog/<kind>/{id}`). */
export type CatalogItemOf<K extends CatalogKind> = ResponseOf<`/api/catalog/${K}/{id}`, 'get'>;
/** An entry of any kind (the table and the form treat every kind alike). */
export type CatalogItem = CatalogItemOf<CatalogKind>;
export type CatalogPageOf<K extends CatalogKind> = ResponseOf<`/api/catalog/${K}`, 'get'>;
export type CatalogItemInputOf<K extends CatalogKind> = RequestBodyOf<`/api/catalog/${K}`, 'post'>;
export type CatalogItemChangesOf<K extends CatalogKind> = RequestBodyOf<`/api/catalog/${K}/{id}`, 'patch'>;

/** The list's query (every kind takes the same paging and search; page and size always sent). */
export type CatalogListQuery = Pick<PagedQueryOf<'/api/catalog/engines'>, 'page' | 'pageSize' | 'search'>;
