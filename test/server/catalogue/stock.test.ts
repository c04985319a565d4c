/**
 * Stock movements against a real SQLite file: on hand and reserved always equal the sums of the
 * movements, reserved the sum of the open holds, and neither goes negative (random sequences from
 * fast-check), truly concurrent holds over separate sockets never oversell, and the sizing's
 * in-stock pick follows a receive or a hold at once. Stock facts here are invented test data.
 */
import { AddressInfo } from 'node:net';
import { Server } from 'node:http';
import * as fc from 'fast-check';
import request from 'supertest';
import { IsNull } from 'typeorm';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { StockHold } from '../../../server/entities/stock-hold.entity';
import { StockMovement } from '../../../server/entities/stock-movement.entity';
import { ConflictError } from '../../../server/errors';
import { seed } from '../../../server/seed';
import { StockService, writeCatalogue } from '../../../server/services/stock.service';
import body from '../fixtures/sizing-two-ends.json';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, createSpring, ledgerMismatches, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;
let counterId: number;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  const accounts = await accountsByRole(t);
  tokens = accounts.tokens;
  counterId = accounts.users.counter.id;
});
afterAll(() => t.dispose());

const post = (path: string, role: keyof Tokens, payload: object) => request(t.app).post(`/api${path}`).set('Authorization', tokens[role]).send(payload);

test('the demo stock is represented by opening movements', async () => {
  expect(await t.db.read.getRepository(StockMovement).countBy({ kind: 'receive', userId: IsNull() })).toBeGreaterThan(0);
  expect(await ledgerMismatches(t)).toEqual([]);
});

describe('each movement over HTTP', () => {
  test('receive, count, reserve, release and fit, each a row with who, when, how many and why', async () => {
    const spring = await createSpring(t, {}, 0);
    const path = (action: string) => `/stock/${spring.id}/${action}`;
    const received = await post(path('receive'), 'counter', { quantity: 5, reason: 'Delivery 88' }).expect(201);
    expect(received.body.spring).toEqual(expect.objectContaining({ onHand: 5, reserved: 0, available: 5 }));
    expect(received.body.movement).toEqual(
      expect.objectContaining({ kind: 'receive', onHandDelta: 5, reservedDelta: 0, onHandAfter: 5, reason: 'Delivery 88', user: expect.objectContaining({ id: counterId }) }),
    );
    expect(Date.parse(received.body.movement.at)).not.toBeNaN();
    await post(path('count'), 'admin', { counted: 4, reason: 'Stock-take, one cracked' }).expect(201);
    const reserved = await post(path('reserve'), 'desk', { quantity: 3, name: 'Job 12', reason: 'Promised at the desk' }).expect(201);
    // The desk gets the summary: availability, no stock counts or supplier.
    expect(reserved.body.spring).toEqual(expect.objectContaining({ available: 1 }));
    expect(reserved.body.spring.onHand).toBeUndefined();
    expect(reserved.body.spring.supplier).toBeUndefined();
    const holdId = reserved.body.hold.id;
    expect(reserved.body.movement).toEqual(expect.objectContaining({ kind: 'reserve', reservedDelta: 3, holdId, quoteId: null }));
    await post(path('release'), 'desk', { holdId, quantity: 1, reason: 'Job 12 changed to one spring' }).expect(201);
    const fitted = await post(path('fit'), 'counter', { holdId, quantity: 2, reason: 'Fitted on job 12' }).expect(201);
    expect(fitted.body.spring).toEqual(expect.objectContaining({ onHand: 2, reserved: 0 }));
    expect(fitted.body.hold).toEqual(expect.objectContaining({ id: holdId, quantity: 0, heldQuantity: 3, status: 'fitted' }));
    const history = await request(t.app).get(`/api/stock/movements?springId=${spring.id}&pageSize=10`).set('Authorization', tokens.counter).expect(200);
    expect(history.body.movements.map((m: { kind: string; holdId: number | null }) => [m.kind, m.holdId])).toEqual([
      ['fit', holdId],
      ['release', holdId],
      ['reserve', holdId],
      ['correction', null],
      ['receive', null],
    ]);
    expect(await ledgerMismatches(t)).toEqual([]);
  });

  test('refuses what would go negative or promise more than is there, with a 409 that says why', async () => {
    const spring = await createSpring(t, {}, 2);
    const path = (action: string) => `/stock/${spring.id}/${action}`;
    const { hold } = (await post(path('reserve'), 'desk', { quantity: 1, name: 'Job 30', reason: 'On the phone' }).expect(201)).body;
    const short = await post(path('reserve'), 'desk', { quantity: 2, name: 'Job 31', reason: 'On the phone' }).expect(409);
    expect(short.body.error).toEqual({ code: 'out-of-stock', message: expect.stringMatching(/Only 1 of .* available \(2 on hand, 1 reserved\)/) });
    expect((await post(path('release'), 'desk', { holdId: hold.id, quantity: 2, reason: 'Too many' }).expect(409)).body.error.code).toBe('not-reserved');
    expect((await post(path('count'), 'counter', { counted: 0, reason: 'Shelf empty?' }).expect(409)).body.error.code).toBe('below-reserved');
    expect((await post(path('fit'), 'counter', { holdId: hold.id, quantity: 2, reason: 'Two fitted' }).expect(409)).body.error.code).toBe('not-reserved');
    expect((await post(path('fit'), 'counter', { quantity: 2, reason: 'Walk-in' }).expect(409)).body.error.code).toBe('out-of-stock');
    const bad = await post(path('receive'), 'counter', { quantity: -4 }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['quantity', 'reason']);
    await post('/stock/999999/receive', 'counter', { quantity: 1, reason: 'Nowhere' }).expect(404);
    const stored = await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id });
    expect(stored).toEqual(expect.objectContaining({ onHand: 2, reserved: 1 }));
    expect(await ledgerMismatches(t)).toEqual([]);
  });

  test('the database itself refuses negative stock, whatever the code does', async () => {
    const spring = await createSpring(t, {}, 1);
    await expect(t.db.write((m) => m.update(SpringRate, spring.id, { reserved: 2 }))).rejects.toThrow(/CHECK constraint failed/);
    await expect(t.db.write((m) => m.update(SpringRate, spring.id, { onHand: -1 }))).rejects.toThrow(/CHECK constraint failed/);
  });
});

