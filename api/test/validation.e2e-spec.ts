import { DEMO_CATALOG_IDS, DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, countRows, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

describe('validation', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    s = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  const validProject = { customerId: DEMO_CUSTOMER_IDS.caspar, title: 'Valid title', goals: { use: 'street' } };

  const BAD_WRITES = [
    { what: 'an unknown field', table: 'customers', path: '/api/customers', body: { name: 'Ok Name', shoeSize: 44 }, message: /property shoeSize should not exist/ },
    { what: 'a wrong type', table: 'customers', path: '/api/customers', body: { name: 123 }, message: /name must be a string/ },
    { what: 'a missing name', table: 'customers', path: '/api/customers', body: { email: 'x@example.test' }, message: /name/ },
    { what: 'a bad e-mail', table: 'customers', path: '/api/customers', body: { name: 'Ok', email: 'not-an-email' }, message: /email must be an e-mail address/ },
    { what: 'a too long name', table: 'customers', path: '/api/customers', body: { name: 'x'.repeat(121) }, message: /name must be shorter than or equal to 120 characters/ },
    { what: 'an unknown status', table: 'projects', path: '/api/projects', body: { ...validProject, status: 'finished' }, message: /status is not set by hand/ },
    { what: 'a stage set by hand', table: 'projects', path: '/api/projects', body: { ...validProject, status: 'done' }, message: /moves by itself when the sheet is signed off/ },
    { what: 'an out-of-range rev limit', table: 'projects', path: '/api/projects', body: { ...validProject, goals: { use: 'tow', revLimitRpm: 25000 } }, message: /revLimitRpm must not be greater than 12000/ },
    { what: 'an unknown nested field', table: 'projects', path: '/api/projects', body: { ...validProject, goals: { use: 'tow', torque: 5 } }, message: /torque should not exist/ },
    { what: 'an unknown use', table: 'projects', path: '/api/projects', body: { ...validProject, goals: { use: 'racing' } }, message: /goals.use must be one of/ },
    { what: 'an incomplete placement', table: 'projects', path: '/api/projects', body: { ...validProject, placement: { setbackMm: 500 } }, message: /heightMm/ },
    { what: 'a tilt out of range', table: 'projects', path: '/api/projects', body: { ...validProject, placement: { setbackMm: 500, heightMm: 600, tiltDeg: 45 } }, message: /tiltDeg must not be greater than 20/ },
    { what: 'a non-UUID customer', table: 'projects', path: '/api/projects', body: { ...validProject, customerId: 'abc' }, message: /customerId must be a UUID/ },
    { what: 'a string for a number', table: 'projects', path: '/api/projects', body: { ...validProject, goals: { use: 'street', budgetCents: '100' } }, message: /budgetCents must be an integer/ },
  ];

  it.each(BAD_WRITES)('refuses $what with 400 and writes nothing', async ({ table, path, body, message }) => {
    const before = await countRows(t.dataSource, table);
    const response = await t.http.post(path).set(...bearer(s.estimator)).send(body).expect(400);
    expect(response.body).toMatchObject({ statusCode: 400, error: 'Bad Request', code: 'validation_failed' });
    expect(response.body.details.join(' | ')).toMatch(message);
    expect(response.body.message).toBe(response.body.details[0]);
    expect(await countRows(t.dataSource, table)).toBe(before);
  });

  it('lists every problem in details', async () => {
    const response = await t.http.post('/api/customers').set(...bearer(s.owner)).send({ name: '', email: 'nope', extra: true }).expect(400);
    expect(response.body.details.length).toBeGreaterThanOrEqual(3);
  });

  it('refuses an out-of-range shop setting and keeps the old value', async () => {
    const before = await t.http.get('/api/shops/current').set(...bearer(s.owner)).expect(200);
    const response = await t.http.patch('/api/shops/current').set(...bearer(s.owner)).send({ taxRatePercent: 150, currency: 'dollars' }).expect(400);
    expect(response.body.details).toEqual(
      expect.arrayContaining(['taxRatePercent must not be greater than 100', expect.stringMatching(/currency must be a three-letter/)]),
    );
    const after = await t.http.get('/api/shops/current').set(...bearer(s.owner)).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('accepts good shop settings', async () => {
    const response = await t.http
      .patch('/api/shops/current')
      .set(...bearer(s.owner))
      .send({ unitSystem: 'mm', laborRatePerHour: 142.5, taxRatePercent: 7, shopSuppliesPercent: 3.5, currency: 'EUR' })
      .expect(200);
    expect(response.body).toMatchObject({ unitSystem: 'mm', laborRatePerHour: 142.5, taxRatePercent: 7, currency: 'EUR' });
  });

  it('refuses a bad update and leaves the project as it was', async () => {
    const before = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    await t.http.patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).send({ title: null }).expect(400);
    await t.http.patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).send({ id: 'x', title: 'New' }).expect(400);
    await t.http.patch(`/api/customers/${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(s.owner)).send({ name: null }).expect(400);
    const after = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('refuses a fabricator changing more than the placement, and changes nothing', async () => {
    const before = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    const response = await t.http
      .patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`)
      .set(...bearer(s.fabricator))
      .send({ placement: { setbackMm: 100, heightMm: 100, tiltDeg: 0 }, title: 'Renamed' })
      .expect(403);
    expect(response.body.code).toBe('project_fields_forbidden');
    expect(response.body.message).toMatch(/title/);
    const after = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('refuses a stage set by hand on an update, for every role, and changes nothing', async () => {
    const before = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    for (const role of ['owner', 'estimator', 'fabricator'] as const) {
      const response = await t.http.patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s[role])).send({ status: 'done' }).expect(400);
      expect(response.body.message).toMatch(/status is not set by hand/);
    }
    const after = await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('clears a placement with null', async () => {
    const response = await t.http.patch(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.fabricator)).send({ placement: null }).expect(200);
    expect(response.body.placement).toBeNull();
  });

  it('refuses malformed JSON and a non-UUID id', async () => {
    const json = await t.http.post('/api/customers').set(...bearer(s.owner)).set('Content-Type', 'application/json').send('{"name": ').expect(400);
    expect(json.body.code).toBe('invalid_json');
    const id = await t.http.get('/api/customers/not-a-uuid').set(...bearer(s.owner)).expect(400);
    expect(id.body.message).toBe('id must be a UUID');
  });

  it('refuses deleting a customer who still has projects', async () => {
    const response = await t.http.delete(`/api/customers/${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(s.owner)).expect(409);
    expect(response.body.code).toBe('customer_has_projects');
  });

  describe('catalog references of a project', () => {
    beforeAll(() => seedCatalog(t.dataSource));

    const REFS = [
      { field: 'chassisModelId', wrongKind: DEMO_CATALOG_IDS.engines.kestrel53 },
      { field: 'engineProfileId', wrongKind: DEMO_CATALOG_IDS.chassis.stag84 },
      { field: 'transmissionId', wrongKind: DEMO_CATALOG_IDS.engines.kestrel62 },
    ];

    it.each(REFS)('refuses a $field outside the shop catalog on PATCH and POST, naming it, and writes nothing', async ({ field, wrongKind }) => {
      const path = `/api/projects/${DEMO_PROJECT_IDS.ridgeback}`;
      const before = await t.http.get(path).set(...bearer(s.owner)).expect(200);
      const projects = await countRows(t.dataSource, 'projects');
      for (const id of ['nope', wrongKind]) {
        const patch = await t.http.patch(path).set(...bearer(s.owner)).send({ title: 'Renamed', [field]: id }).expect(400);
        expect(patch.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(new RegExp(`^${field} `)) });
        const post = await t.http.post('/api/projects').set(...bearer(s.estimator)).send({ ...validProject, [field]: id }).expect(400);
        expect(post.body.message).toMatch(new RegExp(`^${field} must be the id of (a chassis|an engine|a transmission) in your shop's catalog$`));
      }
      expect((await t.http.get(path).set(...bearer(s.owner)).expect(200)).body).toEqual(before.body);
      expect(await countRows(t.dataSource, 'projects')).toBe(projects);
    });

    it('accepts ids of the shop catalog and null', async () => {
      const path = `/api/projects/${DEMO_PROJECT_IDS.stag}`;
      const body = {
        chassisModelId: DEMO_CATALOG_IDS.chassis.stag84,
        engineProfileId: DEMO_CATALOG_IDS.engines.kestrel62,
        transmissionId: DEMO_CATALOG_IDS.transmissions.marlow65,
      };
      await t.http.patch(path).set(...bearer(s.owner)).send(body).expect(200);
      const cleared = await t.http.patch(path).set(...bearer(s.owner)).send({ transmissionId: null }).expect(200);
      expect(cleared.body).toMatchObject({ ...body, transmissionId: null });
      const created = await t.http.post('/api/projects').set(...bearer(s.estimator)).send({ ...validProject, ...body }).expect(201);
      expect(created.body).toMatchObject(body);
    });
  });

  describe('blank names', () => {
    it.each([
      { what: 'a customer name', path: '/api/customers', body: { name: '   ' }, message: 'name must not be empty' },
      { what: 'a project title', path: '/api/projects', body: { ...validProject, title: ' \t ' }, message: 'title must not be empty' },
      { what: 'a catalog item name', path: '/api/catalog/chassis', body: null, message: 'name must not be empty' },
    ])('refuses $what of only spaces', async ({ path, body, message }) => {
      let send: object | undefined = body ?? undefined;
      if (!send) {
        const existing = await t.http.get(`${path}/${DEMO_CATALOG_IDS.chassis.stag84}`).set(...bearer(s.owner)).expect(200);
        const { id: _id, ...spec } = existing.body.spec;
        send = { ...spec, name: '   ' };
      }
      const response = await t.http.post(path).set(...bearer(s.owner)).send(send).expect(400);
      expect(response.body.message).toBe(message);
    });

    it('refuses a blank shop name and trims a padded customer name', async () => {
      const shop = await t.http.patch('/api/shops/current').set(...bearer(s.owner)).send({ name: '  ' }).expect(400);
      expect(shop.body.message).toBe('name must not be empty');
      const update = await t.http.patch(`/api/customers/${DEMO_CUSTOMER_IDS.juno}`).set(...bearer(s.owner)).send({ name: ' ' }).expect(400);
      expect(update.body.message).toBe('name must not be empty');
      const created = await t.http.post('/api/customers').set(...bearer(s.owner)).send({ name: '  Padded Name  ' }).expect(201);
      expect(created.body.name).toBe('Padded Name');
    });
  });

  describe('the headline message', () => {
    it.each([
      { what: 'a missing name', body: {}, headline: 'name must not be empty' },
      { what: 'a number for the name', body: { name: 123 }, headline: 'name must be a string' },
      { what: 'an object for the e-mail', body: { name: 'Ok', email: { a: 1 } }, headline: 'email must be an e-mail address' },
      { what: 'an unknown field beside a too long name', body: { name: 'x'.repeat(121), extra: 1 }, headline: 'property extra should not exist' },
    ])('leads with the real problem for $what and keeps every message', async ({ body, headline }) => {
      const response = await t.http.post('/api/customers').set(...bearer(s.owner)).send(body).expect(400);
      expect(response.body.message).toBe(headline);
      expect(response.body.details[0]).toBe(headline);
      if ('name' in body && typeof body.name === 'string' && body.name.length > 120) {
        expect(response.body.details).toContain('name must be shorter than or equal to 120 characters');
      }
    });

    it('still lists the length problem of a missing name in details', async () => {
      const response = await t.http.post('/api/customers').set(...bearer(s.owner)).send({}).expect(400);
      expect(response.body.details).toEqual(expect.arrayContaining(['name must be a string', 'name must be shorter than or equal to 120 characters']));
    });
  });
});
