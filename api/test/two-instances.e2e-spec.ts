import { DEMO_PASSWORD } from '@swapwright/seed-data';
import { ApiProcess, assertApiBuilt, startApiProcess, stopApiProcess } from './helpers/api-process';
import { startTestApp, TestApp } from './helpers/test-app';

const LIMIT = 3;
type Instance = ApiProcess;

/** A real API process (the built server), on its own port against the test database. */
const startInstance = () => startApiProcess({ AUTH_RATE_LIMIT: String(LIMIT), AUTH_RATE_WINDOW_SECONDS: '60' });
const stopInstance = (instance: Instance | undefined) => stopApiProcess(instance);

function signIn(instance: Instance, password: string) {
  return fetch(`${instance.base}/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'estimator@ironbark.test', password }),
  });
}

/**
 * Two API processes on two ports against one database, as behind a load balancer: nothing a request needs lives in
 * one process (sessions are tokens plus rows; the sign-in limit is counted in the database).
 */
describe('two API instances against one database', () => {
  let t: TestApp;
  let a: Instance;
  let b: Instance;

  beforeAll(async () => {
    assertApiBuilt();
    t = await startTestApp(); // fresh demo data and empty rate-limit counters
    [a, b] = await Promise.all([startInstance(), startInstance()]);
  }, 120_000);

  afterAll(async () => {
    await Promise.all([stopInstance(a), stopInstance(b)]);
    await t?.close();
  });

  it('a sign-in on one instance works on the other: the token, the refresh and the sign-out', async () => {
    const signedIn = await signIn(a, DEMO_PASSWORD);
    expect(signedIn.status).toBe(200);
    const session = (await signedIn.json()) as { accessToken: string; refreshToken: string };

    const me = await fetch(`${b.base}/auth/me`, { headers: { authorization: `Bearer ${session.accessToken}` } });
    expect(me.status).toBe(200);
    expect(((await me.json()) as { email: string }).email).toBe('estimator@ironbark.test');

    const refreshed = await fetch(`${b.base}/auth/refresh`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ refreshToken: session.refreshToken }),
    });
    expect(refreshed.status).toBe(200);
    const next = (await refreshed.json()) as { accessToken: string; refreshToken: string };

    // Signed out on B: the token is refused on A at once (no per-process copy of the session).
    const signOut = await fetch(`${b.base}/auth/sign-out`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${next.accessToken}` },
      body: JSON.stringify({ refreshToken: next.refreshToken }),
    });
    expect(signOut.status).toBeLessThan(300);
    expect((await fetch(`${a.base}/auth/me`, { headers: { authorization: `Bearer ${next.accessToken}` } })).status).toBe(401);
  });

  it('counts sign-in attempts across both instances: past the limit either one answers 429', async () => {
    // One attempt was made above (on A). Two wrong passwords, one on each instance, reach the limit of 3 …
    expect((await signIn(b, 'wrong-password-1')).status).toBe(401);
    expect((await signIn(a, 'wrong-password-2')).status).toBe(401);
    // … so the next attempt is refused wherever it lands, even with the right password. Counted per instance, B
    // would have seen 2 attempts and A 2, both under the limit.
    const refusedOnB = await signIn(b, 'wrong-password-3');
    expect(refusedOnB.status).toBe(429);
    expect(Number(refusedOnB.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(Number(refusedOnB.headers.get('retry-after'))).toBeLessThanOrEqual(60);
    expect((await signIn(a, DEMO_PASSWORD)).status).toBe(429);
  });
});
