/**
 * `npm run restore FILE`: puts a backup back as the database of the data folder. It refuses while
 * a server uses the folder (the server would go on serving what it had cached, and its writes
 * would collide with the copy), and it signs everyone out: see restore-sessions.ts.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DATABASE_FILE } from '../data-source';
import { liveUsers, markInUse } from '../db/data-dir-users';
import { checkIntegrity, copyDatabase } from '../db/online-backup';
import { readConfig } from '../env';
import { JWT_SECRET_FILE } from '../services/jwt-secret.service';
import { endSessions, SessionsEnded } from './restore-sessions';

export class RestoreRefused extends Error {}

export interface Restored extends SessionsEnded {
  /** The generated signing secret was deleted (a new one is made at the next start). */
  secretReplaced: boolean;
}

export async function restoreDatabase(dataDir: string, backupFile: string): Promise<Restored> {
  if (!fs.existsSync(backupFile)) throw new RestoreRefused(`No backup at ${backupFile}.`);
  const integrity = await checkIntegrity(backupFile);
  if (integrity !== 'ok') throw new RestoreRefused(`The backup failed its integrity check, nothing was restored: ${integrity}`);
  fs.mkdirSync(dataDir, { recursive: true });
  const unmark = markInUse(dataDir, 'restore');
  try {
    const servers = liveUsers(dataDir, 'server');
    if (servers.length) {
      throw new RestoreRefused(
        `A Sagwright server (process ${servers.join(', ')}) is using ${dataDir}: stop it, then restore. Nothing was restored.`,
      );
    }
    const live = path.join(dataDir, DATABASE_FILE);
    // The backup is made ready beside the database, then copied over it in one go: the live file is
    // either the old database or the restored one with its sessions ended, never something between.
    const staged = path.join(dataDir, `restoring-${process.pid}.sqlite`);
    try {
      await copyDatabase(backupFile, staged);
      const ended = await endSessions(staged, fs.existsSync(live) ? live : undefined);
      await copyDatabase(staged, live);
      // Without the replaced database's versions, only a new secret surely ends the older sessions.
      const secretFile = path.join(dataDir, JWT_SECRET_FILE);
      const secretReplaced = !ended.comparedWithReplaced && fs.existsSync(secretFile);
      if (secretReplaced) fs.rmSync(secretFile);
      return { ...ended, secretReplaced };
    } finally {
      for (const suffix of ['', '-wal', '-shm', '-journal']) fs.rmSync(staged + suffix, { force: true });
    }
  } finally {
    unmark();
  }
}

function report(file: string, dataDir: string, restored: Restored): string {
  const lines = [`Restored ${file} into ${dataDir}.`, `All ${restored.users} account(s) are signed out: everyone signs in again.`];
  if (!restored.comparedWithReplaced && !restored.secretReplaced) {
    lines.push('The replaced database could not be read: if SAGWRIGHT_JWT_SECRET is set, change it, or tokens revoked after the backup may pass again.');
  }
  lines.push('Start the server again.');
  return lines.join('\n');
}

if (require.main === module) {
  const file = process.argv[2];
  if (!file) {
    console.error('Usage: npm run restore FILE');
    process.exit(2);
  }
  const dataDir = readConfig().dataDir;
  restoreDatabase(dataDir, path.resolve(file))
    .then((restored) => console.log(report(file, dataDir, restored)))
    .catch((err: Error) => {
      console.error(err instanceof RestoreRefused ? err.message : `Restore failed, nothing was restored: ${err.message}`);
      process.exit(1);
    });
}
