/**
 * What test/server/auth/tokens.test.ts leaves out: forged refresh cookies (alg none, another key,
 * another algorithm; RFC 8725 §2.1, §3.1), an access token signed with a fresh RSA key, tokens
 * signed with the real secret but without `exp` (RFC 7519 §4.1.4 makes it optional; required here,
 * since such a token would never expire: common practice, no source), and the
 * customer's quote link token. That token is 32 bytes from crypto.randomBytes, base64url without
 * padding (RFC 4648 §5): 43 characters carrying 256 bits, so guessing one of n live links takes
 * about 2^256 / n tries. It opens its one quote and nothing else: not as a bearer token, not as a
 * refresh cookie or reset token, and not another quote.
 */
import crypto, { generateKeyPairSync } from 'node:crypto';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { REFRESH_COOKIE } from '../../../server/routes/auth.router';
import { newQuoteToken } from '../../../server/services/quote-token';
import { SessionService } from '../../../server/services/session.service';
import { as } from '../rider/helpers';
import { openShop, routeKey, sendQuoteForToken, Shop } from './fuzz-fixtures';

let shop: Shop;

beforeAll(async () => {
  shop = await openShop();
}, 60_000);
afterAll(() => shop.close());

const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
const withoutExp = ({ exp: _exp, ...claims }: jwt.JwtPayload) => claims;

describe('forged session tokens', () => {
  let claims: jwt.JwtPayload;
  const { privateKey } = generateKeyPairSync('rsa', { modulusLength: 2048 });
  beforeAll(() => {
    claims = jwt.decode(new SessionService(shop.t).issue(shop.accounts.rider, 'refresh'), { json: true })!;
  });

  const refresh = (token: string) => request(shop.base).post('/api/auth/refresh').set('Cookie', `${REFRESH_COOKIE}=${token}`);

  test('a genuine refresh cookie works, so the refusals below are the forgery and nothing else', async () => {
    await refresh(new SessionService(shop.t).issue(shop.accounts.rider, 'refresh')).expect(200);
  });

  test.each([
    ['alg none', () => `${b64({ alg: 'none', typ: 'JWT' })}.${b64(claims)}.`],
    ['alg None with a signature', () => `${b64({ alg: 'None', typ: 'JWT' })}.${b64(claims)}.${'A'.repeat(43)}`],
    ['another secret', () => jwt.sign(claims, 'another secret that is long enough, truly')],
    ['HS512 with the right secret', () => jwt.sign(claims, shop.t.secrets.jwt, { algorithm: 'HS512' })],
    ['RS256 with a fresh key', () => jwt.sign(claims, privateKey, { algorithm: 'RS256' })],
    ['an access token', () => new SessionService(shop.t).issue(shop.accounts.rider, 'access')],
    ['the right secret and algorithm but no exp', () => jwt.sign(withoutExp(claims), shop.t.secrets.jwt, { algorithm: 'HS256' })],
  ])('a refresh cookie forged with %s is refused', async (_label, forge) => {
    const res = await refresh(forge()).expect(401);
    expect(res.body.error.code).toBe('session-expired');
  });

  test('an access token signed with a fresh RSA key, or for an account that does not exist, is refused', async () => {
    const access = jwt.decode(new SessionService(shop.t).issue(shop.accounts.admin, 'access'), { json: true })!;
    await request(shop.base).get('/api/me').set('Authorization', `Bearer ${jwt.sign(access, privateKey, { algorithm: 'RS256' })}`).expect(401);
    await request(shop.base).get('/api/me').set('Authorization', `Bearer ${jwt.sign({ ...access, sub: '999999' }, shop.t.secrets.jwt, { algorithm: 'HS256' })}`).expect(401);
  });

  test('an access token signed with the real secret but without exp is refused', async () => {
    const access = jwt.decode(new SessionService(shop.t).issue(shop.accounts.admin, 'access'), { json: true })!;
    await request(shop.base).get('/api/me').set('Authorization', `Bearer ${jwt.sign(access, shop.t.secrets.jwt, { algorithm: 'HS256' })}`).expect(200);
    await request(shop.base).get('/api/me').set('Authorization', `Bearer ${jwt.sign(withoutExp(access), shop.t.secrets.jwt, { algorithm: 'HS256' })}`).expect(401);
  });
});

