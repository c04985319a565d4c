/** The real server as its own process, on a free port, over a temporary data folder. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ChildServer, startChildServer } from '../support/child-server';

export interface RunningServer extends Pick<ChildServer, 'output' | 'stop' | 'kill'> {
  url: string;
  dataDir: string;
}

export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const dataDir = env.DATA_DIR ?? fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-e2e-'));
  const server = await startChildServer({
    script: 'server/index.ts',
    env: { NODE_ENV: 'test', PORT: '0', DATA_DIR: dataDir, ...env },
    portLine: /running at http:\/\/localhost:(\d+)/,
  });
  return { url: `http://localhost:${server.port}`, dataDir, output: server.output, stop: server.stop, kill: server.kill };
}
