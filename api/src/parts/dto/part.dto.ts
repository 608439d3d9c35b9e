import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { PART_CATEGORIES, TORQUE_JOINT_PATTERN, type CatalogPartCategory } from '@swapwright/shared';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../../common/decorators/trim.decorator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';

export const FIT_KINDS = ['engines', 'transmissions', 'oil-pans', 'oil-pickups', 'oil-pumps', 'controllers', 'mount-adapters', 'bellhousing-adapters', 'belts'] as const;
/** Letters, digits and - _ . / only: a SKU is typed at the counter and printed on pick lists. */
export const SKU_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._/-]*$/;
export const MAX_PRICE_CENTS = 100_000_000;

export class TorqueSpecDto {
  @ApiPropertyOptional({ maxLength: 60, example: 'oil-pan-to-block', description: "The stable name of the joint it tightens (lower-case words joined by hyphens, e.g. oil-pan-to-block): a work order gives each joint one figure, a part's own before an operation's." })
  @IsOptional()
  @IsString()
  @MaxLength(60)
  @Matches(TORQUE_JOINT_PATTERN, { message: 'joint must be lower-case words joined by hyphens, e.g. oil-pan-to-block' })
  joint?: string;

  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(120)
  fastener: string;

  @ApiProperty({ minimum: 0, maximum: 5000, description: 'Tightening torque, N·m.' })
  @IsNumber()
  @Min(0)
  @Max(5000)
  newtonMetres: number;

  @ApiPropertyOptional({ maxLength: 240, description: 'Tightening sequence or angle steps.' })
  @IsOptional()
  @IsString()
  @MaxLength(240)
  sequence?: string;
}

export class CreatePartDto {
  @ApiProperty({ maxLength: 64, example: 'TR-4410' })
  @Trim()
  @IsString()
  @Matches(SKU_PATTERN, { message: 'sku may hold letters, digits and - _ . / only, and starts with a letter or digit' })
  @MaxLength(64)
  sku: string;

