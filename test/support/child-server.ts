/**
 * A server script run as its own process from the repository root, through tsx, so it has its
 * own event loop and memory. Ready once its stdout has a line that gives the port it listens on.
 */
import { ChildProcess, spawn } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');

export interface ChildServerOptions {
  /** The script to run, relative to the repository root. */
  script: string;
  /** Added to this process's environment. */
  env?: Record<string, string>;
  /** Matches the line the server prints once it listens; its first group is the port. */
  portLine: RegExp;
  timeoutMs?: number;
}

export interface ChildServer {
  port: number;
  pid: number;
  /** Everything the server has printed so far, stdout and stderr together. */
  output: () => string;
  stop: () => Promise<void>;
  /** SIGKILL: no shutdown handler runs, as when the power fails. */
  kill: () => Promise<void>;
}

export async function startChildServer({ script, env = {}, portLine, timeoutMs = 60_000 }: ChildServerOptions): Promise<ChildServer> {
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', script], {
    cwd: root,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const pid = child.pid;
  if (pid === undefined) throw new Error(`${script} did not start`);
  let output = '';
  child.stdout?.on('data', (chunk) => (output += chunk));
  child.stderr?.on('data', (chunk) => (output += chunk));

  const signal = (name: NodeJS.Signals) =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill(name);
    });

  const port = await new Promise<number>((resolve, reject) => {
    const timer = setTimeout(() => {
      void signal('SIGKILL');
      reject(new Error(`${script} printed no port within ${timeoutMs} ms:\n${output}`));
    }, timeoutMs);
    const exited = (code: number | null) => {
      clearTimeout(timer);
      reject(new Error(`${script} exited with ${code}:\n${output}`));
    };
    // Once the port is known the server's further output is only collected, not searched.
    const watch = () => {
      const match = portLine.exec(output);
      if (!match) return;
      clearTimeout(timer);
      child.stdout?.off('data', watch);
      child.off('exit', exited);
      resolve(Number(match[1]));
    };
    child.stdout?.on('data', watch);
    child.once('exit', exited);
  });

  return { port, pid, output: () => output, stop: () => signal('SIGTERM'), kill: () => signal('SIGKILL') };
}
