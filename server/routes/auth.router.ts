/**
 * Sign-up, sign-in, the refresh cookie, sign-out, password reset and /me. Answers carrying a session
 * set the refresh cookie, scoped to /api/auth so no other request ever carries it; the routes that
 * read or set it refuse requests from another site's page.
 */
import { Response } from 'express';
import { resetRequestSchema, resetSchema, signInSchema, signUpSchema } from '../../shared/schemas/auth.schema';
import { SessionAnswer } from '../../shared/types/account';
import type { AppContext } from '../app-context';
import { User } from '../entities/user.entity';
import { UnauthorizedError } from '../errors';
import { currentUser } from '../middleware/auth';
import { rateLimiters } from '../middleware/rate-limit';
import { sameSiteOnly } from '../middleware/same-site';
import { PasswordResetService } from '../services/password-reset.service';
import { SessionService, TOKEN_SECONDS } from '../services/session.service';
import { toAccountUser, UsersService } from '../services/users.service';
import { anyRole, publicAccess, RouteSpec } from './route-table';
import { parseInput } from './validate';

export const REFRESH_COOKIE = 'sagwright_refresh';
const REFRESH_COOKIE_PATH = '/api/auth';
const SESSION_ENDED = 'Your session has ended; sign in again.';

export function authRoutes(ctx: AppContext): RouteSpec[] {
  const limits = rateLimiters(ctx.config.rateLimits);
  const sameSite = sameSiteOnly(ctx);
  const sessions = new SessionService(ctx);
  const users = new UsersService(ctx);
  const resets = new PasswordResetService(ctx, users);
  const cookie = { httpOnly: true, sameSite: 'strict', secure: ctx.config.secureCookies, path: REFRESH_COOKIE_PATH } as const;

  function startSession(res: Response, user: User): SessionAnswer {
    res.cookie(REFRESH_COOKIE, sessions.issue(user, 'refresh'), { ...cookie, maxAge: TOKEN_SECONDS.refresh * 1000 });
    return { token: sessions.issue(user, 'access'), expiresIn: TOKEN_SECONDS.access, user: toAccountUser(user) };
  }

  return [
    {
      method: 'post',
      path: '/auth/sign-up',
      access: publicAccess,
      before: [sameSite, limits.perAddress, limits.signUp],
      handler: async (req, res) => {
        const input = await parseInput(signUpSchema, req.body);
        const user = await users.create({ ...input, role: 'rider' });
        res.status(201).json(startSession(res, user));
      },
    },
    {
      method: 'post',
      path: '/auth/sign-in',
      access: publicAccess,
      before: [sameSite, limits.perAddress, limits.signIn],
      handler: async (req, res) => {
        const { email, password } = await parseInput(signInSchema, req.body);
        res.json(startSession(res, await users.signIn(email, password)));
      },
    },
    {
      method: 'post',
      path: '/auth/refresh',
      access: publicAccess,
      before: [sameSite],
      handler: async (req, res) => {
        const token: unknown = req.cookies?.[REFRESH_COOKIE];
        // Another site's request arrives without the SameSite=Strict cookie; clearing it then would sign its visitor out.
        if (typeof token !== 'string' || !token) throw new UnauthorizedError(SESSION_ENDED, 'session-expired');
        const session = await sessions.verify(token, 'refresh');
        const user = session && (await users.find(session.id));
        if (!user) {
          res.clearCookie(REFRESH_COOKIE, cookie);
          throw new UnauthorizedError(SESSION_ENDED, 'session-expired');
        }
        res.json(startSession(res, user));
      },
    },
    {
      method: 'post',
      path: '/auth/sign-out',
      access: anyRole,
      before: [sameSite],
      handler: async (req, res) => {
        await users.revokeTokens(currentUser(req).id);
        res.clearCookie(REFRESH_COOKIE, cookie);
        res.status(204).end();
      },
    },
    {
      method: 'post',
      path: '/auth/reset-request',
      access: publicAccess,
      before: [limits.perAddress, limits.reset],
      handler: async (req, res) => {
        const { email } = await parseInput(resetRequestSchema, req.body);
        await resets.request(email, await ctx.publicAddress.forLinks());
        res.status(202).json({ message: 'If an account uses this e-mail, a reset link is on its way.' });
      },
    },
    {
      method: 'post',
      path: '/auth/reset',
      access: publicAccess,
      before: [limits.perAddress, limits.reset],
      handler: async (req, res) => {
        const { token, password } = await parseInput(resetSchema, req.body);
        await resets.reset(token, password);
        res.status(204).end();
      },
    },
    {
      method: 'get',
      path: '/me',
      access: anyRole,
      handler: async (req, res) => {
        const user = await users.find(currentUser(req).id);
        if (!user) throw new UnauthorizedError();
        res.json({ user: toAccountUser(user) });
      },
    },
  ];
}
