/** The rider-flow migration on a fresh database: its tables take good rows, refuse bad ones, and go again on down. */
import { Database } from '../../../server/data-source';
import { seed } from '../../../server/seed';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';
import { BikeModel } from '../../../server/entities/bike-model.entity';
import { RiderFlow1764634100000 } from '../../../server/migrations/1764634100000-rider-flow';
import { tempDir } from '../test-context';

const TABLES = ['bike_model', 'bike', 'rider_profile', 'measuring_draft', 'sizing_record', 'setup_log_entry', 'audit_entry'];

async function tables(db: Database): Promise<string[]> {
  const rows: { name: string }[] = await db.read.query(`SELECT name FROM sqlite_master WHERE type = 'table'`);
  return rows.map((r) => r.name);
}

test('up creates the tables, CHECKs refuse what must never be stored, down drops them', async () => {
  const db = await Database.open(tempDir());
  try {
    expect(await tables(db)).toEqual(expect.arrayContaining(TABLES));
    await seed(db, { demo: true });
    expect(await db.read.getRepository(BikeModel).count()).toBe(DEMO_BIKE_MODELS.length);

    const now = new Date();
    const insertModel = (name: string, front: unknown, rear: unknown) =>
      db.write((m) => m.query(`INSERT INTO bike_model (name, masses, front, rear, createdAt, updatedAt) VALUES (?, '{}', ?, ?, ?, ?)`, [name, front, rear, now, now]));
    await expect(insertModel('No Ends', null, null)).rejects.toThrow(/CHECK/);
    await expect(insertModel('Bad Json', '{oops', null)).rejects.toThrow(/CHECK/);
    await expect(insertModel('TARN 690 ROADSTER', '{}', null)).rejects.toThrow(/UNIQUE/);
    await expect(db.write((m) => m.query(`INSERT INTO audit_entry (at, actorName, entity, entityKey, action) VALUES (?, 'x', 'spring', 'k', 'update')`, [now]))).rejects.toThrow(/CHECK/);

    await db.write(async (m) => {
      if (!m.queryRunner) throw new Error('a write runs on a query runner');
      await new RiderFlow1764634100000().down(m.queryRunner);
    });
    const left = await tables(db);
    expect(TABLES.filter((name) => left.includes(name))).toEqual([]);
  } finally {
    await db.close();
  }
});
