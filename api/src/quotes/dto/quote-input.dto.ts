import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { DEPOSIT_KINDS, DISCOUNT_KINDS, PART_PRICINGS, type DepositKind, type DiscountKind, type PartPricing } from '@swapwright/shared';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsDateString,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { IsOptionalDefined } from '../../common/decorators/optional-defined.decorator';
import { Trim } from '../../common/decorators/trim.decorator';
import { NamedInMessages, shortText } from '../../common/validation/item-names';

const MAX_CENTS = 100_000_000_00; // 100 million in the shop's currency: beyond any swap job
/** The largest amount as a person reads it; the DTO does not know the shop's currency, so no sign. */
const MAX_AMOUNT_WORDS = '100,000,000.00';
const MAX_QUANTITY = 10_000;
const MAX_HOURS = 999;
const MAX_MARKUP_PERCENT = 1000;

/** "Line 1 (Notch crossmember)", as the estimator sees the line in the list. */
@NamedInMessages((line, index) => {
  const description = shortText(line.description);
  return description ? `Line ${index + 1} (${description})` : `Line ${index + 1}`;
})
export class QuoteLineInputDto {
  @ApiPropertyOptional({ description: 'Keep the key of a line you edit, so revisions can be compared line by line; omit for a new line.' })
  @IsOptionalDefined()
  @IsUUID()
  key?: string;

  @ApiProperty({ enum: ['part', 'labor'] })
  @IsIn(['part', 'labor'])
  kind: 'part' | 'labor';

  @ApiProperty({ maxLength: 200 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'each line needs a description' })
  @MaxLength(200)
  description: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 60, description: 'Part lines: the part number the shop orders by' })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(60)
  sku?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  catalogKind?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsUUID()
  catalogItemId?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsUUID()
  laborOperationId?: string | null;

  @ApiPropertyOptional({ description: 'Part lines: whole units', default: 1 })
  @IsOptionalDefined()
  @IsInt({ message: 'Quantity must be a whole number, for example 2' })
  @Min(1, { message: 'Quantity must be at least 1' })
  @Max(MAX_QUANTITY, { message: 'Quantity must be at most 10,000' })
  quantity?: number;

  @ApiPropertyOptional({ enum: PART_PRICINGS, default: 'list' })
  @IsOptionalDefined()
  @IsIn(PART_PRICINGS)
  pricing?: PartPricing;

  @ApiPropertyOptional({ description: 'Part lines priced from the list: the unit price in cents' })
  @IsOptionalDefined()
  @IsInt({ message: 'Unit price must be a whole number of cents' })
  @Min(0, { message: 'Unit price must be 0.00 or more' })
  @Max(MAX_CENTS, { message: `Unit price must be at most ${MAX_AMOUNT_WORDS}` })
  unitPriceCents?: number;

  @ApiPropertyOptional({ description: 'Part lines priced from cost: the unit cost in cents' })
  @IsOptionalDefined()
  @IsInt({ message: 'Unit cost must be a whole number of cents' })
  @Min(0, { message: 'Unit cost must be 0.00 or more' })
  @Max(MAX_CENTS, { message: `Unit cost must be at most ${MAX_AMOUNT_WORDS}` })
  unitCostCents?: number;

  @ApiPropertyOptional({ description: 'Part lines priced from cost: markup in percent' })
  @IsOptionalDefined()
  @IsNumber({ maxDecimalPlaces: 4 }, { message: 'Markup must be a percentage with at most 4 decimals, for example 35' })
  @Min(0, { message: 'Markup must be 0% or more' })
  @Max(MAX_MARKUP_PERCENT, { message: 'Markup must be at most 1,000%' })
  markupPercent?: number;

  @ApiPropertyOptional({ description: 'Labor lines: hours to a tenth' })
  @IsOptionalDefined()
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'Hours are quoted to a tenth of an hour, for example 2.5' })
  @Min(0, { message: 'Hours must be 0 or more' })
  @Max(MAX_HOURS, { message: 'Hours must be at most 999' })
  hours?: number;
}

export class QuoteDiscountDto {
  @ApiProperty({ enum: DISCOUNT_KINDS })
  @IsIn(DISCOUNT_KINDS)
  kind: DiscountKind;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 4 })
  @Min(0)
  @Max(100)
  percent?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(MAX_CENTS)
  amountCents?: number | null;
}

export class QuoteDepositDto {
  @ApiProperty({ enum: DEPOSIT_KINDS })
  @IsIn(DEPOSIT_KINDS)
  kind: DepositKind;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 4 })
  @Min(0)
  @Max(100)
  percent?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(MAX_CENTS)
  amountCents?: number | null;
}

/** What the estimator edits on the working revision; everything optional (only what is given changes). */
export class UpdateQuoteDto {
  @ApiPropertyOptional({ type: [QuoteLineInputDto], description: 'The whole list of lines, in order' })
  @IsOptionalDefined()
  @IsArray()
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => QuoteLineInputDto)
  lines?: QuoteLineInputDto[];

  @ApiPropertyOptional({ type: QuoteDiscountDto })
  @IsOptionalDefined()
  @ValidateNested()
  @Type(() => QuoteDiscountDto)
  discount?: QuoteDiscountDto;

  @ApiPropertyOptional({ type: QuoteDepositDto })
  @IsOptionalDefined()
  @ValidateNested()
  @Type(() => QuoteDepositDto)
  deposit?: QuoteDepositDto;

  @ApiPropertyOptional({ example: '2027-01-15', description: 'Last day the customer may accept' })
  @IsOptionalDefined()
  @IsDateString({ strict: true }, { message: 'validUntil must be a date like 2027-01-15' })
  validUntil?: string;

  @ApiPropertyOptional({ maxLength: 4000 })
  @IsOptionalDefined()
  @IsString()
  @MaxLength(4000)
  terms?: string;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptionalDefined()
  @IsString()
  @MaxLength(2000)
  notes?: string;
}

export class CreateQuoteDto extends UpdateQuoteDto {
  @ApiPropertyOptional({ description: 'The stored fit report to build on; the newest one of the project when omitted' })
  @IsOptionalDefined()
  @IsUUID()
  fitReportId?: string;
}

export class AnswerQuoteDto {
  @ApiProperty({ enum: ['accept', 'decline'] })
  @IsIn(['accept', 'decline'], { message: 'answer must be accept or decline' })
  answer: 'accept' | 'decline';

  @ApiPropertyOptional({ maxLength: 1000, description: 'Why the quote is declined (asked for when declining)' })
  @IsOptionalDefined()
  @Trim()
  @IsString()
  @MaxLength(1000)
  reason?: string;
}

export class UpdateQuoteSettingsDto {
  @ApiPropertyOptional() @IsOptionalDefined() @IsNumber({ maxDecimalPlaces: 4 }) @Min(0) @Max(100) laborTaxPercent?: number;
  @ApiPropertyOptional({ type: Number, nullable: true }) @IsOptional() @IsInt() @Min(0) @Max(MAX_CENTS) suppliesCapCents?: number | null;
  @ApiPropertyOptional() @IsOptionalDefined() @IsNumber({ maxDecimalPlaces: 4 }) @Min(0) @Max(100) depositPercent?: number;
  @ApiPropertyOptional() @IsOptionalDefined() @IsInt() @Min(1) @Max(365) validityDays?: number;
  @ApiPropertyOptional() @IsOptionalDefined() @IsNumber({ maxDecimalPlaces: 4 }) @Min(0) @Max(1000) defaultMarkupPercent?: number;
  @ApiPropertyOptional() @IsOptionalDefined() @IsString() @MaxLength(4000) terms?: string;
}
