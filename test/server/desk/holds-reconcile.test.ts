/**
 * On hand, reserved and the holds reconcile after any sequence of the counter's and the desk's
 * operations: fast-check draws receives, named holds and their releases and fits, quotes accepted,
 * paid, booked, fitted, cancelled and expired, and the counter's override, all through the real
 * services on a real SQLite file, and after each step SQL checks that every spring's reserved is
 * the sum of its open holds and its stock the sum of its movements, that each hold's quantity is
 * what its movements moved, and that each quote holds what its status says (its lines while
 * accepted, paid or booked; part of them once the counter released some; nothing once closed),
 * with a cancelled quote's deposit refunded. Refusals must be 4xx answers. Stock and prices are
 * invented test data; the checks are common practice, no source.
 */
import * as fc from 'fast-check';
import { HttpError } from '../../../server/errors';
import type { AuthUser } from '../../../server/types/auth-user';
import { PaymentsService } from '../../../server/services/payments.service';
import { actorOf, QuotesService } from '../../../server/services/quotes.service';
import { StockService, writeCatalogue } from '../../../server/services/stock.service';
import { createSpring } from '../catalogue/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { DeskShop, setUpDeskShop } from './helpers';

// Many quotes, payments through the card stand-in and a check of every table after each step.
jest.setTimeout(180_000);

let t: TestContext;
let shop: DeskShop;
let desk: AuthUser;
let counter: AuthUser;
let rider: AuthUser;

/** One run's own springs (two of each end's fit, little stock, so quotes and holds compete) and quotes. */
interface Run {
  springs: { id: number; end: 'front' | 'rear' }[];
  quotes: number[];
}

const DAY_MS = 24 * 3600 * 1000;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t, { fork: 3, shock: 2 });
  const authUser = (user: DeskShop['desk']): AuthUser => ({ id: user.id, role: user.role, email: user.email, name: user.name });
  desk = authUser(shop.desk);
  counter = authUser(shop.counter);
  rider = authUser(shop.rider);
});
afterAll(() => t.dispose());

async function newRun(): Promise<Run> {
  const fork = { kind: 'fork', family: 'F37x320', freeLengthMm: 320, innerDiameterMm: 20, outerDiameterMm: 37, wireDiameterMm: 4.6, maxDeflectionMm: 150 } as const;
  const made = [
    await createSpring(t, { ...fork, rateNmm: 9.5, priceCents: 6550 }, 3),
    await createSpring(t, { ...fork, rateNmm: 10, priceCents: 6800 }, 2),
    await createSpring(t, { kind: 'shock', family: 'S56x150', rateNmm: 100, priceCents: 13000 }, 2),
    await createSpring(t, { kind: 'shock', family: 'S56x150', rateNmm: 105, priceCents: 13500 }, 1),
  ];
  return { springs: made.map((spring) => ({ id: spring.id, end: spring.kind === 'fork' ? 'front' : 'rear' })), quotes: [] };
}

type Op =
  | { kind: 'receive' | 'hold'; spring: number; quantity: number }
  | { kind: 'release' | 'fit-hold' | 'override'; pick: number; quantity: number }
  | { kind: 'quote'; front: number; rear: number; quantity: number }
  | { kind: 'pay' | 'book' | 'fit' | 'cancel'; pick: number }
  | { kind: 'expire' };

const quantity = fc.integer({ min: 1, max: 3 });
const op: fc.Arbitrary<Op> = fc.oneof(
  fc.record({ kind: fc.constantFrom('receive' as const, 'hold' as const), spring: fc.nat(3), quantity }),
  fc.record({ kind: fc.constantFrom('release' as const, 'fit-hold' as const, 'override' as const), pick: fc.nat(), quantity }),
  fc.record({ kind: fc.constant('quote' as const), front: fc.nat(2), rear: fc.nat(2), quantity }),
  fc.record({ kind: fc.constantFrom('pay' as const, 'book' as const, 'fit' as const, 'cancel' as const), pick: fc.nat() }),
  fc.record({ kind: fc.constant('expire' as const) }),
);

const pickFrom = <T>(items: T[], pick: number): T | undefined => items[pick % Math.max(items.length, 1)];

const list = (ids: number[]) => (ids.length ? ids.join(', ') : 'NULL');

