import { MigrationInterface, QueryRunner } from 'typeorm';

/** The quote status an override at the counter leaves (server/services/quote-rules.ts). */
const RELEASED = 'springs-released';
/** Quote statuses that held their springs when this migration was written. */
const HOLDING = ['accepted', 'deposit-paid', 'booked'];
const NOW = `strftime('%Y-%m-%d %H:%M:%f', 'now')`;

/**
 * Reservations get their holders. `stock_hold` records who holds reserved units (a quote, or a hold
 * made by name at the counter), each stock movement names the hold it moved, and quotes gain the
 * `springs-released` status. Reservations already stored become holds: each quote that holds stock
 * gets a hold per spring of its lines, oldest quote first; one whose springs are no longer all
 * reserved (the counter released them before holds existed) moves to `springs-released`, noted in
 * its history; what is left reserved becomes a hold named as carried over. No stock moves, so no
 * movement is written.
 *
 * SQLite widens a CHECK only by rebuilding the table. `quote` has child tables whose rows a
 * DROP TABLE with foreign keys on would delete (ON DELETE CASCADE), so the rebuild runs only with
 * foreign keys off (as TypeORM's runMigrations sets them) or over an empty table.
 */
export class StockHolds1764634800000 implements MigrationInterface {
  name = 'StockHolds1764634800000';

  async up(q: QueryRunner): Promise<void> {
    await inTransaction(q, () => this.apply(q));
  }

  /**
   * Refuses while a quote is in `springs-released` (the older code cannot move it: cancel it
   * first). History events into and out of that status become notes on the status before it, so
   * the narrower CHECK holds them and their text stays. Reserved counts stay as they are.
   */
  async down(q: QueryRunner): Promise<void> {
    await inTransaction(q, () => this.revert(q));
  }

  private async apply(q: QueryRunner): Promise<void> {
    await assertRebuildIsSafe(q);
    const widen = { from: `'superseded'`, to: `'superseded', '${RELEASED}'` };
    await rebuildTable(q, 'quote', widen, 1);
    await rebuildTable(q, 'quote_status_event', widen, 2);

    await q.query(`CREATE TABLE "stock_hold" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "springId" INTEGER NOT NULL REFERENCES "spring_rate" ("id") ON DELETE RESTRICT,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('quote', 'manual')),
      "quoteId" INTEGER REFERENCES "quote" ("id") ON DELETE RESTRICT,
      "name" TEXT,
      "reason" TEXT NOT NULL CHECK (length(trim("reason")) > 0),
      "heldQuantity" INTEGER NOT NULL CHECK ("heldQuantity" > 0),
      "quantity" INTEGER NOT NULL CHECK ("quantity" BETWEEN 0 AND "heldQuantity"),
      "status" TEXT NOT NULL CHECK ("status" IN ('open', 'released', 'fitted')),
      "createdById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "createdAt" DATETIME NOT NULL,
      "closedById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "closedAt" DATETIME,
      CHECK (CASE "kind"
        WHEN 'quote' THEN "quoteId" IS NOT NULL AND "name" IS NULL
        WHEN 'manual' THEN "quoteId" IS NULL AND length(trim(coalesce("name", ''))) > 0
      END),
      CHECK (("status" = 'open') = ("quantity" > 0)),
      CHECK (("status" = 'open') = ("closedAt" IS NULL)),
      CHECK ("closedById" IS NULL OR "closedAt" IS NOT NULL)
    )`);
    // A spring's open holds, oldest first: the counter's list and every release.
    await q.query(`CREATE INDEX "idx_stock_hold_open" ON "stock_hold" ("springId", "id") WHERE "status" = 'open'`);
    // A quote's holds; at most one open hold per quote and spring.
    await q.query(`CREATE INDEX "idx_stock_hold_quote" ON "stock_hold" ("quoteId") WHERE "quoteId" IS NOT NULL`);
    await q.query(`CREATE UNIQUE INDEX "uq_stock_hold_open_quote" ON "stock_hold" ("quoteId", "springId") WHERE "status" = 'open' AND "quoteId" IS NOT NULL`);

    // Older rows have no hold; a hold is only ever on a movement of held units.
    await q.query(`ALTER TABLE "stock_movement" ADD COLUMN "holdId" INTEGER
      CHECK ("holdId" IS NULL OR "kind" IN ('reserve', 'release') OR ("kind" = 'fit' AND "reservedDelta" < 0))`);
    await q.query(`CREATE INDEX "idx_stock_movement_hold" ON "stock_movement" ("holdId") WHERE "holdId" IS NOT NULL`);

    await carryOverReservations(q);
    const broken: unknown[] = await q.query(`SELECT * FROM pragma_foreign_key_check WHERE "table" IN ('quote', 'quote_line', 'quote_status_event', 'payment', 'stock_hold')`);
    if (broken.length) throw new Error(`The quote tables lost ${broken.length} foreign key(s) in the rebuild.`);
  }

