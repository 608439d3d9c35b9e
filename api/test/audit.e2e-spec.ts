import { randomUUID } from 'node:crypto';
import { DEMO_MEMBERSHIP_IDS, DEMO_SHOP_ID, DemoRole } from '@swapwright/seed-data';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { FullShop, loadFullShop } from './fixtures/full-shop.fixture';
import { bearer, Session, signIn, startSignedInApp, TestApp } from './helpers/test-app';

interface AuditEventBody {
  kind: string;
  action: string;
  actorName: string;
  actorUserId: string | null;
  subjectId: string | null;
  summary: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
  createdAt: string;
}

describe('audit log of money, stock, sign-off and membership changes', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;
  let shop: FullShop;

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    shop = await loadFullShop(t, s);
  });

  afterAll(() => t.close());

  const events = async (query = ''): Promise<{ items: AuditEventBody[]; total: number }> =>
    (await t.http.get(`/api/audit-events${query}`).set(...bearer(s.owner)).expect(200)).body;
  const auditRows = async (): Promise<number> => Number((await t.dataSource.query('SELECT COUNT(*) AS n FROM audit_events'))[0].n);

  it('records a role change and a removal with who, when, before and after', async () => {
    await t.http.patch(`/api/memberships/${DEMO_MEMBERSHIP_IDS.counter}`).set(...bearer(s.owner)).send({ role: 'estimator' }).expect(200);
    const [changed] = (await events('?kind=membership')).items;
    expect(changed).toMatchObject({
      kind: 'membership',
      action: 'membership.role-changed',
      actorUserId: s.owner.user.id,
      actorName: s.owner.user.name,
      subjectId: DEMO_MEMBERSHIP_IDS.counter,
      before: { role: 'counter' },
      after: { role: 'estimator' },
    });
    expect(Date.now() - Date.parse(changed.createdAt)).toBeLessThan(60_000);
    await t.http.patch(`/api/memberships/${DEMO_MEMBERSHIP_IDS.counter}`).set(...bearer(s.owner)).send({ role: 'counter' }).expect(200);

    const userId = randomUUID();
    const membershipId = randomUUID();
    await t.dataSource.query('INSERT INTO users (id, email, name, passwordHash) VALUES (?, ?, ?, ?)', [userId, `leaving-${userId}@ironbark.test`, 'Leaving Member', 'x']);
    await t.dataSource.query('INSERT INTO memberships (id, shopId, userId, role) VALUES (?, ?, ?, ?)', [membershipId, DEMO_SHOP_ID, userId, 'fabricator']);
    await t.http.delete(`/api/memberships/${membershipId}`).set(...bearer(s.owner)).expect(204);
    const [removed] = (await events('?kind=membership')).items;
    expect(removed).toMatchObject({ action: 'membership.removed', subjectId: membershipId, before: { role: 'fabricator', userId }, after: null });

    // The same role again is no change: nothing to record.
    const before = await auditRows();
    await t.http.patch(`/api/memberships/${DEMO_MEMBERSHIP_IDS.counter}`).set(...bearer(s.owner)).send({ role: 'counter' }).expect(200);
    expect(await auditRows()).toBe(before);
  });

  it('records labor and tax rate changes (money), not a change of the shop name', async () => {
    const shopBefore = (await t.http.get('/api/shops/current').set(...bearer(s.owner)).expect(200)).body;
    const updated = await t.http.patch('/api/shops/current').set(...bearer(s.owner)).send({ laborRatePerHour: 142.5 }).expect(200);
    // The answer is the whole shop (the web shows it at once), not only the field that was sent.
    expect(updated.body).toEqual({ ...shopBefore, laborRatePerHour: 142.5 });
    // (each quote still being written is repriced in the same transaction, with an entry of its own)
    const rates = (await events('?kind=money')).items.find((event) => event.action === 'shop.rates-changed');
    expect(rates).toMatchObject({ action: 'shop.rates-changed', before: { laborRatePerHour: Number(shopBefore.laborRatePerHour) }, after: { laborRatePerHour: 142.5 } });
    const before = await auditRows();
    await t.http.patch('/api/shops/current').set(...bearer(s.owner)).send({ name: 'Ironbark Swap Works' }).expect(200);
    expect(await auditRows()).toBe(before);
  });

  it('records quote terms that price work (money), not a change of the printed terms', async () => {
    const termsBefore = (await t.http.get('/api/quote-settings').set(...bearer(s.owner)).expect(200)).body;
    const nextDeposit = termsBefore.depositPercent === 35 ? 40 : 35;
    await t.http.put('/api/quote-settings').set(...bearer(s.owner)).send({ depositPercent: nextDeposit }).expect(200);
    const [changed] = (await events('?kind=money')).items;
    expect(changed).toMatchObject({
      action: 'quote-terms.changed',
      actorName: s.owner.user.name,
      before: { depositPercent: Number(termsBefore.depositPercent) },
      after: { depositPercent: nextDeposit },
    });
    const before = await auditRows();
    await t.http.put('/api/quote-settings').set(...bearer(s.owner)).send({ terms: `${termsBefore.terms} ` }).expect(200);
    expect(await auditRows()).toBe(before);
    await t.http.put('/api/quote-settings').set(...bearer(s.owner)).send({ depositPercent: termsBefore.depositPercent, terms: termsBefore.terms }).expect(200);
  });

  it('records stock counted, reserved and released with the figures before and after', async () => {
    const [line] = await t.dataSource.query('SELECT partId, quantity, sku FROM counter_lines WHERE id = ?', [shop.counterLineId]);
    await t.http.put(`/api/parts/${line.partId}/stock`).set(...bearer(s.counter)).send({ location: 'Audit shelf', onHand: 40 }).expect(200);
    await t.http.post(`/api/counter-lines/${shop.counterLineId}/reserve`).set(...bearer(s.counter)).send({ location: 'Audit shelf' }).expect(200);
    await t.http.post(`/api/counter-lines/${shop.counterLineId}/release`).set(...bearer(s.counter)).send({}).expect(200);
    const stock = (await events('?kind=stock&pageSize=3')).items;
    expect(stock.map((event) => event.action)).toEqual(['stock.released', 'stock.reserved', 'stock.counted']);
    expect(stock[2]).toMatchObject({ actorName: s.counter.user.name, after: { location: 'Audit shelf', onHand: 40 } });
    expect(stock[1]).toMatchObject({ before: { reserved: 0 }, after: { status: 'reserved', reserved: Number(line.quantity) } });
    expect(stock[0]).toMatchObject({ before: { status: 'reserved' }, after: { status: 'open', reserved: 0 } });
  });

  it('records a quote sent to the customer (money)', async () => {
    const sent = await t.http.post(`/api/quotes/${shop.quoteId}/send`).set(...bearer(s.estimator)).send({});
    expect(sent.status).toBeLessThan(300);
    const [event] = (await events('?kind=money')).items;
    expect(event).toMatchObject({ action: 'quote.sent', subjectId: shop.quoteId, actorName: s.estimator.user.name, after: { status: 'awaiting-answer', sentRevision: 1 } });
    expect(event.after?.totalCents).toEqual(expect.any(Number));
  });

  it('writes the entry in the same transaction: a change whose transaction fails leaves no audit row', async () => {
    // The database itself refuses this one role change after the audit entry was written inside the transaction.
    await t.dataSource.query(
      "CREATE TRIGGER audit_test_refuse BEFORE UPDATE ON memberships FOR EACH ROW BEGIN IF NEW.role = 'fabricator' AND OLD.role = 'counter' THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused for the test'; END IF; END",
    );
    try {
      const before = await auditRows();
      const response = await t.http.patch(`/api/memberships/${DEMO_MEMBERSHIP_IDS.counter}`).set(...bearer(s.owner)).send({ role: 'fabricator' });
      expect(response.status).toBeGreaterThanOrEqual(400);
      expect(await auditRows()).toBe(before);
      const [membership] = await t.dataSource.query('SELECT role FROM memberships WHERE id = ?', [DEMO_MEMBERSHIP_IDS.counter]);
      expect(membership.role).toBe('counter');
    } finally {
      await t.dataSource.query('DROP TRIGGER IF EXISTS audit_test_refuse');
    }
  });

  it('pages newest first, filters by kind, refuses an unknown kind, and shows nothing to another shop', async () => {
    const all = await events('?pageSize=2');
    expect(all.items).toHaveLength(2);
    expect(all.total).toBeGreaterThanOrEqual(7);
    expect(Date.parse(all.items[0].createdAt)).toBeGreaterThanOrEqual(Date.parse(all.items[1].createdAt));
    const second = await events('?pageSize=2&page=2');
    expect(second.items.map((e) => e.summary)).not.toContain(all.items[0].summary);
    const bad = await t.http.get('/api/audit-events?kind=gossip').set(...bearer(s.owner)).expect(400);
    expect(bad.body.message).toMatch(/kind/);
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    expect((await t.http.get('/api/audit-events').set(...bearer(other)).expect(200)).body.total).toBe(0);
    await t.http.get('/api/audit-events').set(...bearer(s.estimator)).expect(403);
    const [row] = await t.dataSource.query('SELECT COUNT(*) AS n FROM audit_events WHERE shopId <> ?', [DEMO_SHOP_ID]);
    expect(Number(row.n)).toBe(0);
  });
});
