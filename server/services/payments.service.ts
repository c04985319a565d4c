/**
 * Card deposits through the payment provider's SDK. With the provider's keys (STRIPE_SECRET_KEY,
 * STRIPE_WEBHOOK_SECRET) the SDK talks to the provider; outside production without them it talks
 * to the local stand-in (server/fakes/payment-service.ts) with generated test keys. A deposit is
 * recorded once per payment intent, whether the pay route or the signed webhook sees it first;
 * webhook events are also kept by id, so a repeated delivery changes nothing. A deposit that
 * lands on a quote already cancelled, expired or paid is refunded as it is recorded.
 */
import Stripe from 'stripe';
import { EntityManager } from 'typeorm';
import type { QuoteStatus, QuoteView, ReceiptView } from '../../shared/types/quote';
import type { AppContext } from '../app-context';
import { ServerConfig } from '../env';
import { PaymentStandIn } from '../fakes/payment-service';
import { Payment } from '../entities/payment.entity';
import { PaymentWebhookEvent } from '../entities/payment-webhook-event.entity';
import { Quote } from '../entities/quote.entity';
import { BadRequestError, ConflictError, HttpError, NotFoundError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { assertOwnerOrStaff } from '../middleware/ownership';
import { formatCents } from '../../shared/money/format-cents';
import { moveQuote, noteOnQuote, QuoteActor } from './quote-rules';
import { toQuoteView, toReceipt } from './quote-view';

type Intent = Stripe.PaymentIntent;

export class PaymentGateway {
  private constructor(
    readonly client: Stripe | null,
    readonly webhookSecret: string | null,
    /** Test keys (or the stand-in): the shop's own test card form may post a test payment method. */
    readonly testMode: boolean,
    readonly standIn: PaymentStandIn | undefined,
  ) {}

  static async open(config: ServerConfig, log: AppContext['log']): Promise<PaymentGateway> {
    if (config.payments) {
      const client = new Stripe(config.payments.secretKey, { maxNetworkRetries: 1 });
      return new PaymentGateway(client, config.payments.webhookSecret, config.payments.secretKey.startsWith('sk_test_'), undefined);
    }
    if (config.production) return new PaymentGateway(null, null, false, undefined);
    const standIn = await PaymentStandIn.start(log);
    const client = new Stripe(standIn.secretKey, { host: '127.0.0.1', port: standIn.port, protocol: 'http', maxNetworkRetries: 0 });
    return new PaymentGateway(client, standIn.webhookSecret, true, standIn);
  }

  sdk(): Stripe {
    if (!this.client) throw new ConflictError('Card payments are not set up on this installation; pay the deposit at the shop.', 'payments-off');
    return this.client;
  }

  /** Refunds the quote's kept deposit (its first): the cancel's refund. */
  async refundDeposit(manager: EntityManager, quote: Quote, amountCents: number, at: Date): Promise<void> {
    const deposit = await manager.findOne(Payment, { where: { quoteId: quote.id, kind: 'deposit' }, order: { id: 'ASC' } });
    if (!deposit) return;
    await this.refundPayment(manager, quote, deposit, amountCents, at);
  }

  /**
   * Gives a deposit back to the card and records it (a refund row, the quote's refundedCents).
   * The idempotency key is the deposit's: should the transaction roll back after the provider
   * refunded, the retry gets the same refund instead of a second one.
   */
  async refundPayment(manager: EntityManager, quote: Quote, deposit: Payment, amountCents: number, at: Date): Promise<Payment> {
    const refund = await this.sdk().refunds.create({ payment_intent: deposit.providerId, amount: amountCents }, { idempotencyKey: `refund-${deposit.providerId}` });
    const row = await manager.save(
      manager.create(Payment, { quoteId: quote.id, kind: 'refund', providerId: refund.id, amountCents, currency: quote.currency, method: deposit.method, last4: deposit.last4, at }),
    );
    await manager.update(Quote, { id: quote.id }, { refundedCents: quote.refundedCents + amountCents });
    quote.refundedCents += amountCents;
    return row;
  }

  close(): Promise<void> {
    return this.standIn?.close() ?? Promise.resolve();
  }
}

export function openPaymentGateway(config: ServerConfig, log: AppContext['log']): Promise<PaymentGateway> {
  return PaymentGateway.open(config, log);
}

function cardDetails(intent: Intent): { method: string; last4: string | null } {
  const charge = typeof intent.latest_charge === 'object' ? intent.latest_charge : null;
  const card = charge?.payment_method_details?.card;
  return { method: charge?.payment_method_details?.type ?? 'card', last4: card?.last4 ?? null };
}

/** The pay route's answer for a card charged while the quote closed: the money is already on its way back. */
function refundedAnswer(quote: Quote, deposit: Payment): ConflictError {
  const amount = formatCents(deposit.amountCents, quote.currency);
  const message = HOLDS_DEPOSIT.includes(quote.status)
    ? `The deposit for quote ${quote.number} had already been paid, so this payment of ${amount} has gone back to the card.`
    : `Quote ${quote.number} was ${quote.status} while the card was being charged, so the ${amount} has gone back to the card.`;
  return new ConflictError(message, 'deposit-refunded');
}

export interface DepositAnswer {
  quote: QuoteView;
  receipt: ReceiptView;
}

export class PaymentsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'payments'>) {}

  /**
   * Charges the deposit with a test payment method from the shop's test card form. A decline
   * answers 402 with the reason and leaves the quote accepted and unpaid.
   */
  async payDeposit(actor: QuoteActor, quoteId: number, paymentMethod: string, owner?: AuthUser): Promise<DepositAnswer> {
    const gateway = this.ctx.payments;
    const quote = await this.ctx.db.read.getRepository(Quote).findOneBy({ id: quoteId });
    if (!quote) throw new NotFoundError('There is no such quote.');
    if (owner) assertOwnerOrStaff(owner, quote.riderId);
    const sdk = gateway.sdk();
    if (!gateway.testMode) throw new ConflictError('This card form takes test cards only; pay the deposit at the shop.', 'test-mode-only');
    if (quote.paidCents > 0) throw new ConflictError(`The deposit for quote ${quote.number} is already paid.`, 'already-paid');
    if (quote.status !== 'accepted') throw new ConflictError(`Quote ${quote.number} must be accepted before its deposit is paid.`, 'bad-status');
    if (quote.depositDueCents <= 0) throw new ConflictError(`Quote ${quote.number} needs no deposit.`, 'no-deposit');
    if (quote.validUntil.getTime() <= this.ctx.now().getTime()) throw new ConflictError(`Quote ${quote.number} is past its validity date: ask the shop for a new one.`, 'expired');
    let intent: Intent;
    try {
      const created = await sdk.paymentIntents.create(
        { amount: quote.depositDueCents, currency: quote.currency.toLowerCase(), payment_method: paymentMethod, metadata: { quoteId: String(quote.id), quoteNumber: quote.number } },
      );
      intent = await sdk.paymentIntents.confirm(created.id, { payment_method: paymentMethod, expand: ['latest_charge'] });
    } catch (err) {
      if (err instanceof Stripe.errors.StripeCardError) {
        throw new HttpError(402, 'card-declined', `The card was declined (${err.message.replace(/\.$/, '')}). The deposit is still due: try another card.`);
      }
      if (err instanceof Stripe.errors.StripeInvalidRequestError && err.param === 'payment_method') {
        throw new BadRequestError('That card is not one the test card form knows.', 'bad-payment-method');
      }
      throw err;
    }
    if (intent.status !== 'succeeded') throw new HttpError(402, 'card-not-charged', 'The card was not charged; the deposit is still due.');
    const recorded = await this.ctx.db.write((manager) => recordDeposit(manager, gateway, intent, { kind: 'payment', id: actor.id, name: actor.name }, this.ctx.now()));
    const read = this.ctx.db.read.manager;
    const after = await read.findOneByOrFail(Quote, { id: quoteId });
    if (!recorded.kept) throw refundedAnswer(after, recorded.payment);
    return { quote: await toQuoteView(read, after), receipt: toReceipt(recorded.payment) };
  }

  /** A signed event from the provider; a bad signature is a 400 and changes nothing. */
  async handleWebhook(rawBody: Buffer | undefined, signature: string | undefined): Promise<{ received: true; duplicate: boolean }> {
    const gateway = this.ctx.payments;
    if (!gateway.client || !gateway.webhookSecret) throw new BadRequestError('Payments are not set up.', 'payments-off');
    if (!Buffer.isBuffer(rawBody) || !signature) throw new BadRequestError('The event is not signed.', 'bad-signature');
    let event: Stripe.Event;
    try {
      event = gateway.client.webhooks.constructEvent(rawBody, signature, gateway.webhookSecret);
    } catch {
      throw new BadRequestError('The event signature does not match.', 'bad-signature');
    }
    return this.ctx.db.write(async (manager) => {
      if (await manager.existsBy(PaymentWebhookEvent, { eventId: event.id })) return { received: true as const, duplicate: true };
      await manager.insert(PaymentWebhookEvent, { eventId: event.id, type: event.type, receivedAt: this.ctx.now() });
      if (event.type === 'payment_intent.succeeded') {
        await recordDeposit(manager, gateway, event.data.object, { kind: 'payment', id: null, name: 'Card payment' }, this.ctx.now());
      }
      return { received: true as const, duplicate: false };
    });
  }
}

