/**
 * The test-ride-loop migration: the tables and their CHECKs, which refuse what the loop must never
 * store (a change made that was never proposed, a verdict before the change, an undo of a change
 * that did not ride worse, two open rides on one bike, a rule naming an adjuster kind not on the
 * list or a symptom at an end it cannot have), the audit taking the table's edits, and `down`
 * dropping it all so that `up` and the seed run again cleanly. Rows are invented test data.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { migrations } from '../../../server/migrations';
import { TestRideLoop1764635000000 } from '../../../server/migrations/1764635000000-test-ride-loop';
import { seed } from '../../../server/seed';
import { SEEDED_DAMPING_RULES } from '../../../shared/damping/seeded-rules';
import { handBike } from '../rider/helpers';
import { tempDir } from '../test-context';

const mine = migrations.indexOf(TestRideLoop1764635000000);
const AT = '2026-11-01 09:00:00.000';
const CHANGE = JSON.stringify({ kind: 'change', change: { adjuster: 'rebound', from: 12, to: 10 } });
const NONE = JSON.stringify({ kind: 'none', reason: 'Nothing left to try.' });

async function openWith(dir: string, count: number): Promise<DataSource> {
  const source = new DataSource({ ...dataSourceOptions(path.join(dir, DATABASE_FILE)), migrations: migrations.slice(0, count) });
  await source.initialize();
  await source.runMigrations({ transaction: 'each' });
  return source;
}

async function storeBike(source: DataSource): Promise<void> {
  const bike = handBike();
  await source.query(`INSERT INTO "user" ("id", "email", "name", "role", "passwordHash", "createdAt") VALUES (1, 'rider@example.test', 'Test Rider', 'rider', 'x', '${AT}')`);
  await source.query(`INSERT INTO "bike" ("id", "ownerId", "nickname", "masses", "front", "rear", "createdAt", "updatedAt") VALUES (1, 1, 'Bike', ?, ?, ?, '${AT}', '${AT}')`, [
    JSON.stringify(bike.masses),
    JSON.stringify(bike.front),
    JSON.stringify(bike.rear),
  ]);
}

type Ride = Record<string, string | number | null>;

/** A ride proposed as a change, with any columns overridden. */
function insertRide(source: DataSource, overrides: Ride = {}) {
  const row: Ride = {
    bikeId: 1,
    end: 'front',
    symptom: 'bounces-after-bump',
    strength: 'clear',
    reportedAt: AT,
    proposal: CHANGE,
    proposalKind: 'change',
    adjuster: 'rebound',
    direction: 'more',
    fromPosition: 12,
    toPosition: 10,
    ...overrides,
  };
  const columns = Object.keys(row);
  return source.query(`INSERT INTO "test_ride" (${columns.map((c) => `"${c}"`).join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`, Object.values(row));
}

