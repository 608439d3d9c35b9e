import { PartialType } from '@nestjs/swagger';
import {
  CreateBellhousingAdapterDto,
  CreateChassisDto,
  CreateEngineControllerDto,
  CreateEngineDto,
  CreateMountAdapterDto,
  CreateOilPanDto,
  CreateOilPickupDto,
  CreateOilPumpDto,
  CreateSerpentineBeltDto,
  CreateTransmissionDto,
} from './create-catalog-item.dto';

/** Top-level spec fields given here replace the stored ones whole (a new bottomProfile replaces the old one). */
export class UpdateEngineDto extends PartialType(CreateEngineDto) {}
export class UpdateOilPanDto extends PartialType(CreateOilPanDto) {}
export class UpdateOilPickupDto extends PartialType(CreateOilPickupDto) {}
export class UpdateOilPumpDto extends PartialType(CreateOilPumpDto) {}
export class UpdateTransmissionDto extends PartialType(CreateTransmissionDto) {}
export class UpdateChassisDto extends PartialType(CreateChassisDto) {}
export class UpdateEngineControllerDto extends PartialType(CreateEngineControllerDto) {}
export class UpdateMountAdapterDto extends PartialType(CreateMountAdapterDto) {}
export class UpdateBellhousingAdapterDto extends PartialType(CreateBellhousingAdapterDto) {}
export class UpdateSerpentineBeltDto extends PartialType(CreateSerpentineBeltDto) {}
