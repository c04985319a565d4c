/**
 * The stock-holds migration on a database that already holds reservations: a quote's reserved
 * springs become that quote's holds (oldest quote first), a quote whose springs are no longer all
 * reserved moves to springs-released with a note, what is left becomes a hold named as carried
 * over, and the rebuilt quote tables keep every row, child row, index and id sequence. `down`
 * refuses while a quote is springs-released or while foreign keys would cascade, and otherwise
 * gives the old schema back with the history kept as notes. Rows are invented test data; the
 * checks are common practice, no source.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { migrations } from '../../../server/migrations';
import { StockHolds1764634800000 } from '../../../server/migrations/1764634800000-stock-holds';
import { tempDir } from '../test-context';

const mine = migrations.indexOf(StockHolds1764634800000);

async function openUpTo(dir: string, count: number): Promise<DataSource> {
  const source = new DataSource({ ...dataSourceOptions(path.join(dir, DATABASE_FILE)), migrations: migrations.slice(0, count) });
  await source.initialize();
  await source.runMigrations({ transaction: 'each' });
  return source;
}

const AT = '2026-11-01 09:00:00.000';

/**
 * Springs 1 (5 on hand, 3 reserved), 2 (2, 1) and 3 (4, 2), their movements, and quotes:
 * 1 accepted (spring 1 x 2, spring 2 x 1), 2 booked (spring 1 x 1), 3 deposit-paid (spring 2 x 1,
 * which quote 1 already takes: the counter had released it) with its deposit, and 4 a draft.
 */
async function storeOldReservations(source: DataSource): Promise<void> {
  await source.query(`INSERT INTO "user" ("id", "email", "name", "role", "passwordHash", "createdAt") VALUES (1, 'rider@example.test', 'Test Rider', 'rider', 'x', '${AT}')`);
  await source.query(`INSERT INTO "sizing_record" ("id", "riderId", "source", "discipline", "engineVersion", "request", "result", "profile", "summary", "createdAt")
    VALUES (1, 1, 'rider', 'road', '2.0.0', '{}', '{}', '{}', '{}', '${AT}')`);
  await source.query(`INSERT INTO "spring_rate" ("id", "sku", "kind", "family", "rateNmm", "freeLengthMm", "maxDeflectionMm", "onHand", "reserved", "priceCents")
    VALUES (1, 'OLD-F1', 'fork', 'F37x320', 9.5, 320, 150, 5, 3, 6500), (2, 'OLD-S1', 'shock', 'S56x150', 100, 150, 68, 2, 1, 13000), (3, 'OLD-S2', 'shock', 'S56x150', 105, 150, 68, 4, 2, 13500)`);
  for (const [springId, onHand, reserved] of [
    [1, 5, 3],
    [2, 2, 1],
    [3, 4, 2],
  ]) {
    await source.query(`INSERT INTO "stock_movement" ("springId", "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "at", "reason")
      VALUES (?, 'receive', ?, 0, ?, 0, '${AT}', 'Delivery'), (?, 'reserve', 0, ?, ?, ?, '${AT}', 'Reserved')`, [springId, onHand, onHand, springId, reserved, onHand, reserved]);
  }
  const quote = (id: number, status: string, paidCents: number) =>
    source.query(`INSERT INTO "quote" ("id", "number", "year", "sequence", "version", "status", "riderId", "sizingRecordId", "currency", "shop", "labourRateCentsPerHour", "taxBasisPoints",
        "partsCents", "labourCents", "subtotalCents", "taxCents", "totalCents", "depositDueCents", "paidCents", "validUntil", "tokenHash", "createdAt", "updatedAt")
      VALUES (?, ?, 2026, ?, 1, ?, 1, 1, 'EUR', '{}', 7000, 0, 10000, 0, 10000, 0, 10000, 3000, ?, '2026-12-31 00:00:00.000', ?, '${AT}', '${AT}')`, [id, `Q-2026-000${id}`, id, status, paidCents, `hash-${id}`]);
  const line = (quoteId: number, springId: number, quantity: number) =>
    source.query(`INSERT INTO "quote_line" ("quoteId", "position", "kind", "end", "springId", "sku", "description", "quantity", "unitPriceCents", "lineCents")
      VALUES (?, 0, 'spring', ?, ?, 'OLD', 'A spring', ?, 5000, ?)`, [quoteId, springId === 1 ? 'front' : 'rear', springId, quantity, 5000 * quantity]);
  const event = (quoteId: number, from: string | null, to: string) =>
    source.query(`INSERT INTO "quote_status_event" ("quoteId", "fromStatus", "toStatus", "actorKind", "actorName", "note", "at") VALUES (?, ?, ?, 'system', 'Sagwright', '', '${AT}')`, [quoteId, from, to]);
  await quote(1, 'accepted', 0);
  await line(1, 1, 2);
  await line(1, 2, 1);
  await quote(2, 'booked', 3000);
  await line(2, 1, 1);
  await quote(3, 'deposit-paid', 3000);
  await line(3, 2, 1);
  await quote(4, 'draft', 0);
  await line(4, 3, 1);
  for (const id of [1, 2, 3, 4]) await event(id, null, 'draft');
  await event(3, 'draft', 'deposit-paid');
  await source.query(`INSERT INTO "payment" ("quoteId", "kind", "providerId", "amountCents", "currency", "method", "last4", "at") VALUES (3, 'deposit', 'pi_old', 3000, 'EUR', 'card', '4242', '${AT}')`);
}

