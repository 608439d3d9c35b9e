import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  compareFitReports,
  runFitCheck,
  worstStatus,
  type FitReport,
  type FitSettings,
  type FitSpec,
} from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, Repository, SelectQueryBuilder } from 'typeorm';
import { Page, PageQueryDto, skipOf, toPage } from '../common/pagination/page-query.dto';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { ProjectsService } from '../projects/projects.service';
import { User } from '../users/user.entity';
import { WhatIfDto } from './dto/what-if.dto';
import { FitReportRecord } from './fit-report-record.entity';
import { FitReportErrors } from './fit-reports.errors';
import { FitSettingsService } from './fit-settings.service';
import { FitSpecBuilderService } from './fit-spec-builder.service';
import { jsonCopy } from '../common/json/json-copy';

/** Two stored reports of the caller's shop and what changed, check by check, from a to b. */
export interface FitReportComparison {
  a: FitReportRecord;
  b: FitReportRecord;
  changes: ReturnType<typeof compareFitReports>;
}

@Injectable()
export class FitReportsService {
  private readonly scoped: TenantRepository<FitReportRecord>;

  constructor(
    @InjectRepository(FitReportRecord) reports: Repository<FitReportRecord>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly projects: ProjectsService,
    private readonly builder: FitSpecBuilderService,
    private readonly settings: FitSettingsService,
  ) {
    this.scoped = new TenantRepository(reports);
  }

  async run(user: AuthUser, projectId: string): Promise<FitReportRecord> {
    const project = await this.projects.get(user, projectId);
    const settingsOverrides = await this.settings.overridesFor(user);
    const built = await this.builder.build(user, project, settingsOverrides);
    const report = runFitCheck(built.spec, settingsOverrides);
    const record = this.scoped.repository.create({
      id: randomUUID(),
      shopId: user.shopId,
      projectId: project.id,
      createdById: user.userId,
      engineVersion: report.engineVersion,
      placementSetbackMm: report.placement.setbackMm,
      placementHeightMm: report.placement.heightMm,
      placementTiltDeg: report.placement.tiltDeg,
      placementSource: built.placementSource,
      inputsSnapshot: { spec: built.spec, settingsOverrides, placementSource: built.placementSource, notes: built.notes, chassisInputs: built.chassisInputs },
      results: report,
      totalCount: report.summary.total,
      okCount: report.summary.ok,
      tightCount: report.summary.tight,
      failsCount: report.summary.fails,
      unknownCount: report.summary.unknown,
      worstStatus: worstStatus(report.summary),
    });
    await this.dataSource.transaction(async (manager) => {
      // Running a check moves a project that is still being set up on to the fit-checked stage. The project's row is
      // locked first: inserting the report first takes a shared lock on it (the foreign key), and two runs on one
      // project that both then ask to update it deadlock.
      await this.projects.advanceStatus(user.shopId, project.id, 'fit-checked', manager);
      await manager.insert(FitReportRecord, record);
    });
    return this.get(user, record.id);
  }

  async list(user: AuthUser, projectId: string, query: PageQueryDto): Promise<Page<FitReportRecord>> {
    const project = await this.projects.get(user, projectId);
    const [items, total] = await this.withAuthorName(this.scoped.query(user, 'report'))
      .andWhere('report.projectId = :projectId', { projectId: project.id })
      .orderBy('report.createdAt', 'DESC')
      .addOrderBy('report.id', 'DESC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
    return toPage(items, total, query);
  }

  /** Joins the author onto `createdBy` (left join: null once that user was removed). */
  private withAuthorName(builder: SelectQueryBuilder<FitReportRecord>): SelectQueryBuilder<FitReportRecord> {
    return builder.leftJoinAndMapOne('report.createdBy', User, 'author', 'author.id = report.createdById');
  }

  /** One report of the caller's shop; a customer only sees reports of their own projects. */
  async get(user: AuthUser, id: string): Promise<FitReportRecord> {
    const record = await this.withAuthorName(this.scoped.query(user, 'report')).andWhere('report.id = :id', { id }).getOne();
    if (!record || !(await this.projects.isReadableBy(user, record.projectId))) throw FitReportErrors.notFound();
    return record;
  }

  async compare(user: AuthUser, aId: string, bId: string): Promise<FitReportComparison> {
    if (aId === bId) throw FitReportErrors.compareSameReport();
    const [a, b] = await Promise.all([this.get(user, aId), this.get(user, bId)]);
    return { a, b, changes: compareFitReports(a.results, b.results) };
  }

  /** Runs the engine on a spec as given, with the shop's thresholds under the request's own; nothing is stored. */
  async whatIf(user: AuthUser, input: WhatIfDto): Promise<FitReport> {
    // A body the compiled check accepted is still the plain JSON parsed from the request (no copy needed); one that
    // took class-validator's run holds DTO instances, copied to plain JSON like any other engine input.
    const plain = input instanceof WhatIfDto ? jsonCopy(input) : input;
    const overrides: Partial<FitSettings> = { ...(await this.settings.overridesForPreview(user)), ...(plain.settings ?? {}) };
    return runFitCheck(plain.spec as FitSpec, overrides);
  }
}
