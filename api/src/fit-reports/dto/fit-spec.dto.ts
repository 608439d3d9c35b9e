import { DRIVESHAFT_MATERIALS, type DriveshaftSpec, type FitSpec, type SwapGoals } from '@swapwright/shared';
import {
  BellhousingAdapterSpecDto,
  ChassisSpecDto,
  EngineControllerSpecDto,
  EngineSpecDto,
  MountAdapterSpecDto,
  OilPanSpecDto,
  OilPickupSpecDto,
  OilPumpSpecDto,
  PlacementDto,
  TransmissionSpecDto,
} from '../../catalog/dto/part-spec.dto';
import {
  Nested,
  NumberIn,
  NumberList,
  OneOf,
  OptionalNested,
  OptionalNestedList,
  OptionalNumberIn,
  OptionalText,
} from '../../catalog/dto/spec-validators';

export const SWAP_USES = ['street', 'tow', 'off-road', 'strip'] as const;

export class DriveshaftSpecDto implements DriveshaftSpec {
  @NumberIn(25, 200) outerDiameterMm: number;
  @NumberIn(0.5, 15) wallMm: number;
  @OneOf(DRIVESHAFT_MATERIALS) material: (typeof DRIVESHAFT_MATERIALS)[number];
  @OptionalNumberIn(100, 3000, 'An existing shaft to reuse, U-joint centre to centre') lengthMm?: number;
  @OptionalNumberIn(0, 300, 'Output-to-pinion growth from ride height to full droop') suspensionGrowthMm?: number;
}

export class SwapGoalsDto implements SwapGoals {
  @OneOf(SWAP_USES) use: (typeof SWAP_USES)[number];
  @NumberIn(1, 2000) targetPowerKw: number;
  @OptionalNumberIn(1, 2000, 'Power held for long periods; the radiator is sized for this') continuousPowerKw?: number;
  @OptionalNumberIn(500, 12000, 'The planned rev limit; without it the oil pump and driveshaft speed checks are not checked') revLimitRpm?: number;
  @OptionalNumberIn(10, 400) topSpeedKph?: number;
  @OptionalNumberIn(300, 1600) tireDiameterMm?: number;
  @OptionalNumberIn(1, 8) axleRatio?: number;
}

export class FitCandidatesDto {
  @OptionalNestedList(() => OilPanSpecDto, 0, 200) oilPans?: OilPanSpecDto[];
  @OptionalNestedList(() => OilPickupSpecDto, 0, 200) oilPickups?: OilPickupSpecDto[];
  @OptionalNestedList(() => OilPumpSpecDto, 0, 200) oilPumps?: OilPumpSpecDto[];
  @OptionalNestedList(() => MountAdapterSpecDto, 0, 200) mountAdapters?: MountAdapterSpecDto[];
  @OptionalNestedList(() => BellhousingAdapterSpecDto, 0, 200) bellhousingAdapters?: BellhousingAdapterSpecDto[];
  @OptionalNestedList(() => EngineControllerSpecDto, 0, 200) controllers?: EngineControllerSpecDto[];
  @NumberList(0, 200, 300, 5000, 'Stock belt lengths the shop can get, millimetres') stockBeltLengthsMm?: number[];
}

/** The fit engine's whole input (shared FitSpec), validated field by field. See docs/fit-spec.md. */
export class FitSpecDto implements FitSpec {
  @Nested(() => EngineSpecDto) engine: EngineSpecDto;
  @OptionalText(40, 'One of engine.accessoryDrives[].id') accessoryDriveId?: string;
  @OptionalText(40, 'One of candidates.mountAdapters[].id: the adapter chosen for both sides') mountAdapterId?: string;
  @OptionalNested(() => OilPanSpecDto) oilPan?: OilPanSpecDto;
  @OptionalNested(() => OilPickupSpecDto) oilPickup?: OilPickupSpecDto;
  @OptionalNested(() => OilPumpSpecDto) oilPump?: OilPumpSpecDto;
  @OptionalNested(() => TransmissionSpecDto) transmission?: TransmissionSpecDto;
  @Nested(() => ChassisSpecDto) chassis: ChassisSpecDto;
  @OptionalNested(() => EngineControllerSpecDto) controller?: EngineControllerSpecDto;
  @OptionalNested(() => DriveshaftSpecDto) driveshaft?: DriveshaftSpecDto;
  @OptionalNumberIn(-20, 20, 'Degrees the cam is set advanced at the timing set (0 = marks aligned)') timingSetAdvanceDeg?: number;
  @Nested(() => PlacementDto) placement: PlacementDto;
  @Nested(() => SwapGoalsDto) goals: SwapGoalsDto;
  @OptionalNested(() => FitCandidatesDto, 'Catalog parts the engine may name in remedies') candidates?: FitCandidatesDto;
}
