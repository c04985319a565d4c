/**
 * Session tokens. Refusals follow RFC 8725 (JWT Best Current Practices) §2.1 and §3.1: the
 * algorithm is pinned to HS256, so `alg: none` and any other algorithm fail, as do a bad signature
 * and an expired `exp` (RFC 7519 §4.1.4). Cookie attributes per RFC 6265 §4.1.2 and the SameSite draft.
 */
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { User } from '../../../server/entities/user.entity';
import { SessionService, TOKEN_SECONDS } from '../../../server/services/session.service';
import { makeTestContext, TestContext } from '../test-context';
import { bearer, createAccount, RAISED_LIMITS, refreshCookie, refreshSetCookie, signIn } from './helpers';

let t: TestContext;
let admin: User;

beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  admin = await createAccount(t, 'admin');
});
afterAll(() => t.dispose());

const me = (authorization: string) => request(t.app).get('/api/me').set('Authorization', authorization);
const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

describe('access tokens', () => {
  let rider: User;
  let token: string;
  beforeAll(async () => {
    rider = await createAccount(t, 'rider');
    token = new SessionService(t).issue(rider, 'access');
  });

  test('a valid one reaches /me, which answers the user without secrets', async () => {
    const res = await me(`Bearer ${token}`).expect(200);
    expect(res.body.user).toEqual(expect.objectContaining({ id: rider.id, email: rider.email, role: 'rider', active: true }));
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|tokenVersion|argon2/);
  });

  test('an expired one is refused, one just inside its lifetime is not', async () => {
    t.advanceClock(TOKEN_SECONDS.access * 1000 - 2000);
    await me(`Bearer ${token}`).expect(200);
    t.advanceClock(3000);
    await me(`Bearer ${token}`).expect(401);
    t.advanceClock(-(TOKEN_SECONDS.access * 1000 + 1000));
    await me(`Bearer ${token}`).expect(200);
  });

  test('a tampered payload is refused', async () => {
    const [header, , signature] = token.split('.');
    const forged = b64({ ...jwt.decode(token, { json: true }), sub: String(admin.id) });
    await me(`Bearer ${header}.${forged}.${signature}`).expect(401);
  });

  test('one signed with another secret is refused', async () => {
    const claims = jwt.decode(token, { json: true })!;
    await me(`Bearer ${jwt.sign(claims, 'another secret that is long enough, really')}`).expect(401);
  });

  test('alg none, and HS512 with the right secret, are refused', async () => {
    const claims = jwt.decode(token, { json: true })!;
    await me(`Bearer ${b64({ alg: 'none', typ: 'JWT' })}.${b64(claims)}.`).expect(401);
    await me(`Bearer ${jwt.sign(claims, t.secrets.jwt, { algorithm: 'HS512' })}`).expect(401);
  });

  test('a refresh token does not pass as an access token', async () => {
    await me(`Bearer ${new SessionService(t).issue(rider, 'refresh')}`).expect(401);
  });

  test('a missing or malformed header is refused with 401', async () => {
    await request(t.app).get('/api/me').expect(401);
    await me(token).expect(401);
    await me('Bearer ').expect(401);
  });
});

describe('deactivation', () => {
  test('stops the access and the refresh token at once', async () => {
    const rider = await createAccount(t, 'rider');
    const signedIn = await signIn(t, rider.email).expect(200);
    const cookie = refreshCookie(signedIn);
    await me(`Bearer ${signedIn.body.token}`).expect(200);

    await request(t.app)
      .patch(`/api/users/${rider.id}/active`)
      .set('Authorization', await bearer(t, admin))
      .send({ active: false })
      .expect(200);
    await me(`Bearer ${signedIn.body.token}`).expect(401);
    await request(t.app).post('/api/auth/refresh').set('Cookie', cookie).expect(401);
  });
});

describe('the refresh cookie', () => {
  test('is httpOnly, SameSite=Strict, scoped to /api/auth, and not Secure on plain HTTP', async () => {
    const rider = await createAccount(t, 'rider');
    const res = await signIn(t, rider.email).expect(200);
    const cookie = refreshSetCookie(res);
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Strict/i);
    expect(cookie).toMatch(/; Path=\/api\/auth(;|$)/);
    expect(cookie).not.toMatch(/; Secure/i);
    expect(res.body).toEqual({ token: expect.any(String), expiresIn: TOKEN_SECONDS.access, user: expect.objectContaining({ id: rider.id }) });
  });

  test('is Secure when the shop is reached over https', async () => {
    const prod = await makeTestContext({ production: true, secureCookies: true });
    try {
      const rider = await createAccount(prod, 'rider');
      const res = await signIn(prod, rider.email).expect(200);
      expect(refreshSetCookie(res)).toMatch(/; Secure/i);
    } finally {
      await prod.dispose();
    }
  });

  test('buys a new access token, and stops working after sign-out', async () => {
    const rider = await createAccount(t, 'rider');
    const cookie = refreshCookie(await signIn(t, rider.email).expect(200));

    const refreshed = await request(t.app).post('/api/auth/refresh').set('Cookie', cookie).expect(200);
    expect(refreshed.body.user.id).toBe(rider.id);
    await me(`Bearer ${refreshed.body.token}`).expect(200);

    const out = await request(t.app).post('/api/auth/sign-out').set('Authorization', `Bearer ${refreshed.body.token}`).expect(204);
    expect(refreshSetCookie(out)).toMatch(/Expires=Thu, 01 Jan 1970/);
    await request(t.app).post('/api/auth/refresh').set('Cookie', cookie).expect(401);
    await request(t.app).post('/api/auth/refresh').set('Cookie', refreshCookie(refreshed)).expect(401);
    await me(`Bearer ${refreshed.body.token}`).expect(401);
  });

  test('expires after its lifetime', async () => {
    const rider = await createAccount(t, 'rider');
    const cookie = refreshCookie(await signIn(t, rider.email).expect(200));
    t.advanceClock(TOKEN_SECONDS.refresh * 1000 + 1000);
    try {
      const res = await request(t.app).post('/api/auth/refresh').set('Cookie', cookie).expect(401);
      expect(res.body.error.code).toBe('session-expired');
    } finally {
      t.advanceClock(-(TOKEN_SECONDS.refresh * 1000 + 1000));
    }
  });

  test('is required: without one, refresh answers 401', async () => {
    const res = await request(t.app).post('/api/auth/refresh').expect(401);
    expect(res.body.error.code).toBe('session-expired');
  });
});
