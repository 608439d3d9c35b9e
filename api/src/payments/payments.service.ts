import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { DataSource, EntityManager, Not } from 'typeorm';
import { EnvironmentVariables } from '../config/env.validation';
import { insertOnce } from '../jobs/jobs.service';
import { QuoteView } from '../quotes/quotes.service';
import { DepositPayment, PaymentEvent } from './deposit-payment.entity';
import { PaymentErrors } from './payments.errors';

export interface DepositOutcome {
  payment: DepositPayment;
  message: string;
}

/**
 * Deposits through the provider's official SDK. A confirmed payment is only recorded as paid when the provider's
 * signed event arrives. The webhook only queues the event (a job keyed by the event id); the background worker applies
 * it once (a table of applied ids, written in the job's transaction), so duplicates and replays change nothing.
 */
@Injectable()
export class PaymentsService {
  private readonly logger = new Logger(PaymentsService.name);
  private readonly client: Stripe | null;
  private readonly webhookSecret: string | null;

  constructor(
    config: ConfigService<EnvironmentVariables, true>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    const apiUrl = config.get('PAYMENT_API_URL', { infer: true });
    const secretKey = config.get('PAYMENT_SECRET_KEY', { infer: true });
    this.webhookSecret = config.get('PAYMENT_WEBHOOK_SECRET', { infer: true }) ?? null;
    if (apiUrl && secretKey) {
      const url = new URL(apiUrl);
      this.client = new Stripe(secretKey, {
        host: url.hostname,
        port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
        protocol: url.protocol === 'https:' ? 'https' : 'http',
        maxNetworkRetries: 0,
        telemetry: false,
        timeout: 10_000,
      });
    } else {
      this.client = null;
    }
  }

  /** Charges the deposit of an approved quote with the payment method the customer's card form gave. */
  async payDeposit(view: QuoteView, paymentMethod: string): Promise<DepositOutcome> {
    if (!this.client) throw PaymentErrors.notConfigured();
    const { quote, revision } = view;
    if (view.status !== 'approved') throw PaymentErrors.notDue('Approve the quote before paying its deposit.');
    if (quote.depositState === 'paid') throw PaymentErrors.notDue('The deposit of this quote is already paid.');
    if (quote.depositState !== 'due') throw PaymentErrors.notDue('This quote asks for no deposit.');
    const attempt = await this.dataSource.getRepository(DepositPayment).count({ where: { quoteId: quote.id } });
    let intent: Stripe.PaymentIntent;
    try {
      intent = await this.client.paymentIntents.create(
        {
          amount: revision.totals.depositCents,
          currency: revision.currency.toLowerCase(),
          metadata: { quoteId: quote.id, shopId: quote.shopId, revision: String(revision.number) },
          description: `Deposit, quote Q-${String(quote.number).padStart(4, '0')} revision ${revision.number}`,
        },
        { idempotencyKey: `deposit-${quote.id}-${attempt + 1}` },
      );
    } catch (error) {
      this.logger.error(`Creating the payment failed: ${error instanceof Error ? error.message : error}`);
      throw PaymentErrors.providerUnavailable();
    }
    const payment = this.dataSource.getRepository(DepositPayment).create({
      id: randomUUID(),
      shopId: quote.shopId,
      quoteId: quote.id,
      intentId: intent.id,
      amountCents: intent.amount,
      currency: revision.currency,
      state: 'pending',
      lastError: null,
    });
    await this.dataSource.getRepository(DepositPayment).insert(payment);
    try {
      await this.client.paymentIntents.confirm(intent.id, { payment_method: paymentMethod }, { idempotencyKey: `confirm-${intent.id}` });
    } catch (error) {
      if (error instanceof Stripe.errors.StripeCardError) {
        const message = error.message || 'The card was declined.';
        await this.dataSource.getRepository(DepositPayment).update({ id: payment.id, state: 'pending' }, { state: 'failed', lastError: message.slice(0, 300) });
        throw PaymentErrors.declined(message);
      }
      if (error instanceof Stripe.errors.StripeInvalidRequestError) {
        await this.dataSource.getRepository(DepositPayment).update({ id: payment.id, state: 'pending' }, { state: 'failed', lastError: error.message.slice(0, 300) });
        throw PaymentErrors.declined('The card details were not accepted.');
      }
      this.logger.error(`Confirming the payment failed: ${error instanceof Error ? error.message : error}`);
      throw PaymentErrors.providerUnavailable();
    }
    return { payment, message: 'The payment went through; the deposit shows as paid as soon as the payment service confirms it (a few seconds).' };
  }

  async latestFor(quoteId: string): Promise<DepositPayment | null> {
    return this.dataSource.getRepository(DepositPayment).findOne({ where: { quoteId }, order: { createdAt: 'DESC' } });
  }

  /** Verifies the signature over the exact bytes received (the SDK's own check, timestamp tolerance included). */
  verify(rawBody: Buffer | undefined, signature: string | undefined): Stripe.Event {
    if (!this.client || !this.webhookSecret) throw PaymentErrors.notConfigured();
    if (!rawBody || !signature) throw PaymentErrors.badSignature();
    try {
      return this.client.webhooks.constructEvent(rawBody, signature, this.webhookSecret);
    } catch {
      throw PaymentErrors.badSignature();
    }
  }

  /**
   * Applies an event once, with the manager of the caller's transaction (the background job's, which is marked done
   * in it). `onPaid` runs in it too (marks the quote's deposit paid and what follows). The event id is recorded in
   * the same transaction; an id already recorded changes nothing and answers false.
   */
  async apply(
    manager: EntityManager,
    event: Stripe.Event,
    onPaid: (manager: EntityManager, payment: DepositPayment, paidAt: Date) => Promise<void>,
  ): Promise<boolean> {
    const intent = (event.data?.object ?? {}) as Partial<Stripe.PaymentIntent>;
    const intentId = typeof intent.id === 'string' ? intent.id : null;
    const recorded = await insertOnce(manager, 'INSERT IGNORE INTO `payment_events` (`eventId`, `type`, `intentId`) VALUES (?, ?, ?)', [
      event.id,
      event.type.slice(0, 60),
      intentId,
    ]);
    if (!recorded) return false;
    if (!intentId) return true;
    const payment = await manager.findOne(DepositPayment, { where: { intentId }, lock: { mode: 'pessimistic_write' } });
    if (!payment) return true;
    if (event.type === 'payment_intent.succeeded' && payment.state !== 'paid') {
      await manager.update(DepositPayment, { id: payment.id }, { state: 'paid', lastError: null });
      await onPaid(manager, payment, new Date(event.created * 1000));
    } else if (event.type === 'payment_intent.payment_failed') {
      const message = intent.last_payment_error?.message ?? 'The card was declined.';
      await manager.update(DepositPayment, { id: payment.id, state: Not('paid') }, { state: 'failed', lastError: message.slice(0, 300) });
    }
    return true;
  }

  /** Whether an event id was already applied (a redelivery after its job finished). */
  async wasApplied(eventId: string): Promise<boolean> {
    return this.dataSource.getRepository(PaymentEvent).exists({ where: { eventId } });
  }
}
