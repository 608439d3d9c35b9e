import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches } from 'class-validator';
import { DEPOSIT_PAYMENT_STATES, DepositPaymentState } from '../deposit-payment.entity';

export class PayDepositDto {
  @ApiProperty({ description: "The payment method the provider's card form returned (in test: pm_card_visa pays, pm_card_chargeDeclined is declined)", example: 'pm_card_visa' })
  @IsString()
  @Matches(/^pm_[A-Za-z0-9_]{1,80}$/, { message: 'paymentMethod must be a payment method id (pm_…)' })
  paymentMethod: string;
}

export class DepositPaymentResponseDto {
  @ApiProperty() quoteId: string;
  @ApiProperty({ enum: DEPOSIT_PAYMENT_STATES }) state: DepositPaymentState;
  @ApiProperty() amountCents: number;
  @ApiProperty() currency: string;
  @ApiProperty({ description: 'What happens next, in words' }) message: string;
}

export class WebhookAnswerDto {
  @ApiProperty() received: boolean;
  @ApiProperty({ description: 'True when the event is new and was queued for the background worker, which applies it once; false for a duplicate or replay (it changes nothing)' })
  applied: boolean;
}
