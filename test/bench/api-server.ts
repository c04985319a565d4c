/**
 * The real app for the API benchmark, run as its own process so the load generator's CPU does not
 * share its event loop: a fresh data folder with the demo loaded, `createApp` as the server runs
 * it, and in front of it `POST /bench/bare`, a bare Express JSON route that echoes its body, as the
 * baseline of the same server. Prints `{"port": n}` once it listens; SIGTERM stops it and removes
 * the data folder.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import { createApp, JSON_BODY_LIMIT } from '../../server/app';
import { openContext } from '../../server/context';
import { readConfig } from '../../server/env';
import { seed } from '../../server/seed';

async function main(): Promise<void> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-bench-'));
  const config = readConfig({ ...process.env, NODE_ENV: 'test', DATA_DIR: dataDir, SAGWRIGHT_DEMO: '1' });
  const { ctx, close } = await openContext(config, (message, detail) => console.error(`[bench server] ${message}`, detail ?? ''));
  await seed(ctx.db, { demo: true });

  const app = express();
  app.disable('x-powered-by');
  app.post('/bench/bare', express.json({ limit: JSON_BODY_LIMIT }), (req, res) => {
    res.json(req.body);
  });
  app.use(createApp(ctx));

  const server = app.listen(0, '127.0.0.1', () => {
    const address = server.address();
    if (!address || typeof address === 'string') throw new Error('the bench server has no TCP address');
    console.log(JSON.stringify({ port: address.port }));
  });
  process.once('SIGTERM', () => {
    server.close(() => {
      close()
        .finally(() => fs.rmSync(dataDir, { recursive: true, force: true }))
        .finally(() => process.exit(0));
    });
    server.closeAllConnections();
  });
}

main().catch((error: unknown) => {
  console.error('The bench server could not start:', error);
  process.exit(1);
});
