import { DEMO_CATALOG, DEMO_FIT_SELECTIONS, DEMO_PROJECTS, DEMO_SHOP } from '@swapwright/seed-data';
import { generateMeasurementTemplate } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, In, IsNull } from 'typeorm';
import { CATALOG_KINDS, CatalogKind } from '../../catalog/catalog-kinds';
import { sampleCatalogRows } from '../../catalog/sample-catalog';
import { ProjectFitSelection } from '../../fit-reports/project-fit-selection.entity';
import { MeasurementTemplate } from '../../measurements/measurement-sheet.entity';
import { Project } from '../../projects/project.entity';

export interface CatalogSeedResult {
  inserted: number;
}

async function insertMissing(manager: EntityManager, kind: CatalogKind): Promise<number> {
  const definition = CATALOG_KINDS[kind];
  const rows = sampleCatalogRows(kind);
  const present = await manager.find(definition.entity, { select: { id: true }, where: { id: In(rows.map((row) => row.spec.id)) } });
  const known = new Set(present.map((row) => row.id));
  const missing = rows.filter((row) => !known.has(row.spec.id));
  if (missing.length === 0) return 0;
  await manager.insert(
    definition.entity,
    missing.map(({ spec, extras }) => ({
      id: spec.id,
      shopId: DEMO_SHOP.id,
      name: spec.name,
      spec,
      ...definition.columns(spec, extras),
    })),
  );
  return missing.length;
}

/**
 * Loads the demo shop's catalog and the demo projects' fit selections, by fixed ids: a second run inserts
 * nothing. Projects seeded before the catalog existed get their engine, chassis and transmission filled in
 * where they are still empty. Needs the demo shop (seedDemo) first.
 */
export async function seedCatalog(dataSource: DataSource): Promise<CatalogSeedResult> {
  return dataSource.transaction(async (manager) => {
    let inserted = 0;
    for (const kind of Object.keys(CATALOG_KINDS) as CatalogKind[]) inserted += await insertMissing(manager, kind);
    for (const project of DEMO_PROJECTS) {
      for (const field of ['engineProfileId', 'chassisModelId', 'transmissionId'] as const) {
        if (!project[field]) continue;
        await manager.update(Project, { id: project.id, shopId: DEMO_SHOP.id, [field]: IsNull() }, { [field]: project[field] });
      }
    }
    for (const selection of DEMO_FIT_SELECTIONS) {
      if (await manager.exists(ProjectFitSelection, { where: { projectId: selection.projectId } })) continue;
      if (!(await manager.exists(Project, { where: { id: selection.projectId, shopId: DEMO_SHOP.id } }))) continue;
      await manager.insert(ProjectFitSelection, {
        projectId: selection.projectId,
        shopId: DEMO_SHOP.id,
        oilPanId: selection.oilPanId,
        oilPickupId: selection.oilPickupId,
        oilPumpId: selection.oilPumpId,
        controllerId: selection.controllerId,
        accessoryDriveId: selection.accessoryDriveId,
        mountAdapterId: selection.mountAdapterId,
        driveshaftOuterDiameterMm: selection.driveshaft?.outerDiameterMm ?? null,
        driveshaftWallMm: selection.driveshaft?.wallMm ?? null,
        driveshaftMaterial: selection.driveshaft?.material ?? null,
        driveshaftLengthMm: null,
        driveshaftSuspensionGrowthMm: null,
        timingSetAdvanceDeg: selection.timingSetAdvanceDeg,
        topSpeedKph: selection.topSpeedKph,
        tireDiameterMm: selection.tireDiameterMm,
        axleRatio: selection.axleRatio,
        continuousPowerKw: selection.continuousPowerKw,
        updatedById: null,
      });
      inserted += 1;
    }
    // The demo chassis come with their measurement templates (generated from the catalog figures).
    for (const chassis of DEMO_CATALOG.chassis) {
      if (await manager.exists(MeasurementTemplate, { where: { shopId: DEMO_SHOP.id, chassisId: chassis.spec.id } })) continue;
      await manager.insert(MeasurementTemplate, {
        id: randomUUID(),
        shopId: DEMO_SHOP.id,
        chassisId: chassis.spec.id,
        points: generateMeasurementTemplate(chassis.spec),
        updatedById: null,
      });
      inserted += 1;
    }
    return { inserted };
  });
}
