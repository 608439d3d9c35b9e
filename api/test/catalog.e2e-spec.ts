import { DEMO_CATALOG, DEMO_CATALOG_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, countRows, createTestApp, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';

/** A valid oil pan body: the rear-sump demo pan without its id. */
function panBody(): Record<string, unknown> {
  const { id: _id, ...rest } = structuredClone(DEMO_CATALOG.oilPans[1]);
  return { ...rest, name: 'Bench test rear-sump pan' };
}

/** A valid belt body: ribs and length; the server fills in the profile and the designation. */
function beltBody(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return { name: 'Bench test belt', ribs: 6, effectiveLengthMm: 1232, stockOnHand: 2, ...overrides };
}

describe('catalog', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let other: Session;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    demo = await signInAllRoles(t.http);
    other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
  });

  afterAll(() => t.close());

  it('seeds idempotently by fixed ids', async () => {
    const before = await countRows(t.dataSource, 'catalog_oil_pans');
    expect(await seedCatalog(t.dataSource)).toEqual({ inserted: 0 });
    expect(await countRows(t.dataSource, 'catalog_oil_pans')).toBe(before);
  });

  it('creates, reads, updates and deletes an oil pan; the spec carries the row id', async () => {
    const created = await t.http.post('/api/catalog/oil-pans').set(...bearer(demo.counter)).send(panBody());
    expect(created.status).toBe(201);
    expect(created.body.spec.id).toBe(created.body.id);
    expect(created.body.spec.sumpPosition).toBe('rear');

    const read = await t.http.get(`/api/catalog/oil-pans/${created.body.id}`).set(...bearer(demo.fabricator));
    expect(read.status).toBe(200);
    expect(read.body.name).toBe('Bench test rear-sump pan');

    const updated = await t.http
      .patch(`/api/catalog/oil-pans/${created.body.id}`)
      .set(...bearer(demo.estimator))
      .send({ sumpPosition: 'center', capacityL: 6.1 });
    expect(updated.status).toBe(200);
    expect(updated.body.spec).toMatchObject({ id: created.body.id, sumpPosition: 'center', capacityL: 6.1, railPattern: 'KS-V8' });

    const filtered = await t.http.get('/api/catalog/oil-pans?sumpPosition=center&railPattern=KS-V8').set(...bearer(demo.owner));
    expect(filtered.status).toBe(200);
    expect(filtered.body.items.map((item: { id: string }) => item.id)).toContain(created.body.id);
    expect(filtered.body.items.every((item: { spec: { sumpPosition: string } }) => item.spec.sumpPosition === 'center')).toBe(true);

    const removed = await t.http.delete(`/api/catalog/oil-pans/${created.body.id}`).set(...bearer(demo.owner));
    expect(removed.status).toBe(204);
    expect((await t.http.get(`/api/catalog/oil-pans/${created.body.id}`).set(...bearer(demo.owner))).status).toBe(404);
  });

  it('lists paginated and searches by name', async () => {
    const response = await t.http.get('/api/catalog/engines?search=kestrel&pageSize=1').set(...bearer(demo.counter));
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ total: 2, page: 1, pageSize: 1 });
    expect(response.body.items).toHaveLength(1);
    const byBell = await t.http.get('/api/catalog/transmissions?bellPattern=DM-5').set(...bearer(demo.counter));
    expect(byBell.body.items.map((item: { id: string }) => item.id)).toEqual([DEMO_CATALOG_IDS.transmissions.dunmore5]);
  });

  it('refuses a filter the kind does not have', async () => {
    const response = await t.http.get('/api/catalog/engines?sumpPosition=rear').set(...bearer(demo.owner));
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/engines cannot be filtered by sumpPosition/);
  });

  it('keeps the chassis stock placement beside the spec', async () => {
    const response = await t.http.get(`/api/catalog/chassis/${DEMO_CATALOG_IDS.chassis.stag84}`).set(...bearer(demo.owner));
    expect(response.status).toBe(200);
    expect(response.body.defaultPlacement).toEqual({ setbackMm: 700, heightMm: 590, tiltDeg: 3 });
    expect(response.body.spec.defaultPlacement).toBeUndefined();
  });

  describe('validation (400, nothing written)', () => {
    const cases: Array<{ what: string; body: () => Record<string, unknown>; message: RegExp }> = [
      { what: 'an unknown field', body: () => ({ ...panBody(), colour: 'blue' }), message: /property colour should not exist/ },
      {
        what: 'an unknown nested field',
        body: () => {
          const body = panBody();
          (body.bottomProfile as Array<Record<string, unknown>>)[0].x = 3;
          return body;
        },
        message: /property x should not exist/,
      },
      {
        what: 'a pan outline point above the crank (w > 0)',
        body: () => {
          const body = panBody();
          (body.bottomProfile as Array<{ u: number; w: number }>)[2].w = 40;
          return body;
        },
        message: /bottomProfile\.2\.w must be negative/,
      },
      {
        what: 'a pan outline with too few points',
        body: () => ({ ...panBody(), bottomProfile: [{ u: 10, w: -100 }, { u: 200, w: -100 }] }),
        message: /bottomProfile must have at least 3 items/,
      },
      { what: 'a string where a number belongs', body: () => ({ ...panBody(), capacityL: '5.7' }), message: /capacityL must be a number/ },
      { what: 'a value outside the union', body: () => ({ ...panBody(), sumpPosition: 'side' }), message: /sumpPosition must be one of: front, center, rear, dual/ },
      { what: 'a missing field', body: () => ({ ...panBody(), railPattern: undefined }), message: /railPattern must/ },
      { what: 'an id in the body', body: () => ({ ...panBody(), id: 'mine' }), message: /property id should not exist/ },
    ];

    it.each(cases)('refuses $what', async ({ body, message }) => {
      const before = await countRows(t.dataSource, 'catalog_oil_pans');
      const response = await t.http.post('/api/catalog/oil-pans').set(...bearer(demo.owner)).send(body());
      expect(response.status).toBe(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details.join('\n')).toMatch(message);
      expect(await countRows(t.dataSource, 'catalog_oil_pans')).toBe(before);
    });

    it('refuses a bad update and keeps the stored spec', async () => {
      const id = DEMO_CATALOG_IDS.oilPans.kestrelRearSwap;
      const response = await t.http
        .patch(`/api/catalog/oil-pans/${id}`)
        .set(...bearer(demo.owner))
        .send({ bottomProfile: [{ u: 1, w: 5 }] });
      expect(response.status).toBe(400);
      const [row] = await t.dataSource.query('SELECT spec FROM catalog_oil_pans WHERE id = ?', [id]);
      expect(JSON.parse(row.spec).bottomProfile).toEqual(DEMO_CATALOG.oilPans[1].bottomProfile);
    });

    it('validates a nested engine body', async () => {
      const { id: _id, ...engine } = structuredClone(DEMO_CATALOG.engines[0]);
      const bad = { ...engine, mountBosses: { left: engine.mountBosses.left }, cylinders: 8.5 };
      const response = await t.http.post('/api/catalog/engines').set(...bearer(demo.owner)).send(bad);
      expect(response.status).toBe(400);
      expect(response.body.details).toEqual(expect.arrayContaining(['cylinders must be an integer number', 'mountBosses.right must be an object']));
      const ok = await t.http.post('/api/catalog/engines').set(...bearer(demo.owner)).send(engine);
      expect(ok.status).toBe(201);
      expect(ok.body.spec.panRail.pattern).toBe('KS-V8');
    });
  });

  it("answers 404 for another shop's catalog item, for read, update and delete", async () => {
    const created = await t.http.post('/api/catalog/oil-pans').set(...bearer(other)).send(panBody());
    expect(created.status).toBe(201);
    const path = `/api/catalog/oil-pans/${created.body.id}`;
    for (const call of [t.http.get(path), t.http.patch(path).send({ capacityL: 4 }), t.http.delete(path)]) {
      const response = await call.set(...bearer(demo.owner));
      expect(response.status).toBe(404);
      expect(response.body.code).toBe('catalog_item_not_found');
    }
    const list = await t.http.get('/api/catalog/oil-pans?pageSize=100').set(...bearer(demo.owner));
    expect(list.body.items.map((item: { id: string }) => item.id)).not.toContain(created.body.id);
    const mine = await t.http.get(path).set(...bearer(other));
    expect(mine.body.spec.capacityL).toBe(DEMO_CATALOG.oilPans[1].capacityL);
  });

  describe('roles', () => {
    it('gives customers no catalog access', async () => {
      expect((await t.http.get('/api/catalog/engines').set(...bearer(demo.customer))).status).toBe(403);
      expect((await t.http.post('/api/catalog/oil-pans').set(...bearer(demo.customer)).send(panBody())).status).toBe(403);
    });

    it('lets the counter write and the fabricator only read', async () => {
      expect((await t.http.post('/api/catalog/oil-pans').set(...bearer(demo.counter)).send(panBody())).status).toBe(201);
      expect((await t.http.get('/api/catalog/oil-pans').set(...bearer(demo.fabricator))).status).toBe(200);
      const refused = await t.http.post('/api/catalog/oil-pans').set(...bearer(demo.fabricator)).send(panBody());
      expect(refused.status).toBe(403);
      const patch = await t.http
        .patch(`/api/catalog/oil-pans/${DEMO_CATALOG_IDS.oilPans.kestrelRearSwap}`)
        .set(...bearer(demo.fabricator))
        .send({ capacityL: 4 });
      expect(patch.status).toBe(403);
    });
  });

  it('refuses to delete a part chosen in a project\'s fit selections (409)', async () => {
    const response = await t.http.delete(`/api/catalog/oil-pans/${DEMO_CATALOG_IDS.oilPans.kestrelStockFront}`).set(...bearer(demo.owner));
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('still_referenced');
  });

  describe('serpentine belts', () => {
    it('seeds the demo belt stock with designations', async () => {
      const response = await t.http.get(`/api/catalog/belts/${DEMO_CATALOG_IDS.belts.sixPk1225}`).set(...bearer(demo.fabricator));
      expect(response.status).toBe(200);
      expect(response.body.spec).toMatchObject({ ribs: 6, profile: 'PK', effectiveLengthMm: 1225, designation: '6PK1225' });
      expect(response.body.name).toBe('Ironbark stock 6PK1225');
    });

    it('creates, reads, filters by ribs, updates and deletes a belt; the designation follows ribs and length', async () => {
      const created = await t.http.post('/api/catalog/belts').set(...bearer(demo.counter)).send(beltBody());
      expect(created.status).toBe(201);
      // Source: ISO 9982:2019 (PK rib pitch 3.56 mm; designation ribs × profile × effective length)
      expect(created.body.spec).toEqual({
        id: created.body.id,
        name: 'Bench test belt',
        ribs: 6,
        profile: 'PK',
        effectiveLengthMm: 1232,
        designation: '6PK1232',
        stockOnHand: 2,
      });

      const read = await t.http.get(`/api/catalog/belts/${created.body.id}`).set(...bearer(demo.fabricator));
      expect(read.status).toBe(200);
      expect(read.body.spec.designation).toBe('6PK1232');

      const sixes = await t.http.get('/api/catalog/belts?ribs=6&pageSize=100').set(...bearer(demo.owner));
      expect(sixes.status).toBe(200);
      expect(sixes.body.items.map((item: { id: string }) => item.id)).toContain(created.body.id);
      expect(sixes.body.items.every((item: { spec: { ribs: number } }) => item.spec.ribs === 6)).toBe(true);
      const fives = await t.http.get('/api/catalog/belts?ribs=5').set(...bearer(demo.owner));
      expect(fives.body.items.map((item: { id: string }) => item.id)).toEqual([DEMO_CATALOG_IDS.belts.fivePk1223]);

      const updated = await t.http
        .patch(`/api/catalog/belts/${created.body.id}`)
        .set(...bearer(demo.estimator))
        .send({ ribs: 8, effectiveLengthMm: 1510.4 });
      expect(updated.status).toBe(200);
      expect(updated.body.spec).toMatchObject({ id: created.body.id, ribs: 8, effectiveLengthMm: 1510.4, designation: '8PK1510', stockOnHand: 2 });
      const [row] = await t.dataSource.query('SELECT ribs FROM catalog_belts WHERE id = ?', [created.body.id]);
      expect(Number(row.ribs)).toBe(8);

      const removed = await t.http.delete(`/api/catalog/belts/${created.body.id}`).set(...bearer(demo.owner));
      expect(removed.status).toBe(204);
      expect((await t.http.get(`/api/catalog/belts/${created.body.id}`).set(...bearer(demo.owner))).status).toBe(404);
    });

    it('refuses a filter belts do not have, and ribs on other kinds', async () => {
      expect((await t.http.get('/api/catalog/belts?railPattern=KS-V8').set(...bearer(demo.owner))).status).toBe(400);
      const engines = await t.http.get('/api/catalog/engines?ribs=6').set(...bearer(demo.owner));
      expect(engines.status).toBe(400);
      expect(engines.body.message).toMatch(/engines cannot be filtered by ribs/);
    });

    const cases: Array<{ what: string; body: () => Record<string, unknown>; message: RegExp }> = [
      { what: 'too few ribs', body: () => beltBody({ ribs: 2 }), message: /ribs must not be less than 3/ },
      { what: 'too many ribs', body: () => beltBody({ ribs: 13 }), message: /ribs must not be greater than 12/ },
      { what: 'a fractional rib count', body: () => beltBody({ ribs: 6.5 }), message: /ribs must be an integer number/ },
      { what: 'a length typed in inches', body: () => beltBody({ effectiveLengthMm: 48.2 }), message: /effectiveLengthMm must not be less than 400/ },
      { what: 'an unknown field', body: () => beltBody({ colour: 'black' }), message: /property colour should not exist/ },
      { what: 'a designation in the body', body: () => beltBody({ designation: '6PK9999' }), message: /property designation should not exist/ },
      { what: 'a profile other than PK', body: () => beltBody({ profile: 'PJ' }), message: /profile must be one of: PK/ },
      { what: 'a missing length', body: () => beltBody({ effectiveLengthMm: undefined }), message: /effectiveLengthMm must/ },
    ];

    it.each(cases)('refuses $what (400, nothing written)', async ({ body, message }) => {
      const before = await countRows(t.dataSource, 'catalog_belts');
      const response = await t.http.post('/api/catalog/belts').set(...bearer(demo.owner)).send(body());
      expect(response.status).toBe(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details.join('\n')).toMatch(message);
      expect(await countRows(t.dataSource, 'catalog_belts')).toBe(before);
    });

    it('refuses a bad belt update and keeps the stored spec', async () => {
      const id = DEMO_CATALOG_IDS.belts.sixPk1120;
      const response = await t.http.patch(`/api/catalog/belts/${id}`).set(...bearer(demo.owner)).send({ ribs: 20 });
      expect(response.status).toBe(400);
      const [row] = await t.dataSource.query('SELECT spec, ribs FROM catalog_belts WHERE id = ?', [id]);
      expect(JSON.parse(row.spec)).toMatchObject({ ribs: 6, designation: '6PK1120' });
      expect(Number(row.ribs)).toBe(6);
    });

    it('lets the fabricator read belts but not write them; customers see none', async () => {
      expect((await t.http.get('/api/catalog/belts').set(...bearer(demo.fabricator))).status).toBe(200);
      expect((await t.http.post('/api/catalog/belts').set(...bearer(demo.fabricator)).send(beltBody())).status).toBe(403);
      expect((await t.http.get('/api/catalog/belts').set(...bearer(demo.customer))).status).toBe(403);
    });
  });
});
