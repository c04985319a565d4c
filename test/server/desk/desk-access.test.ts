/**
 * Who reaches which quote: riders their own only; a quote link its one quote and nothing else;
 * the payment webhook only with a valid signature. Also the desk's customer search and walk-ins,
 * the admin's settings, and the money columns' storage class.
 */
import request from 'supertest';
import { signWebhookPayload } from '../../../server/fakes/payment-service';
import { Payment } from '../../../server/entities/payment.entity';
import { Quote } from '../../../server/entities/quote.entity';
import { makeTestContext, TestContext } from '../test-context';
import { centsFields, createQuote, DeskShop, sendQuote, setUpDeskShop, TEST_SETTINGS } from './helpers';

let t: TestContext;
let shop: DeskShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t);
});
afterAll(() => t.dispose());

test('riders list and read only their own quotes; desk sees all', async () => {
  const quote = await createQuote(shop);
  const own = await shop.asRider.get('/quotes').expect(200);
  expect(own.body.quotes.map((q: { id: number }) => q.id)).toContain(quote.id);
  await shop.asRider.get(`/quotes/${quote.id}`).expect(200);
  const other = await shop.asOtherRider.get('/quotes').expect(200);
  expect(other.body.quotes).toEqual([]);
  await shop.asOtherRider.get(`/quotes/${quote.id}`).expect(404);
  await shop.asOtherRider.post(`/quotes/${quote.id}/accept`).expect(404);
  const board = await shop.asDesk.get(`/quotes?status=draft&q=${encodeURIComponent(shop.rider.email)}`).expect(200);
  expect(board.body.quotes.map((q: { id: number }) => q.id)).toContain(quote.id);
  const none = await shop.asDesk.get('/quotes?status=fitted').expect(200);
  expect(none.body.quotes).toEqual([]);
  await shop.asDesk.get('/quotes?status=lost').expect(400);
});

test('lines change only in a draft, and bad lines get messages per field', async () => {
  const quote = await createQuote(shop);
  const bad = await shop.asDesk.put(`/quotes/${quote.id}/lines`, { lines: [{ kind: 'spring', springId: shop.shockSpring.id, end: 'front' }, { kind: 'labour', operationCode: 'polish' }] }).expect(400);
  expect(Object.keys(bad.body.error.fields).sort()).toEqual(['lines[0].springId', 'lines[1].operationCode']);
  const edited = await shop.asDesk.put(`/quotes/${quote.id}/lines`, { lines: [{ kind: 'labour', operationCode: 'fork-oil', quantity: 1 }] }).expect(200);
  // 40 min at 70.00/h = 46.666 -> 46.67; 20 % tax 9.334 -> 9.33 (half to even, not a half).
  expect(edited.body.quote).toMatchObject({ subtotalCents: 4667, taxCents: 933, totalCents: 5600 });
  await sendQuote(t, shop, quote.id);
  const locked = await shop.asDesk.put(`/quotes/${quote.id}/lines`, { lines: [] }).expect(409);
  expect(locked.body.error.code).toBe('not-draft');
});

