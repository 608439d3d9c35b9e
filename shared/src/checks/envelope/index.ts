import type { CheckDefinition } from '../check-definition';
import { FAN_RADIATOR_CHECK } from './fan-radiator';
import { GROUND_CLEARANCE_CHECK } from './ground-clearance';
import { HEADS_FIREWALL_CHECK } from './heads-firewall';
import { HOOD_CHECK } from './hood';
import { RAIL_WIDTH_CHECK } from './rail-width';
import { STEERING_BOX_CHECK } from './steering-box';
import { PAN_CHECKS } from './pan-checks';
import { SUMP_AXLE_CHECK } from './sump-axle';
import { SUMP_CROSSMEMBER_CHECK } from './sump-crossmember';
import { SUMP_STEERING_CHECK } from './sump-steering-linkage';
import { TRANSMISSION_TUNNEL_CHECK } from './transmission-tunnel';

/** The clearance checks: every one is geometric and bounds the fit window. */
export const ENVELOPE_CHECKS: CheckDefinition[] = [
  ...PAN_CHECKS,
  GROUND_CLEARANCE_CHECK,
  HOOD_CHECK,
  FAN_RADIATOR_CHECK,
  HEADS_FIREWALL_CHECK,
  TRANSMISSION_TUNNEL_CHECK,
  RAIL_WIDTH_CHECK,
  STEERING_BOX_CHECK,
];

export {
  FAN_RADIATOR_CHECK,
  GROUND_CLEARANCE_CHECK,
  HEADS_FIREWALL_CHECK,
  HOOD_CHECK,
  RAIL_WIDTH_CHECK,
  STEERING_BOX_CHECK,
  SUMP_AXLE_CHECK,
  SUMP_CROSSMEMBER_CHECK,
  SUMP_STEERING_CHECK,
  TRANSMISSION_TUNNEL_CHECK,
};
