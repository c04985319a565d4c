/**
 * Ends every session a restored database would bring back. Each user's token version returns to
 * what it was at the backup, so tokens revoked since (a sign-out, a password reset, a deactivated
 * account) would pass again. Every version is raised past both the backup's and the replaced
 * database's, and the user id sequence past the replaced one's, so that no token issued before the
 * restore passes: not even one of an account the backup does not have, whose id a new account
 * would otherwise take with version 0.
 */
import sqlite3 from 'sqlite3';
import { all, run, withFile } from '../db/sqlite-file';

export interface SessionsEnded {
  users: number;
  /** False when the replaced database could not be read: its versions were not compared. */
  comparedWithReplaced: boolean;
}

interface Replaced {
  versions: Record<string, number>;
  lastUserId: number;
}

const LAST_USER_ID = `SELECT coalesce(max("seq"), 0) AS "seq" FROM "sqlite_sequence" WHERE "name" = 'user'`;

/** The token versions and last user id of the database about to be replaced; undefined when it is missing or unreadable. */
async function readReplaced(file: string | undefined): Promise<Replaced | undefined> {
  if (!file) return undefined;
  try {
    // Read-write only so SQLite can open a WAL file whose shared-memory file is gone; nothing is written.
    return await withFile(file, sqlite3.OPEN_READWRITE, async (db) => {
      const users = await all<{ id: number; tokenVersion: number }>(db, 'SELECT "id", "tokenVersion" FROM "user"');
      const [{ seq }] = await all<{ seq: number }>(db, LAST_USER_ID);
      return { versions: Object.fromEntries(users.map((u) => [String(u.id), u.tokenVersion])), lastUserId: seq };
    });
  } catch {
    return undefined;
  }
}

/** Raises the versions and the sequence in `restored` (not yet live), in one transaction. */
export async function endSessions(restored: string, replacedFile: string | undefined): Promise<SessionsEnded> {
  const replaced = await readReplaced(replacedFile);
  const users = await withFile(restored, sqlite3.OPEN_READWRITE, async (db) => {
    await run(db, 'BEGIN IMMEDIATE');
    try {
      await run(
        db,
        `UPDATE "user" SET "tokenVersion" = max("tokenVersion", coalesce((SELECT "value" FROM json_each(?) WHERE "key" = CAST("user"."id" AS TEXT)), 0)) + 1`,
        [JSON.stringify(replaced?.versions ?? {})],
      );
      const [{ seq }] = await all<{ seq: number }>(db, LAST_USER_ID);
      await run(db, `DELETE FROM "sqlite_sequence" WHERE "name" = 'user'`);
      await run(db, `INSERT INTO "sqlite_sequence" ("name", "seq") VALUES ('user', ?)`, [Math.max(seq, replaced?.lastUserId ?? 0)]);
      const [{ count }] = await all<{ count: number }>(db, 'SELECT count(*) AS "count" FROM "user"');
      await run(db, 'COMMIT');
      return count;
    } catch (err) {
      await run(db, 'ROLLBACK');
      throw err;
    }
  });
  return { users, comparedWithReplaced: replaced !== undefined };
}
