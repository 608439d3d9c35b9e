import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  buildWorkSteps,
  planResolutions,
  measuredCheckResult,
  type FitReport,
  type WorkCheck,
  type WorkOperationInput,
  type WorkOrderState,
  type WorkPartInput,
} from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, In, Repository } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { FitReportRecord } from '../fit-reports/fit-report-record.entity';
import { LaborOperation } from '../labor-operations/labor-operation.entity';
import { CounterService, type AcceptedPart } from '../parts/counter.service';
import { CounterLine, Part, PartsPlanRecord } from '../parts/part.entity';
import type { Project } from '../projects/project.entity';
import { ProjectsService } from '../projects/projects.service';
import type { Quote } from '../quotes/quote.entity';
import { quoteLabel } from '../quotes/quote-label';
import type { QuoteRevision } from '../quotes/quote-revision.entity';
import { RecordCheckDto } from './dto/record-check.dto';
import { PhotoIntakeService, type UploadedPhotoFile } from '../measurements/photo-intake.service';
import { WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto } from './work-order.entity';
import { WorkOrderErrors } from './work-orders.errors';

/** A work order with what its views need. */
export interface WorkOrderView {
  order: WorkOrder;
  project: Project;
  records: WorkOrderCheck[];
  photos: WorkOrderCheckPhoto[];
  /** The counter's lines of the plan the approved revision was drawn from; null when it was drawn from none. */
  counterLines: { planId: string; lines: CounterLine[] } | null;
}

/** The quote a work order is opened from: the approved quote and the revision the customer approved. */
export interface ApprovedQuote {
  quote: Quote;
  revision: QuoteRevision;
}

/** Opens work orders when deposits settle, and runs them in the bay: start, record checks, finish. */
@Injectable()
export class WorkOrdersService {
  private readonly orders: TenantRepository<WorkOrder>;

  constructor(
    @InjectRepository(WorkOrder) orders: Repository<WorkOrder>,
    @InjectRepository(WorkOrderCheck) private readonly checks: Repository<WorkOrderCheck>,
    @InjectRepository(WorkOrderCheckPhoto) private readonly photos: Repository<WorkOrderCheckPhoto>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly projects: ProjectsService,
    private readonly intake: PhotoIntakeService,
    private readonly counter: CounterService,
  ) {
    this.orders = new TenantRepository(orders);
  }

  // ------------------------------------------------------------------ opening (inside the deposit's transaction)

