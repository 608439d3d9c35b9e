import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../src/config/env.validation';
import { buildDataSourceOptions } from '../src/database/typeorm-options';
import { seedDemo } from '../src/database/seed/seed-demo';
import { PrivateMariaDb } from './helpers/private-mariadb';
import type { Session, TestApp } from './helpers/test-app';

// The app module reads its configuration when it is first imported: load it only after the env points here.
type Helpers = typeof import('./helpers/test-app');

/**
 * MariaDB stops in the middle of a short write load (its own private server, loopback only) and comes back:
 * while it is down every request is answered 503 with a clear message (never 500), the API recovers by itself,
 * and every write it acknowledged (201) is in the database afterwards.
 */
const WORKERS = 4;

describe('the database stops during a load run', () => {
  const db = new PrivateMariaDb();
  const savedEnv = { ...process.env };
  let t: TestApp;
  let owner: Session;
  let bearer: Helpers['bearer'];

  beforeAll(async () => {
    await db.install();
    Object.assign(process.env, db.env());
    const setup = new DataSource({ ...buildDataSourceOptions(validateDatabaseEnv(process.env)), logging: ['error'] });
    await setup.initialize();
    await setup.runMigrations({ transaction: 'each' });
    await seedDemo(setup);
    await setup.destroy();
    const helpers: Helpers = await import('./helpers/test-app');
    bearer = helpers.bearer;
    t = await helpers.createTestApp();
    owner = await helpers.signIn(t.http, 'owner@ironbark.test');
  }, 120_000);

  afterAll(async () => {
    await t?.close().catch(() => undefined);
    await db.destroy();
    process.env = savedEnv;
  });

  it('answers 503 while it is down, recovers by itself, and loses no acknowledged write', async () => {
    const acknowledged: string[] = [];
    const statuses = new Map<number, number>();
    const unavailable: Array<{ code: string; message: string; retryAfter: string | undefined }> = [];
    let phase: 'up' | 'down' | 'back' = 'up';
    let createdAfterRestart = 0;
    let running = true;
    let sequence = 0;

    const worker = async () => {
      while (running) {
        const name = `Load customer ${++sequence}`;
        const response = await t.http.post('/api/customers').set(...bearer(owner)).send({ name });
        statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
        if (response.status === 201) {
          acknowledged.push(response.body.id);
          if (phase === 'back') createdAfterRestart += 1;
        } else if (response.status === 503) {
          unavailable.push({ code: response.body.code, message: response.body.message, retryAfter: response.headers['retry-after'] });
          await new Promise((resolve) => setTimeout(resolve, 50));
        }
      }
    };
    const load = Promise.all(Array.from({ length: WORKERS }, worker));
    const waitFor = async (what: () => boolean, ms: number) => {
      const until = Date.now() + ms;
      while (!what() && Date.now() < until) await new Promise((resolve) => setTimeout(resolve, 50));
      return what();
    };

    try {
      expect(await waitFor(() => acknowledged.length >= 10, 20_000)).toBe(true);
      await db.stop();
      phase = 'down';
      expect(await waitFor(() => unavailable.length >= 8, 20_000)).toBe(true);
      const health = await t.http.get('/api/health');
      expect(health.status).toBe(503);
      await db.start();
      phase = 'back';
      // No restart of the API, no reconnect call: the next requests find the database again.
      expect(await waitFor(() => createdAfterRestart >= 10, 30_000)).toBe(true);
    } finally {
      running = false;
      await load;
    }

    expect([...statuses.keys()].sort()).toEqual([201, 503]);
    expect(new Set(unavailable.map((answer) => answer.code))).toEqual(new Set(['database_unavailable']));
    expect(unavailable[0].message).toMatch(/database is not reachable.*Try again in a moment/);
    expect(unavailable[0].retryAfter).toBe('5');
    await t.http.get('/api/health').expect(200);

    const stored = new Set<string>(
      (await t.dataSource.query("SELECT id FROM customers WHERE name LIKE 'Load customer %'")).map((row: { id: string }) => row.id),
    );
    const lost = acknowledged.filter((id) => !stored.has(id));
    expect({ acknowledged: acknowledged.length, lost }).toEqual({ acknowledged: acknowledged.length, lost: [] });
    // A write whose answer was lost with the connection may have committed; nothing beyond what was sent.
    expect(stored.size).toBeGreaterThanOrEqual(acknowledged.length);
    expect(stored.size).toBeLessThanOrEqual(sequence);
  }, 120_000);
});
