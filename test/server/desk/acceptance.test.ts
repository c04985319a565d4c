/**
 * Points of the service desk's acceptance the flow test leaves implicit, over HTTP on a real
 * SQLite file: every *Cents field of every answer along the whole flow is an integer and every
 * stored *Cents value is an SQLite integer (an INTEGER column still stores 70.5 as REAL, so the
 * declared type alone proves nothing; SQLite's "Datatypes In SQLite", type affinity); each status
 * event says who and when; the balance due shows at booking and at fitting; the swap's preload is
 * the sizing record's own; a sent quote revises into a new version; a booked quote cancels with
 * its springs released and its deposit refunded; a sent quote expires without touching stock.
 */
import request from 'supertest';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { as } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { centsFields, createQuote, DeskShop, fullSwapLines, listen, sendQuote, setUpDeskShop } from './helpers';

// Accounts hashed with argon2, sizings and the card stand-in: slow on a busy machine.
jest.setTimeout(60_000);

let t: TestContext;
let shop: DeskShop;
let server: { base: string; close: () => Promise<void> };

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t, { fork: 10, shock: 5 });
  server = await listen(t);
  t.payments.standIn!.setWebhookUrl(`${server.base}/api/payments/webhook`);
});
beforeEach(async () => {
  shop.asDesk = await as(t, shop.desk);
});
afterAll(async () => {
  await server.close();
  await t.dispose();
});

const DAY_MS = 24 * 3600 * 1000;
const spring = (id: number) => t.db.read.getRepository(SpringRate).findOneByOrFail({ id });

test('along the whole flow every *Cents answer is an integer, every event says who and when, and the balance shows at fitting', async () => {
  const answers: { route: string; body: unknown }[] = [];
  const keep = async <R extends { body: unknown }>(route: string, call: PromiseLike<R>): Promise<R> => {
    const res = await call;
    answers.push({ route, body: res.body });
    return res;
  };
  const started = t.now().getTime();

  const created = await keep('POST /quotes', shop.asDesk.post('/quotes', { sizingRecordId: shop.recordId }).expect(201));
  const quote = created.body.quote;
  await keep('GET /quotes/:id/spring-options', shop.asDesk.get(`/quotes/${quote.id}/spring-options`).expect(200));
  await keep('PUT /quotes/:id/lines', shop.asDesk.put(`/quotes/${quote.id}/lines`, { lines: [...fullSwapLines(shop), { kind: 'labour', operationCode: 'fork-oil' }] }).expect(200));
  const { token } = await sendQuote(t, shop, quote.id);
  await keep('GET /customer-quotes/:token', request(t.app).get(`/api/customer-quotes/${token}`).expect(200));
  await keep('POST /customer-quotes/:token/accept', request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200));
  const paid = await keep('POST /customer-quotes/:token/pay-deposit', request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200));
  await t.payments.standIn!.idle();
  const fittingAt = new Date(t.now().getTime() + 2 * DAY_MS).toISOString();
  const booked = await keep('POST /quotes/:id/book', shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt }).expect(200));
  const riderView = await keep('GET /quotes/:id (rider)', shop.asRider.get(`/quotes/${quote.id}`).expect(200));
  const fitted = await keep('POST /quotes/:id/fitted', shop.asDesk.post(`/quotes/${quote.id}/fitted`).expect(200));
  await keep('GET /quotes', shop.asDesk.get('/quotes').expect(200));
  await keep('GET /quotes (rider)', shop.asRider.get('/quotes').expect(200));
  const finished = t.now().getTime();

  const fields = answers.flatMap(({ route, body }) => centsFields(body).map((f) => ({ route, ...f })));
  expect(new Set(fields.map((f) => f.route)).size).toBe(answers.length);
  expect(fields.filter((f) => f.value !== null && !Number.isInteger(f.value))).toEqual([]);

  // What is left to pay at the fitting: the total less the deposit, on the desk's answers and the rider's.
  const { totalCents } = fitted.body.quote;
  const depositCents = paid.body.receipt.amountCents;
  expect(depositCents).toBeGreaterThan(0);
  expect(booked.body.quote.balanceDueCents).toBe(totalCents - depositCents);
  expect(riderView.body.quote).toMatchObject({ balanceDueCents: totalCents - depositCents, fittingAt });
  expect(fitted.body.quote.balanceDueCents).toBe(totalCents - depositCents);

  const history: { from: string | null; to: string; at: string; actor: { kind: string; id: number | null; name: string } }[] = fitted.body.quote.history;
  expect(history.map((h) => [h.to, h.actor.kind, h.actor.id])).toEqual([
    ['draft', 'staff', shop.desk.id],
    ['sent', 'staff', shop.desk.id],
    ['accepted', 'customer-link', null],
    ['deposit-paid', 'payment', null],
    ['booked', 'staff', shop.desk.id],
    ['fitted', 'staff', shop.desk.id],
  ]);
  expect(history.filter((h) => h.actor.kind === 'staff').every((h) => h.actor.name === shop.desk.name)).toBe(true);
  const times = history.map((h) => Date.parse(h.at));
  expect(times.every((at) => at >= started && at <= finished)).toBe(true);
  expect([...times].sort((a, b) => a - b)).toEqual(times);

  // The swap's preload is what the sizing record advised for the fitted spring, where it advised one.
  const record = (await shop.asDesk.get(`/sizing-records/${shop.recordId}`).expect(200)).body.record;
  const swap = (await shop.asRider.get(`/bikes/${shop.bikeId}/setup-log`).expect(200)).body.entries.at(-1);
  const springLines = fitted.body.quote.lines.filter((l: { kind: string }) => l.kind === 'spring');
  expect(springLines.length).toBeGreaterThan(0);
  for (const line of springLines) {
    const end = line.end as 'front' | 'rear';
    const advice = record.result[end].recommendation.candidates.find((c: { sku: string }) => c.sku === line.sku);
    expect(typeof advice.setPreloadMm).toBe('number');
    expect(swap.after[end]).toMatchObject({ rateNmm: advice.rateNmm, preloadMm: advice.setPreloadMm, preloadPosition: advice.position });
  }
});

