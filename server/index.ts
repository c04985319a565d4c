/** Starts Sagwright: opens the database (migrating it), loads the demo once, and listens. */
import { createApp } from './app';
import { AppContext } from './context';
import { Database } from './data-source';
import { readConfig } from './env';
import { seedDemo } from './seed';

async function main() {
  const config = readConfig();
  const log = (message: string, detail?: unknown) => console.error(`[sagwright] ${message}`, detail ?? '');
  const db = await Database.open(config.dataDir);
  if (config.seedDemo) {
    const loaded = await seedDemo(db);
    if (loaded.length) console.log(`Loaded demo data: ${loaded.join(', ')}`);
  }
  const ctx: AppContext = { config, db, log };
  const server = createApp(ctx).listen(config.port, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    console.log(`Sagwright is running at http://localhost:${port}`);
    console.log(`Data folder: ${config.dataDir}`);
  });

  const stop = () => {
    server.close(() => {
      db.close().finally(() => process.exit(0));
    });
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error('Sagwright could not start:', err);
  process.exit(1);
});
