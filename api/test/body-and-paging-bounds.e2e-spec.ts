import { DemoRole } from '@swapwright/seed-data';
import { MAX_JSON_DEPTH } from '../src/common/middleware/json-depth';
import { bearer, countRows, Session, startSignedInApp, TestApp } from './helpers/test-app';

function nested(levels: number, leaf: unknown = 1): string {
  return '{"a":'.repeat(levels) + JSON.stringify(leaf) + '}'.repeat(levels);
}

describe('bounds on request bodies and paging', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
  });

  afterAll(() => t.close());

  describe('JSON nesting depth', () => {
    it.each([
      ['5,000 levels of objects', nested(5000)],
      ['20,000 levels of arrays', '['.repeat(20000) + ']'.repeat(20000)],
      ['just past the limit', nested(MAX_JSON_DEPTH + 1)],
    ])('refuses %s with a clear 400 and writes nothing', async (_what, body) => {
      expect(Buffer.byteLength(body)).toBeLessThan(1024 * 1024);
      const before = await countRows(t.dataSource, 'customers');
      const response = await t.http
        .post('/api/customers')
        .set(...bearer(s.owner))
        .set('Content-Type', 'application/json')
        .send(body)
        .expect(400);
      expect(response.body).toMatchObject({ statusCode: 400, code: 'body_too_deep' });
      expect(response.body.message).toMatch(new RegExp(`nested more than ${MAX_JSON_DEPTH} levels`));
      expect(await countRows(t.dataSource, 'customers')).toBe(before);
    });

    it('refuses a deep body on a public route too, before any sign-in check', async () => {
      const response = await t.http.post('/api/auth/sign-in').set('Content-Type', 'application/json').send(nested(3000)).expect(400);
      expect(response.body.code).toBe('body_too_deep');
    });

    it('counts brackets inside strings as text, not nesting', async () => {
      const response = await t.http
        .post('/api/customers')
        .set(...bearer(s.owner))
        .send({ name: 'Brackets [[[{{{ Person', notes: '{'.repeat(2000) + '"\\"' })
        .expect(201);
      expect(response.body.name).toBe('Brackets [[[{{{ Person');
    });

    it('still reads a body at the limit (it then fails validation, not parsing)', async () => {
      const response = await t.http
        .post('/api/customers')
        .set(...bearer(s.owner))
        .set('Content-Type', 'application/json')
        .send(nested(MAX_JSON_DEPTH))
        .expect(400);
      expect(response.body.code).toBe('validation_failed');
    });
  });

  describe('paging parameters', () => {
    it.each(['/api/customers', '/api/projects', '/api/catalog/engines'])('refuses page=1e20 on %s with a clear 400', async (path) => {
      const response = await t.http.get(`${path}?page=1e20`).set(...bearer(s.owner)).expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details.join(' | ')).toMatch(/page must not be greater than 10000/);
    });

    it.each(['page=10001', 'page=1e308', 'page=Infinity', 'page=-1e20', 'pageSize=1e20', 'page=9007199254740993'])(
      'refuses ?%s with 400',
      async (query) => {
        const response = await t.http.get(`/api/customers?${query}`).set(...bearer(s.owner)).expect(400);
        expect(response.body.code).toBe('validation_failed');
      },
    );

    it('answers the last allowed page with an empty list', async () => {
      const response = await t.http.get('/api/customers?page=10000&pageSize=100').set(...bearer(s.owner)).expect(200);
      expect(response.body).toMatchObject({ items: [], page: 10000, pageSize: 100 });
    });
  });
});
