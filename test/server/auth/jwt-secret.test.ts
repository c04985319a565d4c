/** The token secret: generated once into the data folder, owner read/write only (mode 0600), and reused. */
import fs from 'node:fs';
import path from 'node:path';
import { openContext } from '../../../server/context';
import { readConfig } from '../../../server/env';
import { SessionService } from '../../../server/services/session.service';
import { JWT_SECRET_FILE, loadJwtSecret } from '../../../server/services/jwt-secret.service';
import { tempDir } from '../test-context';
import { createAccount } from './helpers';

test('is created with mode 0600 and reused on the next start', () => {
  const dataDir = tempDir();
  const secret = loadJwtSecret({ dataDir });
  const file = path.join(dataDir, JWT_SECRET_FILE);
  expect(fs.statSync(file).mode & 0o777).toBe(0o600);
  expect(secret.length).toBeGreaterThanOrEqual(32);
  expect(fs.readFileSync(file, 'utf8')).toBe(secret);
  expect(loadJwtSecret({ dataDir })).toBe(secret);
  fs.rmSync(dataDir, { recursive: true });
});

test('a token issued before a restart still verifies after it', async () => {
  const config = { ...readConfig({ NODE_ENV: 'test' }), dataDir: tempDir() };
  const first = await openContext(config, () => {});
  const user = await createAccount(first.ctx, 'rider');
  const token = new SessionService(first.ctx).issue(user, 'access');
  await first.close();

  const second = await openContext(config, () => {});
  try {
    expect((await new SessionService(second.ctx).verify(token, 'access'))?.id).toBe(user.id);
  } finally {
    await second.close();
    fs.rmSync(config.dataDir, { recursive: true });
  }
});

test('SAGWRIGHT_JWT_SECRET wins and no file is written; a short one is refused', () => {
  const dataDir = tempDir();
  const fromEnv = 'an operator-provided secret of enough length';
  expect(loadJwtSecret({ dataDir, jwtSecret: readConfig({ NODE_ENV: 'test', SAGWRIGHT_JWT_SECRET: fromEnv }).jwtSecret })).toBe(fromEnv);
  expect(fs.existsSync(path.join(dataDir, JWT_SECRET_FILE))).toBe(false);
  expect(() => readConfig({ NODE_ENV: 'test', SAGWRIGHT_JWT_SECRET: 'too short' })).toThrow(/at least 32/);
  fs.rmSync(dataDir, { recursive: true });
});
