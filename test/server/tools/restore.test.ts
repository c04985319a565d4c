/**
 * `npm run restore`, run as the real command against the data folder of a real server process.
 * It refuses while the server runs and changes nothing; once the server is gone (here killed
 * outright, so its mark is left behind) it restores, and no token issued before the restore passes
 * any more: not one revoked after the backup (a sign-out, which the restored token version would
 * otherwise undo), not one issued after it, not the refresh cookie. A server will not start while
 * a restore is running.
 */
import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { DATABASE_FILE } from '../../../server/data-source';
import { RUNNING_DIR } from '../../../server/db/data-dir-users';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../../server/seed/demo-accounts';
import { RunningServer, startServer } from '../../e2e/server-process';
import { call } from '../../support/api-call';

jest.setTimeout(180_000);

const root = path.resolve(__dirname, '../../..');
const rider = DEMO_ACCOUNTS.find((a) => a.role === 'rider')!;

let server: RunningServer | undefined;
let dataDir: string;
afterAll(async () => {
  await server?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

/** An npm script of the project, as an operator runs it; answers its exit code and what it printed. */
async function npmRun(script: string, ...args: string[]): Promise<{ code: number; output: string }> {
  try {
    const { stdout, stderr } = await promisify(execFile)('npm', ['run', '--silent', script, '--', ...args], { cwd: root, env: { ...process.env, DATA_DIR: dataDir } });
    return { code: 0, output: stdout + stderr };
  } catch (err) {
    const failed = err as { code: number; stdout: string; stderr: string };
    return { code: failed.code, output: failed.stdout + failed.stderr };
  }
}

async function signIn(base: string): Promise<{ token: string; cookie: string }> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: rider.email, password: DEMO_PASSWORD }),
  });
  expect(res.status).toBe(200);
  const cookie = res.headers.getSetCookie()[0].split(';')[0];
  return { token: ((await res.json()) as { token: string }).token, cookie };
}

const meStatus = async (base: string, token: string) => (await fetch(`${base}/api/me`, { headers: { Authorization: `Bearer ${token}` } })).status;
const refreshStatus = async (base: string, cookie: string) => (await fetch(`${base}/api/auth/refresh`, { method: 'POST', headers: { Cookie: cookie } })).status;
const bikeNames = async (base: string, token: string) => (await call<{ bikes: { nickname: string }[] }>(base, 'GET', '/bikes', token)).bikes.map((b) => b.nickname);

test('restore refuses under a running server, then restores and ends every session issued before it', async () => {
  server = await startServer();
  dataDir = server.dataDir;
  const atBackup = await signIn(server.url);
  const backupFile = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-backup-')), 'copy.sqlite');
  expect((await npmRun('backup', backupFile)).code).toBe(0);

  // After the backup: a sign-out revokes the first session, a new one begins, a bike is added.
  const signOut = await fetch(`${server.url}/api/auth/sign-out`, { method: 'POST', headers: { Authorization: `Bearer ${atBackup.token}` } });
  expect(signOut.status).toBe(204);
  expect(await meStatus(server.url, atBackup.token)).toBe(401);
  const afterBackup = await signIn(server.url);
  await call(server.url, 'POST', '/bikes', afterBackup.token, { modelId: (await call<{ models: { id: number }[] }>(server.url, 'GET', '/bike-models', afterBackup.token)).models[0].id, nickname: 'Added after the backup' });

  const refused = await npmRun('restore', backupFile);
  expect(refused.code).not.toBe(0);
  expect(refused.output).toMatch(/A Sagwright server \(process \d+\) is using .*: stop it, then restore\. Nothing was restored\./);
  expect(refused.output).not.toMatch(/SQLITE_/);
  expect(await meStatus(server.url, afterBackup.token)).toBe(200);
  expect(await bikeNames(server.url, afterBackup.token)).toContain('Added after the backup');

  // Killed outright, the server leaves its mark; a mark whose process is gone does not hold the folder.
  await server.kill();
  server = undefined;
  expect(fs.readdirSync(path.join(dataDir, RUNNING_DIR))).toEqual([expect.stringMatching(/^server-\d+\.pid$/)]);
  const restored = await npmRun('restore', backupFile);
  expect(restored.output).toMatch(/account\(s\) are signed out/);
  expect(restored.code).toBe(0);

  server = await startServer({ DATA_DIR: dataDir });
  expect(await meStatus(server.url, atBackup.token)).toBe(401);
  expect(await meStatus(server.url, afterBackup.token)).toBe(401);
  expect(await refreshStatus(server.url, atBackup.cookie)).toBe(401);
  expect(await refreshStatus(server.url, afterBackup.cookie)).toBe(401);
  const fresh = await signIn(server.url);
  expect(await meStatus(server.url, fresh.token)).toBe(200);
  expect(await bikeNames(server.url, fresh.token)).not.toContain('Added after the backup');

  await server.stop();
  server = undefined;
  expect(fs.readdirSync(path.join(dataDir, RUNNING_DIR))).toEqual([]);
});

test('a server does not start while a restore is replacing its database', async () => {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-restoring-'));
  try {
    fs.mkdirSync(path.join(folder, RUNNING_DIR));
    // This test's own process stands in for a restore still copying.
    fs.writeFileSync(path.join(folder, RUNNING_DIR, `restore-${process.pid}.pid`), '');
    await expect(startServer({ DATA_DIR: folder })).rejects.toThrow(/a restore \(process \d+\) is replacing the database/);
    expect(fs.existsSync(path.join(folder, DATABASE_FILE))).toBe(false);
  } finally {
    fs.rmSync(folder, { recursive: true, force: true });
  }
});
