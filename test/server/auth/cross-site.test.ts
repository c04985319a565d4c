/**
 * The routes that read or set the refresh cookie (sign-up, sign-in, refresh, sign-out) refuse what
 * another site makes a browser send: `Sec-Fetch-Site: cross-site` (W3C Fetch Metadata Request
 * Headers, "Sec-Fetch-Site") and an `Origin` (RFC 6454 §7) that is not the shop's own address, the
 * address the request was sent to, or a configured dev origin (OWASP Cross-Site Request Forgery
 * Prevention Cheat Sheet: "Fetch Metadata headers", "Verifying Origin With Standard Headers"). A request with neither
 * header is not a browser's cross-site request and goes through. A refresh without a cookie leaves
 * the browser's cookies alone (RFC 6265 §5.3: a Set-Cookie with a past expiry deletes the cookie).
 */
import request from 'supertest';
import { seed } from '../../../server/seed';
import { TEST_SETTINGS } from '../desk/helpers';
import { as } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { createAccount, PASSWORD, RAISED_LIMITS, refreshCookie, refreshSetCookie, signIn } from './helpers';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  await seed(t.db, { demo: false });
});
afterAll(() => t.dispose());

const OTHER_SITE = 'https://other-site.example';

test('a refresh without a cookie is a 401 that sets no cookie', async () => {
  const res = await request(t.app).post('/api/auth/refresh').expect(401);
  expect(res.body.error.code).toBe('session-expired');
  expect(res.headers['set-cookie']).toBeUndefined();
});

describe.each([
  ['Sec-Fetch-Site: cross-site', { 'Sec-Fetch-Site': 'cross-site' }],
  ['Sec-Fetch-Site: cross-site from a listed origin', { 'Sec-Fetch-Site': 'cross-site', Origin: 'http://localhost:8081' }],
  ['an Origin of another site', { Origin: OTHER_SITE }],
  ['an Origin of another site, claiming same-origin', { Origin: OTHER_SITE, 'Sec-Fetch-Site': 'same-origin' }],
  ['the opaque Origin null', { Origin: 'null' }],
])('with %s', (_label, headers) => {
  test('refresh and sign-out are refused with 403 and change nothing; the session still works after', async () => {
    const rider = await createAccount(t, 'rider');
    const session = await signIn(t, rider.email).expect(200);
    const cookie = refreshCookie(session);

    const refresh = await request(t.app).post('/api/auth/refresh').set(headers).set('Cookie', cookie).expect(403);
    expect(refresh.body.error.code).toBe('cross-site');
    expect(refreshSetCookie(refresh)).toBe('');
    const out = await request(t.app).post('/api/auth/sign-out').set(headers).set('Authorization', `Bearer ${session.body.token}`).set('Cookie', cookie).expect(403);
    expect(refreshSetCookie(out)).toBe('');

    await request(t.app).get('/api/me').set('Authorization', `Bearer ${session.body.token}`).expect(200);
    await request(t.app).post('/api/auth/refresh').set('Cookie', cookie).expect(200);
  });

  test('sign-in and sign-up set no cookie', async () => {
    const rider = await createAccount(t, 'rider');
    const signInRes = await request(t.app).post('/api/auth/sign-in').set(headers).send({ email: rider.email, password: PASSWORD }).expect(403);
    expect(signInRes.body.error.code).toBe('cross-site');
    expect(refreshSetCookie(signInRes)).toBe('');
    const email = `cross-site-${Math.random().toString(36).slice(2)}@example.test`;
    const signUp = await request(t.app).post('/api/auth/sign-up').set(headers).send({ name: 'Someone', email, password: PASSWORD }).expect(403);
    expect(refreshSetCookie(signUp)).toBe('');
    await signIn(t, email).expect(401);
  });
});

test("the shop's own pages, its configured address and the dev origin are let through; another site is not", async () => {
  const rider = await createAccount(t, 'rider');
  const cookie = refreshCookie(await signIn(t, rider.email).expect(200));
  const refresh = (headers: Record<string, string>) => request(t.app).post('/api/auth/refresh').set(headers).set('Cookie', cookie);

  await refresh({}).expect(200);
  await refresh({ 'Sec-Fetch-Site': 'same-origin' }).expect(200);
  await refresh({ 'Sec-Fetch-Site': 'same-site', Origin: 'http://localhost:8081' }).expect(200);
  await refresh({ Origin: `http://localhost:${t.config.port}` }).expect(200);
  await refresh({ Host: 'shop.local:8080', Origin: 'http://shop.local:8080', 'Sec-Fetch-Site': 'same-origin' }).expect(200);
  await refresh({ Origin: 'https://shop.example' }).expect(403);

  const admin = await createAccount(t, 'admin');
  await (await as(t, admin)).put('/shop-settings', { ...TEST_SETTINGS, publicUrl: 'https://shop.example' }).expect(200);
  await refresh({ Origin: 'https://shop.example', 'Sec-Fetch-Site': 'same-origin' }).expect(200);
  await refresh({ Origin: 'https://shop.example.other-site.example' }).expect(403);
});