test('every stored *Cents value is an SQLite integer, in every table that has one', async () => {
  const tables: { name: string }[] = await t.db.read.query(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`);
  const checked: string[] = [];
  for (const { name } of tables) {
    const columns: { name: string; type: string }[] = await t.db.read.query(`PRAGMA table_info("${name}")`);
    for (const column of columns.filter((c) => /Cents/.test(c.name))) {
      expect(`${name}.${column.name} ${column.type}`).toBe(`${name}.${column.name} INTEGER`);
      const [row]: { stored: number; other: number }[] = await t.db.read.query(
        `SELECT count("${column.name}") AS stored, sum(typeof("${column.name}") <> 'integer' AND "${column.name}" IS NOT NULL) AS other FROM "${name}"`,
      );
      expect({ column: `${name}.${column.name}`, other: row.other ?? 0 }).toEqual({ column: `${name}.${column.name}`, other: 0 });
      if (row.stored > 0) checked.push(`${name}.${column.name}`);
    }
  }
  expect(checked).toEqual(expect.arrayContaining(['quote.totalCents', 'quote.paidCents', 'quote_line.lineCents', 'payment.amountCents', 'shop_settings.labourRateCentsPerHour', 'spring_rate.priceCents']));
});

test('a sent quote revises into a new draft version; the old link dies and the new one is sent afresh', async () => {
  const quote = await createQuote(shop);
  const first = await sendQuote(t, shop, quote.id);
  const revised = await shop.asDesk.post(`/quotes/${quote.id}/revise`).expect(201);
  expect(revised.body.quote).toMatchObject({ number: quote.number, version: 2, previousId: quote.id, status: 'draft', totalCents: quote.totalCents });
  expect(revised.body.quote.lines.map((l: { sku: string | null; operationCode: string | null }) => l.sku ?? l.operationCode)).toEqual(
    quote.lines.map((l: { sku: string | null; operationCode: string | null }) => l.sku ?? l.operationCode),
  );
  const old = (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote;
  expect(old).toMatchObject({ status: 'superseded', supersededById: revised.body.quote.id });
  expect(old.history.at(-1)).toMatchObject({ from: 'sent', to: 'superseded', actor: { kind: 'staff', id: shop.desk.id } });
  expect((await request(t.app).get(`/api/customer-quotes/${first.token}`).expect(404)).body.error.code).toBe('quote-link');
  await shop.asDesk.put(`/quotes/${quote.id}/lines`, { lines: [{ kind: 'labour', operationCode: 'sag-setup' }] }).expect(409);
  const second = await sendQuote(t, shop, revised.body.quote.id);
  expect((await request(t.app).get(`/api/customer-quotes/${second.token}`).expect(200)).body.quote).toMatchObject({ id: revised.body.quote.id, version: 2 });
});

test('cancelling a booked quote releases its springs and refunds its deposit', async () => {
  const quote = await createQuote(shop);
  const { token } = await sendQuote(t, shop, quote.id);
  const shelf = (await spring(shop.forkSpring.id)).reserved;
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  expect((await spring(shop.forkSpring.id)).reserved).toBe(shelf + 2);
  await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  await t.payments.standIn!.idle();
  await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt: new Date(t.now().getTime() + DAY_MS).toISOString() }).expect(200);
  const cancelled = await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Bike sold' }).expect(200);
  expect(cancelled.body.quote).toMatchObject({ status: 'cancelled', paidCents: quote.depositDueCents, refundedCents: quote.depositDueCents, balanceDueCents: 0 });
  expect(cancelled.body.quote.history.at(-1)).toMatchObject({ from: 'booked', to: 'cancelled', note: 'Bike sold', actor: { kind: 'staff', id: shop.desk.id } });
  expect((await spring(shop.forkSpring.id)).reserved).toBe(shelf);
  await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Twice' }).expect(409);
});

test('a sent quote expires by itself, recorded as the system at its time, with no stock moved', async () => {
  const quote = await createQuote(shop);
  await sendQuote(t, shop, quote.id);
  const before = await Promise.all([spring(shop.forkSpring.id), spring(shop.shockSpring.id)]);
  t.advanceClock(31 * DAY_MS);
  const listedAt = t.now().getTime();
  const board = await (await as(t, shop.desk)).get('/quotes?status=expired').expect(200);
  expect(board.body.quotes.map((q: { id: number }) => q.id)).toContain(quote.id);
  const read = (await (await as(t, shop.desk)).get(`/quotes/${quote.id}`).expect(200)).body.quote;
  const expired = read.history.at(-1);
  expect(expired).toMatchObject({ from: 'sent', to: 'expired', actor: { kind: 'system', id: null } });
  expect(Date.parse(expired.at)).toBeGreaterThanOrEqual(listedAt);
  expect(await Promise.all([spring(shop.forkSpring.id), spring(shop.shockSpring.id)])).toEqual(before);
});

test('an acceptance short of one spring reserves none of them and leaves the quote sent', async () => {
  const shock = await spring(shop.shockSpring.id);
  const tooMany = shock.onHand - shock.reserved + 1;
  const quote = await createQuote(shop, [
    { kind: 'spring', springId: shop.forkSpring.id, end: 'front', quantity: 2 },
    { kind: 'spring', springId: shop.shockSpring.id, end: 'rear', quantity: tooMany },
  ]);
  const { token } = await sendQuote(t, shop, quote.id);
  const fork = await spring(shop.forkSpring.id);
  const refused = await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(409);
  expect(refused.body.error.code).toBe('out-of-stock');
  expect(refused.body.error.message).toContain(shop.shockSpring.sku);
  expect(await spring(shop.forkSpring.id)).toEqual(fork);
  expect(await spring(shop.shockSpring.id)).toEqual(shock);
  expect((await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote.status).toBe('sent');
});
