/**
 * Bodies and paths a client should never send, over a real loopback socket: an oversized body is a
 * 413 that says so; a body in another content type is a 400 or 415, never a 500; bytes that are not
 * JSON, or JSON nested past the parser's stack, are a 400; a path that climbs out of its folder
 * (in an API parameter or a web file) reaches nothing outside `dist/`; and SQL-looking text in
 * every text field is stored and answered back exactly as text. Samples: OWASP WSTG v4.2
 * (INPV-05 SQL injection, ATHZ-01 directory traversal); HTTP status codes: RFC 9110 §15.5.
 */
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import request from 'supertest';
import { JSON_BODY_LIMIT } from '../../../server/app';
import { bearer } from '../auth/helpers';
import { as, handBike } from '../rider/helpers';
import { createQuote, DeskShop, listen, setUpDeskShop } from '../desk/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { tableNames } from './db-checksum';
import { SQL_LOOKING } from './hostile-values';

let t: TestContext;
let shop: DeskShop;
let base: string;
let stopListening: () => Promise<void>;
const SECRET = 'secret-outside-the-web-folder-4f1c';

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t);
  fs.mkdirSync(path.join(t.config.webDir, 'assets'), { recursive: true });
  fs.writeFileSync(path.join(t.config.webDir, 'index.html'), '<!doctype html><title>Sagwright</title>');
  fs.writeFileSync(path.join(t.config.webDir, 'assets', 'app.js'), 'console.log("app")');
  // Beside the web folder, as the database and the signing secret are.
  fs.writeFileSync(path.join(t.config.dataDir, 'secret.txt'), SECRET);
  ({ base, close: stopListening } = await listen(t));
}, 60_000);
afterAll(async () => {
  await stopListening();
  await t.dispose();
});

/** A request whose path is sent byte for byte: URL parsers would resolve the `..` before it left. */
function rawGet(rawPath: string, headers: Record<string, string> = {}): Promise<{ status: number; body: string }> {
  const { hostname, port } = new URL(base);
  return new Promise((resolve, reject) => {
    const req = http.request({ hostname, port, path: rawPath, method: 'GET', headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString('latin1') }));
    });
    req.on('error', reject);
    req.end();
  });
}

const limitBytes = Number.parseInt(JSON_BODY_LIMIT, 10) * 1024;

