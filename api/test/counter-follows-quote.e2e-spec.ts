import { DemoRole } from '@swapwright/seed-data';
import { planStagForNewCustomer, type QuoteLineBody } from './fixtures/planned-stag.fixture';
import { startAppWithPayments, until } from './helpers/app-with-payments';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { bearer, seedWithParts, Session, TestApp } from './helpers/test-app';

type Line = QuoteLineBody;
type CounterLine = { id: string; sku: string; quantity: number; status: string };


const asInput = (line: Line) => ({
  key: line.key,
  kind: line.kind,
  description: line.description,
  sku: line.sku,
  catalogKind: line.catalogKind,
  catalogItemId: line.catalogItemId,
  laborOperationId: line.laborOperationId,
  quantity: line.quantity,
  ...(line.kind === 'part' ? { pricing: 'list', unitPriceCents: line.unitPriceCents } : { hours: line.hours }),
});

type Setup = { t: TestApp; demo: Record<DemoRole, Session>; stop: () => Promise<void> };
type Accepted = { projectId: string; planId: string; planLines: CounterLine[]; lines: Line[] };

/** A project of the parts-planned demo job with a locked plan and a quote drawn from it, edited, sent, accepted and paid. */
async function acceptEditedQuote({ t, demo }: Setup, email: string, edit: (lines: Line[]) => Promise<object[]>): Promise<Accepted> {
  const as = (method: 'post' | 'patch', path: string, body: object = {}) => t.http[method](path).set(...bearer(demo.estimator)).send(body);
  const { projectId, plan } = await planStagForNewCustomer(t, demo.estimator, { name: `Test Customer ${email}`, email }, 'Stag with a part changed at the quote');
  const planLines = (await t.http.get(`/api/parts-plans/${plan.id}/counter-lines`).set(...bearer(demo.counter)).expect(200)).body as CounterLine[];
  const drafted = await as('post', `/api/projects/${projectId}/quotes`).expect(201);
  const lines = drafted.body.revision.lines as Line[];
  await as('patch', `/api/quotes/${drafted.body.id}`, { lines: await edit(lines) }).expect(200);

  const before = await lastMailId();
  await as('post', `/api/quotes/${drafted.body.id}/send`).expect(200);
  const mail = await waitForMail(email, /quote Q-/, before);
  const token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail.text)![1];
  await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' }).expect(200);
  await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  await until(
    async () => t.http.get(`/api/projects/${projectId}/work-order`).set(...bearer(demo.fabricator)),
    (response) => response.status === 200,
    'the work order',
  );
  return { projectId, planId: plan.id, planLines, lines };
}

const unitsOf = (lines: CounterLine[], sku: string | null) => lines.filter((line) => line.sku === sku).reduce((sum, line) => sum + line.quantity, 0);

