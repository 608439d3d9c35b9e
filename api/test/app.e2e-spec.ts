import { createTestApp, TestApp } from './helpers/test-app';

describe('app: health, docs and the error shape', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp();
  });

  afterAll(() => t.close());

  it('GET /api/health checks the database', async () => {
    const response = await t.http.get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('serves the OpenAPI document', async () => {
    const response = await t.http.get('/api/docs-json').expect(200);
    expect(response.body.info.title).toBe('Swapwright API');
    expect(Object.keys(response.body.paths)).toEqual(
      expect.arrayContaining(['/api/auth/sign-in', '/api/customers/{id}', '/api/projects', '/api/shops/current', '/api/invitations/accept']),
    );
  });

  it('answers an unknown API route with the error shape and a correlation id', async () => {
    const response = await t.http.get('/api/nowhere').set('X-Correlation-Id', 'trace-1234abcd').expect(404);
    expect(response.body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      code: 'not_found',
      message: 'Cannot GET /api/nowhere',
      details: ['Cannot GET /api/nowhere'],
      correlationId: 'trace-1234abcd',
    });
    expect(response.headers['x-correlation-id']).toBe('trace-1234abcd');
  });
});
