import path from 'node:path';
import { Database } from './data-source';
import { ServerConfig } from './env';
import { SmtpOutbox } from './fakes/smtp-outbox';
import { loadJwtSecret } from './services/jwt-secret.service';
import { createMailer, Mailer } from './services/mailer.service';
import { openPaymentGateway, PaymentGateway } from './services/payments.service';
import { PublicAddress } from './services/public-address.service';
import { SizingDataCache } from './services/sizing-data.service';

/** What every router and service is built from; tests assemble their own. */
export interface AppContext {
  config: ServerConfig;
  db: Database;
  log: (message: string, detail?: unknown) => void;
  /** The one clock services read, so tests move time instead of sleeping. */
  now: () => Date;
  secrets: { jwt: string };
  mailer: Mailer;
  /** Profiles, settings and candidate springs the sizing reads, and catalogue search totals, cached until a write invalidates them. */
  sizingData: SizingDataCache;
  /** The card payment provider's SDK, pointed at the local stand-in outside production without keys. */
  payments: PaymentGateway;
  /** The local SMTP stand-in, when this installation runs one (never in production). */
  outbox?: SmtpOutbox;
  /** Where links in mails point and which origin the cookie routes trust; never a request's Host. */
  publicAddress: PublicAddress;
}

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
