/**
 * The damper-adjusters migration on a database written before it: a stored bike model, bike and
 * setup-log entry with clickers come out with the same settings as damping adjusters counted in
 * clicks, the six kinds of the trade are listed, and the audit takes additions to the list. `down`
 * gives the clickers back, dropping what they cannot hold. Rows are invented test data; the checks
 * are common practice, no source.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { bikeSpecSchema } from '../../../shared/schemas/bike.schema';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { migrations } from '../../../server/migrations';
import { DamperAdjusters1764634900000 } from '../../../server/migrations/1764634900000-damper-adjusters';
import { tempDir } from '../test-context';
import { handBike } from './helpers';

const mine = migrations.indexOf(DamperAdjusters1764634900000);

async function openUpTo(dir: string, count: number): Promise<DataSource> {
  const source = new DataSource({ ...dataSourceOptions(path.join(dir, DATABASE_FILE)), migrations: migrations.slice(0, count) });
  await source.initialize();
  await source.runMigrations({ transaction: 'each' });
  return source;
}

const AT = '2026-11-01 09:00:00.000';

/** The hand-made bike as it was stored before: fork rebound 12 and compression 10 of 20 clicks, shock rebound 14 of 24. */
function oldBike() {
  const { front, rear, masses } = handBike();
  const { dampers: _front, ...fork } = front!;
  const { dampers: _rear, ...shock } = rear!;
  return {
    masses,
    front: { ...fork, clickers: { rebound: { position: 12, maxPosition: 20 }, compression: { position: 10, maxPosition: 20 } } },
    rear: { ...shock, clickers: { rebound: { position: 14, maxPosition: 24 }, compression: null } },
  };
}

const SPRING = { rateNmm: 8.5, secondRateNmm: null, breakMm: null, family: 'F37x320', preloadMm: 10, preloadPosition: 5 };

/** A setup-log entry's settings as stored before: positions of rebound and compression, null without. */
function oldSettings(frontRebound: number, rearRebound: number | null = 14) {
  return { front: { ...SPRING, rebound: frontRebound, compression: 10 }, rear: { ...SPRING, rebound: rearRebound, compression: null } };
}

async function storeOldRows(source: DataSource): Promise<void> {
  const bike = oldBike();
  await source.query(`INSERT INTO "user" ("id", "email", "name", "role", "passwordHash", "createdAt") VALUES (1, 'rider@example.test', 'Test Rider', 'rider', 'x', '${AT}')`);
  await source.query(`INSERT INTO "bike_model" ("id", "name", "description", "masses", "front", "rear", "createdAt", "updatedAt") VALUES (1, 'Old Model 600', '', ?, ?, NULL, '${AT}', '${AT}')`, [
    JSON.stringify(bike.masses),
    JSON.stringify(bike.front),
  ]);
  await source.query(`INSERT INTO "bike" ("id", "ownerId", "modelId", "nickname", "masses", "front", "rear", "createdAt", "updatedAt") VALUES (1, 1, 1, 'Old bike', ?, ?, ?, '${AT}', '${AT}')`, [
    JSON.stringify(bike.masses),
    JSON.stringify(bike.front),
    JSON.stringify(bike.rear),
  ]);
  await source.query(`INSERT INTO "setup_log_entry" ("id", "bikeId", "kind", "note", "before", "after", "createdAt") VALUES (1, 1, 'change', 'rebound in', ?, ?, '${AT}')`, [
    JSON.stringify(oldSettings(14)),
    JSON.stringify(oldSettings(12)),
  ]);
  await source.query(`INSERT INTO "audit_entry" ("id", "at", "actorId", "actorName", "entity", "entityKey", "action", "before", "after") VALUES (1, '${AT}', NULL, 'Admin', 'bike-model', '1', 'create', NULL, ?)`, [
    JSON.stringify({ id: 1, ...bike }),
  ]);
}

const json = (text: string | null) => (text === null ? null : JSON.parse(text));

