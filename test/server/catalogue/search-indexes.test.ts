/**
 * The catalogue search indexes: the FTS5 trigram index finds what `LIKE '%…%'` found (substrings
 * of SKU, family and, for the counter, the supplier's code, ignoring case) and follows every
 * insert, edit and delete; the migration indexes springs already stored and `down` removes it
 * all; the searches run on the indexes (EXPLAIN QUERY PLAN).
 * Source for the trigram behaviour: SQLite's FTS5 documentation, section 4.3.4 "The Trigram
 * Tokenizer" (sqlite.org/fts5.html): substring matching for 3 or more characters, case-insensitive
 * by default.
 */
import path from 'node:path';
import { DataSource } from 'typeorm';
import { springListSchema } from '../../../shared/schemas/catalogue.schema';
import type { Role } from '../../../shared/types/roles';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { migrations } from '../../../server/migrations';
import { CatalogueSearchIndexes1764634400000 } from '../../../server/migrations/1764634400000-catalogue-search-indexes';
import { SearchOrderIndexes1764634500000 } from '../../../server/migrations/1764634500000-search-order-indexes';
import { CatalogueService } from '../../../server/services/catalogue.service';
import { makeTestContext, tempDir, TestContext } from '../test-context';
import { createSpring } from './helpers';

let t: TestContext;

beforeAll(async () => {
  t = await makeTestContext();
  await createSpring(t, { sku: 'QX-F43x290-0850', kind: 'fork', family: 'F43x290', rateNmm: 8.5, freeLengthMm: 290, maxDeflectionMm: 175, innerDiameterMm: 30, outerDiameterMm: 43, wireDiameterMm: 5, supplierCode: 'TW-431290' });
  await createSpring(t, { sku: 'QX-S56x150-0900', family: 'S56x150', supplierCode: 'QM-561500' });
  await createSpring(t, { sku: 'ZR-S61x170-1000', family: 'S61x170', supplierCode: 'QM-611700' });
});

afterAll(() => t.dispose());

async function search(query: Record<string, string>, role: Role = 'counter'): Promise<string[]> {
  const input = await springListSchema.validate(query);
  return (await new CatalogueService(t).list(input, role)).springs.map((s) => s.sku).sort();
}

describe('text search through the trigram index', () => {
  test('finds a substring of the SKU, the family or the supplier code, in any case', async () => {
    expect(await search({ q: 'x290' })).toEqual(['QX-F43x290-0850']);
    expect(await search({ q: 'qx-s56' })).toEqual(['QX-S56x150-0900']);
    expect(await search({ q: 's61X170' })).toEqual(['ZR-S61x170-1000']);
    expect(await search({ q: '1290' })).toEqual(['QX-F43x290-0850']);
    expect(await search({ q: 'QM-' })).toEqual(['QX-S56x150-0900', 'ZR-S61x170-1000']);
    expect(await search({ q: 'none-such' })).toEqual([]);
  });

  test('the desk and riders cannot find springs by the supplier code they do not see', async () => {
    expect(await search({ q: 'QM-' }, 'desk')).toEqual([]);
    expect(await search({ q: 'TW-431' }, 'rider')).toEqual([]);
    expect(await search({ q: 'x150' }, 'rider')).toEqual(['QX-S56x150-0900']);
  });

  test('a search shorter than three characters still finds substrings (without the index)', async () => {
    expect(await search({ q: 'ZR' })).toEqual(['ZR-S61x170-1000']);
    expect(await search({ q: 'x1' })).toEqual(['QX-S56x150-0900', 'ZR-S61x170-1000']);
  });

  test('quotes, percent signs and FTS5 operators in the text are searched as text', async () => {
    expect(await search({ q: '"QX' })).toEqual([]);
    expect(await search({ q: 'QX OR ZR' })).toEqual([]);
    expect(await search({ q: '%-S' })).toEqual([]);
    expect(await search({ q: 'x150-0900*' })).toEqual([]);
  });

  test('follows edits and deletes of the searched columns', async () => {
    const spring = await createSpring(t, { sku: 'ED-S56x150-0950', supplierCode: 'ED-1' });
    expect(await search({ q: 'ED-S56' })).toEqual(['ED-S56x150-0950']);
    await new CatalogueService(t).update(spring.id, { sku: 'NW-S56x150-0950', supplierCode: 'NW-7' });
    expect(await search({ q: 'ED-S56' })).toEqual([]);
    expect(await search({ q: 'NW-S56' })).toEqual(['NW-S56x150-0950']);
    await t.db.write((m) => m.query(`DELETE FROM "spring_rate" WHERE "id" = ?`, [spring.id]));
    expect(await search({ q: 'NW-S56' })).toEqual([]);
    const [{ problems }] = await t.db.read.query(`SELECT count(*) AS "problems" FROM "spring_rate_search" WHERE "spring_rate_search" MATCH '"NW-"'`);
    expect(problems).toBe(0);
  });
});

