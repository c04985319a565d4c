/**
 * `npm run restore FILE`: puts a backup back as the live database. Stop the server first: the
 * copy replaces every page, and a running server would keep serving what it had cached.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DATABASE_FILE } from '../data-source';
import { checkIntegrity, copyDatabase } from '../db/online-backup';
import { readConfig } from '../env';

export async function restoreDatabase(dataDir: string, backupFile: string): Promise<void> {
  if (!fs.existsSync(backupFile)) throw new Error(`No backup at ${backupFile}.`);
  const integrity = await checkIntegrity(backupFile);
  if (integrity !== 'ok') throw new Error(`The backup failed its integrity check, nothing was restored: ${integrity}`);
  fs.mkdirSync(dataDir, { recursive: true });
  await copyDatabase(backupFile, path.join(dataDir, DATABASE_FILE));
}

if (require.main === module) {
  const file = process.argv[2];
  if (!file) {
    console.error('Usage: npm run restore FILE');
    process.exit(2);
  }
  const dataDir = readConfig().dataDir;
  restoreDatabase(dataDir, path.resolve(file))
    .then(() => console.log(`Restored ${file} into ${dataDir}. Start the server again.`))
    .catch((err) => {
      console.error(`Restore failed: ${err.message}`);
      process.exit(1);
    });
}
