/** The rider's profile over HTTP: the weigh-in kept for next time, and the units preference. */
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { as, WEIGH_IN } from './helpers';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
});
afterAll(() => t.dispose());

describe('weigh-in', () => {
  test('none at first; saved with its totals; replaced by the next', async () => {
    const rider = await as(t, await createAccount(t, 'rider'));
    expect((await rider.get('/weigh-in').expect(200)).body).toEqual({ weighIn: null, weighedAt: null, totals: null });
    const { passenger: _p, ...body } = { ...WEIGH_IN, loads: [{ kind: 'top-box', massKg: 8 }], position: 'upright', rearShare: undefined, passenger: 0 };
    const saved = (await rider.put('/weigh-in', body).expect(200)).body;
    // weigh-in.fields.ts (from memory): upright 0.70, top box 1.2. Gear 1.5 + 2.5 + 1.5 + 2.5 = 8 kg.
    expect(saved.weighIn).toEqual({ ...WEIGH_IN, position: 'upright', rearShare: 0.7, loads: [{ kind: 'top-box', massKg: 8, rearShare: 1.2 }] });
    expect(saved.totals.rider).toEqual({ bodyKg: 82, gearKg: 8, rearShare: 0.7 });
    expect(saved.totals.loadCases).toEqual([{ name: 'With luggage', massKg: 8, rearShare: 1.2 }]);
    expect(saved.weighedAt).toEqual(expect.any(String));
    expect((await rider.get('/weigh-in').expect(200)).body).toEqual(saved);
    await rider.put('/weigh-in', WEIGH_IN).expect(200);
    expect((await rider.get('/weigh-in').expect(200)).body.weighIn).toEqual(WEIGH_IN);
  });

  test('bad values by field, an unknown discipline names those the shop has', async () => {
    const rider = await as(t, await createAccount(t, 'rider'));
    const bad = await rider.put('/weigh-in', { ...WEIGH_IN, bodyKg: 'heavy', gear: { boots: 40 } }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['bodyKg', 'gear.boots']);
    const unknown = await rider.put('/weigh-in', { ...WEIGH_IN, discipline: 'ice-racing' }).expect(400);
    expect(unknown.body.error.fields.discipline).toMatch(/road/);
  });

  test("a rider sees only their own; the desk reads and sets a customer's", async () => {
    const owner = await createAccount(t, 'rider');
    await (await as(t, owner)).put('/weigh-in', WEIGH_IN).expect(200);
    const other = await as(t, await createAccount(t, 'rider'));
    await other.get(`/weigh-in?riderId=${owner.id}`).expect(404);
    await other.put(`/weigh-in?riderId=${owner.id}`, WEIGH_IN).expect(404);
    const desk = await as(t, await createAccount(t, 'desk'));
    expect((await desk.get(`/weigh-in?riderId=${owner.id}`).expect(200)).body.weighIn).toEqual(WEIGH_IN);
    await desk.put(`/weigh-in?riderId=${owner.id}`, { ...WEIGH_IN, bodyKg: 90 }).expect(200);
    expect((await (await as(t, owner)).get('/weigh-in').expect(200)).body.weighIn.bodyKg).toBe(90);
    await desk.get('/weigh-in?riderId=999999').expect(404);
  });
});

describe('units', () => {
  test('metric and N/mm until changed; imperial defaults to lbf/in; a rate unit of its own', async () => {
    const user = await as(t, await createAccount(t, 'counter'));
    expect((await user.get('/me/units').expect(200)).body.units).toEqual({ system: 'metric', rateUnit: 'N/mm', length: 'mm', mass: 'kg', force: 'N' });
    expect((await user.put('/me/units', { system: 'imperial' }).expect(200)).body.units).toEqual({ system: 'imperial', rateUnit: 'lbf/in', length: 'in', mass: 'lb', force: 'lbf' });
    await user.put('/me/units', { system: 'imperial', rateUnit: 'kgf/mm' }).expect(200);
    expect((await user.get('/me/units').expect(200)).body.units.rateUnit).toBe('kgf/mm');
    const bad = await user.put('/me/units', { system: 'nautical', rateUnit: 'N/m' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['rateUnit', 'system']);
  });
});
