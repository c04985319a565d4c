/**
 * A deposit that lands after its quote closed: the rider pays in one tab while the desk cancels,
 * or while the quote expires, or pays twice from two tabs. The card is charged through the
 * payment SDK against the local stand-in; the test holds the charge open at the provider's
 * confirm (a spy around the SDK call) to run the other side in between, and delivers the
 * stand-in's signed webhook itself, before or after the pay route records the payment. Either
 * way the money goes back to the card once: one refund row, refundedCents, one history note.
 */
import request from 'supertest';
import type Stripe from 'stripe';
import { Payment } from '../../../server/entities/payment.entity';
import { Quote } from '../../../server/entities/quote.entity';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { as } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { createQuote, DeskShop, sendQuote, setUpDeskShop } from './helpers';

// Accounts hashed with argon2, sizings and the card stand-in: slow on a busy machine.
jest.setTimeout(60_000);

let t: TestContext;
let shop: DeskShop;
let sdk: Stripe;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t);
  sdk = t.payments.client!;
});
// Fresh access tokens for each test: some move the clock past the earlier ones.
beforeEach(async () => {
  shop.asDesk = await as(t, shop.desk);
  shop.asRider = await as(t, shop.rider);
});
afterEach(() => jest.restoreAllMocks());
afterAll(() => t.dispose());

type Confirm = Stripe['paymentIntents']['confirm'];

async function acceptedQuote() {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  return { quote, token };
}

/** The stand-in's signed `payment_intent.succeeded` for an intent, posted to the webhook route. */
function deliverWebhook(intentId: string) {
  const delivery = t.payments.standIn!.deliveries.find((d) => {
    const event = JSON.parse(d.payload);
    return event.type === 'payment_intent.succeeded' && event.data.object.id === intentId;
  });
  if (!delivery) throw new Error(`no webhook for ${intentId}`);
  return request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', delivery.signature).send(delivery.payload);
}

/**
 * Holds the next card charge at the provider's confirm: `meanwhile` runs before the charge goes
 * through, `afterCharge` after the provider has charged but before the pay route records it.
 */
function holdCharge(meanwhile: () => Promise<unknown>, afterCharge: (intentId: string) => Promise<unknown> = async () => undefined) {
  const realConfirm: Confirm = sdk.paymentIntents.confirm.bind(sdk.paymentIntents);
  const charged: string[] = [];
  jest.spyOn(sdk.paymentIntents, 'confirm').mockImplementationOnce((async (id: string, params?: Stripe.PaymentIntentConfirmParams) => {
    await meanwhile();
    const intent = await realConfirm(id, params);
    charged.push(intent.id);
    await afterCharge(intent.id);
    return intent;
  }) as Confirm);
  return charged;
}

async function moneyOf(quoteId: number) {
  const payments = await t.db.read.getRepository(Payment).find({ where: { quoteId }, order: { id: 'ASC' } });
  const quote = await t.db.read.getRepository(Quote).findOneByOrFail({ id: quoteId });
  return { kinds: payments.map((p) => p.kind), amounts: payments.map((p) => p.amountCents), paidCents: quote.paidCents, refundedCents: quote.refundedCents, status: quote.status };
}

const reservedOf = async (spring: SpringRate) => (await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id })).reserved;

async function historyNotes(quoteId: number) {
  const res = await shop.asDesk.get(`/quotes/${quoteId}`).expect(200);
  return (res.body.quote.history as { from: string | null; to: string; note: string; actor: { kind: string } }[]).filter((h) => h.from === h.to && h.note.includes('refunded'));
}

