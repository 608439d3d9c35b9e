import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, IsNull, Repository } from 'typeorm';
import { CommonErrors } from '../common/errors/app-error';
import { Page, skipOf, toPage } from '../common/pagination/page-query.dto';
import { AuthUser } from '../common/tenant/auth-user';
import { likeContains, TenantRepository } from '../common/tenant/tenant-repository';
import { Customer } from './customer.entity';
import { CustomerErrors } from './customers.errors';
import { CreateCustomerDto } from './dto/create-customer.dto';
import { ListCustomersQueryDto } from './dto/list-customers-query.dto';
import { UpdateCustomerDto } from './dto/update-customer.dto';

/**
 * Counts a customer's projects inside the removal's transaction. The projects module owns that table and hands
 * this in when it starts (projects depend on customers, so customers cannot ask the projects service directly).
 */
export type CustomerProjectCounter = (manager: EntityManager, shopId: string, customerId: string) => Promise<number>;

function clean(value: string | null | undefined): string | null | undefined {
  if (value === undefined || value === null) return value;
  const trimmed = value.trim();
  return trimmed === '' ? null : trimmed;
}

@Injectable()
export class CustomersService {
  private readonly scoped: TenantRepository<Customer>;
  private projectCounter: CustomerProjectCounter | null = null;

  constructor(
    @InjectRepository(Customer) customers: Repository<Customer>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    this.scoped = new TenantRepository(customers);
  }

  async list(user: AuthUser, query: ListCustomersQueryDto): Promise<Page<Customer>> {
    const sort = query.sort ?? 'name';
    const order = (query.order ?? (sort === 'name' || sort === 'email' ? 'asc' : 'desc')).toUpperCase() as 'ASC' | 'DESC';
    const builder = this.scoped.query(user, 'customer');
    if (query.search?.trim()) {
      builder.andWhere('(customer.name LIKE :search OR customer.email LIKE :search OR customer.phone LIKE :search)', {
        search: likeContains(query.search.trim()),
      });
    }
    const [items, total] = await builder
      .orderBy(`customer.${sort}`, order)
      .addOrderBy('customer.id', 'ASC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
    return toPage(items, total, query);
  }

  async get(user: AuthUser, id: string): Promise<Customer> {
    const customer = await this.scoped.findById(user, id);
    if (!customer) throw CustomerErrors.notFound();
    return customer;
  }

  async create(user: AuthUser, input: CreateCustomerDto): Promise<Customer> {
    const customer = this.scoped.repository.create({
      id: randomUUID(),
      shopId: user.shopId,
      name: input.name.trim(),
      email: clean(input.email) ?? null,
      phone: clean(input.phone) ?? null,
      notes: clean(input.notes) ?? null,
      userId: null,
    });
    await this.scoped.repository.insert(customer);
    return this.get(user, customer.id);
  }

  async update(user: AuthUser, id: string, input: UpdateCustomerDto): Promise<Customer> {
    const customer = await this.get(user, id);
    if (input.name === null) throw CommonErrors.validation(['name must not be empty']);
    if (input.name !== undefined) customer.name = input.name.trim();
    if (input.email !== undefined) customer.email = clean(input.email) ?? null;
    if (input.phone !== undefined) customer.phone = clean(input.phone) ?? null;
    if (input.notes !== undefined) customer.notes = clean(input.notes) ?? null;
    await this.scoped.repository.save(customer);
    return this.get(user, id);
  }

  countProjectsWith(counter: CustomerProjectCounter): void {
    this.projectCounter = counter;
  }

  /** A customer of the shop, or null (for modules that refer to customers and answer with their own error). */
  findInShop(shopId: string, id: string): Promise<Customer | null> {
    return this.scoped.repository.findOne({ where: { id, shopId } });
  }

  /** The customer record a customer's login is linked to in a shop, if any. */
  linkedTo(shopId: string, userId: string, manager: EntityManager = this.scoped.repository.manager): Promise<Customer | null> {
    return manager.findOne(Customer, { where: { shopId, userId } });
  }

  /**
   * The signed-in person's own customer record in their shop (an owner-builder's projects are filed under it), made on
   * first use from their name and e-mail. Found again by the login link, so it stays theirs when they change their
   * e-mail; the shop-and-login unique key keeps it to one. Inside the caller's transaction.
   */
  async ownRecord(manager: EntityManager, user: AuthUser): Promise<Customer> {
    const existing = await this.linkedTo(user.shopId, user.userId, manager);
    if (existing) return existing;
    const customer = manager.create(Customer, {
      id: randomUUID(),
      shopId: user.shopId,
      name: user.name.trim().slice(0, 120) || user.email.slice(0, 120),
      email: user.email,
      phone: null,
      notes: null,
      userId: user.userId,
    });
    await manager.insert(Customer, customer);
    return customer;
  }

  /** Links a login to a customer record that has none yet; false when it has one meanwhile. Inside the caller's transaction. */
  async linkLogin(manager: EntityManager, shopId: string, customerId: string, userId: string): Promise<boolean> {
    const linked = await manager.update(Customer, { id: customerId, shopId, userId: IsNull() }, { userId });
    return linked.affected === 1;
  }

  /** The login leaves the shop: its customer records keep their data and lose the link. Inside the caller's transaction. */
  async unlinkLogin(manager: EntityManager, shopId: string, userId: string): Promise<void> {
    await manager.update(Customer, { shopId, userId }, { userId: null });
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const customer = await manager.findOne(Customer, {
        where: { id, shopId: user.shopId },
        lock: { mode: 'pessimistic_write' },
      });
      if (!customer) throw CustomerErrors.notFound();
      if (!this.projectCounter) throw new Error('No project counter: the projects module registers one when it starts');
      const projects = await this.projectCounter(manager, user.shopId, id);
      if (projects > 0) throw CustomerErrors.hasProjects(projects);
      await manager.delete(Customer, { id, shopId: user.shopId });
    });
  }
}