test('a quote link opens its one quote and nothing else', async () => {
  const [a, b] = [await createQuote(shop), await createQuote(shop)];
  const { token } = await sendQuote(t, shop, a.id);
  await sendQuote(t, shop, b.id);
  const view = await request(t.app).get(`/api/customer-quotes/${token}`).expect(200);
  expect(view.body.quote.id).toBe(a.id);
  // As a bearer token it opens nothing.
  await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`).expect(401);
  await request(t.app).get(`/api/quotes/${b.id}`).set('Authorization', `Bearer ${token}`).expect(401);
  // Altered by one character, it opens nothing.
  const altered = token.slice(0, -1) + (token.endsWith('A') ? 'B' : 'A');
  await request(t.app).get(`/api/customer-quotes/${altered}`).expect(404);
  await request(t.app).post(`/api/customer-quotes/${altered}/accept`).expect(404);
  // Only its hash is stored.
  const row = await t.db.read.getRepository(Quote).findOneByOrFail({ id: a.id });
  expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
  expect(row.tokenHash).not.toContain(token);
});

test('the webhook refuses an unsigned or wrongly signed event and changes nothing', async () => {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  const payload = JSON.stringify({
    id: 'evt_forged',
    object: 'event',
    type: 'payment_intent.succeeded',
    data: { object: { id: 'pi_forged', object: 'payment_intent', amount: 14646, status: 'succeeded', metadata: { quoteId: String(quote.id) } } },
  });
  const unsigned = await request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').send(payload).expect(400);
  expect(unsigned.body.error.code).toBe('bad-signature');
  const forged = await request(t.app)
    .post('/api/payments/webhook')
    .set('content-type', 'application/json')
    .set('stripe-signature', signWebhookPayload(payload, 'whsec_not_the_secret'))
    .send(payload)
    .expect(400);
  expect(forged.body.error.code).toBe('bad-signature');
  expect(await t.db.read.getRepository(Payment).countBy({ quoteId: quote.id })).toBe(0);
  expect((await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote.status).toBe('accepted');
  // Signed with the real secret, the same event is taken: the signature is what decides.
  await request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signWebhookPayload(payload, t.payments.webhookSecret!)).send(payload).expect(200);
  expect((await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote.status).toBe('deposit-paid');
});

test('every *Cents field in the answers is an integer, and every money column is INTEGER', async () => {
  const quote = await createQuote(shop);
  const answers = [
    (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body,
    (await shop.asDesk.get('/quotes').expect(200)).body,
    (await shop.asDesk.get('/shop-settings').expect(200)).body,
    (await shop.asDesk.get(`/quotes/${quote.id}/spring-options`).expect(200)).body,
  ];
  const fields = answers.flatMap((body) => centsFields(body));
  expect(fields.length).toBeGreaterThan(10);
  expect(fields.filter((f) => f.value !== null && !Number.isInteger(f.value))).toEqual([]);
  for (const table of ['quote', 'quote_line', 'payment', 'shop_settings']) {
    const columns: { name: string; type: string }[] = await t.db.read.query(`PRAGMA table_info("${table}")`);
    const money = columns.filter((c) => /Cents/.test(c.name));
    expect(money.length).toBeGreaterThan(0);
    expect(money.filter((c) => c.type !== 'INTEGER')).toEqual([]);
  }
});

test('the desk finds riders by name or e-mail with their bike count, and opens a walk-in account', async () => {
  const found = await shop.asDesk.get(`/customers?q=${encodeURIComponent(shop.rider.email.toUpperCase())}`).expect(200);
  expect(found.body.customers).toEqual([expect.objectContaining({ id: shop.rider.id, bikes: 1 })]);
  const staff = await shop.asDesk.get(`/customers?q=${encodeURIComponent(shop.desk.email)}`).expect(200);
  expect(staff.body.customers).toEqual([]);
  const walkIn = await shop.asDesk.post('/customers', { name: 'Walk In', email: 'walk.in@example.test' }).expect(201);
  expect(walkIn.body.customer).toMatchObject({ name: 'Walk In', email: 'walk.in@example.test', bikes: 0 });
  const taken = await shop.asDesk.post('/customers', { name: 'Again', email: 'walk.in@example.test' }).expect(409);
  expect(taken.body.error.fields.email).toBeDefined();
  await shop.asDesk.post('/customers', { name: '', email: 'nope' }).expect(400);
});

test('the admin sets the shop settings, validated field by field', async () => {
  const bad = await shop.asAdmin.put('/shop-settings', { ...TEST_SETTINGS, labourRateCentsPerHour: 70.5, taxBasisPoints: -1, operations: [{ code: 'A B', label: '', minutes: 0 }] }).expect(400);
  expect(Object.keys(bad.body.error.fields).sort()).toEqual(['labourRateCentsPerHour', 'operations[0].code', 'operations[0].label', 'operations[0].minutes', 'taxBasisPoints']);
  const good = await shop.asAdmin.put('/shop-settings', { ...TEST_SETTINGS, deposit: { kind: 'fixed', cents: 5000 } }).expect(200);
  expect(good.body.settings.deposit).toEqual({ kind: 'fixed', cents: 5000 });
  await shop.asDesk.put('/shop-settings', TEST_SETTINGS).expect(403);
  await shop.asAdmin.put('/shop-settings', TEST_SETTINGS).expect(200);
});
