/**
 * Backups taken with SQLite's online backup while stock is being written, then restored: the copy
 * opens, passes PRAGMA integrity_check, and is a consistent moment (every spring's stock equals
 * the sum of its movements in the copy, as it must in the live database).
 */
import fs from 'node:fs';
import path from 'node:path';
import { Database, DATABASE_FILE } from '../../../server/data-source';
import { checkIntegrity } from '../../../server/db/online-backup';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { seed } from '../../../server/seed';
import { StockService } from '../../../server/services/stock.service';
import { backupDatabase } from '../../../server/tools/backup';
import { restoreDatabase } from '../../../server/tools/restore';
import { makeTestContext, TestContext, tempDir } from '../test-context';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
});
afterAll(() => t.dispose());

async function stockMismatches(db: Database): Promise<unknown[]> {
  return db.read.query(`
    SELECT s.sku, s.onHand, s.reserved, COALESCE(SUM(m.onHandDelta), 0) AS movedOnHand, COALESCE(SUM(m.reservedDelta), 0) AS movedReserved
    FROM spring_rate s LEFT JOIN stock_movement m ON m.springId = s.id
    GROUP BY s.id
    HAVING s.onHand != movedOnHand OR s.reserved != movedReserved`);
}

test('a backup taken under write load restores to a sound, consistent database', async () => {
  const springs = await t.db.read.getRepository(SpringRate).find({ select: { id: true } });
  const stock = new StockService(t);
  let writing = true;
  let written = 0;
  const load = (async () => {
    while (writing) {
      const springId = springs[written % springs.length].id;
      await t.db.write((m) => stock.receive(m, { springId, quantity: 1, userId: null, reason: 'delivery under load' }));
      written += 1;
    }
  })();

  await new Promise((resolve) => setTimeout(resolve, 50));
  const file = await backupDatabase(t.config.dataDir, path.join(tempDir(), 'copy.sqlite'));
  const writtenDuringBackup = written;
  writing = false;
  await load;
  expect(writtenDuringBackup).toBeGreaterThan(0);

  expect(await checkIntegrity(file)).toBe('ok');
  const restoredDir = tempDir();
  await restoreDatabase(restoredDir, file);
  expect(await checkIntegrity(path.join(restoredDir, DATABASE_FILE))).toBe('ok');

  const restored = await Database.open(restoredDir);
  try {
    expect(await stockMismatches(restored)).toEqual([]);
    const [{ movements }] = await restored.read.query(`SELECT COUNT(*) AS movements FROM stock_movement WHERE reason = 'delivery under load'`);
    // The copy is one moment of the live database: some of the load, never more than was written.
    expect(movements).toBeGreaterThan(0);
    expect(movements).toBeLessThanOrEqual(written);
  } finally {
    await restored.close();
  }
  expect(await stockMismatches(t.db)).toEqual([]);
});

test('a damaged backup is refused and nothing is restored', async () => {
  const bogus = path.join(tempDir(), 'not-a-database.sqlite');
  fs.writeFileSync(bogus, 'this is not a database file at all, just text'.repeat(100));
  const dir = tempDir();
  await expect(restoreDatabase(dir, bogus)).rejects.toThrow();
  expect(fs.existsSync(path.join(dir, DATABASE_FILE))).toBe(false);
});
