import { FitSelectionsResponseDto } from './dto/fit-selections.dto';
import type { ProjectSelections } from './fit-selections.service';

export function mapFitSelections({ projectId, row }: ProjectSelections): FitSelectionsResponseDto {
  const hasShaft = row !== null && row.driveshaftOuterDiameterMm !== null && row.driveshaftWallMm !== null;
  return {
    projectId,
    oilPanId: row?.oilPanId ?? null,
    oilPickupId: row?.oilPickupId ?? null,
    oilPumpId: row?.oilPumpId ?? null,
    controllerId: row?.controllerId ?? null,
    accessoryDriveId: row?.accessoryDriveId ?? null,
    mountAdapterId: row?.mountAdapterId ?? null,
    driveshaft: hasShaft
      ? {
          outerDiameterMm: row.driveshaftOuterDiameterMm!,
          wallMm: row.driveshaftWallMm!,
          material: row.driveshaftMaterial ?? 'steel',
          ...(row.driveshaftLengthMm !== null && { lengthMm: row.driveshaftLengthMm }),
          ...(row.driveshaftSuspensionGrowthMm !== null && { suspensionGrowthMm: row.driveshaftSuspensionGrowthMm }),
        }
      : null,
    timingSetAdvanceDeg: row?.timingSetAdvanceDeg ?? null,
    topSpeedKph: row?.topSpeedKph ?? null,
    tireDiameterMm: row?.tireDiameterMm ?? null,
    axleRatio: row?.axleRatio ?? null,
    continuousPowerKw: row?.continuousPowerKw ?? null,
    updatedAt: row?.updatedAt.toISOString() ?? null,
  };
}
