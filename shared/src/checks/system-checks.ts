import type { CheckDefinition } from './check-definition';

/** Checks that do not depend on where the engine sits: drivetrain, oiling, management, fuel, cooling, belt, cam. */
export const SYSTEM_CHECKS: CheckDefinition[] = [];
