import { DEMO_PROJECTS, DEMO_STORY_JOBS } from '@swapwright/seed-data';
import { imageSize } from 'image-size';
import { runDemoStory, DemoStoryResult } from '../src/database/seed/demo-story/demo-story';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { seedParts } from '../src/database/seed/seed-parts';
import { startAppWithPayments } from './helpers/app-with-payments';
import { bearer, jobsSettled, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

const STAGES = ['intake', 'measured', 'fit-checked', 'parts-planned', 'quote-sent', 'approved', 'deposit-paid', 'in-the-bay', 'done'];
const TABLES = ['customers', 'projects', 'measurement_values', 'measurement_photos', 'fit_reports', 'parts_plans', 'counter_lines', 'quotes', 'quote_revisions', 'work_orders', 'jobs', 'audit_events'];

type Project = { id: string; title: string; status: string };

/**
 * The demo story `npm start` plays on the development database, here on a fresh test database through the in-process
 * API, the mail fake and the payment fake: one job at each stage, each made by the routes the web calls.
 */
describe('the demo story: one job at each stage, through the API', () => {
  let t: TestApp;
  let s: Record<'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer', Session>;
  let stop: () => Promise<void>;
  let result: DemoStoryResult;
  const get = async (path: string, who: Session = s.owner) => (await t.http.get(path).set(...bearer(who)).expect(200)).body;
  const projectAt = (stage: string) => result.made.find((job) => job.stage === stage)!.projectId;

  beforeAll(async () => {
    ({ t, stop } = await startAppWithPayments());
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    await seedParts(t.dataSource);
    s = await signInAllRoles(t.http);
    result = await runDemoStory({ baseUrl: `http://127.0.0.1:${process.env.PORT}`, mailFakeUrl: process.env.MAIL_FAKE_URL! });
    // A safety limit, not a speed check: the story takes under a minute on a quiet machine and twice that on a busy one.
  }, 300_000);

  afterAll(async () => {
    // The other suites start from the minimal seed: leave it as they expect.
    // A failed set-up still closes the app, so the next suites get its port.
    try {
      await jobsSettled(t.dataSource);
      await resetData(t.dataSource);
    } finally {
      await stop?.();
    }
  });

  it('leaves one new job at each stage beside the two demo projects at intake', async () => {
    expect(result.made.map((job) => job.stage).sort()).toEqual([...STAGES].sort());
    const projects = (await get('/api/projects?pageSize=50')).items as Project[];
    const byStage = Object.fromEntries(STAGES.map((stage) => [stage, projects.filter((project) => project.status === stage).length]));
    expect(byStage).toEqual({ ...Object.fromEntries(STAGES.map((stage) => [stage, 1])), intake: 1 + DEMO_PROJECTS.length });
    // The demo projects the suites and journeys rely on are as the seed left them.
    for (const demo of DEMO_PROJECTS) expect(projects.find((project) => project.id === demo.id)).toMatchObject({ title: demo.title, status: 'intake' });
  });

  it('measured jobs carry a signed-off sheet with every required point and photos that are valid images', async () => {
    const sheet = await get(`/api/projects/${projectAt('measured')}/measurement-sheet`, s.fabricator);
    expect(sheet.signedOffAt).not.toBeNull();
    expect(sheet.missing).toEqual([]);
    expect(sheet.values.find((value: { pointId: string }) => value.pointId === 'ride-height.rear-left')).toMatchObject({ flagged: true, note: expect.stringMatching(/springs/) });
    expect(sheet.photos).toHaveLength(2);
    const file = await t.http.get(`/api/measurement-photos/${sheet.photos[0].id}/file`).set(...bearer(s.fabricator)).buffer(true).expect(200);
    // Source: the PNG Specification (W3C, ISO/IEC 15948): signature and IHDR, read back by the image-size package.
    expect(file.headers['content-type']).toBe('image/png');
    expect(imageSize(file.body as Buffer)).toMatchObject({ type: 'png', width: 320, height: 240 });
    // The intake job has no sheet readings yet.
    expect((await get(`/api/projects/${projectAt('intake')}/measurement-sheet`, s.fabricator)).values).toEqual([]);
  });

  it('each job past the fit check has a stored report, each job past planning a plan, the quoted ones a locked one', async () => {
    for (const stage of STAGES.slice(STAGES.indexOf('fit-checked'))) {
      expect((await get(`/api/projects/${projectAt(stage)}/fit-reports`)).items.length).toBeGreaterThan(0);
    }
    expect((await get(`/api/projects/${projectAt('measured')}/fit-reports`)).items).toEqual([]);
    expect(await get(`/api/projects/${projectAt('fit-checked')}/parts-plans`)).toEqual([]);
    const planned = await get(`/api/projects/${projectAt('parts-planned')}/parts-plans`);
    expect(planned).toHaveLength(1);
    expect(planned[0]).toMatchObject({ status: 'draft', result: { status: 'optimal' } });
    expect(await get(`/api/projects/${projectAt('parts-planned')}/quotes`)).toEqual([]);
    expect((await get(`/api/projects/${projectAt('done')}/parts-plans`))[0].status).toBe('locked');
  });

  it('the quote with the customer has two sent revisions; the customer with a login sees it waiting for her answer', async () => {
    const [quote] = await get(`/api/projects/${projectAt('quote-sent')}/quotes`);
    expect(quote).toMatchObject({ status: 'awaiting-answer', latestRevision: 2, sentRevision: 2, depositState: 'not-due' });
    const diff = await get(`/api/quotes/${quote.id}/compare?from=1&to=2`);
    expect(JSON.stringify(diff)).toMatch(/Wire the engine controller/);
    const pdf = await t.http.get(`/api/quotes/${quote.id}/pdf?revision=1`).set(...bearer(s.estimator)).buffer(true).expect(200);
    // Source: ISO 32000-1:2008 §7.5.2, a PDF file begins with the header line "%PDF-".
    expect((pdf.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const own = await get(`/api/quotes/${quote.id}`, s.customer);
    expect(own.revision.number).toBe(2);
  });

  it('approval, deposit and work order: unpaid, paid and ready, in the bay part-way, finished', async () => {
    const [approved] = await get(`/api/projects/${projectAt('approved')}/quotes`);
    expect(approved).toMatchObject({ status: 'approved', depositState: 'due' });
    await t.http.get(`/api/projects/${projectAt('approved')}/work-order`).set(...bearer(s.owner)).expect(404);
    for (const stage of ['deposit-paid', 'in-the-bay', 'done']) {
      const [paid] = await get(`/api/projects/${projectAt(stage)}/quotes`);
      expect(paid).toMatchObject({ status: 'approved', depositState: 'paid' });
    }
    const audit = (await get('/api/audit-events?pageSize=100')).items as Array<{ action: string }>;
    expect(audit.filter((event) => event.action === 'payment.settled')).toHaveLength(3);

    const ready = await get(`/api/projects/${projectAt('deposit-paid')}/work-order`);
    expect(ready).toMatchObject({ state: 'ready', progress: { passed: 0, failed: 0 } });
    const bay = await get(`/api/projects/${projectAt('in-the-bay')}/work-order`);
    expect(bay.state).toBe('in-the-bay');
    expect(bay.progress.passed).toBeGreaterThan(0);
    expect(bay.progress.open).toBeGreaterThan(0);
    const checks = bay.steps.flatMap((step: { checks: Array<{ key: string; recordings: number; photos: unknown[] }> }) => step.checks);
    expect(checks.find((check: { key: string }) => check.key === 'oil-pan-pickup.screen-height')).toMatchObject({ recordings: 2, latest: { result: 'pass' } });
    expect(checks.some((check: { photos: unknown[] }) => check.photos.length > 0)).toBe(true);
    // The fit check was run again with the planned rear-sump pan before the quote: the bay's pan-gap check cites it passing.
    const panGap = checks.find((check: { fitFinding: { checkId: string } | null }) => check.fitFinding?.checkId === 'envelope.sump-crossmember');
    expect(panGap.fitFinding.status).toBe('ok');
    const done = await get(`/api/projects/${projectAt('done')}/work-order`);
    expect(done).toMatchObject({ state: 'finished', progress: { failed: 0, open: 0 } });
  });

  it('the counter has set parts aside, ordered what was not on the shelf, received it for the jobs in the bay and issued it to them', async () => {
    type Line = { id: string; sku: string; status: string; quantity: number; onHand: number; available: number };
    const linesOf = async (stage: string) => {
      const [plan] = await get(`/api/projects/${projectAt(stage)}/parts-plans`, s.counter);
      return (await get(`/api/parts-plans/${plan.id}/counter-lines`, s.counter)) as Line[];
    };
    // The job in the bay and the finished one have every part set aside or received for them, and issued to them.
    const issued: Line[] = [];
    for (const stage of ['in-the-bay', 'done']) {
      const lines = await linesOf(stage);
      expect(lines.length).toBeGreaterThan(0);
      expect(lines.every((line) => line.status === 'issued')).toBe(true);
      issued.push(...lines);
    }
    expect((await linesOf('deposit-paid')).map((line) => line.status)).toContain('ordered');
    expect((await linesOf('approved')).every((line) => line.status === 'open')).toBe(true);
    const audit = (await get('/api/audit-events?kind=stock&pageSize=100')).items as Array<{ action: string; subjectId: string }>;
    expect(audit.filter((event) => event.action === 'stock.issued').map((event) => event.subjectId).sort()).toEqual(issued.map((line) => line.id).sort());
    // Issued parts are off the shelf: what each stock row holds set aside is exactly what the set-aside lines hold there.
    const rows = (await t.dataSource.query(
      `SELECT s.id, s.onHand, s.reserved, COALESCE(SUM(l.quantity), 0) AS held FROM part_stock s
       LEFT JOIN counter_lines l ON l.stockId = s.id AND l.status IN ('reserved', 'received') GROUP BY s.id, s.onHand, s.reserved`,
    )) as Array<{ onHand: number; reserved: number; held: number }>;
    for (const row of rows) {
      expect(Number(row.reserved)).toBe(Number(row.held));
      expect(Number(row.onHand)).toBeGreaterThanOrEqual(Number(row.reserved));
    }
  });

  it('a second run adds nothing', async () => {
    await jobsSettled(t.dataSource);
    const count = async () => Promise.all(TABLES.map(async (table) => Number((await t.dataSource.query(`SELECT COUNT(*) AS n FROM \`${table}\``))[0].n)));
    const before = await count();
    const again = await runDemoStory({ baseUrl: `http://127.0.0.1:${process.env.PORT}`, mailFakeUrl: process.env.MAIL_FAKE_URL! });
    expect(again).toMatchObject({ made: [], alreadyPresent: DEMO_STORY_JOBS.length });
    expect(await count()).toEqual(before);
  });
});
