/**
 * Reservations belong to their holder, over HTTP on a real SQLite file: a quote's hold or a named
 * hold made at the counter. A release names the hold it releases; a quote's hold goes only with
 * its quote (cancel, expiry, fitting) or through the counter's audited override, which leaves the
 * quote in `springs-released`, seen by the desk and the rider, and still refundable. Stock
 * figures and prices are invented test data; the checks are common practice, no source.
 */
import request from 'supertest';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { StockMovement } from '../../../server/entities/stock-movement.entity';
import { createQuote, DeskShop, listen, sendQuote, setUpDeskShop } from '../desk/helpers';
import { as, Client } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { ledgerMismatches } from './helpers';

// Accounts hashed with argon2, sizings and the card stand-in: slow on a busy machine.
jest.setTimeout(60_000);

let t: TestContext;
let shop: DeskShop;
let asCounter: Client;
let server: { base: string; close: () => Promise<void> };

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t, { fork: 10, shock: 6 });
  asCounter = await as(t, shop.counter);
  server = await listen(t);
  t.payments.standIn!.setWebhookUrl(`${server.base}/api/payments/webhook`);
});
afterAll(async () => {
  await server.close();
  await t.dispose();
});

const spring = (id: number) => t.db.read.getRepository(SpringRate).findOneByOrFail({ id });
const shockLine = (quantity = 1) => [
  { kind: 'spring', springId: shop.shockSpring.id, end: 'rear', quantity },
  { kind: 'labour', operationCode: 'shock-spring-swap' },
];

interface HoldView {
  id: number;
  springId: number;
  quantity: number;
  holder: { kind: 'manual'; name: string } | { kind: 'quote'; quoteId: number; number: string; status: string; riderName: string };
  reason: string;
  createdBy: { id: number; name: string } | null;
}

async function holdsOf(springId: number): Promise<HoldView[]> {
  return (await asCounter.get(`/stock/${springId}/holds`).expect(200)).body.holds;
}

/** The spring's reserved count against the sum of its open holds; the invariant this issue is about. */
async function reservedMatchesHolds(springId: number): Promise<void> {
  const [row]: { reserved: number; held: number }[] = await t.db.read.query(
    `SELECT s."reserved" AS reserved, coalesce((SELECT sum(h."quantity") FROM "stock_hold" h WHERE h."springId" = s."id" AND h."status" = 'open'), 0) AS held
     FROM "spring_rate" s WHERE s."id" = ?`,
    [springId],
  );
  expect(row.reserved).toBe(row.held);
}

