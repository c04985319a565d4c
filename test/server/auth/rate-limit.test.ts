/**
 * Abuse limits: the attempt after the configured number inside the window is refused with 429
 * (RFC 6585 §4), and the limit comes from ServerConfig.rateLimits, not from this file.
 */
import request from 'supertest';
import { DEFAULT_RATE_LIMITS } from '../../../server/env';
import { makeTestContext, TestContext } from '../test-context';
import { signIn } from './helpers';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
});
afterAll(() => t.dispose());

test('the test runs with the default limits', () => {
  expect(t.config.rateLimits).toEqual(DEFAULT_RATE_LIMITS);
});

test('sign-in: N attempts for one e-mail are answered, the next is 429; another e-mail still gets through', async () => {
  const n = t.config.rateLimits.signIn.limit;
  for (let i = 0; i < n; i += 1) await signIn(t, 'target@example.test', 'guess number ' + i).expect(401);
  const refused = await signIn(t, 'target@example.test', 'one more guess').expect(429);
  expect(refused.body.error.code).toBe('rate-limited');
  expect(refused.headers['retry-after']).toMatch(/^\d+$/);
  await signIn(t, 'TARGET@example.test', 'case does not dodge it').expect(429);
  await signIn(t, 'other@example.test', 'a first guess').expect(401);
});

test('sign-up: the attempt after N from one address is 429', async () => {
  const n = t.config.rateLimits.signUp.limit;
  const attempt = () => request(t.app).post('/api/auth/sign-up').send({});
  for (let i = 0; i < n; i += 1) await attempt().expect(400);
  await attempt().expect(429);
});

test('reset request and reset share one count per address', async () => {
  const n = t.config.rateLimits.reset.limit;
  for (let i = 0; i < n; i += 1) {
    await request(t.app).post(i % 2 ? '/api/auth/reset' : '/api/auth/reset-request').send({}).expect(400);
  }
  await request(t.app).post('/api/auth/reset-request').send({ email: 'a@example.test' }).expect(429);
  await request(t.app).post('/api/auth/reset').send({}).expect(429);
});

test('from one address sign-in, sign-up and reset share one cap whatever the e-mail; another address still gets through', async () => {
  // A cap per address beside the one per address and e-mail: common practice, no source.
  const perAddress = { limit: 20, windowMs: 15 * 60_000 };
  const capped = await makeTestContext({ rateLimits: { ...DEFAULT_RATE_LIMITS, perAddress } });
  try {
    // As in the probe: parallel workers, each with a new e-mail, so the per-e-mail count never trips.
    const answers = await Promise.all(Array.from({ length: 40 }, (_, i) => signIn(capped, `worker-${i}@example.test`, 'a guess')));
    const statuses = answers.map((res) => res.status).sort();
    expect(statuses).toEqual([...Array(perAddress.limit).fill(401), ...Array(40 - perAddress.limit).fill(429)]);
    expect(answers.find((res) => res.status === 429)!.body.error.code).toBe('rate-limited');

    await request(capped.app).post('/api/auth/sign-up').send({}).expect(429);
    await request(capped.app).post('/api/auth/reset-request').send({ email: 'a@example.test' }).expect(429);
    await request(capped.app).post('/api/auth/reset').send({}).expect(429);
    // Behind the loopback proxy the client's own address counts (server/app.ts trusts loopback).
    await signIn(capped, 'worker-0@example.test', 'a guess').set('X-Forwarded-For', '203.0.113.7').expect(401);
  } finally {
    await capped.dispose();
  }
});
