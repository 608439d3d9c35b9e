import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
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
    { what: 'an unknown status', table: 'projects', path: '/api/projects', body: { ...validProject, status: 'finished' }, message: /status must be one of/ },
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

  it('refuses a fabricator changing more than placement and status, and changes nothing', async () => {
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
});