  /**
   * Opens the work order of an approved quote, in the transaction that settles its deposit (or, for a member's own
   * truck, the one that starts their build: `QuotesService.startOwnBuild`); a second call for the same
   * quote changes nothing (one work order per quote, by a unique key). Returns the id of the one opened, or null.
   */
  async openForQuote(manager: EntityManager, approved: ApprovedQuote): Promise<string | null> {
    const { quote, revision } = approved;
    const shopId = quote.shopId;
    const operationIds = revision.lines.map((line) => line.laborOperationId).filter((id): id is string => Boolean(id));
    const operations = operationIds.length ? await manager.find(LaborOperation, { where: { shopId, id: In(operationIds) } }) : [];
    // One step per labor line of the accepted quote, in the line's own words and hours; a line of one of the shop's
    // operations brings that operation's place in the build, hazards, torques and checks (a second line of the same
    // operation gets a step key of its own, so its checks are recorded apart).
    const operationInputs: WorkOperationInput[] = [];
    const stepsOfOperation = new Map<string, number>();
    revision.lines.forEach((line, index) => {
      if (line.kind !== 'labor') return;
      const operation = operations.find((candidate) => candidate.id === line.laborOperationId);
      if (operation) {
        const seen = (stepsOfOperation.get(operation.id) ?? 0) + 1;
        stepsOfOperation.set(operation.id, seen);
        operationInputs.push({
          ...operation,
          code: seen === 1 ? operation.code : `${operation.code}-${seen}`,
          name: line.description,
          hours: line.hours ?? operation.bookHours,
          checks: operation.checks,
          torqueSpecs: operation.torqueSpecs,
        });
      } else {
        operationInputs.push({ id: null, code: `line-${index + 1}`, name: line.description, buildOrder: 900 + index, hours: line.hours ?? 0, matches: [], hazards: [], torqueSpecs: [], checks: [] });
      }
    });
    const parts: WorkPartInput[] = [];
    const counterParts: AcceptedPart[] = [];
    for (const line of revision.lines) {
      if (line.kind !== 'part') continue;
      const part = await this.partOfLine(manager, shopId, line.catalogKind, line.catalogItemId);
      if (part) counterParts.push({ partId: part.id, sku: part.sku, description: part.description, quantity: line.quantity });
      parts.push(
        part
          ? { sku: part.sku, description: part.description, category: part.category, quantity: line.quantity, torqueSpecs: part.torqueSpecs, instructions: part.instructions, attributes: part.attributes }
          : { sku: '', description: line.description, category: '', quantity: line.quantity, torqueSpecs: [], instructions: null, attributes: {} },
      );
    }
    const report = revision.fitReportId ? await manager.findOne(FitReportRecord, { where: { shopId, id: revision.fitReportId } }) : null;
    const findings = (report?.results as FitReport | undefined)?.findings ?? [];
    // The plan the quote was drawn from: a shortfall it resolves is measured once fitted, not read as the verdict.
    const plan = revision.partsPlanId ? await manager.findOne(PartsPlanRecord, { where: { shopId, id: revision.partsPlanId } }) : null;
    const id = randomUUID();
    const result = await manager
      .createQueryBuilder()
      .insert()
      .into(WorkOrder)
      .values({
        id,
        shopId,
        projectId: quote.projectId,
        quoteId: quote.id,
        quoteRevision: revision.number,
        number: quote.number,
        state: 'ready',
        steps: buildWorkSteps(operationInputs, parts, findings, planResolutions(plan?.result)),
        fitReportId: revision.fitReportId,
        partsPlanVersion: revision.partsPlanVersion,
        startedAt: null,
        startedById: null,
        finishedAt: null,
        finishedById: null,
      })
      .orIgnore()
      .execute();
    if ((result.raw as { affectedRows?: number }).affectedRows !== 1) return null;
    await this.counter.matchAcceptedQuote(manager, { shopId, projectId: quote.projectId, planId: revision.partsPlanId, quoteLabel: quoteLabel(quote), parts: counterParts, everyPartLinked: counterParts.length === parts.length });
    return id;
  }

  /** The shop's part a quote line prices: a part row itself (`parts`), or the part carrying that fit spec. */
  private async partOfLine(manager: EntityManager, shopId: string, kind: string | null, id: string | null): Promise<Part | null> {
    if (!kind || !id) return null;
    if (kind === 'parts') return manager.findOne(Part, { where: { shopId, id } });
    return manager.findOne(Part, { where: { shopId, fitKind: kind as NonNullable<Part['fitKind']>, fitSpecId: id }, order: { priceCents: 'ASC' } });
  }

  // ------------------------------------------------------------------ reading

  async list(user: AuthUser, state?: WorkOrderState): Promise<WorkOrderView[]> {
    const orders = await this.orders.repository.find({ where: this.orders.where(user, state ? { state } : {}), order: { createdAt: 'DESC' }, take: 100 });
    const views: WorkOrderView[] = [];
    for (const order of orders) views.push(await this.viewOf(user, order));
    return views;
  }

  async get(user: AuthUser, id: string): Promise<WorkOrderView> {
    const order = await this.orders.findById(user, id);
    if (!order) throw WorkOrderErrors.notFound();
    return this.viewOf(user, order);
  }

  async forProject(user: AuthUser, projectId: string): Promise<WorkOrderView> {
    const project = await this.projects.get(user, projectId);
    const order = await this.orders.repository.findOne({ where: this.orders.where(user, { projectId: project.id }), order: { createdAt: 'DESC' } });
    if (!order) throw WorkOrderErrors.noneForProject();
    return this.viewOf(user, order, project);
  }

