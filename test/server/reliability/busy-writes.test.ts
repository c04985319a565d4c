/**
 * Another connection to the file (a tool, a second process) holding SQLite's write lock: the
 * server's writes wait under the busy timeout and then succeed on top of what it committed; reads
 * answer meanwhile. Without BEGIN IMMEDIATE, a write transaction that had read before the other
 * writer committed could never write (SQLITE_BUSY_SNAPSHOT, sqlite.org/rescode.html#busy_snapshot)
 * and TypeORM would retry its statement for ever. WAL readers do not wait for a writer:
 * sqlite.org/wal.html ("readers do not block writers and a writer does not block readers").
 */
import sqlite3 from 'sqlite3';
import { Database } from '../../../server/data-source';
import { Shop } from '../../../server/entities/shop.entity';
import { tempDir } from '../test-context';

const HOLD_MS = 400;

let db: Database;
let outside: sqlite3.Database;
const exec = (sql: string) => new Promise<void>((resolve, reject) => outside.exec(sql, (err) => (err ? reject(err) : resolve())));

beforeAll(async () => {
  db = await Database.open(tempDir('sagwright-busy-'));
  await db.write((m) => m.getRepository(Shop).insert({ name: 'Busy', address: '0', email: 'busy@example.test', phone: '0', currency: 'EUR' }));
  outside = await new Promise<sqlite3.Database>((resolve, reject) => {
    const opened = new sqlite3.Database(db.file, (err) => (err ? reject(err) : resolve(opened)));
  });
  await exec('PRAGMA busy_timeout = 5000');
});
afterAll(async () => {
  await new Promise((resolve) => outside.close(resolve));
  await db.close();
});

/** Reads the counter, then writes counter + 1, in one write transaction. */
const increment = () =>
  db.write(async (m) => {
    const shop = await m.getRepository(Shop).findOneByOrFail({ name: 'Busy' });
    await m.getRepository(Shop).update(shop.id, { address: String(Number(shop.address) + 1) });
  });

async function within<T>(ms: number, work: Promise<T>): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`still waiting after ${ms} ms`)), ms);
  });
  try {
    return await Promise.race([work, late]);
  } finally {
    clearTimeout(timer);
  }
}

test('writes queued behind another connection\'s write lock wait for its commit, then build on it', async () => {
  await exec(`BEGIN IMMEDIATE; UPDATE "shop" SET "address" = '100' WHERE "name" = 'Busy';`);
  const started = Date.now();
  setTimeout(() => void exec('COMMIT'), HOLD_MS);
  const reads = await db.read.getRepository(Shop).findOneByOrFail({ name: 'Busy' });
  expect(reads.address).toBe('0');
  expect(Date.now() - started).toBeLessThan(HOLD_MS);

  await within(4000, Promise.all(Array.from({ length: 5 }, increment)));
  expect(Date.now() - started).toBeGreaterThanOrEqual(HOLD_MS - 20);
  expect((await db.read.getRepository(Shop).findOneByOrFail({ name: 'Busy' })).address).toBe('105');
});
