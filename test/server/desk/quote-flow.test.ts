/**
 * The whole desk flow over HTTP on a real SQLite file: size, quote, send (the mail in the outbox),
 * accept by the link, pay the deposit through the payment SDK against the local stand-in (a
 * decline, then a success, the signed webhook and its replay), book, fit (stock consumed, the swap
 * in the setup log). Amounts are worked by hand below with the rule of shared/money/quote-totals.
 */
import request from 'supertest';
import { Payment } from '../../../server/entities/payment.entity';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { StockMovement } from '../../../server/entities/stock-movement.entity';
import { as } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { centsFields, createQuote, DeskShop, listen, sendQuote, setUpDeskShop } from './helpers';

let t: TestContext;
let shop: DeskShop;
let server: { base: string; close: () => Promise<void> };

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t);
  server = await listen(t);
  t.payments.standIn!.setWebhookUrl(`${server.base}/api/payments/webhook`);
});
afterAll(async () => {
  await server.close();
  await t.dispose();
});

const spring = (id: number) => t.db.read.getRepository(SpringRate).findOneByOrFail({ id });

test('a quote goes from sizing to fitted, with the deposit paid once and the springs reserved then fitted', async () => {
  const quote = await createQuote(shop);
  expect(quote.status).toBe('draft');
  expect(quote.number).toMatch(/^Q-\d{4}-0001$/);
  // Hand-worked (invented prices, test settings 70.00/h, 20 % tax, 30 % deposit):
  // springs 2 x 6550 + 1 x 13000 = 26100; labour 60 min -> 7000, 45 min -> 5250, 20 min -> 2333.33 -> 2333;
  // subtotal 40683; tax 40683 x 0.2 = 8136.6 -> 8137; total 48820; deposit 48820 x 0.3 = 14646.
  expect(quote.lines.map((l: { lineCents: number }) => l.lineCents)).toEqual([13100, 7000, 13000, 5250, 2333]);
  expect(quote).toMatchObject({ partsCents: 26100, labourCents: 14583, subtotalCents: 40683, taxCents: 8137, totalCents: 48820, depositDueCents: 14646, balanceDueCents: 48820 });
  expect(quote.shop.name).toBe('Test Suspension Works');

  const { token, text, html } = await sendQuote(t, shop, quote.id);
  expect(text).toContain(`/q/${token}`);
  expect(text).toContain('EUR 488.20');
  expect(text).toContain('EUR 146.46');
  expect(html).toContain(`/q/${token}`);
  expect(token).toHaveLength(43);

  const link = await request(t.app).get(`/api/customer-quotes/${token}`).expect(200);
  expect(link.body.quote).toMatchObject({ id: quote.id, status: 'sent', totalCents: 48820, cautions: 'Test cautions.' });
  for (const field of centsFields(link.body)) expect(Number.isInteger(field.value)).toBe(true);

  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  expect((await spring(shop.forkSpring.id)).reserved).toBe(2);
  expect((await spring(shop.shockSpring.id)).reserved).toBe(1);

  const declined = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_chargeDeclined' }).expect(402);
  expect(declined.body.error.code).toBe('card-declined');
  expect(declined.body.error.message).toMatch(/declined/);
  expect(declined.body.error.message).not.toMatch(/stripe/i);
  const stillDue = await request(t.app).get(`/api/customer-quotes/${token}`).expect(200);
  expect(stillDue.body.quote).toMatchObject({ status: 'accepted', paidCents: 0, depositDueCents: 14646 });

  const paid = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  expect(paid.body.receipt).toMatchObject({ amountCents: 14646, method: 'card', last4: '4242' });
  expect(paid.body.receipt.intentId).toMatch(/^pi_/);
  expect(paid.body.quote.status).toBe('deposit-paid');

  await t.payments.standIn!.idle();
  const delivered = t.payments.standIn!.deliveries.filter((d) => JSON.parse(d.payload).type === 'payment_intent.succeeded');
  expect(delivered).toHaveLength(1);
  expect(delivered[0].status).toBe(200);
  const replay = await request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', delivered[0].signature).send(delivered[0].payload).expect(200);
  expect(replay.body).toEqual({ received: true, duplicate: true });
  expect(await t.db.read.getRepository(Payment).countBy({ quoteId: quote.id })).toBe(1);

  const fittingAt = new Date(t.now().getTime() + 3 * 24 * 3600 * 1000).toISOString();
  const booked = await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt }).expect(200);
  expect(booked.body.quote).toMatchObject({ status: 'booked', fittingAt, balanceDueCents: 48820 - 14646 });
  const riderView = await request(t.app).get(`/api/customer-quotes/${token}`).expect(200);
  expect(riderView.body.quote.fittingAt).toBe(fittingAt);

  const fitted = await shop.asDesk.post(`/quotes/${quote.id}/fitted`).expect(200);
  expect(fitted.body.quote.status).toBe('fitted');
  expect(fitted.body.quote.history.map((h: { to: string }) => h.to)).toEqual(['draft', 'sent', 'accepted', 'deposit-paid', 'booked', 'fitted']);
  expect(await spring(shop.forkSpring.id)).toMatchObject({ onHand: 2, reserved: 0 });
  expect(await spring(shop.shockSpring.id)).toMatchObject({ onHand: 1, reserved: 0 });
  const kinds = await t.db.read.getRepository(StockMovement).find({ where: { quoteId: quote.id }, order: { id: 'ASC' } });
  expect(kinds.map((m) => m.kind)).toEqual(['reserve', 'reserve', 'fit', 'fit']);

  const log = await shop.asRider.get(`/bikes/${shop.bikeId}/setup-log`).expect(200);
  const swap = log.body.entries.at(-1);
  expect(swap.kind).toBe('change');
  expect(swap.note).toContain(quote.number);
  expect(swap.after.front.rateNmm).toBe(9.5);
  expect(swap.after.rear.rateNmm).toBe(100);
  const bike = await shop.asRider.get(`/bikes/${shop.bikeId}`).expect(200);
  expect(bike.body.bike.front.rateNmm).toBe(9.5);
  expect(bike.body.bike.rear.rateNmm).toBe(100);
});

