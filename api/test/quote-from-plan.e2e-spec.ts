import { DEMO_LABOR_OPERATIONS, DemoRole } from '@swapwright/seed-data';
import { planStagForNewCustomer, type QuoteLineBody } from './fixtures/planned-stag.fixture';
import { startAppWithPayments, until } from './helpers/app-with-payments';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { bearer, seedWithParts, Session, TestApp } from './helpers/test-app';

type Line = QuoteLineBody;
type PlanResult = {
  picks: { partId: string; sku: string; quantity: number; priceCents: number; laborHours: number; category: string }[];
  operations: { operation: string; laborHours: number; operationCode?: string | null }[];
  totals: { partsCents: number; laborHours: number; laborCents: number };
};

const operation = (code: string) => DEMO_LABOR_OPERATIONS.find((candidate) => candidate.code === code)!;

describe('the quote drafted from a locked parts plan carries exactly the plan', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let plan: { id: string; version: number; result: PlanResult };
  let lines: Line[];
  let totals: { partsSubtotalCents: number };
  let quoteId: string;
  let projectId: string;
  let stop: () => Promise<void>;

  beforeAll(async () => {
    ({ t, stop } = await startAppWithPayments());
    demo = await seedWithParts(t);
    const as = (method: 'post', path: string) => t.http[method](path).set(...bearer(demo.estimator)).send({});
    const planned = await planStagForNewCustomer(t, demo.estimator, { name: 'Test Customer Plan', email: 'plan.customer@example.test' }, 'Stag with the crossmember to move');
    plan = planned.plan as typeof plan;
    const drafted = await as('post', `/api/projects/${planned.projectId}/quotes`).expect(201);
    expect(drafted.body.revision).toMatchObject({ partsPlanId: plan.id, partsPlanVersion: plan.version });
    lines = drafted.body.revision.lines;
    quoteId = drafted.body.id;
    projectId = planned.projectId;
    totals = drafted.body.revision.totals;
  }, 60_000);

  afterAll(() => stop());

  it('the plan moves the transmission crossmember and raises its mount pad in one rework, and its pan clears the front crossmember', () => {
    const planned = plan.result.operations.map((op) => op.operation);
    // Common practice (no published source): the shop reworks the transmission crossmember once, so both moves are one operation.
    const rework = plan.result.operations.filter((op) => op.operationCode === 'transmission-crossmember');
    expect(rework).toHaveLength(1);
    expect(rework[0].operation).toMatch(/^Rework the transmission crossmember: .*\braise its mount pad\b/);
    expect(rework[0].operation).toMatch(/\brelocate it \d+\.\d mm \(\d+\.\d\d in\) rearward\b/);
    // One set-up of the member: the hours of one move (the shop's crossmember setting), not one per shortfall.
    expect(rework[0].laborHours).toBe(4);
    expect(planned.some((words) => /front crossmember/i.test(words))).toBe(false);
  });

  it('quotes every planned operation in its own words and hours, and nothing the plan does not call for', () => {
    for (const planned of plan.result.operations) {
      const quoted = lines.filter((line) => line.kind === 'labor' && line.description === planned.operation);
      expect(quoted).toHaveLength(1);
      // Common practice (no published source): labor is quoted in tenths of an hour.
      expect(quoted[0]).toMatchObject({ source: 'plan', hours: Math.round(planned.laborHours * 10) / 10 });
    }
    // The crossmember rework is one line of the shop's operation (its welding and support cautions), linked by its code.
    const rework = lines.filter((line) => line.laborOperationId === operation('transmission-crossmember').id);
    expect(rework).toHaveLength(1);
    expect(rework[0]).toMatchObject({ source: 'plan', hours: 4 });
    expect(rework[0].description).toMatch(/^Rework the transmission crossmember: /);
    // The rear-sump pan clears the front crossmember: no notch is quoted.
    expect(lines.some((line) => line.laborOperationId === operation('crossmember-modify').id)).toBe(false);
    expect(lines.some((line) => /front crossmember/i.test(line.description))).toBe(false);
    // Every line but the shop's standing engine removal and installation comes from the plan, and its labor is the plan's.
    const fromPlan = lines.filter((line) => line.source === 'plan');
    expect(lines.filter((line) => line.source !== 'plan').map((line) => line.laborOperationId)).toEqual([operation('engine-remove-install').id]);
    const planHours = fromPlan.filter((line) => line.kind === 'labor').reduce((sum, line) => sum + (line.hours ?? 0), 0);
    expect(Math.round(planHours * 10) / 10).toBe(plan.result.totals.laborHours);
  });

  it('prices each part at the plan price, so the parts subtotal is the plan parts figure', () => {
    const parts = lines.filter((line) => line.kind === 'part');
    expect(parts.map((line) => line.catalogItemId).sort()).toEqual(plan.result.picks.map((pick) => pick.partId).sort());
    for (const pick of plan.result.picks) {
      const line = parts.find((candidate) => candidate.catalogItemId === pick.partId)!;
      expect(line).toMatchObject({ source: 'plan', sku: pick.sku, pricing: 'list', unitPriceCents: pick.priceCents, quantity: pick.quantity });
    }
    const pan = parts.find((line) => line.sku === 'TR-4410');
    if (pan) expect(pan.unitPriceCents).toBe(32_900);
    expect(totals.partsSubtotalCents).toBe(plan.result.totals.partsCents);
  });

  it('the work order of the accepted quote has a step per quoted labor line, no front-crossmember work, and one figure per joint', async () => {
    const before = await lastMailId();
    await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator)).expect(200);
    const mail = await waitForMail('plan.customer@example.test', /quote Q-/, before);
    const token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail.text)![1];
    await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' }).expect(200);
    await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
    const opened = await until(
      async () => t.http.get(`/api/projects/${projectId}/work-order`).set(...bearer(demo.fabricator)),
      (response) => response.status === 200,
      'the work order',
    );
    type Step = { key: string; name: string; hours: number; hazards: string[]; torque: { joint: string | null; fastener: string; partSku: string | null }[]; checks: { label: string }[] };
    const steps = opened.body.steps as Step[];
    const labor = lines.filter((line) => line.kind === 'labor');
    expect(steps.filter((step) => step.key !== 'other-parts').map((step) => [step.name, step.hours]).sort()).toEqual(labor.map((line) => [line.description, line.hours]).sort());
    expect(steps.some((step) => /front crossmember/i.test(step.name) || step.key.startsWith('crossmember-modify'))).toBe(false);
    // The transmission-crossmember work keeps its cautions: the vehicle on stands and frame welding.
    // One step for the crossmember rework, so its checks are asked once.
    const rework = steps.filter((step) => step.key.startsWith('transmission-crossmember'));
    expect(rework.map((step) => step.key)).toEqual(['transmission-crossmember']);
    expect(rework[0].name).toMatch(/^Rework the transmission crossmember: /);
    expect(rework[0].hazards).toEqual(expect.arrayContaining(['support', 'welding']));
    const checkLabels = steps.flatMap((step) => step.checks.map((check) => check.label));
    expect(new Set(checkLabels).size).toBe(checkLabels.length);
    expect(opened.body.cautions.map((c: { hazard: string }) => c.hazard)).toEqual(expect.arrayContaining(['lifting', 'support', 'welding']));
    const joints = steps.flatMap((step) => step.torque.map((spec) => spec.joint ?? spec.fastener));
    expect(new Set(joints).size).toBe(joints.length);
    const pan = steps.flatMap((step) => step.torque).filter((spec) => spec.joint === 'oil-pan-to-block');
    expect(pan).toHaveLength(1);
    expect(pan[0].partSku).not.toBeNull();
  });
});
