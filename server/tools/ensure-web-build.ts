/**
 * Exports the web app to dist/ when the build is missing or older than anything it is built
 * from, so a second `npm start` with nothing changed starts in seconds.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const sources = ['app', 'src', 'shared', 'fonts', 'app.json', 'babel.config.js', 'metro.config.js', 'package-lock.json', 'tsconfig.json'];
const stamp = path.join(root, 'dist', 'index.html');

function newestChange(entry: string): number {
  const stat = fs.statSync(entry, { throwIfNoEntry: false });
  if (!stat) return 0;
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const child of fs.readdirSync(entry)) newest = Math.max(newest, newestChange(path.join(entry, child)));
  return newest;
}

export function webBuildIsCurrent(): boolean {
  const built = fs.statSync(stamp, { throwIfNoEntry: false });
  if (!built) return false;
  return sources.every((entry) => newestChange(path.join(root, entry)) <= built.mtimeMs);
}

export function buildWeb(): void {
  console.log('Building the web app (a minute or two the first time)...');
  const result = spawnSync(
    process.execPath,
    [require.resolve('expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', 'dist'],
    { cwd: root, stdio: 'inherit', env: { ...process.env, CI: '1' } },
  );
  if (result.status !== 0) throw new Error('The web build failed; see the output above.');
}

if (require.main === module) {
  if (webBuildIsCurrent()) console.log('The web build is up to date.');
  else buildWeb();
}
