/** The real server as its own process, on a free port, over a temporary data folder. */
import { ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');

export interface RunningServer {
  url: string;
  dataDir: string;
  output: () => string;
  stop: () => Promise<void>;
  /** SIGKILL: no shutdown handler runs, as when the power fails. */
  kill: () => Promise<void>;
}

export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const dataDir = env.DATA_DIR ?? fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-e2e-'));
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'test', PORT: '0', DATA_DIR: dataDir, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (chunk) => (output += chunk));
  child.stderr?.on('data', (chunk) => (output += chunk));

  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${output}`)), 60_000);
    const watch = () => {
      const match = /running at (http:\/\/localhost:\d+)/.exec(output);
      if (match) {
        clearTimeout(timer);
        resolve(match[1]);
      }
    };
    child.stdout?.on('data', watch);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code}:\n${output}`));
    });
  });

  const signal = (name: NodeJS.Signals) =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill(name);
    });

  return {
    url,
    dataDir,
    output: () => output,
    stop: () => signal('SIGTERM'),
    kill: () => signal('SIGKILL'),
  };
}
