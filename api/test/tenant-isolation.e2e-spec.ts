import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, countRows, createTestApp, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';

describe('tenant isolation', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let other: Session;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    demo = await signInAllRoles(t.http);
    other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
  });

  afterAll(() => t.close());

  const crossShop = [
    { what: 'customer', path: `/api/customers/${OTHER_SHOP.customerId}`, patch: { notes: 'peeked' } },
    { what: 'project', path: `/api/projects/${OTHER_SHOP.projectId}`, patch: { title: 'peeked' } },
  ];

  describe.each(crossShop)("another shop's $what", ({ path, patch }) => {
    it.each(['owner', 'estimator'] as DemoRole[])('is not found for read, update and delete (%s)', async (role) => {
      for (const call of [
        t.http.get(path),
        t.http.patch(path).send(patch),
        t.http.delete(path),
      ]) {
        const response = await call.set(...bearer(demo[role]));
        expect(response.status).toBe(404);
        expect(response.body.code).toMatch(/not_found/);
      }
    });
  });

  it("leaves the other shop's records untouched", async () => {
    const [row] = await t.dataSource.query('SELECT title FROM projects WHERE id = ?', [OTHER_SHOP.projectId]);
    expect(row.title).toBe('Orrin Tallboy 1971: Alder 4.8 I6');
    expect(await countRows(t.dataSource, 'customers')).toBeGreaterThan(5);
  });

  it('works the other way round too', async () => {
    await t.http.get(`/api/customers/${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(other)).expect(404);
    await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(other)).expect(404);
    await t.http.delete(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(other)).expect(404);
  });

  it('lists only records of the own shop', async () => {
    const customers = await t.http.get('/api/customers?pageSize=100').set(...bearer(other)).expect(200);
    expect(customers.body.items.map((c: { id: string }) => c.id)).toEqual([OTHER_SHOP.customerId]);
    const projects = await t.http.get('/api/projects?pageSize=100').set(...bearer(demo.owner)).expect(200);
    expect(projects.body.items.map((p: { id: string }) => p.id)).not.toContain(OTHER_SHOP.projectId);
    const filtered = await t.http.get(`/api/projects?customerId=${OTHER_SHOP.customerId}`).set(...bearer(demo.owner)).expect(200);
    expect(filtered.body.total).toBe(0);
  });

  it("refuses a project for another shop's customer", async () => {
    const before = await countRows(t.dataSource, 'projects');
    const response = await t.http
      .post('/api/projects')
      .set(...bearer(demo.estimator))
      .send({ customerId: OTHER_SHOP.customerId, title: 'Smuggled project' })
      .expect(404);
    expect(response.body.code).toBe('customer_not_found');
    await t.http
      .patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`)
      .set(...bearer(demo.estimator))
      .send({ customerId: OTHER_SHOP.customerId })
      .expect(404);
    expect(await countRows(t.dataSource, 'projects')).toBe(before);
  });

  it("refuses inviting a login for another shop's customer", async () => {
    await t.http
      .post('/api/invitations')
      .set(...bearer(demo.owner))
      .send({ email: 'sneaky@example.test', role: 'customer', customerId: OTHER_SHOP.customerId })
      .expect(404);
  });

  describe('a customer', () => {
    it('sees their own project', async () => {
      const response = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(demo.customer)).expect(200);
      expect(response.body.customer.id).toBe(DEMO_CUSTOMER_IDS.juno);
      expect(demo.customer.user.customerId).toBe(DEMO_CUSTOMER_IDS.juno);
    });

    it("gets 404 for another customer's project of the same shop", async () => {
      const response = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.stag}`).set(...bearer(demo.customer)).expect(404);
      expect(response.body.code).toBe('project_not_found');
    });

    it("does not find it in the list, not even by filter or search", async () => {
      const all = await t.http.get('/api/projects?pageSize=100').set(...bearer(demo.customer)).expect(200);
      expect(all.body.items.map((p: { id: string }) => p.id)).toEqual([DEMO_PROJECT_IDS.ridgeback]);
      expect(all.body.total).toBe(1);
      const byCustomer = await t.http.get(`/api/projects?customerId=${DEMO_CUSTOMER_IDS.odile}`).set(...bearer(demo.customer)).expect(200);
      expect(byCustomer.body.total).toBe(0);
      const bySearch = await t.http.get('/api/projects?search=Pellam').set(...bearer(demo.customer)).expect(200);
      expect(bySearch.body.total).toBe(0);
    });

    it('gets no customer list', async () => {
      await t.http.get('/api/customers').set(...bearer(demo.customer)).expect(403);
      await t.http.get(`/api/customers/${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(demo.customer)).expect(403);
    });
  });
});
