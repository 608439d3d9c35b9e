import { Injectable, Logger, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { diffRevisions, endOfDayIn, formatCalendarDate, formatMoney, QUOTE_STATUS_LABELS, todayIn, utcToday, type FitReport, type PartsPlanResult, type RevisionDiff } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, In, IsNull, Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { EnvironmentVariables } from '../config/env.validation';
import { FitReportRecord } from '../fit-reports/fit-report-record.entity';
import { FitReportsService } from '../fit-reports/fit-reports.service';
import { LaborOperationsService } from '../labor-operations/labor-operations.service';
import { PartsPlanRecord } from '../parts/part.entity';
import { PartsPlansService } from '../parts/parts-plans.service';
import { MailQueue } from '../mail/mail-queue.service';
import { MailService } from '../mail/mail.service';
import { JobHandlers } from '../jobs/job-handlers';
import { JobsService } from '../jobs/jobs.service';
import { Project } from '../projects/project.entity';
import { isOwnProject } from '../projects/project.mapper';
import { ProjectsService } from '../projects/projects.service';
import { Shop } from '../shops/shop.entity';
import { ShopsService } from '../shops/shops.service';
import { UsersService } from '../users/users.service';
import { WorkOrdersService } from '../work-orders/work-orders.service';
import { AnswerQuoteDto, CreateQuoteDto, QuoteLineInputDto, UpdateQuoteDto } from './dto/quote-input.dto';
import { CATALOG_KIND_OF_CATEGORY, catalogPriceCents, draftLinesFromPlan, draftLinesFromReport } from './quote-draft.builder';
import { quoteLabel } from './quote-label';
import { QuoteLinksService } from './quote-links.service';
import { priceRevision, UnpricedLine } from './quote-money.adapter';
import { QuoteNotification } from './quote-notification.entity';
import { QuotePdfService } from './quote-pdf.service';
import { QuoteLine, QuoteRevision } from './quote-revision.entity';
import { QuoteSettings } from './quote-settings.entity';
import { QuoteSettingsService } from './quote-settings.service';
import { Quote, QUOTE_STATUSES, QuoteStatus } from './quote.entity';
import { QuoteErrors } from './quotes.errors';

/** Operations every swap quote starts with (codes of the shop's labor operations). */
export const BASE_OPERATION_CODES = ['engine-remove-install'] as const;

/** Everything one view of a quote needs. */
export interface QuoteView {
  quote: Quote;
  /** The shop's name, which the customer reads the quote under. */
  shopName: string;
  status: QuoteStatus;
  project: Project;
  revision: QuoteRevision;
  revisions: QuoteRevision[];
}

/** Who is acting: a signed-in member, or the holder of a quote link (a customer without a sign-in). */
export type QuoteActor = { kind: 'member'; user: AuthUser } | { kind: 'link'; shopId: string };

/** Reads made on behalf of a link holder use the shop's scope (the link itself is the permission). */
function shopReader(shopId: string): AuthUser {
  return { userId: '', email: '', name: 'Quote link', membershipId: '', shopId, role: 'estimator', customerId: null };
}

function addDays(iso: string, days: number): string {
  const date = new Date(`${iso}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return utcToday(date);
}

/** A last valid day given by the estimator must be the shop's today or later (its day, as sending and lapsing judge it). */
function refusePastValidity(validUntil: string | undefined, today: string): void {
  if (validUntil !== undefined && validUntil < today) throw QuoteErrors.validUntilPast(validUntil);
}

/** A quote awaiting an answer reads as lapsed once the shop's today (`todayIn(shop.timeZone)`) is past its last valid day. */
export function effectiveQuoteStatus(quote: Quote, sent: QuoteRevision | null, today: string): QuoteStatus {
  if (quote.status === 'awaiting-answer' && sent && sent.validUntil < today) return 'lapsed';
  return quote.status;
}

/** A status inside a sentence: the app's label, lower-cased ("awaiting the customer"). */
export const QUOTE_STATUS_WORDS = Object.fromEntries(
  Object.entries(QUOTE_STATUS_LABELS).map(([status, label]) => [status, label.toLowerCase()]),
) as Record<QuoteStatus, string>;

@Injectable()
export class QuotesService implements OnModuleInit {
  private readonly logger = new Logger(QuotesService.name);
  private readonly quotes: TenantRepository<Quote>;
  private readonly revisions: TenantRepository<QuoteRevision>;

  constructor(
    @InjectRepository(Quote) quotes: Repository<Quote>,
    @InjectRepository(QuoteRevision) revisions: Repository<QuoteRevision>,
    @InjectRepository(QuoteNotification) private readonly notifications: Repository<QuoteNotification>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly projects: ProjectsService,
    private readonly fitReports: FitReportsService,
    private readonly operations: LaborOperationsService,
    private readonly partsPlans: PartsPlansService,
    private readonly catalog: CatalogService,
    private readonly shops: ShopsService,
    private readonly users: UsersService,
    private readonly workOrders: WorkOrdersService,
    private readonly settings: QuoteSettingsService,
    private readonly links: QuoteLinksService,
    private readonly audit: AuditService,
    private readonly pdf: QuotePdfService,
    private readonly mail: MailService,
    private readonly mailQueue: MailQueue,
    private readonly jobs: JobsService,
    private readonly jobHandlers: JobHandlers,
    private readonly config: ConfigService<EnvironmentVariables, true>,
  ) {
    this.quotes = new TenantRepository(quotes);
    this.revisions = new TenantRepository(revisions);
  }

  onModuleInit(): void {
    const reprice = (manager: EntityManager, shopId: string, actor: AuthUser) => this.repriceDrafts(manager, shopId, actor);
    this.shops.onRatesChanged(reprice);
    this.settings.onPricingChanged(reprice);
    // The quote's e-mail is rendered (PDF included) and sent by the background worker, from the revision that was sent.
    this.jobHandlers.register('quote.mail', async (payload, { job }) => {
      const { shopId, quoteId, revision } = payload as { shopId: string; quoteId: string; revision: number };
      const view = await this.viewInShop(shopId, quoteId);
      const sent = view.revisions.find((candidate) => candidate.number === revision);
      if (!sent) throw new Error(`quote ${quoteId} has no sent revision ${revision}`);
      const messageId = this.mailQueue.messageIdOf(job.id);
      await this.mailQuote({ ...view, revision: sent }, messageId);
      return messageId;
    });
  }

  // ------------------------------------------------------------------ reading

  async listForProject(user: AuthUser, projectId: string): Promise<QuoteView[]> {
    const project = await this.projects.get(user, projectId);
    const quotes = await this.quotes.repository.find({ where: this.quotes.where(user, { projectId: project.id }), order: { number: 'DESC' } });
    const views: QuoteView[] = [];
    for (const quote of quotes) {
      if (user.role === 'customer' && quote.sentRevision === null) continue;
      views.push(await this.viewOf(user, quote, project));
    }
    return views;
  }

  /** The shop's newest quotes; a status filter matches the status as read (a lapsed quote is stored as awaiting an answer). */
  async listForShop(user: AuthUser, status?: string): Promise<QuoteView[]> {
    if (status !== undefined && !(QUOTE_STATUSES as readonly string[]).includes(status)) {
      throw QuoteErrors.badLine(`status must be one of: ${QUOTE_STATUSES.join(', ')}`);
    }
    const quotes = await this.quotes.repository.find({ where: this.quotes.where(user), order: { number: 'DESC' }, take: 100 });
    const shop = await this.shops.getById(user.shopId);
    const views: QuoteView[] = [];
    for (const quote of quotes) views.push(await this.viewOf(user, quote, await this.projects.get(user, quote.projectId), undefined, shop));
    return status ? views.filter((view) => view.status === status) : views;
  }

  async get(user: AuthUser, id: string): Promise<QuoteView> {
    const quote = await this.findQuote(user.shopId, id);
    const project = await this.projects.get(user, quote.projectId).catch(() => {
      throw QuoteErrors.notFound();
    });
    if (user.role === 'customer' && quote.sentRevision === null) throw QuoteErrors.notFound();
    return this.viewOf(user, quote, project);
  }

  /** The quote a link points at, as its holder sees it (the revision sent with the link). */
  async getByLink(token: string): Promise<QuoteView> {
    const claims = this.links.verify(token);
    const quote = await this.findQuote(claims.s, claims.q).catch(() => {
      throw QuoteErrors.linkInvalid();
    });
    if (quote.sentRevision !== claims.r) {
      if (quote.status === 'approved') {
        const { timeZone } = await this.shops.getById(quote.shopId);
        throw QuoteErrors.linkAfterAcceptance(quote.sentRevision, quote.answeredAt, quote.depositState === 'paid' ? quote.depositPaidAt : null, timeZone);
      }
      throw QuoteErrors.linkSuperseded();
    }
    const reader = shopReader(claims.s);
    const project = await this.projects.get(reader, quote.projectId);
    return this.viewOf(reader, quote, project, true);
  }

  async revision(user: AuthUser, id: string, number?: number): Promise<QuoteView> {
    const view = await this.get(user, id);
    if (number === undefined) return view;
    const revision = view.revisions.find((candidate) => candidate.number === number);
    if (!revision) throw QuoteErrors.revisionNotFound(number);
    return { ...view, revision };
  }

  async compare(user: AuthUser, id: string, from: number, to: number): Promise<RevisionDiff> {
    if (from === to) throw QuoteErrors.compareSame();
    const view = await this.get(user, id);
    const find = (number: number) => {
      const revision = view.revisions.find((candidate) => candidate.number === number);
      if (!revision) throw QuoteErrors.revisionNotFound(number);
      return { number, totals: revision.totals, lines: revision.lines };
    };
    return diffRevisions(find(from), find(to));
  }

  async pdfOf(user: AuthUser, id: string, number?: number): Promise<{ fileName: string; content: Buffer }> {
    const view = await this.revision(user, id, number);
    return this.renderPdf(view, isOwnProject(view.project, user));
  }

  async pdfByLink(token: string): Promise<{ fileName: string; content: Buffer }> {
    return this.renderPdf(await this.getByLink(token));
  }

  // ------------------------------------------------------------------ writing

  async create(user: AuthUser, projectId: string, input: CreateQuoteDto): Promise<QuoteView> {
    const project = await this.projects.get(user, projectId);
    const [shop, settings] = await Promise.all([this.shops.getCurrent(user), this.settings.forShop(user)]);
    const today = todayIn(shop.timeZone);
    refusePastValidity(input.validUntil, today);
    const report = await this.reportFor(user, project, input.fitReportId);
    // The quote names the plan version and fit report it is built on; without lines it is drawn from them.
    const plan = await this.partsPlans.forQuote(user, project.id);
    const lines = input.lines
      ? await this.linesFromInput(user, input.lines, [])
      : plan
        ? await this.draftLinesFromPlan(user, plan)
        : await this.draftLines(user, report?.results ?? null, settings.defaultMarkupPercent);
    const quoteId = randomUUID();
    const revision: Omit<QuoteRevision, 'lines' | 'totals' | 'createdAt'> & { lines: UnpricedLine[] } = {
      id: randomUUID(),
      shopId: user.shopId,
      quoteId,
      number: 1,
      fitReportId: report?.id ?? null,
      partsPlanId: plan?.id ?? null,
      partsPlanVersion: plan?.version ?? null,
      validUntil: input.validUntil ?? addDays(today, settings.validityDays),
      currency: shop.currency,
      laborRateCents: Math.round(shop.laborRatePerHour * 100),
      suppliesPercent: shop.shopSuppliesPercent,
      suppliesCapCents: settings.suppliesCapCents,
      partsTaxPercent: shop.taxRatePercent,
      laborTaxPercent: settings.laborTaxPercent,
      discountKind: input.discount?.kind ?? 'none',
      discountPercent: input.discount?.percent ?? null,
      discountAmountCents: input.discount?.amountCents ?? null,
      depositKind: input.deposit?.kind ?? 'percent',
      depositPercent: input.deposit ? (input.deposit.percent ?? null) : settings.depositPercent,
      depositAmountCents: input.deposit?.amountCents ?? null,
      terms: input.terms ?? settings.terms,
      notes: input.notes ?? '',
      createdById: user.userId,
      sentAt: null,
      lines,
    };
    const priced = priceRevision(revision);
    await this.dataSource.transaction(async (manager) => {
      const [{ next }] = await manager.query('SELECT COALESCE(MAX(number), 0) + 1 AS next FROM quotes WHERE shopId = ? FOR UPDATE', [user.shopId]);
      await manager.insert(Quote, {
        id: quoteId,
        shopId: user.shopId,
        projectId: project.id,
        number: Number(next),
        status: 'drafting',
        latestRevision: 1,
        sentRevision: null,
        sentById: null,
        answeredAt: null,
        declineReason: null,
        depositState: 'not-due',
        depositPaidAt: null,
      });
      await manager.insert(QuoteRevision, { ...revision, ...priced });
    });
    return this.get(user, quoteId);
  }

  /** Changes the working revision; when the newest revision was already sent, the change starts the next one. */
  async update(user: AuthUser, id: string, input: UpdateQuoteDto): Promise<QuoteView> {
    const view = await this.get(user, id);
    if (view.quote.status === 'approved') throw QuoteErrors.notEditable(QUOTE_STATUS_WORDS.approved);
    refusePastValidity(input.validUntil, await this.shopToday(user.shopId));
    const latest = view.revisions[view.revisions.length - 1];
    const lines = input.lines ? await this.linesFromInput(user, input.lines, latest.lines) : latest.lines;
    const next = {
      ...latest,
      lines,
      ...(input.discount && {
        discountKind: input.discount.kind,
        discountPercent: input.discount.percent ?? null,
        discountAmountCents: input.discount.amountCents ?? null,
      }),
      ...(input.deposit && { depositKind: input.deposit.kind, depositPercent: input.deposit.percent ?? null, depositAmountCents: input.deposit.amountCents ?? null }),
      ...(input.validUntil !== undefined && { validUntil: input.validUntil }),
      ...(input.terms !== undefined && { terms: input.terms }),
      ...(input.notes !== undefined && { notes: input.notes }),
    };
    const priced = priceRevision(next);
    await this.dataSource.transaction(async (manager) => {
      if (latest.sentAt === null) {
        await manager.update(QuoteRevision, { id: latest.id, shopId: user.shopId, sentAt: IsNull() }, { ...this.editable({ ...next, ...priced }) });
        return;
      }
      const number = latest.number + 1;
      await manager.insert(QuoteRevision, {
        ...next,
        ...priced,
        id: randomUUID(),
        number,
        createdById: user.userId,
        sentAt: null,
        createdAt: undefined,
      });
      await manager.update(Quote, { id: view.quote.id, shopId: user.shopId }, { latestRevision: number });
    });
    return this.get(user, id);
  }

  /**
   * Freezes the working revision and queues its e-mail to the customer (PDF and a signed link) in the same
   * transaction; the background worker renders and sends it. Again for the same revision queues the mail again.
   */
  async send(user: AuthUser, id: string): Promise<QuoteView> {
    const view = await this.get(user, id);
    if (view.quote.status === 'approved') throw QuoteErrors.notEditable(QUOTE_STATUS_WORDS.approved);
    if (isOwnProject(view.project, user)) throw QuoteErrors.ownProject();
    const latest = view.revisions[view.revisions.length - 1];
    if (latest.lines.length === 0) throw QuoteErrors.emptyQuote();
    if (latest.validUntil < (await this.shopToday(user.shopId))) throw QuoteErrors.pastValidity(latest.validUntil);
    if (!view.project.customer?.email) throw QuoteErrors.noCustomerEmail();
    if (latest.sentAt !== null && view.quote.status !== 'awaiting-answer') throw QuoteErrors.nothingToSend();
    if (latest.sentAt === null) {
      const sentAt = new Date();
      await this.dataSource.transaction(async (manager) => {
        const frozen = await manager.update(QuoteRevision, { id: latest.id, shopId: user.shopId, sentAt: IsNull() }, { sentAt });
        if (!frozen.affected) throw QuoteErrors.nothingToSend();
        await this.audit.record(manager, {
          shopId: user.shopId,
          actor: user,
          kind: 'money',
          action: 'quote.sent',
          subjectId: view.quote.id,
          summary: `Quote ${quoteLabel(view.quote)} revision ${latest.number} sent to ${view.project.customer?.email ?? 'the customer'}: total ${formatMoney(latest.totals.totalCents, latest.currency)}.`,
          before: { status: view.quote.status, sentRevision: view.quote.sentRevision ?? null },
          after: { status: 'awaiting-answer', sentRevision: latest.number, totalCents: latest.totals.totalCents, depositCents: latest.totals.depositCents },
        });
        await manager.update(
          Quote,
          { id: view.quote.id, shopId: user.shopId },
          { status: 'awaiting-answer', sentRevision: latest.number, sentById: user.userId, answeredAt: null, declineReason: null, depositState: 'not-due' },
        );
        await this.projects.advanceStatus(user.shopId, view.project.id, 'quote-sent', manager);
        await this.enqueueQuoteMail(manager, view, latest.number, `${view.quote.id}:r${latest.number}`);
      });
    } else {
      await this.enqueueQuoteMail(this.dataSource.manager, view, latest.number, `${view.quote.id}:r${latest.number}:again:${randomUUID()}`);
    }
    return this.get(user, id);
  }

  /** The customer's answer (signed in, or through the link) to the revision they were sent. */
  async answer(actor: QuoteActor, idOrToken: string, input: AnswerQuoteDto): Promise<QuoteView> {
    const view = actor.kind === 'link' ? await this.getByLink(idOrToken) : await this.get(actor.user, idOrToken);
    const shopId = view.quote.shopId;
    if (view.status === 'lapsed') throw QuoteErrors.lapsed(view.revision.validUntil);
    if (view.quote.status !== 'awaiting-answer') throw QuoteErrors.notAwaitingAnswer(QUOTE_STATUS_WORDS[view.status]);
    const reason = input.reason?.trim() ?? '';
    if (input.answer === 'decline' && !reason) throw QuoteErrors.reasonRequired();
    const accepted = input.answer === 'accept';
    const estimator = view.quote.sentById ? await this.users.findById(view.quote.sentById) : null;
    await this.dataSource.transaction(async (manager) => {
      const changed = await manager.update(
        Quote,
        { id: view.quote.id, shopId, status: 'awaiting-answer', sentRevision: view.revision.number },
        {
          status: accepted ? 'approved' : 'turned-down',
          answeredAt: new Date(),
          declineReason: accepted ? null : reason,
          depositState: accepted && view.revision.totals.depositCents > 0 ? 'due' : 'not-due',
        },
      );
      if (!changed.affected) throw QuoteErrors.notAwaitingAnswer('already answered');
      await this.audit.record(manager, {
        shopId,
        actor: actor.kind === 'link' ? { userId: null, name: `${view.project.customer?.name ?? 'The customer'} (e-mailed link)` } : actor.user,
        kind: 'money',
        action: accepted ? 'quote.accepted' : 'quote.declined',
        subjectId: view.quote.id,
        summary: `Quote ${quoteLabel(view.quote)} revision ${view.revision.number} ${accepted ? 'accepted' : `declined: ${reason}`}.`,
        before: { status: 'awaiting-answer' },
        after: { status: accepted ? 'approved' : 'turned-down', revision: view.revision.number, totalCents: view.revision.totals.totalCents },
      });
      if (accepted) await this.projects.advanceStatus(shopId, view.project.id, 'approved', manager);
      await this.notify(manager, view, accepted ? `${view.project.customer?.name ?? 'The customer'} approved quote ${quoteLabel(view.quote)} (revision ${view.revision.number}).` : `${view.project.customer?.name ?? 'The customer'} turned down quote ${quoteLabel(view.quote)}: ${reason}`);
      if (estimator?.email) {
        await this.mailQueue.enqueue(manager, `quote-answer:${view.quote.id}:r${view.revision.number}`, shopId, this.estimatorMail(view, estimator.email, accepted ? 'approved' : 'turned down', reason));
      }
    });
    const answered = await this.findQuote(shopId, view.quote.id);
    return this.viewOf(shopReader(shopId), answered, view.project, true);
  }

  /**
   * A member's own truck has no customer to approve the budget or pay a deposit: starting the build freezes the working
   * revision as the approved one (no e-mail, no deposit due), moves the project to where the work order opens and opens
   * it, as a paid deposit does, with the audit entry, all in one transaction. Once started, a second call is refused.
   */
  async startOwnBuild(user: AuthUser, id: string): Promise<{ view: QuoteView; workOrderId: string }> {
    const view = await this.get(user, id);
    if (!isOwnProject(view.project, user)) throw QuoteErrors.notOwnProject();
    if (view.quote.status === 'approved') throw QuoteErrors.ownBuildStarted(view.quote.sentRevision);
    const latest = view.revisions[view.revisions.length - 1];
    if (!latest.lines.some((line) => line.kind === 'labor')) throw QuoteErrors.ownBuildWithoutLabor();
    const now = new Date();
    const workOrderId = await this.dataSource.transaction(async (manager) => {
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'money',
        action: 'quote.own-build-started',
        subjectId: view.quote.id,
        summary: `Quote ${quoteLabel(view.quote)} revision ${latest.number} kept as the budget of ${user.name}'s own build: total ${formatMoney(latest.totals.totalCents, latest.currency)}, no deposit.`,
        before: { status: view.quote.status, sentRevision: view.quote.sentRevision ?? null },
        after: { status: 'approved', sentRevision: latest.number, totalCents: latest.totals.totalCents, depositCents: 0 },
      });
      if (latest.sentAt === null) await manager.update(QuoteRevision, { id: latest.id, shopId: user.shopId, sentAt: IsNull() }, { sentAt: now });
      // Guarded by the status read above: of two calls at once, the second finds the quote changed and changes nothing.
      const changed = await manager.update(
        Quote,
        { id: view.quote.id, shopId: user.shopId, status: view.quote.status, latestRevision: latest.number },
        { status: 'approved', sentRevision: latest.number, sentById: user.userId, answeredAt: now, declineReason: null, depositState: 'not-due' },
      );
      if (!changed.affected) throw QuoteErrors.ownBuildStarted(null);
      await this.projects.advanceStatus(user.shopId, view.project.id, 'deposit-paid', manager);
      const opened = await this.workOrders.openForQuote(manager, {
        quote: { ...view.quote, status: 'approved', sentRevision: latest.number },
        revision: { ...latest, sentAt: latest.sentAt ?? now },
      });
      if (!opened) throw QuoteErrors.ownBuildStarted(latest.number);
      return opened;
    });
    return { view: await this.get(user, id), workOrderId };
  }

  // ------------------------------------------------------------------ for the payments and work-order modules

  /** Marks the deposit of an approved quote paid; false when it already was (so an event applies once). */
  async markDepositPaid(manager: EntityManager, shopId: string, quoteId: string, paidAt: Date): Promise<boolean> {
    const changed = await manager.update(Quote, { id: quoteId, shopId, status: 'approved', depositState: 'due' }, { depositState: 'paid', depositPaidAt: paidAt });
    if (!changed.affected) return false;
    const quote = await manager.findOneByOrFail(Quote, { id: quoteId, shopId });
    await this.projects.advanceStatus(shopId, quote.projectId, 'deposit-paid', manager);
    return true;
  }

  async notifyDepositPaid(manager: EntityManager, view: QuoteView): Promise<void> {
    await this.notify(manager, view, `${view.project.customer?.name ?? 'The customer'} paid the deposit on quote ${quoteLabel(view.quote)}.`);
  }

  /** A quote by id within a shop, as the system sees it (no role scoping): for payment events. */
  async viewInShop(shopId: string, quoteId: string): Promise<QuoteView> {
    const reader = shopReader(shopId);
    const quote = await this.findQuote(shopId, quoteId);
    return this.viewOf(reader, quote, await this.projects.get(reader, quote.projectId), true);
  }

  async notificationsFor(user: AuthUser): Promise<QuoteNotification[]> {
    return this.notifications.find({ where: { shopId: user.shopId, userId: user.userId }, order: { createdAt: 'DESC' }, take: 50 });
  }

  // ------------------------------------------------------------------ helpers

  private async findQuote(shopId: string, id: string): Promise<Quote> {
    const quote = await this.quotes.findById({ shopId }, id);
    if (!quote) throw QuoteErrors.notFound();
    return quote;
  }

  /** The shop's calendar day now, in its own time zone: the day quotes are dated and lapse by. */
  private async shopToday(shopId: string): Promise<string> {
    return todayIn((await this.shops.getById(shopId)).timeZone);
  }

  /** `shop`: the quote's shop when the caller has it already (a list reads it once). */
  private async viewOf(user: AuthUser, quote: Quote, project: Project, sentOnly = user.role === 'customer', shop?: Pick<Shop, 'name' | 'timeZone'>): Promise<QuoteView> {
    const all = await this.revisions.repository.find({ where: this.revisions.where(user, { quoteId: quote.id }), order: { number: 'ASC' } });
    const revisions = sentOnly ? all.filter((revision) => revision.sentAt !== null) : all;
    const sent = all.find((revision) => revision.number === quote.sentRevision) ?? null;
    const revision = sentOnly ? (sent ?? revisions[revisions.length - 1]) : all[all.length - 1];
    const { name, timeZone } = shop ?? (await this.shops.getById(quote.shopId));
    return { quote, shopName: name, status: effectiveQuoteStatus(quote, sent, todayIn(timeZone)), project, revision, revisions };
  }

  /**
   * A quote still being written (its working revision not sent, the quote not approved) takes the shop's new labor
   * rate, supplies rate and cap, and parts and labor tax, in the transaction of the change (read inside it), one audit
   * entry each. A sent revision keeps the rates it was sent with; changing it makes the next revision, with its own.
   */
  private async repriceDrafts(manager: EntityManager, shopId: string, actor: AuthUser): Promise<void> {
    const shop = await manager.findOneOrFail(Shop, { where: { id: shopId } });
    const terms = await manager.findOne(QuoteSettings, { where: { shopId } });
    const drafts = await manager
      .createQueryBuilder(QuoteRevision, 'r')
      .innerJoin(Quote, 'q', 'q.id = r.quoteId AND q.shopId = r.shopId AND q.latestRevision = r.number')
      .where("r.shopId = :shopId AND r.sentAt IS NULL AND q.status <> 'approved'", { shopId })
      .orderBy('r.id', 'ASC')
      .setLock('pessimistic_write')
      .getMany();
    const rates = {
      laborRateCents: Math.round(shop.laborRatePerHour * 100),
      suppliesPercent: shop.shopSuppliesPercent,
      suppliesCapCents: terms?.suppliesCapCents ?? null,
      partsTaxPercent: shop.taxRatePercent,
      laborTaxPercent: terms?.laborTaxPercent ?? 0,
    };
    const changed = drafts.filter((draft) => (Object.keys(rates) as (keyof typeof rates)[]).some((rate) => draft[rate] !== rates[rate]));
    if (changed.length === 0) return;
    const numbers = new Map((await manager.find(Quote, { select: { id: true, number: true }, where: { shopId, id: In(changed.map((draft) => draft.quoteId)) } })).map((quote) => [quote.id, quote.number]));
    for (const draft of changed) {
      const priced = priceRevision({ ...draft, ...rates });
      await this.audit.record(manager, {
        shopId,
        actor,
        kind: 'money',
        action: 'quote.repriced-at-shop-rates',
        subjectId: draft.quoteId,
        summary: `Quote ${quoteLabel({ number: numbers.get(draft.quoteId) ?? 0 })} revision ${draft.number}, still being written, repriced at the shop's new rates: total ${formatMoney(draft.totals.totalCents, draft.currency)} → ${formatMoney(priced.totals.totalCents, draft.currency)}.`,
        before: {
          laborRateCents: draft.laborRateCents,
          suppliesPercent: draft.suppliesPercent,
          suppliesCapCents: draft.suppliesCapCents,
          partsTaxPercent: draft.partsTaxPercent,
          laborTaxPercent: draft.laborTaxPercent,
          totalCents: draft.totals.totalCents,
        },
        after: { ...rates, totalCents: priced.totals.totalCents },
      });
      await manager.update(QuoteRevision, { id: draft.id, shopId, sentAt: IsNull() }, { ...rates, lines: priced.lines, totals: priced.totals });
    }
  }

  private editable(revision: QuoteRevision): Partial<QuoteRevision> {
    const { lines, totals, discountKind, discountPercent, discountAmountCents, depositKind, depositPercent, depositAmountCents, validUntil, terms, notes } = revision;
    return { lines, totals, discountKind, discountPercent, discountAmountCents, depositKind, depositPercent, depositAmountCents, validUntil, terms, notes };
  }

  private async reportFor(user: AuthUser, project: Project, fitReportId?: string): Promise<FitReportRecord | null> {
    if (fitReportId) {
      const report = await this.fitReports.get(user, fitReportId);
      if (report.projectId !== project.id) throw QuoteErrors.fitReportNotOfProject();
      return report;
    }
    const page = await this.fitReports.list(user, project.id, { page: 1, pageSize: 1 } as never);
    return page.items[0] ?? null;
  }

  private async draftLines(user: AuthUser, report: FitReport | null, defaultMarkupPercent: number): Promise<UnpricedLine[]> {
    const operations = await this.operations.list(user);
    const rows = new Map<string, { id: string; name: string; priceCents: number | null }>();
    for (const finding of report?.shortfalls ?? []) {
      for (const remedy of finding.remedies) {
        if (remedy.kind !== 'part') continue;
        for (const id of remedy.partIds.slice(0, 1)) {
          const kind = CATALOG_KIND_OF_CATEGORY[remedy.category];
          if (!kind) continue;
          const row = await this.catalog.findRow(kind as CatalogKind, user, id).catch(() => null);
          if (row) rows.set(`${kind}:${id}`, { id: row.id, name: row.name, priceCents: catalogPriceCents(row.spec as unknown as Record<string, unknown>) });
        }
      }
    }
    const drafted = draftLinesFromReport({
      report,
      operations,
      catalogRow: (kind, id) => rows.get(`${kind}:${id}`) ?? null,
      baseOperationCodes: BASE_OPERATION_CODES,
      defaultMarkupPercent,
    });
    return drafted.map((line) => this.toUnpriced(line, line.source));
  }

  /** The plan's own figures: each pick at the price and install hours the plan shows, each planned operation as planned. */
  private async draftLinesFromPlan(user: AuthUser, plan: PartsPlanRecord): Promise<UnpricedLine[]> {
    const result = plan.result as unknown as PartsPlanResult;
    const drafted = draftLinesFromPlan({
      plan: result,
      parts: result.picks.map((pick) => ({
        partId: pick.partId,
        sku: pick.sku,
        description: pick.description,
        category: pick.category,
        quantity: pick.quantity,
        priceCents: pick.priceCents,
        laborHours: pick.laborHours,
      })),
      operations: await this.operations.list(user),
      baseOperationCodes: BASE_OPERATION_CODES,
    });
    return drafted.map((line) => this.toUnpriced(line, line.source));
  }

  /** The estimator's lines, checked: labor operations must be the shop's own; a kept key keeps its line's origin. */
  private async linesFromInput(user: AuthUser, input: QuoteLineInputDto[], previous: QuoteLine[]): Promise<UnpricedLine[]> {
    const operationIds = [...new Set(input.map((line) => line.laborOperationId).filter((id): id is string => Boolean(id)))];
    const found = new Set((await this.operations.byIds(user, operationIds)).map((operation) => operation.id));
    const missing = operationIds.find((operationId) => !found.has(operationId));
    if (missing) throw QuoteErrors.badLine(`laborOperationId ${missing} is not one of your shop's labor operations`);
    const keys = new Set<string>();
    return input.map((line, index) => {
      if (line.key && keys.has(line.key)) throw QuoteErrors.badLine(`line ${index + 1} repeats the key of another line`);
      if (line.key) keys.add(line.key);
      if (line.kind === 'labor' && line.hours === undefined) throw QuoteErrors.badLine(`line ${index + 1} (labor) needs hours`);
      if (line.kind === 'part' && (line.pricing ?? 'list') === 'list' && line.unitPriceCents === undefined) {
        throw QuoteErrors.badLine(`line ${index + 1} (part) needs unitPriceCents, or pricing cost-plus with unitCostCents and markupPercent`);
      }
      const before = line.key ? previous.find((candidate) => candidate.key === line.key) : undefined;
      return this.toUnpriced({ ...line, key: line.key ?? randomUUID() }, before?.source ?? 'manual');
    });
  }

  private toUnpriced(line: QuoteLineInputDto & { key: string }, source: QuoteLine['source']): UnpricedLine {
    return {
      key: line.key,
      kind: line.kind,
      source,
      description: line.description,
      sku: line.kind === 'part' ? (line.sku || null) : null,
      catalogKind: line.catalogKind ?? null,
      catalogItemId: line.catalogItemId ?? null,
      laborOperationId: line.laborOperationId ?? null,
      quantity: line.kind === 'part' ? (line.quantity ?? 1) : 1,
      pricing: line.kind === 'part' ? (line.pricing ?? 'list') : 'list',
      unitCostCents: line.unitCostCents ?? null,
      markupPercent: line.markupPercent ?? null,
      hours: line.kind === 'labor' ? (line.hours ?? 0) : null,
      unitPriceCents: line.unitPriceCents ?? null,
    };
  }

  /** `forMyself`: the member's own build, printed as a budget (nobody to approve it or pay a deposit). */
  private async renderPdf(view: QuoteView, forMyself = false): Promise<{ fileName: string; content: Buffer }> {
    const reader = shopReader(view.quote.shopId);
    const shop = await this.shops.getCurrent(reader);
    const report = view.revision.fitReportId ? await this.fitReports.get(reader, view.revision.fitReportId).catch(() => null) : null;
    const content = await this.pdf.render({ view, shop, report, forMyself });
    const stem = forMyself ? `Budget-${quoteLabel(view.quote)}` : quoteLabel(view.quote);
    return { fileName: `${stem}-rev${view.revision.number}.pdf`, content };
  }

  /** The link works to the end of the last valid day in the shop's own zone. */
  private approvalLink(view: QuoteView, timeZone: string): string {
    const expiresAt = endOfDayIn(view.revision.validUntil, timeZone);
    const token = this.links.sign({ q: view.quote.id, s: view.quote.shopId, r: view.revision.number }, expiresAt);
    return `${this.config.get('APP_URL', { infer: true })}/quote-answer/${token}`;
  }

  /** The quote's label ("Q-0003") in its shop, or null when there is no such quote (e.g. for a payment event's subject). */
  async labelInShop(shopId: string, quoteId: string): Promise<string | null> {
    const quote = await this.quotes.findById({ shopId }, quoteId);
    return quote ? quoteLabel(quote) : null;
  }

  private async enqueueQuoteMail(manager: EntityManager, view: QuoteView, revision: number, idempotencyKey: string): Promise<void> {
    const { shopId, id: quoteId } = view.quote;
    const subject = `Quote ${quoteLabel(view.quote)} (revision ${revision}) e-mail to ${view.project.customer?.email ?? 'the customer'}`;
    await this.jobs.enqueue(manager, { kind: 'quote.mail', idempotencyKey, shopId, subject, payload: { shopId, quoteId, revision } });
  }

  private async mailQuote(view: QuoteView, messageId: string): Promise<void> {
    const { fileName, content } = await this.renderPdf(view);
    const shop: Shop = await this.shops.getCurrent(shopReader(view.quote.shopId));
    const link = this.approvalLink(view, shop.timeZone);
    const customer = view.project.customer;
    if (!customer?.email) throw new Error('the customer of this quote has no e-mail address any more');
    await this.mail.send(
      {
        to: customer.email,
        subject: `${shop.name}: quote ${quoteLabel(view.quote)} for ${view.project.title}`,
        text:
          `Hello ${customer.name},\n\n` +
          `${shop.name} has prepared quote ${quoteLabel(view.quote)} (revision ${view.revision.number}) for "${view.project.title}". ` +
          `Total ${formatMoney(view.revision.totals.totalCents, view.revision.currency)}, deposit on approval ${formatMoney(view.revision.totals.depositCents, view.revision.currency)}. ` +
          `The PDF is attached.\n\nRead it and approve or decline it here (the link works until ${formatCalendarDate(view.revision.validUntil)}):\n${link}\n\n` +
          `This quote is a planning aid built on the figures measured so far; the shop confirms every measurement before cutting or ordering.\n`,
        attachments: [{ filename: fileName, content, contentType: 'application/pdf' }],
      },
      messageId,
    );
  }

  private estimatorMail(view: QuoteView, to: string, answer: string, reason: string) {
    return {
      to,
      subject: `Quote ${quoteLabel(view.quote)} ${answer} by ${view.project.customer?.name ?? 'the customer'}`,
      text:
        `${view.project.customer?.name ?? 'The customer'} ${answer} quote ${quoteLabel(view.quote)} (revision ${view.revision.number}) for "${view.project.title}".` +
        (reason ? `\nReason given: ${reason}` : '') +
        `\n\nOpen the project: ${this.config.get('APP_URL', { infer: true })}/projects/${view.project.id}\n`,
    };
  }

  private async notify(manager: EntityManager, view: QuoteView, message: string): Promise<void> {
    if (!view.quote.sentById) return;
    await manager.insert(QuoteNotification, {
      id: randomUUID(),
      shopId: view.quote.shopId,
      userId: view.quote.sentById,
      quoteId: view.quote.id,
      projectId: view.project.id,
      message: message.slice(0, 500),
      readAt: null,
    });
  }
}

