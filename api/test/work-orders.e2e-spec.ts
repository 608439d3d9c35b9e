import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import Stripe from 'stripe';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { seedParts } from '../src/database/seed/seed-parts';
import { startAppWithPayments, until } from './helpers/app-with-payments';
import exifr from 'exifr';
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { demoOperation, demoPart, SHOP_QUOTE_LINES } from './fixtures/shop-quote-lines';
import { bearer, countRows, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';
import { jpegWithGps, makeJpeg } from './helpers/test-images';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { pdfText } from './helpers/pdf-text';
import { RunningPaymentFake } from './helpers/payment-fake-process';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const operation = demoOperation;
const part = demoPart;
const LINES = SHOP_QUOTE_LINES;

type Check = { key: string; label: string; photos: { id: string; contentType: string; widthPx: number; heightPx: number; uploadedByName: string }[]; measured: boolean; range: string | null; rangeFrom: string | null; latest: { result: string; value: number | null; recordedByName: string; recordedAt: string } | null; fitFinding: { checkId: string } | null };
type Step = { key: string; name: string; torque: { joint: string | null; fastener: string; lbfFt: number; newtonMetres: number; sequence: string | null; partSku: string | null }[]; checks: Check[] };

describe('job stages and the work order, from the first fit check to the finished build', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let fake: RunningPaymentFake;
  let token: string;
  let quoteId: string;
  let workOrderId: string;

  const stage = async () => (await t.http.get(`/api/projects/${RIDGEBACK}`).set(...bearer(demo.estimator)).expect(200)).body.status as string;
  const workOrder = async (session: Session = demo.fabricator) => (await t.http.get(`/api/work-orders/${workOrderId}`).set(...bearer(session)).expect(200)).body;
  const checkOf = (order: { steps: Step[] }, key: string) => order.steps.flatMap((step) => step.checks).find((check) => check.key === key)!;
  const record = (body: object, session: Session = demo.fabricator) => t.http.post(`/api/work-orders/${workOrderId}/checks`).set(...bearer(session)).send(body);
  let stop: () => Promise<void>;

  type Line = { id: string; sku: string; quantity: number; status: string; stockId: string | null; issuedAt: string | null; onHand: number; available: number; stock: Array<{ id: string; onHand: number; reserved: number }> };
  const counterLines = async (): Promise<Line[]> => {
    const [plan] = (await t.http.get(`/api/projects/${RIDGEBACK}/parts-plans`).set(...bearer(demo.counter)).expect(200)).body;
    return (await t.http.get(`/api/parts-plans/${plan.id}/counter-lines`).set(...bearer(demo.counter)).expect(200)).body;
  };
  const planId = async (): Promise<string> => (await t.http.get(`/api/projects/${RIDGEBACK}/parts-plans`).set(...bearer(demo.counter)).expect(200)).body[0].id;
  const shelf = async (stockId: string) => {
    const [row] = await t.dataSource.query('SELECT onHand, reserved FROM part_stock WHERE id = ?', [stockId]);
    return { onHand: Number(row.onHand), reserved: Number(row.reserved) };
  };
  const counterPost = (path: string, session: Session = demo.counter) => t.http.post(`/api/${path}`).set(...bearer(session)).send({});
  const stockEvents = async (action: string) =>
    ((await t.http.get('/api/audit-events?kind=stock&pageSize=100').set(...bearer(demo.owner)).expect(200)).body.items as Array<{ action: string; subjectId: string; before: Record<string, number>; after: Record<string, number> }>).filter(
      (event) => event.action === action,
    );

  beforeAll(async () => {
    ({ t, fake, stop } = await startAppWithPayments());
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    await seedParts(t.dataSource);
    demo = await signInAllRoles(t.http);
  });

  afterAll(() => stop());

  it('moves the stage with each event: fit report run, parts plan saved, quote sent, approved', async () => {
    expect(await stage()).toBe('intake');
    await t.http.post(`/api/projects/${RIDGEBACK}/fit-reports`).set(...bearer(demo.fabricator)).expect(201);
    expect(await stage()).toBe('fit-checked');
    await t.http.post(`/api/projects/${RIDGEBACK}/parts-plans`).set(...bearer(demo.estimator)).send({ objective: 'lowest-cost' }).expect(201);
    expect(await stage()).toBe('parts-planned');

    // A draft without lines is drawn from the plan (parts at the plan's price, the operations that install them) and
    // names the plan version and the fit report it was built on.
    const drafted = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({}).expect(201);
    const plan = (await t.http.get(`/api/projects/${RIDGEBACK}/parts-plans`).set(...bearer(demo.estimator))).body[0];
    expect(drafted.body.revision).toMatchObject({ partsPlanId: plan.id, partsPlanVersion: plan.version, fitReportId: expect.any(String) });
    const draftLines = drafted.body.revision.lines as { kind: string; source: string; catalogKind: string | null; catalogItemId: string | null; laborOperationId: string | null; pricing: string; unitPriceCents: number; markupPercent: number | null }[];
    const planParts = draftLines.filter((line) => line.kind === 'part');
    expect(planParts.map((line) => line.catalogItemId).sort()).toEqual(plan.result.picks.map((pick: { partId: string }) => pick.partId).sort());
    const planPrice = (partId: string | null) => plan.result.picks.find((pick: { partId: string }) => pick.partId === partId).priceCents;
    expect(planParts.every((line) => line.source === 'plan' && line.catalogKind === 'parts' && line.pricing === 'list' && line.unitPriceCents === planPrice(line.catalogItemId))).toBe(true);
    const laborOperations = draftLines.filter((line) => line.kind === 'labor').map((line) => line.laborOperationId);
    expect(laborOperations).toEqual(expect.arrayContaining([operation('engine-remove-install').id, operation('oil-pan-pickup').id]));
    const pdf = await t.http.get(`/api/quotes/${drafted.body.id}/pdf`).set(...bearer(demo.estimator)).responseType('blob').expect(200);
    const text = await pdfText(pdf.body as Buffer);
    expect(text).toMatch(new RegExp(`Fit report ${drafted.body.revision.fitReportId.slice(0, 8)}`));
    expect(text).toContain(`Parts from parts plan version ${plan.version}.`);

    const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES }).expect(201);
    quoteId = created.body.id;
    expect(await stage()).toBe('parts-planned');
    const before = await lastMailId();
    await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator)).expect(200);
    expect(await stage()).toBe('quote-sent');
    const mail = await waitForMail('customer@ironbark.test', /quote Q-/, before);
    token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail.text)![1];
    await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' }).expect(200);
    expect(await stage()).toBe('approved');
    // No work order before the deposit is paid.
    const none = await t.http.get(`/api/projects/${RIDGEBACK}/work-order`).set(...bearer(demo.fabricator)).expect(404);
    expect(none.body.message).toMatch(/deposit is paid/);
  });

  it('parts cannot be issued to a job before its deposit opens the work order', async () => {
    const line = (await counterLines()).find((candidate) => candidate.available >= candidate.quantity)!;
    await counterPost(`counter-lines/${line.id}/reserve`).expect(200);
    const early = await counterPost(`counter-lines/${line.id}/issue`).expect(409);
    expect(early.body).toMatchObject({ code: 'no_work_order', message: expect.stringMatching(/once its deposit has opened the work order/) });
    expect((await counterPost(`parts-plans/${await planId()}/issue`)).status).toBe(409);
    await counterPost(`counter-lines/${line.id}/release`).expect(200);
  });

  it('the settled deposit opens the work order exactly once, in build order, with torques in both units', async () => {
    await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
    const order = await until(
      async () => t.http.get(`/api/projects/${RIDGEBACK}/work-order`).set(...bearer(demo.estimator)),
      (response) => response.status === 200,
      'the work order',
    );
    workOrderId = order.body.id;
    expect(await stage()).toBe('deposit-paid');
    expect(order.body).toMatchObject({ state: 'ready', quoteId, progress: { total: 5, passed: 0, failed: 0, open: 5 } });
    expect(order.body.steps.map((step: Step) => step.key)).toEqual(['cam-timing-set', 'oil-pan-pickup']);
    const pan = order.body.steps[1] as Step;
    // Source: NIST SP 811 (2008), Appendix B.9: 1 lbf·ft = 1.355 817 948 331 4004 N·m, so 18 lbf·ft ≈ 24.4 N·m.
    expect(pan.torque).toContainEqual(expect.objectContaining({ joint: 'oil-pump-to-main-cap', fastener: 'Oil pump to rear main cap bolts (M8)', lbfFt: 18, newtonMetres: 24.4, partSku: 'TR-OP-HV' }));
    // One figure per joint: the parts' own data (pump, pan and pickup bolts) replaces the operation's general figures.
    const joints = (order.body.steps as Step[]).flatMap((step) => step.torque.map((spec) => spec.joint ?? spec.fastener));
    expect(new Set(joints).size).toBe(joints.length);
    expect(pan.torque.filter((spec) => spec.partSku === null).map((spec) => spec.fastener)).toEqual([]);
    // Source: NIST SP 811 (2008), Appendix B.9: the pan's own 12 N·m is 8.9 lbf·ft, and no 9.0 lbf·ft beside it.
    expect(pan.torque.filter((spec) => spec.joint === 'oil-pan-to-block')).toEqual([expect.objectContaining({ lbfFt: 8.9, newtonMetres: 12, partSku: 'TR-4410' })]);
    const panBolts = pan.torque.find((spec) => spec.partSku === 'TR-4410' && /pan bolts/.test(spec.fastener))!;
    expect(panBolts.sequence).toMatch(/crisscross from the centre out, in two stages/);
    expect(checkOf(order.body, 'oil-pan-pickup.screen-height')).toMatchObject({ measured: true, range: '6–9 mm', rangeFrom: 'TR-4411', latest: null });
    expect(checkOf(order.body, 'cam-timing-set.cam-marks').fitFinding).toMatchObject({ checkId: 'cam.timing-advance' });
    // What the locked plan resolves is said beside a shortfall the check quotes; a finding that fits has nothing to resolve.
    for (const step of order.body.steps as { checks: { fitFinding: { status: string; resolvedBy: string | null } | null }[] }[]) {
      for (const { fitFinding } of step.checks) if (fitFinding && fitFinding.status === 'ok') expect(fitFinding.resolvedBy).toBeNull();
    }
    expect(checkOf(order.body, 'cam-timing-set.cam-marks').fitFinding).toHaveProperty('resolvedBy');
    expect(order.body.cautions.map((c: { hazard: string }) => c.hazard)).toEqual(['lifting', 'support', 'fuel', 'welding']);
    expect(order.body.deference).toMatch(/licensed practice/);

    // The same settlement event again (redelivered, then replayed freshly signed) opens nothing more.
    const events = (await (await fetch(`${fake.url}/_fake/events`)).json()) as Stripe.Event[];
    const succeeded = events.filter((event) => event.type === 'payment_intent.succeeded').at(-1)!;
    await fetch(`${fake.url}/_fake/events/${succeeded.id}/deliver`, { method: 'POST' });
    const payload = JSON.stringify(succeeded);
    await t.http.post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', Stripe.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret })).send(payload).expect(200);
    expect(await countRows(t.dataSource, 'work_orders')).toBe(1);
  });

  it('lets only the shop staff who build read it, and refuses checks before the job is in the bay', async () => {
    expect((await t.http.get(`/api/work-orders/${workOrderId}`).set(...bearer(demo.counter))).status).toBe(403);
    expect((await t.http.get(`/api/work-orders/${workOrderId}`).set(...bearer(demo.customer))).status).toBe(403);
    const early = await record({ checkKey: 'oil-pan-pickup.screen-height', value: 8 });
    expect(early.status).toBe(409);
    expect(early.body.message).toMatch(/Start the work order first/);
  });

  it('starting the work order moves the stage to in the bay', async () => {
    const started = await t.http.post(`/api/work-orders/${workOrderId}/start`).set(...bearer(demo.fabricator)).expect(200);
    expect(started.body.state).toBe('in-the-bay');
    expect(started.body.startedAt).not.toBeNull();
    expect(await stage()).toBe('in-the-bay');
    expect((await t.http.post(`/api/work-orders/${workOrderId}/start`).set(...bearer(demo.fabricator))).status).toBe(409);
  });

  it('records checks with who and when; a value outside its range shows as failed', async () => {
    // Common practice (no published source): the pickup screen sits 6–10 mm above the sump floor; this pickup's data says 6–9 mm.
    const inRange = await record({ checkKey: 'oil-pan-pickup.screen-height', value: 8 }).expect(200);
    expect(checkOf(inRange.body, 'oil-pan-pickup.screen-height').latest).toMatchObject({ result: 'pass', value: 8, recordedByName: expect.any(String) });
    const outside = await record({ checkKey: 'oil-pan-pickup.screen-height', value: 9.5, note: 'screen sits high' }).expect(200);
    const latest = checkOf(outside.body, 'oil-pan-pickup.screen-height').latest!;
    expect(latest).toMatchObject({ result: 'fail', value: 9.5 });
    expect(Date.parse(latest.recordedAt)).not.toBeNaN();
    expect(outside.body.progress).toEqual({ total: 5, passed: 0, failed: 1, open: 4 });
    // Common practice (no published source): a check marked not right says what is wrong, or the next person cannot put it right.
    for (const note of [undefined, '   ']) {
      const bare = await record({ checkKey: 'oil-pan-pickup.rear-main-lip', passed: false, ...(note !== undefined && { note }) }).expect(400);
      expect(bare.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(/marked not right: say in the note what is wrong/) });
    }
    const unchanged = await t.http.get(`/api/work-orders/${workOrderId}`).set(...bearer(demo.fabricator)).expect(200);
    expect(checkOf(unchanged.body, 'oil-pan-pickup.rear-main-lip').latest).toBeNull();
    const rolled = await record({ checkKey: 'oil-pan-pickup.rear-main-lip', passed: false, note: 'Seal lip rolled at the left corner' }).expect(200);
    expect(checkOf(rolled.body, 'oil-pan-pickup.rear-main-lip').latest).toMatchObject({ result: 'fail', note: 'Seal lip rolled at the left corner' });
  });

  it('a photo of a check is stored without its location, served to the shop and the project\'s customer with nosniff, not found for another shop', async () => {
    const tagged = jpegWithGps();
    const url = `/api/work-orders/${workOrderId}/checks/oil-pan-pickup.pickup-tabs/photos`;
    const added = await t.http.post(url).set(...bearer(demo.fabricator)).attach('photos', tagged, 'tabs.jpg').expect(201);
    const [photo] = checkOf(added.body, 'oil-pan-pickup.pickup-tabs').photos;
    expect(photo).toMatchObject({ contentType: 'image/jpeg', widthPx: 64, heightPx: 48, uploadedByName: demo.fabricator.user.name });
    const file = `/api/work-order-photos/${photo.id}/file`;
    const served = await t.http.get(file).set(...bearer(demo.estimator)).buffer(true).expect(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(await exifr.gps(served.body as Buffer).catch(() => undefined)).toBeUndefined();
    // The project's own customer may see it; another shop may not (not found, as if it did not exist).
    await t.http.get(file).set(...bearer(demo.customer)).expect(200);
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    expect((await t.http.get(file).set(...bearer(other))).status).toBe(404);
    expect((await t.http.post(url).set(...bearer(other)).attach('photos', makeJpeg(16, 16), 'peek.jpg')).status).toBe(404);
    // The shared photo pipeline's refusals: content read (not the name), a check that does not exist, a role that records no checks.
    const notImage = await t.http.post(url).set(...bearer(demo.fabricator)).attach('photos', Buffer.from('not a photo'), 'tabs.jpg');
    expect(notImage.status).toBe(415);
    expect((await t.http.post(`/api/work-orders/${workOrderId}/checks/no-such.check/photos`).set(...bearer(demo.fabricator)).attach('photos', makeJpeg(16, 16), 'x.jpg')).status).toBe(400);
    expect((await t.http.post(url).set(...bearer(demo.counter)).attach('photos', makeJpeg(16, 16), 'x.jpg')).status).toBe(403);
    expect((await t.http.post(url).set(...bearer(demo.fabricator))).status).toBe(400);
    expect(checkOf(await workOrder(), 'oil-pan-pickup.pickup-tabs').photos).toHaveLength(1);
  });

  it('a wrong check photo is removed with its file by who builds; not found for another shop, refused to other roles', async () => {
    const storedFiles = async (): Promise<string[]> => readdir(join(process.env.UPLOAD_DIR!, 'measurement-photos')).catch(() => []);
    const storageKeyOf = async (id: string) => ((await t.dataSource.query('SELECT storageKey FROM work_order_check_photos WHERE id = ?', [id])) as { storageKey: string }[])[0]?.storageKey;
    const url = `/api/work-orders/${workOrderId}/checks/oil-pan-pickup.pickup-tabs/photos`;
    const added = await t.http.post(url).set(...bearer(demo.fabricator)).attach('photos', makeJpeg(24, 24), 'wrong-engine.jpg').expect(201);
    const photos = checkOf(added.body, 'oil-pan-pickup.pickup-tabs').photos;
    expect(photos).toHaveLength(2);
    const wrong = photos[1];
    const key = await storageKeyOf(wrong.id);
    expect(await storedFiles()).toContain(key);
    const rows = await countRows(t.dataSource, 'work_order_check_photos');

    // Another shop: not found, as if it did not exist; a role that adds no check photos: refused. Nothing changes.
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    expect((await t.http.delete(`/api/work-order-photos/${wrong.id}`).set(...bearer(other))).status).toBe(404);
    expect((await t.http.delete(`/api/work-order-photos/${wrong.id}`).set(...bearer(demo.counter))).status).toBe(403);
    expect((await t.http.delete(`/api/work-order-photos/${wrong.id}`).set(...bearer(demo.customer))).status).toBe(403);
    expect(await countRows(t.dataSource, 'work_order_check_photos')).toBe(rows);

    await t.http.delete(`/api/work-order-photos/${wrong.id}`).set(...bearer(demo.fabricator)).expect(204);
    expect(await countRows(t.dataSource, 'work_order_check_photos')).toBe(rows - 1);
    expect(await storedFiles()).not.toContain(key);
    expect(checkOf(await workOrder(), 'oil-pan-pickup.pickup-tabs').photos.map((photo: { id: string }) => photo.id)).toEqual([photos[0].id]);
    await t.http.get(`/api/work-order-photos/${wrong.id}/file`).set(...bearer(demo.fabricator)).expect(404);
    expect((await t.http.delete(`/api/work-order-photos/${wrong.id}`).set(...bearer(demo.fabricator))).status).toBe(404);
  });

  // Common practice (no published source): parts set aside for a job are issued to it when the bay takes them; issued
  // parts are off the shelf (on hand and set aside both go down), so they can no longer be released and sold again.
  it('the counter issues set-aside parts to the job in the bay: off the shelf, audited, never released after', async () => {
    const lines = (await counterLines()).filter((line) => line.available >= line.quantity);
    expect(lines.length).toBeGreaterThanOrEqual(3);
    const [first, second, third] = lines;
    for (const line of [first, second, third]) await counterPost(`counter-lines/${line.id}/reserve`).expect(200);
    const reserved = (await counterLines()).find((line) => line.id === first.id)!;
    const before = await shelf(reserved.stockId!);

    const issued = await counterPost(`counter-lines/${first.id}/issue`).expect(200);
    expect(issued.body).toMatchObject({ status: 'issued', stockId: reserved.stockId, issuedAt: expect.any(String) });
    expect(await shelf(reserved.stockId!)).toEqual({ onHand: before.onHand - first.quantity, reserved: before.reserved - first.quantity });
    expect(issued.body.onHand).toBe(before.onHand - first.quantity);
    const [event] = (await stockEvents('stock.issued')).filter((candidate) => candidate.subjectId === first.id);
    expect(event).toMatchObject({ before: { status: 'reserved', onHand: before.onHand, reserved: before.reserved }, after: { status: 'issued', onHand: before.onHand - first.quantity } });

    // An issued line is never released (the parts are in the truck), nor issued twice.
    const release = await counterPost(`counter-lines/${first.id}/release`).expect(409);
    expect(release.body).toMatchObject({ code: 'counter_line_issued', message: expect.stringMatching(/was issued to the job: its parts left the shelf, so it cannot be released/) });
    expect((await counterPost(`counter-lines/${first.id}/issue`)).status).toBe(409);
    expect(await shelf(reserved.stockId!)).toEqual({ onHand: before.onHand - first.quantity, reserved: before.reserved - first.quantity });
    // A line not set aside is not issued; the fabricator does not work the counter; another shop does not see the line.
    const open = (await counterLines()).find((line) => line.status === 'open' || line.status === 'to-order' || line.status === 'ordered');
    if (open) expect((await counterPost(`counter-lines/${open.id}/issue`)).body.code).toBe('counter_line_not_set_aside');
    expect((await counterPost(`counter-lines/${second.id}/issue`, demo.fabricator)).status).toBe(403);
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    expect((await counterPost(`counter-lines/${second.id}/issue`, other)).status).toBe(404);
    expect((await counterPost(`counter-lines/${first.id}/return`, other)).status).toBe(404);
    expect((await counterPost(`parts-plans/${await planId()}/issue`, other)).status).toBe(404);

    // A part back unused goes on hand again through Return to shelf; the line is open and can be set aside again.
    const returned = await counterPost(`counter-lines/${first.id}/return`).expect(200);
    expect(returned.body).toMatchObject({ status: 'open', stockId: null, issuedAt: null });
    expect(await shelf(reserved.stockId!)).toEqual({ onHand: before.onHand, reserved: before.reserved - first.quantity });
    expect((await stockEvents('stock.returned')).filter((candidate) => candidate.subjectId === first.id)).toHaveLength(1);
    expect((await counterPost(`counter-lines/${first.id}/return`)).body.code).toBe('counter_line_not_issued');
    await counterPost(`counter-lines/${first.id}/reserve`).expect(200);

    // Issue and release of the same line at once: exactly one wins, and the shelf agrees with it.
    const secondStock = (await counterLines()).find((line) => line.id === second.id)!.stockId!;
    const shelfBefore = await shelf(secondStock);
    const raced = await Promise.all([counterPost(`counter-lines/${second.id}/issue`), counterPost(`counter-lines/${second.id}/release`, demo.owner)]);
    expect(raced.map((response) => response.status).sort()).toEqual([200, 409]);
    const won = raced[0].status === 200 ? 'issued' : 'open';
    expect((await counterLines()).find((line) => line.id === second.id)!.status).toBe(won);
    expect(await shelf(secondStock)).toEqual(
      won === 'issued'
        ? { onHand: shelfBefore.onHand - second.quantity, reserved: shelfBefore.reserved - second.quantity }
        : { onHand: shelfBefore.onHand, reserved: shelfBefore.reserved - second.quantity },
    );
    if (won === 'open') await counterPost(`counter-lines/${second.id}/reserve`).expect(200);
  });

  it('refuses a check recorded the wrong way, with a message that says what to send', async () => {
    expect((await record({ checkKey: 'oil-pan-pickup.screen-height', passed: true })).body.message).toMatch(/is measured: send value \(allowed 6–9 mm\)/);
    expect((await record({ checkKey: 'oil-pan-pickup.pickup-tabs', value: 3 })).body.message).toMatch(/send passed true or false/);
    expect((await record({ checkKey: 'no-such.check', passed: true })).status).toBe(400);
    expect((await record({ checkKey: 'oil-pan-pickup.screen-height', value: 'eight' })).status).toBe(400);
    expect((await record({ checkKey: 'oil-pan-pickup.pickup-tabs', passed: true }, demo.counter)).status).toBe(403);
  });

  it('finishing needs every check passed, then moves the stage to done; the stage never moves back', async () => {
    const refused = await t.http.post(`/api/work-orders/${workOrderId}/finish`).set(...bearer(demo.fabricator)).expect(409);
    expect(refused.body.message).toMatch(/Still open or failed: .*Camshaft turns by hand/);
    await record({ checkKey: 'oil-pan-pickup.screen-height', value: 7.5 }).expect(200);
    for (const checkKey of ['oil-pan-pickup.pickup-tabs', 'oil-pan-pickup.rear-main-lip', 'cam-timing-set.cam-turns', 'cam-timing-set.cam-marks']) {
      await record({ checkKey, passed: true }).expect(200);
    }
    const setAside = (await counterLines()).filter((line) => line.status === 'reserved' || line.status === 'received');
    expect(setAside.length).toBeGreaterThan(0);
    const shelvesBefore = await Promise.all(setAside.map((line) => shelf(line.stockId!)));
    const issuedBefore = (await stockEvents('stock.issued')).length;
    const finished = await t.http.post(`/api/work-orders/${workOrderId}/finish`).set(...bearer(demo.fabricator)).expect(200);
    expect(finished.body).toMatchObject({ state: 'finished', progress: { total: 5, passed: 5, failed: 0, open: 0 } });
    expect(await stage()).toBe('done');
    // Finishing issued whatever was still set aside for the job: off the shelf, one audit entry per line, nothing left to release.
    const after = await counterLines();
    for (const [index, line] of setAside.entries()) {
      expect(after.find((candidate) => candidate.id === line.id)).toMatchObject({ status: 'issued', issuedAt: expect.any(String) });
      expect(await shelf(line.stockId!)).toEqual({ onHand: shelvesBefore[index].onHand - line.quantity, reserved: shelvesBefore[index].reserved - line.quantity });
    }
    expect(after.some((line) => line.status === 'reserved' || line.status === 'received')).toBe(false);
    expect((await stockEvents('stock.issued')).length).toBe(issuedBefore + setAside.length);
    expect((await counterPost(`counter-lines/${setAside[0].id}/release`)).body.code).toBe('counter_line_issued');
    // The job is done: nothing more is issued to it.
    expect((await counterPost(`parts-plans/${await planId()}/issue`)).status).toBe(409);
    expect((await record({ checkKey: 'oil-pan-pickup.pickup-tabs', passed: false })).status).toBe(409);
    // A finished work order is signed off: its check photos stay as the record of the build.
    const [kept] = checkOf(finished.body, 'oil-pan-pickup.pickup-tabs').photos;
    const rows = await countRows(t.dataSource, 'work_order_check_photos');
    const refusedRemoval = await t.http.delete(`/api/work-order-photos/${kept.id}`).set(...bearer(demo.owner)).expect(409);
    expect(refusedRemoval.body).toMatchObject({ code: 'work_order_finished', message: expect.stringMatching(/finished \(signed off\): its check photos stay/) });
    expect(await countRows(t.dataSource, 'work_order_check_photos')).toBe(rows);
    await t.http.get(`/api/work-order-photos/${kept.id}/file`).set(...bearer(demo.fabricator)).expect(200);
    await t.http.post(`/api/projects/${RIDGEBACK}/fit-reports`).set(...bearer(demo.fabricator)).expect(201);
    expect(await stage()).toBe('done');
    const list = await t.http.get('/api/work-orders?state=finished').set(...bearer(demo.owner)).expect(200);
    expect(list.body.map((o: { id: string }) => o.id)).toEqual([workOrderId]);
    expect((await t.http.get('/api/work-orders?state=parked').set(...bearer(demo.owner))).status).toBe(400);
  });
});
