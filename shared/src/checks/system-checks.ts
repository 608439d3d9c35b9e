import type { CheckDefinition } from './check-definition';

/** Drivetrain, oiling, management, fuel, cooling, belt and cam checks; each says whether it depends on placement. */
export const SYSTEM_CHECKS: CheckDefinition[] = [];