/** A quote for `lines`, sent, accepted by its link and, when a deposit is due, paid by card. */
async function paidQuote(lines: object[]): Promise<{ id: number; number: string; token: string; depositCents: number }> {
  const quote = await createQuote(shop, lines);
  const { token } = await sendQuote(t, shop, quote.id);
  await request(t.app).post(`/api/customer-quotes/${token}/accept`).expect(200);
  const paid = await request(t.app).post(`/api/customer-quotes/${token}/pay-deposit`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  await t.payments.standIn!.idle();
  expect(paid.body.quote.status).toBe('deposit-paid');
  return { id: quote.id, number: quote.number, token, depositCents: paid.body.receipt.amountCents };
}

test("a release that names no hold is refused, and a paid quote's hold cannot be released at the counter: the quote still cancels and refunds", async () => {
  const quote = await paidQuote(shockLine());
  const before = await spring(shop.shockSpring.id);

  // The "tidy up" of the probe: a release by quantity alone no longer exists.
  const unnamed = await asCounter.post(`/stock/${shop.shockSpring.id}/release`, { quantity: 1, reason: 'Tidy up' }).expect(400);
  expect(unnamed.body.error.fields).toEqual({ holdId: expect.stringMatching(/hold/i) });

  const [hold] = (await holdsOf(shop.shockSpring.id)).filter((h) => h.holder.kind === 'quote' && h.holder.quoteId === quote.id);
  expect(hold).toMatchObject({ quantity: 1, holder: { kind: 'quote', number: quote.number, status: 'deposit-paid', riderName: shop.rider.name } });
  const refused = await asCounter.post(`/stock/${shop.shockSpring.id}/release`, { holdId: hold.id, reason: 'Tidy up' }).expect(409);
  expect(refused.body.error).toEqual({ code: 'held-by-quote', message: expect.stringContaining(quote.number) });
  expect(await spring(shop.shockSpring.id)).toEqual(before);

  const cancelled = await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Rider changed plans' }).expect(200);
  expect(cancelled.body.quote).toMatchObject({ status: 'cancelled', refundedCents: quote.depositCents });
  expect((await spring(shop.shockSpring.id)).reserved).toBe(before.reserved - 1);
  await reservedMatchesHolds(shop.shockSpring.id);
  expect(await ledgerMismatches(t)).toEqual([]);
});

test("the counter's override takes a quote's spring with a reason; the quote says so to the desk and the rider, cannot be fitted, and cancels with its deposit refunded", async () => {
  const quote = await paidQuote([
    { kind: 'spring', springId: shop.forkSpring.id, end: 'front', quantity: 2 },
    { kind: 'labour', operationCode: 'fork-spring-swap' },
    ...shockLine(),
  ]);
  const [hold] = (await holdsOf(shop.shockSpring.id)).filter((h) => h.holder.kind === 'quote' && h.holder.quoteId === quote.id);
  const fork = await spring(shop.forkSpring.id);
  const shock = await spring(shop.shockSpring.id);

  // Only the counter and the admin may override; the desk and the rider are refused by the guard.
  await shop.asDesk.post(`/stock/${shop.shockSpring.id}/override-release`, { holdId: hold.id, reason: 'Walk-in' }).expect(403);
  await shop.asRider.post(`/stock/${shop.shockSpring.id}/override-release`, { holdId: hold.id, reason: 'Walk-in' }).expect(403);
  const missing = await asCounter.post(`/stock/${shop.shockSpring.id}/override-release`, { holdId: hold.id }).expect(400);
  expect(Object.keys(missing.body.error.fields)).toEqual(['reason']);
  await asCounter.post(`/stock/${shop.forkSpring.id}/override-release`, { holdId: hold.id, reason: 'Wrong spring' }).expect(404);

  const taken = await asCounter.post(`/stock/${shop.shockSpring.id}/override-release`, { holdId: hold.id, reason: 'Needed for a walk-in fitting' }).expect(201);
  expect(taken.body.movement).toMatchObject({ kind: 'release', reservedDelta: -1, holdId: hold.id, quoteId: quote.id, user: { id: shop.counter.id } });
  expect(taken.body.movement.reason).toContain('Needed for a walk-in fitting');
  expect(taken.body.spring).toMatchObject({ reserved: shock.reserved - 1 });
  expect((await holdsOf(shop.shockSpring.id)).map((h) => h.id)).not.toContain(hold.id);

  const seenByDesk = (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body.quote;
  expect(seenByDesk.status).toBe('springs-released');
  expect(seenByDesk.history.at(-1)).toMatchObject({
    from: 'deposit-paid',
    to: 'springs-released',
    actor: { kind: 'staff', id: shop.counter.id, name: shop.counter.name },
    note: expect.stringContaining('Needed for a walk-in fitting'),
  });
  expect(seenByDesk.history.at(-1).note).toContain(shop.shockSpring.sku);
  expect((await shop.asRider.get(`/quotes/${quote.id}`).expect(200)).body.quote.status).toBe('springs-released');
  const link = (await request(t.app).get(`/api/customer-quotes/${quote.token}`).expect(200)).body.quote;
  expect(link).toMatchObject({ status: 'springs-released', paidCents: quote.depositCents, refundedCents: 0 });

  // A quote without its springs cannot go on to a fitting; the fork it still holds stays held until it closes.
  expect((await shop.asDesk.post(`/quotes/${quote.id}/fitted`).expect(409)).body.error.code).toBe('bad-status');
  const fittingAt = new Date(t.now().getTime() + 2 * 24 * 3600 * 1000).toISOString();
  expect((await shop.asDesk.post(`/quotes/${quote.id}/book`, { fittingAt }).expect(409)).body.error.code).toBe('bad-status');
  expect((await spring(shop.forkSpring.id)).reserved).toBe(fork.reserved);

  const cancelled = await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Springs gone' }).expect(200);
  expect(cancelled.body.quote).toMatchObject({ status: 'cancelled', refundedCents: quote.depositCents, balanceDueCents: 0 });
  expect(cancelled.body.quote.history.at(-1)).toMatchObject({ from: 'springs-released', to: 'cancelled' });
  expect((await spring(shop.forkSpring.id)).reserved).toBe(fork.reserved - 2);
  expect((await spring(shop.shockSpring.id)).reserved).toBe(shock.reserved - 1);
  for (const id of [shop.forkSpring.id, shop.shockSpring.id]) await reservedMatchesHolds(id);

  const moved = await t.db.read.getRepository(StockMovement).find({ where: { quoteId: quote.id }, order: { id: 'ASC' } });
  expect(moved.map((m) => [m.kind, m.springId, m.holdId !== null])).toEqual([
    ['reserve', shop.forkSpring.id, true],
    ['reserve', shop.shockSpring.id, true],
    ['release', shop.shockSpring.id, true],
    ['release', shop.forkSpring.id, true],
  ]);
  expect(await ledgerMismatches(t)).toEqual([]);
});

test("with two quotes on one spring, cancelling one leaves the other's hold, and the spring is not shown free", async () => {
  const first = await paidQuote(shockLine());
  const second = await paidQuote(shockLine());
  const held = await spring(shop.shockSpring.id);
  await shop.asDesk.post(`/quotes/${first.id}/cancel`, { reason: 'Not needed' }).expect(200);
  const after = await spring(shop.shockSpring.id);
  expect(after.reserved).toBe(held.reserved - 1);
  const holders = (await holdsOf(shop.shockSpring.id)).map((h) => (h.holder.kind === 'quote' ? h.holder.quoteId : null));
  expect(holders).toContain(second.id);
  expect(holders).not.toContain(first.id);
  const cancelled = await shop.asDesk.post(`/quotes/${second.id}/cancel`, { reason: 'Not needed either' }).expect(200);
  expect(cancelled.body.quote.refundedCents).toBe(second.depositCents);
  expect((await spring(shop.shockSpring.id)).reserved).toBe(held.reserved - 2);
  await reservedMatchesHolds(shop.shockSpring.id);
});

test('a named hold at the counter: listed with who made it, released by its id in part and in full, fitted from, and refused clearly', async () => {
  const id = shop.forkSpring.id;
  const bad = await asCounter.post(`/stock/${id}/reserve`, { quantity: 0 }).expect(400);
  expect(Object.keys(bad.body.error.fields).sort()).toEqual(['name', 'quantity', 'reason']);

  const made = await asCounter.post(`/stock/${id}/reserve`, { quantity: 3, name: 'Race team, bike 7', reason: 'Promised by phone' }).expect(201);
  const holdId: number = made.body.hold.id;
  expect(made.body.movement).toMatchObject({ kind: 'reserve', reservedDelta: 3, holdId, quoteId: null });
  const listed = (await holdsOf(id)).find((h) => h.id === holdId)!;
  expect(listed).toMatchObject({ quantity: 3, holder: { kind: 'manual', name: 'Race team, bike 7' }, reason: 'Promised by phone', createdBy: { id: shop.counter.id } });

  // The desk sees who holds what too, since it may make and release such holds.
  expect((await shop.asDesk.get(`/stock/${id}/holds`).expect(200)).body.holds.map((h: HoldView) => h.id)).toContain(holdId);
  await shop.asRider.get(`/stock/${id}/holds`).expect(403);
  expect((await asCounter.post(`/stock/${id}/override-release`, { holdId, reason: 'Not a quote' }).expect(409)).body.error.code).toBe('not-a-quote-hold');

  const partial = await asCounter.post(`/stock/${id}/release`, { holdId, quantity: 1, reason: 'One back on the shelf' }).expect(201);
  expect(partial.body).toMatchObject({ movement: { kind: 'release', reservedDelta: -1, holdId }, hold: { id: holdId, quantity: 2, status: 'open' } });
  const tooMany = await asCounter.post(`/stock/${id}/release`, { holdId, quantity: 5, reason: 'Too many' }).expect(409);
  expect(tooMany.body.error.code).toBe('not-reserved');
  await asCounter.post(`/stock/${shop.shockSpring.id}/release`, { holdId, reason: 'Wrong spring' }).expect(404);
  await asCounter.post(`/stock/${id}/release`, { holdId: 999_999, reason: 'No such hold' }).expect(404);

  const fitted = await asCounter.post(`/stock/${id}/fit`, { holdId, quantity: 1, reason: 'Fitted on bike 7' }).expect(201);
  expect(fitted.body.movement).toMatchObject({ kind: 'fit', onHandDelta: -1, reservedDelta: -1, holdId });
  const rest = await asCounter.post(`/stock/${id}/release`, { holdId, reason: 'Team collected the other elsewhere' }).expect(201);
  expect(rest.body.hold).toMatchObject({ quantity: 0, status: 'released' });
  expect((await asCounter.post(`/stock/${id}/release`, { holdId, reason: 'Again' }).expect(409)).body.error.code).toBe('hold-closed');

  // A fit that names no hold comes from what is available; one that names a quote's hold is the quote's to make.
  const quote = await paidQuote(shockLine());
  const [quoteHold] = (await holdsOf(shop.shockSpring.id)).filter((h) => h.holder.kind === 'quote' && h.holder.quoteId === quote.id);
  expect((await asCounter.post(`/stock/${shop.shockSpring.id}/fit`, { holdId: quoteHold.id, quantity: 1, reason: 'Walk-in' }).expect(409)).body.error.code).toBe('held-by-quote');
  await asCounter.post(`/stock/${shop.shockSpring.id}/fit`, { quantity: 1, reason: 'Walk-in, from the shelf' }).expect(201);
  await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: 'Tidy' }).expect(200);

  const history = await asCounter.get(`/stock/movements?springId=${id}&pageSize=5`).expect(200);
  expect(history.body.movements.slice(0, 4).map((m: { kind: string; holdId: number | null }) => [m.kind, m.holdId])).toEqual([
    ['release', holdId],
    ['fit', holdId],
    ['release', holdId],
    ['reserve', holdId],
  ]);
  for (const springId of [shop.forkSpring.id, shop.shockSpring.id]) await reservedMatchesHolds(springId);
  expect(await ledgerMismatches(t)).toEqual([]);
});

