/**
 * `npm run backup [FILE]`: a consistent copy of the live database, taken with SQLite's online
 * backup while the server may keep running. Without FILE it goes to <data>/backups/.
 */
import fs from 'node:fs';
import path from 'node:path';
import { DATABASE_FILE } from '../data-source';
import { checkIntegrity, copyDatabase } from '../db/online-backup';
import { readConfig } from '../env';

export async function backupDatabase(dataDir: string, target?: string, now = new Date()): Promise<string> {
  const source = path.join(dataDir, DATABASE_FILE);
  if (!fs.existsSync(source)) throw new Error(`No database at ${source}.`);
  const file = target ?? path.join(dataDir, 'backups', `sagwright-${now.toISOString().replace(/[:.]/g, '-')}.sqlite`);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  await copyDatabase(source, file);
  const integrity = await checkIntegrity(file);
  if (integrity !== 'ok') throw new Error(`The copy failed its integrity check: ${integrity}`);
  return file;
}

if (require.main === module) {
  backupDatabase(readConfig().dataDir, process.argv[2] ? path.resolve(process.argv[2]) : undefined)
    .then((file) => console.log(`Backed up to ${file}`))
    .catch((err) => {
      console.error(`Backup failed: ${err.message}`);
      process.exit(1);
    });
}
