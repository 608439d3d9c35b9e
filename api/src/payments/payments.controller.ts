import { Body, Controller, Headers, HttpCode, Param, Post, Req } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { QUOTE_ANSWERERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { DepositPaymentResponseDto, PayDepositDto, WebhookAnswerDto } from './dto/deposit.dto';
import { DepositsService } from './deposits.service';

@ApiTags('payments')
@Controller()
export class PaymentsController {
  constructor(private readonly deposits: DepositsService) {}

  @Post('quotes/:id/deposit')
  @ApiBearerAuth()
  @Roles(...QUOTE_ANSWERERS)
  @HttpCode(200)
  @ApiOkResponse({ type: DepositPaymentResponseDto })
  payAsCustomer(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: PayDepositDto): Promise<DepositPaymentResponseDto> {
    return this.deposits.pay({ kind: 'member', user }, id, body.paymentMethod);
  }

  @Public()
  @Post('quote-links/:token/deposit')
  @HttpCode(200)
  @ApiOkResponse({ type: DepositPaymentResponseDto })
  payByLink(@Param('token') token: string, @Body() body: PayDepositDto): Promise<DepositPaymentResponseDto> {
    return this.deposits.pay({ kind: 'link', shopId: '' }, token, body.paymentMethod);
  }

  /** The provider's signed events. Not in the web's contract: only the provider calls it. */
  @Public()
  @Post('payments/webhook')
  @HttpCode(200)
  @ApiOkResponse({ type: WebhookAnswerDto })
  async webhook(@Req() request: Request & { rawBody?: Buffer }, @Headers('stripe-signature') signature?: string): Promise<WebhookAnswerDto> {
    return { received: true, applied: await this.deposits.receive(request.rawBody, signature) };
  }
}