describe('body size, type and syntax', () => {
  test('a JSON body over the limit is a 413 with a clear message, on a public and a signed-in route', async () => {
    const big = JSON.stringify({ email: 'a@example.test', password: 'x'.repeat(limitBytes) });
    const publicRoute = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(big).expect(413);
    expect(publicRoute.body.error).toEqual({ code: 'too-large', message: 'The request body is too large.' });
    const signedIn = await shop.asRider.post('/bikes', { nickname: 'x'.repeat(limitBytes) }).expect(413);
    expect(signedIn.body.error.code).toBe('too-large');
    const webhook = await request(base).post('/api/payments/webhook').set('stripe-signature', 't=1,v1=00').set('Content-Type', 'application/json').send(big).expect(413);
    expect(webhook.body.error.code).toBe('too-large');
  });

  test('a body just under the limit is read (and refused for its content, not its size)', async () => {
    const res = await request(base)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@example.test', password: 'x'.repeat(limitBytes - 100) }))
      .expect(400);
    expect(res.body.error.fields.password).toMatch(/at most/);
  });

  test.each([
    ['text/plain', '{"email":"a@example.test","password":"long enough password"}'],
    ['application/xml', '<signIn><email>a@example.test</email></signIn>'],
    ['application/x-www-form-urlencoded', 'email=a%40example.test&password=long+enough+password'],
    ['multipart/form-data; boundary=x', '--x\r\nContent-Disposition: form-data; name="email"\r\n\r\na@example.test\r\n--x--\r\n'],
    ['image/png', '\u0089PNG\r\n'],
  ])('a %s body to a JSON route is a 400 with field errors, not a 500', async (type, body) => {
    const res = await request(base).post('/api/auth/sign-in').set('Content-Type', type).send(body).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['email', 'password']));
  });

  test('a JSON body in a charset or encoding the server does not read is a 415', async () => {
    const latin1 = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json; charset=iso-8859-1').send(Buffer.from('{}', 'latin1')).expect(415);
    expect(latin1.body.error.code).toBe('unsupported-encoding');
    const encoded = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').set('Content-Encoding', 'compress').send('{}').expect(415);
    expect(encoded.body.error.code).toBe('unsupported-encoding');
  });

  test.each(['{', '{"email": }', "{'email': 'a'}", '{"a":1,}', 'nul', '"just a string"', '42'])('the body %j is a 400 malformed-json', async (raw) => {
    const res = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(raw).expect(400);
    expect(res.body.error).toEqual({ code: 'malformed-json', message: 'The request body is not valid JSON.' });
  });

  test('JSON nested 45,000 deep, within the size limit, is refused with a 4xx and the server keeps answering', async () => {
    const depth = 45_000;
    const res = await request(base).post('/api/bikes').set('Authorization', await bearer(t, shop.rider)).set('Content-Type', 'application/json').send(`${'['.repeat(depth)}${']'.repeat(depth)}`);
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(JSON.stringify(res.body).length).toBeLessThan(2000);
    await request(base).get('/api/health').expect(200);
  });

  test('prototype keys, spelt out or as \\u escapes and at any depth, are dropped like any unknown key', async () => {
    const escaped = '{"__proto\\u005f_":{"a":1},"constructor":{"name":"x"},"email":"nobody@example.test","password":"not the password"}';
    const signIn = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(escaped);
    expect([signIn.status, signIn.body.error?.code]).toEqual([401, expect.any(String)]);
    const depth = 6_000;
    const deep = `${'{"prototype":'.repeat(depth)}1${'}'.repeat(depth)}`;
    const res = await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(deep);
    expect(res.status).toBe(400);
    const wide = `{"email":"a@example.test","password":"long enough password","x":[${Array.from({ length: 5_000 }, () => '{"constructor":1}').join(',')}]}`;
    expect((await request(base).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(wide)).status).toBe(401);
  });

  test('a wrongly typed body is named in a short message that does not echo it back', async () => {
    const wrong = await shop.asRider.post('/bikes', ['a'.repeat(5000)]).expect(400);
    expect(wrong.body.error.fields).toEqual({ '': expect.any(String) });
    expect(JSON.stringify(wrong.body)).not.toContain('aaaa');
    const nested = await shop.asDesk.put(`/quotes/${(await createQuote(shop)).id}/lines`, { lines: { a: 'b'.repeat(5000) } }).expect(400);
    expect(nested.body.error.fields.lines).toBeDefined();
    expect(JSON.stringify(nested.body)).not.toContain('bbbb');
  });
});

