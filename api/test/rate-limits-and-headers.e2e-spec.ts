import { getOptionsToken } from '@nestjs/throttler';
import { DEMO_PASSWORD } from '@swapwright/seed-data';
import { createTestApp, resetData, TestApp } from './helpers/test-app';

const LIMIT = 3;
const WINDOW_SECONDS = 60;

describe('rate limits on sign-in, sign-up and password reset, and security headers', () => {
  let t: TestApp;

  beforeAll(async () => {
    // The test profile sets a generous AUTH_RATE_LIMIT so the suites can sign in often; this app gets a small one.
    t = await createTestApp((builder) =>
      builder.overrideProvider(getOptionsToken()).useValue({ throttlers: [{ ttl: WINDOW_SECONDS * 1000, limit: LIMIT }] }),
    );
    await resetData(t.dataSource);
  });

  afterAll(() => t.close());

  it('answers wrong passwords past the limit with 429 and Retry-After, even for the right password', async () => {
    for (let attempt = 0; attempt < LIMIT; attempt++) {
      await t.http.post('/api/auth/sign-in').send({ email: 'owner@ironbark.test', password: 'guess-number-' + attempt }).expect(401);
    }
    const refused = await t.http.post('/api/auth/sign-in').send({ email: 'owner@ironbark.test', password: DEMO_PASSWORD }).expect(429);
    const retryAfter = Number(refused.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(WINDOW_SECONDS);
    expect(refused.body).toMatchObject({ statusCode: 429, code: 'too_many_attempts' });
    expect(refused.body.message).toMatch(/Too many attempts from this address\. Wait \d+ seconds? and try again\./);
  });

  it.each([
    ['sign-up', '/api/auth/sign-up', { email: 'x@example.test', password: 'short', name: 'X', shopName: 'Y' }],
    ['password-reset request', '/api/auth/password-reset/request', { email: 'flood@example.test' }],
    ['password-reset confirm', '/api/auth/password-reset/confirm', { token: 'made-up', password: 'long-enough-1' }],
  ])('limits %s the same way', async (_name, path, body) => {
    for (let attempt = 0; attempt < LIMIT; attempt++) {
      const response = await t.http.post(path).send(body);
      expect(response.status).not.toBe(429);
    }
    const refused = await t.http.post(path).send(body).expect(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('does not limit signed-in work or the refresh route', async () => {
    for (let attempt = 0; attempt < LIMIT + 2; attempt++) await t.http.get('/api/health').expect(200);
    for (let attempt = 0; attempt < LIMIT + 2; attempt++) await t.http.post('/api/auth/refresh').send({ refreshToken: 'x' }).expect(401);
  });

  it('sends security headers with a content security policy that allows only our own scripts', async () => {
    const response = await t.http.get('/api/health').expect(200);
    const csp = response.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(response.headers['referrer-policy']).toBe('no-referrer');
    expect(response.headers['x-powered-by']).toBeUndefined();
  });
});
