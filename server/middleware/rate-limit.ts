/** The abuse limits of ServerConfig.rateLimits as middleware, each with its own in-memory count. */
import { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { RateLimit, RateLimits } from '../env';
import { RateLimitedError } from '../errors';

function limiter({ limit, windowMs }: RateLimit, key: (req: Request) => string): RequestHandler {
  return rateLimit({
    limit,
    windowMs,
    keyGenerator: key,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new RateLimitedError()),
  });
}

function clientKey(req: Request): string {
  return ipKeyGenerator(req.ip ?? '');
}

function emailTried(req: Request): string {
  const email: unknown = req.body?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

export interface RateLimiters {
  signIn: RequestHandler;
  signUp: RequestHandler;
  reset: RequestHandler;
  /** One count per address shared by every route it is put on. */
  perAddress: RequestHandler;
}

export function rateLimiters(limits: RateLimits): RateLimiters {
  return {
    signIn: limiter(limits.signIn, (req) => `${clientKey(req)} ${emailTried(req)}`),
    signUp: limiter(limits.signUp, clientKey),
    reset: limiter(limits.reset, clientKey),
    perAddress: limiter(limits.perAddress, clientKey),
  };
}
