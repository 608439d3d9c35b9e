import { Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service';
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
    private readonly audit: AuditService,
  ) {}

  async pay(actor: QuoteActor, idOrToken: string, paymentMethod: string): Promise<DepositPaymentResponseDto> {
    const view = actor.kind === 'link' ? await this.quotes.getByLink(idOrToken) : await this.quotes.get(actor.user, idOrToken);
    const { payment, message } = await this.payments.payDeposit(view, paymentMethod);
    return { quoteId: view.quote.id, state: payment.state, amountCents: payment.amountCents, currency: payment.currency, message };
  }

  async receive(rawBody: Buffer | undefined, signature: string | undefined): Promise<boolean> {
    const event = this.payments.verify(rawBody, signature);
    return this.payments.apply(event, async (manager, payment, paidAt) => {
      await this.audit.record(manager, {
        shopId: payment.shopId,
        actor: { userId: null, name: 'Payment provider' },
        kind: 'money',
        action: 'payment.settled',
        subjectId: payment.quoteId,
        summary: `Deposit of ${payment.amountCents} cents (${payment.currency}) settled by the payment provider (event ${event.id}).`,
        before: { state: payment.state },
        after: { state: 'paid', amountCents: payment.amountCents, currency: payment.currency, eventId: event.id },
      });
      const marked = await this.quotes.markDepositPaid(manager, payment.shopId, payment.quoteId, paidAt);
      if (!marked) return;
      const view = await this.quotes.viewInShop(payment.shopId, payment.quoteId);
      await this.quotes.notifyDepositPaid(manager, view);
      // The bay's work order opens with the settlement, in the same transaction: both happen once, or neither.
      await this.workOrders.openForQuote(manager, view);
    });
  }
}
