/**
 * Password storage and sign-in answers. Parameters: OWASP Password Storage Cheat Sheet (argon2id,
 * m=19456 KiB, t=2, p=1); hash layout: the PHC string format (P-H-C/phc-string-format),
 * `$argon2id$v=19$m=..,t=..,p=..$salt$hash`, version 19 being 0x13 of RFC 9106.
 */
import request from 'supertest';
import { User } from '../../../server/entities/user.entity';
import { BAD_CREDENTIALS } from '../../../server/services/users.service';
import { makeTestContext, TestContext } from '../test-context';
import { createAccount, PASSWORD, RAISED_LIMITS, signIn } from './helpers';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
});
afterAll(() => t.dispose());

async function storedHash(email: string): Promise<string> {
  const user = await t.db.read.getRepository(User).findOneByOrFail({ email });
  return user.passwordHash;
}

test('the stored hash is argon2id with m=19456, t=2, p=1, and is never the password', async () => {
  const res = await request(t.app).post('/api/auth/sign-up').send({ name: 'Sam Ridge', email: 'sam@example.test', password: PASSWORD }).expect(201);
  const hash = await storedHash('sam@example.test');
  const [, algorithm, version, params, salt, digest] = hash.split('$');
  expect(algorithm).toBe('argon2id');
  expect(version).toBe('v=19');
  expect(Object.fromEntries(params.split(',').map((p) => p.split('=')))).toEqual({ m: '19456', t: '2', p: '1' });
  expect(Buffer.from(salt, 'base64').length).toBeGreaterThanOrEqual(16);
  expect(Buffer.from(digest, 'base64').length).toBeGreaterThanOrEqual(32);
  expect(hash).not.toContain(PASSWORD);
  expect(JSON.stringify(res.body)).not.toMatch(/argon2|passwordHash/);
});

test('a wrong password and an unknown e-mail get the same status and body', async () => {
  const rider = await createAccount(t, 'rider');
  const wrong = await signIn(t, rider.email, 'not the password at all');
  const unknown = await signIn(t, 'nobody@example.test', 'not the password at all');
  expect(wrong.status).toBe(401);
  expect(unknown.status).toBe(401);
  expect(wrong.body).toEqual(unknown.body);
  expect(wrong.body).toEqual({ error: { code: 'bad-credentials', message: BAD_CREDENTIALS } });
  expect(wrong.headers['set-cookie']).toBeUndefined();
});

test('the e-mail is case-insensitive: stored lower-case, unique whatever the case', async () => {
  await request(t.app).post('/api/auth/sign-up').send({ name: 'Kit Vale', email: ' Kit.Vale@Example.TEST ', password: PASSWORD }).expect(201);
  expect(await storedHash('kit.vale@example.test')).toMatch(/^\$argon2id\$/);
  const again = await request(t.app).post('/api/auth/sign-up').send({ name: 'Kit', email: 'kit.vale@example.test', password: PASSWORD }).expect(409);
  expect(again.body.error.fields).toEqual({ email: expect.any(String) });
  await signIn(t, 'KIT.VALE@example.test').expect(200);
});

test('the database itself refuses an upper-case or duplicate e-mail', async () => {
  const row = (email: string) =>
    t.db.write((m) =>
      m.query(`INSERT INTO "user" ("email", "name", "role", "passwordHash", "createdAt") VALUES (?, 'X', 'rider', 'x', datetime('now'))`, [email]),
    );
  await row('dup@example.test');
  await expect(row('dup@example.test')).rejects.toThrow(/UNIQUE/);
  await expect(row('Upper@example.test')).rejects.toThrow(/CHECK/);
});

test('sign-up asks for 10 to 200 characters, makes a rider, and signs in', async () => {
  const short = await request(t.app).post('/api/auth/sign-up').send({ name: 'Lee', email: 'lee@example.test', password: 'short' }).expect(400);
  expect(short.body.error.fields).toEqual({ password: expect.stringMatching(/at least 10 characters/) });
  const long = await request(t.app).post('/api/auth/sign-up').send({ name: 'Lee', email: 'lee@example.test', password: 'x'.repeat(201) }).expect(400);
  expect(long.body.error.fields.password).toMatch(/at most 200/);
  const res = await request(t.app).post('/api/auth/sign-up').send({ name: 'Lee', email: 'lee@example.test', password: 'x'.repeat(10), role: 'admin' }).expect(201);
  expect(res.body.user.role).toBe('rider');
  await request(t.app).get('/api/me').set('Authorization', `Bearer ${res.body.token}`).expect(200);
});

test('a switched-off account with the right password is told so; with a wrong one it is not', async () => {
  const rider = await createAccount(t, 'rider');
  await t.db.write((m) => m.update(User, rider.id, { active: false }));
  expect((await signIn(t, rider.email).expect(403)).body.error.code).toBe('account-inactive');
  expect((await signIn(t, rider.email, 'not the password at all').expect(401)).body.error.code).toBe('bad-credentials');
});

test('sign-in records when it happened', async () => {
  const rider = await createAccount(t, 'rider');
  expect(rider.lastSignInAt).toBeNull();
  const res = await signIn(t, rider.email).expect(200);
  expect(Date.parse(res.body.user.lastSignInAt)).toBeGreaterThan(Date.now() - 60_000);
});