describe('query plans', () => {
  const plan = async (sql: string) => ((await t.db.read.query(`EXPLAIN QUERY PLAN ${sql}`)) as { detail: string }[]).map((p) => p.detail).join(' / ');

  test('each search runs on its index, not a scan of every spring', async () => {
    expect(await plan(`SELECT * FROM "spring_rate" "s" WHERE "s"."active" = 1 AND "s"."id" IN (SELECT rowid FROM spring_rate_search WHERE spring_rate_search MATCH '"x290"') ORDER BY "s"."sku" LIMIT 50`)).toMatch(
      /SEARCH s USING INTEGER PRIMARY KEY .*VIRTUAL TABLE INDEX/,
    );
    expect(await plan(`SELECT * FROM "spring_rate" "s" WHERE "s"."active" = 1 AND "s"."kind" = 'shock' AND "s"."rateNmm" >= 80 AND "s"."rateNmm" <= 90 ORDER BY "s"."rateNmm"`)).toMatch(
      /USING INDEX idx_spring_rate_kind_rate/,
    );
    expect(await plan(`SELECT * FROM "spring_rate" "s" WHERE "s"."active" = 1 AND "s"."onHand" - "s"."reserved" < "s"."reorderPoint" ORDER BY ("s"."onHand" - "s"."reserved"), "s"."sku" LIMIT 50`)).toMatch(
      /USING INDEX idx_spring_rate_low_stock/,
    );
    expect(await plan(`SELECT * FROM "spring_rate" "s" WHERE "s"."active" = 1 ORDER BY "s"."family", "s"."rateNmm" LIMIT 50`)).toMatch(/USING INDEX idx_spring_rate_family_rate/);
    expect(await plan(`SELECT COUNT(1) FROM "spring_rate" "s" WHERE "s"."active" = 1`)).toMatch(/COVERING INDEX/);
  });

  test('a rate range, a fit by rate and the family order read their page in order, with no sort', async () => {
    const ordered = [
      [`"s"."kind" = 'shock' AND "s"."rateNmm" >= 80 AND "s"."rateNmm" <= 90 AND "s"."onHand" - "s"."reserved" > 0`, `"s"."rateNmm", "s"."sku", "s"."id"`, 'idx_spring_rate_kind_rate'],
      [`"s"."kind" = 'fork' AND "s"."family" = 'F43x290'`, `"s"."rateNmm", "s"."sku", "s"."id"`, 'idx_spring_rate_fit'],
      ['1 = 1', `"s"."family", "s"."rateNmm", "s"."sku", "s"."id"`, 'idx_spring_rate_family_rate'],
    ];
    for (const [where, order, index] of ordered) {
      const shown = await plan(`SELECT * FROM "spring_rate" "s" WHERE "s"."active" = 1 AND ${where} ORDER BY ${order} LIMIT 50 OFFSET 100`);
      expect(shown).toContain(index);
      expect(shown).not.toMatch(/TEMP B-TREE/);
    }
  });
});

describe('the migration', () => {
  const mine = migrations.indexOf(CatalogueSearchIndexes1764634400000);

  async function openUpTo(dir: string, count: number): Promise<DataSource> {
    const source = new DataSource({ ...dataSourceOptions(path.join(dir, DATABASE_FILE)), migrations: migrations.slice(0, count) });
    await source.initialize();
    await source.runMigrations({ transaction: 'each' });
    return source;
  }

  test('indexes the springs already stored, and down removes the index, its triggers and the indexes', async () => {
    expect(mine).toBeGreaterThan(0);
    const dir = tempDir();
    const before = await openUpTo(dir, mine);
    await before.query(`INSERT INTO "spring_rate" ("sku", "kind", "family", "rateNmm", "freeLengthMm", "maxDeflectionMm", "supplierCode")
      VALUES ('OLD-F37x320-1', 'fork', 'F37x320', 8.5, 320, 190, 'KL-9911')`);
    await before.destroy();

    const db = await Database.open(dir);
    const found = await db.read.query(`SELECT "rowid" FROM "spring_rate_search" WHERE "spring_rate_search" MATCH '"kl-991"'`);
    expect(found).toHaveLength(1);
    await db.close();

    // Database.open ran every migration: undo those after this one, then this one.
    const source = await openUpTo(dir, migrations.length);
    for (let undone = migrations.length; undone > mine; undone -= 1) await source.undoLastMigration({ transaction: 'each' });
    const left = await source.query(
      `SELECT "name" FROM "sqlite_master" WHERE "name" LIKE 'spring_rate_search%' OR "name" IN ('idx_spring_rate_family_rate', 'idx_spring_rate_kind_rate', 'idx_spring_rate_low_stock')`,
    );
    expect(left).toEqual([]);
    await source.destroy();
  });
});

describe('the migration that puts the SKU in the sorted indexes', () => {
  const mine = migrations.indexOf(SearchOrderIndexes1764634500000);

  async function columnsOf(source: DataSource, index: string): Promise<string[]> {
    const rows: { name: string }[] = await source.query(`SELECT "name" FROM pragma_index_info('${index}') ORDER BY "seqno"`);
    return rows.map((r) => r.name);
  }

  test('up adds the SKU (and the id where `active` follows) and down puts the indexes back as they were', async () => {
    expect(mine).toBeGreaterThan(0);
    const source = new DataSource({ ...dataSourceOptions(path.join(tempDir(), DATABASE_FILE)), migrations: migrations.slice(0, mine + 1) });
    await source.initialize();
    await source.runMigrations({ transaction: 'each' });
    expect(await columnsOf(source, 'idx_spring_rate_fit')).toEqual(['kind', 'family', 'rateNmm', 'sku']);
    expect(await columnsOf(source, 'idx_spring_rate_kind_rate')).toEqual(['kind', 'rateNmm', 'sku']);
    expect(await columnsOf(source, 'idx_spring_rate_family_rate')).toEqual(['family', 'rateNmm', 'sku', 'id', 'active']);
    await source.undoLastMigration({ transaction: 'each' });
    expect(await columnsOf(source, 'idx_spring_rate_fit')).toEqual(['kind', 'family', 'rateNmm']);
    expect(await columnsOf(source, 'idx_spring_rate_kind_rate')).toEqual(['kind', 'rateNmm']);
    expect(await columnsOf(source, 'idx_spring_rate_family_rate')).toEqual(['family', 'rateNmm', 'active']);
    await source.destroy();
  });
});
