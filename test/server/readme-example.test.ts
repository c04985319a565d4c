/**
 * The README's sizing example, run against the server with the demo catalogue: the body it sends is
 * the fixture its curl command posts, and every field of the answer it shows is the server's, to
 * the decimals it shows. The answer must also agree with itself: a keep offers no spring, a change
 * fits one that keeps both sags in their windows.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { seed } from '../../server/seed';
import body from './fixtures/readme-example.json';
import { bearer, createAccount } from './auth/helpers';
import { makeTestContext, TestContext } from './test-context';

let t: TestContext;
let auth: string;
beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  auth = await bearer(t, await createAccount(t, 'rider'));
});
afterAll(() => t.dispose());

const readme = fs.readFileSync(path.join(__dirname, '..', '..', 'README.md'), 'utf8');

/** The JSON blocks under the README's "Sizing over the API". */
function jsonBlocks(): unknown[] {
  const section = readme.slice(readme.indexOf('## Sizing over the API'), readme.indexOf('## Safety'));
  return [...section.matchAll(/```json\n([\s\S]*?)```/g)].map((m) => JSON.parse(m[1]));
}

/** Every field the README shows, compared at the decimals it is written with. */
function expectShown(shown: unknown, actual: unknown, at: string): void {
  if (typeof shown === 'number') {
    const decimals = (String(shown).split('.')[1] ?? '').length;
    expect([at, Number((actual as number).toFixed(decimals))]).toEqual([at, shown]);
  } else if (Array.isArray(shown)) {
    expect([at, Array.isArray(actual) && actual.length]).toEqual([at, shown.length]);
    shown.forEach((item, i) => expectShown(item, (actual as unknown[])[i], `${at}[${i}]`));
  } else if (shown !== null && typeof shown === 'object') {
    for (const [key, value] of Object.entries(shown)) expectShown(value, (actual as Record<string, unknown>)[key], `${at}.${key}`);
  } else {
    expect([at, actual]).toEqual([at, shown]);
  }
}

test('the README posts the fixture its curl command names', () => {
  const [shownBody] = jsonBlocks();
  expect(shownBody).toEqual(body);
  expect(readme).toContain('-d @test/server/fixtures/readme-example.json');
});

test('the answer the README shows is the server\'s', async () => {
  const [, shownAnswer] = jsonBlocks();
  const res = await request(t.app).post('/api/sizing').set('Authorization', auth).send(body).expect(200);
  expectShown(shownAnswer, res.body, 'answer');
});

test('the answer agrees with itself', async () => {
  const { front, rear } = (await request(t.app).post('/api/sizing').set('Authorization', auth).send(body).expect(200)).body;
  // The fork keeps its spring: nothing else is offered, no damping hint, and the advised setting is inside both windows.
  expect(front.decision.kind).toBe('keep');
  expect(front.decision.pick).toBeNull();
  expect(front.decision.dampingHint).toBeNull();
  expect(front.preload.riderSagAfterMm).toBeGreaterThanOrEqual(front.target.riderSagMm.min);
  expect(front.preload.riderSagAfterMm).toBeLessThanOrEqual(front.target.riderSagMm.max);
  // The shock changes its spring: the pick is a fit at its setting, the fitted spring's preload is only interim.
  expect(rear.decision.kind).toBe('change');
  const pick = rear.recommendation.candidates.find((c: { sku: string }) => c.sku === rear.decision.pick.sku);
  expect(pick.feasible).toBe(true);
  expect(rear.preload.interim).toBe(true);
  expect(rear.decision.text.damping).toMatch(/^With the 135 N\/mm spring/);
});
