import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The full catalogue fields on spring_rate (added in place, so existing rows stay), the stock
 * movement ledger and CSV import batches. Stock already on the shelves becomes opening movements,
 * so every spring's onHand and reserved equal the sums of its movements from here on.
 */
export class CatalogueAndStock1764634000000 implements MigrationInterface {
  name = 'CatalogueAndStock1764634000000';

  async up(q: QueryRunner): Promise<void> {
    const addColumn = (definition: string) => q.query(`ALTER TABLE "spring_rate" ADD COLUMN ${definition}`);
    await addColumn(`"secondRateNmm" REAL CHECK ("secondRateNmm" IS NULL OR "secondRateNmm" > 0)`);
    await addColumn(`"breakMm" REAL CHECK (("breakMm" IS NULL OR "breakMm" > 0) AND ("breakMm" IS NULL) = ("secondRateNmm" IS NULL))`);
    await addColumn(`"innerDiameterMm" REAL CHECK ("innerDiameterMm" IS NULL OR "innerDiameterMm" > 0)`);
    await addColumn(
      `"outerDiameterMm" REAL CHECK ("outerDiameterMm" IS NULL OR ("outerDiameterMm" > 0 AND ("innerDiameterMm" IS NULL OR "outerDiameterMm" > "innerDiameterMm")))`,
    );
    await addColumn(`"wireDiameterMm" REAL CHECK ("wireDiameterMm" IS NULL OR "wireDiameterMm" > 0)`);
    await addColumn(`"supplier" TEXT`);
    await addColumn(`"supplierCode" TEXT`);
    await addColumn(`"costCents" INTEGER CHECK ("costCents" IS NULL OR "costCents" >= 0)`);
    await addColumn(`"priceCents" INTEGER CHECK ("priceCents" IS NULL OR "priceCents" >= 0)`);
    await addColumn(`"bin" TEXT`);
    await addColumn(`"reorderPoint" INTEGER NOT NULL DEFAULT 0 CHECK ("reorderPoint" >= 0)`);

    await q.query(`CREATE TABLE "import_batch" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "userId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "at" DATETIME NOT NULL,
      "fileName" TEXT NOT NULL,
      "contentSha256" TEXT NOT NULL,
      "rowCount" INTEGER NOT NULL CHECK ("rowCount" >= 0),
      "createdCount" INTEGER NOT NULL CHECK ("createdCount" >= 0),
      "updatedCount" INTEGER NOT NULL CHECK ("updatedCount" >= 0),
      "unchangedCount" INTEGER NOT NULL CHECK ("unchangedCount" >= 0),
      "movementCount" INTEGER NOT NULL CHECK ("movementCount" >= 0)
    )`);

    await q.query(`CREATE TABLE "stock_movement" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "springId" INTEGER NOT NULL REFERENCES "spring_rate" ("id") ON DELETE RESTRICT,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('receive', 'correction', 'reserve', 'release', 'fit')),
      "onHandDelta" INTEGER NOT NULL,
      "reservedDelta" INTEGER NOT NULL,
      "onHandAfter" INTEGER NOT NULL CHECK ("onHandAfter" >= 0),
      "reservedAfter" INTEGER NOT NULL CHECK ("reservedAfter" >= 0 AND "reservedAfter" <= "onHandAfter"),
      "userId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "at" DATETIME NOT NULL,
      "reason" TEXT NOT NULL CHECK (length(trim("reason")) > 0),
      "quoteId" INTEGER,
      "importBatchId" INTEGER REFERENCES "import_batch" ("id") ON DELETE RESTRICT,
      CHECK (CASE "kind"
        WHEN 'receive' THEN "onHandDelta" > 0 AND "reservedDelta" = 0
        WHEN 'correction' THEN "reservedDelta" = 0
        WHEN 'reserve' THEN "onHandDelta" = 0 AND "reservedDelta" > 0
        WHEN 'release' THEN "onHandDelta" = 0 AND "reservedDelta" < 0
        WHEN 'fit' THEN "onHandDelta" < 0 AND "reservedDelta" IN (0, "onHandDelta")
      END)
    )`);
    // A spring's history, newest first, page by page.
    await q.query(`CREATE INDEX "idx_stock_movement_spring" ON "stock_movement" ("springId", "id")`);
    // The movement export and list by date range.
    await q.query(`CREATE INDEX "idx_stock_movement_at" ON "stock_movement" ("at")`);
    // What one import or one quote moved; most rows have neither, so the indexes hold only those that do.
    await q.query(`CREATE INDEX "idx_stock_movement_batch" ON "stock_movement" ("importBatchId") WHERE "importBatchId" IS NOT NULL`);
    await q.query(`CREATE INDEX "idx_stock_movement_quote" ON "stock_movement" ("quoteId") WHERE "quoteId" IS NOT NULL`);

    const now = `strftime('%Y-%m-%d %H:%M:%f', 'now')`;
    await q.query(`INSERT INTO "stock_movement"
      ("springId", "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "userId", "at", "reason")
      SELECT "id", 'receive', "onHand", 0, "onHand", 0, NULL, ${now}, 'Opening stock, counted before movements were recorded'
      FROM "spring_rate" WHERE "onHand" > 0 ORDER BY "id"`);
    await q.query(`INSERT INTO "stock_movement"
      ("springId", "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "userId", "at", "reason")
      SELECT "id", 'reserve', 0, "reserved", "onHand", "reserved", NULL, ${now}, 'Opening reservations, held before movements were recorded'
      FROM "spring_rate" WHERE "reserved" > 0 ORDER BY "id"`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "stock_movement"`);
    await q.query(`DROP TABLE "import_batch"`);
    // Each column after the ones whose CHECK names it.
    for (const column of [
      'reorderPoint',
      'bin',
      'priceCents',
      'costCents',
      'supplierCode',
      'supplier',
      'wireDiameterMm',
      'outerDiameterMm',
      'innerDiameterMm',
      'breakMm',
      'secondRateNmm',
    ]) {
      await q.query(`ALTER TABLE "spring_rate" DROP COLUMN "${column}"`);
    }
  }
}
