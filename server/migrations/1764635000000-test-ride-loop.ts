import { MigrationInterface, QueryRunner } from 'typeorm';

// The lists as they stand at this migration, written out: the types in shared/ move on.
const SYMPTOMS = [
  'dives-braking',
  'bounces-after-bump',
  'harsh-small-bumps',
  'wallows-long-corners',
  'sinks-repeated-bumps',
  'bottoms-big-hits',
  'kicks-after-dip',
  'runs-wide-throttle',
  'chatters-corners',
  'squats-throttle',
];
/** Symptoms of one end only: braking dive is the fork's, squat and running wide under power the shock's. */
const FRONT_ONLY = ['dives-braking'];
const REAR_ONLY = ['runs-wide-throttle', 'squats-throttle'];
const CLAIMS = ['less-overshoot', 'slower-dive', 'softer-on-sharp-bumps', 'faster-recovery'];
const AUDIT_BEFORE = ['bike-model', 'target-profile', 'engine-setting', 'shop-settings', 'damper-kind'];

const list = (values: readonly string[]) => values.map((v) => `'${v}'`).join(', ');

const SYMPTOM_AT_ITS_END = `CHECK (("symptom" NOT IN (${list(FRONT_ONLY)}) OR "end" = 'front') AND ("symptom" NOT IN (${list(REAR_ONLY)}) OR "end" = 'rear'))`;

/** The audit_entry table with the entities its CHECK allows; SQLite changes a CHECK only by rebuilding the table. */
async function rebuildAudit(q: QueryRunner, entities: readonly string[], keep: string): Promise<void> {
  const columns = `"id", "at", "actorId", "actorName", "entity", "entityKey", "action", "before", "after"`;
  await q.query(`CREATE TABLE "audit_entry_rebuilt" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" DATETIME NOT NULL,
      "actorId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "actorName" TEXT NOT NULL,
      "entity" TEXT NOT NULL CHECK ("entity" IN (${list(entities)})),
      "entityKey" TEXT NOT NULL,
      "action" TEXT NOT NULL CHECK ("action" IN ('create', 'update', 'delete')),
      "before" TEXT CHECK ("before" IS NULL OR json_valid("before")),
      "after" TEXT CHECK ("after" IS NULL OR json_valid("after"))
    )`);
  await q.query(`INSERT INTO "audit_entry_rebuilt" (${columns}) SELECT ${columns} FROM "audit_entry" WHERE ${keep} ORDER BY "id"`);
  await q.query(`DROP TABLE "audit_entry"`);
  await q.query(`ALTER TABLE "audit_entry_rebuilt" RENAME TO "audit_entry"`);
  await q.query(`CREATE INDEX "idx_audit_entry_entity" ON "audit_entry" ("entity", "id")`);
}

/**
 * The test-ride loop. `damping_rule` is the symptom-to-change table (its rows are seed data, the
 * `damping-rules` seed part, so this stays DDL); at most one active row per symptom, end, adjuster
 * and direction, since the loop tells tries apart by adjuster and direction. `test_ride` is one
 * report and what became of it; its CHECKs tie the states together: the change's columns are
 * there exactly when the proposal is a change, it is made only then and never once superseded,
 * judged only once made, undone only once judged worse, and at most one ride per bike is open
 * (its change waiting to be made or judged). The setup-log entries a ride wrote are named without
 * a foreign key: an entry goes only with its bike, and the ride with it, and a key would stop the
 * rider-flow migration's `down` from dropping setup_log_entry. The audit learns 'damping-rule' (audit_entry rebuilt
 * with the wider CHECK, rows and ids kept; nothing references it).
 */
