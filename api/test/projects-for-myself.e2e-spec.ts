import { DEMO_CUSTOMER_IDS } from '@swapwright/seed-data';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, countRows, Session, signIn, signUpThroughMail, startTestApp, TestApp } from './helpers/test-app';

/** A person building their own truck plans a swap under their own customer record, made once and found again. */
describe('projects for oneself', () => {
  let t: TestApp;
  let builder: Session;

  beforeAll(async () => {
    t = await startTestApp();
    builder = await signUpThroughMail(t.http, {
      email: 'wren.halloway@builder.test',
      password: 'own-truck-password',
      name: 'Wren Halloway',
      shopName: 'Halloway Garage',
    });
  });

  afterAll(() => t.close());

  const ownRecords = (shopId: string, userId: string) =>
    t.dataSource.query('SELECT id, name, email, userId FROM customers WHERE shopId = ? AND userId = ?', [shopId, userId]);

  it('files the first project under a customer record for the signed-in person, made in the same request', async () => {
    const customersBefore = await countRows(t.dataSource, 'customers');
    const projectsBefore = await countRows(t.dataSource, 'projects');
    const response = await t.http
      .post('/api/projects')
      .set(...bearer(builder))
      .send({ forMyself: true, title: 'Own hauler: diesel swap', vehicleDescription: 'Invented 1979 flatbed' })
      .expect(201);
    expect(response.body.customer.name).toBe('Wren Halloway');
    expect(response.body.status).toBe('intake');
    const rows = await ownRecords(builder.user.shop.id, builder.user.id);
    expect(rows).toEqual([{ id: response.body.customerId, name: 'Wren Halloway', email: 'wren.halloway@builder.test', userId: builder.user.id }]);
    expect(await countRows(t.dataSource, 'customers')).toBe(customersBefore + 1);
    expect(await countRows(t.dataSource, 'projects')).toBe(projectsBefore + 1);
  });

  it('reuses that record for the next project, also after the person changed their e-mail', async () => {
    const [first] = await ownRecords(builder.user.shop.id, builder.user.id);
    await t.dataSource.query('UPDATE users SET email = ? WHERE id = ?', ['wren.h@builder.test', builder.user.id]);
    const customersBefore = await countRows(t.dataSource, 'customers');
    const response = await t.http.post('/api/projects').set(...bearer(builder)).send({ forMyself: true, title: 'Second build' }).expect(201);
    expect(response.body.customerId).toBe(first.id);
    expect(await countRows(t.dataSource, 'customers')).toBe(customersBefore);
    const list = await t.http.get(`/api/projects?customerId=${first.id}`).set(...bearer(builder)).expect(200);
    expect(list.body.items.map((p: { title: string }) => p.title).sort()).toEqual(['Own hauler: diesel swap', 'Second build']);
  });

  it('gives each staff member of a shop their own record, apart from the shop customers', async () => {
    const estimator = await signIn(t.http, 'estimator@ironbark.test');
    const owner = await signIn(t.http, 'owner@ironbark.test');
    const a = await t.http.post('/api/projects').set(...bearer(estimator)).send({ forMyself: true, title: 'Estimator own truck' }).expect(201);
    const b = await t.http.post('/api/projects').set(...bearer(owner)).send({ forMyself: true, title: 'Owner own truck' }).expect(201);
    expect(a.body.customerId).not.toBe(b.body.customerId);
    expect(Object.values(DEMO_CUSTOMER_IDS)).not.toContain(a.body.customerId);
    expect(a.body.customer.name).toBe(estimator.user.name);
    const byCustomer = await t.http.post('/api/projects').set(...bearer(owner)).send({ customerId: DEMO_CUSTOMER_IDS.juno, title: 'For a customer' }).expect(201);
    expect(byCustomer.body.customerId).toBe(DEMO_CUSTOMER_IDS.juno);
    // Each project says whose truck it is to the one reading it: the estimator's own is theirs, to the owner a shop job.
    expect([a.body.forMyself, b.body.forMyself, byCustomer.body.forMyself]).toEqual([true, true, false]);
    expect((await t.http.get(`/api/projects/${a.body.id}`).set(...bearer(owner)).expect(200)).body.forMyself).toBe(false);
    const listed = await t.http.get('/api/projects?pageSize=100').set(...bearer(estimator)).expect(200);
    const own = new Map(listed.body.items.map((p: { id: string; forMyself: boolean }) => [p.id, p.forMyself]));
    expect([own.get(a.body.id), own.get(b.body.id), own.get(byCustomer.body.id)]).toEqual([true, false, false]);
  });

  it("marks the member's own record as theirs in the customers list and by id, and nobody else's", async () => {
    const [own] = await ownRecords(builder.user.shop.id, builder.user.id);
    const list = await t.http.get('/api/customers').set(...bearer(builder)).expect(200);
    // still listed, so the own-truck projects filed under it stay reachable
    expect(list.body.items.map((c: { id: string; ownRecord: boolean }) => [c.id, c.ownRecord])).toEqual([[own.id, true]]);
    expect((await t.http.get(`/api/customers/${own.id}`).set(...bearer(builder)).expect(200)).body.ownRecord).toBe(true);

    // In a shop with customers: the estimator's own record is theirs to the estimator, one more record to the owner.
    const estimator = await signIn(t.http, 'estimator@ironbark.test');
    const owner = await signIn(t.http, 'owner@ironbark.test');
    const [estimatorsOwn] = await ownRecords(estimator.user.shop.id, estimator.user.id);
    const flags = async (session: Session) => {
      const page = await t.http.get('/api/customers?pageSize=100').set(...bearer(session)).expect(200);
      return new Map(page.body.items.map((c: { id: string; ownRecord: boolean }) => [c.id, c.ownRecord]));
    };
    const seenByEstimator = await flags(estimator);
    const seenByOwner = await flags(owner);
    expect(seenByEstimator.get(estimatorsOwn.id)).toBe(true);
    expect(seenByOwner.get(estimatorsOwn.id)).toBe(false);
    expect([...seenByEstimator.values()].filter(Boolean)).toHaveLength(1);
    expect(seenByEstimator.get(DEMO_CUSTOMER_IDS.juno)).toBe(false);
  });

  it('asks for exactly one of customerId and forMyself, writing nothing otherwise', async () => {
    const customersBefore = await countRows(t.dataSource, 'customers');
    const projectsBefore = await countRows(t.dataSource, 'projects');
    const fresh = await signUpThroughMail(t.http, { email: 'pell.orrick@builder.test', password: 'own-truck-password', name: 'Pell Orrick', shopName: 'Orrick Barn' });
    const customersAfterSignUp = await countRows(t.dataSource, 'customers');
    for (const body of [
      { title: 'Neither' },
      { forMyself: false, title: 'Neither either' },
      { forMyself: true, customerId: DEMO_CUSTOMER_IDS.juno, title: 'Both' },
    ]) {
      const response = await t.http.post('/api/projects').set(...bearer(fresh)).send(body).expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.message).toMatch(/either customerId .* or forMyself: true/);
    }
    const wrongType = await t.http.post('/api/projects').set(...bearer(fresh)).send({ forMyself: 'yes', title: 'Text' }).expect(400);
    expect(wrongType.body.details).toContain('forMyself must be true or false');
    expect(await countRows(t.dataSource, 'customers')).toBe(customersAfterSignUp);
    expect(customersAfterSignUp).toBe(customersBefore);
    expect(await countRows(t.dataSource, 'projects')).toBe(projectsBefore);
  });

  it("still answers 404 for another shop's customer", async () => {
    const projectsBefore = await countRows(t.dataSource, 'projects');
    const response = await t.http.post('/api/projects').set(...bearer(builder)).send({ customerId: OTHER_SHOP.customerId, title: 'Not ours' }).expect(404);
    expect(response.body.code).toBe('customer_not_found');
    expect(await countRows(t.dataSource, 'projects')).toBe(projectsBefore);
  });

  it('is not a field a project can be changed with', async () => {
    const [project] = await t.dataSource.query('SELECT id FROM projects WHERE title = ?', ['Second build']);
    const response = await t.http.patch(`/api/projects/${project.id}`).set(...bearer(builder)).send({ forMyself: true }).expect(400);
    expect(response.body.details).toContain('property forMyself should not exist');
  });
});
