import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { EngineSpec } from '@swapwright/shared';
import { DataSource, Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { AuthUser } from '../common/tenant/auth-user';
import { Project } from '../projects/project.entity';
import { ProjectsService } from '../projects/projects.service';
import { PatchFitSelectionsDto, UpdateFitSelectionsDto } from './dto/fit-selections.dto';
import { FitReportErrors } from './fit-reports.errors';
import { ProjectFitSelection } from './project-fit-selection.entity';

const PART_FIELDS: Array<{ field: 'oilPanId' | 'oilPickupId' | 'oilPumpId' | 'controllerId' | 'mountAdapterId'; kind: CatalogKind; words: string }> = [
  { field: 'oilPanId', kind: 'oil-pans', words: 'oil pan' },
  { field: 'oilPickupId', kind: 'oil-pickups', words: 'oil pickup' },
  { field: 'oilPumpId', kind: 'oil-pumps', words: 'oil pump' },
  { field: 'controllerId', kind: 'controllers', words: 'engine controller' },
  { field: 'mountAdapterId', kind: 'mount-adapters', words: 'mount adapter' },
];

/** A project's selections: the stored row, or null before they are first saved. */
export interface ProjectSelections {
  projectId: string;
  row: ProjectFitSelection | null;
}

type SelectionColumns = Omit<ProjectFitSelection, 'projectId' | 'shopId' | 'createdAt' | 'updatedAt' | 'updatedById'>;

/** The columns a request body sets; a field left out (undefined) sets nothing, `null` clears. */
export function selectionColumns(input: UpdateFitSelectionsDto): Partial<SelectionColumns> {
  const columns: Partial<SelectionColumns> = {};
  for (const { field } of PART_FIELDS) {
    const value = input[field];
    if (value !== undefined) columns[field] = value?.toLowerCase() ?? null;
  }
  if (input.accessoryDriveId !== undefined) columns.accessoryDriveId = input.accessoryDriveId;
  if (input.driveshaft !== undefined) {
    const shaft = input.driveshaft;
    columns.driveshaftOuterDiameterMm = shaft?.outerDiameterMm ?? null;
    columns.driveshaftWallMm = shaft?.wallMm ?? null;
    columns.driveshaftMaterial = shaft?.material ?? null;
    columns.driveshaftLengthMm = shaft?.lengthMm ?? null;
    columns.driveshaftSuspensionGrowthMm = shaft?.suspensionGrowthMm ?? null;
  }
  for (const field of ['timingSetAdvanceDeg', 'topSpeedKph', 'tireDiameterMm', 'axleRatio', 'continuousPowerKw'] as const) {
    if (input[field] !== undefined) columns[field] = input[field];
  }
  return columns;
}

/** Every selection column cleared: what PUT starts from. */
const CLEARED: SelectionColumns = {
  oilPanId: null,
  oilPickupId: null,
  oilPumpId: null,
  controllerId: null,
  accessoryDriveId: null,
  mountAdapterId: null,
  driveshaftOuterDiameterMm: null,
  driveshaftWallMm: null,
  driveshaftMaterial: null,
  driveshaftLengthMm: null,
  driveshaftSuspensionGrowthMm: null,
  timingSetAdvanceDeg: null,
  topSpeedKph: null,
  tireDiameterMm: null,
  axleRatio: null,
  continuousPowerKw: null,
};

@Injectable()
export class FitSelectionsService {
  constructor(
    @InjectRepository(ProjectFitSelection) private readonly selections: Repository<ProjectFitSelection>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly projects: ProjectsService,
    private readonly catalog: CatalogService,
  ) {}

  async get(user: AuthUser, projectId: string): Promise<ProjectSelections> {
    const project = await this.projects.get(user, projectId);
    const row = await this.selections.findOne({ where: { projectId: project.id, shopId: user.shopId } });
    return { projectId: project.id, row };
  }

  /** Replaces the whole selection: a field left out is cleared. */
  async replace(user: AuthUser, projectId: string, input: UpdateFitSelectionsDto): Promise<ProjectSelections> {
    const project = await this.projects.get(user, projectId);
    await this.assertValid(user, project, input);
    await this.selections.upsert(
      { projectId: project.id, shopId: user.shopId, ...CLEARED, ...selectionColumns(input), updatedById: user.userId },
      ['projectId'],
    );
    return this.get(user, project.id);
  }

  /**
   * Changes only the fields given, merged into the stored row under a row lock (SELECT … FOR UPDATE), so two quick
   * edits of different fields both stay.
   */
  async patch(user: AuthUser, projectId: string, input: PatchFitSelectionsDto): Promise<ProjectSelections> {
    const project = await this.projects.get(user, projectId);
    await this.assertValid(user, project, input);
    const changes = selectionColumns(input);
    await this.dataSource.transaction(async (manager) => {
      // The row exists from here on; ON DUPLICATE KEY takes an exclusive lock on an existing row (INSERT IGNORE
      // would take a shared one, and two of those upgrading at once deadlock).
      await manager
        .createQueryBuilder()
        .insert()
        .into(ProjectFitSelection)
        .values({ projectId: project.id, shopId: user.shopId, ...CLEARED, updatedById: user.userId })
        .orUpdate(['projectId'], ['projectId'])
        .execute();
      const row = await manager
        .createQueryBuilder(ProjectFitSelection, 'selection')
        .setLock('pessimistic_write')
        .where('selection.projectId = :projectId AND selection.shopId = :shopId', { projectId: project.id, shopId: user.shopId })
        .getOneOrFail();
      await manager.update(
        ProjectFitSelection,
        { projectId: row.projectId, shopId: user.shopId },
        { ...changes, updatedById: user.userId },
      );
    });
    return this.get(user, project.id);
  }

  /** The part ids given are rows of the shop's catalog; the accessory drive is one of the project's engine. */
  private async assertValid(user: AuthUser, project: Project, input: UpdateFitSelectionsDto): Promise<void> {
    const problems: string[] = [];
    for (const { field, kind, words } of PART_FIELDS) {
      const id = input[field]?.toLowerCase();
      if (!id) continue;
      const found = await this.catalog.existing(kind, user, [id]);
      if (!found.has(id)) problems.push(`${field}: there is no ${words} with this id in your shop's catalog`);
    }
    if (input.accessoryDriveId) {
      const engine = await this.catalog.findSpec<EngineSpec>('engines', user, project.engineProfileId);
      if (engine && !engine.accessoryDrives.some((drive) => drive.id === input.accessoryDriveId)) {
        const known = engine.accessoryDrives.map((drive) => drive.id);
        problems.push(
          `accessoryDriveId: the project's engine has no accessory drive "${input.accessoryDriveId}"${
            known.length > 0 ? ` (it has: ${known.join(', ')})` : ' (it lists none)'
          }`,
        );
      }
    }
    if (problems.length > 0) throw FitReportErrors.badSelection(problems);
  }
}