export class TestRideLoop1764635000000 implements MigrationInterface {
  name = 'TestRideLoop1764635000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "damping_rule" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "symptom" TEXT NOT NULL CHECK ("symptom" IN (${list(SYMPTOMS)})),
      "end" TEXT NOT NULL CHECK ("end" IN ('front', 'rear')),
      "adjuster" TEXT NOT NULL REFERENCES "damper_kind" ("key") ON DELETE RESTRICT,
      "direction" TEXT NOT NULL CHECK ("direction" IN ('more', 'less')),
      "priority" INTEGER NOT NULL CHECK ("priority" BETWEEN 1 AND 99),
      "why" TEXT NOT NULL CHECK (length(trim("why")) BETWEEN 1 AND 500),
      "feelFor" TEXT NOT NULL CHECK (length(trim("feelFor")) BETWEEN 1 AND 500),
      "claim" TEXT CHECK ("claim" IS NULL OR "claim" IN (${list(CLAIMS)})),
      "source" TEXT NOT NULL CHECK ("source" IN ('common-practice', 'shop')),
      "active" BOOLEAN NOT NULL DEFAULT 1 CHECK ("active" IN (0, 1)),
      "createdById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "createdAt" DATETIME NOT NULL,
      "updatedAt" DATETIME NOT NULL,
      ${SYMPTOM_AT_ITS_END}
    )`);
    await q.query(`CREATE INDEX "idx_damping_rule_symptom" ON "damping_rule" ("symptom", "end", "priority")`);
    await q.query(`CREATE UNIQUE INDEX "uq_damping_rule_active" ON "damping_rule" ("symptom", "end", "adjuster", "direction") WHERE "active" = 1`);

    await q.query(`CREATE TABLE "test_ride" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "bikeId" INTEGER NOT NULL REFERENCES "bike" ("id") ON DELETE CASCADE,
      "end" TEXT NOT NULL CHECK ("end" IN ('front', 'rear')),
      "symptom" TEXT NOT NULL CHECK ("symptom" IN (${list(SYMPTOMS)})),
      "strength" TEXT NOT NULL CHECK ("strength" IN ('slight', 'clear', 'strong')),
      "note" TEXT NOT NULL DEFAULT '' CHECK (length("note") <= 500),
      "reportedById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "reportedAt" DATETIME NOT NULL,
      "proposal" TEXT NOT NULL CHECK (json_valid("proposal")),
      "proposalKind" TEXT NOT NULL CHECK ("proposalKind" IN ('change', 'spring', 'none')),
      "ruleId" INTEGER REFERENCES "damping_rule" ("id") ON DELETE SET NULL,
      "adjuster" TEXT,
      "direction" TEXT CHECK ("direction" IS NULL OR "direction" IN ('more', 'less')),
      "fromPosition" REAL CHECK ("fromPosition" IS NULL OR "fromPosition" >= 0),
      "toPosition" REAL CHECK ("toPosition" IS NULL OR "toPosition" >= 0),
      "supersededAt" DATETIME,
      "madeAt" DATETIME,
      "madeById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "setupLogEntryId" INTEGER,
      "outcome" TEXT CHECK ("outcome" IS NULL OR "outcome" IN ('better', 'worse', 'same')),
      "outcomeNote" TEXT NOT NULL DEFAULT '' CHECK (length("outcomeNote") <= 500),
      "judgedAt" DATETIME,
      "judgedById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "undoneAt" DATETIME,
      "undoneById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "undoLogEntryId" INTEGER,
      ${SYMPTOM_AT_ITS_END},
      CHECK ("proposalKind" = json_extract("proposal", '$.kind')),
      CHECK (("proposalKind" = 'change') = ("adjuster" IS NOT NULL AND "direction" IS NOT NULL AND "fromPosition" IS NOT NULL AND "toPosition" IS NOT NULL AND "fromPosition" <> "toPosition")),
      CHECK ("madeAt" IS NULL OR ("proposalKind" = 'change' AND "supersededAt" IS NULL)),
      CHECK ("supersededAt" IS NULL OR "proposalKind" = 'change'),
      CHECK (("madeAt" IS NULL) = ("setupLogEntryId" IS NULL)),
      CHECK ("madeById" IS NULL OR "madeAt" IS NOT NULL),
      CHECK (("outcome" IS NULL) = ("judgedAt" IS NULL)),
      CHECK ("outcome" IS NULL OR "madeAt" IS NOT NULL),
      CHECK ("judgedAt" IS NOT NULL OR ("judgedById" IS NULL AND "outcomeNote" = '')),
      CHECK ("undoneAt" IS NULL OR "outcome" = 'worse'),
      CHECK (("undoneAt" IS NULL) = ("undoLogEntryId" IS NULL)),
      CHECK ("undoneById" IS NULL OR "undoneAt" IS NOT NULL)
    )`);
    await q.query(`CREATE INDEX "idx_test_ride_bike" ON "test_ride" ("bikeId", "id")`);
    // The loop's one change at a time: a bike has at most one ride waiting to be made or judged.
    await q.query(
      `CREATE UNIQUE INDEX "uq_test_ride_open" ON "test_ride" ("bikeId") WHERE "proposalKind" = 'change' AND "supersededAt" IS NULL AND "outcome" IS NULL`,
    );

    await rebuildAudit(q, [...AUDIT_BEFORE, 'damping-rule'], 'TRUE');
  }

  /** The rides and the table go, and so do the audit rows of the table's edits: the narrower CHECK cannot hold them. */
  async down(q: QueryRunner): Promise<void> {
    await rebuildAudit(q, AUDIT_BEFORE, `"entity" <> 'damping-rule'`);
    await q.query(`DROP TABLE "test_ride"`);
    await q.query(`DROP TABLE "damping_rule"`);
    await q.query(`DELETE FROM "seed_record" WHERE "name" = 'damping-rules'`);
  }
}