describe('properties (fast-check)', () => {
  type Op = { kind: 'receive' | 'count' | 'reserve' | 'release' | 'fit' | 'fit-direct'; quantity: number; pick: number };
  const op: fc.Arbitrary<Op> = fc.record({
    kind: fc.constantFrom('receive', 'count', 'reserve', 'release', 'fit', 'fit-direct'),
    quantity: fc.integer({ min: 1, max: 6 }),
    pick: fc.nat(),
  });

  test('after any sequence of movements on hand and reserved equal their sums and the holds, and never go negative', async () => {
    const stock = new StockService(t);
    await fc.assert(
      fc.asyncProperty(fc.array(op, { minLength: 1, maxLength: 25 }), async (ops) => {
        const spring = await createSpring(t);
        // A model of what the books should say, refused moves leaving it as it was.
        let onHand = 0;
        const holds = new Map<number, number>();
        const reserved = () => [...holds.values()].reduce((a, b) => a + b, 0);
        for (const { kind, quantity, pick } of ops) {
          const base = { springId: spring.id, quantity, userId: counterId, reason: `property ${kind}` };
          const open = [...holds.keys()];
          const holdId = open[pick % Math.max(open.length, 1)];
          if ((kind === 'release' || kind === 'fit') && holdId === undefined) continue;
          const allowed =
            kind === 'receive' ? true
            : kind === 'count' ? quantity >= reserved()
            : kind === 'reserve' || kind === 'fit-direct' ? quantity <= onHand - reserved()
            : quantity <= holds.get(holdId)!;
          const run = writeCatalogue(t, (m) =>
            kind === 'receive' ? stock.receive(m, base)
            : kind === 'count' ? stock.correct(m, { ...base, counted: quantity })
            : kind === 'reserve' ? stock.reserve(m, { ...base, holder: { kind: 'manual', name: 'Property' } })
            : kind === 'release' ? stock.release(m, { ...base, holdId })
            : stock.fit(m, kind === 'fit' ? { ...base, holdId } : base),
          );
          if (!allowed) {
            await expect(run).rejects.toBeInstanceOf(ConflictError);
            continue;
          }
          const { hold } = await run;
          if (kind === 'receive') onHand += quantity;
          if (kind === 'count') onHand = quantity;
          if (kind === 'fit' || kind === 'fit-direct') onHand -= quantity;
          if (hold && hold.quantity > 0) holds.set(hold.id, hold.quantity);
          else if (hold) holds.delete(hold.id);
        }
        const stored = await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id });
        expect({ onHand: stored.onHand, reserved: stored.reserved }).toEqual({ onHand, reserved: reserved() });
        const openHolds = await t.db.read.getRepository(StockHold).find({ where: { springId: spring.id, status: 'open' } });
        expect(new Map(openHolds.map((h) => [h.id, h.quantity]))).toEqual(holds);
        expect(await ledgerMismatches(t)).toEqual([]);
      }),
      { numRuns: 30 },
    );
  });
});

