import { MigrationInterface, QueryRunner } from 'typeorm';

/** Each index as it was before this migration and as it is after. */
const CHANGED = [
  { name: 'idx_spring_rate_fit', before: '"kind", "family", "rateNmm"', after: '"kind", "family", "rateNmm", "sku"' },
  { name: 'idx_spring_rate_kind_rate', before: '"kind", "rateNmm"', after: '"kind", "rateNmm", "sku"' },
  { name: 'idx_spring_rate_family_rate', before: '"family", "rateNmm", "active"', after: '"family", "rateNmm", "sku", "id", "active"' },
] as const;

/**
 * The searches sort by their column, then SKU, then id. With SKU in the index (and the id, which
 * every SQLite index ends with, or named where `active` follows it), a page is read in order and
 * stops at its LIMIT instead of sorting every row the filter finds: at 100,000 springs a rate range
 * of one kind went from about 5 to 2 ms and page 40 in family order from 6 to 1.5 ms
 * (docs/performance.md, "Query plans"). The sizing's candidate read of a fit uses the same order.
 */
export class SearchOrderIndexes1764634500000 implements MigrationInterface {
  name = 'SearchOrderIndexes1764634500000';

  async up(q: QueryRunner): Promise<void> {
    for (const index of CHANGED) await recreate(q, index.name, index.after);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const index of CHANGED) await recreate(q, index.name, index.before);
  }
}

async function recreate(q: QueryRunner, name: string, columns: string): Promise<void> {
  await q.query(`DROP INDEX "${name}"`);
  await q.query(`CREATE INDEX "${name}" ON "spring_rate" (${columns})`);
}
