/**
 * SQLite's online backup: copies a live database page by page into another file, giving a
 * consistent snapshot while the server keeps writing (writes that land mid-copy restart it).
 */
import sqlite3 from 'sqlite3';
import { all, withFile } from './sqlite-file';

/** The part of node-sqlite3's Backup object used here; its type declarations leave it out. */
interface Backup {
  step(pages: number, callback: (err: Error | null) => void): void;
  finish(callback?: (err: Error | null) => void): void;
  readonly completed: boolean;
  readonly failed: boolean;
}

type BackupFactory = (target: string, destName: string, sourceName: string, filenameIsDest: boolean) => Backup;

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
  const rows = await withFile(file, sqlite3.OPEN_READONLY, (db) => all<{ integrity_check: string }>(db, 'PRAGMA integrity_check'));
  return rows.map((r) => r.integrity_check).join('; ');
}

/** Copies `source` (live or not) into `target`, replacing what was there. */
export function copyDatabase(source: string, target: string): Promise<void> {
  return withFile(source, sqlite3.OPEN_READWRITE, (db) => runBackup((db as unknown as { backup: BackupFactory }).backup(target, 'main', 'main', true)));
}
