import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { seedParts } from '../src/database/seed/seed-parts';
import { ApiProcess, assertApiBuilt, callApi, startApiProcess, stopApiProcess } from './helpers/api-process';
import { bearer, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

const SKU = 'TR-4410';
const ON_HAND = 3;
const CLERKS = 20;

/**
 * Two API processes on two ports against one database, reserving the same stock at the same moment: the row locks
 * (SELECT … FOR UPDATE) live in MariaDB, so no process can sell what the other one already took.
 */
describe('two API instances reserving the same stock at once', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let a: ApiProcess;
  let b: ApiProcess;
  let lineIds: string[];

  beforeAll(async () => {
    assertApiBuilt();
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    await seedParts(t.dataSource);
    demo = await signInAllRoles(t.http);
    const part = (await t.http.get(`/api/parts?search=${SKU}`).set(...bearer(demo.counter))).body.items[0];
    await t.http.put(`/api/parts/${part.id}/stock`).set(...bearer(demo.counter)).send({ location: 'Main store', bin: 'A-01-2', onHand: ON_HAND }).expect(200);
    // Twenty plans, each with its own counter line for the pan, all wanting one unit; three are on the shelf.
    lineIds = [];
    for (let i = 0; i < CLERKS; i++) {
      const plan = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({}).expect(201);
      const lines = await t.http.get(`/api/parts-plans/${plan.body.id}/counter-lines`).set(...bearer(demo.counter)).expect(200);
      const line = lines.body.find((candidate: { sku: string }) => candidate.sku === SKU);
      expect(line).toMatchObject({ quantity: 1, status: 'open' });
      lineIds.push(line.id);
    }
    [a, b] = await Promise.all([startApiProcess(), startApiProcess()]);
  }, 180_000);

  afterAll(async () => {
    await Promise.all([stopApiProcess(a), stopApiProcess(b)]);
    await t?.close();
  });

  it(`${CLERKS} reservations split across both processes at once: exactly ${ON_HAND} succeed, the rest get a clear 409`, async () => {
    const [clerkA, clerkB] = [demo.counter.accessToken, demo.owner.accessToken];
    const results = await Promise.all(
      lineIds.map((id, index) =>
        callApi(index % 2 === 0 ? a : b, 'POST', `/counter-lines/${id}/reserve`, { token: index % 2 === 0 ? clerkA : clerkB, body: {} }),
      ),
    );
    const reserved = results.filter((result) => result.status === 200);
    const refused = results.filter((result) => result.status === 409);
    expect(reserved).toHaveLength(ON_HAND);
    expect(refused).toHaveLength(CLERKS - ON_HAND);
    for (const result of refused) {
      expect(result.body.code).toBe('out_of_stock');
      expect(result.body.message).toBe(`No ${SKU} is left to reserve: another job took the last one. Mark the line to order, or reserve from another location.`);
    }

    // The stock count, the lines and the audit log agree.
    const [stock] = await t.dataSource.query('SELECT s.onHand, s.reserved FROM part_stock s JOIN parts p ON p.id = s.partId WHERE p.sku = ?', [SKU]);
    expect({ onHand: Number(stock.onHand), reserved: Number(stock.reserved) }).toEqual({ onHand: ON_HAND, reserved: ON_HAND });
    const [lines] = await t.dataSource.query("SELECT COUNT(*) AS n FROM counter_lines WHERE sku = ? AND status = 'reserved'", [SKU]);
    expect(Number(lines.n)).toBe(ON_HAND);
    const [audit] = await t.dataSource.query("SELECT COUNT(*) AS n FROM audit_events WHERE action = 'stock.reserved'");
    expect(Number(audit.n)).toBe(ON_HAND);
    const reservedIds = new Set(reserved.map((result) => result.body.id));
    const rows = await t.dataSource.query("SELECT id FROM counter_lines WHERE sku = ? AND status = 'reserved'", [SKU]);
    expect(new Set(rows.map((row: { id: string }) => row.id))).toEqual(reservedIds);
  }, 60_000);
});
