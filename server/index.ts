/**
 * Starts Sagwright: marks the data folder as in use (a restore refuses meanwhile), opens the
 * database (migrating it), the token secret and mail (with the local SMTP stand-in outside
 * production), loads the demo once, and listens.
 */
import { createApp } from './app';
import { openContext } from './context';
import { liveUsers, markInUse } from './db/data-dir-users';
import { readConfig } from './env';
import { seed } from './seed';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './seed/demo-accounts';

async function main() {
  const config = readConfig();
  const log = (message: string, detail?: unknown) => console.error(`[sagwright] ${message}`, detail ?? '');
  // Marked before looking, as a restore does, so the two never both go ahead.
  const unmark = markInUse(config.dataDir, 'server');
  const restoring = liveUsers(config.dataDir, 'restore');
  if (restoring.length) {
    unmark();
    throw new Error(`a restore (process ${restoring.join(', ')}) is replacing the database in ${config.dataDir}: start the server once it has finished`);
  }
  const { ctx, close } = await openContext(config, log);
  const loaded = await seed(ctx.db, { demo: config.seedDemo });
  if (loaded.length) console.log(`Loaded seed data: ${loaded.join(', ')}`);
  if (config.production && !config.smtp) log('no SMTP server is configured (SMTP_URL or SMTP_HOST): reset mails cannot be sent');
  if (config.production && !(await ctx.publicAddress.current())) log("no public address (SAGWRIGHT_PUBLIC_URL, or the admin's shop settings): reset and quote mails are refused until one is set");
  const server = createApp(ctx).listen(config.port, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    ctx.publicAddress.listeningOn(port);
    ctx.payments.standIn?.setWebhookUrl(`http://127.0.0.1:${port}/api/payments/webhook`);
    console.log(`Sagwright is running at http://localhost:${port}`);
    if (config.seedDemo) {
      console.log(`Demo accounts, password "${DEMO_PASSWORD}":`);
      for (const account of DEMO_ACCOUNTS) console.log(`  ${account.email.padEnd(20)} ${account.role}`);
    }
    console.log(`Data folder: ${config.dataDir}`);
    if (ctx.outbox) console.log(`Mail is not sent but kept in ${ctx.outbox.dir} (admin: GET /api/dev/outbox)`);
  });

  const stop = () => {
    server.close(() => {
      close().finally(() => process.exit(0));
    });
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error('Sagwright could not start:', err);
  process.exit(1);
});