describe('concurrent reservations over real sockets', () => {
  let server: Server;
  let base: string;
  const connections = new Set<string>();

  beforeAll(async () => {
    server = t.app.listen(0);
    await new Promise((resolve) => server.once('listening', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    server.on('connection', (socket) => connections.add(`${socket.remoteAddress}:${socket.remotePort}`));
  });
  afterAll(() => new Promise((resolve) => server.close(resolve)));

  test('with 3 left, 25 reservations started together end in exactly 3 successes and 22 out-of-stock', async () => {
    const spring = await createSpring(t, {}, 3);
    connections.clear();
    const attempts = 25;
    // All requests are created in one synchronous loop, so they are in flight together; fetch's pool
    // opens a socket for each request it cannot serve on an idle one, and the server counts them.
    const responses = await Promise.all(
      Array.from({ length: attempts }, (_, i) =>
        fetch(`${base}/api/stock/${spring.id}/reserve`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', authorization: tokens.desk },
          body: JSON.stringify({ quantity: 1, name: `Walk-in ${1000 + i}`, reason: 'Held at the counter' }),
        }).then(async (res) => ({ status: res.status, body: await res.json() })),
      ),
    );
    expect(connections.size).toBe(attempts);
    const statuses = responses.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(3);
    expect(statuses.filter((s) => s === 409)).toHaveLength(attempts - 3);
    for (const refused of responses.filter((r) => r.status === 409)) {
      expect(refused.body.error).toEqual({ code: 'out-of-stock', message: expect.stringMatching(/Only 0 of .* available/) });
    }
    const stored = await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id });
    expect(stored).toEqual(expect.objectContaining({ onHand: 3, reserved: 3 }));
    expect(await t.db.read.getRepository(StockMovement).countBy({ springId: spring.id, kind: 'reserve' })).toBe(3);
  });
});

describe('the sizing follows the stock', () => {
  const size = () => request(t.app).post('/api/sizing').set('Authorization', tokens.rider).send(body);
  const inStockPick = async () => (await size().expect(200)).body.front.recommendation.inStock;

  test('reserving the last units of the in-stock pick changes it at once, and receiving them brings it back', async () => {
    const first = await inStockPick();
    expect(first).toEqual(expect.objectContaining({ sku: expect.any(String), inStock: true }));
    const spring = await t.db.read.getRepository(SpringRate).findOneByOrFail({ sku: first.sku });
    const available = spring.onHand - spring.reserved;
    await post(`/stock/${spring.id}/reserve`, 'desk', { quantity: available, name: 'Job 500', reason: 'Held for a fitting' }).expect(201);
    const after = await inStockPick();
    expect(after?.sku).not.toBe(first.sku);
    await post(`/stock/${spring.id}/receive`, 'counter', { quantity: 4, reason: 'Delivery 501' }).expect(201);
    expect((await inStockPick()).sku).toBe(first.sku);
  });
});