  private async revert(q: QueryRunner): Promise<void> {
    await assertRebuildIsSafe(q);
    const [{ stuck }]: { stuck: number }[] = await q.query(`SELECT count(*) AS stuck FROM "quote" WHERE "status" = ?`, [RELEASED]);
    if (stuck > 0) throw new Error(`${stuck} quote(s) are ${RELEASED}: cancel them before undoing this migration.`);
    const before = `(SELECT p."fromStatus" FROM "quote_status_event" p
      WHERE p."quoteId" = e."quoteId" AND p."toStatus" = '${RELEASED}' AND p."fromStatus" <> '${RELEASED}' AND p."id" < e."id" ORDER BY p."id" DESC LIMIT 1)`;
    await q.query(`UPDATE "quote_status_event" AS e SET "fromStatus" = ${before} WHERE e."fromStatus" = '${RELEASED}'`);
    await q.query(`UPDATE "quote_status_event" SET "toStatus" = "fromStatus" WHERE "toStatus" = '${RELEASED}'`);

    await q.query(`DROP INDEX "idx_stock_movement_hold"`);
    await q.query(`ALTER TABLE "stock_movement" DROP COLUMN "holdId"`);
    await q.query(`DROP TABLE "stock_hold"`);
    const narrow = { from: `, '${RELEASED}'`, to: '' };
    await rebuildTable(q, 'quote_status_event', narrow, 2);
    await rebuildTable(q, 'quote', narrow, 1);
  }
}

/**
 * TypeORM runs a migration in a transaction except when undoing with `transaction: 'none'` (the
 * way to undo this one with foreign keys off); the change is all or nothing either way.
 */
async function inTransaction(q: QueryRunner, change: () => Promise<void>): Promise<void> {
  if (q.isTransactionActive) return change();
  await q.startTransaction();
  try {
    await change();
    await q.commitTransaction();
  } catch (err) {
    await q.rollbackTransaction();
    throw err;
  }
}

async function assertRebuildIsSafe(q: QueryRunner): Promise<void> {
  const [{ foreign_keys: on }]: { foreign_keys: number }[] = await q.query(`PRAGMA foreign_keys`);
  const [{ quotes }]: { quotes: number }[] = await q.query(`SELECT count(*) AS quotes FROM "quote"`);
  if (on && quotes > 0) {
    throw new Error(
      'Rebuilding "quote" with foreign keys on would delete its lines, history and payments: run this migration with foreign keys off (undo it with transaction: \'none\').',
    );
  }
}

/**
 * SQLite's procedure for a schema change ALTER TABLE cannot make: the table again from its own
 * stored SQL with `edit.from` replaced by `edit.to` (in exactly `places` places, or the schema is
 * not the one this migration knows), its rows copied with their ids, its indexes and triggers made
 * again, and its AUTOINCREMENT sequence kept. Working from the stored SQL keeps whatever another
 * migration added to the table before this one.
 */