async function openHolds(current: Run, kind: 'manual' | 'quote'): Promise<{ id: number; springId: number }[]> {
  return t.db.read.query(`SELECT "id", "springId" FROM "stock_hold" WHERE "status" = 'open' AND "kind" = ? AND "springId" IN (${list(current.springs.map((s) => s.id))}) ORDER BY "id"`, [kind]);
}

/** The run's quotes in the statuses a step acts on, so that runs get far along the flow; the step is still refused wherever its rules say. */
async function quoteIds(current: Run, statuses: string[]): Promise<number[]> {
  const rows: { id: number }[] = await t.db.read.query(
    `SELECT "id" FROM "quote" WHERE "id" IN (${list(current.quotes)}) AND "status" IN (${statuses.map(() => '?').join(', ')}) ORDER BY "id"`,
    statuses,
  );
  return rows.map((q) => q.id);
}

async function run(current: Run, step: Op): Promise<void> {
  const { springs } = current;
  const stock = new StockService(t);
  const quotes = new QuotesService(t);
  const reason = `Property: ${step.kind}`;
  switch (step.kind) {
    case 'receive':
      await writeCatalogue(t, (m) => stock.receive(m, { springId: springs[step.spring].id, quantity: step.quantity, userId: counter.id, reason }));
      return;
    case 'hold':
      await writeCatalogue(t, (m) =>
        stock.reserve(m, { springId: springs[step.spring].id, quantity: step.quantity, userId: counter.id, reason, holder: { kind: 'manual', name: 'Walk-in' } }),
      );
      return;
    case 'release':
    case 'fit-hold': {
      const hold = pickFrom(await openHolds(current, 'manual'), step.pick);
      if (!hold) return;
      const request = { springId: hold.springId, holdId: hold.id, quantity: step.quantity, userId: counter.id, reason };
      await writeCatalogue(t, (m) => (step.kind === 'release' ? stock.release(m, request) : stock.fit(m, request)));
      return;
    }
    case 'override': {
      const hold = pickFrom(await openHolds(current, 'quote'), step.pick);
      if (hold) await quotes.releaseOverQuote(counter, { springId: hold.springId, holdId: hold.id, reason });
      return;
    }
    case 'quote': {
      const front = springs.filter((s) => s.end === 'front')[step.front];
      const rear = springs.filter((s) => s.end === 'rear')[step.rear];
      const lines = [front, rear]
        .filter((s): s is (typeof springs)[number] => s !== undefined)
        .map((s) => ({ kind: 'spring' as const, springId: s.id, end: s.end, quantity: step.quantity }));
      const quote = await quotes.create(desk, { sizingRecordId: shop.recordId, lines: lines.length ? lines : [{ kind: 'labour', operationCode: 'sag-setup', quantity: 1 }] });
      current.quotes.push(quote.id);
      await quotes.markSent(desk, quote.id);
      await quotes.accept(actorOf(rider), quote.id, rider);
      return;
    }
    case 'pay': {
      const id = pickFrom(await quoteIds(current, ['accepted', 'springs-released']), step.pick);
      if (id) await new PaymentsService(t).payDeposit({ kind: 'customer-link', id: null, name: 'Link' }, id, 'pm_card_visa');
      return;
    }
    case 'book': {
      const id = pickFrom(await quoteIds(current, ['accepted', 'deposit-paid', 'springs-released']), step.pick);
      if (id) await quotes.book(desk, id, new Date(t.now().getTime() + DAY_MS));
      return;
    }
    case 'fit':
    case 'cancel': {
      const id = pickFrom(await quoteIds(current, step.kind === 'fit' ? ['booked', 'springs-released'] : ['accepted', 'deposit-paid', 'booked', 'springs-released', 'sent']), step.pick);
      if (id && step.kind === 'fit') await quotes.markFitted(desk, id);
      if (id && step.kind === 'cancel') await quotes.cancel(desk, id, reason);
      return;
    }
    case 'expire':
      t.advanceClock(31 * DAY_MS);
      await quotes.expireDue();
      return;
  }
}

