import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  fitSpecAttributes,
  isPartCategory,
  panClearanceRefusals,
  planParts,
  resolveFitSettings,
  runFitCheck,
  type EngineControllerSpec,
  type FitSpec,
  type FitSpecKind,
  type FittedPart,
  type MountAdapterSpec,
  type OilPanSpec,
  type OilPickupSpec,
  type OilPumpSpec,
  type PartsPlanResult,
  type PlanObjective,
  type PlanPart,
  type PlanSlot,
  type ProjectStatus,
} from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, In, Not } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { AuthUser } from '../common/tenant/auth-user';
import { FitReportsService } from '../fit-reports/fit-reports.service';
import { ProjectsService } from '../projects/projects.service';
import { ShopsService } from '../shops/shops.service';
import { MipSolverService } from './mip-solver.service';
import { CounterLine, Part, PartStock, PartsPlanRecord, type PlanRecheck } from './part.entity';
import { PartsErrors } from './parts.errors';

const NOT_PLANNED = new Set(['engine', 'transmission']);

/** Builds, stores, lists and locks parts plans: the fit report's shortfalls, the catalog and the solver. */
@Injectable()
export class PartsPlansService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly projects: ProjectsService,
    private readonly fitReports: FitReportsService,
    private readonly catalog: CatalogService,
    private readonly solver: MipSolverService,
    private readonly shops: ShopsService,
  ) {}

  /** The planner's catalog: every part of the shop (but engines and transmissions) with its free stock and fit-spec attributes. */
  async planParts(user: Pick<AuthUser, 'shopId'>): Promise<PlanPart[]> {
    const parts = await this.dataSource.getRepository(Part).find({ where: { shopId: user.shopId, category: Not(In([...NOT_PLANNED])) } });
    const free = await this.dataSource
      .getRepository(PartStock)
      .createQueryBuilder('s')
      .select('s.partId', 'partId')
      .addSelect('SUM(s.onHand - s.reserved)', 'available')
      .where('s.shopId = :shopId', { shopId: user.shopId })
      .groupBy('s.partId')
      .getRawMany<{ partId: string; available: string }>();
    const available = new Map(free.map((row) => [row.partId, Number(row.available)]));
    const specs = new Map<string, unknown>();
    const byKind = new Map<string, string[]>();
    for (const part of parts) if (part.fitKind && part.fitSpecId) byKind.set(part.fitKind, [...(byKind.get(part.fitKind) ?? []), part.fitSpecId]);
    for (const [kind, ids] of byKind) {
      for (const [id, spec] of await this.catalog.specsByIds(kind as CatalogKind, user, ids)) specs.set(id, spec);
    }
    return parts
      .filter((part) => isPartCategory(part.category))
      .map((part) => ({
        id: part.id,
        sku: part.sku,
        description: part.description,
        category: part.category,
        priceCents: part.priceCents,
        laborHours: part.laborHours,
        attributes: {
          ...(part.fitKind && part.fitSpecId && specs.has(part.fitSpecId) ? fitSpecAttributes(part.fitKind as FitSpecKind, specs.get(part.fitSpecId)) : {}),
          ...part.attributes,
        },
        requires: part.requiresSkus,
        excludes: part.excludesSkus,
        replaces: part.replacesSkus,
        available: available.get(part.id) ?? 0,
        fitSpecId: part.fitSpecId,
      }));
  }

  /**
   * A new plan version from a stored fit report of the project (the given one, or a fit check run and stored now),
   * so the plan names the report whose shortfalls it answers.
   */
  async build(user: AuthUser, projectId: string, objective: PlanObjective, resolve?: string[], fitReportId?: string): Promise<PartsPlanRecord> {
    const project = await this.projects.get(user, projectId);
    const stored = fitReportId ? await this.fitReports.get(user, fitReportId) : await this.fitReports.run(user, project.id);
    if (stored.projectId !== project.id) throw PartsErrors.fitReportNotOfProject();
    const spec = stored.inputsSnapshot.spec;
    const overrides = stored.inputsSnapshot.settingsOverrides;
    const report = stored.results;
    const parts = await this.planParts(user);
    const shop = await this.shops.getCurrent(user);
    const skuOfSpec = new Map(parts.filter((p) => p.fitSpecId).map((p) => [p.fitSpecId!, p.sku]));
    const fitted: Partial<Record<PlanSlot, FittedPart>> = {};
    const fit = (slot: PlanSlot, kind: FitSpecKind, item: { id: string; name: string } | undefined) => {
      if (item) fitted[slot] = { name: item.name, attributes: fitSpecAttributes(kind, item), fitSpecId: item.id, sku: skuOfSpec.get(item.id) ?? null };
    };
    fit('oil-pan', 'oil-pans', spec.oilPan);
    fit('oil-pickup', 'oil-pickups', spec.oilPickup);
    fit('oil-pump', 'oil-pumps', spec.oilPump);
    fit('engine-controller', 'controllers', spec.controller);
    fit('mount-adapter', 'mount-adapters', spec.candidates?.mountAdapters?.find((a) => a.id === spec.mountAdapterId));
    const started = performance.now();
    const result = await planParts(
      {
        engine: {
          name: spec.engine.name,
          railPattern: spec.engine.panRail.pattern,
          bellPattern: spec.engine.bellPattern,
          crankSignal: spec.engine.crankSignal,
          camSignal: spec.engine.camSignal,
          throttle: spec.engine.throttle,
          cylinders: spec.engine.cylinders,
          dipstickLocation: spec.engine.dipstickLocation,
        },
        transmissionBellPattern: spec.transmission?.bellPattern ?? null,
        fitted,
        shortfalls: report.shortfalls,
        ...(resolve && { resolve }),
        parts,
        // Pans that would meet the crossmember (or another obstacle below the engine) where it sits are never picked.
        clearanceRefusals: panClearanceRefusals(spec, resolveFitSettings(overrides)),
        laborRateCents: Math.round(shop.laborRatePerHour * 100),
        objective,
      },
      (lp, options) => this.solver.solve(lp, options),
    );
    const solveMs = Math.round(performance.now() - started);
    const recheck = await this.recheck(user, spec, overrides, result, report.shortfalls.map((s) => s.checkId));
    const id = randomUUID();
    await this.dataSource.transaction(async (manager) => {
      // Lock the project row so two builds at once take the next version numbers one after the other.
      await manager.query('SELECT id FROM projects WHERE id = ? FOR UPDATE', [project.id]);
      const [latest] = await manager.query('SELECT COALESCE(MAX(version), 0) AS v FROM parts_plans WHERE projectId = ?', [project.id]);
      await manager.insert(PartsPlanRecord, {
        id,
        shopId: user.shopId,
        projectId: project.id,
        version: Number(latest.v) + 1,
        objective,
        status: 'draft',
        fitReportId: stored.id,
        result,
        recheck,
        totalCents: result.totals.totalCents,
        solveMs,
        lockedAt: null,
        createdById: user.userId,
      });
      if (result.picks.length > 0) {
        await manager.insert(
          CounterLine,
          result.picks.map((pick) => ({
            id: randomUUID(),
            shopId: user.shopId,
            planId: id,
            projectId: project.id,
            partId: pick.partId,
            sku: pick.sku,
            description: pick.description,
            quantity: pick.quantity,
            status: 'open' as const,
            stockId: null,
            updatedById: user.userId,
          })),
        );
      }
      await this.projects.advanceStatus(user.shopId, project.id, 'parts-planned', manager);
    });
    return this.get(user, id);
  }

  /** The fit check again with the chosen parts carrying fit specs in place of the fitted ones. */
  private async recheck(user: AuthUser, spec: FitSpec, overrides: object, result: PartsPlanResult, before: string[]): Promise<PlanRecheck> {
    const next: FitSpec = { ...spec };
    for (const pick of result.picks) {
      if (!pick.fitSpecId) continue;
      if (pick.category === 'oil-pan') next.oilPan = (await this.catalog.findSpec<OilPanSpec>('oil-pans', user, pick.fitSpecId)) ?? next.oilPan;
      if (pick.category === 'oil-pickup') next.oilPickup = (await this.catalog.findSpec<OilPickupSpec>('oil-pickups', user, pick.fitSpecId)) ?? next.oilPickup;
      if (pick.category === 'oil-pump') next.oilPump = (await this.catalog.findSpec<OilPumpSpec>('oil-pumps', user, pick.fitSpecId)) ?? next.oilPump;
      if (pick.category === 'engine-controller') next.controller = (await this.catalog.findSpec<EngineControllerSpec>('controllers', user, pick.fitSpecId)) ?? next.controller;
      if (pick.category === 'mount-adapter' && (await this.catalog.findSpec<MountAdapterSpec>('mount-adapters', user, pick.fitSpecId))) next.mountAdapterId = pick.fitSpecId;
    }
    const report = runFitCheck(next, overrides);
    const remaining = report.shortfalls.map((s) => ({ checkId: s.checkId, title: s.title, status: s.status, message: s.message }));
    const still = new Set(remaining.map((s) => s.checkId));
    return {
      summary: { ok: report.summary.ok, tight: report.summary.tight, fails: report.summary.fails, unknown: report.summary.unknown },
      resolved: before.filter((checkId) => !still.has(checkId)),
      remaining,
    };
  }

  /** The project's plan versions, newest first; a customer's own projects only (the projects service scopes them). */
  async list(user: AuthUser, projectId: string): Promise<PartsPlanRecord[]> {
    const project = await this.projects.get(user, projectId);
    return this.dataSource.getRepository(PartsPlanRecord).find({ where: { shopId: user.shopId, projectId: project.id }, order: { version: 'DESC' }, take: 50 });
  }

  /** The plan a quote is drawn from: the newest locked version, else the newest version; null when the project has none. */
  async forQuote(user: Pick<AuthUser, 'shopId'>, projectId: string): Promise<PartsPlanRecord | null> {
    const plans = this.dataSource.getRepository(PartsPlanRecord);
    return (
      (await plans.findOne({ where: { shopId: user.shopId, projectId, status: 'locked' }, order: { version: 'DESC' } })) ??
      (await plans.findOne({ where: { shopId: user.shopId, projectId }, order: { version: 'DESC' } }))
    );
  }

  /** The shop's part rows by id (for prices, costs and install data). */
  async partsByIds(user: Pick<AuthUser, 'shopId'>, ids: string[]): Promise<Part[]> {
    if (ids.length === 0) return [];
    return this.dataSource.getRepository(Part).find({ where: { shopId: user.shopId, id: In(ids) } });
  }

  async get(user: Pick<AuthUser, 'shopId'>, id: string): Promise<PartsPlanRecord> {
    const plan = await this.dataSource.getRepository(PartsPlanRecord).findOne({ where: { id, shopId: user.shopId } });
    if (!plan) throw PartsErrors.planNotFound();
    return plan;
  }

  /** One plan version for a reader: the shop's; a customer only sees plans of their own projects (another's is not found). */
  async read(user: AuthUser, id: string): Promise<PartsPlanRecord> {
    const plan = await this.get(user, id);
    if (!(await this.projects.isReadableBy(user, plan.projectId))) throw PartsErrors.planNotFound();
    return plan;
  }

  async lock(user: AuthUser, id: string): Promise<PartsPlanRecord> {
    const plan = await this.get(user, id);
    if (plan.status === 'locked') throw PartsErrors.planLocked(plan.version);
    await this.dataSource.getRepository(PartsPlanRecord).update({ id: plan.id, shopId: user.shopId }, { status: 'locked', lockedAt: new Date() });
    return this.get(user, id);
  }

  /** The most recent plans of the shop with their project titles, newest first (the counter's work list). */
  async recent(user: Pick<AuthUser, 'shopId'>): Promise<Array<PartsPlanRecord & { projectTitle: string; projectStatus: ProjectStatus; customerName: string | null }>> {
    const rows = await this.dataSource.query(
      `SELECT p.id, p.projectId, p.version, p.status, p.objective, p.totalCents, p.createdAt, pr.title AS projectTitle, pr.status AS projectStatus,
              c.name AS customerName
         FROM parts_plans p JOIN projects pr ON pr.id = p.projectId LEFT JOIN customers c ON c.id = pr.customerId AND c.shopId = pr.shopId
        WHERE p.shopId = ? AND p.version = (SELECT MAX(version) FROM parts_plans q WHERE q.projectId = p.projectId)
        ORDER BY p.createdAt DESC LIMIT 50`,
      [user.shopId],
    );
    return rows;
  }
}
