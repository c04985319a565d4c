/**
 * A bike's load cases over HTTP: the passenger and the luggage of the weigh-in become cases on the
 * spring the bike has fitted, set from its solo setting; a switch moves the adjusters and goes in
 * the setup log, and going back to solo restores the solo setting exactly. Check values worked by
 * hand from sizing.md section 3-4 (dp = dW*cos(theta)/(n*k) at the fork, dW*LR/k at a shock with a
 * constant leverage ratio); the load shares are from memory (weigh-in.fields.ts).
 */
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import type { WeighIn } from '../../../shared/types/garage';
import type { LoadCasesAnswer } from '../../../shared/types/load-case';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, READINGS, WEIGH_IN } from './helpers';

const g = 9.80665; // standard gravity (CGPM 1901; NIST SP 811)
const cos25 = Math.cos((25 * Math.PI) / 180);

/** The hand bike's rear read so that it agrees with its 90 N/mm label: S_S = 32.5, S_R = 75.5 mm. */
const CONSISTENT = { ...READINGS, rear: { extendedMm: 600, staticMm: { pushedMm: 567, liftedMm: 568 }, riderMm: { pushedMm: 523, liftedMm: 526 } } };

const LOADED: WeighIn = {
  ...WEIGH_IN,
  loads: [
    { kind: 'passenger', massKg: 70, rearShare: 0.95 },
    { kind: 'top-box', massKg: 10, rearShare: 1.2 },
  ],
};

let t: TestContext;
let rider: User;
let a: Client;
let bikeId: number;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
  rider = await createAccount(t, 'rider');
  a = await as(t, rider);
  await a.put('/weigh-in', LOADED).expect(200);
  bikeId = await addHandBike(a);
  await a.post(`/bikes/${bikeId}/sizing-records`, { readings: CONSISTENT }).expect(201);
});
afterAll(() => t.dispose());

const cases = async (): Promise<LoadCasesAnswer> => (await a.get(`/bikes/${bikeId}/load-cases`).expect(200)).body;

test('the weigh-in\'s loads make the cases, each set from the solo setting on the fitted springs', async () => {
  const answer = await cases();
  expect(answer.active).toBeNull();
  expect(answer.solo).toEqual({ front: 5, rear: 4 });
  expect(answer.cases.map((c) => c.name)).toEqual(['With passenger', 'With luggage', 'With passenger and luggage']);
  const luggage = answer.cases[1];
  // A 10 kg top box at a rear share of 1.2 unloads the fork by 10*0.2*g = 19.61 N: dp = -19.61*cos25/(2*8.5) =
  // -1.05 mm, 1 turn out of a 1 mm collar; it loads the shock by 12 g = 117.68 N: dp = 117.68*2.6/90 = 3.40 mm,
  // 2.27 turns of 1.5 mm, so 2 1/4 turns. The shock's spring is too soft even solo (rider sag 75.5 mm), but the
  // luggage only brings it back there: carried.
  expect((-10 * 0.2 * g * cos25) / 17).toBeCloseTo(-1.05, 2);
  expect(luggage.ends.front).toMatchObject({ changeUnits: -1, position: 4, carries: true, spring: { rateNmm: 8.5 } });
  expect((12 * g * 2.6) / 90 / 1.5).toBeCloseTo(2.27, 2);
  expect(luggage.ends.rear).toMatchObject({ changeUnits: 2.25, position: 6.25, carries: true, spring: { rateNmm: 90 } });
  // A 70 kg passenger needs 66.5 g*2.6/90 = 18.84 mm, 12.6 turns: the collar has 8 left, so the 90 N/mm spring cannot carry it.
  expect(answer.cases[0].ends.rear).toMatchObject({ position: 12, carries: false, limit: 'range' });
});

test('a switch moves the adjusters and is logged; going back to solo restores the solo setting', async () => {
  const toLuggage = (await a.post(`/bikes/${bikeId}/load-case`, { name: 'With luggage' }).expect(201)).body;
  expect(toLuggage.entry.note).toBe('Load case: solo to With luggage (10 kg)');
  expect(toLuggage.entry.changes).toEqual([
    { end: 'front', setting: 'preload', from: 5, to: 4, fromMm: 10, toMm: 9 },
    { end: 'rear', setting: 'preload', from: 4, to: 6.25, fromMm: 8, toMm: 11.375 },
  ]);
  expect(toLuggage.bike.loadCase).toBe('With luggage');
  expect((await cases()).active).toBe('With luggage');

  // Straight to another case: its positions come from the solo setting, not from the luggage one.
  const toPassenger = (await a.post(`/bikes/${bikeId}/load-case`, { name: 'With passenger' }).expect(201)).body;
  const passenger = (await cases()).cases[0];
  expect(toPassenger.bike.front.adjuster.position).toBe(passenger.ends.front!.position);
  expect(toPassenger.bike.rear.adjuster.position).toBe(12);

  const solo = (await a.post(`/bikes/${bikeId}/load-case`, { name: null }).expect(201)).body;
  expect(solo.entry.note).toBe('Load case: With passenger to solo');
  expect([solo.bike.front.adjuster.position, solo.bike.front.preloadMm, solo.bike.rear.adjuster.position, solo.bike.rear.preloadMm]).toEqual([5, 10, 4, 8]);
  expect(solo.bike.loadCase).toBeNull();
  const log = (await a.get(`/bikes/${bikeId}/setup-log`).expect(200)).body;
  expect(log.entries.map((e: { kind: string }) => e.kind)).toEqual(['pass', 'change', 'change', 'change']);
});

