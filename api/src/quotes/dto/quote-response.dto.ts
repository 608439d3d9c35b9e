import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { DEPOSIT_KINDS, DISCOUNT_KINDS, PART_PRICINGS, type DepositKind, type DiscountKind, type PartPricing } from '@swapwright/shared';
import { DEPOSIT_STATES, DepositState, QUOTE_STATUSES, QuoteStatus } from '../quote.entity';
import { LINE_SOURCES, LineSource } from '../quote-revision.entity';

export class QuoteLineResponseDto {
  @ApiProperty() key: string;
  @ApiProperty({ enum: ['part', 'labor'] }) kind: 'part' | 'labor';
  @ApiProperty({ enum: LINE_SOURCES }) source: LineSource;
  @ApiProperty() description: string;
  @ApiProperty({ type: String, nullable: true, description: 'Part lines: the part number the shop orders by' }) sku: string | null;
  @ApiProperty({ type: String, nullable: true }) catalogKind: string | null;
  @ApiProperty({ type: String, nullable: true }) catalogItemId: string | null;
  @ApiProperty({ type: String, nullable: true }) laborOperationId: string | null;
  @ApiProperty() quantity: number;
  @ApiProperty({ enum: PART_PRICINGS }) pricing: PartPricing;
  @ApiProperty({ type: Number, nullable: true, description: "The shop's cost of a cost-plus part; always null for the customer" }) unitCostCents: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'The markup of a cost-plus part; always null for the customer' }) markupPercent: number | null;
  @ApiProperty({ type: Number, nullable: true }) hours: number | null;
  @ApiProperty() unitPriceCents: number;
  @ApiProperty() lineTotalCents: number;
}

export class QuoteTotalsResponseDto {
  @ApiProperty() partsSubtotalCents: number;
  @ApiProperty() laborSubtotalCents: number;
  @ApiProperty() suppliesCents: number;
  @ApiProperty() partsDiscountCents: number;
  @ApiProperty() laborDiscountCents: number;
  @ApiProperty() partsTaxCents: number;
  @ApiProperty() laborTaxCents: number;
  @ApiProperty() taxCents: number;
  @ApiProperty() totalCents: number;
  @ApiProperty() depositCents: number;
}

export class QuoteRevisionResponseDto {
  @ApiProperty() number: number;
  @ApiProperty({ description: 'A sent revision is frozen' }) sent: boolean;
  @ApiProperty({ type: String, nullable: true }) sentAt: string | null;
  @ApiProperty({ type: String, nullable: true }) fitReportId: string | null;
  @ApiProperty({ type: String, nullable: true }) partsPlanId: string | null;
  @ApiProperty({ type: Number, nullable: true }) partsPlanVersion: number | null;
  @ApiProperty() validUntil: string;
  @ApiProperty() currency: string;
  @ApiProperty() laborRateCents: number;
  @ApiProperty() suppliesPercent: number;
  @ApiProperty({ type: Number, nullable: true }) suppliesCapCents: number | null;
  @ApiProperty() partsTaxPercent: number;
  @ApiProperty() laborTaxPercent: number;
  @ApiProperty({ enum: DISCOUNT_KINDS }) discountKind: DiscountKind;
  @ApiProperty({ type: Number, nullable: true }) discountPercent: number | null;
  @ApiProperty({ type: Number, nullable: true }) discountAmountCents: number | null;
  @ApiProperty({ enum: DEPOSIT_KINDS }) depositKind: DepositKind;
  @ApiProperty({ type: Number, nullable: true }) depositPercent: number | null;
  @ApiProperty({ type: Number, nullable: true }) depositAmountCents: number | null;
  @ApiProperty() terms: string;
  @ApiProperty() notes: string;
  @ApiProperty({ type: [QuoteLineResponseDto] }) lines: QuoteLineResponseDto[];
  @ApiProperty({ type: QuoteTotalsResponseDto }) totals: QuoteTotalsResponseDto;
  @ApiProperty() createdAt: string;
}

export class QuoteRevisionSummaryDto {
  @ApiProperty() number: number;
  @ApiProperty({ type: String, nullable: true }) sentAt: string | null;
  @ApiProperty() totalCents: number;
}

