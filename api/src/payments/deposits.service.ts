import { Injectable, OnModuleInit } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { formatMoney } from '@swapwright/shared';
import Stripe from 'stripe';
import { DataSource, EntityManager } from 'typeorm';
import { JobHandlers } from '../jobs/job-handlers';
import { JobsService } from '../jobs/jobs.service';
import { AuditService } from '../audit/audit.service';
import { QuoteActor, QuotesService } from '../quotes/quotes.service';
import { WorkOrdersService } from '../work-orders/work-orders.service';
import { DepositPaymentResponseDto } from './dto/deposit.dto';
import { PaymentsService } from './payments.service';

/** The deposit use cases: pay a quote's deposit (signed in or by link), and settle it when the provider's event arrives (opening the work order). */
@Injectable()
export class DepositsService implements OnModuleInit {
  constructor(
    private readonly quotes: QuotesService,
    private readonly payments: PaymentsService,
    private readonly workOrders: WorkOrdersService,
    private readonly audit: AuditService,
    private readonly jobs: JobsService,
    private readonly jobHandlers: JobHandlers,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  onModuleInit(): void {
    this.jobHandlers.register('payment.event', (payload, { manager }) => this.applyEvent(manager, payload as unknown as Stripe.Event));
  }

  async pay(actor: QuoteActor, idOrToken: string, paymentMethod: string): Promise<DepositPaymentResponseDto> {
    const view = actor.kind === 'link' ? await this.quotes.getByLink(idOrToken) : await this.quotes.get(actor.user, idOrToken);
    const { payment, message } = await this.payments.payDeposit(view, paymentMethod);
    return { quoteId: view.quote.id, state: payment.state, amountCents: payment.amountCents, currency: payment.currency, message };
  }

  /**
   * A verified event is queued as a job keyed by its id, in one statement, and the provider gets its 200 at once;
   * the background worker applies it. True when the event is new (queued now), false for a duplicate or replay.
   */
  async receive(rawBody: Buffer | undefined, signature: string | undefined): Promise<boolean> {
    const event = this.payments.verify(rawBody, signature);
    if (await this.payments.wasApplied(event.id)) return false;
    const metadata = typeof event.data?.object === 'object' ? (event.data.object as { metadata?: { shopId?: string; quoteId?: string } }).metadata : undefined;
    const shopId = metadata?.shopId ?? null;
    return this.jobs.enqueue(this.dataSource.manager, {
      kind: 'payment.event',
      idempotencyKey: event.id,
      shopId,
      subject: await this.eventSubject(event, shopId, metadata?.quoteId),
      payload: event as unknown as Record<string, unknown>,
    });
  }

  /** "Deposit payment for quote Q-0003: payment_intent.succeeded (evt_…)", for the shop's list of background work. */
  private async eventSubject(event: Stripe.Event, shopId: string | null, quoteId: string | undefined): Promise<string> {
    const label = shopId && quoteId ? await this.quotes.labelInShop(shopId, quoteId) : null;
    const about = label ? `Deposit payment for quote ${label}` : 'Payment provider event';
    return `${about}: ${event.type} (${event.id})`;
  }

  /** Applies one provider event inside its job's transaction: the settlement, its audit entry, the notification and the work order commit with the job. */
  private async applyEvent(manager: EntityManager, event: Stripe.Event): Promise<string> {
    const applied = await this.payments.apply(manager, event, async (manager, payment, paidAt) => {
      await this.audit.record(manager, {
        shopId: payment.shopId,
        actor: { userId: null, name: 'Payment provider' },
        kind: 'money',
        action: 'payment.settled',
        subjectId: payment.quoteId,
        summary: `Deposit of ${formatMoney(payment.amountCents, payment.currency)} settled by the payment provider (event ${event.id}).`,
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
    return applied ? `applied ${event.type}` : 'already applied';
  }
}