async function rebuildTable(q: QueryRunner, table: string, edit: { from: string; to: string }, places: number): Promise<void> {
  const [{ sql }]: { sql: string }[] = await q.query(`SELECT "sql" FROM "sqlite_master" WHERE "type" = 'table' AND "name" = ?`, [table]);
  const parts = sql.split(edit.from);
  if (parts.length - 1 !== places || !sql.startsWith(`CREATE TABLE "${table}" (`)) {
    throw new Error(`The stored schema of "${table}" is not the one this migration knows.`);
  }
  const rewritten = parts.join(edit.to);
  const extras: { sql: string }[] = await q.query(`SELECT "sql" FROM "sqlite_master" WHERE "tbl_name" = ? AND "type" IN ('index', 'trigger') AND "sql" IS NOT NULL`, [table]);
  const sequence: { seq: number }[] = await q.query(`SELECT "seq" FROM "sqlite_sequence" WHERE "name" = ?`, [table]);
  const rebuilt = `${table}_rebuilt`;
  await q.query(rewritten.replace(`CREATE TABLE "${table}" (`, `CREATE TABLE "${rebuilt}" (`));
  await q.query(`INSERT INTO "${rebuilt}" SELECT * FROM "${table}"`);
  await q.query(`DROP TABLE "${table}"`);
  await q.query(`ALTER TABLE "${rebuilt}" RENAME TO "${table}"`);
  for (const extra of extras) await q.query(extra.sql);
  if (sequence.length) await q.query(`UPDATE "sqlite_sequence" SET "seq" = ? WHERE "name" = ?`, [sequence[0].seq, table]);
}

/** Reserved units as they stand become holds; see the class comment. */
async function carryOverReservations(q: QueryRunner): Promise<void> {
  const left = new Map<number, number>(
    ((await q.query(`SELECT "id", "reserved" FROM "spring_rate" WHERE "reserved" > 0`)) as { id: number; reserved: number }[]).map((s) => [s.id, s.reserved]),
  );
  const quotes: { id: number; number: string; version: number; status: string }[] = await q.query(
    `SELECT "id", "number", "version", "status" FROM "quote" WHERE "status" IN (${HOLDING.map(() => '?').join(', ')}) ORDER BY "id"`,
    HOLDING,
  );
  for (const quote of quotes) {
    const lines: { springId: number; quantity: number }[] = await q.query(
      `SELECT "springId", sum("quantity") AS "quantity" FROM "quote_line" WHERE "quoteId" = ? AND "kind" = 'spring' GROUP BY "springId" ORDER BY "springId"`,
      [quote.id],
    );
    if (lines.every((line) => (left.get(line.springId) ?? 0) >= line.quantity)) {
      for (const line of lines) {
        left.set(line.springId, left.get(line.springId)! - line.quantity);
        await q.query(
          `INSERT INTO "stock_hold" ("springId", "kind", "quoteId", "name", "reason", "heldQuantity", "quantity", "status", "createdById", "createdAt")
           VALUES (?, 'quote', ?, NULL, ?, ?, ?, 'open', NULL, ${NOW})`,
          [line.springId, quote.id, `Quote ${quote.number} v${quote.version} accepted (carried over)`, line.quantity, line.quantity],
        );
      }
      continue;
    }
    await q.query(`UPDATE "quote" SET "status" = ?, "updatedAt" = ${NOW} WHERE "id" = ?`, [RELEASED, quote.id]);
    await q.query(
      `INSERT INTO "quote_status_event" ("quoteId", "fromStatus", "toStatus", "actorKind", "actorId", "actorName", "note", "at")
       VALUES (?, ?, ?, 'system', NULL, 'Sagwright', ?, ${NOW})`,
      [quote.id, quote.status, RELEASED, 'Its springs were no longer all reserved when holds began to be recorded: they had been released at the counter. Cancel it to refund the deposit.'],
    );
  }
  for (const [springId, quantity] of left) {
    if (quantity === 0) continue;
    await q.query(
      `INSERT INTO "stock_hold" ("springId", "kind", "quoteId", "name", "reason", "heldQuantity", "quantity", "status", "createdById", "createdAt")
       VALUES (?, 'manual', NULL, 'Carried over', 'Reserved before holds were recorded: release it once nobody needs it', ?, ?, 'open', NULL, ${NOW})`,
      [springId, quantity, quantity],
    );
  }
}
