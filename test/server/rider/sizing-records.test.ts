/**
 * Saved passes over HTTP. The bike, weigh-in and readings of the helpers are those of the fixture
 * sizing-two-ends.json, so the pass must send the engine exactly the fixture's request and store
 * exactly what POST /api/sizing answers for it.
 */
import { validateSizingRequest } from '../../../shared/schemas/sizing.schema';
import { ENGINE_VERSION } from '../../../shared/sizing';
import { MeasuringDraft } from '../../../server/entities/measuring-draft.entity';
import { SetupLogEntry } from '../../../server/entities/setup-log-entry.entity';
import { SizingRecord } from '../../../server/entities/sizing-record.entity';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import fixture from '../fixtures/sizing-two-ends.json';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, handBike, READINGS, WEIGH_IN } from './helpers';

let t: TestContext;
let rider: User;
let deskUser: User;
let a: Client;
let desk: Client;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  rider = await createAccount(t, 'rider');
  deskUser = await createAccount(t, 'desk');
  [a, desk] = [await as(t, rider), await as(t, deskUser)];
  await a.put('/weigh-in', WEIGH_IN).expect(200);
});
afterAll(() => t.dispose());

describe('a pass from the bike, the weigh-in and the readings', () => {
  let bikeId: number;
  let record: Record<string, any>;
  beforeAll(async () => {
    bikeId = await addHandBike(a);
    record = (await a.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201)).body.record;
  });

  test("sends the engine the fixture's request and stores what POST /api/sizing answers", async () => {
    const expected = validateSizingRequest(fixture);
    if (!expected.ok) throw new Error('the fixture no longer validates');
    expect(record.request).toEqual(expected.value);
    const calculated = (await a.post('/sizing', fixture).expect(200)).body;
    expect(record.result).toEqual(calculated);
  });

  test('keeps the engine version, the profile, the weigh-in and who ran it', async () => {
    const road = (await a.get('/target-profiles').expect(200)).body.profiles.find((p: { discipline: string }) => p.discipline === 'road');
    expect(record).toEqual(
      expect.objectContaining({ engineVersion: ENGINE_VERSION, profile: road, weighIn: WEIGH_IN, bikeId, riderId: rider.id, createdById: rider.id, source: 'rider', discipline: 'road' }),
    );
    expect((await a.get(`/sizing-records/${record.id}`).expect(200)).body.record).toEqual(record);
  });

  test('lists per bike with the sags for the chart, and adds a pass to the setup log', async () => {
    t.advanceClock(60_000);
    const second = (await a.post(`/bikes/${bikeId}/sizing-records`, { ends: ['front'], readings: { front: READINGS.front } }).expect(201)).body.record;
    const list = (await a.get(`/bikes/${bikeId}/sizing-records`).expect(200)).body.records;
    expect(list.map((r: { id: number }) => r.id)).toEqual([record.id, second.id]);
    // sizing.test.ts: front rider sag 180 - 141 = 39 mm, 32.5 % of 120 mm.
    expect(list[0].front).toEqual(expect.objectContaining({ mode: 'readings', riderSagMm: 39, riderSagPct: 32.5, targetRiderSagPct: record.result.front.target.riderSagPct }));
    expect(list[1].rear).toBeNull();
    expect(list[0]).not.toHaveProperty('result');
    const log = (await a.get(`/bikes/${bikeId}/setup-log`).expect(200)).body;
    expect(log.entries.map((e: { kind: string; sizing: { id: number } }) => [e.kind, e.sizing.id])).toEqual([
      ['pass', record.id],
      ['pass', second.id],
    ]);
    const garage = (await a.get('/bikes').expect(200)).body.bikes;
    expect(garage.find((b: { id: number }) => b.id === bikeId).lastSizing.id).toBe(second.id);
  });
});

