import { runFitCheck } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { DEMO_CUSTOMER_IDS, DEMO_MEMBERSHIP_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { createTestApp, resetData, TestApp } from '../../test/helpers/test-app';
import { MemberResolverService } from '../auth/member-resolver.service';
import { AuthUser } from '../common/tenant/auth-user';
import { seedCatalog } from '../database/seed/seed-catalog';
import { FitSettingsOverridesDto } from './dto/fit-settings-overrides.dto';
import { FitReportsService } from './fit-reports.service';
import { FitSettingsService } from './fit-settings.service';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const STAG = DEMO_PROJECT_IDS.stag;

// Against the real test database: running a check stores a report and moves the project along in one transaction.
describe('FitReportsService', () => {
  let t: TestApp;
  let reports: FitReportsService;
  let settings: FitSettingsService;
  const as = {} as Record<DemoRole, AuthUser>;

  async function statusOf(projectId: string): Promise<string> {
    const [row] = await t.dataSource.query('SELECT status FROM projects WHERE id = ?', [projectId]);
    return row.status;
  }

  beforeAll(async () => {
    t = await createTestApp();
    reports = t.app.get(FitReportsService);
    settings = t.app.get(FitSettingsService);
  });

  beforeEach(async () => {
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    const members = t.app.get(MemberResolverService);
    for (const role of Object.keys(DEMO_MEMBERSHIP_IDS) as DemoRole[]) as[role] = (await members.resolve(DEMO_MEMBERSHIP_IDS[role]))!;
  });

  afterAll(() => t.close());

  it('stores the report with its counts and moves a project still being set up on to fit-checked', async () => {
    expect(await statusOf(RIDGEBACK)).toBe('intake');
    const record = await reports.run(as.fabricator, RIDGEBACK);
    expect(record.totalCount).toBe(record.results.summary.total);
    expect(record.failsCount).toBe(record.results.summary.fails);
    expect(record.worstStatus).toBe('fails');
    expect(record.createdBy?.name).toBe(as.fabricator.name);
    expect(await statusOf(RIDGEBACK)).toBe('fit-checked');
  });

  it('never moves a project back: a project whose quote went out stays there', async () => {
    await t.dataSource.query("UPDATE projects SET status = 'quote-sent' WHERE id = ?", [RIDGEBACK]);
    await reports.run(as.estimator, RIDGEBACK);
    expect(await statusOf(RIDGEBACK)).toBe('quote-sent');
  });

  it("hides a report of another customer's project from a customer as not found", async () => {
    const stag = await reports.run(as.estimator, STAG);
    const ridgeback = await reports.run(as.estimator, RIDGEBACK);
    // The demo customer login belongs to the Ridgeback's customer.
    expect(as.customer.customerId).toBe(DEMO_CUSTOMER_IDS.juno);
    expect((await reports.get(as.customer, ridgeback.id)).id).toBe(ridgeback.id);
    await expect(reports.get(as.customer, stag.id)).rejects.toMatchObject({ status: 404, code: 'fit_report_not_found' });
  });

  it('compares two reports of the shop and refuses a report against itself', async () => {
    const a = await reports.run(as.estimator, RIDGEBACK);
    const b = await reports.run(as.estimator, RIDGEBACK);
    const comparison = await reports.compare(as.counter, a.id, b.id);
    expect(comparison.a.id).toBe(a.id);
    expect(comparison.b.id).toBe(b.id);
    // Same inputs: no check changed.
    expect(comparison.changes.filter((change) => change.change !== 'same')).toEqual([]);
    await expect(reports.compare(as.counter, a.id, a.id)).rejects.toMatchObject({ status: 400 });
  });

  it("what-if puts the request's thresholds over the shop's and stores nothing", async () => {
    await settings.replace(as.owner, { minGapBelowMm: 30, minGroundClearanceMm: 120 } as FitSettingsOverridesDto);
    const before = await t.dataSource.query('SELECT COUNT(*) AS n FROM fit_reports');
    const report = await reports.whatIf(as.estimator, { spec: DEMO_FIT_SPEC, settings: { minGapBelowMm: 20 } } as never);
    expect(report.settings.minGapBelowMm).toBe(20);
    expect(report.settings.minGroundClearanceMm).toBe(120);
    expect(report).toEqual(runFitCheck(DEMO_FIT_SPEC, { minGapBelowMm: 20, minGroundClearanceMm: 120 }));
    expect(await t.dataSource.query('SELECT COUNT(*) AS n FROM fit_reports')).toEqual(before);
  });
});