test('up: the CHECKs tie the ride states together and the table to the kinds and symptoms', async () => {
  expect(mine).toBeGreaterThan(0);
  const dir = tempDir();
  const source = await openWith(dir, mine + 1);
  await storeBike(source);

  const refused: [string, Ride][] = [
    ['made without a change proposed', { proposal: NONE, proposalKind: 'none', adjuster: null, direction: null, fromPosition: null, toPosition: null, madeAt: AT, setupLogEntryId: 1 }],
    ['a kind that is not the proposal’s', { proposalKind: 'spring' }],
    ['a change without its positions', { toPosition: null }],
    ['a change to where it is', { toPosition: 12 }],
    ['made after it was superseded', { supersededAt: AT, madeAt: AT, setupLogEntryId: 1 }],
    ['made without its log entry', { madeAt: AT }],
    ['judged before it was made', { outcome: 'better', judgedAt: AT }],
    ['an outcome without its time', { madeAt: AT, setupLogEntryId: 1, outcome: 'better' }],
    ['undone after a better ride', { madeAt: AT, setupLogEntryId: 1, outcome: 'better', judgedAt: AT, undoneAt: AT, undoLogEntryId: 2 }],
    ['undone without its log entry', { madeAt: AT, setupLogEntryId: 1, outcome: 'worse', judgedAt: AT, undoneAt: AT }],
    ['a symptom the end cannot have', { end: 'rear', symptom: 'dives-braking' }],
    ['an unknown strength', { strength: 'huge' }],
  ];
  for (const [label, overrides] of refused) {
    await expect(insertRide(source, overrides).then(() => label)).rejects.toThrow(/CHECK/);
  }

  await insertRide(source, { madeAt: AT, setupLogEntryId: 1, outcome: 'worse', judgedAt: AT, undoneAt: AT, undoLogEntryId: 2 });
  await insertRide(source, { proposal: NONE, proposalKind: 'none', adjuster: null, direction: null, fromPosition: null, toPosition: null });
  await insertRide(source, { supersededAt: AT });
  await insertRide(source);
  // One change at a time: a second ride waiting to be made or judged on the bike is refused.
  await expect(insertRide(source, { madeAt: AT, setupLogEntryId: 3 })).rejects.toThrow(/UNIQUE/);

  const insertRule = (adjuster: string, symptom = 'bounces-after-bump', end = 'front') =>
    source.query(
      `INSERT INTO "damping_rule" ("symptom", "end", "adjuster", "direction", "priority", "why", "feelFor", "source", "createdAt", "updatedAt") VALUES (?, ?, ?, 'more', 1, 'Why.', 'Feel.', 'shop', '${AT}', '${AT}')`,
      [symptom, end, adjuster],
    );
  await expect(insertRule('mid-valve')).rejects.toThrow(/FOREIGN KEY/);
  await expect(insertRule('rebound', 'squats-throttle', 'front')).rejects.toThrow(/CHECK/);
  await insertRule('rebound');
  await expect(insertRule('rebound')).rejects.toThrow(/UNIQUE/);

  await source.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damping-rule', '1', 'create')`);
  expect(await source.query(`SELECT "name" FROM "sqlite_master" WHERE "type" = 'index' AND "tbl_name" = 'audit_entry' AND "sql" IS NOT NULL`)).toEqual([{ name: 'idx_audit_entry_entity' }]);
  // A bike deleted takes its rides along.
  await source.query(`DELETE FROM "bike" WHERE "id" = 1`);
  expect(await source.query(`SELECT count(*) AS n FROM "test_ride"`)).toEqual([{ n: 0 }]);
  await source.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});

test('down drops the tables and the audit rows of the table; up and the seed then run again', async () => {
  // Database.open runs every migration, and undoing the last one must undo this one.
  expect(mine).toBe(migrations.length - 1);
  const dir = tempDir();
  const db = await Database.open(dir);
  expect(await seed(db, { demo: false })).toContain('damping-rules');
  await db.write((m) => m.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damper-kind', 'x', 'create')`));
  await db.write((m) => m.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damping-rule', '1', 'update')`));
  await db.close();

  const source = await openWith(dir, mine + 1);
  await source.undoLastMigration({ transaction: 'each' });
  const tables = await source.query(`SELECT "name" FROM "sqlite_master" WHERE "name" IN ('damping_rule', 'test_ride')`);
  expect(tables).toEqual([]);
  expect(await source.query(`SELECT "entity" FROM "audit_entry"`)).toEqual([{ entity: 'damper-kind' }]);
  await expect(source.query(`INSERT INTO "audit_entry" ("at", "actorName", "entity", "entityKey", "action") VALUES ('${AT}', 'Admin', 'damping-rule', '1', 'create')`)).rejects.toThrow(
    /CHECK/,
  );
  expect(await source.query(`SELECT "name" FROM "seed_record" WHERE "name" = 'damping-rules'`)).toEqual([]);
  await source.destroy();

  const again = await Database.open(dir);
  expect(await seed(again, { demo: false })).toEqual(['damping-rules']);
  expect(await again.read.query(`SELECT count(*) AS n FROM "damping_rule"`)).toEqual([{ n: SEEDED_DAMPING_RULES.length }]);
  await again.close();
  fs.rmSync(dir, { recursive: true, force: true });
});
