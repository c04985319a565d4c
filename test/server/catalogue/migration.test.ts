/**
 * The catalogue-and-stock migration on a database that already holds springs: the rows stay, their
 * stock becomes opening movements, the new CHECK constraints hold, and `down` gives the old table
 * back with its rows.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { migrations } from '../../../server/migrations';
import { CatalogueAndStock1764634000000 } from '../../../server/migrations/1764634000000-catalogue-and-stock';
import { tempDir } from '../test-context';

const mine = migrations.indexOf(CatalogueAndStock1764634000000);

async function openUpTo(dir: string, count: number): Promise<DataSource> {
  const source = new DataSource({ ...dataSourceOptions(path.join(dir, DATABASE_FILE)), migrations: migrations.slice(0, count) });
  await source.initialize();
  await source.runMigrations({ transaction: 'each' });
  return source;
}

const columnsOf = async (source: DataSource, table: string) =>
  ((await source.query(`SELECT name FROM pragma_table_info('${table}')`)) as { name: string }[]).map((c) => c.name);

test('keeps the springs already stored and records their stock as opening movements', async () => {
  expect(mine).toBeGreaterThan(0);
  const dir = tempDir();
  const before = await openUpTo(dir, mine);
  await before.query(`INSERT INTO "spring_rate" ("sku", "kind", "family", "rateNmm", "freeLengthMm", "maxDeflectionMm", "onHand", "reserved", "active")
    VALUES ('OLD-1', 'fork', 'F37x320', 8.5, 320, 190, 4, 1, 1), ('OLD-2', 'shock', 'S56x150', 90, 150, 68, 0, 0, 0)`);
  await before.destroy();

  const db = await Database.open(dir);
  const springs = await db.read.query(`SELECT "sku", "onHand", "reserved", "active", "reorderPoint", "supplier" FROM "spring_rate" ORDER BY "sku"`);
  expect(springs).toEqual([
    { sku: 'OLD-1', onHand: 4, reserved: 1, active: 1, reorderPoint: 0, supplier: null },
    { sku: 'OLD-2', onHand: 0, reserved: 0, active: 0, reorderPoint: 0, supplier: null },
  ]);
  const movements = await db.read.query(`SELECT "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "userId" FROM "stock_movement" ORDER BY "id"`);
  expect(movements).toEqual([
    { kind: 'receive', onHandDelta: 4, reservedDelta: 0, onHandAfter: 4, reservedAfter: 0, userId: null },
    { kind: 'reserve', onHandDelta: 0, reservedDelta: 1, onHandAfter: 4, reservedAfter: 1, userId: null },
  ]);
  // A second rate without its break point, and a movement that contradicts its kind, are refused by the database.
  await expect(db.write((m) => m.query(`UPDATE "spring_rate" SET "secondRateNmm" = 11 WHERE "sku" = 'OLD-1'`))).rejects.toThrow(/CHECK constraint failed/);
  await expect(
    db.write((m) =>
      m.query(`INSERT INTO "stock_movement" ("springId", "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "at", "reason")
        SELECT "id", 'receive', -1, 0, 3, 1, '2025-01-01 00:00:00.000', 'wrong' FROM "spring_rate" WHERE "sku" = 'OLD-1'`),
    ),
  ).rejects.toThrow(/CHECK constraint failed/);
  await db.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

test('down gives the table its old columns back, rows and all', async () => {
  const dir = tempDir();
  const source = await openUpTo(dir, mine + 1);
  await source.query(`INSERT INTO "spring_rate" ("sku", "kind", "family", "rateNmm", "secondRateNmm", "breakMm", "freeLengthMm", "maxDeflectionMm", "bin", "onHand")
    VALUES ('NEW-1', 'fork', 'F37x320', 8.5, 11, 100, 320, 190, 'A-1', 2)`);
  expect(await columnsOf(source, 'spring_rate')).toEqual(expect.arrayContaining(['secondRateNmm', 'breakMm', 'bin', 'reorderPoint']));
  const runner = source.createQueryRunner();
  await new CatalogueAndStock1764634000000().down(runner);
  await runner.release();
  expect(await columnsOf(source, 'spring_rate')).toEqual(['id', 'sku', 'kind', 'family', 'rateNmm', 'freeLengthMm', 'maxDeflectionMm', 'onHand', 'reserved', 'active']);
  expect(await source.query(`SELECT name FROM sqlite_master WHERE name IN ('stock_movement', 'import_batch')`)).toEqual([]);
  expect(await source.query(`SELECT "sku", "onHand" FROM "spring_rate"`)).toEqual([{ sku: 'NEW-1', onHand: 2 }]);
  await source.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});