test('up turns stored clickers into damping adjusters and lists the six kinds of the trade', async () => {
  expect(mine).toBeGreaterThan(0);
  const dir = tempDir();
  const before = await openUpTo(dir, mine);
  await storeOldRows(before);
  await before.destroy();

  const db = await Database.open(dir);
  const clicks = (kind: string, position: number, maxPosition: number) => ({ kind, unit: 'clicks', maxPosition, standard: null, position, dampingPerStepNsPerM: null });
  const [model] = await db.read.query(`SELECT "front", "rear" FROM "bike_model" WHERE "id" = 1`);
  expect(json(model.front).dampers).toEqual([clicks('rebound', 12, 20), clicks('compression', 10, 20)]);
  expect(json(model.front)).not.toHaveProperty('clickers');
  expect(model.rear).toBeNull();
  const [bike] = await db.read.query(`SELECT "masses", "front", "rear" FROM "bike" WHERE "id" = 1`);
  const stored = { masses: json(bike.masses), front: json(bike.front), rear: json(bike.rear) };
  expect(stored).toEqual(handBike());
  await expect(bikeSpecSchema.validate(stored, { strict: true })).resolves.toBeTruthy();

  const [entry] = await db.read.query(`SELECT "before", "after" FROM "setup_log_entry" WHERE "id" = 1`);
  expect([json(entry.before).front.dampers, json(entry.after).front.dampers, json(entry.after).rear.dampers]).toEqual([{ rebound: 14, compression: 10 }, { rebound: 12, compression: 10 }, { rebound: 14 }]);
  expect(json(entry.after).front).not.toHaveProperty('rebound');
  expect(json(entry.after).front).toEqual(expect.objectContaining({ rateNmm: 8.5, preloadPosition: 5, preloadMm: 10 }));

  const kinds = await db.read.query(`SELECT "key", "label", "circuit", "speed" FROM "damper_kind" ORDER BY rowid`);
  expect(kinds.map((k: { key: string }) => k.key)).toEqual(['rebound', 'compression', 'hs-compression', 'ls-compression', 'hs-rebound', 'ls-rebound']);
  // The audit keeps what was written then, its ids and its index, and now takes the list's additions.
  const [audit] = await db.read.query(`SELECT "id", "after" FROM "audit_entry"`);
  expect([audit.id, json(audit.after).front.clickers.rebound]).toEqual([1, { position: 12, maxPosition: 20 }]);
  await db.write((m) => m.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damper-kind', 'x', 'create')`));
  await expect(db.write((m) => m.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'spring', 'x', 'create')`))).rejects.toThrow(/CHECK/);
  expect(await db.read.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'index' AND "tbl_name" = 'audit_entry' AND "sql" IS NOT NULL`)).toEqual([{ name: 'idx_audit_entry_entity' }]);

  // The CHECKs refuse a key out of shape, an empty label, an unknown circuit or speed.
  const insertKind = (key: string, label: string, circuit: string, speed: string) =>
    db.write((m) => m.query(`INSERT INTO "damper_kind" ("key", "label", "circuit", "speed", "createdAt") VALUES (?, ?, ?, ?, '${AT}')`, [key, label, circuit, speed]));
  for (const bad of [
    ['Rebound-2', 'x', 'rebound', 'all'],
    ['2-stage', 'x', 'rebound', 'all'],
    ['mid valve', 'x', 'rebound', 'all'],
    [`a${'b'.repeat(40)}`, 'x', 'rebound', 'all'],
    ['mid-valve', ' ', 'rebound', 'all'],
    ['mid-valve', 'x', 'both', 'all'],
    ['mid-valve', 'x', 'rebound', 'medium'],
  ]) {
    await expect(insertKind(bad[0], bad[1], bad[2], bad[3])).rejects.toThrow(/CHECK/);
  }
  await insertKind('mid-valve-2', 'Mid-valve bleed', 'compression', 'low');
  await expect(insertKind('rebound', 'Again', 'rebound', 'all')).rejects.toThrow(/UNIQUE/);
  await db.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

test('down gives the clickers back and drops what they cannot hold: other kinds, turns, the list', async () => {
  const dir = tempDir();
  const before = await openUpTo(dir, mine);
  await storeOldRows(before);
  await before.destroy();

  const source = await openUpTo(dir, mine + 1);
  // Since the migration: the fork gained high-speed compression in turns, the shock's rebound became turns.
  const bike = handBike();
  bike.front!.dampers.push({ kind: 'hs-compression', unit: 'turns', maxPosition: 3, standard: 1.5, position: 1.5, dampingPerStepNsPerM: null });
  bike.rear!.dampers = [
    { kind: 'rebound', unit: 'turns', maxPosition: 3, standard: 1.5, position: 1.75, dampingPerStepNsPerM: null },
    { kind: 'compression', unit: 'clicks', maxPosition: 20, standard: 10, position: 9, dampingPerStepNsPerM: 40 },
  ];
  await source.query(`UPDATE "bike" SET "front" = ?, "rear" = ? WHERE "id" = 1`, [JSON.stringify(bike.front), JSON.stringify(bike.rear)]);
  const settings = { front: { ...SPRING, dampers: { rebound: 12, compression: 10, 'hs-compression': 1.5 } }, rear: { ...SPRING, dampers: { rebound: 1.75, compression: 9 } } };
  await source.query(`INSERT INTO "setup_log_entry" ("id", "bikeId", "kind", "note", "before", "after", "createdAt") VALUES (2, 1, 'change', '', ?, ?, '${AT}')`, [JSON.stringify(settings), JSON.stringify(settings)]);
  await source.query(`INSERT INTO "damper_kind" ("key", "label", "circuit", "speed", "createdAt") VALUES ('mid-valve', 'Mid-valve bleed', 'compression', 'low', '${AT}')`);
  await source.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damper-kind', 'mid-valve', 'create')`);

  await source.undoLastMigration({ transaction: 'each' });

  const [stored] = await source.query(`SELECT "front", "rear" FROM "bike" WHERE "id" = 1`);
  expect([json(stored.front).clickers, json(stored.rear).clickers]).toEqual([
    { rebound: { position: 12, maxPosition: 20 }, compression: { position: 10, maxPosition: 20 } },
    { rebound: null, compression: { position: 9, maxPosition: 20 } },
  ]);
  expect(json(stored.front)).not.toHaveProperty('dampers');
  const [model] = await source.query(`SELECT "front" FROM "bike_model" WHERE "id" = 1`);
  expect(json(model.front)).toEqual(oldBike().front);
  const entries = await source.query(`SELECT "before", "after" FROM "setup_log_entry" ORDER BY "id"`);
  // The shock's rebound counts turns now: its positions are dropped from the log, the clicks kept.
  expect([json(entries[0].before), json(entries[0].after)]).toEqual([oldSettings(14, null), oldSettings(12, null)]);
  expect(json(entries[1].after)).toEqual({ front: { ...SPRING, rebound: 12, compression: 10 }, rear: { ...SPRING, rebound: null, compression: 9 } });

  expect(await source.query(`SELECT "name" FROM "sqlite_master" WHERE "name" = 'damper_kind'`)).toEqual([]);
  expect(await source.query(`SELECT "entity" FROM "audit_entry" ORDER BY "id"`)).toEqual([{ entity: 'bike-model' }]);
  await expect(source.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damper-kind', 'x', 'create')`)).rejects.toThrow(/CHECK/);
  await source.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});
