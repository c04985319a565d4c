/**
 * The one module that reads process.env. Everything else receives a ServerConfig.
 */
import path from 'node:path';

/** At most `limit` requests per key in any `windowMs`. */
export interface RateLimit {
  limit: number;
  windowMs: number;
}

/** Every abuse limit, here only, so tests and benchmarks raise them explicitly. */
export interface RateLimits {
  /** Keyed by client IP and the e-mail tried, so one mistyping rider does not lock out a shop behind one address. */
  signIn: RateLimit;
  /** Keyed by client IP. */
  signUp: RateLimit;
  /** Reset request and reset together, keyed by client IP. */
  reset: RateLimit;
  /**
   * Sign-in, sign-up and reset together, keyed by client IP alone: the per-e-mail count of sign-in
   * does not stop one address trying a new e-mail each time, and every try costs a password hash.
   */
  perAddress: RateLimit;
}

const MINUTE = 60_000;

/**
 * Points inside a write transaction where a reliability test may hold it open
 * (SAGWRIGHT_FAULT_PAUSE), to kill the process between the writes and the commit.
 */
export const FAULT_POINTS = ['import-written', 'quote-accept-written'] as const;
export type FaultPoint = (typeof FAULT_POINTS)[number];

export const DEFAULT_RATE_LIMITS: RateLimits = {
  signIn: { limit: 10, windowMs: 15 * MINUTE },
  signUp: { limit: 5, windowMs: 60 * MINUTE },
  reset: { limit: 5, windowMs: 15 * MINUTE },
  perAddress: { limit: 100, windowMs: 15 * MINUTE },
};

export type SmtpSettings =
  | { url: string }
  | { host: string; port: number; secure: boolean; user?: string; pass?: string };

export interface PaymentKeys {
  secretKey: string;
  webhookSecret: string;
}

export interface ServerConfig {
  port: number;
  dataDir: string;
  webDir: string;
  production: boolean;
  seedDemo: boolean;
  version: string;
  /** Origins allowed to call the API from another origin (the Expo dev server); empty closes CORS. */
  corsOrigins: string[];
  /** Signs session tokens; without it a secret is generated once into the data folder. */
  jwtSecret?: string;
  /** Where the web app is reached, for links in mails; wins over the admin's setting (server/services/public-address.service.ts). */
  publicUrl?: string;
  /** Outgoing mail; without it, outside production, a local stand-in keeps every mail in the data folder. */
  smtp?: SmtpSettings;
  mailFrom: string;
  /** The card payment provider's keys; without them, outside production, a local stand-in with generated test keys. */
  payments?: PaymentKeys;
  rateLimits: RateLimits;
  /**
   * Marks the refresh cookie Secure. On by default only when the public address is https: a
   * browser drops a Secure cookie over the plain HTTP of a shop's local network.
   */
  secureCookies: boolean;
  /** Test only, refused in production: the write transaction that reaches this point never commits. */
  faultPause?: FaultPoint;
}

const root = path.resolve(__dirname, '..');

function readPort(raw: string | undefined, fallback = 8080, name = 'PORT'): number {
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`${name} must be a whole number from 0 to 65535, not "${raw}"`);
  }
  return port;
}

function readJwtSecret(raw: string | undefined): string | undefined {
  if (raw === undefined || raw === '') return undefined;
  if (raw.length < 32) throw new Error('SAGWRIGHT_JWT_SECRET must be at least 32 characters long');
  return raw;
}

function readPublicUrl(raw: string | undefined): string | undefined {
  if (raw === undefined || raw === '') return undefined;
  const url = new URL(raw);
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    throw new Error(`SAGWRIGHT_PUBLIC_URL must be an http(s) address, not "${raw}"`);
  }
  return url.origin + url.pathname.replace(/\/+$/, '');
}

function readSmtp(env: Record<string, string | undefined>): SmtpSettings | undefined {
  if (env.SMTP_URL) return { url: env.SMTP_URL };
  if (!env.SMTP_HOST) return undefined;
  const port = readPort(env.SMTP_PORT, 587, 'SMTP_PORT');
  return {
    host: env.SMTP_HOST,
    port,
    secure: env.SMTP_SECURE === 'true' || port === 465,
    user: env.SMTP_USER || undefined,
    pass: env.SMTP_PASS || undefined,
  };
}

function readPaymentKeys(env: Record<string, string | undefined>): PaymentKeys | undefined {
  const secretKey = env.STRIPE_SECRET_KEY || undefined;
  const webhookSecret = env.STRIPE_WEBHOOK_SECRET || undefined;
  if (!secretKey && !webhookSecret) return undefined;
  if (!secretKey || !webhookSecret) throw new Error('Set both STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET, or neither');
  return { secretKey, webhookSecret };
}

function readFaultPause(raw: string | undefined, production: boolean): FaultPoint | undefined {
  if (raw === undefined || raw === '') return undefined;
  if (production) throw new Error('SAGWRIGHT_FAULT_PAUSE holds writes open for reliability tests and is refused in production');
  const point = FAULT_POINTS.find((p) => p === raw);
  if (!point) throw new Error(`SAGWRIGHT_FAULT_PAUSE must be one of ${FAULT_POINTS.join(', ')}, not "${raw}"`);
  return point;
}

export function readConfig(env: Record<string, string | undefined> = process.env): ServerConfig {
  const production = env.NODE_ENV === 'production';
  const publicUrl = readPublicUrl(env.SAGWRIGHT_PUBLIC_URL);
  return {
    port: readPort(env.PORT),
    dataDir: path.resolve(env.DATA_DIR ?? path.join(root, 'data')),
    webDir: path.resolve(env.WEB_DIR ?? path.join(root, 'dist')),
    production,
    seedDemo: env.SAGWRIGHT_DEMO !== '0',
    version: env.npm_package_version ?? require('../package.json').version,
    corsOrigins: production
      ? []
      : (env.SAGWRIGHT_DEV_ORIGINS ?? 'http://localhost:8081').split(',').map((o) => o.trim()).filter(Boolean),
    jwtSecret: readJwtSecret(env.SAGWRIGHT_JWT_SECRET),
    publicUrl,
    smtp: readSmtp(env),
    mailFrom: env.SAGWRIGHT_MAIL_FROM || 'Sagwright <no-reply@sagwright.invalid>',
    payments: readPaymentKeys(env),
    rateLimits: DEFAULT_RATE_LIMITS,
    secureCookies: env.SAGWRIGHT_SECURE_COOKIES ? env.SAGWRIGHT_SECURE_COOKIES === '1' : publicUrl?.startsWith('https:') === true,
    faultPause: readFaultPause(env.SAGWRIGHT_FAULT_PAUSE, production),
  };
}
