import { DEMO_CUSTOMER_IDS } from './demo-customers';

export type DemoProjectStatus = 'intake' | 'measuring' | 'checking' | 'quoting' | 'approved' | 'building' | 'done';
export type DemoProjectUse = 'street' | 'tow' | 'off-road' | 'strip';

export interface DemoProject {
  id: string;
  customerId: string;
  title: string;
  status: DemoProjectStatus;
  vehicleDescription: string;
  /** Catalog references: filled in once the demo catalog has fixed ids of its own. */
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
    status: 'measuring',
    vehicleDescription: 'Harlan Ridgeback 1978 half-ton pickup, long bed, original inline six removed; frame straight, light surface rust.',
    chassisModelId: null,
    engineProfileId: null,
    transmissionId: null,
    goals: { use: 'street', targetPowerKw: 260, revLimitRpm: 6000, budgetCents: 1_450_000 },
    placement: { setbackMm: 540, heightMm: 610, tiltDeg: 3 },
  },
  {
    id: DEMO_PROJECT_IDS.stag,
    customerId: DEMO_CUSTOMER_IDS.odile,
    title: 'Pellam Stag 1984 4x4: Kestrel 6.2 V8 for towing',
    status: 'intake',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4, tow package, leaf springs front and rear.',
    chassisModelId: null,
    engineProfileId: null,
    transmissionId: null,
    goals: { use: 'tow', targetPowerKw: 300, revLimitRpm: 5800, budgetCents: 2_200_000 },
    placement: null,
  },
];