test('a whole request may be sent instead, and gives the same answer', async () => {
  const bikeId = await addHandBike(a);
  const record = (await a.post(`/bikes/${bikeId}/sizing-records`, { request: fixture }).expect(201)).body.record;
  expect(record.result).toEqual((await a.post('/sizing', fixture).expect(200)).body);
  expect(record.weighIn).toBeNull();
  const bad = await a.post(`/bikes/${bikeId}/sizing-records`, { request: { ...fixture, discipline: 'ice-racing' } }).expect(400);
  expect(Object.keys(bad.body.error.fields)).toEqual(['request.discipline']);
});

test("the desk sizes a walk-in's bike from the weights alone, recorded as the desk's", async () => {
  const walkIn = await createAccount(t, 'rider');
  const bike = (await desk.post('/bikes', { riderId: walkIn.id, nickname: 'Not in yet', ...handBike() }).expect(201)).body.bike;
  const noWeighIn = await desk.post(`/bikes/${bike.id}/sizing-records`, {}).expect(400);
  expect(Object.keys(noWeighIn.body.error.fields)).toEqual(['weighIn']);
  const record = (await desk.post(`/bikes/${bike.id}/sizing-records`, { weighIn: { ...WEIGH_IN, bodyKg: 95 } }).expect(201)).body.record;
  expect(record).toEqual(expect.objectContaining({ source: 'desk', riderId: walkIn.id, createdById: deskUser.id }));
  expect([record.result.front.mode, record.result.rear.mode]).toEqual(['weights', 'weights']);
  expect(record.request.rider.bodyKg).toBe(95);
  const theirs = await as(t, walkIn);
  expect((await theirs.get(`/sizing-records/${record.id}`).expect(200)).body.record.id).toBe(record.id);
});

test('bad readings and bad ends answer field errors under the body’s paths', async () => {
  const bikeId = await addHandBike(a);
  const res = await a
    .post(`/bikes/${bikeId}/sizing-records`, { readings: { front: { ...READINGS.front, riderMm: { pushedMm: 190, liftedMm: 192 } }, rear: { extendedMm: 'long' } } })
    .expect(400);
  expect(Object.keys(res.body.error.fields).every((k) => k.startsWith('readings.front') || k.startsWith('readings.rear'))).toBe(true);
  expect(Object.keys(res.body.error.fields).some((k) => k.startsWith('readings.front'))).toBe(true);
  await a.post(`/bikes/${bikeId}/sizing-records`, { ends: ['middle'] }).expect(400);
});

test("another rider cannot size, list or read this rider's passes", async () => {
  const bikeId = await addHandBike(a);
  const record = (await a.post(`/bikes/${bikeId}/sizing-records`, {}).expect(201)).body.record;
  const b = await as(t, await createAccount(t, 'rider'));
  await b.post(`/bikes/${bikeId}/sizing-records`, { weighIn: WEIGH_IN }).expect(404);
  await b.get(`/bikes/${bikeId}/sizing-records`).expect(404);
  await b.get(`/sizing-records/${record.id}`).expect(404);
  expect((await desk.get(`/sizing-records/${record.id}`).expect(200)).body.record.id).toBe(record.id);
});

test('deleting the bike keeps its passes, unlinked, and drops its log and draft', async () => {
  const bikeId = await addHandBike(a);
  const record = (await a.post(`/bikes/${bikeId}/sizing-records`, {}).expect(201)).body.record;
  await a.put(`/bikes/${bikeId}/draft`, { step: 'ends' }).expect(200);
  await a.delete(`/bikes/${bikeId}`).expect(204);
  const kept = await t.db.read.getRepository(SizingRecord).findOneByOrFail({ id: record.id });
  expect(kept.bikeId).toBeNull();
  expect((await a.get(`/sizing-records/${record.id}`).expect(200)).body.record.riderId).toBe(rider.id);
  expect(await t.db.read.getRepository(SetupLogEntry).countBy({ bikeId })).toBe(0);
  expect(await t.db.read.getRepository(MeasuringDraft).countBy({ bikeId })).toBe(0);
});
