import path from 'node:path';
import type { AppContext } from './app-context';
import { Database } from './data-source';
import { ServerConfig } from './env';
import { SmtpOutbox } from './fakes/smtp-outbox';
import { loadJwtSecret } from './services/jwt-secret.service';
import { createMailer } from './services/mailer.service';
import { openPaymentGateway } from './services/payments.service';
import { PublicAddress } from './services/public-address.service';
import { SizingDataCache } from './services/sizing-data.service';

export type { AppContext } from './app-context';

export interface OpenContext {
  ctx: AppContext;
  close: () => Promise<void>;
}

/**
 * Opens everything a context holds: the database (migrated), the token secret, and mail, through
 * the configured SMTP server or, outside production without one, a local stand-in started here.
 */
export async function openContext(config: ServerConfig, log: AppContext['log'], now: AppContext['now'] = () => new Date()): Promise<OpenContext> {
  const db = await Database.open(config.dataDir);
  const secrets = { jwt: loadJwtSecret(config) };
  const outbox = config.smtp || config.production ? undefined : await SmtpOutbox.start(path.join(config.dataDir, 'outbox'), log);
  const mailer = createMailer(config.smtp ?? outbox?.smtp, config.mailFrom);
  const payments = await openPaymentGateway(config, log);
  return {
    ctx: { config, db, log, now, secrets, mailer, outbox, payments, sizingData: new SizingDataCache(db), publicAddress: new PublicAddress(config, db) },
    close: async () => {
      mailer.close();
      await payments.close();
      await outbox?.close();
      await db.close();
    },
  };
}
