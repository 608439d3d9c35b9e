import { ApiProperty } from '@nestjs/swagger';
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
} from './part-spec.dto';

export class CatalogItemResponseDto {
  @ApiProperty({ format: 'uuid', description: 'Also the `id` inside `spec`' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'The shared part spec, as the fit engine reads it' }) spec: object;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class EngineResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: EngineSpecDto }) spec: EngineSpecDto;
}
export class OilPanResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: OilPanSpecDto }) spec: OilPanSpecDto;
}
export class OilPickupResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: OilPickupSpecDto }) spec: OilPickupSpecDto;
}
export class OilPumpResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: OilPumpSpecDto }) spec: OilPumpSpecDto;
}
export class TransmissionResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: TransmissionSpecDto }) spec: TransmissionSpecDto;
}
export class ChassisResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: ChassisSpecDto }) spec: ChassisSpecDto;
  @ApiProperty({ type: PlacementDto, nullable: true, description: 'Where the stock engine sat' })
  defaultPlacement: PlacementDto | null;
}
export class EngineControllerResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: EngineControllerSpecDto }) spec: EngineControllerSpecDto;
}
export class MountAdapterResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: MountAdapterSpecDto }) spec: MountAdapterSpecDto;
}
export class BellhousingAdapterResponseDto extends CatalogItemResponseDto {
  @ApiProperty({ type: BellhousingAdapterSpecDto }) spec: BellhousingAdapterSpecDto;
}
