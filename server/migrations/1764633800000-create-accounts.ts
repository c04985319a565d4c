import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateAccounts1764633800000 implements MigrationInterface {
  name = 'CreateAccounts1764633800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "user" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "email" TEXT NOT NULL CHECK ("email" = lower("email")),
      "name" TEXT NOT NULL,
      "role" TEXT NOT NULL CHECK ("role" IN ('rider', 'desk', 'counter', 'admin')),
      "passwordHash" TEXT NOT NULL,
      "active" BOOLEAN NOT NULL DEFAULT 1,
      "tokenVersion" INTEGER NOT NULL DEFAULT 0,
      "createdAt" DATETIME NOT NULL,
      "lastSignInAt" DATETIME
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_user_email" ON "user" ("email")`);
    await q.query(`CREATE TABLE "password_reset" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "userId" INTEGER NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
      "tokenHash" TEXT NOT NULL,
      "createdAt" DATETIME NOT NULL,
      "expiresAt" DATETIME NOT NULL,
      "usedAt" DATETIME
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_password_reset_token" ON "password_reset" ("tokenHash")`);
    await q.query(`CREATE INDEX "idx_password_reset_user" ON "password_reset" ("userId")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "password_reset"`);
    await q.query(`DROP TABLE "user"`);
  }
}
