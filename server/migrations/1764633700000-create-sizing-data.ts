import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateSizingData1764633700000 implements MigrationInterface {
  name = 'CreateSizingData1764633700000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "spring_rate" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "sku" TEXT NOT NULL,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('fork', 'shock')),
      "family" TEXT NOT NULL,
      "rateNmm" REAL NOT NULL CHECK ("rateNmm" > 0),
      "freeLengthMm" REAL NOT NULL CHECK ("freeLengthMm" > 0),
      "maxDeflectionMm" REAL NOT NULL CHECK ("maxDeflectionMm" > 0),
      "onHand" INTEGER NOT NULL DEFAULT 0 CHECK ("onHand" >= 0),
      "reserved" INTEGER NOT NULL DEFAULT 0 CHECK ("reserved" >= 0 AND "reserved" <= "onHand"),
      "active" BOOLEAN NOT NULL DEFAULT 1
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_spring_rate_sku" ON "spring_rate" ("sku")`);
    await q.query(`CREATE INDEX "idx_spring_rate_fit" ON "spring_rate" ("kind", "family", "rateNmm")`);
    await q.query(`CREATE TABLE "target_profile" (
      "discipline" TEXT PRIMARY KEY NOT NULL,
      "label" TEXT NOT NULL,
      "frontRiderSagMinPct" REAL NOT NULL,
      "frontRiderSagMaxPct" REAL NOT NULL,
      "frontStaticSagMinPct" REAL NOT NULL,
      "frontStaticSagMaxPct" REAL NOT NULL,
      "rearRiderSagMinPct" REAL NOT NULL,
      "rearRiderSagMaxPct" REAL NOT NULL,
      "rearStaticSagMinPct" REAL NOT NULL,
      "rearStaticSagMaxPct" REAL NOT NULL,
      "note" TEXT NOT NULL,
      "sortOrder" INTEGER NOT NULL DEFAULT 0
    )`);
    await q.query(`CREATE TABLE "engine_setting" (
      "key" TEXT PRIMARY KEY NOT NULL,
      "value" REAL NOT NULL,
      "unit" TEXT NOT NULL,
      "label" TEXT NOT NULL,
      "source" TEXT NOT NULL
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "engine_setting"`);
    await q.query(`DROP TABLE "target_profile"`);
    await q.query(`DROP INDEX "idx_spring_rate_fit"`);
    await q.query(`DROP INDEX "uq_spring_rate_sku"`);
    await q.query(`DROP TABLE "spring_rate"`);
  }
}
