import { Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { AuthUser } from '../common/tenant/auth-user';
import { CustomersService } from '../customers/customers.service';
import { Project } from './project.entity';
import { assertFieldsAllowed, ProjectsService } from './projects.service';

const userStub = {
  estimator: {
    userId: 'u-1',
    email: 'estimator@shop.test',
    name: 'Esti Mator',
    membershipId: 'm-1',
    shopId: 'shop-a',
    role: 'estimator',
    customerId: null,
  } satisfies AuthUser,
  fabricator: {
    userId: 'u-2',
    email: 'fab@shop.test',
    name: 'Fab Ricator',
    membershipId: 'm-2',
    shopId: 'shop-a',
    role: 'fabricator',
    customerId: null,
  } satisfies AuthUser,
};

function repositoryMock<T extends object>(overrides: Partial<Record<keyof Repository<T>, jest.Mock>> = {}) {
  return { create: jest.fn((value) => value), insert: jest.fn(), exists: jest.fn(), ...overrides } as unknown as Repository<T>;
}

function customersWith(found: boolean) {
  return { findInShop: jest.fn().mockResolvedValue(found ? { id: 'c-1' } : null) } as unknown as CustomersService;
}

function catalogMock(known: string[] = []) {
  return { definition: () => ({ singular: 'part' }), existing: jest.fn(async (_kind: string, _user: unknown, ids: string[]) => new Set(ids.filter((id) => known.includes(id)))) } as unknown as CatalogService;
}

describe('assertFieldsAllowed', () => {
  it('lets a fabricator change the placement', () => {
    expect(() => assertFieldsAllowed(userStub.fabricator, { placement: null })).not.toThrow();
  });

  it('refuses any other field for a fabricator, naming it', () => {
    expect(() => assertFieldsAllowed(userStub.fabricator, { placement: null, title: 'x' })).toThrow(/title/);
  });

  it('ignores fields that are present but undefined', () => {
    expect(() => assertFieldsAllowed(userStub.fabricator, { title: undefined, placement: null })).not.toThrow();
  });

  it('does not limit an estimator', () => {
    expect(() => assertFieldsAllowed(userStub.estimator, { title: 'x', goals: { use: 'tow' } })).not.toThrow();
  });
});

describe('ProjectsService.create', () => {
  it("refuses a customer outside the caller's shop before writing", async () => {
    const projects = repositoryMock<Project>();
    const customers = customersWith(false);
    const service = new ProjectsService(projects, customers, catalogMock());

    await expect(service.create(userStub.estimator, { customerId: 'c-other', title: 'Swap' })).rejects.toMatchObject({
      code: 'customer_not_found',
    });
    expect(customers.findInShop).toHaveBeenCalledWith('shop-a', 'c-other');
    expect(projects.insert).not.toHaveBeenCalled();
  });
});

describe('ProjectsService catalog references', () => {
  it('refuses an engine id that is not in the shop catalog, naming the field, before writing', async () => {
    const projects = repositoryMock<Project>();
    const customers = customersWith(true);
    const catalog = catalogMock(['chassis-1']);
    const service = new ProjectsService(projects, customers, catalog);

    await expect(
      service.create(userStub.estimator, { customerId: 'c-1', title: 'Swap', chassisModelId: 'chassis-1', engineProfileId: 'nope' }),
    ).rejects.toMatchObject({ status: 400, message: expect.stringMatching(/^engineProfileId /) });
    expect(catalog.existing).toHaveBeenCalledWith('engines', userStub.estimator, ['nope']);
    expect(projects.insert).not.toHaveBeenCalled();
  });
});