const counts = async (source: DataSource | Database['read']) =>
  Object.fromEntries(
    await Promise.all(
      ['quote', 'quote_line', 'quote_status_event', 'payment'].map(async (table) => [table, ((await source.query(`SELECT count(*) AS n FROM "${table}"`)) as { n: number }[])[0].n]),
    ),
  );

test('up makes holds of stored reservations and keeps every quote row, child row, index and id sequence', async () => {
  expect(mine).toBeGreaterThan(0);
  const dir = tempDir();
  const before = await openUpTo(dir, mine);
  await storeOldReservations(before);
  const rowsBefore = await counts(before);
  const sequence = await before.query(`SELECT "seq" FROM "sqlite_sequence" WHERE "name" = 'quote'`);
  await before.destroy();

  const db = await Database.open(dir);
  const holds = await db.read.query(`SELECT "springId", "kind", "quoteId", "name", "heldQuantity", "quantity", "status", "createdById" FROM "stock_hold" ORDER BY "id"`);
  expect(holds).toEqual([
    { springId: 1, kind: 'quote', quoteId: 1, name: null, heldQuantity: 2, quantity: 2, status: 'open', createdById: null },
    { springId: 2, kind: 'quote', quoteId: 1, name: null, heldQuantity: 1, quantity: 1, status: 'open', createdById: null },
    { springId: 1, kind: 'quote', quoteId: 2, name: null, heldQuantity: 1, quantity: 1, status: 'open', createdById: null },
    { springId: 3, kind: 'manual', quoteId: null, name: 'Carried over', heldQuantity: 2, quantity: 2, status: 'open', createdById: null },
  ]);
  expect(await db.read.query(`SELECT "id", "status" FROM "quote" ORDER BY "id"`)).toEqual([
    { id: 1, status: 'accepted' },
    { id: 2, status: 'booked' },
    { id: 3, status: 'springs-released' },
    { id: 4, status: 'draft' },
  ]);
  const [note] = await db.read.query(`SELECT "fromStatus", "toStatus", "actorKind", "note" FROM "quote_status_event" WHERE "quoteId" = 3 ORDER BY "id" DESC LIMIT 1`);
  expect(note).toMatchObject({ fromStatus: 'deposit-paid', toStatus: 'springs-released', actorKind: 'system', note: expect.stringMatching(/released at the counter.*refund the deposit/) });
  expect(await counts(db.read)).toEqual({ ...rowsBefore, quote_status_event: rowsBefore.quote_status_event + 1 });
  expect(await db.read.query(`SELECT "seq" FROM "sqlite_sequence" WHERE "name" = 'quote'`)).toEqual(sequence);
  const indexes = await db.read.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'index' AND "tbl_name" IN ('quote', 'quote_status_event') AND "sql" IS NOT NULL ORDER BY "name"`);
  expect(indexes.map((i: { name: string }) => i.name)).toEqual(['idx_quote_rider', 'idx_quote_status', 'idx_quote_status_event_quote', 'uq_quote_token']);
  // Every spring's reserved is the sum of its open holds, and the ledger still holds.
  expect(
    await db.read.query(`SELECT s."id" FROM "spring_rate" s WHERE s."reserved" <> (SELECT coalesce(sum("quantity"), 0) FROM "stock_hold" h WHERE h."springId" = s."id" AND h."status" = 'open')`),
  ).toEqual([]);
  expect(await db.read.query(`SELECT * FROM pragma_foreign_key_check`)).toEqual([]);
  // The wider CHECK takes the new status and still refuses an unknown one; a movement's hold only on held units.
  await expect(db.write((m) => m.query(`UPDATE "quote" SET "status" = 'mislaid' WHERE "id" = 4`))).rejects.toThrow(/CHECK constraint failed/);
  await expect(db.write((m) => m.query(`UPDATE "stock_movement" SET "holdId" = 1 WHERE "kind" = 'receive'`))).rejects.toThrow(/CHECK constraint failed/);
  await db.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

test('down refuses a springs-released quote and cascading foreign keys, then gives the old schema back with the history as notes', async () => {
  const dir = tempDir();
  const before = await openUpTo(dir, mine);
  await storeOldReservations(before);
  await before.destroy();
  await (await Database.open(dir)).close();

  const source = await openUpTo(dir, migrations.length);
  // Database.open ran every migration: undo those after this one first.
  for (let undone = migrations.length; undone > mine + 1; undone -= 1) await source.undoLastMigration({ transaction: 'each' });
  const rowsBefore = await counts(source);
  // With foreign keys on, dropping "quote" would delete its lines, history and payments.
  await expect(source.undoLastMigration({ transaction: 'each' })).rejects.toThrow(/foreign keys off/);
  await expect(source.undoLastMigration({ transaction: 'none' })).rejects.toThrow(/springs-released: cancel them/);
  expect(await source.query(`SELECT count(*) AS n FROM "stock_hold"`)).toEqual([{ n: 4 }]);

  await source.query(`UPDATE "quote" SET "status" = 'cancelled', "refundedCents" = 3000 WHERE "id" = 3`);
  await source.query(`INSERT INTO "quote_status_event" ("quoteId", "fromStatus", "toStatus", "actorKind", "actorName", "note", "at") VALUES (3, 'springs-released', 'cancelled', 'staff', 'Desk', 'Refunded', '${AT}')`);
  await source.undoLastMigration({ transaction: 'none' });

  expect(await source.query(`SELECT "name" FROM "sqlite_master" WHERE "name" = 'stock_hold'`)).toEqual([]);
  expect((await source.query(`SELECT "name" FROM pragma_table_info('stock_movement')`)).map((c: { name: string }) => c.name)).not.toContain('holdId');
  const history = await source.query(`SELECT "fromStatus", "toStatus", "note" FROM "quote_status_event" WHERE "quoteId" = 3 ORDER BY "id"`);
  expect(history).toEqual([
    { fromStatus: null, toStatus: 'draft', note: '' },
    { fromStatus: 'draft', toStatus: 'deposit-paid', note: '' },
    { fromStatus: 'deposit-paid', toStatus: 'deposit-paid', note: expect.stringMatching(/released at the counter/) },
    { fromStatus: 'deposit-paid', toStatus: 'cancelled', note: 'Refunded' },
  ]);
  expect(await counts(source)).toEqual({ ...rowsBefore, quote_status_event: rowsBefore.quote_status_event + 1 });
  await expect(source.query(`UPDATE "quote" SET "status" = 'springs-released' WHERE "id" = 4`)).rejects.toThrow(/CHECK constraint failed/);
  expect(await source.query(`SELECT * FROM pragma_foreign_key_check`)).toEqual([]);
  await source.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});
