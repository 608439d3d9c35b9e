import { DEMO_LABOR_OPERATIONS, DEMO_SIGN_INS, DEMO_STORY_JOBS, DemoRole, DemoStoryJob } from '@swapwright/seed-data';
import type { CustomerResponseDto } from '../../../customers/dto/customer-response.dto';
import type { MeasurementSheetResponseDto } from '../../../measurements/dto/measurement-response.dto';
import type { CounterLineResponseDto, PartsPlanResponseDto } from '../../../parts/dto/plan.dto';
import type { ProjectResponseDto } from '../../../projects/dto/project-response.dto';
import type { QuoteLineResponseDto, QuoteResponseDto } from '../../../quotes/dto/quote-response.dto';
import type { WorkCheckResponseDto, WorkOrderResponseDto } from '../../../work-orders/dto/work-order-response.dto';
import { StoryClient, waitFor } from './story-client';
import { storyPhoto } from './story-photos';

/**
 * Plays the demo story through the API, as the shop's people would: the estimator enters the customer and the job,
 * the fabricator measures the truck and signs the sheet off, the fit check and the parts plan run on the engine and the
 * solver, the estimator sends the quote (and a revision), the customer answers through the link in the e-mail and pays
 * the deposit with the payment provider's test card (its webhook opens the work order), the counter sets the parts
 * aside or orders them, and the bay records its checks. Each job stops at the stage the scenario gives it.
 *
 * A job whose project title is already in the shop is left alone, so a second run adds nothing.
 */
export interface DemoStoryOptions {
  /** Where the API listens, e.g. http://127.0.0.1:3000 */
  baseUrl: string;
  /** The local mail fake's list of captured messages (the customers' inboxes). */
  mailFakeUrl: string;
  jobs?: DemoStoryJob[];
}

export interface DemoStoryResult {
  made: Array<{ stage: string; projectId: string; title: string; ms: number }>;
  alreadyPresent: number;
  ms: number;
}

type Page<T> = { items: T[] };
type Staff = Record<Exclude<DemoRole, 'customer' | 'owner'>, StoryClient>;
type CapturedMail = { id: number; to: string[]; subject: string; text: string };

const STAGES = ['intake', 'measured', 'fit-checked', 'parts-planned', 'quote-sent', 'approved', 'deposit-paid', 'in-the-bay', 'done'] as const;
const reached = (job: DemoStoryJob, stage: (typeof STAGES)[number]) => STAGES.indexOf(job.stage) >= STAGES.indexOf(stage);

async function signInAs(baseUrl: string, role: DemoRole): Promise<StoryClient> {
  const demo = DEMO_SIGN_INS.find((candidate) => candidate.role === role)!;
  return StoryClient.signIn(baseUrl, demo.email, demo.password);
}

export async function runDemoStory(options: DemoStoryOptions): Promise<DemoStoryResult> {
  const started = Date.now();
  const jobs = options.jobs ?? DEMO_STORY_JOBS;
  const estimator = await signInAs(options.baseUrl, 'estimator');
  const missing: DemoStoryJob[] = [];
  for (const job of jobs) if (!(await projectTitled(estimator, job.title))) missing.push(job);
  const made: DemoStoryResult['made'] = [];
  if (missing.length > 0) {
    const staff: Staff = {
      estimator,
      fabricator: await signInAs(options.baseUrl, 'fabricator'),
      counter: await signInAs(options.baseUrl, 'counter'),
    };
    const story = new Story(options, staff);
    // Three jobs at a time from intake to the parts plan (the fabricator and the estimator work side by side); then,
    // one after another and oldest first, quote, answer, deposit, counter and bay, so the quote numbers and who gets
    // the last unit on the shelf follow the story.
    const prepared: Array<{ projectId: string; plan: PartsPlanResponseDto | null; ms: number }> = [];
    await inParallel(missing, 3, async (job, index) => {
      const jobStarted = Date.now();
      prepared[index] = { ...(await story.prepare(job, index)), ms: 0 };
      prepared[index].ms = Date.now() - jobStarted;
    });
    for (const [index, job] of missing.entries()) {
      const jobStarted = Date.now();
      await story.finish(job, index, prepared[index]);
      made.push({ stage: job.stage, projectId: prepared[index].projectId, title: job.title, ms: prepared[index].ms + Date.now() - jobStarted });
    }
  }
  return { made, alreadyPresent: jobs.length - missing.length, ms: Date.now() - started };
}

async function projectTitled(client: StoryClient, title: string): Promise<ProjectResponseDto | null> {
  const page = await client.get<Page<ProjectResponseDto>>(`/projects?search=${encodeURIComponent(title)}&pageSize=10`);
  return page.items.find((project) => project.title === title) ?? null;
}

