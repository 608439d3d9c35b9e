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
  SerpentineBeltSpecDto,
  TransmissionSpecDto,
} from './part-spec.dto';

class CatalogItemFieldsDto {
  @ApiProperty({ format: 'uuid', description: 'Also the `id` inside `spec`' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class CatalogItemResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ description: 'The shared part spec, as the fit engine reads it' }) spec: object;
}

export class EngineResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: EngineSpecDto }) spec: EngineSpecDto;
}
export class OilPanResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: OilPanSpecDto }) spec: OilPanSpecDto;
}
export class OilPickupResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: OilPickupSpecDto }) spec: OilPickupSpecDto;
}
export class OilPumpResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: OilPumpSpecDto }) spec: OilPumpSpecDto;
}
export class TransmissionResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: TransmissionSpecDto }) spec: TransmissionSpecDto;
}
export class ChassisResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: ChassisSpecDto }) spec: ChassisSpecDto;
  @ApiProperty({ type: PlacementDto, nullable: true, description: 'Where the stock engine sat' })
  defaultPlacement: PlacementDto | null;
}
export class EngineControllerResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: EngineControllerSpecDto }) spec: EngineControllerSpecDto;
}
export class MountAdapterResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: MountAdapterSpecDto }) spec: MountAdapterSpecDto;
}
export class BellhousingAdapterResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: BellhousingAdapterSpecDto }) spec: BellhousingAdapterSpecDto;
}
export class SerpentineBeltResponseDto extends CatalogItemFieldsDto {
  @ApiProperty({ type: SerpentineBeltSpecDto }) spec: SerpentineBeltSpecDto;
}
