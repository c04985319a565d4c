/**
 * Shop-settings edits in the audit: the migration that widens audit_entry's CHECK (rows and index
 * kept, down reverses), and PUT /api/shop-settings over HTTP on a real SQLite file writing one
 * audit row per change in the same transaction. Settings values are invented.
 */
import path from 'node:path';
import { DataSource } from 'typeorm';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { ShopSettings } from '../../../server/entities/shop-settings.entity';
import { migrations } from '../../../server/migrations';
import { AuditShopSettings1764634300000 } from '../../../server/migrations/1764634300000-audit-shop-settings';
import { ServiceDesk1764634200000 } from '../../../server/migrations/1764634200000-service-desk';
import { seed } from '../../../server/seed';
import { ShopSettingsService, writeShopSettings } from '../../../server/services/shop-settings.service';
import { createAccount } from '../auth/helpers';
import { as } from '../rider/helpers';
import { makeTestContext, tempDir, TestContext } from '../test-context';
import { TEST_SETTINGS } from './helpers';

// Accounts hashed with argon2, sizings and the card stand-in: slow on a busy machine.
jest.setTimeout(60_000);

const insertAudit = (source: { query: DataSource['query'] }, entity: string, key: string) =>
  source.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action", "before", "after") VALUES ('2026-12-01 10:00:00', 'Admin', ?, ?, 'update', '{"a":1}', '{"a":2}')`, [entity, key]);

const indexesOf = async (source: DataSource) =>
  ((await source.query(`SELECT name FROM sqlite_master WHERE type = 'index' AND tbl_name = 'audit_entry' AND sql IS NOT NULL`)) as { name: string }[]).map((r) => r.name);

test('the migration keeps the rows and the index, takes shop-settings rows, and down narrows it again', async () => {
  const before = migrations.indexOf(ServiceDesk1764634200000);
  expect(migrations.indexOf(AuditShopSettings1764634300000)).toBe(before + 1);
  const file = path.join(tempDir(), DATABASE_FILE);
  const old = new DataSource({ ...dataSourceOptions(file), migrations: migrations.slice(0, before + 1) });
  await old.initialize();
  await old.runMigrations({ transaction: 'each' });
  await insertAudit(old, 'engine-setting', 'dampingRatio');
  await expect(insertAudit(old, 'shop-settings', 'quote-terms')).rejects.toThrow(/CHECK/);
  await old.destroy();

  const source = new DataSource({ ...dataSourceOptions(file), migrations: migrations.slice(0, before + 2) });
  await source.initialize();
  try {
    await source.runMigrations({ transaction: 'each' });
    expect(await source.query(`SELECT "id", "entity", "entityKey", "before", "after" FROM "audit_entry"`)).toEqual([
      { id: 1, entity: 'engine-setting', entityKey: 'dampingRatio', before: '{"a":1}', after: '{"a":2}' },
    ]);
    expect(await indexesOf(source)).toEqual(['idx_audit_entry_entity']);
    await insertAudit(source, 'shop-settings', 'quote-terms');
    await expect(insertAudit(source, 'spring', 'x')).rejects.toThrow(/CHECK/);
    // AUTOINCREMENT carries on past the copied ids.
    expect(await source.query(`SELECT "id" FROM "audit_entry" WHERE "entity" = 'shop-settings'`)).toEqual([{ id: 2 }]);

    await source.undoLastMigration({ transaction: 'each' });
    expect(await source.query(`SELECT "id", "entity" FROM "audit_entry"`)).toEqual([{ id: 1, entity: 'engine-setting' }]);
    expect(await indexesOf(source)).toEqual(['idx_audit_entry_entity']);
    await expect(insertAudit(source, 'shop-settings', 'quote-terms')).rejects.toThrow(/CHECK/);
  } finally {
    await source.destroy();
  }
});