describe('paths that climb out of their folder', () => {
  const TRAVERSALS = [
    '/../secret.txt',
    '/..%2fsecret.txt',
    '/..%2Fsecret.txt',
    '/%2e%2e/secret.txt',
    '/%2e%2e%2fsecret.txt',
    '/assets/../../secret.txt',
    '/assets/..%2f..%2fsecret.txt',
    '/assets/%2e%2e/%2e%2e/secret.txt',
    '/..%5csecret.txt',
    '/assets/..%5c..%5csecret.txt',
    '/%252e%252e/secret.txt',
    '/..%00/secret.txt',
    '/....//secret.txt',
    '//secret.txt',
    '/%2e%2e/sagwright.sqlite',
    '/../sagwright.sqlite',
    '/../jwt-secret',
    '/../../../../../../etc/passwd',
    '/%2e%2e/%2e%2e/%2e%2e/%2e%2e/etc/passwd',
    '/assets/%c0%ae%c0%ae/secret.txt',
  ];

  test('the web build serves its own files', async () => {
    const asset = await rawGet('/assets/app.js');
    expect(asset).toEqual({ status: 200, body: 'console.log("app")' });
  });

  test.each(TRAVERSALS)('GET %s serves nothing from outside the web folder', async (rawPath) => {
    const res = await rawGet(rawPath);
    expect(res.status).toBeLessThan(500);
    expect(res.body).not.toContain(SECRET);
    expect(res.body).not.toContain('SQLite format 3');
    expect(res.body).not.toMatch(/root:.*:0:0:/);
    expect(res.body).not.toContain(fs.readFileSync(path.join(t.config.dataDir, 'jwt-secret'), 'utf8'));
  });

  test('API path parameters that climb are a 404, as an unknown id is', async () => {
    const admin = await bearer(t, shop.admin);
    const rider = await bearer(t, shop.rider);
    const cases: [string, string | undefined, number, string?][] = [
      ['/api/bikes/..%2F..%2Fetc%2Fpasswd', rider, 404],
      ['/api/bikes/1%2F..%2F2', rider, 404],
      ['/api/dev/outbox/..%2F..%2Fetc%2Fpasswd', admin, 404],
      ['/api/dev/outbox/..%2Findex', admin, 404],
      ['/api/dev/outbox/%2e%2e%2f%2e%2e%2fjwt-secret', admin, 404],
      ['/api/customer-quotes/..%2F..%2Fetc%2Fpasswd', undefined, 404, 'quote-link'],
      ['/api/imports/..%2F1', admin, 404],
      ['/api/sizing-records/1;DROP%20TABLE%20quote', rider, 404],
    ];
    for (const [rawPath, auth, status, code] of cases) {
      const res = await rawGet(rawPath, auth ? { Authorization: auth } : {});
      expect([rawPath, res.status]).toEqual([rawPath, status]);
      const body = JSON.parse(res.body);
      if (code) expect(body.error.code).toBe(code);
      expect(res.body).not.toMatch(/root:.*:0:0:/);
    }
    const profile = await rawGet('/api/target-profiles/..%2F..%2Fetc', { Authorization: admin });
    expect(profile.status).toBeGreaterThanOrEqual(400);
    expect(profile.status).toBeLessThan(500);
  });
});

describe('addresses with a broken percent-escape (RFC 3986 §2.1, RFC 3629 §3)', () => {
  const STACK_OR_PATH = /\bat \w|node_modules|\/work\/|[A-Z]:\\|URIError|<pre>/;

  test.each(['/q/%E0%A4%A', '/desk/quotes/%ff', '/assets/%ff.js', '/%C0%AF'])('the page %s is a short plain 400 with no stack and no path', async (rawPath) => {
    const res = await rawGet(rawPath);
    expect(res.status).toBe(400);
    expect(res.body).toBe('The address has a broken percent-escape (%).');
    expect(res.body).not.toMatch(STACK_OR_PATH);
    expect(res.body).not.toContain(path.resolve(__dirname, '../../..'));
  });

  test('an API address is a JSON 400 that says so', async () => {
    const res = await rawGet('/api/bikes/%E0%A4%A', { Authorization: await bearer(t, shop.rider) });
    expect(res.status).toBe(400);
    expect(JSON.parse(res.body).error.code).toBe('malformed-url');
    expect(res.body).not.toMatch(STACK_OR_PATH);
  });
});

/** True when `text` is one of the string values anywhere in `value`. */
function holdsText(value: unknown, text: string): boolean {
  if (typeof value === 'string') return value === text;
  if (Array.isArray(value)) return value.some((v) => holdsText(v, text));
  if (value && typeof value === 'object') return Object.values(value).some((v) => holdsText(v, text));
  return false;
}

