/** The guards behind the access classes of the route table, and the signed-in user they leave on the request. */
import { Request, RequestHandler } from 'express';
import { Role } from '../../shared/types/roles';
import type { AppContext } from '../app-context';
import { Quote } from '../entities/quote.entity';
import { BadRequestError, ForbiddenError, HttpError, UnauthorizedError } from '../errors';
import { hashQuoteToken } from '../services/quote-token';
import { Guards } from '../routes/route-table';
import { SessionService } from '../services/session.service';
import type { AuthUser } from '../types/auth-user';

/** Who is calling, as `req.user` holds it (server/types/auth-user.ts). */
export type { AuthUser };

export function bearerToken(req: Request): string | undefined {
  const match = /^Bearer\s+(\S+)$/i.exec(req.get('authorization') ?? '');
  return match?.[1];
}

/** Refuses (401) without a valid access token and (403) for a role not listed; the role is read fresh from the database. */
export function requireUser(sessions: SessionService, roles: readonly Role[]): RequestHandler {
  return async (req, _res, next) => {
    const token = bearerToken(req);
    const user = token ? await sessions.verify(token, 'access') : undefined;
    if (!user) throw new UnauthorizedError();
    if (!roles.includes(user.role)) throw new ForbiddenError();
    req.user = { id: user.id, role: user.role, email: user.email, name: user.name };
    next();
  };
}

/** The user a signed-in route's guard let through. */
export function currentUser(req: Request): AuthUser {
  if (!req.user) throw new UnauthorizedError();
  return req.user;
}

const DEAD_LINK = 'This quote link is not valid any more: ask the shop for a new one.';

/**
 * Opens the one quote whose link token is the path's `:token` (only its SHA-256 is stored), and
 * leaves its id in `res.locals.quoteId`. A superseded or expired quote's link is dead.
 */
export function requireQuoteToken(ctx: AppContext): RequestHandler {
  return async (req, res, next) => {
    const token = typeof req.params.token === 'string' ? req.params.token : '';
    const quote = /^[A-Za-z0-9_-]{43}$/.test(token)
      ? await ctx.db.read.getRepository(Quote).findOne({ select: { id: true, status: true, validUntil: true }, where: { tokenHash: hashQuoteToken(token) } })
      : null;
    const lapsed = quote && ['draft', 'sent', 'accepted'].includes(quote.status) && quote.validUntil.getTime() < ctx.now().getTime();
    if (!quote || lapsed || quote.status === 'superseded' || quote.status === 'expired') throw new HttpError(404, 'quote-link', DEAD_LINK);
    res.locals.quoteId = quote.id;
    next();
  };
}

/** The provider signs every event; one without the header is refused before its body is read. */
export const requireSignatureHeader: RequestHandler = (req, _res, next) => {
  if (!req.get('stripe-signature')) throw new BadRequestError('The event is not signed.', 'bad-signature');
  next();
};

export function authGuards(ctx: AppContext): Guards {
  const sessions = new SessionService(ctx);
  return {
    public: () => [],
    'signed-in': (access) => [requireUser(sessions, access.roles)],
    'quote-token': () => [requireQuoteToken(ctx)],
    webhook: () => [requireSignatureHeader],
  };
}
