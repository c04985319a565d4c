import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The shop's public address (scheme, host and port), set by the admin: links in mails are built
 * on it instead of on a request's Host header. Null until set.
 */
export class ShopPublicUrl1764634700000 implements MigrationInterface {
  name = 'ShopPublicUrl1764634700000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "shop_settings" ADD COLUMN "publicUrl" TEXT NULL CHECK ("publicUrl" IS NULL OR (length("publicUrl") <= 200 AND ("publicUrl" LIKE 'http://%' OR "publicUrl" LIKE 'https://%')))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "shop_settings" DROP COLUMN "publicUrl"`);
  }
}