describe('the quote link token', () => {
  test('as issued: 43 base64url characters that decode to exactly 32 bytes', () => {
    const token = shop.ids.quoteToken;
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const bytes = Buffer.from(token, 'base64url');
    expect(bytes).toHaveLength(32);
    expect(bytes.toString('base64url')).toBe(token);
  });

  test('comes from crypto.randomBytes(32): 2,000 of them are distinct and pass the NIST SP 800-22 frequency test', () => {
    const spy = jest.spyOn(crypto, 'randomBytes');
    const tokens = Array.from({ length: 2000 }, () => newQuoteToken().token);
    expect(spy).toHaveBeenCalledTimes(2000);
    expect(spy.mock.calls.every(([size]) => size === 32)).toBe(true);
    spy.mockRestore();
    expect(new Set(tokens).size).toBe(tokens.length);
    // NIST SP 800-22 rev. 1a §2.1: S = sum of ±1 over n bits, p = erfc(|S| / sqrt(2n)). A p-value
    // of 1e-6 is |S| / sqrt(n) = 4.89; random bytes fall below that all but once in a million runs.
    let sum = 0;
    let n = 0;
    for (const token of tokens) {
      for (const byte of Buffer.from(token, 'base64url')) {
        for (let bit = 0; bit < 8; bit++) sum += (byte >> bit) & 1 ? 1 : -1;
        n += 8;
      }
    }
    expect(n).toBe(2000 * 256);
    expect(Math.abs(sum) / Math.sqrt(n)).toBeLessThan(4.89);
  });

  test('as a bearer token, a refresh cookie or a reset token it opens nothing, on any route', async () => {
    const token = shop.ids.quoteToken;
    const wrong: string[] = [];
    for (const route of shop.routes.filter((r) => r.access.kind !== 'quote-token')) {
      const path = `/api${route.path.replace(/:(\w+)/g, '1')}`;
      const withToken = await request(shop.base)[route.method](path).set('Authorization', `Bearer ${token}`).set('Cookie', `${REFRESH_COOKIE}=${token}`).send({});
      const label = `${routeKey(route)}: ${withToken.status}`;
      if (route.access.kind === 'signed-in' && withToken.status !== 401) wrong.push(`${label}, expected 401`);
      if (route.access.kind === 'webhook' && withToken.status !== 400) wrong.push(`${label}, expected 400`);
      if (route.access.kind === 'public') {
        // The token adds nothing: a public route answers it as it answers a caller without one.
        const without = await request(shop.base)[route.method](path).send({});
        if (withToken.status !== without.status) wrong.push(`${label}, ${without.status} without the token`);
      }
    }
    expect(wrong).toEqual([]);
    const reset = await request(shop.base).post('/api/auth/reset').send({ token, password: 'a new password for nobody' });
    expect(reset.status).toBeGreaterThanOrEqual(400);
    expect(reset.status).toBeLessThan(500);
  }, 60_000);

  test("a token for quote A opens nothing of quote B, whatever the request names", async () => {
    const asDesk = await as(shop.t, shop.accounts.desk);
    const b = await asDesk.post('/quotes', { sizingRecordId: Number(shop.ids.recordId), lines: [{ kind: 'labour', operationCode: 'sag-setup' }] }).expect(201);
    const quoteB = b.body.quote.id as number;
    const { token: tokenB } = await sendQuoteForToken(shop.t, shop.accounts.desk, shop.accounts.admin, quoteB);
    const tokenA = shop.ids.quoteToken;
    const quoteA = Number(shop.ids.sentQuoteId);

    const view = await request(shop.base).get(`/api/customer-quotes/${tokenA}?id=${quoteB}&quoteId=${quoteB}`).expect(200);
    expect(view.body.quote.id).toBe(quoteA);
    expect(JSON.stringify(view.body)).not.toContain(tokenB);
    await request(shop.base).get(`/api/quotes/${quoteB}`).set('Authorization', `Bearer ${tokenA}`).expect(401);
    // A path that tries to climb from A's link to B's is no link at all.
    for (const climb of [`${tokenA}/..%2F${tokenB}`, `${tokenA}%2F..%2F${tokenB}`, `${tokenA}${tokenB}`]) {
      const res = await request(shop.base).get(`/api/customer-quotes/${climb}`);
      expect([climb, res.status]).toEqual([climb, 404]);
    }
    const declined = await request(shop.base).post(`/api/customer-quotes/${tokenA}/decline`).send({ quoteId: quoteB, id: quoteB, reason: 'not today' }).expect(200);
    expect(declined.body.quote).toMatchObject({ id: quoteA, status: 'declined' });
    const other = await request(shop.base).get(`/api/customer-quotes/${tokenB}`).expect(200);
    expect(other.body.quote).toMatchObject({ id: quoteB, status: 'sent' });
  });
});
