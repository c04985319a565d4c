/** The rider's signed-in equivalents of the link's actions, and the moves the flow refuses. */
import request from 'supertest';
import { makeTestContext, TestContext } from '../test-context';
import { READINGS } from '../rider/helpers';
import { createQuote, DeskShop, sendQuote, setUpDeskShop } from './helpers';

let t: TestContext;
let shop: DeskShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t, { fork: 10, shock: 5 });
});
afterAll(() => t.dispose());

test('a signed-in rider accepts and pays their own quote', async () => {
  const quote = await createQuote(shop);
  await shop.asRider.post(`/quotes/${quote.id}/accept`).expect(409);
  await sendQuote(t, shop, quote.id);
  const early = await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt: new Date(t.now().getTime() + 86_400_000).toISOString() }).expect(409);
  expect(early.body.error.code).toBe('bad-status');
  const accepted = await shop.asRider.post(`/quotes/${quote.id}/accept`).expect(200);
  expect(accepted.body.quote.history.at(-1).actor).toMatchObject({ kind: 'rider', id: shop.rider.id });
  const unpaid = await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt: new Date(t.now().getTime() + 86_400_000).toISOString() }).expect(409);
  expect(unpaid.body.error.code).toBe('deposit-due');
  await shop.asOtherRider.post(`/quotes/${quote.id}/pay-deposit`, { paymentMethod: 'pm_card_visa' }).expect(404);
  await shop.asRider.post(`/quotes/${quote.id}/pay-deposit`, {}).expect(400);
  const paid = await shop.asRider.post(`/quotes/${quote.id}/pay-deposit`, { paymentMethod: 'pm_card_mastercard' }).expect(200);
  expect(paid.body.receipt).toMatchObject({ amountCents: quote.depositDueCents, last4: '4444' });
  const again = await shop.asRider.post(`/quotes/${quote.id}/pay-deposit`, { paymentMethod: 'pm_card_visa' }).expect(409);
  expect(again.body.error.code).toBe('already-paid');
  const past = await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt: '2020-01-01T09:00:00Z' }).expect(400);
  expect(past.body.error.fields.fittingAt).toBeDefined();
  await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt: 'soon' }).expect(400);
});

test('a rider declines by the link; a declined quote can be revised but not accepted', async () => {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  const declined = await request(t.app).post(`/api/customer-quotes/${token}/decline`).send({ reason: 'Too dear' }).expect(200);
  expect(declined.body.quote.status).toBe('declined');
  expect(declined.body.quote.history.at(-1)).toMatchObject({ to: 'declined', note: 'Too dear', actor: { kind: 'customer-link' } });
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(409);
  const revised = await shop.asDesk.post(`/quotes/${quote.id}/revise`).expect(201);
  expect(revised.body.quote.version).toBe(2);
  await request(t.app).get(`/api/customer-quotes/${token}`).expect(404);
});

test('a rider asks the shop to quote for a saved result, once while that quote is open', async () => {
  const record = await shop.asRider.post(`/bikes/${shop.bikeId}/sizing-records`, { readings: READINGS }).expect(201);
  const recordId = record.body.record.id;
  await shop.asOtherRider.post(`/sizing-records/${recordId}/quote-request`).expect(404);

  const asked = await shop.asRider.post(`/sizing-records/${recordId}/quote-request`).expect(201);
  expect(asked.body.created).toBe(true);
  expect(asked.body.quote).toMatchObject({ status: 'draft', sizingRecordId: recordId });
  expect(asked.body.quote.lines.length).toBeGreaterThan(0);
  expect(asked.body.quote.history[0]).toMatchObject({ to: 'draft', actor: { kind: 'rider', id: shop.rider.id } });

  const again = await shop.asRider.post(`/sizing-records/${recordId}/quote-request`).expect(200);
  expect(again.body).toMatchObject({ created: false, quote: { id: asked.body.quote.id } });

  const board = await shop.asDesk.get('/quotes?status=draft').expect(200);
  expect(board.body.quotes.map((q: { id: number }) => q.id)).toContain(asked.body.quote.id);
});
