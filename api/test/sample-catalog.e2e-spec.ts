import { DEMO_CATALOG, DEMO_CATALOG_IDS, DEMO_SHOP_ID } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, countRows, Session, signIn, signUpThroughMail, startTestApp, TestApp } from './helpers/test-app';

const TABLES = {
  engines: 'catalog_engines',
  chassis: 'catalog_chassis',
  transmissions: 'catalog_transmissions',
  'oil-pans': 'catalog_oil_pans',
  'oil-pickups': 'catalog_oil_pickups',
  'oil-pumps': 'catalog_oil_pumps',
  controllers: 'catalog_controllers',
  'mount-adapters': 'catalog_mount_adapters',
  'bellhousing-adapters': 'catalog_bellhousing_adapters',
  belts: 'catalog_belts',
} as const;
type Kind = keyof typeof TABLES;

/** How many records of each kind the sample catalog holds: the demo catalog in seed-data. */
const SAMPLE_COUNTS: Record<Kind, number> = {
  engines: DEMO_CATALOG.engines.length,
  chassis: DEMO_CATALOG.chassis.length,
  transmissions: DEMO_CATALOG.transmissions.length,
  'oil-pans': DEMO_CATALOG.oilPans.length,
  'oil-pickups': DEMO_CATALOG.oilPickups.length,
  'oil-pumps': DEMO_CATALOG.oilPumps.length,
  controllers: DEMO_CATALOG.controllers.length,
  'mount-adapters': DEMO_CATALOG.mountAdapters.length,
  'bellhousing-adapters': DEMO_CATALOG.bellhousingAdapters.length,
  belts: DEMO_CATALOG.belts.length,
};
const SAMPLE_TOTAL = Object.values(SAMPLE_COUNTS).reduce((a, b) => a + b, 0);

