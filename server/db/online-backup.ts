/**
 * SQLite's online backup: copies a live database page by page into another file, giving a
 * consistent snapshot while the server keeps writing (writes that land mid-copy restart it).
 */
import sqlite3 from 'sqlite3';

/** The part of node-sqlite3's Backup object used here; its type declarations leave it out. */
interface Backup {
  step(pages: number, callback: (err: Error | null) => void): void;
  finish(callback?: (err: Error | null) => void): void;
  readonly completed: boolean;
  readonly failed: boolean;
}

type BackupFactory = (target: string, destName: string, sourceName: string, filenameIsDest: boolean) => Backup;

function open(file: string, mode: number): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
  });
}

function close(db: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));
}

function runBackup(backup: Backup): Promise<void> {
  return new Promise((resolve, reject) => {
    const next = () =>
      backup.step(256, (err) => {
        if (err) return backup.finish(() => reject(err));
        if (backup.completed) return backup.finish((finishErr) => (finishErr ? reject(finishErr) : resolve()));
        setImmediate(next);
      });
    next();
  });
}

/** The result of PRAGMA integrity_check: 'ok' for a sound file. */
export async function checkIntegrity(file: string): Promise<string> {
  const db = await open(file, sqlite3.OPEN_READONLY);
  try {
    const rows = await new Promise<{ integrity_check: string }[]>((resolve, reject) =>
      db.all('PRAGMA integrity_check', (err, result) => (err ? reject(err) : resolve(result as { integrity_check: string }[]))),
    );
    return rows.map((r) => r.integrity_check).join('; ');
  } finally {
    await close(db);
  }
}

/** Copies `source` (live or not) into `target`, replacing what was there. */
export async function copyDatabase(source: string, target: string): Promise<void> {
  const db = await open(source, sqlite3.OPEN_READWRITE);
  try {
    const backup = (db as unknown as { backup: BackupFactory }).backup(target, 'main', 'main', true);
    await runBackup(backup);
  } finally {
    await close(db);
  }
}
