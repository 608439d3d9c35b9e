import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { demoOperation, SHOP_QUOTE_LINES } from './fixtures/shop-quote-lines';
import { pdfText } from './helpers/pdf-text';
import { bearer, countRows, createTestApp, jobsSettled, seedWithParts, Session, signIn, signUpThroughMail, TestApp } from './helpers/test-app';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const operation = demoOperation;

/** A one-person shop's budget, typed in by hand. */
const HAND_LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'labor', description: 'Remove and install engine', hours: 8.5 },
  { kind: 'labor', description: 'Install pan and pickup', hours: 1.3 },
];

type Step = { key: string; name: string; torque: { joint: string | null; lbfFt: number; newtonMetres: number }[]; checks: { key: string }[] };

/** A member's own truck: the quote is their budget, and starting the build opens the work order without a customer or a deposit. */
describe('starting the build of one’s own truck', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let builder: Session;

  beforeAll(async () => {
    t = await createTestApp();
    demo = await seedWithParts(t);
    // An address of this run's own, so a sign-up link mailed by an earlier run (the mail fake keeps it) is never taken for this one.
    const email = `tamsin.orrery.${Date.now()}@builder.test`;
    builder = await signUpThroughMail(t.http, { email, password: 'own-truck-password', name: 'Tamsin Orrery', shopName: 'Orrery Garage' });
  });

  afterAll(() => t.close());

  const ownQuote = async (session: Session, lines: object[], title = 'Own hauler: budget') => {
    const project = await t.http.post('/api/projects').set(...bearer(session)).send({ forMyself: true, title }).expect(201);
    const quote = await t.http.post(`/api/projects/${project.body.id}/quotes`).set(...bearer(session)).send({ lines }).expect(201);
    expect(quote.body.forMyself).toBe(true);
    return { projectId: project.body.id as string, quoteId: quote.body.id as string };
  };
  const start = (session: Session, quoteId: string) => t.http.post(`/api/quotes/${quoteId}/start-own-build`).set(...bearer(session));
  const ownBuildEvents = async (session: Session, quoteId: string) =>
    ((await t.http.get('/api/audit-events?kind=money&pageSize=100').set(...bearer(session)).expect(200)).body.items as Array<{ action: string; subjectId: string; actorName: string; after: Record<string, unknown> }>).filter(
      (event) => event.action === 'quote.own-build-started' && event.subjectId === quoteId,
    );

  it('freezes the budget as approved, moves the project to where the work order opens and opens it, with an audit entry and no e-mail', async () => {
    const { projectId, quoteId } = await ownQuote(builder, HAND_LINES);
    await jobsSettled(t.dataSource);
    const jobsBefore = await countRows(t.dataSource, 'jobs');

    const started = await start(builder, quoteId);
    expect(started.status).toBe(200);
    expect(started.body.quote).toMatchObject({ id: quoteId, status: 'approved', sentRevision: 1, latestRevision: 1, depositState: 'not-due', forMyself: true });
    expect(started.body.quote.revision.sent).toBe(true);
    expect(started.body.quote.answeredAt).toEqual(expect.any(String));

    const order = (await t.http.get(`/api/work-orders/${started.body.workOrderId}`).set(...bearer(builder)).expect(200)).body;
    expect(order).toMatchObject({ projectId, quoteId, quoteRevision: 1, state: 'ready' });
    // One step per labor line of the budget, in its own words.
    const names = (order.steps as Step[]).map((step) => step.name);
    expect(names).toEqual(expect.arrayContaining(['Remove and install engine', 'Install pan and pickup']));
    expect((await t.http.get(`/api/projects/${projectId}/work-order`).set(...bearer(builder)).expect(200)).body.id).toBe(started.body.workOrderId);

    expect((await t.http.get(`/api/projects/${projectId}`).set(...bearer(builder)).expect(200)).body.status).toBe('deposit-paid');
    const [event] = await ownBuildEvents(builder, quoteId);
    expect(event).toMatchObject({ actorName: 'Tamsin Orrery', after: { status: 'approved', sentRevision: 1, depositCents: 0 } });

    // Nothing to mail: no quote e-mail, no answer e-mail, no payment.
    expect(await countRows(t.dataSource, 'jobs')).toBe(jobsBefore);
    expect(await countRows(t.dataSource, 'deposit_payments')).toBe(0);
  });

  it('prints the budget as a budget: no deposit, approval terms or last valid day; a colleague reading it gets the quote', async () => {
    const { quoteId } = await ownQuote(demo.estimator, HAND_LINES, 'Estimator own truck: print');
    const download = (session: Session) =>
      t.http
        .get(`/api/quotes/${quoteId}/pdf`)
        .set(...bearer(session))
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        });
    const own = await download(demo.estimator);
    expect(own.status).toBe(200);
    expect(own.headers['content-disposition']).toMatch(/filename="Budget-Q-\d{4}-rev1\.pdf"/);
    const budget = (await pdfText(own.body as Buffer)).replace(/\s+/g, ' ');
    expect(budget).toContain('Budget of your own build');
    expect(budget).not.toMatch(/Deposit due|Valid until/);

    const colleague = await download(demo.owner);
    expect(colleague.headers['content-disposition']).toMatch(/filename="Q-\d{4}-rev1\.pdf"/);
    expect((await pdfText(colleague.body as Buffer)).replace(/\s+/g, ' ')).toContain('Deposit due on approval');
  });

  it('answers 409 when started again, and nothing doubles', async () => {
    const { quoteId } = await ownQuote(builder, HAND_LINES, 'Second build');
    await start(builder, quoteId).expect(200);
    const counts = async () => ({ orders: await countRows(t.dataSource, 'work_orders'), audit: await countRows(t.dataSource, 'audit_events'), jobs: await countRows(t.dataSource, 'jobs') });
    const before = await counts();
    const again = await start(builder, quoteId);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('quote_own_build_started');
    expect(again.body.message).toBe('Your build was already started from this budget (revision 1); open its work order under Work orders. For further work, start a new quote.');
    expect(await counts()).toEqual(before);
    // Once started, the budget is an approved quote: not edited, not sent.
    expect((await t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(builder)).send({ notes: 'more' })).status).toBe(409);
    expect((await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(builder))).status).toBe(409);
  });

  it('of two starts at once, one opens the work order and the other answers 409', async () => {
    const { quoteId } = await ownQuote(builder, HAND_LINES, 'Twice at once');
    const ordersBefore = await countRows(t.dataSource, 'work_orders');
    const answers = await Promise.all([start(builder, quoteId), start(builder, quoteId)]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([200, 409]);
    expect(await countRows(t.dataSource, 'work_orders')).toBe(ordersBefore + 1);
    expect(await ownBuildEvents(builder, quoteId)).toHaveLength(1);
  });

  it("a shop member's own truck: the work order carries the shop operations' torques and checks", async () => {
    const { quoteId } = await ownQuote(demo.estimator, SHOP_QUOTE_LINES, 'Estimator own truck: budget');
    const started = await start(demo.estimator, quoteId).expect(200);
    const order = (await t.http.get(`/api/work-orders/${started.body.workOrderId}`).set(...bearer(demo.fabricator)).expect(200)).body;
    const pan = (order.steps as Step[]).find((step) => step.name === operation('oil-pan-pickup').name)!;
    // Source: NIST SP 811 (2008), appendix B.9: 1 lbf·ft = 1.355 818 N·m; 18 lbf·ft = 24.40 N·m, shown to a tenth.
    expect(pan.torque).toEqual(expect.arrayContaining([expect.objectContaining({ joint: 'oil-pump-to-main-cap', lbfFt: 18, newtonMetres: 24.4 })]));
    expect(pan.checks.length).toBeGreaterThan(0);
    expect(await ownBuildEvents(demo.owner, quoteId)).toHaveLength(1);
  });

  it('refuses with 422 a quote of somebody else’s truck, and a budget without labor', async () => {
    const customers = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: HAND_LINES }).expect(201);
    const refused = await start(demo.estimator, customers.body.id);
    expect(refused.status).toBe(422);
    expect(refused.body.code).toBe('quote_not_own_project');
    expect(refused.body.message).toBe(
      "Only a quote of your own truck starts a build this way. A customer's quote opens its work order once the customer approves it and pays the deposit.",
    );
    // A colleague's own truck is, to the owner, a customer record like any other.
    const { quoteId } = await ownQuote(demo.estimator, HAND_LINES, 'Estimator own truck: colleague');
    expect((await start(demo.owner, quoteId)).body.code).toBe('quote_not_own_project');
    expect((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).expect(200)).body.status).toBe('drafting');

    const partsOnly = await ownQuote(builder, HAND_LINES.filter((line) => line.kind === 'part'), 'Parts only');
    const noLabor = await start(builder, partsOnly.quoteId);
    expect(noLabor.status).toBe(422);
    expect(noLabor.body.code).toBe('quote_own_build_without_labor');
  });

  it('is refused to roles that do not write quotes (403) and across shops (404), changing nothing', async () => {
    const { quoteId } = await ownQuote(builder, HAND_LINES, 'Guarded build');
    const ordersBefore = await countRows(t.dataSource, 'work_orders');
    for (const role of ['customer', 'fabricator', 'counter'] as const) expect((await start(demo[role], quoteId)).status).toBe(403);
    expect((await start(demo.estimator, quoteId)).status).toBe(404);
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    expect((await start(other, quoteId)).status).toBe(404);
    expect((await t.http.post('/api/quotes/00000000-0000-4000-8000-000000000000/start-own-build').set(...bearer(builder))).status).toBe(404);
    expect(await countRows(t.dataSource, 'work_orders')).toBe(ordersBefore);
    expect((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(builder)).expect(200)).body.status).toBe('drafting');
  });
});
