/**
 * The type every router and service receives. It builds nothing, so importing it pulls in no
 * service: `server/context.ts` assembles the real one.
 */
import type { Database } from './data-source';
import type { ServerConfig } from './env';
import type { SmtpOutbox } from './fakes/smtp-outbox';
import type { Mailer } from './services/mailer.service';
import type { PaymentGateway } from './services/payments.service';
import type { PublicAddress } from './services/public-address.service';
import type { SizingDataCache } from './services/sizing-data.service';

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
