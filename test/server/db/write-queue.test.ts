import { Shop } from '../../../server/entities/shop.entity';
import { Database } from '../../../server/data-source';
import { tempDir } from '../test-context';

let db: Database;
beforeAll(async () => {
  db = await Database.open(tempDir());
  await db.write((m) => m.getRepository(Shop).insert({ name: 'Counter', address: '0', email: 'c@x.test', phone: '0', currency: 'EUR' }));
});
afterAll(() => db.close());

// Each transaction reads the counter, yields to the event loop, then writes counter + 1: without
// the queue, overlapping transactions on TypeORM's one SQLite connection fail or lose updates.
async function increment(fail = false) {
  return db.write(async (m) => {
    const shop = await m.getRepository(Shop).findOneByOrFail({ name: 'Counter' });
    await new Promise((resolve) => setImmediate(resolve));
    await m.getRepository(Shop).update(shop.id, { address: String(Number(shop.address) + 1) });
    if (fail) throw new Error('rolled back on purpose');
  });
}

test('many transactions at once all commit, one at a time', async () => {
  const results = await Promise.allSettled(Array.from({ length: 60 }, () => increment()));
  expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
  const shop = await db.read.getRepository(Shop).findOneByOrFail({ name: 'Counter' });
  expect(shop.address).toBe('60');
});

test('a failing transaction rolls back and does not block the ones queued behind it', async () => {
  const before = Number((await db.read.getRepository(Shop).findOneByOrFail({ name: 'Counter' })).address);
  const results = await Promise.allSettled([increment(), increment(true), increment()]);
  expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
  const after = Number((await db.read.getRepository(Shop).findOneByOrFail({ name: 'Counter' })).address);
  expect(after).toBe(before + 2);
  expect(db.pendingWrites).toBe(0);
});

test('reads come from a read-only connection', async () => {
  await expect(db.read.query(`DELETE FROM shop`)).rejects.toThrow(/readonly/i);
});
