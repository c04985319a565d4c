/**
 * A local stand-in for the card payment provider, for development and tests: its own Express app
 * on 127.0.0.1 on a free port, answering the few calls Sagwright's payments service makes through
 * the provider's SDK (create and confirm a payment intent, read one, refund) in the provider's wire
 * format. The documented test payment methods decide the outcome. After each confirm it posts a
 * webhook event to Sagwright, signed as the provider signs them: header `t=<unix seconds>,v1=<hex
 * HMAC-SHA256 of "<t>.<raw body>">` with the webhook secret.
 */
import { createHmac, randomBytes } from 'node:crypto';
import http from 'node:http';
import { AddressInfo } from 'node:net';
import express, { Request, Response } from 'express';

interface TestCard {
  brand: string;
  last4: string;
  /** Set for a card that is declined. */
  decline?: { code: string; declineCode: string; message: string };
}

/** The provider's documented test payment methods (its testing guide), the ones Sagwright's tests use. */
const TEST_CARDS: Record<string, TestCard> = {
  pm_card_visa: { brand: 'visa', last4: '4242' },
  pm_card_mastercard: { brand: 'mastercard', last4: '4444' },
  pm_card_chargeDeclined: { brand: 'visa', last4: '0002', decline: { code: 'card_declined', declineCode: 'generic_decline', message: 'Your card was declined.' } },
  pm_card_chargeDeclinedInsufficientFunds: {
    brand: 'visa',
    last4: '9995',
    decline: { code: 'card_declined', declineCode: 'insufficient_funds', message: 'Your card has insufficient funds.' },
  },
};

interface Intent {
  id: string;
  object: 'payment_intent';
  amount: number;
  currency: string;
  status: 'requires_payment_method' | 'requires_confirmation' | 'succeeded';
  metadata: Record<string, string>;
  payment_method: string | null;
  latest_charge: string | null;
  amount_received: number;
  created: number;
  livemode: false;
}

interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  payment_intent: string;
  payment_method_details: { type: 'card'; card: { brand: string; last4: string } };
}

export interface WebhookDelivery {
  payload: string;
  signature: string;
  status: number | null;
}