/** Every way the run's books can disagree, as readable lines; empty when they reconcile. */
async function disagreements(current: Run): Promise<string[]> {
  const read = t.db.read;
  const springIds = list(current.springs.map((s) => s.id));
  const quoteIds = list(current.quotes);
  // Each check over the run's own springs and quotes, so a shrunk counterexample starts clean.
  const rows = async (label: string, sql: string) =>
    ((await read.query(`SELECT * FROM (${sql}) WHERE "springId" IN (${springIds}) OR "quoteId" IN (${quoteIds})`)) as object[]).map((row) => `${label}: ${JSON.stringify(row)}`);
  return [
    ...(await rows(
      'reserved is not the sum of the open holds',
      `SELECT s."id" AS "springId", NULL AS "quoteId", s."reserved", coalesce(sum(h."quantity"), 0) AS "held" FROM "spring_rate" s
       LEFT JOIN "stock_hold" h ON h."springId" = s."id" AND h."status" = 'open'
       GROUP BY s."id" HAVING s."reserved" <> "held"`,
    )),
    ...(await rows(
      'stock is not the sum of the movements',
      `SELECT s."id" AS "springId", NULL AS "quoteId", s."onHand", s."reserved", coalesce(sum(m."onHandDelta"), 0) AS "moved", coalesce(sum(m."reservedDelta"), 0) AS "movedReserved"
       FROM "spring_rate" s LEFT JOIN "stock_movement" m ON m."springId" = s."id"
       GROUP BY s."id" HAVING s."onHand" <> "moved" OR s."reserved" <> "movedReserved"`,
    )),
    ...(await rows(
      "a hold's quantity is not what its movements moved",
      `SELECT h."id", h."springId", h."quoteId", h."quantity", coalesce(sum(m."reservedDelta"), 0) AS "moved" FROM "stock_hold" h
       LEFT JOIN "stock_movement" m ON m."holdId" = h."id" GROUP BY h."id" HAVING h."quantity" <> "moved"`,
    )),
    ...(await rows(
      'a quote holds other than its status says',
      `WITH "wanted" AS (SELECT "quoteId", "springId", sum("quantity") AS "quantity" FROM "quote_line" WHERE "kind" = 'spring' GROUP BY "quoteId", "springId"),
            "held" AS (SELECT "quoteId", "springId", sum("quantity") AS "quantity" FROM "stock_hold" WHERE "status" = 'open' AND "quoteId" IS NOT NULL GROUP BY "quoteId", "springId")
       SELECT q."id" AS "quoteId", q."status", w."springId", w."quantity" AS "wanted", coalesce(h."quantity", 0) AS "held"
       FROM "quote" q JOIN "wanted" w ON w."quoteId" = q."id" LEFT JOIN "held" h ON h."quoteId" = q."id" AND h."springId" = w."springId"
       WHERE CASE WHEN q."status" IN ('accepted', 'deposit-paid', 'booked') THEN coalesce(h."quantity", 0) <> w."quantity"
                  WHEN q."status" = 'springs-released' THEN coalesce(h."quantity", 0) NOT IN (0, w."quantity")
                  ELSE coalesce(h."quantity", 0) <> 0 END
       UNION ALL
       SELECT h."quoteId", NULL, h."springId", NULL, h."quantity" FROM "held" h
       LEFT JOIN "wanted" w ON w."quoteId" = h."quoteId" AND w."springId" = h."springId" WHERE w."quoteId" IS NULL`,
    )),
    ...(await rows(
      'a cancelled quote kept its deposit',
      `SELECT "id" AS "quoteId", NULL AS "springId", "paidCents", "refundedCents" FROM "quote" WHERE "status" = 'cancelled' AND "refundedCents" <> "paidCents"`,
    )),
  ];
}

test('after every step of any sequence, reserved is the sum of the open holds and each quote holds what its status says', async () => {
  const seen = new Set<string>();
  await fc.assert(
    fc.asyncProperty(fc.array(op, { minLength: 1, maxLength: 14 }), async (ops) => {
      const current = await newRun();
      for (const step of ops) {
        try {
          await run(current, step);
          seen.add(`${step.kind} done`);
        } catch (err) {
          // A refusal is part of the game (no stock, wrong status); anything but a 4xx is a failure.
          if (!(err instanceof HttpError) || err.status >= 500) throw err;
          seen.add(`${step.kind} refused`);
        }
        expect({ after: step, wrong: await disagreements(current) }).toEqual({ after: step, wrong: [] });
      }
    }),
    { numRuns: 40 },
  );
  // The runs reached the interesting steps, not only their refusals.
  expect([...seen]).toEqual(expect.arrayContaining(['quote done', 'override done', 'cancel done', 'fit done', 'release done', 'expire done']));
});