describe('SQL-looking text', () => {
  test('is stored and answered back verbatim in every text field, and every table is still there', async () => {
    const tablesBefore = await tableNames(t);
    const [a, b, c, d, e, f] = SQL_LOOKING;
    const checks: { field: string; text: string; answer: () => Promise<unknown> }[] = [];
    const expectText = (field: string, text: string, answer: () => Promise<unknown>) => checks.push({ field, text, answer });

    const spec = handBike();
    spec.front!.adjuster.zeroReference = b;
    const bike = await shop.asRider.post('/bikes', { nickname: a, ...spec }).expect(201);
    const bikeAnswer = async () => (await shop.asRider.get(`/bikes/${bike.body.bike.id}`).expect(200)).body;
    expectText('bike nickname', a, bikeAnswer);
    expectText('adjuster zero reference', b, bikeAnswer);

    const model = await shop.asAdmin.post('/bike-models', { name: c, description: d, ...handBike() }).expect(201);
    const modelAnswer = async () => (await shop.asAdmin.get(`/bike-models/${model.body.model.id}`).expect(200)).body;
    expectText('bike model name', c, modelAnswer);
    expectText('bike model description', d, modelAnswer);

    const asCounter = await as(t, shop.counter);
    const spring = await asCounter
      .post('/catalogue/springs', { sku: e, kind: 'fork', family: f, rateNmm: 9, freeLengthMm: 320, maxDeflectionMm: 150, supplier: a, supplierCode: b, bin: "' OR '1'='1" })
      .expect(201);
    const springAnswer = async () => (await asCounter.get(`/catalogue/springs/${spring.body.spring.id}`).expect(200)).body;
    for (const [field, text] of [['sku', e], ['family', f], ['supplier', a], ['supplier code', b], ['bin', "' OR '1'='1"]]) expectText(`spring ${field}`, text, springAnswer);

    await asCounter.post(`/stock/${spring.body.spring.id}/receive`, { quantity: 2, reason: c }).expect(201);
    expectText('stock movement reason', c, async () => (await asCounter.get(`/stock/movements?springId=${spring.body.spring.id}`).expect(200)).body);

    await shop.asDesk.post('/customers', { name: d, email: 'sql.customer@example.test' }).expect(201);
    expectText('customer name', d, async () => (await shop.asDesk.get('/customers?q=sql.customer').expect(200)).body);

    const signUp = await request(base).post('/api/auth/sign-up').send({ name: e, email: 'sql.rider@example.test', password: 'a long enough password' });
    expect(signUp.status).toBeLessThan(300);
    expectText('account name', e, async () => (await request(base).get('/api/me').set('Authorization', `Bearer ${signUp.body.token}`).expect(200)).body);

    const quote = await createQuote(shop);
    await shop.asDesk.post(`/quotes/${quote.id}/cancel`, { reason: f }).expect(200);
    expectText('quote cancel reason', f, async () => (await shop.asDesk.get(`/quotes/${quote.id}`).expect(200)).body);

    await shop.asRider.post(`/bikes/${shop.bikeId}/setup-log`, { front: { preloadPosition: 7 }, note: a }).expect(201);
    expectText('setup log note', a, async () => (await shop.asRider.get(`/bikes/${shop.bikeId}/setup-log`).expect(200)).body);

    const settings = (await shop.asAdmin.get('/shop-settings').expect(200)).body.settings;
    const operations = [...settings.operations, { code: 'sql-check', label: b, minutes: 10 }];
    await shop.asAdmin.put('/shop-settings', { ...settings, operations, cautions: c }).expect(200);
    const settingsAnswer = async () => (await shop.asAdmin.get('/shop-settings').expect(200)).body;
    expectText('operation label', b, settingsAnswer);
    expectText('quote cautions', c, settingsAnswer);

    const road = (await shop.asAdmin.get('/target-profiles').expect(200)).body.profiles.find((p: { discipline: string }) => p.discipline === 'road');
    const { discipline: _discipline, ...profile } = road;
    await shop.asAdmin.put('/target-profiles/road', { ...profile, label: "x' OR 1=1", note: d }).expect(200);
    const profileAnswer = async () => (await shop.asAdmin.get('/target-profiles').expect(200)).body;
    expectText('target profile label', "x' OR 1=1", profileAnswer);
    expectText('target profile note', d, profileAnswer);

    const missing: string[] = [];
    for (const check of checks) if (!holdsText(await check.answer(), check.text)) missing.push(`${check.field}: ${check.text}`);
    expect(missing).toEqual([]);
    expect(checks.length).toBeGreaterThanOrEqual(18);
    expect(await tableNames(t)).toEqual(tablesBefore);
    const [{ bikes }] = await t.db.read.query('SELECT COUNT(*) AS bikes FROM bike');
    expect(bikes).toBeGreaterThanOrEqual(2);
  }, 60_000);
});
