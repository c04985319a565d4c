/** A real app over a fresh SQLite file in a temporary folder, for API tests. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../../server/app';
import { AppContext } from '../../server/context';
import { Database } from '../../server/data-source';
import { readConfig, ServerConfig } from '../../server/env';

export interface TestContext extends AppContext {
  app: ReturnType<typeof createApp>;
  logged: string[];
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
  const db = await Database.open(config.dataDir);
  const logged: string[] = [];
  const ctx: AppContext = { config, db, log: (message) => logged.push(message) };
  return {
    ...ctx,
    app: createApp(ctx),
    logged,
    dispose: async () => {
      await db.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
