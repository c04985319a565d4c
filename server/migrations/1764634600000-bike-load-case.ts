import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The load case a bike is set for (with passenger, with luggage, ...), and the solo adjuster
 * positions to go back to; null while it rides solo.
 */
export class BikeLoadCase1764634600000 implements MigrationInterface {
  name = 'BikeLoadCase1764634600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "bike" ADD COLUMN "loadCase" TEXT NULL CHECK ("loadCase" IS NULL OR json_valid("loadCase"))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "bike" DROP COLUMN "loadCase"`);
  }
}
