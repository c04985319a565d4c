/**
 * A real app over a fresh SQLite file in a temporary folder, for API tests, with the local SMTP
 * stand-in running (as in development) and a clock the test can move forward.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/app-context';
import { openContext } from '../../server/context';
import { readConfig, ServerConfig } from '../../server/env';

export interface TestContext extends AppContext {
  app: ReturnType<typeof createApp>;
  logged: string[];
  /** Moves the services' clock (`now()`) forward; token expiry and reset links follow it. */
  advanceClock: (ms: number) => void;
  dispose: () => Promise<void>;
}

export function tempDir(prefix = 'sagwright-test-'): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), prefix));
}

export async function makeTestContext(overrides: Partial<ServerConfig> = {}): Promise<TestContext> {
  const dataDir = tempDir();
  const config: ServerConfig = {
    ...readConfig({ NODE_ENV: 'test' }),
    dataDir,
    webDir: path.join(dataDir, 'web'),
    ...overrides,
  };
  const logged: string[] = [];
  let offsetMs = 0;
  const { ctx, close } = await openContext(config, (message) => logged.push(message), () => new Date(Date.now() + offsetMs));
  return {
    ...ctx,
    app: createApp(ctx),
    logged,
    advanceClock: (ms) => {
      offsetMs += ms;
    },
    dispose: async () => {
      await close();
      fs.rmSync(config.dataDir, { recursive: true, force: true });
    },
  };
}
