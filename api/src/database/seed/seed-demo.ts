import * as bcrypt from 'bcryptjs';
import { DataSource } from 'typeorm';
import {
  DEMO_CUSTOMERS,
  DEMO_LABOR_OPERATIONS,
  DEMO_PASSWORD,
  DEMO_PROJECTS,
  DEMO_SHOP,
  DEMO_USERS,
} from '@swapwright/seed-data';
import { BCRYPT_ROUNDS } from '../../auth/auth.constants';
import { Customer } from '../../customers/customer.entity';
import { LaborOperation } from '../../labor-operations/labor-operation.entity';
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
    return 'loaded';
  });
}
