import { Injectable, OnModuleInit } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { EntityManager, In, Repository, SelectQueryBuilder } from 'typeorm';
import { CommonErrors } from '../common/errors/app-error';
import { mapDatabaseError } from '../common/errors/database-error.mapper';
import { Page, skipOf, toPage } from '../common/pagination/page-query.dto';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { FABRICATOR_PROJECT_FIELDS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { likeContains, TenantRepository } from '../common/tenant/tenant-repository';
import { CustomersService } from '../customers/customers.service';
import { CreateProjectDto, CUSTOMER_OR_SELF_MESSAGE, ProjectPlacementDto } from './dto/create-project.dto';
import { ListProjectsQueryDto } from './dto/list-projects-query.dto';
import { UpdateProjectDto } from './dto/update-project.dto';
import { Project, PROJECT_STATUSES, ProjectStatus } from './project.entity';
import { ProjectErrors } from './projects.errors';

/** A fabricator may move the engine and the project along, nothing else. */
export function assertFieldsAllowed(user: Pick<AuthUser, 'role'>, changes: object): void {
  if (user.role !== 'fabricator') return;
  const allowed: readonly string[] = FABRICATOR_PROJECT_FIELDS;
  const refused = Object.keys(changes).filter((key) => (changes as Record<string, unknown>)[key] !== undefined && !allowed.includes(key));
  if (refused.length > 0) throw ProjectErrors.fieldsForbidden(refused);
}

/** Project fields that point at a catalog row of the caller's shop. */
const CATALOG_REFS = [
  { field: 'chassisModelId', kind: 'chassis' },
  { field: 'engineProfileId', kind: 'engines' },
  { field: 'transmissionId', kind: 'transmissions' },
] as const satisfies readonly { field: keyof CreateProjectDto; kind: CatalogKind }[];

function placementColumns(placement: ProjectPlacementDto | null | undefined): Partial<Project> {
  if (placement === undefined) return {};
  return {
    placementSetbackMm: placement?.setbackMm ?? null,
    placementHeightMm: placement?.heightMm ?? null,
    placementTiltDeg: placement?.tiltDeg ?? null,
  };
}

@Injectable()
export class ProjectsService implements OnModuleInit {
  private readonly scoped: TenantRepository<Project>;

  constructor(
    @InjectRepository(Project) projects: Repository<Project>,
    private readonly customers: CustomersService,
    private readonly catalog: CatalogService,
  ) {
    this.scoped = new TenantRepository(projects);
  }

  onModuleInit(): void {
    // A customer with projects cannot be removed; this module owns the projects table, so it counts them.
    this.customers.countProjectsWith((manager, shopId, customerId) => this.countForCustomer(shopId, customerId, manager));
  }

  /** Shop scope for everyone; a customer additionally sees only the projects of their own customer record. */
  private visible(user: AuthUser): SelectQueryBuilder<Project> {
    const builder = this.scoped.query(user, 'project').innerJoinAndSelect('project.customer', 'customer');
    if (user.role === 'customer') builder.andWhere('customer.userId = :ownUserId', { ownUserId: user.userId });
    return builder;
  }

  async list(user: AuthUser, query: ListProjectsQueryDto): Promise<Page<Project>> {
    const sort = query.sort ?? 'updatedAt';
    const order = (query.order ?? (sort === 'title' || sort === 'status' ? 'asc' : 'desc')).toUpperCase() as 'ASC' | 'DESC';
    const builder = this.visible(user);
    if (query.status) builder.andWhere('project.status = :status', { status: query.status });
    if (query.customerId) builder.andWhere('project.customerId = :customerId', { customerId: query.customerId });
    if (query.search?.trim()) {
      builder.andWhere('(project.title LIKE :search OR project.vehicleDescription LIKE :search OR customer.name LIKE :search)', {
        search: likeContains(query.search.trim()),
      });
    }
    const [items, total] = await builder
      .orderBy(`project.${sort}`, order)
      .addOrderBy('project.id', 'ASC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
    return toPage(items, total, query);
  }

  async get(user: AuthUser, id: string): Promise<Project> {
    const project = await this.visible(user).andWhere('project.id = :id', { id }).getOne();
    if (!project) throw ProjectErrors.notFound();
    return project;
  }

  /** Whether the caller may read this project (their shop's; a customer's own). For modules that hold rows of a project. */
  async isReadableBy(user: AuthUser, id: string): Promise<boolean> {
    return (await this.visible(user).andWhere('project.id = :id', { id }).getCount()) > 0;
  }

  /** How many projects of the shop belong to this customer (pass the manager of an open transaction to count inside it). */
  countForCustomer(shopId: string, customerId: string, manager?: EntityManager): Promise<number> {
    return (manager ?? this.scoped.repository.manager).count(Project, { where: { customerId, shopId } });
  }

  async create(user: AuthUser, input: CreateProjectDto): Promise<Project> {
    const forMyself = input.forMyself === true;
    if (forMyself === (input.customerId !== undefined)) throw CommonErrors.validation([CUSTOMER_OR_SELF_MESSAGE]);
    if (input.customerId !== undefined) await this.assertCustomerInShop(user, input.customerId);
    await this.assertCatalogRefs(user, input);
    const id = randomUUID();
    const write = () =>
      this.scoped.repository.manager.transaction(async (manager) => {
        const customerId = input.customerId ?? (await this.customers.ownRecord(manager, user)).id;
        await manager.insert(Project, this.newProject(user, id, customerId, input));
      });
    try {
      await write();
    } catch (error) {
      // Two first projects for oneself at the same moment: the other request made the own record; use it.
      if (!forMyself || mapDatabaseError(error)?.code !== 'duplicate') throw error;
      await write();
    }
    return this.get(user, id);
  }

  private newProject(user: AuthUser, id: string, customerId: string, input: CreateProjectDto): Project {
    return this.scoped.repository.create({
      id,
      shopId: user.shopId,
      customerId,
      title: input.title.trim(),
      status: 'intake',
      vehicleDescription: input.vehicleDescription?.trim() ?? '',
      chassisModelId: input.chassisModelId ?? null,
      engineProfileId: input.engineProfileId ?? null,
      transmissionId: input.transmissionId ?? null,
      goalUse: input.goals?.use ?? 'street',
      goalTargetPowerKw: input.goals?.targetPowerKw ?? null,
      goalRevLimitRpm: input.goals?.revLimitRpm ?? null,
      goalBudgetCents: input.goals?.budgetCents ?? null,
      ...placementColumns(input.placement ?? null),
    });
  }

  async update(user: AuthUser, id: string, input: UpdateProjectDto): Promise<Project> {
    assertFieldsAllowed(user, input);
    for (const field of ['customerId', 'title', 'vehicleDescription'] as const) {
      if (input[field] === null) throw ProjectErrors.notNullable(field);
    }
    if (input.goals && input.goals.use === null) throw ProjectErrors.notNullable('goals.use');
    const project = await this.get(user, id);
    if (input.customerId !== undefined && input.customerId !== project.customerId) {
      await this.assertCustomerInShop(user, input.customerId);
    }
    await this.assertCatalogRefs(user, input, project);
    const changes: Partial<Project> = {
      ...(input.customerId !== undefined && { customerId: input.customerId }),
      ...(input.title !== undefined && { title: input.title.trim() }),
      ...(input.vehicleDescription !== undefined && { vehicleDescription: input.vehicleDescription.trim() }),
      ...(input.chassisModelId !== undefined && { chassisModelId: input.chassisModelId }),
      ...(input.engineProfileId !== undefined && { engineProfileId: input.engineProfileId }),
      ...(input.transmissionId !== undefined && { transmissionId: input.transmissionId }),
      ...(input.goals?.use !== undefined && { goalUse: input.goals.use }),
      ...(input.goals?.targetPowerKw !== undefined && { goalTargetPowerKw: input.goals.targetPowerKw }),
      ...(input.goals?.revLimitRpm !== undefined && { goalRevLimitRpm: input.goals.revLimitRpm }),
      ...(input.goals?.budgetCents !== undefined && { goalBudgetCents: input.goals.budgetCents }),
      ...placementColumns(input.placement),
    };
    if (Object.keys(changes).length > 0) {
      await this.scoped.repository.update({ id: project.id, shopId: user.shopId }, changes);
    }
    return this.get(user, id);
  }

  /**
   * Moves a project forward to `to` when it is at an earlier stage; never back. The one way other modules change
   * a project's stage, each on its event (pass the transaction's manager when the move belongs with other writes);
   * nobody sets it by hand.
   */
  async advanceStatus(shopId: string, projectId: string, to: ProjectStatus, manager?: EntityManager): Promise<void> {
    const earlier = PROJECT_STATUSES.slice(0, PROJECT_STATUSES.indexOf(to));
    if (earlier.length === 0) return;
    await (manager ?? this.scoped.repository.manager).update(Project, { id: projectId, shopId, status: In(earlier) }, { status: to });
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    const project = await this.get(user, id);
    await this.scoped.repository.delete({ id: project.id, shopId: user.shopId });
  }

  /** Every catalog id given (not null, and on update not the one already stored) must be a row of that kind in the caller's shop. */
  private async assertCatalogRefs(
    user: AuthUser,
    input: Partial<Pick<CreateProjectDto, (typeof CATALOG_REFS)[number]['field']>>,
    current?: Project,
  ): Promise<void> {
    for (const { field, kind } of CATALOG_REFS) {
      const id = input[field];
      if (id === undefined || id === null || id === current?.[field]) continue;
      const found = await this.catalog.existing(kind, user, [id]);
      if (!found.has(id)) throw ProjectErrors.catalogRefNotFound(field, this.catalog.definition(kind).singular);
    }
  }

  private async assertCustomerInShop(user: AuthUser, customerId: string): Promise<void> {
    if (!(await this.customers.findInShop(user.shopId, customerId))) throw ProjectErrors.customerNotFound();
  }
}
