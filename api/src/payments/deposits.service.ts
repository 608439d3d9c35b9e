import { Injectable } from '@nestjs/common';
import { QuoteActor, QuotesService } from '../quotes/quotes.service';
import { WorkOrdersService } from '../work-orders/work-orders.service';
import { DepositPaymentResponseDto } from './dto/deposit.dto';
import { PaymentsService } from './payments.service';

/** The deposit use cases: pay a quote's deposit (signed in or by link), and settle it when the provider's event arrives (opening the work order). */
@Injectable()
export class DepositsService {
  constructor(
    private readonly quotes: QuotesService,
    private readonly payments: PaymentsService,
    private readonly workOrders: WorkOrdersService,
  ) {}

  async pay(actor: QuoteActor, idOrToken: string, paymentMethod: string): Promise<DepositPaymentResponseDto> {
    const view = actor.kind === 'link' ? await this.quotes.getByLink(idOrToken) : await this.quotes.get(actor.user, idOrToken);
    const { payment, message } = await this.payments.payDeposit(view, paymentMethod);
    return { quoteId: view.quote.id, state: payment.state, amountCents: payment.amountCents, currency: payment.currency, message };
  }

  async receive(rawBody: Buffer | undefined, signature: string | undefined): Promise<boolean> {
    const event = this.payments.verify(rawBody, signature);
    return this.payments.apply(event, async (manager, payment, paidAt) => {
      const marked = await this.quotes.markDepositPaid(manager, payment.shopId, payment.quoteId, paidAt);
      if (!marked) return;
      const view = await this.quotes.viewInShop(payment.shopId, payment.quoteId);
      await this.quotes.notifyDepositPaid(manager, view);
      // The bay's work order opens with the settlement, in the same transaction: both happen once, or neither.
      await this.workOrders.openForQuote(manager, view);
    });
  }
}