/** The provider's signature header for a payload. */
export function signWebhookPayload(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

function newId(prefix: string): string {
  return `${prefix}_${randomBytes(12).toString('hex')}`;
}

function providerError(res: Response, status: number, error: Record<string, unknown>) {
  res.status(status).json({ error });
}

export class PaymentStandIn {
  readonly secretKey = `sk_test_${randomBytes(16).toString('hex')}`;
  readonly webhookSecret = `whsec_${randomBytes(24).toString('hex')}`;
  /** Every webhook sent, in order, so a test can replay one. */
  readonly deliveries: WebhookDelivery[] = [];
  private readonly intents = new Map<string, Intent>();
  private readonly charges = new Map<string, Charge>();
  private readonly pending = new Set<Promise<void>>();
  private webhookUrl: string | undefined;

  private constructor(
    private readonly server: http.Server,
    readonly port: number,
    private readonly log: (message: string, detail?: unknown) => void,
  ) {}

  static async start(log: (message: string, detail?: unknown) => void): Promise<PaymentStandIn> {
    let standIn: PaymentStandIn | undefined;
    const app = express();
    app.use(express.urlencoded({ extended: true }));
    app.use((req, res, next) => (standIn?.authorised(req) ? next() : providerError(res, 401, { type: 'invalid_request_error', message: 'Invalid API key provided.' })));
    app.post('/v1/payment_intents', (req, res) => standIn!.create(req, res));
    app.get('/v1/payment_intents/:id', (req, res) => standIn!.retrieve(req, res));
    app.post('/v1/payment_intents/:id/confirm', (req, res) => standIn!.confirm(req, res));
    app.post('/v1/refunds', (req, res) => standIn!.refund(req, res));
    app.use((_req, res) => providerError(res, 404, { type: 'invalid_request_error', message: 'Unrecognized request URL.' }));
    const server = http.createServer(app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    standIn = new PaymentStandIn(server, (server.address() as AddressInfo).port, log);
    return standIn;
  }

  /** Where webhooks go: Sagwright's webhook route, known once its server listens. */
  setWebhookUrl(url: string): void {
    this.webhookUrl = url;
  }

  /** Resolves when every webhook started so far has been answered. */
  async idle(): Promise<void> {
    while (this.pending.size) await Promise.all([...this.pending]);
  }

  async close(): Promise<void> {
    await this.idle();
    await new Promise<void>((resolve) => this.server.close(() => resolve()));
  }

  private authorised(req: Request): boolean {
    return req.get('authorization') === `Bearer ${this.secretKey}`;
  }

  private create(req: Request, res: Response) {
    const amount = Number(req.body.amount);
    if (!Number.isSafeInteger(amount) || amount < 1) {
      return providerError(res, 400, { type: 'invalid_request_error', param: 'amount', message: 'Invalid positive integer' });
    }
    const intent: Intent = {
      id: newId('pi'),
      object: 'payment_intent',
      amount,
      currency: String(req.body.currency ?? '').toLowerCase(),
      status: req.body.payment_method ? 'requires_confirmation' : 'requires_payment_method',
      metadata: (req.body.metadata as Record<string, string>) ?? {},
      payment_method: req.body.payment_method ?? null,
      latest_charge: null,
      amount_received: 0,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
    };
    this.intents.set(intent.id, intent);
    res.json(intent);
  }

  private retrieve(req: Request, res: Response) {
    const intent = this.intents.get(String(req.params.id));
    if (!intent) return providerError(res, 404, { type: 'invalid_request_error', code: 'resource_missing', message: `No such payment_intent: '${req.params.id}'` });
    res.json(this.expanded(intent, req.query.expand));
  }

  private confirm(req: Request, res: Response) {
    const intent = this.intents.get(String(req.params.id));
    if (!intent) return providerError(res, 404, { type: 'invalid_request_error', code: 'resource_missing', message: `No such payment_intent: '${req.params.id}'` });
    if (intent.status === 'succeeded') {
      return providerError(res, 400, { type: 'invalid_request_error', code: 'payment_intent_unexpected_state', message: 'This PaymentIntent has already succeeded.' });
    }
    const method = String(req.body.payment_method ?? intent.payment_method ?? '');
    const card = TEST_CARDS[method];
    if (!card) return providerError(res, 400, { type: 'invalid_request_error', code: 'resource_missing', param: 'payment_method', message: `No such PaymentMethod: '${method}'` });
    intent.payment_method = method;
    if (card.decline) {
      intent.status = 'requires_payment_method';
      this.sendEvent('payment_intent.payment_failed', intent);
      return providerError(res, 402, {
        type: 'card_error',
        code: card.decline.code,
        decline_code: card.decline.declineCode,
        message: card.decline.message,
        payment_intent: intent,
      });
    }
    const charge: Charge = {
      id: newId('ch'),
      object: 'charge',
      amount: intent.amount,
      payment_intent: intent.id,
      payment_method_details: { type: 'card', card: { brand: card.brand, last4: card.last4 } },
    };
    this.charges.set(charge.id, charge);
    Object.assign(intent, { status: 'succeeded', latest_charge: charge.id, amount_received: intent.amount });
    this.sendEvent('payment_intent.succeeded', this.expanded(intent, ['latest_charge']));
    res.json(this.expanded(intent, req.body.expand));
  }

  private refund(req: Request, res: Response) {
    const intent = this.intents.get(String(req.body.payment_intent ?? ''));
    if (!intent || intent.status !== 'succeeded') {
      return providerError(res, 400, { type: 'invalid_request_error', code: 'charge_not_refundable', message: 'This payment cannot be refunded.' });
    }
    const amount = req.body.amount === undefined ? intent.amount : Number(req.body.amount);
    res.json({ id: newId('re'), object: 'refund', amount, currency: intent.currency, payment_intent: intent.id, status: 'succeeded' });
  }

  private expanded(intent: Intent, expand: unknown): Intent | (Omit<Intent, 'latest_charge'> & { latest_charge: Charge | null }) {
    const wanted = ([] as unknown[]).concat(expand ?? []).map(String);
    if (!wanted.includes('latest_charge') || !intent.latest_charge) return { ...intent };
    return { ...intent, latest_charge: this.charges.get(intent.latest_charge) ?? null };
  }

  private sendEvent(type: string, object: object): void {
    const payload = JSON.stringify({ id: newId('evt'), object: 'event', type, created: Math.floor(Date.now() / 1000), livemode: false, data: { object } });
    const delivery: WebhookDelivery = { payload, signature: signWebhookPayload(payload, this.webhookSecret), status: null };
    this.deliveries.push(delivery);
    const url = this.webhookUrl;
    if (!url) return;
    // After the answer to the confirm, as the provider does.
    const sending = new Promise<void>((resolve) => setImmediate(resolve))
      .then(() => fetch(url, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': delivery.signature }, body: payload }))
      .then((response) => {
        delivery.status = response.status;
      })
      .catch((err) => this.log('payment stand-in: webhook not delivered', err))
      .finally(() => this.pending.delete(sending));
    this.pending.add(sending);
  }
}
