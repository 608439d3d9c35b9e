import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { seedParts } from '../src/database/seed/seed-parts';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, createTestApp, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';

/** The demo customer's own project, and a project of another customer of the same shop. */
const OWN = DEMO_PROJECT_IDS.ridgeback;
const ANOTHERS = DEMO_PROJECT_IDS.stag;

/** Every key of a JSON value, at any depth. */
function keysOf(value: unknown): Set<string> {
  const keys = new Set<string>();
  const walk = (v: unknown) => {
    if (Array.isArray(v)) v.forEach(walk);
    else if (v && typeof v === 'object') {
      for (const [key, inner] of Object.entries(v)) {
        keys.add(key);
        walk(inner);
      }
    }
  };
  walk(value);
  return keys;
}

/** What the shop keeps to itself: stock, bins, suppliers, costs, counter states, candidates passed over, solver figures. */
const SHOP_ONLY_KEYS = [
  'available',
  'onHand',
  'stock',
  'bin',
  'location',
  'costCents',
  'unitCostCents',
  'markupPercent',
  'supplierId',
  'supplierSku',
  'supplier',
  'partId',
  'fitSpecId',
  'rejected',
  'broughtInBy',
  'explanation',
  'catalogNeeds',
  'solveMs',
  'model',
  'recheck',
  'result',
  'objective',
  'fitReportId',
];

interface StaffPick {
  sku: string;
  priceCents: number;
  laborHours: number;
  totalCents: number;
  quantity: number;
}

describe("parts plans as the project's customer sees them", () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let other: Session;
  let ownPlan: { id: string; totalCents: number; result: { picks: StaffPick[]; operations: Array<{ operation: string; laborHours: number }>; totals: Record<string, number> } };
  let anothersPlanId: string;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    await seedParts(t.dataSource);
    demo = await signInAllRoles(t.http);
    other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    const built = await t.http.post(`/api/projects/${OWN}/parts-plans`).set(...bearer(demo.estimator)).send({ objective: 'lowest-cost' });
    expect(built.status).toBe(201);
    ownPlan = built.body;
    const anothers = await t.http.post(`/api/projects/${ANOTHERS}/parts-plans`).set(...bearer(demo.estimator)).send({});
    expect(anothers.status).toBe(201);
    anothersPlanId = anothers.body.id;
  });

  afterAll(() => t.close());

  it("reads their own project's plans: the parts at the plan's prices, operations with hours, totals; nothing the shop keeps to itself", async () => {
    const list = await t.http.get(`/api/projects/${OWN}/parts-plans`).set(...bearer(demo.customer));
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(1);
    const one = await t.http.get(`/api/parts-plans/${ownPlan.id}`).set(...bearer(demo.customer));
    expect(one.status).toBe(200);
    expect(one.body).toEqual(list.body[0]);

    const plan = one.body;
    expect(Object.keys(plan).sort()).toEqual(['createdAt', 'id', 'lockedAt', 'notes', 'operations', 'parts', 'projectId', 'status', 'totals', 'unresolved', 'version']);
    expect(plan).toMatchObject({ id: ownPlan.id, projectId: OWN, version: 1, status: 'draft', lockedAt: null });
    // The same parts, quantities and prices the shop's plan holds, line for line.
    expect(plan.parts).toEqual(
      ownPlan.result.picks.map((pick) => ({
        sku: pick.sku,
        description: expect.any(String),
        category: expect.any(String),
        quantity: pick.quantity,
        priceCents: pick.priceCents,
        laborHours: pick.laborHours,
        totalCents: pick.totalCents,
        resolves: expect.any(Array),
      })),
    );
    expect(plan.parts.map((p: { sku: string }) => p.sku)).toEqual(expect.arrayContaining(['TR-4410', 'TR-4411']));
    expect(plan.parts.find((p: { sku: string }) => p.sku === 'TR-4410').resolves.join(' ')).toMatch(/crossmember/i);
    expect(plan.operations.map((op: { operation: string; laborHours: number }) => [op.operation, op.laborHours])).toEqual(
      ownPlan.result.operations.map((op) => [op.operation, op.laborHours]),
    );
    expect(plan.totals).toEqual(ownPlan.result.totals);
    expect(plan.totals.totalCents).toBe(ownPlan.totalCents);

    const leaked = SHOP_ONLY_KEYS.filter((key) => keysOf(list.body).has(key) || keysOf(one.body).has(key));
    expect(leaked).toEqual([]);
  });

  it('sees a version once it is locked for a quote, with the staff still reading the whole plan', async () => {
    expect((await t.http.post(`/api/parts-plans/${ownPlan.id}/lock`).set(...bearer(demo.estimator))).status).toBe(200);
    const seen = await t.http.get(`/api/parts-plans/${ownPlan.id}`).set(...bearer(demo.customer));
    expect(seen.status).toBe(200);
    expect(seen.body.status).toBe('locked');
    expect(seen.body.lockedAt).toEqual(expect.any(String));
    const staff = await t.http.get(`/api/parts-plans/${ownPlan.id}`).set(...bearer(demo.counter));
    expect(staff.status).toBe(200);
    expect(staff.body.result.picks[0]).toHaveProperty('available');
    expect(staff.body).toHaveProperty('recheck');
  });

  it("answers 404 for another customer's project and its plans, and for another shop's", async () => {
    const list = await t.http.get(`/api/projects/${ANOTHERS}/parts-plans`).set(...bearer(demo.customer));
    expect(list.status).toBe(404);
    const one = await t.http.get(`/api/parts-plans/${anothersPlanId}`).set(...bearer(demo.customer));
    expect(one.status).toBe(404);
    expect(one.body.code).toBe('parts_plan_not_found');
    expect((await t.http.get(`/api/parts-plans/${ownPlan.id}`).set(...bearer(other))).status).toBe(404);
    expect((await t.http.get(`/api/projects/${OWN}/parts-plans`).set(...bearer(other))).status).toBe(404);
  });

  it('cannot build, lock or issue a plan, nor reach the counter lists (403)', async () => {
    const draft = await t.http.post(`/api/projects/${OWN}/parts-plans`).set(...bearer(demo.estimator)).send({});
    expect(draft.status).toBe(201);
    const refused = [
      await t.http.post(`/api/projects/${OWN}/parts-plans`).set(...bearer(demo.customer)).send({}),
      await t.http.post(`/api/parts-plans/${draft.body.id}/lock`).set(...bearer(demo.customer)),
      await t.http.post(`/api/parts-plans/${draft.body.id}/issue`).set(...bearer(demo.customer)),
      await t.http.get(`/api/parts-plans/${draft.body.id}/counter-lines`).set(...bearer(demo.customer)),
      await t.http.get(`/api/parts-plans/${draft.body.id}/pick-list.csv`).set(...bearer(demo.customer)),
      await t.http.get('/api/parts-plans').set(...bearer(demo.customer)),
    ];
    expect(refused.map((r) => r.status)).toEqual([403, 403, 403, 403, 403, 403]);
    const after = await t.http.get(`/api/parts-plans/${draft.body.id}`).set(...bearer(demo.estimator));
    expect(after.body.status).toBe('draft');
  });
});
