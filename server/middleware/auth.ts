/** The guards behind the access classes of the route table, and the signed-in user they leave on the request. */
import { Request, RequestHandler } from 'express';
import { Role } from '../../shared/types/roles';
import { AppContext } from '../context';
import { ForbiddenError, UnauthorizedError } from '../errors';
import { Guards } from '../routes/route-table';
import { SessionService } from '../services/session.service';

/** Who is calling, as `req.user` holds it. */
export interface AuthUser {
  id: number;
  role: Role;
  email: string;
  name: string;
}

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

export function authGuards(ctx: AppContext): Guards {
  const sessions = new SessionService(ctx);
  return {
    public: () => [],
    'signed-in': (access) => [requireUser(sessions, access.roles)],
  };
}
