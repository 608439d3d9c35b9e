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

/**
 * The Ridgeback starts on the Kestrel's stock front-sump pan, the one that meets the crossmember. The Stag is at
 * intake: no parts chosen yet, only the figures of how it is driven. A tow rig on 800 mm (31.5 in) tyres with a
 * 4.10 axle at 120 km/h (75 mph) turns its driveshaft about 3,260 rpm (Derived: wheel rpm × axle ratio), where
 * published driveline-maker guidance allows about 5.4° of U-joint angle; without these figures the engine
 * could only assume the rev limit in overdrive (about 8,660 rpm), far past any tow rig's driving.
 */
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
  {
    projectId: DEMO_PROJECT_IDS.stag,
    // No parts chosen yet.
    oilPanId: null, oilPickupId: null, oilPumpId: null, controllerId: null, accessoryDriveId: null, mountAdapterId: null,
    // A 3.5 in × 0.083 in steel tube, the usual size for a three-quarter-ton truck.
    driveshaft: { outerDiameterMm: 88.9, wallMm: 2.1, material: 'steel' },
    timingSetAdvanceDeg: null,
    topSpeedKph: 120,
    tireDiameterMm: 800,
    axleRatio: 4.1,
    continuousPowerKw: 180,
  },
];