/** A tape's few millimetres either way, the same for the same point of the same job on every run. */
function tapeScatter(key: string, unit: 'mm' | 'deg'): number {
  let hash = 0;
  for (const char of key) hash = (hash * 31 + char.charCodeAt(0)) >>> 0;
  return unit === 'deg' ? ((hash % 5) - 2) / 10 : (hash % 5) - 2;
}

/** Runs `work` on every item, at most `size` at a time. */
async function inParallel<T>(items: T[], size: number, work: (item: T, index: number) => Promise<unknown>): Promise<void> {
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const index = next++;
      await work(items[index], index);
    }
  };
  await Promise.all(Array.from({ length: Math.min(size, items.length) }, worker));
}

class Story {
  /** The last sheet being opened: the next one waits for it. */
  private sheetOpening: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly options: DemoStoryOptions,
    private readonly staff: Staff,
  ) {}

  /** Intake to the parts plan: customer, project, selections, sheet and photos, fit report, plan and the re-check. */
  async prepare(job: DemoStoryJob, index: number): Promise<{ projectId: string; plan: PartsPlanResponseDto | null }> {
    const { estimator, fabricator } = this.staff;
    const customerId = await this.customerOf(job);
    const project = await estimator.post<ProjectResponseDto>('/projects', {
      customerId,
      title: job.title,
      vehicleDescription: job.vehicleDescription,
      chassisModelId: job.chassisModelId,
      engineProfileId: job.engineProfileId,
      transmissionId: job.transmissionId,
      goals: job.goals,
      placement: job.placement,
    });
    const ready = { projectId: project.id, plan: null };
    if (job.fitSelections) await estimator.put(`/projects/${project.id}/fit-selections`, job.fitSelections);
    if (!reached(job, 'measured')) return ready;

    await this.measure(job, index, project.id);
    if (!reached(job, 'fit-checked')) return ready;

    const report = await fabricator.post<{ id: string }>(`/projects/${project.id}/fit-reports`);
    if (!reached(job, 'parts-planned')) return ready;

    const plan = await estimator.post<PartsPlanResponseDto>(`/projects/${project.id}/parts-plans`, { objective: 'lowest-cost', fitReportId: report.id });
    if (!reached(job, 'quote-sent')) return ready;

    // The fit check again with the planned pan, pickup, pump, controller and mount adapter, so the quote and the
    // work order name a report of the parts the job is built with.
    await estimator.patch(`/projects/${project.id}/fit-selections`, plannedSelections(plan));
    await estimator.post(`/projects/${project.id}/fit-reports`);
    return { projectId: project.id, plan };
  }

  /** From the locked plan on: quote and revision, the customer's answer and deposit, the counter, the bay. */
  async finish(job: DemoStoryJob, index: number, { projectId, plan }: { projectId: string; plan: PartsPlanResponseDto | null }): Promise<void> {
    if (!plan) return;
    const { estimator, fabricator } = this.staff;
    await estimator.post(`/parts-plans/${plan.id}/lock`);
    const mailBefore = await this.newestMailId();
    const quote = await this.sendQuote(job, projectId);
    if (!reached(job, 'approved')) return;

    const link = await this.approvalLink(job, quote, mailBefore);
    const customer = StoryClient.anonymous(this.options.baseUrl);
    await customer.post(`/quote-links/${link}/answer`, { answer: 'accept' });
    if (!reached(job, 'deposit-paid')) return;

    // The provider's test card; its signed webhook settles the deposit and the paid deposit opens the work order.
    await customer.post(`/quote-links/${link}/deposit`, { paymentMethod: 'pm_card_visa' });
    const workOrderId = await this.workOrderOf(projectId);
    const fromShelf = await this.counter(job, plan.id);
    if (!reached(job, 'in-the-bay')) return;

    await fabricator.post(`/work-orders/${workOrderId}/start`);
    if (job.stage === 'in-the-bay') await this.staff.counter.post(`/parts-plans/${plan.id}/issue`);
    await this.recordChecks(job, index, workOrderId);
    if (job.stage !== 'done') return;
    // Finishing issues what is still set aside; the units it took off the shelf were reordered and have come back in.
    await fabricator.post(`/work-orders/${workOrderId}/finish`);
    await this.restock(fromShelf);
  }

  private async customerOf(job: DemoStoryJob): Promise<string> {
    if ('id' in job.customer) return job.customer.id;
    const { estimator } = this.staff;
    const wanted = job.customer;
    const found = await estimator.get<Page<CustomerResponseDto>>(`/customers?search=${encodeURIComponent(wanted.name)}&pageSize=10`);
    const existing = found.items.find((customer) => customer.name === wanted.name);
    if (existing) return existing.id;
    return (await estimator.post<CustomerResponseDto>('/customers', wanted)).id;
  }

  /** Every required point read off the tape (the catalog's figure, the tape's scatter, the job's own differences), photos, sign-off. */
  private async measure(job: DemoStoryJob, index: number, projectId: string): Promise<void> {
    const { fabricator } = this.staff;
    const sheetPath = `/projects/${projectId}/measurement-sheet`;
    const sheet = await fabricator.get<MeasurementSheetResponseDto>(sheetPath);
    const readings = sheet.points
      .filter((point) => point.required && point.catalogValue !== null)
      .map((point) => {
        const own = job.readings?.[point.id];
        const value = point.catalogValue! + (own ? own.delta : tapeScatter(`${job.title}:${point.id}`, point.unit));
        return { pointId: point.id, body: { value: String(Math.round(value * 10) / 10), unit: 'mm', ...(own?.note && { note: own.note }) } };
      });
    // The first reading opens the sheet, one sheet at a time (two sheets opened at the same moment can deadlock in
    // MariaDB and answer 500); the other readings go eight at a time, as fast as the fabricator calls them out.
    const [first, ...rest] = readings;
    const put = (reading: (typeof readings)[number]) => fabricator.put(`${sheetPath}/values/${encodeURIComponent(reading.pointId)}`, reading.body);
    if (first) {
      const opened = this.sheetOpening.then(() => put(first));
      this.sheetOpening = opened.catch(() => undefined);
      await opened;
    }
    await inParallel(rest, 8, put);
    for (const [photoIndex, photo] of (job.photos ?? []).entries()) {
      const data = storyPhoto(index * 10 + photoIndex + 1);
      await fabricator.upload(`${sheetPath}/photos`, [{ data, fileName: photo.fileName, contentType: 'image/png' }], { pointId: photo.pointId });
    }
    await fabricator.post(`${sheetPath}/sign-off`);
  }

  /** The first revision drawn from the locked plan and sent; where the scenario has one, a second revision sent after it. */
  private async sendQuote(job: DemoStoryJob, projectId: string): Promise<QuoteResponseDto> {
    const { estimator } = this.staff;
    const drafted = await estimator.post<QuoteResponseDto>(`/projects/${projectId}/quotes`, {});
    let quote = await estimator.post<QuoteResponseDto>(`/quotes/${drafted.id}/send`);
    if (job.revision) {
      const dropped = DEMO_LABOR_OPERATIONS.find((operation) => operation.code === job.revision!.dropLaborOperationCode)?.id;
      const kept = quote.revision.lines.filter((line) => !(dropped && line.laborOperationId === dropped));
      const change = kept.length < quote.revision.lines.length ? { lines: kept.map(lineInput) } : { discount: { kind: 'percent', percent: job.revision.discountPercent ?? 5 } };
      await estimator.patch(`/quotes/${quote.id}`, { ...change, notes: job.revision.notes });
      quote = await estimator.post<QuoteResponseDto>(`/quotes/${quote.id}/send`);
    }
    return quote;
  }

  private async inbox(): Promise<CapturedMail[]> {
    const response = await fetch(this.options.mailFakeUrl);
    if (!response.ok) throw new Error(`the mail fake at ${this.options.mailFakeUrl} answered ${response.status}`);
    return (await response.json()) as CapturedMail[];
  }

  /** The mail fake lists the newest message first; it keeps messages of earlier runs, so only later ones count. */
  private async newestMailId(): Promise<number> {
    return (await this.inbox())[0]?.id ?? 0;
  }

  /** The signed link in the newest e-mail of this quote's sent revision, as the customer clicks it. */
  private async approvalLink(job: DemoStoryJob, quote: QuoteResponseDto, after: number): Promise<string> {
    const email = 'id' in job.customer ? null : job.customer.email;
    const mail = await waitFor(
      `the e-mail of quote ${quote.label}`,
      async () =>
        (await this.inbox()).find(
          (message) => message.id > after && (!email || message.to.includes(email)) && message.subject.includes(`quote ${quote.label} for`),
        ),
      (found) => found !== undefined,
    );
    const token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail!.text)?.[1];
    if (!token) throw new Error(`the e-mail of quote ${quote.label} has no approval link`);
    return token;
  }

  private async workOrderOf(projectId: string): Promise<string> {
    const { estimator } = this.staff;
    await waitFor(
      'the settled deposit',
      () => estimator.get<ProjectResponseDto>(`/projects/${projectId}`),
      (project) => project.status === 'deposit-paid',
    );
    return (await estimator.get<WorkOrderResponseDto>(`/projects/${projectId}/work-order`)).id;
  }

  /**
   * The counter sets aside what is on the shelf and orders the rest; for a job already in the bay the order has come in.
   * Returns the lines set aside from the shelf.
   */
  private async counter(job: DemoStoryJob, planId: string): Promise<CounterLineResponseDto[]> {
    const { counter } = this.staff;
    const lines = await counter.get<CounterLineResponseDto[]>(`/parts-plans/${planId}/counter-lines`);
    const fromShelf: CounterLineResponseDto[] = [];
    for (const line of lines) {
      if (line.stock.length > 0 && line.available >= line.quantity) {
        fromShelf.push(await counter.post<CounterLineResponseDto>(`/counter-lines/${line.id}/reserve`, {}));
        continue;
      }
      await counter.post(`/counter-lines/${line.id}/mark`, { status: 'to-order' });
      await counter.post(`/counter-lines/${line.id}/mark`, { status: 'ordered' });
      if (reached(job, 'in-the-bay')) await counter.post(`/counter-lines/${line.id}/receive`, { location: 'Main store', bin: 'RCV-1' });
    }
    return fromShelf;
  }

  /** The replacements of the shelf's units a finished job used are in: the counter counts them back on hand, bin by bin. */
  private async restock(fromShelf: CounterLineResponseDto[]): Promise<void> {
    const { counter } = this.staff;
    for (const line of fromShelf) {
      const row = line.stock.find((stock) => stock.id === line.stockId);
      if (!line.partId || !row) continue;
      const part = await counter.get<{ stock: Array<{ id: string; onHand: number }> }>(`/parts/${line.partId}`);
      const now = part.stock.find((stock) => stock.id === row.id)?.onHand ?? 0;
      await counter.put(`/parts/${line.partId}/stock`, { location: row.location, bin: row.bin, onHand: now + line.quantity });
    }
  }

  /** In the bay: the first half of the checks (one failed first where the scenario says so) and a photo; done: all of them. */
  private async recordChecks(job: DemoStoryJob, index: number, workOrderId: string): Promise<void> {
    const { fabricator } = this.staff;
    const order = await fabricator.get<WorkOrderResponseDto>(`/work-orders/${workOrderId}`);
    const checks = order.steps.flatMap((step) => step.checks);
    const upTo = job.stage === 'done' ? checks.length : Math.ceil(checks.length / 2);
    const record = (body: object) => fabricator.post(`/work-orders/${workOrderId}/checks`, body);
    for (const check of checks.slice(0, upTo)) {
      const failed = job.failedFirst?.[check.key];
      if (failed) await record({ checkKey: check.key, ...(check.measured ? { value: failed.value } : { passed: false }), note: failed.note });
      await record({ checkKey: check.key, ...(check.measured ? { value: passingValue(check) } : { passed: true }) });
    }
    const pictured = checks[0];
    if (pictured) {
      await fabricator.upload(`/work-orders/${workOrderId}/checks/${encodeURIComponent(pictured.key)}/photos`, [
        { data: storyPhoto(100 + index), fileName: `${pictured.key}.png`, contentType: 'image/png' },
      ]);
    }
  }
}

