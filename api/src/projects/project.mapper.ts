import { ProjectResponseDto } from './dto/project-response.dto';
import { Project } from './project.entity';

export function mapProject(project: Project): ProjectResponseDto {
  const hasPlacement =
    project.placementSetbackMm !== null && project.placementHeightMm !== null && project.placementTiltDeg !== null;
  return {
    id: project.id,
    title: project.title,
    status: project.status,
    customerId: project.customerId,
    customer: { id: project.customerId, name: project.customer?.name ?? '' },
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
