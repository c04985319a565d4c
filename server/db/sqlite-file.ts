/**
 * A database file opened with node-sqlite3 itself, outside TypeORM: for the tools that copy or
 * adjust a file whatever its schema version (backup, restore), with promises over its callbacks.
 */
import sqlite3 from 'sqlite3';

export function openFile(file: string, mode: number): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
  });
}

export function closeFile(db: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));
}

export function all<T>(db: sqlite3.Database, sql: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
}

/** Runs `work` on the file opened in `mode`, closing it afterwards whatever happens. */
export async function withFile<T>(file: string, mode: number, work: (db: sqlite3.Database) => Promise<T>): Promise<T> {
  const db = await openFile(file, mode);
  try {
    return await work(db);
  } finally {
    await closeFile(db);
  }
}

export function run(db: sqlite3.Database, sql: string, params: unknown[] = []): Promise<void> {
  return new Promise((resolve, reject) => db.run(sql, params, (err) => (err ? reject(err) : resolve())));
}