/** Statuses in which the quote's first deposit is the money the shop holds for it. */
const HOLDS_DEPOSIT: readonly QuoteStatus[] = ['deposit-paid', 'booked', 'fitted'];

interface RecordedDeposit {
  payment: Payment;
  /** False when the deposit went back to the card: the quote was closed, or already paid, when it landed. */
  kept: boolean;
}

/**
 * Records a succeeded intent as the quote's deposit, once: a second call for the same intent
 * returns the first row. A deposit that lands on a quote no longer waiting for one (the desk
 * cancelled it, or it expired, while the card was charged; or another payment paid it first) is
 * refunded in the same transaction and noted in the quote's history, so no money is held for it.
 */
async function recordDeposit(manager: EntityManager, gateway: PaymentGateway, intent: Intent, actor: QuoteActor, at: Date): Promise<RecordedDeposit> {
  const existing = await manager.findOneBy(Payment, { providerId: intent.id });
  if (existing) return { payment: existing, kept: await isKeptDeposit(manager, existing) };
  const quoteId = Number(intent.metadata?.quoteId);
  const quote = await manager.findOneBy(Quote, { id: quoteId });
  if (!quote) throw new BadRequestError('The payment names no quote of this shop.', 'unknown-quote');
  const { method, last4 } = cardDetails(intent);
  const payment = await manager.save(
    manager.create(Payment, { quoteId, kind: 'deposit', providerId: intent.id, amountCents: intent.amount, currency: quote.currency, method, last4, at }),
  );
  await manager.update(Quote, { id: quoteId }, { paidCents: quote.paidCents + intent.amount });
  quote.paidCents += intent.amount;
  if (quote.status === 'accepted') {
    await moveQuote(manager, quote, 'deposit-paid', actor, at, 'paid', `Deposit of ${formatCents(intent.amount, quote.currency)} by card (payment ${intent.id})`);
    return { payment, kept: true };
  }
  const refund = await gateway.refundPayment(manager, quote, payment, intent.amount, at);
  const why = HOLDS_DEPOSIT.includes(quote.status) ? 'after the deposit was already paid' : `after the quote was ${quote.status}`;
  await noteOnQuote(manager, quote, actor, at, `Deposit of ${formatCents(intent.amount, quote.currency)} by card (payment ${intent.id}) arrived ${why}: refunded to the card (refund ${refund.providerId})`);
  return { payment, kept: false };
}

async function isKeptDeposit(manager: EntityManager, deposit: Payment): Promise<boolean> {
  const quote = await manager.findOneByOrFail(Quote, { id: deposit.quoteId });
  if (!HOLDS_DEPOSIT.includes(quote.status)) return false;
  const first = await manager.findOne(Payment, { where: { quoteId: quote.id, kind: 'deposit' }, order: { id: 'ASC' } });
  return first?.id === deposit.id;
}
