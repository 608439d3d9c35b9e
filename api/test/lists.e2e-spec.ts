import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { bearer, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

describe('lists: pagination, sort and filters', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    s = await signInAllRoles(t.http);
    for (const title of ['Alpha build', 'Bravo build', 'Charlie build']) {
      const created = await t.http.post('/api/projects').set(...bearer(s.estimator)).send({ customerId: DEMO_CUSTOMER_IDS.tamsin, title }).expect(201);
      // The stage moves only with the job's events; put these three at the quote stage directly for the filter.
      await t.dataSource.query("UPDATE projects SET status = 'quote-sent' WHERE id = ?", [created.body.id]);
    }
  });

  afterAll(() => t.close());

  describe('customers', () => {
    it('pages with total, page and pageSize', async () => {
      const first = await t.http.get('/api/customers?page=1&pageSize=2').set(...bearer(s.counter)).expect(200);
      expect(first.body).toMatchObject({ total: 5, page: 1, pageSize: 2 });
      expect(first.body.items).toHaveLength(2);
      const third = await t.http.get('/api/customers?page=3&pageSize=2').set(...bearer(s.counter)).expect(200);
      expect(third.body.items).toHaveLength(1);
      const beyond = await t.http.get('/api/customers?page=9&pageSize=2').set(...bearer(s.counter)).expect(200);
      expect(beyond.body.items).toHaveLength(0);
    });

    it('sorts by name by default and by a whitelisted field on request', async () => {
      const byName = await t.http.get('/api/customers').set(...bearer(s.owner)).expect(200);
      const names = byName.body.items.map((c: { name: string }) => c.name);
      expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
      const desc = await t.http.get('/api/customers?sort=name&order=desc').set(...bearer(s.owner)).expect(200);
      expect(desc.body.items.map((c: { name: string }) => c.name)).toEqual([...names].reverse());
      await t.http.get('/api/customers?sort=email&order=asc').set(...bearer(s.owner)).expect(200);
    });

    it('searches name, e-mail and phone', async () => {
      const byName = await t.http.get('/api/customers?search=straker').set(...bearer(s.owner)).expect(200);
      expect(byName.body.items.map((c: { id: string }) => c.id)).toEqual([DEMO_CUSTOMER_IDS.odile]);
      const byPhone = await t.http.get('/api/customers?search=0144').set(...bearer(s.owner)).expect(200);
      expect(byPhone.body.items.map((c: { id: string }) => c.id)).toEqual([DEMO_CUSTOMER_IDS.tamsin]);
      const wildcard = await t.http.get('/api/customers?search=%25').set(...bearer(s.owner)).expect(200);
      expect(wildcard.body.total).toBe(0);
    });

    it.each([
      ['sort=phone', /sort must be one of: name, email, createdAt, updatedAt/],
      ['order=sideways', /order must be asc or desc/],
      ['pageSize=500', /pageSize must not be greater than 100/],
      ['page=0', /page must not be less than 1/],
      ['page=two', /page must be an integer/],
      ['colour=red', /property colour should not exist/],
    ])('refuses ?%s with 400', async (query, message) => {
      const response = await t.http.get(`/api/customers?${query}`).set(...bearer(s.owner)).expect(400);
      expect(response.body.details.join(' | ')).toMatch(message);
    });
  });

  describe('projects', () => {
    it('sorts by updatedAt, newest first, by default', async () => {
      const response = await t.http.get('/api/projects').set(...bearer(s.owner)).expect(200);
      expect(response.body.total).toBe(5);
      const stamps = response.body.items.map((p: { updatedAt: string }) => p.updatedAt);
      expect(stamps).toEqual([...stamps].sort().reverse());
    });

    it('sorts by title', async () => {
      const response = await t.http.get('/api/projects?sort=title&order=asc&pageSize=3').set(...bearer(s.owner)).expect(200);
      expect(response.body.items.map((p: { title: string }) => p.title)).toEqual(['Alpha build', 'Bravo build', 'Charlie build']);
      const page2 = await t.http.get('/api/projects?sort=title&order=asc&pageSize=3&page=2').set(...bearer(s.owner)).expect(200);
      expect(page2.body.items).toHaveLength(2);
    });

    it('filters by status and customer', async () => {
      const quoting = await t.http.get('/api/projects?status=quote-sent').set(...bearer(s.fabricator)).expect(200);
      expect(quoting.body.total).toBe(3);
      const juno = await t.http.get(`/api/projects?customerId=${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(s.fabricator)).expect(200);
      expect(juno.body.items.map((p: { id: string }) => p.id)).toEqual([DEMO_PROJECT_IDS.ridgeback]);
      const both = await t.http.get(`/api/projects?customerId=${DEMO_CUSTOMER_IDS.tamsin}&status=intake`).set(...bearer(s.fabricator)).expect(200);
      expect(both.body.total).toBe(0);
    });

    it('searches title, vehicle and customer name', async () => {
      const byVehicle = await t.http.get('/api/projects?search=leaf springs').set(...bearer(s.counter)).expect(200);
      expect(byVehicle.body.items.map((p: { id: string }) => p.id)).toEqual([DEMO_PROJECT_IDS.stag]);
      const byCustomer = await t.http.get('/api/projects?search=Greave').set(...bearer(s.counter)).expect(200);
      expect(byCustomer.body.total).toBe(3);
    });

    it.each([
      ['sort=budget', /sort must be one of: title, status, createdAt, updatedAt/],
      ['status=parked', /status must be one of/],
      ['customerId=42', /customerId must be a UUID/],
    ])('refuses ?%s with 400', async (query, message) => {
      const response = await t.http.get(`/api/projects?${query}`).set(...bearer(s.owner)).expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details.join(' | ')).toMatch(message);
    });
  });
});