export class QuoteResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() projectTitle: string;
  @ApiProperty({ description: 'The shop the quote is from, as the customer reads it' }) shopName: string;
  @ApiProperty({ type: String, nullable: true }) customerName: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Where sending the quote e-mails it; null when the customer has no e-mail address (sending is refused)' })
  customerEmail: string | null;
  @ApiProperty({
    description:
      "True when the project is the signed-in member's own truck (filed under their own customer record): there is no customer to send the quote to, and sending it is refused",
  })
  forMyself: boolean;
  @ApiProperty({ example: 'Q-0007' }) label: string;
  @ApiProperty({ enum: QUOTE_STATUSES }) status: QuoteStatus;
  @ApiProperty() latestRevision: number;
  @ApiProperty({ type: Number, nullable: true }) sentRevision: number | null;
  @ApiProperty({ type: String, nullable: true }) answeredAt: string | null;
  @ApiProperty({ type: String, nullable: true }) declineReason: string | null;
  @ApiProperty({ enum: DEPOSIT_STATES }) depositState: DepositState;
  @ApiProperty({ type: String, nullable: true }) depositPaidAt: string | null;
  @ApiProperty() roundingRule: string;
  @ApiProperty({ type: QuoteRevisionResponseDto, description: 'The revision shown: the working one for the shop, the sent one for the customer' })
  revision: QuoteRevisionResponseDto;
  @ApiProperty({ type: [QuoteRevisionSummaryDto] }) revisions: QuoteRevisionSummaryDto[];
}

/** A started own build: the budget as now approved, and the work order (build sheet) it opened. */
export class OwnBuildResponseDto {
  @ApiProperty({ type: QuoteResponseDto }) quote: QuoteResponseDto;
  @ApiProperty({ format: 'uuid', description: 'The work order opened from the budget: its steps, torques, cautions and checks to record' })
  workOrderId: string;
}

export class QuoteNotificationResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() quoteId: string;
  @ApiProperty() projectId: string;
  @ApiProperty() message: string;
  @ApiProperty() createdAt: string;
}

export class QuoteSettingsResponseDto {
  @ApiProperty() laborTaxPercent: number;
  @ApiProperty({ type: Number, nullable: true }) suppliesCapCents: number | null;
  @ApiProperty() depositPercent: number;
  @ApiProperty() validityDays: number;
  @ApiProperty() defaultMarkupPercent: number;
  @ApiProperty() terms: string;
}

/** One side of a compared line: its figures in one revision. */
export class QuoteRevisionDiffLineSideDto {
  @ApiProperty({ description: 'Part lines: whole units; labor lines: 1' }) quantity: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Labor lines: hours to a tenth' }) hours: number | null;
  @ApiProperty() unitPriceCents: number;
  @ApiProperty() lineTotalCents: number;
}

export class QuoteRevisionDiffLineDto {
  @ApiProperty({ enum: ['added', 'removed', 'changed'] }) change: 'added' | 'removed' | 'changed';
  @ApiProperty() key: string;
  @ApiProperty({ enum: ['part', 'labor'] }) kind: 'part' | 'labor';
  @ApiProperty() description: string;
  @ApiPropertyOptional({ type: [String] }) fields?: string[];
  @ApiPropertyOptional({ type: Number, nullable: true }) beforeCents?: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true }) afterCents?: number | null;
  @ApiProperty({ type: QuoteRevisionDiffLineSideDto, nullable: true, description: 'The line in the older revision (null when added)' })
  before: QuoteRevisionDiffLineSideDto | null;
  @ApiProperty({ type: QuoteRevisionDiffLineSideDto, nullable: true, description: 'The line in the newer revision (null when removed)' })
  after: QuoteRevisionDiffLineSideDto | null;
}

export class QuoteRevisionDiffTotalDto {
  @ApiProperty() field: string;
  @ApiProperty() beforeCents: number;
  @ApiProperty() afterCents: number;
  @ApiProperty() deltaCents: number;
}

export class QuoteRevisionDiffResponseDto {
  @ApiProperty() fromNumber: number;
  @ApiProperty() toNumber: number;
  @ApiProperty({ type: [QuoteRevisionDiffLineDto] }) lines: QuoteRevisionDiffLineDto[];
  @ApiProperty({ type: [QuoteRevisionDiffTotalDto] }) totals: QuoteRevisionDiffTotalDto[];
}
