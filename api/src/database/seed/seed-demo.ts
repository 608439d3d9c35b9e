import * as bcrypt from 'bcryptjs';
import { DataSource, EntityManager } from 'typeorm';
import {
  DEMO_CUSTOMERS,
  DEMO_LABOR_OPERATIONS,
  DEMO_MEASUREMENT_SHEETS,
  DEMO_PASSWORD,
  DEMO_PROJECTS,
  DEMO_SHOP,
  DEMO_USERS,
} from '@swapwright/seed-data';
import { BCRYPT_ROUNDS } from '../../auth/auth.constants';
import { Customer } from '../../customers/customer.entity';
import { LaborOperation } from '../../labor-operations/labor-operation.entity';
import { MeasurementSheet, MeasurementSheetEvent, MeasurementValue } from '../../measurements/measurement-sheet.entity';
import { Membership } from '../../memberships/membership.entity';
import { Project } from '../../projects/project.entity';
import { Shop } from '../../shops/shop.entity';
import { User } from '../../users/user.entity';

export type SeedResult = 'loaded' | 'already-present';

/** Loads the demo shop once (one transaction); a second run finds the shop and leaves everything as it is. */
export async function seedDemo(dataSource: DataSource): Promise<SeedResult> {
  return dataSource.transaction(async (manager) => {
    if (await manager.exists(Shop, { where: { id: DEMO_SHOP.id } })) return 'already-present';
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, BCRYPT_ROUNDS);
    await manager.insert(Shop, { ...DEMO_SHOP });
    await manager.insert(
      User,
      DEMO_USERS.map((user) => ({ id: user.id, email: user.email, name: user.name, passwordHash })),
    );
    await manager.insert(
      Membership,
      DEMO_USERS.map((user) => ({ id: user.membershipId, shopId: DEMO_SHOP.id, userId: user.id, role: user.role })),
    );
    await manager.insert(
      Customer,
      DEMO_CUSTOMERS.map((customer) => ({ ...customer, shopId: DEMO_SHOP.id })),
    );
    await manager.insert(
      Project,
      DEMO_PROJECTS.map((project) => ({
        id: project.id,
        shopId: DEMO_SHOP.id,
        customerId: project.customerId,
        title: project.title,
        status: project.status,
        vehicleDescription: project.vehicleDescription,
        chassisModelId: project.chassisModelId,
        engineProfileId: project.engineProfileId,
        transmissionId: project.transmissionId,
        goalUse: project.goals.use,
        goalTargetPowerKw: project.goals.targetPowerKw,
        goalRevLimitRpm: project.goals.revLimitRpm,
        goalBudgetCents: project.goals.budgetCents,
        placementSetbackMm: project.placement?.setbackMm ?? null,
        placementHeightMm: project.placement?.heightMm ?? null,
        placementTiltDeg: project.placement?.tiltDeg ?? null,
      })),
    );
    await manager.insert(
      LaborOperation,
      DEMO_LABOR_OPERATIONS.map((operation) => ({ ...operation, shopId: DEMO_SHOP.id })),
    );
    await seedDemoMeasurements(manager);
    return 'loaded';
  });
}

/** The demo truck's measurement sheet, started: its readings so far, each with its history line. */
async function seedDemoMeasurements(manager: EntityManager): Promise<void> {
  for (const [sheetIndex, sheet] of DEMO_MEASUREMENT_SHEETS.entries()) {
    const by = DEMO_USERS.find((user) => user.id === sheet.measuredById)!;
    await manager.insert(MeasurementSheet, { id: sheet.id, shopId: DEMO_SHOP.id, projectId: sheet.projectId, signedOffAt: null, signedOffById: null });
    const start = Date.parse(sheet.startedAt);
    const rows = sheet.values.map((reading, index) => ({
      reading,
      // fixed ids: one per reading and one per history line
      id: `5a0b1c2d-0000-4000-85${sheetIndex}1-${String(index + 1).padStart(12, '0')}`,
      eventId: `5a0b1c2d-0000-4000-85${sheetIndex}2-${String(index + 1).padStart(12, '0')}`,
      at: new Date(start + reading.minute * 60_000),
    }));
    await manager.insert(
      MeasurementValue,
      rows.map(({ reading, id, at }) => ({
        id,
        shopId: DEMO_SHOP.id,
        sheetId: sheet.id,
        pointId: reading.pointId,
        value: reading.value,
        tolerance: null,
        note: reading.note,
        measuredById: by.id,
        measuredByName: by.name,
        measuredAt: at,
      })),
    );
    await manager.insert(
      MeasurementSheetEvent,
      rows.map(({ reading, eventId, at }) => ({
        id: eventId,
        shopId: DEMO_SHOP.id,
        sheetId: sheet.id,
        kind: 'value' as const,
        pointId: reading.pointId,
        oldValue: null,
        newValue: reading.value,
        reason: null,
        byId: by.id,
        byName: by.name,
        at,
      })),
    );
  }
}
