import { Database } from '../../server/data-source';
import { Shop } from '../../server/entities/shop.entity';
import { seed } from '../../server/seed';
import { tempDir } from './test-context';

test('the demo loads once and survives a restart; a new folder starts clean', async () => {
  const dir = tempDir();
  let db = await Database.open(dir);
  expect(await seed(db, { demo: true })).toEqual(expect.arrayContaining(['sizing-defaults', 'demo-workshop', 'demo-catalogue']));
  await db.close();

  db = await Database.open(dir);
  expect(await seed(db, { demo: true })).toEqual([]);
  expect(await db.read.getRepository(Shop).count()).toBe(1);
  await db.close();

  const fresh = await Database.open(tempDir());
  expect(await fresh.read.getRepository(Shop).count()).toBe(0);
  await fresh.close();
});
