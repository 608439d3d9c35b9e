import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { EngineSpec } from '@swapwright/shared';
import { Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { CatalogKind } from '../catalog/catalog-kinds';
import { AuthUser } from '../common/tenant/auth-user';
import { ProjectsService } from '../projects/projects.service';
import { UpdateFitSelectionsDto } from './dto/fit-selections.dto';
import { FitSelectionsResponseDto } from './dto/fit-selections.dto';
import { mapFitSelections } from './fit-selection.mapper';
import { FitReportErrors } from './fit-reports.errors';
import { ProjectFitSelection } from './project-fit-selection.entity';

const PART_FIELDS: Array<{ field: 'oilPanId' | 'oilPickupId' | 'oilPumpId' | 'controllerId' | 'mountAdapterId'; kind: CatalogKind; words: string }> = [
  { field: 'oilPanId', kind: 'oil-pans', words: 'oil pan' },
  { field: 'oilPickupId', kind: 'oil-pickups', words: 'oil pickup' },
  { field: 'oilPumpId', kind: 'oil-pumps', words: 'oil pump' },
  { field: 'controllerId', kind: 'controllers', words: 'engine controller' },
  { field: 'mountAdapterId', kind: 'mount-adapters', words: 'mount adapter' },
];

@Injectable()
export class FitSelectionsService {
  constructor(
    @InjectRepository(ProjectFitSelection) private readonly selections: Repository<ProjectFitSelection>,
    private readonly projects: ProjectsService,
    private readonly catalog: CatalogService,
  ) {}

  async get(user: AuthUser, projectId: string): Promise<FitSelectionsResponseDto> {
    const project = await this.projects.get(user, projectId);
    const row = await this.selections.findOne({ where: { projectId: project.id, shopId: user.shopId } });
    return mapFitSelections(project.id, row);
  }

  async replace(user: AuthUser, projectId: string, input: UpdateFitSelectionsDto): Promise<FitSelectionsResponseDto> {
    const project = await this.projects.get(user, projectId);
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
    await this.selections.upsert(
      {
        projectId: project.id,
        shopId: user.shopId,
        oilPanId: input.oilPanId?.toLowerCase() ?? null,
        oilPickupId: input.oilPickupId?.toLowerCase() ?? null,
        oilPumpId: input.oilPumpId?.toLowerCase() ?? null,
        controllerId: input.controllerId?.toLowerCase() ?? null,
        accessoryDriveId: input.accessoryDriveId ?? null,
        mountAdapterId: input.mountAdapterId?.toLowerCase() ?? null,
        driveshaftOuterDiameterMm: input.driveshaft?.outerDiameterMm ?? null,
        driveshaftWallMm: input.driveshaft?.wallMm ?? null,
        driveshaftMaterial: input.driveshaft?.material ?? null,
        driveshaftLengthMm: input.driveshaft?.lengthMm ?? null,
        driveshaftSuspensionGrowthMm: input.driveshaft?.suspensionGrowthMm ?? null,
        timingSetAdvanceDeg: input.timingSetAdvanceDeg ?? null,
        topSpeedKph: input.topSpeedKph ?? null,
        tireDiameterMm: input.tireDiameterMm ?? null,
        axleRatio: input.axleRatio ?? null,
        continuousPowerKw: input.continuousPowerKw ?? null,
        updatedById: user.userId,
      },
      ['projectId'],
    );
    return this.get(user, project.id);
  }
}
