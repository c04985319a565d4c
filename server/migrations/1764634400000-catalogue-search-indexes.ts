import { MigrationInterface, QueryRunner } from 'typeorm';

const SEARCHED = ['sku', 'family', 'supplierCode'] as const;
const columns = SEARCHED.map((c) => `"${c}"`).join(', ');
const values = (row: 'new' | 'old') => SEARCHED.map((c) => `${row}."${c}"`).join(', ');

/**
 * Indexes for searching a catalogue of 100,000 springs (see docs/parts-counter.md, "Indexes added"):
 * - `spring_rate_search`, an FTS5 index of trigrams over SKU, family and supplier's code, so a text
 *   search of three characters or more finds its substring without reading every row. It holds
 *   only the index (external content: the text stays in spring_rate), kept in step by triggers.
 * - `idx_spring_rate_family_rate (family, rateNmm, active)`: the list sorted by family, a page at
 *   a time, and the count of active springs from the index alone.
 * - `idx_spring_rate_kind_rate (kind, rateNmm)`: a rate range of one kind across its fits.
 * - `idx_spring_rate_low_stock`: only the springs below their reorder point, in the order the
 *   low-stock search lists them (by what is available, then SKU).
 * No index starts with `active`: without statistics SQLite takes an equality on a leading column
 * as selective, and would then sort every active spring instead of walking the SKU index.
 */
export class CatalogueSearchIndexes1764634400000 implements MigrationInterface {
  name = 'CatalogueSearchIndexes1764634400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE VIRTUAL TABLE "spring_rate_search" USING fts5(${columns}, content='spring_rate', content_rowid='id', tokenize='trigram')`,
    );
    await q.query(`INSERT INTO "spring_rate_search" ("spring_rate_search") VALUES ('rebuild')`);
    await q.query(`CREATE TRIGGER "spring_rate_search_insert" AFTER INSERT ON "spring_rate" BEGIN
      INSERT INTO "spring_rate_search" ("rowid", ${columns}) VALUES (new."id", ${values('new')});
    END`);
    await q.query(`CREATE TRIGGER "spring_rate_search_delete" AFTER DELETE ON "spring_rate" BEGIN
      INSERT INTO "spring_rate_search" ("spring_rate_search", "rowid", ${columns}) VALUES ('delete', old."id", ${values('old')});
    END`);
    // Only when a searched text changes: the import's UPDATE sets every column of a changed row.
    await q.query(`CREATE TRIGGER "spring_rate_search_update" AFTER UPDATE OF ${columns} ON "spring_rate"
      WHEN ${SEARCHED.map((c) => `old."${c}" IS NOT new."${c}"`).join(' OR ')} BEGIN
      INSERT INTO "spring_rate_search" ("spring_rate_search", "rowid", ${columns}) VALUES ('delete', old."id", ${values('old')});
      INSERT INTO "spring_rate_search" ("rowid", ${columns}) VALUES (new."id", ${values('new')});
    END`);
    await q.query(`CREATE INDEX "idx_spring_rate_family_rate" ON "spring_rate" ("family", "rateNmm", "active")`);
    await q.query(`CREATE INDEX "idx_spring_rate_kind_rate" ON "spring_rate" ("kind", "rateNmm")`);
    await q.query(
      `CREATE INDEX "idx_spring_rate_low_stock" ON "spring_rate" (("onHand" - "reserved"), "sku", "active") WHERE "onHand" - "reserved" < "reorderPoint"`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_spring_rate_low_stock"`);
    await q.query(`DROP INDEX "idx_spring_rate_kind_rate"`);
    await q.query(`DROP INDEX "idx_spring_rate_family_rate"`);
    await q.query(`DROP TRIGGER "spring_rate_search_update"`);
    await q.query(`DROP TRIGGER "spring_rate_search_delete"`);
    await q.query(`DROP TRIGGER "spring_rate_search_insert"`);
    await q.query(`DROP TABLE "spring_rate_search"`);
  }
}