/** A person who signs up to build their own truck starts the new shop's catalog from the sample and runs a fit check. */
describe('sample catalog', () => {
  let t: TestApp;
  let builder: Session;

  beforeAll(async () => {
    t = await startTestApp();
    builder = await signUpThroughMail(t.http, {
      email: `tamsin.orley.${Date.now()}@builder.test`,
      password: 'own-truck-password',
      name: 'Tamsin Orley',
      shopName: 'Orley Back Shed',
    });
  });

  afterAll(() => t.close());

  const shopCounts = async (shopId: string): Promise<Record<Kind, number>> => {
    const counts = {} as Record<Kind, number>;
    for (const [kind, table] of Object.entries(TABLES) as Array<[Kind, string]>) {
      const [row] = await t.dataSource.query(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE shopId = ?`, [shopId]);
      counts[kind] = Number(row.n);
    }
    return counts;
  };

  /** A project for the signed-up person's own truck, with the goals the fit check needs besides its parts. */
  const ownProject = (title: string) =>
    t.http
      .post('/api/projects')
      .set(...bearer(builder))
      .send({ forMyself: true, title, goals: { use: 'street', revLimitRpm: 5800 } })
      .expect(201);

  const allCatalogRows = async () => {
    let n = 0;
    for (const table of Object.values(TABLES)) n += await countRows(t.dataSource, table);
    return n;
  };

  it('asks for an engine and a chassis in words and where, pointing an empty catalog at the catalog and the sample', async () => {
    const project = await ownProject('Own flatbed');
    const run = await t.http.post(`/api/projects/${project.body.id}/fit-reports`).set(...bearer(builder));
    expect(run.status).toBe(422);
    expect(run.body.code).toBe('fit_check_not_ready');
    expect(run.body.message).toBe(
      'Before the fit check can run, choose an engine and a chassis under "What goes in" on the fit check page; ' +
        'your catalog has no engines or chassis yet: add them on the Catalog page, or start from the sample catalog.',
    );
    // A person reads it: no request field names.
    expect(run.body.message).not.toMatch(/engineProfileId|chassisModelId|\(\w+Id\)/);
  });

  it('refuses every role but the owner (403) and writes nothing', async () => {
    const before = await allCatalogRows();
    for (const email of ['estimator@ironbark.test', 'fabricator@ironbark.test', 'counter@ironbark.test', 'customer@ironbark.test']) {
      const session = await signIn(t.http, email);
      const response = await t.http.post('/api/catalog/sample').set(...bearer(session));
      expect({ email, status: response.status }).toEqual({ email, status: 403 });
    }
    expect((await t.http.post('/api/catalog/sample')).status).toBe(401);
    expect(await allCatalogRows()).toBe(before);
  });

  it("copies every sample record into the owner's shop in one go, with the shop's own ids", async () => {
    const demoBefore = await shopCounts(DEMO_SHOP_ID);
    const response = await t.http.post('/api/catalog/sample').set(...bearer(builder)).expect(200);
    expect(response.body.added).toBe(SAMPLE_TOTAL);
    expect(response.body.alreadyThere).toBe(0);
    expect(Object.fromEntries(response.body.kinds.map((k: { kind: Kind; added: number }) => [k.kind, k.added]))).toEqual(SAMPLE_COUNTS);
    expect(response.body.message).toMatch(/^Added \d+ sample records to your catalog: 3 engines, 3 chassis, /);
    expect(await shopCounts(builder.user.shop.id)).toEqual(SAMPLE_COUNTS);
    expect(await shopCounts(DEMO_SHOP_ID)).toEqual(demoBefore);

    const engines = await t.http.get('/api/catalog/engines?pageSize=100').set(...bearer(builder)).expect(200);
    expect(engines.body.items.map((e: { name: string }) => e.name).sort()).toEqual(DEMO_CATALOG.engines.map((e) => e.name).sort());
    const demoIds = Object.values(DEMO_CATALOG_IDS).flatMap((ids) => Object.values(ids) as string[]);
    for (const item of engines.body.items) {
      expect(demoIds).not.toContain(item.id);
      expect(item.spec.id).toBe(item.id);
    }
    const belts = await t.http.get('/api/catalog/belts?pageSize=100').set(...bearer(builder)).expect(200);
    for (const belt of belts.body.items) {
      // The demo shop's shelf counts stay the demo shop's; the name says what the belt is.
      expect(belt.spec.stockOnHand).toBeUndefined();
      expect(belt.name).toBe(`${belt.spec.designation} serpentine belt`);
      expect(belt.name).not.toMatch(/Ironbark/);
    }
    const mounts = await t.http.get('/api/catalog/mount-adapters?pageSize=100').set(...bearer(builder)).expect(200);
    for (const mount of mounts.body.items) expect(mount.name).not.toMatch(/Ironbark/);
  });

  it('adds nothing on a second press and says so, keeping the records the owner changed', async () => {
    const engines = await t.http.get('/api/catalog/engines?pageSize=100').set(...bearer(builder)).expect(200);
    const renamed = engines.body.items[0];
    await t.http.patch(`/api/catalog/engines/${renamed.id}`).set(...bearer(builder)).send({ name: 'My yard engine' }).expect(200);
    const before = await allCatalogRows();
    const again = await t.http.post('/api/catalog/sample').set(...bearer(builder)).expect(200);
    expect(again.body.added).toBe(0);
    expect(again.body.alreadyThere).toBe(SAMPLE_TOTAL);
    expect(again.body.message).toBe('Your catalog already has every record of the sample catalog; nothing was added.');
    expect(await allCatalogRows()).toBe(before);
    const kept = await t.http.get(`/api/catalog/engines/${renamed.id}`).set(...bearer(builder)).expect(200);
    expect(kept.body.name).toBe('My yard engine');
  });

  it('adds a removed sample record back and only that one', async () => {
    const pumps = await t.http.get('/api/catalog/oil-pumps?pageSize=100').set(...bearer(builder)).expect(200);
    await t.http.delete(`/api/catalog/oil-pumps/${pumps.body.items[0].id}`).set(...bearer(builder)).expect(204);
    const again = await t.http.post('/api/catalog/sample').set(...bearer(builder)).expect(200);
    expect(again.body.added).toBe(1);
    expect(again.body.message).toMatch(/^Added 1 sample record to your catalog: 1 oil pump\./);
    expect(await shopCounts(builder.user.shop.id)).toEqual(SAMPLE_COUNTS);
  });

  it("adds nothing to the demo shop, whose catalog is the sample's own records", async () => {
    await seedCatalog(t.dataSource);
    const owner = await signIn(t.http, 'owner@ironbark.test');
    const before = await shopCounts(DEMO_SHOP_ID);
    expect(before).toEqual(SAMPLE_COUNTS);
    const response = await t.http.post('/api/catalog/sample').set(...bearer(owner)).expect(200);
    expect(response.body.added).toBe(0);
    expect(await shopCounts(DEMO_SHOP_ID)).toEqual(before);
  });

  it('runs a fit check on a sample engine and chassis', async () => {
    const project = await ownProject('Own half-ton');
    const chassis = await t.http.get('/api/catalog/chassis?pageSize=100').set(...bearer(builder)).expect(200);
    const engines = await t.http.get('/api/catalog/engines?pageSize=100&search=Kestrel%205.3').set(...bearer(builder)).expect(200);
    const ridgeback = chassis.body.items.find((c: { spec: { name: string } }) => /Ridgeback/.test(c.spec.name));
    await t.http
      .patch(`/api/projects/${project.body.id}`)
      .set(...bearer(builder))
      .send({ engineProfileId: engines.body.items[0].id, chassisModelId: ridgeback.id })
      .expect(200);
    const run = await t.http.post(`/api/projects/${project.body.id}/fit-reports`).set(...bearer(builder));
    expect(run.status).toBe(201);
    expect(run.body.report.findings.length).toBeGreaterThan(10);
  });

  it('names only the missing part once the catalog has them', async () => {
    const project = await ownProject('Own wagon');
    const engines = await t.http.get('/api/catalog/engines?pageSize=1').set(...bearer(builder)).expect(200);
    await t.http.patch(`/api/projects/${project.body.id}`).set(...bearer(builder)).send({ engineProfileId: engines.body.items[0].id }).expect(200);
    const run = await t.http.post(`/api/projects/${project.body.id}/fit-reports`).set(...bearer(builder));
    expect(run.status).toBe(422);
    expect(run.body.message).toBe('Before the fit check can run, choose a chassis under "What goes in" on the fit check page.');
  });
});
