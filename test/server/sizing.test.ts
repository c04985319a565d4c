/**
 * POST /api/sizing over HTTP, signed in, against the seeded profiles and demo catalogue.
 * Check values are worked by hand here; the engine's own tests hold the formula sources.
 */
import request from 'supertest';
import { SpringRate } from '../../server/entities/spring-rate.entity';
import { seed } from '../../server/seed';
import body from './fixtures/sizing-two-ends.json';
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

const size = (payload: unknown) => request(t.app).post('/api/sizing').set('Authorization', auth).send(payload as object);

function withoutReadings(): Partial<typeof body> {
  const copy = structuredClone(body);
  const { readings: _front, ...front } = copy.front;
  const { readings: _rear, ...rear } = copy.rear;
  return { ...copy, front: front as typeof copy.front, rear: rear as typeof copy.rear };
}

/** Every number anywhere in the answer is finite (JSON turns NaN and Infinity into null). */
function numbersIn(value: unknown, out: unknown[] = []): unknown[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => numbersIn(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => numbersIn(v, out));
  return out;
}

describe('from readings', () => {
  test('answers both ends with the measured sags and the calibrated loads', async () => {
    const res = await size(body).expect(200);
    const { front, rear } = res.body;
    expect(res.body.engineVersion).toEqual(expect.any(String));
    expect(front.mode).toBe('readings');

    // Front: L0 = 180; L1 = (158 + 162) / 2 = 160; L2 = (139 + 143) / 2 = 141.
    // Static sag 180 - 160 = 20 mm, rider sag 180 - 141 = 39 mm, 39 / 120 = 32.5 % of travel.
    expect(front.staticSagMm).toBeCloseTo(20, 9);
    expect(front.riderSagMm).toBeCloseTo(39, 9);
    expect(front.riderSagPct).toBeCloseTo(32.5, 9);
    // Friction band: half of each pair's spread, (162 - 158) / 2 = 2 mm.
    expect(front.frictionBandMm).toEqual({ static: 2, rider: 2 });

    // Implied rate from the intake weights: rider load (82 + 8) kg x (1 - 0.65) x 9.80665 = 308.909 N;
    // k = W x cos 25 deg / (n x (S_R - S_S)) = 308.909 x 0.906308 / (2 x 19) = 7.3676 N/mm.
    expect(front.impliedRateNmm).toBeCloseTo(7.3676, 3);

    // Rear: L0 = 600, L1 = 591, L2 = 563, so sags 9 and 37 mm of 130 mm wheel travel.
    expect(rear.staticSagMm).toBeCloseTo(9, 9);
    expect(rear.riderSagMm).toBeCloseTo(37, 9);
    expect(rear.loads.source).toBe('calibrated');

    for (const end of [front, rear]) {
      expect(['keep', 'too-soft', 'too-stiff', 'preload-out-of-range']).toContain(end.verdict);
      expect(end.preload).toEqual(expect.objectContaining({ unit: 'turns', direction: expect.stringMatching(/add|remove|none/) }));
      expect(end.recommendation.candidates.length).toBeGreaterThan(0);
      expect(end.target.discipline).toBe('road');
    }
    expect(numbersIn(res.body).every((n) => Number.isFinite(n))).toBe(true);
  });

  test('the in-stock pick follows the stock at once', async () => {
    const first = (await size(body).expect(200)).body.front.recommendation.inStock;
    expect(first).toEqual(expect.objectContaining({ sku: expect.any(String), inStock: true }));

    await t.db.write(async (m) => {
      await m.getRepository(SpringRate).update({ sku: first.sku }, { onHand: 0 });
      t.sizingData.invalidate();
    });
    const after = (await size(body).expect(200)).body.front.recommendation.inStock;
    expect(after?.sku).not.toBe(first.sku);
  });
});

describe('from weights', () => {
  test('answers both ends with predicted sags, before the bike is in', async () => {
    const res = await size(withoutReadings()).expect(200);
    for (const end of [res.body.front, res.body.rear]) {
      expect(end.mode).toBe('weights');
      expect(end.riderSagMm).toBeGreaterThan(end.staticSagMm);
      expect(end.idealRateNmm).toBeGreaterThan(0);
    }
    expect(numbersIn(res.body).every((n) => Number.isFinite(n))).toBe(true);
  });

  test('one end alone is enough', async () => {
    const only = withoutReadings();
    delete only.rear;
    const res = await size(only).expect(200);
    expect(res.body.front).toBeDefined();
    expect(res.body.rear).toBeUndefined();
  });
});

describe('bad bodies', () => {
  test('every bad field gets its own message', async () => {
    const bad = JSON.parse(JSON.stringify(body));
    bad.bike.frontShare = 1.4;
    bad.rider.bodyKg = -3;
    bad.front.readings.riderMm = { pushedMm: 190, liftedMm: 192 };
    delete bad.rear.rateNmm;
    const res = await size(bad).expect(400);
    expect(res.body.error.code).toBe('invalid');
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['bike.frontShare', 'rider.bodyKg', 'rear.rateNmm']),
    );
    expect(Object.keys(res.body.error.fields).some((k) => k.startsWith('front.readings'))).toBe(true);
  });

  test('an unknown discipline names the ones the shop has', async () => {
    const res = await size({ ...body, discipline: 'ice-racing' }).expect(400);
    expect(res.body.error.fields.discipline).toMatch(/road/);
  });

  test('no end at all, or not an object, is a 400', async () => {
    const { front: _front, rear: _rear, ...neither } = body;
    expect((await size(neither).expect(400)).body.error.fields).toBeDefined();
    expect((await size([1, 2, 3]).expect(400)).body.error.code).toBe('invalid');
  });

  test('is refused without sign-in', async () => {
    await request(t.app).post('/api/sizing').send(body).expect(401);
  });
});

test('the target profiles are listed for the forms', async () => {
  const res = await request(t.app).get('/api/target-profiles').set('Authorization', auth).expect(200);
  expect(res.body.profiles.map((p: { discipline: string }) => p.discipline)).toEqual(['road', 'track', 'touring', 'trail', 'motocross']);
});
