import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, Session, startSignedInApp, TestApp } from './helpers/test-app';

/** Values people type by mistake in the forms; the API refuses each with a message that says what to fix. */
describe('values a person can mistype', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    await seedCatalog(t.dataSource);
  });

  afterAll(() => t.close());

  async function refused(method: 'post' | 'patch', path: string, body: object, message: RegExp): Promise<void> {
    const response = await t.http[method](path).set(...bearer(s.owner)).send(body);
    expect({ status: response.status, details: response.body.details }).toEqual({ status: 400, details: expect.arrayContaining([expect.stringMatching(message)]) });
  }

  describe('customer phone', () => {
    const path = `/api/customers/${DEMO_CUSTOMER_IDS.juno}`;

    it.each([
      ['-99999999999999999999', /phone must start with a digit, \+ or \(/],
      ['99999999999999999999', /phone must have 6 to 15 digits/],
      ['12', /phone must have 6 to 15 digits/],
      ['555 + 0142', /phone may have a \+ only at the start/],
    ])('refuses %s', async (phone, message) => {
      const before = (await t.http.get(path).set(...bearer(s.owner)).expect(200)).body.phone;
      await refused('patch', path, { phone }, message);
      expect((await t.http.get(path).set(...bearer(s.owner)).expect(200)).body.phone).toBe(before);
    });

    // Source: ITU-T E.164 (an international number has at most 15 digits).
    it.each(['+1 555 0142', '(03) 9555 0142', '+44 20 7946 0958 x12', '555-0142 x7', '+123456789012345'])('accepts %s', async (phone) => {
      const response = await t.http.patch(path).set(...bearer(s.owner)).send({ phone }).expect(200);
      expect(response.body.phone).toBe(phone);
    });
  });

  describe('project goals', () => {
    const path = `/api/projects/${DEMO_PROJECT_IDS.ridgeback}`;

    it.each([
      ['12 1/2"', /goals.targetPowerKw must be a number/],
      [9.3, /goals.targetPowerKw must be between 10 and 2000 kW \(about 13 to 2,680 hp\)/],
      [5000, /goals.targetPowerKw must be between 10 and 2000 kW/],
    ])('refuses a target power of %s', async (targetPowerKw, message) => {
      await refused('patch', path, { goals: { targetPowerKw } }, message);
    });

    it.each([99_999_999_999_999, 99_999_999_999_999_00])('refuses a budget of %s cents', async (budgetCents) => {
      await refused('patch', path, { goals: { budgetCents } }, /goals.budgetCents must be at most 10000000000 .*extra digits/);
    });

    it('keeps the goals as they were after the refusals', async () => {
      const project = (await t.http.get(path).set(...bearer(s.owner)).expect(200)).body;
      expect(project.goals).toMatchObject({ targetPowerKw: 260, budgetCents: 1_450_000 });
    });
  });

  describe('outlines and the sump', () => {
    let panId: string;
    let bottomProfile: Array<{ u: number; w: number }>;

    beforeAll(async () => {
      const pans = (await t.http.get('/api/catalog/oil-pans').set(...bearer(s.owner)).expect(200)).body.items;
      panId = pans[0].id;
      bottomProfile = pans[0].spec.bottomProfile;
    });

    it('refuses two identical points in a row, naming their positions', async () => {
      const doubled = [bottomProfile[0], { ...bottomProfile[1] }, { ...bottomProfile[1] }, ...bottomProfile.slice(2)];
      await refused('patch', `/api/catalog/oil-pans/${panId}`, { bottomProfile: doubled }, /bottomProfile repeats the same point at positions 2 and 3: remove one or correct it/);
    });

    it('refuses the same slip in an engine top profile', async () => {
      const engines = (await t.http.get('/api/catalog/engines').set(...bearer(s.owner)).expect(200)).body.items;
      const top = engines[0].spec.topProfile;
      await refused('patch', `/api/catalog/engines/${engines[0].id}`, { topProfile: [top[0], top[0], ...top.slice(1)] }, /topProfile repeats the same point at positions 1 and 2/);
    });

    it('refuses a negative sump centre', async () => {
      await refused('patch', `/api/catalog/oil-pans/${panId}`, { sumpCenterU: -120 }, /sumpCenterU must be more than 0: the sump centre lies forward of the bellhousing face/);
    });

    it('refuses a sump centre beyond the pan outline given with it', async () => {
      const end = Math.max(...bottomProfile.map((point) => point.u));
      await refused('patch', `/api/catalog/oil-pans/${panId}`, { bottomProfile, sumpCenterU: end + 50 }, /sumpCenterU must lie along the bottomProfile/);
    });

    it('accepts a sump centre inside the outline', async () => {
      const us = bottomProfile.map((point) => point.u);
      const middle = Math.round((Math.min(...us) + Math.max(...us)) / 2);
      const response = await t.http.patch(`/api/catalog/oil-pans/${panId}`).set(...bearer(s.owner)).send({ bottomProfile, sumpCenterU: middle }).expect(200);
      expect(response.body.spec.sumpCenterU).toBe(middle);
    });
  });
});
