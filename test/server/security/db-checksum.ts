/**
 * A SHA-256 over every row of every table of the database, read through the read-only connection
 * (which sees only committed data). Two equal checksums mean no row was added, removed or changed.
 * No table is left out: nothing in Sagwright writes on a refused request (rate limits and the
 * sizing cache live in memory, sessions are stateless tokens), so a refusal must leave them all alone.
 */
import { createHash } from 'node:crypto';
import { TestContext } from '../test-context';

export async function tableNames(t: TestContext): Promise<string[]> {
  const rows: { name: string }[] = await t.db.read.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
  return rows.map((r) => r.name);
}

/** Per table, the hash of its rows sorted by every column (some tables are WITHOUT ROWID, so no rowid to sort by). */
export async function tableChecksums(t: TestContext): Promise<Record<string, string>> {
  const sums: Record<string, string> = {};
  for (const name of await tableNames(t)) {
    const columns: unknown[] = await t.db.read.query(`PRAGMA table_info("${name}")`);
    const order = columns.map((_, i) => i + 1).join(', ');
    const rows: unknown[] = await t.db.read.query(`SELECT * FROM "${name}" ORDER BY ${order}`);
    // Buffers (BLOB columns) serialise as their bytes, so a changed blob changes the hash too.
    sums[name] = createHash('sha256').update(JSON.stringify(rows)).digest('hex');
  }
  return sums;
}

export async function databaseChecksum(t: TestContext): Promise<string> {
  return createHash('sha256').update(JSON.stringify(await tableChecksums(t))).digest('hex');
}

/** The names of the tables whose rows differ between two `tableChecksums`. */
export function changedTables(before: Record<string, string>, after: Record<string, string>): string[] {
  return [...new Set([...Object.keys(before), ...Object.keys(after)])].filter((name) => before[name] !== after[name]).sort();
}
