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

  it('has no dangling schema references, string-typed customer contact fields and the right articles', async () => {
    const response = await t.http.get('/api/docs-json').expect(200);
    const schemas = response.body.components.schemas as Record<string, unknown>;
    const dangling: string[] = [];
    const walk = (node: unknown, at: string): void => {
      if (Array.isArray(node)) node.forEach((child, index) => walk(child, `${at}[${index}]`));
      else if (node && typeof node === 'object') {
        for (const [key, value] of Object.entries(node)) {
          if (key === '$ref' && typeof value === 'string') {
            const name = value.replace('#/components/schemas/', '');
            if (!name || !(name in schemas)) dangling.push(`${at}: ${value}`);
          } else walk(value, `${at}.${key}`);
        }
      }
    };
    walk(response.body, '');
    expect(dangling).toEqual([]);
    const customer = (schemas.CreateCustomerDto as { properties: Record<string, unknown> }).properties;
    for (const field of ['email', 'phone', 'notes']) expect(customer[field]).toMatchObject({ type: 'string', nullable: true });
    const pan = (schemas.UpdateOilPanDto as { properties: Record<string, unknown> }).properties.bottomProfile;
    expect(pan).toMatchObject({ type: 'array', items: { $ref: '#/components/schemas/PanPointDto' } });
    const text = JSON.stringify(response.body);
    expect(text.match(/\b[Aa] [aeio][a-z]+/g) ?? []).toEqual([]);
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
