/**
 * Builds the Express app without listening, so tests can drive it over HTTP with supertest.
 */
import fs from 'node:fs';
import path from 'node:path';
import querystring from 'node:querystring';
import cookieParser from 'cookie-parser';
import cors from 'cors';
import express, { Express, RequestHandler } from 'express';
import helmet from 'helmet';
import type { AppContext } from './app-context';
import { authGuards } from './middleware/auth';
import { apiErrorHandler, apiNotFound, pageErrorHandler } from './middleware/error-handler';
import { apiRoutes } from './routes';
import { PAYMENT_WEBHOOK_PATH } from './routes/payments.router';
import { mountRoutes } from './routes/route-table';

export const JSON_BODY_LIMIT = '100kb';

/**
 * Keys no field is named. Yup looks each key of a body up in its table of fields, finds these on
 * Object.prototype and throws a TypeError (a 500); they are dropped as any unknown key would be.
 */
const PROTOTYPE_KEYS = ['__proto__', 'constructor', 'prototype'];

/** Bodies whose bytes name a prototype key, or hold a \u escape that could spell one. */
const bodiesToClean = new WeakSet<object>();

/**
 * Runs on the raw bytes before parsing. A byte search costs a few microseconds, against several
 * times the parse itself for a JSON.parse reviver, which would slow every sizing request.
 */
function notePrototypeKeys(req: object, _res: object, raw: Buffer): void {
  if (raw.includes('\\u') || PROTOTYPE_KEYS.some((key) => raw.includes(key))) bodiesToClean.add(req);
}

/** Drops the prototype keys at every depth, without recursion, since a body may nest thousands deep. */
function dropPrototypeKeys(body: unknown): void {
  const pending: unknown[] = [body];
  while (pending.length) {
    const value = pending.pop();
    if (!value || typeof value !== 'object') continue;
    for (const key of PROTOTYPE_KEYS) if (Object.hasOwn(value, key)) delete (value as Record<string, unknown>)[key];
    for (const child of Object.values(value)) pending.push(child);
  }
}

const cleanBody: RequestHandler = (req, _res, next) => {
  if (bodiesToClean.has(req)) dropPrototypeKeys(req.body);
  next();
};

/** Express's "simple" query parser (node:querystring), less the prototype keys. */
function parseQuery(text: string): querystring.ParsedUrlQuery {
  const query = querystring.parse(text);
  for (const key of PROTOTYPE_KEYS) delete query[key];
  return query;
}

function securityHeaders() {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      // A phone reaches the shop's machine over plain HTTP on the local network.
      directives: { 'upgrade-insecure-requests': null },
    },
    strictTransportSecurity: false,
  });
}

function serveWebBuild(app: Express, webDir: string) {
  const index = path.join(webDir, 'index.html');
  app.use(express.static(webDir, { index: false, maxAge: '1h' }));
  app.get('/{*splat}', (_req, res) => {
    if (fs.existsSync(index)) {
      res.set('Cache-Control', 'no-cache').sendFile(index);
    } else {
      res.status(503).type('text').send('The web app has not been built yet: run `npm run build`.');
    }
  });
}

export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.set('query parser', parseQuery);
  app.use(securityHeaders());

  const api = express.Router();
  api.use(cors({ origin: ctx.config.corsOrigins, credentials: true }));
  // The payment webhook's signature covers the raw bytes: parsed before (and so skipped by) the JSON parser.
  api.use(PAYMENT_WEBHOOK_PATH, express.raw({ type: '*/*', limit: JSON_BODY_LIMIT }));
  api.use(express.json({ limit: JSON_BODY_LIMIT, verify: notePrototypeKeys }), cleanBody);
  api.use(cookieParser());
  api.use(mountRoutes(apiRoutes(ctx), authGuards(ctx)));
  api.use(apiNotFound);
  api.use(apiErrorHandler(ctx.log));
  app.use('/api', api);

  serveWebBuild(app, ctx.config.webDir);
  app.use(pageErrorHandler(ctx.log));
  return app;
}
