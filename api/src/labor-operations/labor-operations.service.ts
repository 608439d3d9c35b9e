import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { In, Repository } from 'typeorm';
import { CommonErrors } from '../common/errors/app-error';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { CreateLaborOperationDto, UpdateLaborOperationDto } from './dto/labor-operation.dto';
import { LaborOperation } from './labor-operation.entity';
import { LaborOperationErrors } from './labor-operations.errors';

type ShopScope = Pick<AuthUser, 'shopId'>;

@Injectable()
export class LaborOperationsService {
  private readonly scoped: TenantRepository<LaborOperation>;

  constructor(@InjectRepository(LaborOperation) operations: Repository<LaborOperation>) {
    this.scoped = new TenantRepository(operations);
  }

  list(user: ShopScope): Promise<LaborOperation[]> {
    return this.scoped.repository.find({ where: this.scoped.where(user), order: { buildOrder: 'ASC', name: 'ASC' } });
  }

  byIds(user: ShopScope, ids: string[]): Promise<LaborOperation[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return this.scoped.repository.find({ where: this.scoped.where(user, { id: In(ids) }) });
  }

  async get(user: ShopScope, id: string): Promise<LaborOperation> {
    const operation = await this.scoped.findById(user, id);
    if (!operation) throw LaborOperationErrors.notFound();
    return operation;
  }

  /** The operation that answers a fit remedy or a part category: the first whose match words occur in the text. */
  matchFor(operations: LaborOperation[], text: string): LaborOperation | null {
    const haystack = text.toLowerCase();
    return operations.find((operation) => operation.matches.some((word) => word && haystack.includes(word.toLowerCase()))) ?? null;
  }

  async create(user: ShopScope, input: CreateLaborOperationDto): Promise<LaborOperation> {
    await this.assertCodeFree(user, input.code);
    const operation = this.scoped.repository.create({
      id: randomUUID(),
      shopId: user.shopId,
      code: input.code,
      name: input.name,
      bookHours: input.bookHours,
      buildOrder: input.buildOrder ?? 100,
      matches: input.matches ?? [],
      hazards: input.hazards ?? [],
      torqueSpecs: (input.torqueSpecs ?? []).map((spec) => ({ joint: spec.joint ?? null, fastener: spec.fastener, lbfFt: spec.lbfFt, sequence: spec.sequence ?? null })),
      checks: (input.checks ?? []).map((check) => ({ key: check.key, label: check.label, unit: check.unit ?? null, min: check.min ?? null, max: check.max ?? null })),
    });
    await this.scoped.repository.insert(operation);
    return this.get(user, operation.id);
  }

  async update(user: ShopScope, id: string, input: UpdateLaborOperationDto): Promise<LaborOperation> {
    const nulled = Object.entries(input).find(([, value]) => value === null);
    if (nulled) throw CommonErrors.validation([`${nulled[0]} must not be null`]);
    const operation = await this.get(user, id);
    if (input.code !== undefined && input.code !== operation.code) await this.assertCodeFree(user, input.code);
    const merged = this.scoped.repository.merge(operation, {
      ...(input.code !== undefined && { code: input.code }),
      ...(input.name !== undefined && { name: input.name }),
      ...(input.bookHours !== undefined && { bookHours: input.bookHours }),
      ...(input.buildOrder !== undefined && { buildOrder: input.buildOrder }),
      ...(input.matches !== undefined && { matches: input.matches }),
      ...(input.hazards !== undefined && { hazards: input.hazards }),
      ...(input.torqueSpecs !== undefined && { torqueSpecs: input.torqueSpecs.map((spec) => ({ ...spec, joint: spec.joint ?? null, sequence: spec.sequence ?? null })) }),
      ...(input.checks !== undefined && { checks: input.checks.map((check) => ({ ...check, unit: check.unit ?? null, min: check.min ?? null, max: check.max ?? null })) }),
    });
    await this.scoped.repository.save(merged);
    return this.get(user, id);
  }

  async remove(user: ShopScope, id: string): Promise<void> {
    const operation = await this.get(user, id);
    await this.scoped.repository.delete({ id: operation.id, shopId: user.shopId });
  }

  private async assertCodeFree(user: ShopScope, code: string): Promise<void> {
    if (await this.scoped.repository.exists({ where: this.scoped.where(user, { code }) })) throw LaborOperationErrors.codeTaken(code);
  }
}
