/**
 * Looks at a Sagwright database file through a connection of its own, as an outside tool would:
 * SQLite's own integrity check, and the stock ledger rule that every spring's onHand and reserved
 * are the sums of its movements.
 */
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { DATABASE_FILE } from '../../../server/data-source';

export async function queryFile<T>(dataDir: string, sql: string, parameters: unknown[] = []): Promise<T[]> {
  const db = await new Promise<sqlite3.Database>((resolve, reject) => {
    const opened = new sqlite3.Database(path.join(dataDir, DATABASE_FILE), sqlite3.OPEN_READONLY, (err) => (err ? reject(err) : resolve(opened)));
  });
  try {
    return await new Promise<T[]>((resolve, reject) => db.all(sql, parameters, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
  } finally {
    await new Promise((resolve) => db.close(resolve));
  }
}

/** `PRAGMA integrity_check` answers the single row "ok" for a sound file (sqlite.org/pragma.html#pragma_integrity_check). */
export async function integrityCheck(dataDir: string): Promise<string[]> {
  const rows = await queryFile<{ integrity_check: string }>(dataDir, 'PRAGMA integrity_check');
  return rows.map((r) => r.integrity_check);
}

/** Springs whose stock differs from the sums of their movements; empty when the ledger holds. */
export async function ledgerMismatches(dataDir: string): Promise<string[]> {
  const rows = await queryFile<{ sku: string; onHand: number; reserved: number; movedOnHand: number; movedReserved: number }>(
    dataDir,
    `SELECT s."sku", s."onHand", s."reserved",
            coalesce(sum(m."onHandDelta"), 0) AS "movedOnHand", coalesce(sum(m."reservedDelta"), 0) AS "movedReserved"
       FROM "spring_rate" s LEFT JOIN "stock_movement" m ON m."springId" = s."id"
      GROUP BY s."id"
     HAVING s."onHand" != "movedOnHand" OR s."reserved" != "movedReserved"`,
  );
  return rows.map((r) => `${r.sku}: ${r.onHand}/${r.reserved} on the spring, ${r.movedOnHand}/${r.movedReserved} in the movements`);
}

export async function countRows(dataDir: string, table: string, where = '1', parameters: unknown[] = []): Promise<number> {
  const [row] = await queryFile<{ n: number }>(dataDir, `SELECT count(*) AS n FROM "${table}" WHERE ${where}`, parameters);
  return row.n;
}
