import { DEMO_CATALOG_IDS, DEMO_CUSTOMER_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

const PANS = DEMO_CATALOG_IDS.oilPans;
const PICKUPS = DEMO_CATALOG_IDS.oilPickups;

describe('fit selections: PATCH merges on the server', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let projectId: string;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    demo = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  // Each case works on a project of its own, with no selections saved yet.
  beforeEach(async () => {
    const created = await t.http
      .post('/api/projects')
      .set(...bearer(demo.estimator))
      .send({
        customerId: DEMO_CUSTOMER_IDS.juno,
        title: `Selections case ${expect.getState().currentTestName}`,
        chassisModelId: DEMO_CATALOG_IDS.chassis.ridgeback78,
        engineProfileId: DEMO_CATALOG_IDS.engines.kestrel53,
      });
    expect(created.status).toBe(201);
    projectId = created.body.id;
  });

  const path = () => `/api/projects/${projectId}/fit-selections`;

  it('changes only the fields given; a field left out stays; null clears one', async () => {
    const first = await t.http.patch(path()).set(...bearer(demo.estimator)).send({ oilPanId: PANS.kestrelRearSwap, tireDiameterMm: 760 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ projectId, oilPanId: PANS.kestrelRearSwap, tireDiameterMm: 760, oilPickupId: null, axleRatio: null });

    const second = await t.http.patch(path()).set(...bearer(demo.fabricator)).send({ oilPickupId: PICKUPS.kestrelRear, axleRatio: 3.73 });
    expect(second.status).toBe(200);
    expect(second.body).toMatchObject({ oilPanId: PANS.kestrelRearSwap, oilPickupId: PICKUPS.kestrelRear, tireDiameterMm: 760, axleRatio: 3.73 });

    const cleared = await t.http.patch(path()).set(...bearer(demo.owner)).send({ tireDiameterMm: null });
    expect(cleared.status).toBe(200);
    expect(cleared.body).toMatchObject({ oilPanId: PANS.kestrelRearSwap, oilPickupId: PICKUPS.kestrelRear, tireDiameterMm: null, axleRatio: 3.73 });

    const stored = await t.http.get(path()).set(...bearer(demo.counter));
    expect(stored.body).toEqual(cleared.body);
  });

  it('takes the driveshaft as one field: given, it replaces the whole shaft', async () => {
    await t.http
      .patch(path())
      .set(...bearer(demo.estimator))
      .send({ driveshaft: { outerDiameterMm: 76.2, wallMm: 1.65, material: 'steel', lengthMm: 1320 } })
      .expect(200);
    const replaced = await t.http
      .patch(path())
      .set(...bearer(demo.estimator))
      .send({ driveshaft: { outerDiameterMm: 88.9, wallMm: 2.1, material: 'aluminum' } });
    expect(replaced.status).toBe(200);
    expect(replaced.body.driveshaft).toEqual({ outerDiameterMm: 88.9, wallMm: 2.1, material: 'aluminum' });
  });

  it('two PATCHes of different fields sent at the same moment both stay', async () => {
    // First round: no row yet, so both requests also race to create it; second round: the row exists.
    const rounds = [
      [{ oilPanId: PANS.kestrelRearSwap }, { oilPickupId: PICKUPS.kestrelRear }, { tireDiameterMm: 760 }, { topSpeedKph: 160 }],
      [{ oilPanId: PANS.kestrelDeepRear }, { oilPickupId: PICKUPS.kestrelCenter }, { axleRatio: 4.1 }, { continuousPowerKw: 180 }],
    ];
    for (const bodies of rounds) {
      const answers = await Promise.all(bodies.map((body) => t.http.patch(path()).set(...bearer(demo.estimator)).send(body)));
      expect(answers.map((answer) => answer.status)).toEqual([200, 200, 200, 200]);
      const stored = await t.http.get(path()).set(...bearer(demo.estimator));
      expect(stored.body).toMatchObject(Object.assign({}, ...bodies));
    }
    const stored = await t.http.get(path()).set(...bearer(demo.estimator));
    // Fields of the first round that the second left alone are still there.
    expect(stored.body).toMatchObject({ tireDiameterMm: 760, topSpeedKph: 160 });
  });

  it('refuses an unknown part and a role that may not write; nothing changes', async () => {
    await t.http.patch(path()).set(...bearer(demo.estimator)).send({ oilPanId: PANS.kestrelRearSwap }).expect(200);
    const unknown = await t.http
      .patch(path())
      .set(...bearer(demo.estimator))
      .send({ oilPickupId: '5a0b1c2d-0000-4000-8000-0000000005ff', tireDiameterMm: 760 });
    expect(unknown.status).toBe(400);
    expect(unknown.body.details.join('\n')).toMatch(/oilPickupId: there is no oil pickup/);
    expect((await t.http.patch(path()).set(...bearer(demo.counter)).send({ tireDiameterMm: 700 })).status).toBe(403);
    const stored = await t.http.get(path()).set(...bearer(demo.estimator));
    expect(stored.body).toMatchObject({ oilPanId: PANS.kestrelRearSwap, oilPickupId: null, tireDiameterMm: null });
  });
});