describe.each([
  ['the pay route records it first', false],
  ['the webhook records it first', true],
])('the desk cancels while the card is charged; %s', (_, webhookFirst) => {
  test('the deposit is refunded once, the pay route says so, and webhook replays change nothing', async () => {
    const { quote, token } = await acceptedQuote();
    const refunds = jest.spyOn(sdk.refunds, 'create');
    const charged = holdCharge(
      () => shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Rider rang to call it off' }).expect(200),
      async (intentId) => {
        if (webhookFirst) expect((await deliverWebhook(intentId)).body).toEqual({ received: true, duplicate: false });
      },
    );
    const paid = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(409);
    expect(paid.body.error.code).toBe('deposit-refunded');
    expect(paid.body.error.message).toContain('EUR 146.46');
    expect(paid.body.error.message).not.toMatch(/stripe/i);

    const [intentId] = charged;
    if (!webhookFirst) expect((await deliverWebhook(intentId)).body).toEqual({ received: true, duplicate: false });
    expect((await deliverWebhook(intentId)).body).toEqual({ received: true, duplicate: true });

    // 30 % of 48820 (the hand-worked total of quote-flow.test.ts), round half up: 14646.
    expect(await moneyOf(quote.id)).toEqual({ kinds: ['deposit', 'refund'], amounts: [14646, 14646], paidCents: 14646, refundedCents: 14646, status: 'cancelled' });
    expect(refunds).toHaveBeenCalledTimes(1);
    expect(refunds.mock.calls[0][0]).toMatchObject({ payment_intent: intentId, amount: 14646 });
    const notes = await historyNotes(quote.id);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatchObject({ from: 'cancelled', to: 'cancelled', actor: { kind: 'payment' } });
    expect(notes[0].note).toContain(intentId);
    const view = (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote;
    expect(view).toMatchObject({ status: 'cancelled', paidCents: 14646, refundedCents: 14646, balanceDueCents: 0 });
  });
});

test('a deposit recorded just before the cancel is refunded by the cancel, and the late pay answer and replays add nothing', async () => {
  const { quote, token } = await acceptedQuote();
  const refunds = jest.spyOn(sdk.refunds, 'create');
  const charged = holdCharge(
    async () => undefined,
    async (intentId) => {
      await deliverWebhook(intentId).expect(200);
      await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Rider rang to call it off' }).expect(200);
    },
  );
  const paid = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(409);
  expect(paid.body.error.code).toBe('deposit-refunded');
  expect((await deliverWebhook(charged[0])).body).toEqual({ received: true, duplicate: true });
  expect(await moneyOf(quote.id)).toEqual({ kinds: ['deposit', 'refund'], amounts: [14646, 14646], paidCents: 14646, refundedCents: 14646, status: 'cancelled' });
  expect(refunds).toHaveBeenCalledTimes(1);
  // The cancel refunded it, so the history has the cancel and no late-deposit note.
  expect(await historyNotes(quote.id)).toEqual([]);
});

test('a second payment from another tab is refunded, and the first one stays', async () => {
  const { quote, token } = await acceptedQuote();
  const refunds = jest.spyOn(sdk.refunds, 'create');
  let otherTab: request.Response | undefined;
  holdCharge(async () => {
    otherTab = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_mastercard' });
  });
  const late = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(409);
  expect(otherTab?.status).toBe(200);
  expect(otherTab?.body.receipt).toMatchObject({ amountCents: 14646, last4: '4444' });
  expect(late.body.error).toMatchObject({ code: 'deposit-refunded' });
  expect(late.body.error.message).toMatch(/already been paid/);
  expect(await moneyOf(quote.id)).toEqual({ kinds: ['deposit', 'deposit', 'refund'], amounts: [14646, 14646, 14646], paidCents: 29292, refundedCents: 14646, status: 'deposit-paid' });
  expect(refunds).toHaveBeenCalledTimes(1);
  const view = (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote;
  expect(view.receipt).toMatchObject({ last4: '4444' });
  expect(view.balanceDueCents).toBe(48820 - 14646);

  // Cancelling now gives back the deposit that was kept, and only that one.
  const cancelled = await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Rider changed plans' }).expect(200);
  expect(cancelled.body.quote).toMatchObject({ paidCents: 29292, refundedCents: 29292 });
  expect(refunds).toHaveBeenCalledTimes(2);
  expect(refunds.mock.calls[1][0]).toMatchObject({ payment_intent: otherTab?.body.receipt.intentId });
});

describe.each([
  ['the pay route records it first', false],
  ['the webhook records it first', true],
])('the quote expires while the card is charged; %s', (_, webhookFirst) => {
  test('the deposit is refunded once and the springs stay released', async () => {
    const { quote, token } = await acceptedQuote();
    const held = await reservedOf(shop.forkSpring);
    const refunds = jest.spyOn(sdk.refunds, 'create');
    const charged = holdCharge(
      async () => {
        t.advanceClock(31 * 24 * 3600 * 1000);
        // Any read runs the lazy expiry; a fresh token, as the clock moved past the old one.
        const read = await (await as(t, shop.desk)).get(`/quotes/${quote.id}`).expect(200);
        expect(read.body.quote.status).toBe('expired');
      },
      async (intentId) => {
        if (webhookFirst) await deliverWebhook(intentId).expect(200);
      },
    );
    const paid = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(409);
    expect(paid.body.error.code).toBe('deposit-refunded');
    expect(paid.body.error.message).toMatch(/expired/);
    if (!webhookFirst) await deliverWebhook(charged[0]).expect(200);
    expect((await deliverWebhook(charged[0])).body).toEqual({ received: true, duplicate: true });

    expect(await moneyOf(quote.id)).toEqual({ kinds: ['deposit', 'refund'], amounts: [14646, 14646], paidCents: 14646, refundedCents: 14646, status: 'expired' });
    expect(refunds).toHaveBeenCalledTimes(1);
    expect(await reservedOf(shop.forkSpring)).toBe(held - 2);
    const notes = (await (await as(t, shop.desk)).get(`/quotes/${quote.id}`).expect(200)).body.quote.history.filter((h: { from: string; to: string }) => h.from === h.to);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatchObject({ from: 'expired', to: 'expired' });
    expect(notes[0].note).toContain('refunded');
  });
});

test('a signed-in rider cannot pay a quote whose validity date has passed, even before the lazy expiry ran', async () => {
  const quote = await createQuote(shop);
  await sendQuote(t, shop, quote.id);
  await shop.asRider.post(`/quotes/${quote.id}/accept`).expect(200);
  t.advanceClock(31 * 24 * 3600 * 1000);
  const confirm = jest.spyOn(sdk.paymentIntents, 'create');
  const res = await (await as(t, shop.rider)).post(`/quotes/${quote.id}/pay-deposit`, { paymentMethod: 'pm_card_visa' }).expect(409);
  expect(res.body.error.code).toBe('expired');
  expect(confirm).not.toHaveBeenCalled();
  expect((await moneyOf(quote.id)).kinds).toEqual([]);
});