const SELECTION_OF_CATEGORY: Record<string, string> = {
  'oil-pan': 'oilPanId',
  'oil-pickup': 'oilPickupId',
  'oil-pump': 'oilPumpId',
  'engine-controller': 'controllerId',
  'mount-adapter': 'mountAdapterId',
};

/** The plan's picks that carry a fit spec, as the fit selections they stand for. */
function plannedSelections(plan: PartsPlanResponseDto): Record<string, string> {
  const selections: Record<string, string> = {};
  for (const pick of plan.result.picks) {
    const field = SELECTION_OF_CATEGORY[pick.category];
    if (field && pick.fitSpecId) selections[field] = pick.fitSpecId;
  }
  return selections;
}

/** A reading inside the check's range: its middle, or a little over its minimum when it has no maximum. */
function passingValue(check: WorkCheckResponseDto): number {
  if (check.min !== null && check.max !== null) return Math.round(((check.min + check.max) / 2) * 10) / 10;
  if (check.min !== null) return check.min + 12;
  if (check.max !== null) return check.max - 1;
  return 0;
}

/** A line of a sent revision, as the quote editor sends it back (the key kept, so revisions compare line by line). */
function lineInput(line: QuoteLineResponseDto): object {
  return {
    key: line.key,
    kind: line.kind,
    description: line.description,
    ...(line.sku !== null && { sku: line.sku }),
    ...(line.catalogKind !== null && { catalogKind: line.catalogKind }),
    ...(line.catalogItemId !== null && { catalogItemId: line.catalogItemId }),
    ...(line.laborOperationId !== null && { laborOperationId: line.laborOperationId }),
    ...(line.kind === 'part' && { quantity: line.quantity, pricing: line.pricing }),
    ...(line.kind === 'part' && line.pricing === 'list' && { unitPriceCents: line.unitPriceCents }),
    ...(line.unitCostCents !== null && { unitCostCents: line.unitCostCents }),
    ...(line.markupPercent !== null && { markupPercent: line.markupPercent }),
    ...(line.hours !== null && { hours: line.hours }),
  };
}
