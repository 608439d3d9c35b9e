import type { PanCheckDefinition } from './pan-clearance';
import { SUMP_AXLE_CHECK } from './sump-axle';
import { SUMP_CROSSMEMBER_CHECK } from './sump-crossmember';
import { SUMP_STEERING_CHECK } from './sump-steering-linkage';

/** The checks of the pan against what sits below it, one per obstacle group, front to back. */
export const PAN_CHECKS: readonly PanCheckDefinition[] = [SUMP_CROSSMEMBER_CHECK, SUMP_STEERING_CHECK, SUMP_AXLE_CHECK];

/** Their ids, for code that treats every pan check alike (drawings, the side view's sources). */
export const PAN_CHECK_IDS: readonly string[] = PAN_CHECKS.map((check) => check.id);
