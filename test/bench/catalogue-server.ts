/**
 * The real server (`server/index.ts`) as a child process over a data folder the benchmark has
 * filled, on a free loopback port, so its memory is its own and can be read from /proc: VmHWM is
 * the peak resident set since the process started (proc(5)).
 */
import fs from 'node:fs';
import { DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { startChildServer } from '../support/child-server';

export interface ServerProcess {
  url: string;
  /** Peak and current resident memory of the server process, in bytes. */
  memory: () => { peakBytes: number; residentBytes: number };
  /** CPU time the server process has used, user and system, in seconds: on a busy machine a steadier figure than the wall clock. */
  cpuSeconds: () => number;
  stop: () => Promise<void>;
}

// Clock ticks per second for /proc/<pid>/stat: USER_HZ, 100 on Linux (proc(5), sysconf(_SC_CLK_TCK)).
const USER_HZ = 100;

function readCpuSeconds(pid: number): number {
  const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
  // Fields after the command name in brackets: utime and stime are the 14th and 15th of the line.
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return (Number(fields[11]) + Number(fields[12])) / USER_HZ;
}

function readStatusKb(pid: number, field: 'VmHWM' | 'VmRSS'): number {
  const match = new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(fs.readFileSync(`/proc/${pid}/status`, 'utf8'));
  if (!match) throw new Error(`/proc/${pid}/status has no ${field}`);
  return Number(match[1]);
}

export async function startServerProcess(dataDir: string): Promise<ServerProcess> {
  const server = await startChildServer({
    script: 'server/index.ts',
    env: { NODE_ENV: 'test', PORT: '0', DATA_DIR: dataDir, SAGWRIGHT_DEMO: '1' },
    portLine: /running at http:\/\/localhost:(\d+)/,
  });
  const { pid } = server;
  return {
    url: `http://127.0.0.1:${server.port}`,
    memory: () => ({ peakBytes: readStatusKb(pid, 'VmHWM') * 1024, residentBytes: readStatusKb(pid, 'VmRSS') * 1024 }),
    cpuSeconds: () => readCpuSeconds(pid),
    stop: server.stop,
  };
}

/** An access token for a demo account. */
export async function signIn(url: string, email: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`sign-in answered ${response.status}: ${await response.text()}`);
  return ((await response.json()) as { token: string }).token;
}
