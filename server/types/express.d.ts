import type { AuthUser } from './auth-user';

declare global {
  namespace Express {
    interface Request {
      /** Set by the guard of a signed-in route. */
      user?: AuthUser;
    }
  }
}
