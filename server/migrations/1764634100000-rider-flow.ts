import { MigrationInterface, QueryRunner } from 'typeorm';

/** The rider's flow: bike models, the garage, the rider's profile, drafts, sizing records, the setup log, the audit of shop data edits. */
export class RiderFlow1764634100000 implements MigrationInterface {
  name = 'RiderFlow1764634100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "bike_model" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "name" TEXT NOT NULL CHECK (length(trim("name")) > 0),
      "description" TEXT NOT NULL DEFAULT '',
      "masses" TEXT NOT NULL CHECK (json_valid("masses")),
      "front" TEXT CHECK ("front" IS NULL OR json_valid("front")),
      "rear" TEXT CHECK ("rear" IS NULL OR json_valid("rear")),
      "createdAt" DATETIME NOT NULL,
      "updatedAt" DATETIME NOT NULL,
      CHECK ("front" IS NOT NULL OR "rear" IS NOT NULL)
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_bike_model_name" ON "bike_model" ("name" COLLATE NOCASE)`);

    await q.query(`CREATE TABLE "bike" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "ownerId" INTEGER NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
      "modelId" INTEGER REFERENCES "bike_model" ("id") ON DELETE SET NULL,
      "nickname" TEXT NOT NULL CHECK (length(trim("nickname")) > 0),
      "masses" TEXT NOT NULL CHECK (json_valid("masses")),
      "front" TEXT CHECK ("front" IS NULL OR json_valid("front")),
      "rear" TEXT CHECK ("rear" IS NULL OR json_valid("rear")),
      "createdAt" DATETIME NOT NULL,
      "updatedAt" DATETIME NOT NULL,
      CHECK ("front" IS NOT NULL OR "rear" IS NOT NULL)
    )`);
    await q.query(`CREATE INDEX "idx_bike_owner" ON "bike" ("ownerId")`);
    await q.query(`CREATE INDEX "idx_bike_model" ON "bike" ("modelId")`);

    await q.query(`CREATE TABLE "rider_profile" (
      "userId" INTEGER PRIMARY KEY NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
      "unitSystem" TEXT NOT NULL DEFAULT 'metric' CHECK ("unitSystem" IN ('metric', 'imperial')),
      "rateUnit" TEXT NOT NULL DEFAULT 'N/mm' CHECK ("rateUnit" IN ('N/mm', 'kgf/mm', 'lbf/in')),
      "weighIn" TEXT CHECK ("weighIn" IS NULL OR json_valid("weighIn")),
      "weighedAt" DATETIME,
      "updatedAt" DATETIME NOT NULL
    )`);

    await q.query(`CREATE TABLE "measuring_draft" (
      "bikeId" INTEGER PRIMARY KEY NOT NULL REFERENCES "bike" ("id") ON DELETE CASCADE,
      "step" TEXT NOT NULL,
      "answers" TEXT NOT NULL CHECK (json_valid("answers")),
      "hints" TEXT CHECK ("hints" IS NULL OR json_valid("hints")),
      "createdAt" DATETIME NOT NULL,
      "updatedAt" DATETIME NOT NULL
    )`);

    await q.query(`CREATE TABLE "sizing_record" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "riderId" INTEGER NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
      "bikeId" INTEGER REFERENCES "bike" ("id") ON DELETE SET NULL,
      "createdById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "source" TEXT NOT NULL CHECK ("source" IN ('rider', 'desk')),
      "discipline" TEXT NOT NULL,
      "engineVersion" TEXT NOT NULL,
      "request" TEXT NOT NULL CHECK (json_valid("request")),
      "result" TEXT NOT NULL CHECK (json_valid("result")),
      "profile" TEXT NOT NULL CHECK (json_valid("profile")),
      "weighIn" TEXT CHECK ("weighIn" IS NULL OR json_valid("weighIn")),
      "summary" TEXT NOT NULL CHECK (json_valid("summary")),
      "createdAt" DATETIME NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_sizing_record_bike" ON "sizing_record" ("bikeId", "id")`);
    await q.query(`CREATE INDEX "idx_sizing_record_rider" ON "sizing_record" ("riderId", "id")`);

    await q.query(`CREATE TABLE "setup_log_entry" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "bikeId" INTEGER NOT NULL REFERENCES "bike" ("id") ON DELETE CASCADE,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('pass', 'change')),
      "sizingRecordId" INTEGER REFERENCES "sizing_record" ("id") ON DELETE SET NULL,
      "createdById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "note" TEXT NOT NULL DEFAULT '',
      "before" TEXT NOT NULL CHECK (json_valid("before")),
      "after" TEXT NOT NULL CHECK (json_valid("after")),
      "createdAt" DATETIME NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_setup_log_bike" ON "setup_log_entry" ("bikeId", "id")`);

    await q.query(`CREATE TABLE "audit_entry" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" DATETIME NOT NULL,
      "actorId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "actorName" TEXT NOT NULL,
      "entity" TEXT NOT NULL CHECK ("entity" IN ('bike-model', 'target-profile', 'engine-setting')),
      "entityKey" TEXT NOT NULL,
      "action" TEXT NOT NULL CHECK ("action" IN ('create', 'update', 'delete')),
      "before" TEXT CHECK ("before" IS NULL OR json_valid("before")),
      "after" TEXT CHECK ("after" IS NULL OR json_valid("after"))
    )`);
    await q.query(`CREATE INDEX "idx_audit_entry_entity" ON "audit_entry" ("entity", "id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "audit_entry"`);
    await q.query(`DROP TABLE "setup_log_entry"`);
    await q.query(`DROP TABLE "sizing_record"`);
    await q.query(`DROP TABLE "measuring_draft"`);
    await q.query(`DROP TABLE "rider_profile"`);
    await q.query(`DROP TABLE "bike"`);
    await q.query(`DROP TABLE "bike_model"`);
  }
}
