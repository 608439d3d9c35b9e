import type { ChassisObstacle } from '../../types/fit-spec';

/** The obstacle kinds below the pan, one check each. */
export const PAN_OBSTACLE_KINDS = {
  crossmember: ['crossmember'],
  steering: ['steering-linkage'],
  axle: ['axle-at-bump', 'differential-at-bump'],
} as const satisfies Record<string, readonly ChassisObstacle['kind'][]>;

/** One rule below the engine that any pan must keep: the check's id, its obstacle kinds and how they read in a sentence. */
export interface PanObstacleRule {
  id: string;
  kinds: readonly ChassisObstacle['kind'][];
  /** How the obstacle reads in a sentence, e.g. "the front crossmember". */
  label: string;
}

/** The below-pan checks, front to back: each check's definition and every judgement of a candidate pan read them from here. */
export const PAN_RULES = {
  crossmember: { id: 'envelope.sump-crossmember', kinds: PAN_OBSTACLE_KINDS.crossmember, label: 'the front crossmember' },
  steering: { id: 'envelope.sump-steering-linkage', kinds: PAN_OBSTACLE_KINDS.steering, label: 'the steering linkage' },
  axle: { id: 'envelope.sump-axle', kinds: PAN_OBSTACLE_KINDS.axle, label: 'the front axle at full bump' },
} as const satisfies Record<keyof typeof PAN_OBSTACLE_KINDS, PanObstacleRule>;

export const GROUND_CLEARANCE_ID = 'envelope.ground-clearance';
