/**
 * Password reset over real SMTP into the local stand-in, read back through the admin's outbox
 * route. A reset token is one-time and expires after RESET_TOKEN_MINUTES (OWASP Forgot Password
 * Cheat Sheet: random, single use, expiring, stored hashed); the clock is moved, not waited on.
 */
import { createHash } from 'node:crypto';
import request from 'supertest';
import { PasswordReset } from '../../../server/entities/password-reset.entity';
import { User } from '../../../server/entities/user.entity';
import { RESET_TOKEN_MINUTES } from '../../../server/services/password-reset.service';
import { makeTestContext, TestContext } from '../test-context';
import { bearer, createAccount, PASSWORD, RAISED_LIMITS, signIn, waitForMail } from './helpers';

let t: TestContext;
let admin: User;
beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  admin = await createAccount(t, 'admin');
});
afterAll(() => t.dispose());

const NEW_PASSWORD = 'a brand new passphrase';

/** Asks for a reset the way the web app does, and returns the link from the mail that arrives. */
async function requestReset(user: User, skip = 0, typed = user.email): Promise<URL> {
  const res = await request(t.app).post('/api/auth/reset-request').set('Origin', 'http://localhost:8081').send({ email: typed }).expect(202);
  expect(res.body).toEqual({ message: expect.any(String) });
  const entry = await waitForMail(t, admin, user.email, skip);
  const mail = await request(t.app).get(`/api/dev/outbox/${entry.id}`).set('Authorization', await bearer(t, admin)).expect(200);
  const link = /https?:\/\/\S+\/reset\?token=\S+/.exec(mail.body.mail.text)?.[0];
  if (!link) throw new Error(`no reset link in ${mail.body.mail.text}`);
  expect(mail.body.mail.html).toContain(`href="${link}"`);
  return new URL(link);
}

const reset = (token: string, password = NEW_PASSWORD) => request(t.app).post('/api/auth/reset').send({ token, password });

test('the mailed link sets a new password once; the old password and old sessions stop working', async () => {
  const rider = await createAccount(t, 'rider');
  const session = await signIn(t, rider.email).expect(200);

  const link = await requestReset(rider, 0, rider.email.toUpperCase());
  // The public address (here where the server listens), not the Origin the request names.
  expect(link.origin + link.pathname).toBe(`http://localhost:${t.config.port}/reset`);
  expect((await waitForMail(t, admin, rider.email)).subject).toBe('Reset your Sagwright password');

  const token = link.searchParams.get('token')!;
  await reset(token).expect(204);
  await signIn(t, rider.email, PASSWORD).expect(401);
  await signIn(t, rider.email, NEW_PASSWORD).expect(200);
  await request(t.app).get('/api/me').set('Authorization', `Bearer ${session.body.token}`).expect(401);

  const again = await reset(token, 'yet another passphrase').expect(400);
  expect(again.body.error.fields).toEqual({ token: expect.stringMatching(/expired or was already used/) });
  await signIn(t, rider.email, NEW_PASSWORD).expect(200);
});

test('only the SHA-256 of the token is stored', async () => {
  const rider = await createAccount(t, 'rider');
  const token = (await requestReset(rider)).searchParams.get('token')!;
  const rows = await t.db.read.getRepository(PasswordReset).findBy({ userId: rider.id });
  expect(rows).toHaveLength(1);
  expect(rows[0].tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
  expect(JSON.stringify(rows)).not.toContain(token);
});

test('a token works until it is RESET_TOKEN_MINUTES old, and not after', async () => {
  const rider = await createAccount(t, 'rider');
  const first = (await requestReset(rider, 0)).searchParams.get('token')!;
  const second = (await requestReset(rider, 1)).searchParams.get('token')!;
  const lifetime = RESET_TOKEN_MINUTES * 60_000;
  try {
    t.advanceClock(lifetime + 1000);
    await reset(first).expect(400);
    t.advanceClock(-2000);
    await reset(second).expect(204);
  } finally {
    t.advanceClock(-(lifetime - 1000));
  }
});

test('an unknown e-mail gets the same answer and no mail', async () => {
  const rider = await createAccount(t, 'rider');
  const unknown = await request(t.app).post('/api/auth/reset-request').send({ email: 'nobody@example.test' }).expect(202);
  const known = await request(t.app).post('/api/auth/reset-request').send({ email: rider.email }).expect(202);
  expect(unknown.body).toEqual(known.body);
  // The unknown one was asked first, so had it sent anything it would be in by now.
  await waitForMail(t, admin, rider.email);
  expect(t.outbox!.list().filter((m) => m.to.includes('nobody@example.test'))).toEqual([]);
});

test('a made-up token and a short new password are refused with field errors', async () => {
  expect((await reset('made-up').expect(400)).body.error.fields).toEqual({ token: expect.any(String) });
  expect((await reset('made-up', 'short').expect(400)).body.error.fields).toEqual({ password: expect.any(String) });
});