  @ApiProperty({ maxLength: 240 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(240)
  description: string;

  @ApiProperty({ enum: PART_CATEGORIES })
  @IsIn(PART_CATEGORIES, { message: `category must be one of: ${PART_CATEGORIES.join(', ')}` })
  category: CatalogPartCategory;

  @ApiProperty({ minimum: 0, maximum: MAX_PRICE_CENTS, description: 'Selling price, integer cents.' })
  @IsInt({ message: 'priceCents must be a whole number of cents' })
  @Min(0)
  @Max(MAX_PRICE_CENTS)
  priceCents: number;

  @ApiPropertyOptional({ minimum: 0, maximum: MAX_PRICE_CENTS, description: 'What the shop pays, integer cents.' })
  @IsOptional()
  @IsInt({ message: 'costCents must be a whole number of cents' })
  @Min(0)
  @Max(MAX_PRICE_CENTS)
  costCents?: number;

  @ApiPropertyOptional({ type: String, format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID()
  supplierId?: string | null;

  @ApiPropertyOptional({ type: String, maxLength: 64, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(64)
  supplierSku?: string | null;

  @ApiPropertyOptional({ minimum: 0, maximum: 500, description: 'Install labor, hours to a tenth.' })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'laborHours must be hours to a tenth' })
  @Min(0)
  @Max(500)
  laborHours?: number;

  @ApiPropertyOptional({ type: [TorqueSpecDto] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(50)
  @ValidateNested({ each: true })
  @Type(() => TorqueSpecDto)
  torqueSpecs?: TorqueSpecDto[];

  @ApiPropertyOptional({ type: String, maxLength: 4000, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(4000)
  instructions?: string | null;

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { oneOf: [{ type: 'string' }, { type: 'number' }, { type: 'boolean' }, { type: 'array', items: { type: 'string' } }] },
    description: 'Fitment attributes: sumpPosition, pickupMount, pumpInlet, railPattern, location (dipstick), crankSignals, camSignals, flowLph, pressurePsi, ratedKw, inletSide, outletSide, type, fabricationHours, ...',
  })
  @IsOptional()
  @IsObject()
  attributes?: Record<string, string | number | boolean | string[]>;

  @ApiPropertyOptional({ type: [String], description: 'SKUs: this part needs one of them as well.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(64, { each: true })
  requiresSkus?: string[];

  @ApiPropertyOptional({ type: [String], description: 'SKUs that may not be used with this part.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(64, { each: true })
  excludesSkus?: string[];

  @ApiPropertyOptional({ type: [String], description: 'SKUs this part supersedes.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(64, { each: true })
  replacesSkus?: string[];

  @ApiPropertyOptional({ enum: FIT_KINDS, nullable: true, description: 'The catalog kind of the fit spec this part carries.' })
  @IsOptional()
  @IsIn(FIT_KINDS)
  fitKind?: (typeof FIT_KINDS)[number] | null;

  @ApiPropertyOptional({ type: String, format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID()
  fitSpecId?: string | null;
}

export class UpdatePartDto extends PartialType(CreatePartDto) {}

export const PART_SORTS = ['sku', 'description', 'category', 'priceCents', 'updatedAt'] as const;

export class ListPartsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: PART_SORTS })
  @IsOptional()
  @IsIn(PART_SORTS)
  sort?: (typeof PART_SORTS)[number];

  @ApiPropertyOptional({ enum: PART_CATEGORIES })
  @IsOptional()
  @IsIn(PART_CATEGORIES, { message: `category must be one of: ${PART_CATEGORIES.join(', ')}` })
  category?: CatalogPartCategory;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID()
  supplierId?: string;

  @ApiPropertyOptional({ description: 'Only parts with units free to reserve.' })
  @IsOptional()
  @Type(() => Boolean)
  @IsBoolean()
  inStock?: boolean;
}

export class SetStockDto {
  @ApiProperty({ maxLength: 60, example: 'Main store' })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(60)
  location: string;

  @ApiPropertyOptional({ maxLength: 40, example: 'A-03-2' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  bin?: string;

  @ApiProperty({ minimum: 0, maximum: 1_000_000 })
  @IsInt()
  @Min(0)
  @Max(1_000_000)
  onHand: number;
}

export class StockResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() location: string;
  @ApiProperty() bin: string;
  @ApiProperty() onHand: number;
  @ApiProperty() reserved: number;
  @ApiProperty() available: number;
}

export class PartResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty({ enum: PART_CATEGORIES }) category: CatalogPartCategory;
  @ApiProperty() priceCents: number;
  @ApiProperty() costCents: number;
  @ApiProperty({ nullable: true, type: String }) supplierId: string | null;
  @ApiProperty({ nullable: true, type: String }) supplierName: string | null;
  @ApiProperty({ nullable: true, type: String }) supplierSku: string | null;
  @ApiProperty() laborHours: number;
  @ApiProperty({ type: [TorqueSpecDto] }) torqueSpecs: TorqueSpecDto[];
  @ApiProperty({ nullable: true, type: String }) instructions: string | null;
  @ApiProperty({ type: 'object', additionalProperties: true }) attributes: Record<string, unknown>;
  @ApiProperty({ type: [String] }) requiresSkus: string[];
  @ApiProperty({ type: [String] }) excludesSkus: string[];
  @ApiProperty({ type: [String] }) replacesSkus: string[];
  @ApiProperty({ nullable: true, enum: FIT_KINDS }) fitKind: string | null;
  @ApiProperty({ nullable: true, type: String }) fitSpecId: string | null;
  @ApiProperty({ type: [StockResponseDto] }) stock: StockResponseDto[];
  @ApiProperty() onHand: number;
  @ApiProperty() available: number;
  @ApiProperty() updatedAt: string;
}

export class CreateSupplierDto {
  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(120)
  name: string;

  @ApiPropertyOptional({ type: String, maxLength: 120, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  contact?: string | null;

  @ApiPropertyOptional({ type: String, maxLength: 254, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(254)
  email?: string | null;

  @ApiPropertyOptional({ type: String, maxLength: 40, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  phone?: string | null;
}

export class UpdateSupplierDto extends PartialType(CreateSupplierDto) {}

export class SupplierResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) contact: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
}

export class PartPageResponseDto {
  @ApiProperty({ type: [PartResponseDto] }) items: PartResponseDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class SupplierPageResponseDto {
  @ApiProperty({ type: [SupplierResponseDto] }) items: SupplierResponseDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class ImportRowErrorDto {
  @ApiProperty({ description: 'Line in the file (the header is line 1).' }) row: number;
  @ApiProperty() field: string;
  @ApiProperty() message: string;
}

export class ImportRejectedRowDto {
  @ApiProperty() row: number;
  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' } }) cells: Record<string, string>;
  @ApiProperty({ type: [String] }) errors: string[];
}

export class ImportPreviewResponseDto {
  @ApiProperty({ type: [String] }) headers: string[];
  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' }, description: 'Import field → file header.' }) mapping: Record<string, string>;
  @ApiProperty({ type: [String], description: 'Required fields no column maps to yet.' }) unmapped: string[];
  @ApiProperty() rowCount: number;
  @ApiProperty() validCount: number;
  @ApiProperty({ type: [ImportRowErrorDto] }) errors: ImportRowErrorDto[];
  @ApiProperty({ type: [ImportRejectedRowDto] }) rejected: ImportRejectedRowDto[];
  @ApiProperty({ type: [ImportRowErrorDto] }) warnings: ImportRowErrorDto[];
  @ApiPropertyOptional() inserted?: number;
  @ApiPropertyOptional() updated?: number;
}
