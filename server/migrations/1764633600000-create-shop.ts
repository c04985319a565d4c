import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateShop1764633600000 implements MigrationInterface {
  name = 'CreateShop1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "shop" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "name" TEXT NOT NULL,
      "address" TEXT NOT NULL,
      "email" TEXT NOT NULL,
      "phone" TEXT NOT NULL,
      "currency" VARCHAR(3) NOT NULL
    )`);
    await q.query(`CREATE TABLE "seed_record" (
      "name" TEXT PRIMARY KEY NOT NULL,
      "appliedAt" DATETIME NOT NULL
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "seed_record"`);
    await q.query(`DROP TABLE "shop"`);
  }
}
