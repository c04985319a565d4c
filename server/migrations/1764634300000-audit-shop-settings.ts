import { MigrationInterface, QueryRunner } from 'typeorm';

const COLUMNS = `"id", "at", "actorId", "actorName", "entity", "entityKey", "action", "before", "after"`;

/** The audit_entry table with the entities its CHECK allows; SQLite changes a CHECK only by rebuilding the table. */
function createAuditTable(name: string, entities: readonly string[]): string {
  return `CREATE TABLE "${name}" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" DATETIME NOT NULL,
      "actorId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "actorName" TEXT NOT NULL,
      "entity" TEXT NOT NULL CHECK ("entity" IN (${entities.map((e) => `'${e}'`).join(', ')})),
      "entityKey" TEXT NOT NULL,
      "action" TEXT NOT NULL CHECK ("action" IN ('create', 'update', 'delete')),
      "before" TEXT CHECK ("before" IS NULL OR json_valid("before")),
      "after" TEXT CHECK ("after" IS NULL OR json_valid("after"))
    )`;
}

const SHOP_DATA = ['bike-model', 'target-profile', 'engine-setting'] as const;

/**
 * Shop-settings edits join the audit. The table is rebuilt with the wider CHECK, its rows copied
 * with their ids (so AUTOINCREMENT carries on past them) and its index made again. Nothing
 * references audit_entry, so dropping the old table touches no other row.
 */
export class AuditShopSettings1764634300000 implements MigrationInterface {
  name = 'AuditShopSettings1764634300000';

  async up(q: QueryRunner): Promise<void> {
    await rebuild(q, [...SHOP_DATA, 'shop-settings'], 'TRUE');
  }

  /** The narrower CHECK cannot hold shop-settings rows, so going back drops them. */
  async down(q: QueryRunner): Promise<void> {
    await rebuild(q, SHOP_DATA, `"entity" <> 'shop-settings'`);
  }
}

async function rebuild(q: QueryRunner, entities: readonly string[], keep: string): Promise<void> {
  await q.query(createAuditTable('audit_entry_rebuilt', entities));
  await q.query(`INSERT INTO "audit_entry_rebuilt" (${COLUMNS}) SELECT ${COLUMNS} FROM "audit_entry" WHERE ${keep} ORDER BY "id"`);
  await q.query(`DROP TABLE "audit_entry"`);
  await q.query(`ALTER TABLE "audit_entry_rebuilt" RENAME TO "audit_entry"`);
  await q.query(`CREATE INDEX "idx_audit_entry_entity" ON "audit_entry" ("entity", "id")`);
}