  // ------------------------------------------------------------------ in the bay

  /** The bay takes the job: the project moves to its in-the-bay stage in the same transaction. */
  async start(user: AuthUser, id: string): Promise<WorkOrderView> {
    const { order } = await this.get(user, id);
    if (order.state !== 'ready') throw order.state === 'finished' ? WorkOrderErrors.finished() : WorkOrderErrors.alreadyStarted();
    await this.dataSource.transaction(async (manager) => {
      const changed = await manager.update(WorkOrder, { id: order.id, shopId: user.shopId, state: 'ready' }, { state: 'in-the-bay', startedAt: new Date(), startedById: user.userId });
      if (!changed.affected) throw WorkOrderErrors.alreadyStarted();
      await this.projects.advanceStatus(user.shopId, order.projectId, 'in-the-bay', manager);
    });
    return this.get(user, id);
  }

  /** Records one check with who and when; a measured value is judged against the check's range here, not by the caller. */
  async recordCheck(user: AuthUser, id: string, input: RecordCheckDto): Promise<WorkOrderView> {
    const { order } = await this.get(user, id);
    if (order.state === 'ready') throw WorkOrderErrors.notStarted();
    if (order.state === 'finished') throw WorkOrderErrors.finished();
    const check = this.checkOf(order, input.checkKey);
    let result: 'pass' | 'fail';
    let value: number | null = null;
    if (check.measured) {
      if (input.value === undefined) throw WorkOrderErrors.valueRequired(check.label, check.range ?? '');
      value = Math.round(input.value * 100) / 100;
      result = measuredCheckResult(value, check);
    } else {
      if (input.passed === undefined) throw WorkOrderErrors.passedRequired(check.label);
      result = input.passed ? 'pass' : 'fail';
      // a failure with no word of what is wrong leaves the next person nothing to put right
      if (result === 'fail' && !input.note?.trim()) throw WorkOrderErrors.noteRequired(check.label);
    }
    await this.checks.insert({
      id: randomUUID(),
      shopId: user.shopId,
      workOrderId: order.id,
      checkKey: check.key,
      result,
      value,
      note: input.note ?? '',
      recordedById: user.userId,
      recordedByName: user.name.slice(0, 120),
    });
    return this.get(user, id);
  }

  /** Adds photos to a check of a job in the bay (checked, location metadata stripped, stored by the shared photo pipeline). */
  async addCheckPhotos(user: AuthUser, id: string, checkKey: string, files: UploadedPhotoFile[] | undefined): Promise<WorkOrderView> {
    const { order } = await this.get(user, id);
    if (order.state === 'ready') throw WorkOrderErrors.notStarted();
    if (order.state === 'finished') throw WorkOrderErrors.finished();
    const check = this.checkOf(order, checkKey);
    const prepared = await this.intake.prepare(files);
    await this.intake.storeWith(prepared, () =>
      this.dataSource.transaction(async (manager) => {
        for (const { image, data, key } of prepared) {
          await manager.insert(WorkOrderCheckPhoto, {
            id: randomUUID(),
            shopId: user.shopId,
            workOrderId: order.id,
            projectId: order.projectId,
            checkKey: check.key,
            storageKey: key,
            contentType: image.contentType,
            bytes: data.length,
            widthPx: image.width,
            heightPx: image.height,
            uploadedById: user.userId,
            uploadedByName: user.name.slice(0, 120),
          });
        }
      }),
    );
    return this.get(user, id);
  }

  /** A check photo's file, for the shop's members and the project's own customer (anyone else: not found). */
  async checkPhotoFile(user: AuthUser, photoId: string): Promise<{ photo: WorkOrderCheckPhoto; data: Buffer }> {
    const photo = await this.photos.findOne({ where: { id: photoId, shopId: user.shopId } });
    if (!photo) throw WorkOrderErrors.photoNotFound();
    await this.projects.get(user, photo.projectId).catch(() => {
      throw WorkOrderErrors.photoNotFound();
    });
    return { photo, data: await this.intake.read(photo.storageKey) };
  }

