/**
 * Which processes are using a data folder. A server while it runs, and a restore while it replaces
 * the database, each keep a file named by their role and process id in <data>/running. A restore
 * refuses while a server's process lives; a server refuses to start while a restore's does. Each
 * marks itself before it looks for the other, so two starting together cannot both go ahead. A
 * file whose process is gone (a server killed outright) is ignored and tidied away.
 */
import fs from 'node:fs';
import path from 'node:path';

export type DataDirRole = 'server' | 'restore';

export const RUNNING_DIR = 'running';

const MARK = /^(server|restore)-(\d+)\.pid$/;

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    // EPERM: the process lives but belongs to another user.
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Process ids of other live processes using `dataDir` in `role`. */
export function liveUsers(dataDir: string, role: DataDirRole): number[] {
  const dir = path.join(dataDir, RUNNING_DIR);
  if (!fs.existsSync(dir)) return [];
  const pids: number[] = [];
  for (const name of fs.readdirSync(dir)) {
    const match = MARK.exec(name);
    if (!match || match[1] !== role) continue;
    const pid = Number(match[2]);
    if (pid === process.pid) continue;
    if (alive(pid)) pids.push(pid);
    else fs.rmSync(path.join(dir, name), { force: true });
  }
  return pids;
}

/** Marks this process as using `dataDir` in `role`, until the answered function runs or the process exits. */
export function markInUse(dataDir: string, role: DataDirRole): () => void {
  const dir = path.join(dataDir, RUNNING_DIR);
  fs.mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${role}-${process.pid}.pid`);
  fs.writeFileSync(file, `${new Date().toISOString()}\n`);
  const unmark = () => fs.rmSync(file, { force: true });
  process.once('exit', unmark);
  return () => {
    process.off('exit', unmark);
    unmark();
  };
}
