import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { ROUTE_POLICY } from './access/route-policy';
import { FullShop, loadFullShop } from './fixtures/full-shop.fixture';
import { OpenApiDocument, openApiPath, requestSchema, sample } from './helpers/openapi';
import { inParallel, registeredRoutes, tableChecksums } from './helpers/routes';
import { bearer, countRows, createTestApp, resetData, Session, signIn, signInAllRoles, startSignedInApp, TestApp } from './helpers/test-app';
import { makeJpeg } from './helpers/test-images';

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

/**
 * Generated from the running app: every route with a record in its path, called by the other shop's owner with ids
 * of the demo shop's records and a body the route accepts. Each must answer 404 (or 403 where the owner role is not
 * allowed at all) and change no row of any table.
 */
describe("tenant isolation of every object route, generated from the router", () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let other: Session;
  let shop: FullShop;
  let doc: OpenApiDocument;

  beforeAll(async () => {
    ({ t, s: demo } = await startSignedInApp());
    shop = await loadFullShop(t, demo);
    other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    doc = (await t.http.get('/api/docs-json').expect(200)).body as OpenApiDocument;
  });

  afterAll(() => t.close());

  /** Where each path parameter's record comes from, by the path segment in front of it. */
  function idFor(segment: string, param: string): string | undefined {
    const catalog = /^catalog\/([\w-]+)$/.exec(segment);
    if (catalog) return shop.catalogIds[catalog[1]];
    const ids: Record<string, string> = {
      'memberships:id': shop.membershipId,
      'customers:id': shop.customerId,
      'projects:id': shop.projectId,
      'projects:projectId': shop.projectId,
      'fit-reports:id': shop.fitReportId,
      'values:pointId': 'pinion.height',
      'measurement-photos:id': shop.photoId,
      'chassis:chassisId': shop.chassisId,
      'parts:id': shop.partId,
      'suppliers:id': shop.supplierId,
      'parts-plans:id': shop.partsPlanId,
      'counter-lines:id': shop.counterLineId,
      'labor-operations:id': shop.laborOperationId,
      'quotes:id': shop.quoteId,
      'work-orders:id': shop.workOrderId,
      'checks:checkKey': 'oil-pan-pickup.pickup-tabs',
      'work-order-photos:id': shop.workOrderPhotoId,
      'jobs:id': shop.deadJobId,
      'invitations:id': shop.invitationId,
    };
    return ids[`${segment.split('/').pop()}:${param}`];
  }

  /** Routes whose path parameter is not a shop record: the e-mailed quote link is its own signed credential. */
  const NOT_OBJECT_ROUTES = new Set(['GET /api/quote-links/:token', 'POST /api/quote-links/:token/answer', 'GET /api/quote-links/:token/pdf', 'POST /api/quote-links/:token/deposit']);

  /** Query values the smallest sample cannot give (two different revisions). */
  const QUERY: Record<string, Record<string, string>> = { 'GET /api/quotes/:id/compare': { from: '1', to: '2' } };

  it('sends every object route of the app with the demo shop\'s ids; each is not found and nothing changes', async () => {
    const routes = registeredRoutes(t.app).filter((route) => route.params.length > 0 && !NOT_OBJECT_ROUTES.has(route.key));
    expect(routes.length).toBeGreaterThan(60);
    const tables = t.dataSource.entityMetadatas.map((entity) => entity.tableName);
    const before = await tableChecksums((sql) => t.dataSource.query(sql), tables);
    const undecided: string[] = [];
    const wrong = (
      await inParallel(routes, 6, async (route) => {
        let missing = false;
        const path = route.path.replace(/\/?([\w-]+(?:\/[\w-]+)?)\/:(\w+)/g, (match, segment: string, param: string) => {
          const id = idFor(segment, param);
          if (!id) missing = true;
          return match.replace(`:${param}`, id ?? 'missing');
        });
        if (missing) {
          undecided.push(route.key);
          return null;
        }
        const operation = doc.paths[openApiPath(route.path)]?.[route.method];
        const body = requestSchema(doc, operation);
        const query = Object.fromEntries(
          (operation?.parameters ?? []).filter((p) => p.in === 'query' && p.required).map((p) => [p.name, String(sample(doc, p.schema))]),
        );
        Object.assign(query, QUERY[route.key]);
        let call = t.http[route.method](path).query(query).set(...bearer(other));
        if (body.type === 'multipart') call = call.attach('photos', makeJpeg(16, 16), 'peek.jpg');
        else if (route.method !== 'get' && route.method !== 'delete') call = call.send((sample(doc, body.schema) as object) ?? {});
        const response = await call;
        const policy = ROUTE_POLICY[route.key];
        const expected = policy !== 'public' && policy !== 'signed-in' && !policy.includes('owner') ? 403 : 404;
        return response.status === expected ? null : `${route.key}: expected ${expected}, got ${response.status} ${response.body?.message ?? ''}`;
      })
    ).filter(Boolean);
    expect({ undecided, wrong }).toEqual({ undecided: [], wrong: [] });
    const after = await tableChecksums((sql) => t.dataSource.query(sql), tables);
    expect(tables.filter((table) => after[table] !== before[table])).toEqual([]);
  }, 120_000);
});
