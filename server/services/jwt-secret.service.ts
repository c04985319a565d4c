/**
 * The key that signs session tokens: SAGWRIGHT_JWT_SECRET when set, otherwise one generated on
 * the first start and kept in the data folder (owner-only), so restarts keep everyone signed in.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { ServerConfig } from '../env';

export const JWT_SECRET_FILE = 'jwt-secret';

export function loadJwtSecret(config: Pick<ServerConfig, 'jwtSecret' | 'dataDir'>): string {
  if (config.jwtSecret) return config.jwtSecret;
  const file = path.join(config.dataDir, JWT_SECRET_FILE);
  try {
    // 'wx' fails if the file exists, so two processes starting together cannot both write one.
    fs.writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600, flag: 'wx' });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
  }
  const secret = fs.readFileSync(file, 'utf8').trim();
  if (secret.length < 32) throw new Error(`${file} holds too short a secret; delete it to have a new one made.`);
  return secret;
}
