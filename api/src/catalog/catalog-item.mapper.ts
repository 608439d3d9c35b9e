import type { CatalogKindDefinition } from './catalog-kinds';
import type { CatalogItem } from './catalog-item.entity';
import type { CatalogItemResponseDto } from './dto/catalog-item-response.dto';

export function mapCatalogItem(kind: CatalogKindDefinition, row: CatalogItem): CatalogItemResponseDto {
  return {
    id: row.id,
    name: row.name,
    spec: row.spec,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    ...kind.present?.(row),
  };
}
