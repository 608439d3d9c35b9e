import { AppError } from '../common/errors/app-error';
import type { CatalogKindDefinition } from './catalog-kinds';

export const CatalogErrors = {
  notFound: (kind: Pick<CatalogKindDefinition, 'singular'>) =>
    new AppError(404, 'catalog_item_not_found', `That ${kind.singular} does not exist in your shop's catalog.`),
  filterNotSupported: (kind: Pick<CatalogKindDefinition, 'kind'>, filters: string[], supported: string[]) => {
    const message = `${kind.kind} cannot be filtered by ${filters.join(', ')}; use ${
      supported.length > 0 ? `search or ${supported.join(', ')}` : 'search'
    }.`;
    return new AppError(400, 'catalog_filter_not_supported', message, [message]);
  },
  nameMissing: () => new AppError(400, 'validation_failed', 'name must not be empty', ['name must not be empty']),
};