  /**
   * Removes a check photo (a wrong one) while the job is in the bay. A finished work order is signed off: its photos
   * stay with it as the record of the build (409). The work order's row is locked, so a finish at the same moment
   * waits for the removal or the removal sees the finish; the file goes once the row's removal has committed.
   */
  async removeCheckPhoto(user: AuthUser, photoId: string): Promise<void> {
    const photo = await this.photos.findOne({ where: { id: photoId, shopId: user.shopId } });
    if (!photo) throw WorkOrderErrors.photoNotFound();
    await this.dataSource.transaction(async (manager) => {
      const order = await manager.findOne(WorkOrder, { where: { id: photo.workOrderId, shopId: user.shopId }, lock: { mode: 'pessimistic_write' } });
      if (!order) throw WorkOrderErrors.photoNotFound();
      if (order.state === 'finished') throw WorkOrderErrors.photoSignedOff();
      const removed = await manager.delete(WorkOrderCheckPhoto, { id: photo.id, shopId: user.shopId });
      if (!removed.affected) throw WorkOrderErrors.photoNotFound();
    });
    await this.intake.discard(photo.storageKey);
  }

  /**
   * The job is built: every check's newest recording must be a pass. The project moves to done with it, and whatever
   * the counter still has set aside for the job is issued to it (off the shelf), all in one transaction.
   */
  async finish(user: AuthUser, id: string): Promise<WorkOrderView> {
    const view = await this.get(user, id);
    const { order } = view;
    if (order.state === 'ready') throw WorkOrderErrors.notStarted();
    if (order.state === 'finished') throw WorkOrderErrors.finished();
    const latest = new Map(view.records.map((record) => [record.checkKey, record.result]));
    const outstanding = order.steps.flatMap((step) => step.checks).filter((check) => latest.get(check.key) !== 'pass');
    if (outstanding.length > 0) throw WorkOrderErrors.checksOutstanding(outstanding.map((check) => check.label));
    await this.dataSource.transaction(async (manager) => {
      const changed = await manager.update(WorkOrder, { id: order.id, shopId: user.shopId, state: 'in-the-bay' }, { state: 'finished', finishedAt: new Date(), finishedById: user.userId });
      if (!changed.affected) throw WorkOrderErrors.finished();
      await this.projects.advanceStatus(user.shopId, order.projectId, 'done', manager);
      await this.counter.issueRestOfJob(manager, user, order.projectId);
    });
    return this.get(user, id);
  }

  // ------------------------------------------------------------------ helpers

  private checkOf(order: WorkOrder, key: string): WorkCheck {
    for (const step of order.steps) {
      const check = step.checks.find((candidate) => candidate.key === key);
      if (check) return check;
    }
    throw WorkOrderErrors.unknownCheck(key);
  }

  private async viewOf(user: AuthUser, order: WorkOrder, project?: Project): Promise<WorkOrderView> {
    const records = await this.checks.find({ where: { shopId: user.shopId, workOrderId: order.id }, order: { recordedAt: 'ASC', id: 'ASC' } });
    const photos = await this.photos.find({ where: { shopId: user.shopId, workOrderId: order.id }, order: { createdAt: 'ASC', id: 'ASC' } });
    const counterLines = await this.counterLinesOf(user.shopId, order);
    return { order, project: project ?? (await this.projects.get(user, order.projectId)), records, photos, counterLines };
  }

  private async counterLinesOf(shopId: string, order: WorkOrder): Promise<WorkOrderView['counterLines']> {
    const revision = await this.dataSource
      .getRepository<QuoteRevision>('QuoteRevision')
      .findOne({ select: { id: true, partsPlanId: true }, where: { shopId, quoteId: order.quoteId, number: order.quoteRevision } });
    if (!revision?.partsPlanId) return null;
    const lines = await this.dataSource.getRepository(CounterLine).find({ where: { shopId, planId: revision.partsPlanId }, order: { sku: 'ASC' } });
    return { planId: revision.partsPlanId, lines };
  }
}