test('the settings change and its audit row commit together or not at all', async () => {
  const db = await Database.open(tempDir());
  try {
    await seed(db, { demo: false });
    const admin = await createAccount({ db, now: () => new Date() }, 'admin');
    await db.write((manager) => writeShopSettings(manager, TEST_SETTINGS, null, new Date()));
    // Back to the narrow CHECK: the audit insert now fails inside the settings write.
    await db.write(async (manager) => {
      if (!manager.queryRunner) throw new Error('a write runs on a query runner');
      await new AuditShopSettings1764634300000().down(manager.queryRunner);
    });
    const service = new ShopSettingsService({ db, now: () => new Date() });
    await expect(service.put(admin, { ...TEST_SETTINGS, labourRateCentsPerHour: 9900 })).rejects.toThrow(/CHECK/);
    expect((await db.read.getRepository(ShopSettings).findOneByOrFail({ id: 1 })).labourRateCentsPerHour).toBe(TEST_SETTINGS.labourRateCentsPerHour);
  } finally {
    await db.close();
  }
});

describe('PUT /api/shop-settings over HTTP', () => {
  let t: TestContext;
  beforeAll(async () => {
    t = await makeTestContext();
    await seed(t.db, { demo: false });
  });
  afterAll(() => t.dispose());

  test('the first put is a create, a change an update with before and after, and no change writes nothing', async () => {
    const adminUser = await createAccount(t, 'admin');
    const admin = await as(t, adminUser);
    const audit = async () => (await admin.get('/audit?entity=shop-settings').expect(200)).body;

    const sent = t.now().getTime();
    await admin.put('/shop-settings', TEST_SETTINGS).expect(200);
    const answered = t.now().getTime();
    const first = (await audit()).entries;
    expect(first).toHaveLength(1);
    const at = Date.parse(first[0].at);
    expect(at).toBeGreaterThanOrEqual(sent);
    expect(at).toBeLessThanOrEqual(answered);
    const terms = { ...TEST_SETTINGS, publicUrl: null };
    expect(first[0]).toEqual({
      id: expect.any(Number),
      at: first[0].at,
      actorId: adminUser.id,
      actorName: adminUser.name,
      entity: 'shop-settings',
      entityKey: 'quote-terms',
      action: 'create',
      before: null,
      after: terms,
    });

    const changed = { ...TEST_SETTINGS, labourRateCentsPerHour: 7500, deposit: { kind: 'fixed', cents: 5000 } };
    const answer = await admin.put('/shop-settings', changed).expect(200);
    expect(answer.body.settings.labourRateCentsPerHour).toBe(7500);
    const second = (await audit()).entries;
    expect(second).toHaveLength(2);
    expect(second[0]).toMatchObject({ action: 'update', actorId: adminUser.id, before: terms, after: { ...terms, labourRateCentsPerHour: 7500, deposit: { kind: 'fixed', cents: 5000 } } });
    // The same shape as the other audit rows: the whole list reads them all.
    expect((await admin.get('/audit').expect(200)).body.entries[0].id).toBe(second[0].id);

    const updatedAt = answer.body.settings.updatedAt;
    t.advanceClock(60_000);
    const asAdmin = await as(t, adminUser);
    const same = await asAdmin.put('/shop-settings', changed).expect(200);
    expect(same.body.settings.updatedAt).toBe(updatedAt);
    expect((await asAdmin.get('/audit?entity=shop-settings').expect(200)).body.total).toBe(2);
  });

  test('a refused put (bad field, or a desk account) leaves no audit row', async () => {
    const admin = await as(t, await createAccount(t, 'admin'));
    const desk = await as(t, await createAccount(t, 'desk'));
    const total = async () => (await admin.get('/audit?entity=shop-settings').expect(200)).body.total;
    const before = await total();
    const bad = await admin.put('/shop-settings', { ...TEST_SETTINGS, taxBasisPoints: 2000.5 }).expect(400);
    expect(bad.body.error.fields.taxBasisPoints).toBeDefined();
    await desk.put('/shop-settings', { ...TEST_SETTINGS, taxBasisPoints: 2100 }).expect(403);
    expect(await total()).toBe(before);
  });
});
