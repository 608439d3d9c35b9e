import type { CheckDefinition } from './check-definition';
import { SERPENTINE_BELT_CHECK } from './belt/serpentine-belt';
import { CAM_TIMING_CHECK } from './cam/cam-timing';
import { HOSE_SIDES_CHECK } from './cooling/hose-sides';
import { RADIATOR_CAPACITY_CHECK } from './cooling/radiator-capacity';
import { BELLHOUSING_PATTERN_CHECK } from './drivetrain/bellhousing-pattern';
import { CRITICAL_SPEED_CHECK } from './drivetrain/critical-speed';
import { DRIVESHAFT_LENGTH_CHECK } from './drivetrain/driveshaft-length';
import { U_JOINT_ANGLES_CHECK } from './drivetrain/u-joint-angles';
import { FUEL_SYSTEM_PRESSURE_CHECK } from './fuel/fuel-pressure';
import { FUEL_PUMP_FLOW_CHECK } from './fuel/fuel-pump-flow';
import { INJECTOR_SIZE_CHECK } from './fuel/injector-size';
import { CYLINDER_COUNT_CHECK } from './management/cylinder-count';
import { CAM_SIGNAL_CHECK, CRANK_SIGNAL_CHECK } from './management/sensor-signals';
import { THROTTLE_CHECK } from './management/throttle';
import { DIPSTICK_CHECK } from './oiling/dipstick';
import { PAN_PICKUP_PUMP_CHECK } from './oiling/pan-pickup-pump';
import { PICKUP_SCREEN_CHECK } from './oiling/pickup-screen';
import { OIL_PUMP_SPEED_CHECK } from './oiling/pump-speed';

/** Drivetrain, oiling, management, fuel, cooling, belt and cam checks; each says whether it depends on placement. */
export const SYSTEM_CHECKS: CheckDefinition[] = [
  BELLHOUSING_PATTERN_CHECK,
  DRIVESHAFT_LENGTH_CHECK,
  U_JOINT_ANGLES_CHECK,
  CRITICAL_SPEED_CHECK,
  PAN_PICKUP_PUMP_CHECK,
  PICKUP_SCREEN_CHECK,
  OIL_PUMP_SPEED_CHECK,
  DIPSTICK_CHECK,
  CRANK_SIGNAL_CHECK,
  CAM_SIGNAL_CHECK,
  THROTTLE_CHECK,
  CYLINDER_COUNT_CHECK,
  INJECTOR_SIZE_CHECK,
  FUEL_PUMP_FLOW_CHECK,
  FUEL_SYSTEM_PRESSURE_CHECK,
  RADIATOR_CAPACITY_CHECK,
  HOSE_SIDES_CHECK,
  SERPENTINE_BELT_CHECK,
  CAM_TIMING_CHECK,
];
