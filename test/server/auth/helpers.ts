/** Accounts, tokens and mail for the auth tests, made through the real services. */
import request from 'supertest';
import { Role } from '../../../shared/types/roles';
import type { AppContext } from '../../../server/app-context';
import { User } from '../../../server/entities/user.entity';
import { DEFAULT_RATE_LIMITS, RateLimits } from '../../../server/env';
import { OutboxEntry } from '../../../server/fakes/smtp-outbox';
import { REFRESH_COOKIE } from '../../../server/routes/auth.router';
import { SessionService } from '../../../server/services/session.service';
import { UsersService } from '../../../server/services/users.service';
import { TestContext } from '../test-context';

export const PASSWORD = 'correct horse battery';

/** For tests that sign in more often than a person would; each says so by using this. */
export const RAISED_LIMITS: RateLimits = {
  signIn: { ...DEFAULT_RATE_LIMITS.signIn, limit: 1000 },
  signUp: { ...DEFAULT_RATE_LIMITS.signUp, limit: 1000 },
  reset: { ...DEFAULT_RATE_LIMITS.reset, limit: 1000 },
  perAddress: { ...DEFAULT_RATE_LIMITS.perAddress, limit: 1000 },
};

let serial = 0;

export function createAccount(t: Pick<AppContext, 'db' | 'now'>, role: Role, email = `${role}-${++serial}@example.test`, password = PASSWORD): Promise<User> {
  return new UsersService(t).create({ name: `Test ${role} ${serial}`, email, role, password });
}

/** A fresh access token for the user as the database has it now. */
export async function bearer(t: TestContext, user: Pick<User, 'id'>): Promise<string> {
  const current = await new UsersService(t).find(user.id);
  if (!current) throw new Error(`no user ${user.id}`);
  return `Bearer ${new SessionService(t).issue(current, 'access')}`;
}

export function signIn(t: TestContext, email: string, password = PASSWORD) {
  return request(t.app).post('/api/auth/sign-in').send({ email, password });
}

/** The Set-Cookie header of the refresh cookie, attributes and all, or '' without one. */
export function refreshSetCookie(res: request.Response): string {
  return ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith(`${REFRESH_COOKIE}=`)) ?? '';
}

/** The refresh cookie as a browser sends it back (name=value only). */
export function refreshCookie(res: request.Response): string {
  const cookie = refreshSetCookie(res);
  if (!cookie) throw new Error('no refresh cookie in the answer');
  return cookie.split(';')[0];
}

/** Polls the admin outbox route until a mail to `to` beyond the first `skip` arrives. */
export async function waitForMail(t: TestContext, admin: User, to: string, skip = 0): Promise<OutboxEntry> {
  const deadline = Date.now() + 5000;
  while (Date.now() < deadline) {
    const res = await request(t.app).get('/api/dev/outbox').set('Authorization', await bearer(t, admin)).expect(200);
    const mails = (res.body.mails as OutboxEntry[]).filter((m) => m.to.includes(to)).reverse();
    if (mails.length > skip) return mails[skip];
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`no mail to ${to} arrived`);
}
