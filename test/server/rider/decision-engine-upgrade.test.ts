/**
 * An installation made before the one-decision engine: the bike's load-case column comes and goes
 * with its migration, the seed part adds the decision's settings and retires the "two-up"
 * discipline, and a record stored by engine 1.1.0 is still shown as that engine made it.
 */
import { Database } from '../../../server/data-source';
import { EngineSetting } from '../../../server/entities/engine-setting.entity';
import { RiderProfile } from '../../../server/entities/rider-profile.entity';
import { SeedRecord } from '../../../server/entities/seed-record.entity';
import { SizingRecord } from '../../../server/entities/sizing-record.entity';
import { TargetProfile } from '../../../server/entities/target-profile.entity';
import { BikeLoadCase1764634600000 } from '../../../server/migrations/1764634600000-bike-load-case';
import { seed } from '../../../server/seed';
import { ENGINE_VERSION } from '../../../shared/sizing';
import { createAccount } from '../auth/helpers';
import { makeTestContext, tempDir } from '../test-context';
import { addHandBike, as, READINGS, WEIGH_IN } from './helpers';

async function columns(db: Database, table: string): Promise<string[]> {
  const rows: { name: string }[] = await db.read.query(`PRAGMA table_info("${table}")`);
  return rows.map((r) => r.name);
}

test('the load-case column takes JSON only, and goes with its down', async () => {
  const db = await Database.open(tempDir());
  try {
    expect(await columns(db, 'bike')).toContain('loadCase');
    await seed(db, { demo: true });
    const now = new Date();
    const insert = (loadCase: string | null) =>
      db.write((m) =>
        m.query(`INSERT INTO bike (ownerId, nickname, masses, front, rear, loadCase, createdAt, updatedAt) VALUES ((SELECT MIN(id) FROM "user"), 'x', '{}', '{}', null, ?, ?, ?)`, [loadCase, now, now]),
      );
    await insert(null);
    await insert('{"name":"With luggage","solo":{"front":5}}');
    await expect(insert('{oops')).rejects.toThrow(/CHECK/);
    await db.write(async (m) => new BikeLoadCase1764634600000().down(m.queryRunner!));
    expect(await columns(db, 'bike')).not.toContain('loadCase');
    await db.write(async (m) => new BikeLoadCase1764634600000().up(m.queryRunner!));
    expect(await columns(db, 'bike')).toContain('loadCase');
  } finally {
    await db.close();
  }
});

test('the seed part gives an older installation the decision\'s settings and retires "two-up"', async () => {
  const t = await makeTestContext();
  try {
    await seed(t.db, { demo: false });
    const rider = await createAccount(t, 'rider');
    // As such an installation was: the two settings missing, a two-up profile, a weigh-in naming it.
    await t.db.write(async (m) => {
      await m.delete(EngineSetting, ['marginalRatePct', 'staticLoadMismatchPct']);
      await m.insert(TargetProfile, { ...(await m.findOneByOrFail(TargetProfile, { discipline: 'road' })), discipline: 'two-up', label: 'Two-up', sortOrder: 9 });
      await m.delete(SeedRecord, { name: 'decision-engine' });
    });
    await (await as(t, rider)).put('/weigh-in', WEIGH_IN).expect(200);
    await t.db.write((m) => m.update(RiderProfile, { userId: rider.id }, { weighIn: { ...WEIGH_IN, discipline: 'two-up' } }));

    expect(await seed(t.db, { demo: false })).toEqual(['decision-engine']);
    const settings = await t.db.read.getRepository(EngineSetting).findBy({});
    expect(settings.find((s) => s.key === 'marginalRatePct')?.value).toBe(20);
    expect(settings.find((s) => s.key === 'staticLoadMismatchPct')?.value).toBe(20);
    expect(await t.db.read.getRepository(TargetProfile).existsBy({ discipline: 'two-up' })).toBe(false);
    expect((await t.db.read.getRepository(RiderProfile).findOneByOrFail({ userId: rider.id })).weighIn?.discipline).toBe('touring');
    // A second start changes nothing.
    expect(await seed(t.db, { demo: false })).toEqual([]);
  } finally {
    await t.dispose();
  }
});

test('a record stored by engine 1.1.0 keeps its version and its headline, in the shape the API answers now', async () => {
  const t = await makeTestContext();
  try {
    await seed(t.db, { demo: false });
    const a = await as(t, await createAccount(t, 'rider'));
    await a.put('/weigh-in', WEIGH_IN).expect(200);
    const bikeId = await addHandBike(a);
    const fresh = (await a.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201)).body.record;
    expect(fresh.engineVersion).toBe(ENGINE_VERSION);
    expect(fresh.result.front.decision.legacy).toBeUndefined();

    // Rewrite it as 1.1.0 stored it: a verdict sentence, "recommended" for the ride after, no decision.
    await t.db.write(async (m) => {
      const [row] = await m.query(`SELECT result, summary FROM sizing_record WHERE id = ?`, [fresh.id]);
      const result = JSON.parse(row.result);
      for (const end of ['front', 'rear']) {
        const { decision: _d, loadCases: _l, sagDifference: _s, idealRateBandNmm: _b, installedSpring: _i, ...old } = result[end];
        old.verdictText = `Old sentence for the ${end}.`;
        old.rideFrequencyHz = { current: 2, recommended: 2.5, note: old.rideFrequencyHz.note };
        result[end] = old;
      }
      result.engineVersion = '1.1.0';
      const summary = JSON.parse(row.summary);
      delete summary.front.decision;
      await m.query(`UPDATE sizing_record SET result = ?, summary = ?, engineVersion = '1.1.0' WHERE id = ?`, [JSON.stringify(result), JSON.stringify(summary), fresh.id]);
    });
    const { record } = (await a.get(`/sizing-records/${fresh.id}`).expect(200)).body;
    expect(record.engineVersion).toBe('1.1.0');
    expect(record.result.front.decision).toMatchObject({ legacy: true, steps: [], text: { headline: 'Old sentence for the front.' } });
    expect(record.result.front.rideFrequencyHz).toMatchObject({ current: 2, after: 2.5 });
    expect(record.result.rear.loadCases).toEqual([]);
    expect(record.front.decision).toBeNull();
    // A quote made from it is built on the spring that engine put forward: its best in stock, else its best to
    // order, wherever its verdict was not keep.
    const stored = (await t.db.read.getRepository(SizingRecord).findOneByOrFail({ id: fresh.id })).result;
    for (const end of ['front', 'rear'] as const) {
      const old = stored[end]!;
      const offered = old.verdict !== 'keep' ? (old.recommendation.inStock ?? old.recommendation.best) : null;
      expect(old.decision.pick?.sku ?? null).toBe(offered?.sku ?? null);
    }
  } finally {
    await t.dispose();
  }
});
