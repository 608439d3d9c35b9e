import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, In } from 'typeorm';
import { Page, skipOf, toPage } from '../common/pagination/page-query.dto';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { likeContains } from '../common/tenant/tenant-repository';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { CreatePartDto, CreateSupplierDto, ListPartsQueryDto, SetStockDto, UpdatePartDto, UpdateSupplierDto } from './dto/part.dto';
import { Part, PartStock, Supplier } from './part.entity';
import { PartsErrors } from './parts.errors';
import { jsonCopy } from '../common/json/json-copy';

type Shop = Pick<AuthUser, 'shopId'>;

export interface PartWithStock {
  part: Part;
  stock: PartStock[];
  supplierName: string | null;
}

export function checkAttributes(attributes: Record<string, unknown> | undefined): void {
  for (const [key, value] of Object.entries(attributes ?? {})) {
    const ok =
      typeof value === 'string' ||
      typeof value === 'boolean' ||
      (typeof value === 'number' && Number.isFinite(value)) ||
      (Array.isArray(value) && value.every((item) => typeof item === 'string'));
    if (!ok) throw PartsErrors.badAttributes(key);
  }
}

/** The catalog's parts, suppliers and stock of one shop. */
@Injectable()
export class PartsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly catalog: CatalogService,
    private readonly audit: AuditService,
  ) {}

  async list(user: Shop, query: ListPartsQueryDto): Promise<Page<PartWithStock>> {
    const builder = this.dataSource.getRepository(Part).createQueryBuilder('part').where('part.shopId = :shopId', { shopId: user.shopId });
    if (query.category) builder.andWhere('part.category = :category', { category: query.category });
    if (query.supplierId) builder.andWhere('part.supplierId = :supplierId', { supplierId: query.supplierId });
    if (query.search?.trim()) {
      builder.andWhere('(part.sku LIKE :search OR part.description LIKE :search OR part.supplierSku LIKE :search)', { search: likeContains(query.search.trim()) });
    }
    if (query.inStock) {
      builder.andWhere('EXISTS (SELECT 1 FROM part_stock s WHERE s.partId = part.id AND s.onHand > s.reserved)');
    }
    const sort = query.sort ?? 'sku';
    const order = (query.order ?? (sort === 'updatedAt' ? 'desc' : 'asc')).toUpperCase() as 'ASC' | 'DESC';
    const [parts, total] = await builder.orderBy(`part.${sort}`, order).addOrderBy('part.id', 'ASC').skip(skipOf(query)).take(query.pageSize).getManyAndCount();
    return toPage(await this.withStock(user, parts), total, query);
  }

  async withStock(user: Shop, parts: Part[], manager: EntityManager = this.dataSource.manager): Promise<PartWithStock[]> {
    if (parts.length === 0) return [];
    const ids = parts.map((p) => p.id);
    const stock = await manager.find(PartStock, { where: { shopId: user.shopId, partId: In(ids) }, order: { location: 'ASC' } });
    const supplierIds = [...new Set(parts.map((p) => p.supplierId).filter((id): id is string => !!id))];
    const suppliers = supplierIds.length > 0 ? await manager.find(Supplier, { where: { shopId: user.shopId, id: In(supplierIds) } }) : [];
    const names = new Map(suppliers.map((s) => [s.id, s.name]));
    return parts.map((part) => ({
      part,
      stock: stock.filter((s) => s.partId === part.id),
      supplierName: part.supplierId ? names.get(part.supplierId) ?? null : null,
    }));
  }

  async get(user: Shop, id: string): Promise<PartWithStock> {
    const part = await this.dataSource.getRepository(Part).findOne({ where: { id, shopId: user.shopId } });
    if (!part) throw PartsErrors.partNotFound();
    return (await this.withStock(user, [part]))[0];
  }

  private async checkReferences(user: Shop, body: Partial<CreatePartDto>, current?: Part): Promise<void> {
    checkAttributes(body.attributes);
    if (body.supplierId && !(await this.dataSource.getRepository(Supplier).exists({ where: { id: body.supplierId, shopId: user.shopId } }))) {
      throw PartsErrors.supplierNotFound();
    }
    const fitKind = body.fitKind !== undefined ? body.fitKind : current?.fitKind ?? null;
    const fitSpecId = body.fitSpecId !== undefined ? body.fitSpecId : current?.fitSpecId ?? null;
    if ((fitKind === null) !== (fitSpecId === null)) throw PartsErrors.fitSpecIncomplete();
    if (fitKind && fitSpecId) {
      if (!(await this.catalog.existing(fitKind as CatalogKind, user, [fitSpecId])).has(fitSpecId)) throw PartsErrors.fitSpecMissing(fitKind);
    }
  }

  async create(user: Shop, input: CreatePartDto): Promise<PartWithStock> {
    const body: Partial<typeof input> = jsonCopy(input);
    await this.checkReferences(user, body);
    if (await this.dataSource.getRepository(Part).exists({ where: { shopId: user.shopId, sku: input.sku } })) throw PartsErrors.skuTaken(input.sku);
    const id = randomUUID();
    await this.dataSource.getRepository(Part).insert({
      id,
      shopId: user.shopId,
      sku: input.sku,
      description: input.description,
      category: input.category,
      priceCents: input.priceCents,
      costCents: input.costCents ?? 0,
      supplierId: input.supplierId ?? null,
      supplierSku: input.supplierSku ?? null,
      laborHours: input.laborHours ?? 0,
      torqueSpecs: body.torqueSpecs ?? [],
      instructions: input.instructions ?? null,
      attributes: body.attributes ?? {},
      requiresSkus: input.requiresSkus ?? [],
      excludesSkus: input.excludesSkus ?? [],
      replacesSkus: input.replacesSkus ?? [],
      fitKind: input.fitKind ?? null,
      fitSpecId: input.fitSpecId ?? null,
    });
    return this.get(user, id);
  }

  async update(user: Shop, id: string, input: UpdatePartDto): Promise<PartWithStock> {
    const { part } = await this.get(user, id);
    const body: Partial<typeof input> = jsonCopy(input);
    await this.checkReferences(user, body, part);
    if (body.sku && body.sku !== part.sku && (await this.dataSource.getRepository(Part).exists({ where: { shopId: user.shopId, sku: body.sku } }))) {
      throw PartsErrors.skuTaken(body.sku);
    }
    await this.dataSource.getRepository(Part).update({ id: part.id, shopId: user.shopId }, body as object);
    return this.get(user, id);
  }

  async remove(user: Shop, id: string): Promise<void> {
    const { part } = await this.get(user, id);
    await this.dataSource.getRepository(Part).delete({ id: part.id, shopId: user.shopId });
  }

  /** Sets the count on hand at one location (creating the location), never below what is reserved there. */
  async setStock(user: AuthUser, id: string, input: SetStockDto): Promise<PartWithStock> {
    const { part } = await this.get(user, id);
    await this.dataSource.transaction(async (manager) => {
      const existing = await manager
        .getRepository(PartStock)
        .createQueryBuilder('s')
        .setLock('pessimistic_write')
        .where('s.partId = :partId AND s.location = :location', { partId: part.id, location: input.location })
        .getOne();
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'stock',
        action: 'stock.counted',
        subjectId: part.id,
        summary: `${part.sku} at ${input.location}: on hand ${existing?.onHand ?? 0} → ${input.onHand}.`,
        before: existing ? { location: existing.location, onHand: existing.onHand, reserved: existing.reserved } : null,
        after: { location: input.location, onHand: input.onHand, reserved: existing?.reserved ?? 0 },
      });
      if (existing) {
        if (input.onHand < existing.reserved) {
          throw PartsErrors.outOfStock(part.sku, existing.onHand - existing.reserved, existing.reserved - input.onHand);
        }
        await manager.update(PartStock, { id: existing.id }, { onHand: input.onHand, ...(input.bin !== undefined && { bin: input.bin }) });
      } else {
        await manager.insert(PartStock, { id: randomUUID(), shopId: user.shopId, partId: part.id, location: input.location, bin: input.bin ?? '', onHand: input.onHand, reserved: 0 });
      }
    });
    return this.get(user, id);
  }

  async listSuppliers(user: Shop, query: { search?: string; page: number; pageSize: number }): Promise<Page<Supplier>> {
    const builder = this.dataSource.getRepository(Supplier).createQueryBuilder('s').where('s.shopId = :shopId', { shopId: user.shopId });
    if (query.search?.trim()) builder.andWhere('s.name LIKE :search', { search: likeContains(query.search.trim()) });
    const [items, total] = await builder.orderBy('s.name', 'ASC').skip(skipOf(query)).take(query.pageSize).getManyAndCount();
    return toPage(items, total, query);
  }

  async createSupplier(user: Shop, input: CreateSupplierDto): Promise<Supplier> {
    if (await this.dataSource.getRepository(Supplier).exists({ where: { shopId: user.shopId, name: input.name } })) throw PartsErrors.supplierTaken(input.name);
    const id = randomUUID();
    await this.dataSource.getRepository(Supplier).insert({ id, shopId: user.shopId, name: input.name, contact: input.contact ?? null, email: input.email ?? null, phone: input.phone ?? null });
    return this.dataSource.getRepository(Supplier).findOneByOrFail({ id });
  }

  async updateSupplier(user: Shop, id: string, input: UpdateSupplierDto): Promise<Supplier> {
    const row = await this.dataSource.getRepository(Supplier).findOne({ where: { id, shopId: user.shopId } });
    if (!row) throw PartsErrors.supplierNotFound();
    await this.dataSource.getRepository(Supplier).update({ id, shopId: user.shopId }, jsonCopy(input) as object);
    return this.dataSource.getRepository(Supplier).findOneByOrFail({ id });
  }

  async removeSupplier(user: Shop, id: string): Promise<void> {
    const row = await this.dataSource.getRepository(Supplier).findOne({ where: { id, shopId: user.shopId } });
    if (!row) throw PartsErrors.supplierNotFound();
    await this.dataSource.getRepository(Supplier).delete({ id, shopId: user.shopId });
  }
}