test('the database refuses a hold that breaks its rules, whatever the code does', async () => {
  const insert = (values: string) =>
    t.db.write((m) =>
      m.query(`INSERT INTO "stock_hold" ("springId", "kind", "quoteId", "name", "reason", "heldQuantity", "quantity", "status", "createdById", "createdAt", "closedAt")
        VALUES (${values})`),
    );
  const now = `'2026-01-01 00:00:00.000'`;
  const springId = shop.forkSpring.id;
  // A manual hold without a name, a quote hold without its quote, nothing held, more open than made, open with nothing left.
  for (const values of [
    `${springId}, 'manual', NULL, '  ', 'r', 1, 1, 'open', NULL, ${now}, NULL`,
    `${springId}, 'quote', NULL, NULL, 'r', 1, 1, 'open', NULL, ${now}, NULL`,
    `${springId}, 'manual', NULL, 'n', 'r', 0, 0, 'released', NULL, ${now}, ${now}`,
    `${springId}, 'manual', NULL, 'n', 'r', 1, 2, 'open', NULL, ${now}, NULL`,
    `${springId}, 'manual', NULL, 'n', 'r', 1, 0, 'open', NULL, ${now}, NULL`,
    `${springId}, 'manual', NULL, 'n', 'r', 1, 1, 'lost', NULL, ${now}, NULL`,
  ]) {
    await expect(insert(values)).rejects.toThrow(/CHECK constraint failed/);
  }
});