test('a quote without lines starts from the springs its sizing record\'s decision puts forward', async () => {
  const res = await shop.asDesk.post('/quotes', { sizingRecordId: shop.recordId }).expect(201);
  const record = await shop.asDesk.get(`/sizing-records/${shop.recordId}`).expect(200);
  const result = record.body.record.result;
  const expectedSkus = (['front', 'rear'] as const).map((end) => result[end]?.decision.pick?.sku).filter(Boolean);
  expect(expectedSkus.length).toBeGreaterThan(0);
  const springLines = res.body.quote.lines.filter((l: { kind: string }) => l.kind === 'spring');
  expect(springLines.map((l: { sku: string }) => l.sku).sort()).toEqual(expectedSkus.sort());
  expect(res.body.quote.lines.some((l: { operationCode: string }) => l.operationCode === 'sag-setup')).toBe(true);
});

test('cancelling a paid quote refunds the deposit and releases the springs', async () => {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  const before = await spring(shop.shockSpring.id);
  await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  const cancelled = await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Rider sold the bike' }).expect(200);
  expect(cancelled.body.quote).toMatchObject({ status: 'cancelled', paidCents: 14646, refundedCents: 14646, balanceDueCents: 0 });
  expect((await spring(shop.shockSpring.id)).reserved).toBe(before.reserved - 1);
  const kinds = (await t.db.read.getRepository(Payment).findBy({ quoteId: quote.id })).map((p) => p.kind).sort();
  expect(kinds).toEqual(['deposit', 'refund']);
});

test('a quote past its validity date reads as expired, releases its springs, and its link dies', async () => {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  const held = (await spring(shop.forkSpring.id)).reserved;
  t.advanceClock(31 * 24 * 3600 * 1000);
  // A fresh access token: the earlier one lapsed with the clock.
  const asDesk = await as(t, shop.desk);
  const read = await asDesk.get(`/quotes/${quote.id}`).expect(200);
  expect(read.body.quote.status).toBe('expired');
  expect((await spring(shop.forkSpring.id)).reserved).toBe(held - 2);
  const dead = await request(t.app).get(`/api/customer-quotes/${token}`).expect(404);
  expect(dead.body.error.code).toBe('quote-link');

  const revised = await asDesk.post(`/quotes/${quote.id}/revise`).expect(201);
  expect(revised.body.quote).toMatchObject({ number: quote.number, version: 2, previousId: quote.id, status: 'draft' });
  const old = await asDesk.get(`/quotes/${quote.id}`).expect(200);
  expect(old.body.quote).toMatchObject({ status: 'superseded', supersededById: revised.body.quote.id });
});