test('refuses a switch that changes nothing, an unknown case and a blank name, each with its reason', async () => {
  const same = await a.post(`/bikes/${bikeId}/load-case`, { name: null }).expect(409);
  expect(same.body.error).toMatchObject({ code: 'unchanged', message: 'The bike is set for solo riding already: nothing changed.' });
  const unknown = await a.post(`/bikes/${bikeId}/load-case`, { name: 'With a trailer' }).expect(400);
  expect(unknown.body.error.fields.name).toMatch(/no load case "With a trailer": choose With passenger, With luggage, With passenger and luggage, or solo/);
  expect((await a.post(`/bikes/${bikeId}/load-case`, { name: '  ' }).expect(400)).body.error.fields.name).toMatch(/Name the load case/);
  expect((await a.post(`/bikes/${bikeId}/load-case`, {}).expect(400)).body.error.fields.name).toMatch(/Name the load case/);
  expect((await a.post(`/bikes/${bikeId}/load-case`, { name: ['With luggage'] }).expect(400)).body.error.fields.name).toMatch(/as text/);
});

test('a bike without a pass has no cases to switch to', async () => {
  const fresh = await addHandBike(a, 'Not yet measured');
  expect((await a.get(`/bikes/${fresh}/load-cases`).expect(200)).body).toEqual({ active: null, solo: { front: 5, rear: 4 }, cases: [], recordId: null });
  expect((await a.post(`/bikes/${fresh}/load-case`, { name: 'With luggage' }).expect(409)).body.error.code).toBe('no-sizing');
});

test('another rider gets the 404 an unknown bike gets', async () => {
  const other = await as(t, await createAccount(t, 'rider'));
  await other.get(`/bikes/${bikeId}/load-cases`).expect(404);
  await other.post(`/bikes/${bikeId}/load-case`, { name: 'With luggage' }).expect(404);
});

test('a case that needs no adjuster moved is still set and logged, and solo comes back from it', async () => {
  // A 0.2 kg tank bag at 0.3 to the rear: 1.4 N on the fork, 0.07 mm of preload, less than half a quarter turn.
  const light = await as(t, await createAccount(t, 'rider'));
  await light.put('/weigh-in', { ...WEIGH_IN, loads: [{ kind: 'tank-bag', massKg: 0.2, rearShare: 0.3 }] }).expect(200);
  const id = await addHandBike(light, 'Tank bag only');
  await light.post(`/bikes/${id}/sizing-records`, { readings: CONSISTENT }).expect(201);
  const { cases: [bag] } = (await light.get(`/bikes/${id}/load-cases`).expect(200)).body as LoadCasesAnswer;
  expect([bag.ends.front?.changeUnits, bag.ends.rear?.changeUnits]).toEqual([0, 0]);
  const set = (await light.post(`/bikes/${id}/load-case`, { name: 'With luggage' }).expect(201)).body;
  expect(set.entry.changes).toEqual([]);
  expect(set.bike.loadCase).toBe('With luggage');
  expect((await light.post(`/bikes/${id}/load-case`, { name: null }).expect(201)).body.bike.loadCase).toBeNull();
});

test('a preload turned by hand or a corrected spring ends the case, so solo is never set from stale positions', async () => {
  await a.post(`/bikes/${bikeId}/load-case`, { name: 'With luggage' }).expect(201);
  const turned = (await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 6 }, note: 'a little firmer' }).expect(201)).body;
  expect(turned.bike.loadCase).toBeNull();
  await a.post(`/bikes/${bikeId}/load-case`, { name: 'With luggage' }).expect(201);
  const current = (await a.get(`/bikes/${bikeId}`).expect(200)).body.bike;
  const { id: _id, ownerId: _o, model: _m, loadCase: _l, createdAt: _c, updatedAt: _u, draft: _d, lastSizing: _s, ...form } = current;
  expect((await a.put(`/bikes/${bikeId}`, { ...form, nickname: 'Renamed' }).expect(200)).body.bike.loadCase).toBe('With luggage');
  const corrected = (await a.put(`/bikes/${bikeId}`, { ...form, front: { ...form.front, rateNmm: 9 } }).expect(200)).body.bike;
  expect(corrected.loadCase).toBeNull();
});

test('a new spring ends the case: its solo setting was the old spring\'s', async () => {
  await a.post(`/bikes/${bikeId}/load-case`, { name: 'With luggage' }).expect(201);
  const swapped = (await a.post(`/bikes/${bikeId}/setup-log`, { rear: { spring: { rateNmm: 130 } }, note: 'stiffer shock spring' }).expect(201)).body;
  expect(swapped.bike.loadCase).toBeNull();
  // The cases are now set on the 130 N/mm spring the bike has, from where its adjusters are.
  const answer = await cases();
  expect(answer.active).toBeNull();
  expect(answer.cases[1].ends.rear?.spring.rateNmm).toBe(130);
});
