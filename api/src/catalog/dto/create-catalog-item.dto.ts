import { ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { BELT_PROFILES } from '@swapwright/shared';
import { IsIn, IsOptional, ValidateNested } from 'class-validator';
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
  SerpentineBeltSpecDto,
  TransmissionSpecDto,
} from './part-spec.dto';

/** A catalog body is the shared part spec without its id: the server assigns the id and copies it into the spec. */
export class CreateEngineDto extends OmitType(EngineSpecDto, ['id'] as const) {}
export class CreateOilPanDto extends OmitType(OilPanSpecDto, ['id'] as const) {}
export class CreateOilPickupDto extends OmitType(OilPickupSpecDto, ['id'] as const) {}
export class CreateOilPumpDto extends OmitType(OilPumpSpecDto, ['id'] as const) {}
export class CreateTransmissionDto extends OmitType(TransmissionSpecDto, ['id'] as const) {}
export class CreateEngineControllerDto extends OmitType(EngineControllerSpecDto, ['id'] as const) {}
export class CreateMountAdapterDto extends OmitType(MountAdapterSpecDto, ['id'] as const) {}
export class CreateBellhousingAdapterDto extends OmitType(BellhousingAdapterSpecDto, ['id'] as const) {}

export class CreateChassisDto extends OmitType(ChassisSpecDto, ['id'] as const) {
  @ApiPropertyOptional({
    type: PlacementDto,
    nullable: true,
    description: 'Where the stock engine sat; used when a project has no placement of its own. Not part of the chassis spec.',
  })
  @IsOptional()
  @ValidateNested()
  @Type(() => PlacementDto)
  defaultPlacement?: PlacementDto | null;
}

/** The designation is computed from ribs and length; the profile defaults to PK, the only one the fit engine knows. */
export class CreateSerpentineBeltDto extends OmitType(SerpentineBeltSpecDto, ['id', 'designation', 'profile'] as const) {
  @ApiPropertyOptional({ enum: BELT_PROFILES, default: 'PK' })
  @IsOptional()
  @IsIn(BELT_PROFILES, { message: `profile must be one of: ${BELT_PROFILES.join(', ')}` })
  profile?: (typeof BELT_PROFILES)[number];
}
