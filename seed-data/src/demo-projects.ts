import { DEMO_CATALOG_IDS } from './catalog/demo-catalog-ids';
import { DEMO_CUSTOMER_IDS } from './demo-customers';

export type DemoProjectStatus = 'intake' | 'measured' | 'fit-checked' | 'parts-planned' | 'quote-sent' | 'approved' | 'deposit-paid' | 'in-the-bay' | 'done';
export type DemoProjectUse = 'street' | 'tow' | 'off-road' | 'strip';

export interface DemoProject {
  id: string;
  customerId: string;
  title: string;
  status: DemoProjectStatus;
  vehicleDescription: string;
  /** Catalog references (see catalog/demo-catalog-ids.ts). */
  chassisModelId: string | null;
  engineProfileId: string | null;
  transmissionId: string | null;
  goals: { use: DemoProjectUse; targetPowerKw: number | null; revLimitRpm: number | null; budgetCents: number | null };
  placement: { setbackMm: number; heightMm: number; tiltDeg: number } | null;
}

export const DEMO_PROJECT_IDS = {
  ridgeback: '5a0b1c2d-0000-4000-8000-000000000401',
  stag: '5a0b1c2d-0000-4000-8000-000000000402',
} as const;

export const DEMO_PROJECTS: DemoProject[] = [
  {
    id: DEMO_PROJECT_IDS.ridgeback,
    customerId: DEMO_CUSTOMER_IDS.juno,
    title: 'Harlan Ridgeback 1978: Kestrel 5.3 V8 swap',
    status: 'intake',
    vehicleDescription: 'Harlan Ridgeback 1978 half-ton pickup, long bed, original inline six removed; frame straight, light surface rust.',
    chassisModelId: DEMO_CATALOG_IDS.chassis.ridgeback78,
    engineProfileId: DEMO_CATALOG_IDS.engines.kestrel53,
    transmissionId: DEMO_CATALOG_IDS.transmissions.marlow45,
    goals: { use: 'street', targetPowerKw: 260, revLimitRpm: 6000, budgetCents: 1_450_000 },
    // The placement of the shared demo fit spec: here the stock front-sump pan meets the crossmember.
    placement: { setbackMm: 660, heightMm: 500, tiltDeg: 3 },
  },
  {
    id: DEMO_PROJECT_IDS.stag,
    customerId: DEMO_CUSTOMER_IDS.odile,
    title: 'Pellam Stag 1984 4x4: Kestrel 6.2 V8 for towing',
    status: 'intake',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4, tow package, leaf springs front and rear.',
    chassisModelId: DEMO_CATALOG_IDS.chassis.stag84,
    engineProfileId: DEMO_CATALOG_IDS.engines.kestrel62,
    transmissionId: DEMO_CATALOG_IDS.transmissions.marlow65,
    goals: { use: 'tow', targetPowerKw: 300, revLimitRpm: 5800, budgetCents: 2_200_000 },
    placement: null,
  },
];
