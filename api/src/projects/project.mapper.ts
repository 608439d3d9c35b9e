import { AuthUser } from '../common/tenant/auth-user';
import { isOwnCustomerRecord } from '../customers/customer.mapper';
import { ProjectResponseDto } from './dto/project-response.dto';
import { Project } from './project.entity';

/**
 * Whether the project is the member's own truck: filed under their own customer record ("My own truck"). A quote of it
 * is their budget, with nobody to send it to. A customer signed in to their own project is not a member building it.
 */
export function isOwnProject(project: Project, user: Pick<AuthUser, 'role' | 'userId'>): boolean {
  return user.role !== 'customer' && project.customer != null && isOwnCustomerRecord(project.customer, user);
}

export function mapProject(project: Project, viewer: Pick<AuthUser, 'role' | 'userId'>): ProjectResponseDto {
  const hasPlacement =
    project.placementSetbackMm !== null && project.placementHeightMm !== null && project.placementTiltDeg !== null;
  return {
    id: project.id,
    title: project.title,
    status: project.status,
    customerId: project.customerId,
    customer: { id: project.customerId, name: project.customer?.name ?? '' },
    forMyself: isOwnProject(project, viewer),
    vehicleDescription: project.vehicleDescription,
    chassisModelId: project.chassisModelId,
    engineProfileId: project.engineProfileId,
    transmissionId: project.transmissionId,
    goals: {
      use: project.goalUse,
      targetPowerKw: project.goalTargetPowerKw,
      revLimitRpm: project.goalRevLimitRpm,
      budgetCents: project.goalBudgetCents,
    },
    placement: hasPlacement
      ? { setbackMm: project.placementSetbackMm!, heightMm: project.placementHeightMm!, tiltDeg: project.placementTiltDeg! }
      : null,
    createdAt: project.createdAt.toISOString(),
    updatedAt: project.updatedAt.toISOString(),
  };
}