describe("the counter's list follows the accepted quote, not only the plan it was drawn from", () => {
  const setup = {} as Setup;
  let accepted: Accepted;
  let kept: Line;
  let dropped: Line;
  let handWritten: Line;
  let added: { id: string; sku: string; description: string; priceCents: number };
  let alsoDropped: Accepted;

  beforeAll(async () => {
    Object.assign(setup, await startAppWithPayments());
    setup.demo = await seedWithParts(setup.t);
    const { t, demo } = setup;
    accepted = await acceptEditedQuote(setup, 'counter.customer@example.test', async (lines) => {
      const parts = lines.filter((line) => line.kind === 'part');
      // The plan picks a pan and its pickup at least: one part is kept (its quantity raised), one dropped.
      expect(parts.length).toBeGreaterThan(1);
      [kept, dropped] = parts;
      // A part the plan did not pick, added by the estimator from the shop's parts list.
      const inPlan = new Set(parts.map((line) => line.catalogItemId));
      const listed = (await t.http.get('/api/parts?pageSize=100').set(...bearer(demo.estimator)).expect(200)).body.items as (typeof added)[];
      added = listed.find((part) => !inPlan.has(part.id))!;
      expect(added).toBeDefined();
      return [
        ...lines.filter((line) => line !== dropped).map((line) => asInput(line === kept ? { ...line, quantity: line.quantity + 2 } : line)),
        { kind: 'part', description: added.description, sku: added.sku, catalogKind: 'parts', catalogItemId: added.id, quantity: 3, pricing: 'list', unitPriceCents: added.priceCents },
      ];
    });
    // The same change, but one planned part written out by hand in its place: the counter cannot tell it is the same part.
    alsoDropped = await acceptEditedQuote(setup, 'counter.handwritten@example.test', async (lines) => {
      const parts = lines.filter((line) => line.kind === 'part');
      handWritten = parts[1];
      return lines.map((line) => asInput(line === handWritten ? { ...line, catalogKind: null, catalogItemId: null, sku: null, description: `${line.description}, as the customer asked` } : line));
    });
  }, 120_000);

  afterAll(() => setup.stop());

  const counterLines = async (planId: string) => (await setup.t.http.get(`/api/parts-plans/${planId}/counter-lines`).set(...bearer(setup.demo.counter)).expect(200)).body as CounterLine[];

  it('a part the estimator added to the quote is on the counter to pick, at the quoted quantity', async () => {
    const lines = await counterLines(accepted.planId);
    expect(unitsOf(accepted.planLines, added.sku)).toBe(0);
    expect(lines.filter((line) => line.sku === added.sku)).toEqual([expect.objectContaining({ quantity: 3, status: 'open' })]);
  });

  it('a raised quantity is on the counter, and a part the quote dropped is no longer to pick', async () => {
    const lines = await counterLines(accepted.planId);
    expect(unitsOf(lines, kept.sku)).toBe(unitsOf(accepted.planLines, kept.sku) + 2);
    expect(unitsOf(accepted.planLines, dropped.sku)).toBeGreaterThan(0);
    expect(unitsOf(lines, dropped.sku)).toBe(0);
  });

  it('with a part line written by hand on the quote, no planned part is dropped from the counter', async () => {
    const lines = await counterLines(alsoDropped.planId);
    expect(unitsOf(lines, handWritten.sku)).toBe(unitsOf(alsoDropped.planLines, handWritten.sku));
    expect(lines.map((line) => [line.sku, line.quantity]).sort()).toEqual(alsoDropped.planLines.map((line) => [line.sku, line.quantity]).sort());
  });

  it("the work order tells the bay which of the job's parts are not with it yet, and counts a reserved one as with it", async () => {
    const workOrder = async () =>
      (await setup.t.http.get(`/api/projects/${accepted.projectId}/work-order`).set(...bearer(setup.demo.fabricator)).expect(200)).body.partsAtCounter as {
        planId: string;
        total: number;
        withTheJob: number;
        waiting: { sku: string; quantity: number; status: string }[];
      };
    const lines = await counterLines(accepted.planId);
    const before = await workOrder();
    expect(before.planId).toBe(accepted.planId);
    expect(before.total).toBe(lines.length);
    expect(before.withTheJob).toBe(lines.filter((line) => ['reserved', 'received', 'issued'].includes(line.status)).length);
    expect(before.waiting).toContainEqual({ sku: added.sku, description: added.description, quantity: 3, status: 'open' });

    const open = lines.find((line) => line.status === 'open' && line.sku !== added.sku)!;
    await setup.t.http.post(`/api/counter-lines/${open.id}/reserve`).set(...bearer(setup.demo.counter)).send({}).expect(200);
    const after = await workOrder();
    expect(after.withTheJob).toBe(before.withTheJob + 1);
    expect(after.waiting.map((line) => line.sku)).not.toContain(open.sku);
  });

  it('the owner reads the change in the audit log, by the quote that made it', async () => {
    const log = await setup.t.http.get('/api/audit-events?kind=stock').set(...bearer(setup.demo.owner)).expect(200);
    const entry = (log.body.items as { action: string; summary: string; actorName: string }[]).find((event) => event.action === 'counter.matched-to-quote');
    expect(entry).toBeDefined();
    expect(entry!.actorName).toBe('Quote acceptance');
    expect(entry!.summary).toContain(`${added.sku} +3`);
  });
});
