import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { DEMO_PROJECT_IDS } from '../demo-projects';
import { DEMO_ACCESSORY_DRIVE_IDS } from './demo-catalog';
import { DEMO_CATALOG_IDS as IDS } from './demo-catalog-ids';

export interface DemoFitSelection {
  projectId: string;
  oilPanId: string | null;
  oilPickupId: string | null;
  oilPumpId: string | null;
  controllerId: string | null;
  accessoryDriveId: string | null;
  /** Unset on the demo project: its report shows the mount offset first, then an adapter is chosen. */
  mountAdapterId: string | null;
  driveshaft: { outerDiameterMm: number; wallMm: number; material: 'steel' | 'aluminum' } | null;
  timingSetAdvanceDeg: number | null;
  topSpeedKph: number | null;
  tireDiameterMm: number | null;
  axleRatio: number | null;
  continuousPowerKw: number | null;
}

const goals = DEMO_FIT_SPEC.goals;

/** The Ridgeback starts on the Kestrel's stock front-sump pan, the one that meets the crossmember. */
export const DEMO_FIT_SELECTIONS: DemoFitSelection[] = [
  {
    projectId: DEMO_PROJECT_IDS.ridgeback,
    oilPanId: IDS.oilPans.kestrelStockFront,
    oilPickupId: IDS.oilPickups.kestrelFront,
    oilPumpId: IDS.oilPumps.kestrelStock,
    controllerId: IDS.controllers.tessaryT8,
    accessoryDriveId: DEMO_ACCESSORY_DRIVE_IDS.truck,
    mountAdapterId: null,
    driveshaft: { ...DEMO_FIT_SPEC.driveshaft! },
    timingSetAdvanceDeg: DEMO_FIT_SPEC.timingSetAdvanceDeg ?? 0,
    topSpeedKph: goals.topSpeedKph ?? null,
    tireDiameterMm: goals.tireDiameterMm ?? null,
    axleRatio: goals.axleRatio ?? null,
    continuousPowerKw: goals.continuousPowerKw ?? null,
  },
];
