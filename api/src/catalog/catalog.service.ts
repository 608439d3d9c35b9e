import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, In } from 'typeorm';
import { Page, skipOf, toPage } from '../common/pagination/page-query.dto';
import { AuthUser } from '../common/tenant/auth-user';
import { likeContains, TenantRepository } from '../common/tenant/tenant-repository';
import { CatalogErrors } from './catalog.errors';
import { CATALOG_KINDS, CatalogExtras, CatalogKind, CatalogKindDefinition } from './catalog-kinds';
import { CatalogItem } from './catalog-item.entity';
import { CATALOG_FILTERS, ListCatalogQueryDto } from './dto/list-catalog-query.dto';
import { jsonCopy } from '../common/json/json-copy';

type Shop = Pick<AuthUser, 'shopId'>;

/** How many candidates of one kind a fit run considers; a shop catalog is far smaller in practice. */
export const MAX_CANDIDATES_PER_KIND = 200;

@Injectable()
export class CatalogService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  definition(kind: CatalogKind): CatalogKindDefinition {
    return CATALOG_KINDS[kind];
  }

  private scoped(kind: CatalogKind): TenantRepository<CatalogItem> {
    return new TenantRepository(this.dataSource.getRepository<CatalogItem>(CATALOG_KINDS[kind].entity));
  }

  async list(kind: CatalogKind, user: Shop, query: ListCatalogQueryDto): Promise<Page<CatalogItem>> {
    const definition = CATALOG_KINDS[kind];
    const given = CATALOG_FILTERS.filter((filter) => query[filter] !== undefined);
    const refused = given.filter((filter) => !definition.filters[filter]);
    if (refused.length > 0) throw CatalogErrors.filterNotSupported(definition, refused, Object.keys(definition.filters));
    const sort = query.sort ?? 'name';
    const order = (query.order ?? (sort === 'name' ? 'asc' : 'desc')).toUpperCase() as 'ASC' | 'DESC';
    const builder = this.scoped(kind).query(user, 'item');
    for (const filter of given) {
      builder.andWhere(`item.${definition.filters[filter]} = :${filter}`, { [filter]: query[filter] });
    }
    if (query.search?.trim()) builder.andWhere('item.name LIKE :search', { search: likeContains(query.search.trim()) });
    const [items, total] = await builder
      .orderBy(`item.${sort}`, order)
      .addOrderBy('item.id', 'ASC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
    return toPage(items, total, query);
  }

  async get(kind: CatalogKind, user: Shop, id: string): Promise<CatalogItem> {
    const row = await this.scoped(kind).findById(user, id);
    if (!row) throw CatalogErrors.notFound(CATALOG_KINDS[kind]);
    return row;
  }

  async create(kind: CatalogKind, user: Shop, body: object): Promise<CatalogItem> {
    const definition = CATALOG_KINDS[kind];
    const { spec, extras } = this.split(definition, jsonCopy(body as Record<string, unknown>));
    const id = randomUUID();
    const name = String(spec.name).trim();
    if (name === '') throw CatalogErrors.nameMissing();
    const given = { id, ...spec, name };
    const fullSpec = { ...given, ...definition.derive?.(given) };
    await this.scoped(kind).repository.insert({
      id,
      shopId: user.shopId,
      name,
      spec: fullSpec,
      ...definition.columns(fullSpec, extras),
    } as CatalogItem);
    return this.get(kind, user, id);
  }

  async update(kind: CatalogKind, user: Shop, id: string, body: object): Promise<CatalogItem> {
    const definition = CATALOG_KINDS[kind];
    const row = await this.get(kind, user, id);
    const { spec: changes, extras } = this.split(definition, jsonCopy(body as Record<string, unknown>));
    if (changes.name !== undefined && String(changes.name).trim() === '') throw CatalogErrors.nameMissing();
    const merged: Record<string, unknown> = { ...(row.spec as Record<string, unknown>), ...changes, id: row.id };
    const name = String(merged.name).trim();
    const named = { ...merged, name };
    const spec = { ...named, ...definition.derive?.(named) };
    await this.scoped(kind).repository.update(
      { id: row.id, shopId: user.shopId },
      { name, spec, ...definition.columns(spec, extras) } as object,
    );
    return this.get(kind, user, id);
  }

  async remove(kind: CatalogKind, user: Shop, id: string): Promise<void> {
    const row = await this.get(kind, user, id);
    // A part still chosen in a project's fit selections is refused by its foreign key (409 still_referenced).
    await this.scoped(kind).repository.delete({ id: row.id, shopId: user.shopId });
  }

  /** The spec of one row in the caller's shop, or null when it is not there. */
  async findSpec<TSpec>(kind: CatalogKind, user: Shop, id: string | null | undefined): Promise<TSpec | null> {
    if (!id) return null;
    const row = await this.scoped(kind).findById(user, id);
    return row ? (row.spec as TSpec) : null;
  }

  async findRow(kind: CatalogKind, user: Shop, id: string | null | undefined): Promise<CatalogItem | null> {
    if (!id) return null;
    return this.scoped(kind).findById(user, id);
  }

  /** Whether the caller's shop has at least one record of this kind. */
  async hasAny(kind: CatalogKind, user: Shop): Promise<boolean> {
    return this.scoped(kind).repository.exists({ where: { shopId: user.shopId } });
  }

  /** Which of the given ids exist in the caller's shop. */
  async existing(kind: CatalogKind, user: Shop, ids: string[]): Promise<Set<string>> {
    if (ids.length === 0) return new Set();
    const rows = await this.scoped(kind).repository.find({
      select: { id: true },
      where: { shopId: user.shopId, id: In(ids) },
    });
    return new Set(rows.map((row) => row.id));
  }

  /** The specs of the given ids that exist in the caller's shop, by id. */
  async specsByIds<TSpec>(kind: CatalogKind, user: Shop, ids: string[]): Promise<Map<string, TSpec>> {
    if (ids.length === 0) return new Map();
    const rows = await this.scoped(kind).repository.find({ where: { shopId: user.shopId, id: In(ids) } });
    return new Map(rows.map((row) => [row.id, row.spec as TSpec]));
  }

  /** Candidate specs of one kind, optionally restricted by filter columns, in name order. */
  async candidateSpecs<TSpec>(kind: CatalogKind, user: Shop, where: Record<string, string | number> = {}): Promise<TSpec[]> {
    const rows = await this.scoped(kind).repository.find({
      where: { ...where, shopId: user.shopId },
      order: { name: 'ASC', id: 'ASC' },
      take: MAX_CANDIDATES_PER_KIND,
    });
    return rows.map((row) => row.spec as TSpec);
  }

  private split(definition: CatalogKindDefinition, body: Record<string, unknown>): { spec: Record<string, unknown>; extras: CatalogExtras } {
    const spec: Record<string, unknown> = {};
    const extras: CatalogExtras = {};
    for (const [key, value] of Object.entries(body)) {
      if (definition.extraFields.includes(key)) extras[key] = value;
      else spec[key] = value;
    }
    return { spec, extras };
  }
}
