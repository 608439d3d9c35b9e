import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { bearer, Session, startSignedInApp, TestApp } from './helpers/test-app';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const LINES = [{ kind: 'labor', description: 'Remove and install engine', hours: 8.5 }];

type Revision = { number: number; sent: boolean; laborRateCents: number; lines: { kind: string; lineTotalCents: number }[]; totals: { laborSubtotalCents: number; totalCents: number } };

describe("a quote still being written follows the shop's rates; a sent one keeps its own", () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let draftId: string;
  let sentId: string;
  let sentBefore: Revision;

  beforeAll(async () => {
    ({ t, s: demo } = await startSignedInApp());
    await t.http.patch('/api/shops/current').set(...bearer(demo.owner)).send({ laborRatePerHour: 120 }).expect(200);
    const draft = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES }).expect(201);
    draftId = draft.body.id;
    const sent = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES }).expect(201);
    sentId = sent.body.id;
    sentBefore = (await t.http.post(`/api/quotes/${sentId}/send`).set(...bearer(demo.estimator)).expect(200)).body.revision;
    await t.http.patch('/api/shops/current').set(...bearer(demo.owner)).send({ laborRatePerHour: 135.5 }).expect(200);
  });

  afterAll(() => t.close());

  const revisionOf = async (id: string) => (await t.http.get(`/api/quotes/${id}`).set(...bearer(demo.estimator)).expect(200)).body.revision as Revision;

  it('reprices the draft at the new labor rate: 8.5 h at $135.50 is $1,151.75', async () => {
    const revision = await revisionOf(draftId);
    expect(revision.sent).toBe(false);
    expect(revision.laborRateCents).toBe(13550);
    // Source: arithmetic, 8.5 × 135.50 = 1,151.75 (hours to a tenth times the hourly rate).
    expect(revision.lines.find((line) => line.kind === 'labor')?.lineTotalCents).toBe(115175);
    expect(revision.totals.laborSubtotalCents).toBe(115175);
  });

  it('leaves the sent revision at the rate it was sent with', async () => {
    const revision = await revisionOf(sentId);
    expect(revision.sent).toBe(true);
    expect(revision.laborRateCents).toBe(12000);
    expect(revision.totals.totalCents).toBe(sentBefore.totals.totalCents);
  });

  it('writes what it repriced to the audit log, beside the rate change', async () => {
    const log = await t.http.get('/api/audit-events?kind=money&pageSize=20').set(...bearer(demo.owner)).expect(200);
    const repriced = (log.body.items as { action: string; subjectId: string; summary: string }[]).filter((event) => event.action === 'quote.repriced-at-shop-rates');
    expect(repriced.map((event) => event.subjectId)).toContain(draftId);
    expect(repriced.map((event) => event.subjectId)).not.toContain(sentId);
    expect(repriced.find((event) => event.subjectId === draftId)?.summary).toMatch(/still being written, repriced at the shop's new rates: total \$[\d,.]+ → \$[\d,.]+\.$/);
  });

  it('takes a new tax on labor from the quote terms too, on labor with its supplies share', async () => {
    const before = await revisionOf(draftId);
    await t.http.put('/api/quote-settings').set(...bearer(demo.owner)).send({ laborTaxPercent: 5 }).expect(200);
    const after = (await t.http.get(`/api/quotes/${draftId}`).set(...bearer(demo.estimator)).expect(200)).body.revision;
    // Source: the quote's printed rounding rule: labor tax is (labor after discount + supplies) × the labor tax rate,
    // rounded half away from zero to the cent. No discount here, so it is (1,151.75 + supplies) × 5 %.
    const laborTax = Math.round((115175 + after.totals.suppliesCents) * 0.05);
    expect(after.laborTaxPercent).toBe(5);
    expect(after.totals.laborTaxCents).toBe(laborTax);
    expect(after.totals.totalCents).toBe(before.totals.totalCents + laborTax);
    expect((await revisionOf(sentId)).totals.totalCents).toBe(sentBefore.totals.totalCents);
  });
});
