/**
 * The shop's list of damping adjuster kinds over HTTP: the six of the trade seeded, read by every
 * role, added to by the admin (audited, 409 on a key taken, 400 by field), and bikes and bike
 * models refused an adjuster whose kind is not on it. The six and their labels are the trade's
 * names (common practice, no source); the other kinds and bikes are invented test data.
 */
import request from 'supertest';
import { ROLES } from '../../../shared/types/roles';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, handBike } from './helpers';

const TRADE = [
  { key: 'rebound', label: 'Rebound', circuit: 'rebound', speed: 'all' },
  { key: 'compression', label: 'Compression', circuit: 'compression', speed: 'all' },
  { key: 'hs-compression', label: 'High-speed compression', circuit: 'compression', speed: 'high' },
  { key: 'ls-compression', label: 'Low-speed compression', circuit: 'compression', speed: 'low' },
  { key: 'hs-rebound', label: 'High-speed rebound', circuit: 'rebound', speed: 'high' },
  { key: 'ls-rebound', label: 'Low-speed rebound', circuit: 'rebound', speed: 'low' },
];

const MID_VALVE = { key: 'mid-valve', label: 'Mid-valve bleed', circuit: 'compression', speed: 'low' };

let t: TestContext;
let adminUser: User;
let admin: Client;
let rider: Client;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
  adminUser = await createAccount(t, 'admin');
  admin = await as(t, adminUser);
  rider = await as(t, await createAccount(t, 'rider'));
});
afterAll(() => t.dispose());

/** The hand-made bike with a front adjuster of `kind` added. */
function bikeWith(kind: string) {
  const bike = handBike();
  bike.front!.dampers.push({ kind, unit: 'turns', maxPosition: 2, standard: null, position: 1, dampingPerStepNsPerM: null });
  return bike;
}

test('the six of the trade come first, for every role; anonymous is refused', async () => {
  for (const role of ROLES) {
    const client = await as(t, await createAccount(t, role));
    expect((await client.get('/damper-kinds').expect(200)).body.kinds.slice(0, 6)).toEqual(TRADE);
  }
  await request(t.app).get('/api/damper-kinds').expect(401);
});

describe('adding a kind', () => {
  test('the admin adds one: listed after the six, audited with what was added', async () => {
    const added = (await admin.post('/damper-kinds', { ...MID_VALVE, label: '  Mid-valve bleed ' }).expect(201)).body.kind;
    expect(added).toEqual(MID_VALVE);
    expect((await rider.get('/damper-kinds').expect(200)).body.kinds).toEqual([...TRADE, MID_VALVE]);
    const { entries } = (await admin.get('/audit?entity=damper-kind').expect(200)).body;
    expect(entries).toEqual([expect.objectContaining({ entity: 'damper-kind', entityKey: 'mid-valve', action: 'create', actorId: adminUser.id, before: null, after: MID_VALVE })]);
  });

  test('a key taken is a 409 that names the key, and changes nothing', async () => {
    const taken = await admin.post('/damper-kinds', { ...TRADE[0], label: 'Rebound again' }).expect(409);
    expect(taken.body.error).toEqual(expect.objectContaining({ code: 'damper-kind-taken', fields: { key: expect.any(String) } }));
    expect((await admin.get('/damper-kinds').expect(200)).body.kinds[0]).toEqual(TRADE[0]);
  });

  test('each bad value is a 400 on its field', async () => {
    const bad = await admin.post('/damper-kinds', { key: 'Mid Valve', label: '', circuit: 'both', speed: 'medium' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['circuit', 'key', 'label', 'speed']);
    await admin.post('/damper-kinds', { ...MID_VALVE, key: `a${'b'.repeat(40)}` }).expect(400);
  });

  test('only the admin adds', async () => {
    for (const role of ['rider', 'desk', 'counter'] as const) {
      await (await as(t, await createAccount(t, role))).post('/damper-kinds', { ...MID_VALVE, key: `by-${role}` }).expect(403);
    }
  });
});

describe('a kind not on the list', () => {
  test('is refused on a bike, made or corrected, on its own field', async () => {
    const made = await rider.post('/bikes', { nickname: 'Unknown kind', ...bikeWith('top-out-spring') }).expect(400);
    expect(made.body.error.fields).toEqual({ 'front.dampers[2].kind': expect.stringMatching(/^top-out-spring is not on the shop’s list/) });
    const bikeId = await addHandBike(rider);
    const corrected = await rider.put(`/bikes/${bikeId}`, { nickname: 'Corrected', ...bikeWith('top-out-spring') }).expect(400);
    expect(Object.keys(corrected.body.error.fields)).toEqual(['front.dampers[2].kind']);
    expect((await rider.get(`/bikes/${bikeId}`).expect(200)).body.bike.front.dampers).toEqual(handBike().front!.dampers);
  });

  test('is refused on a bike model', async () => {
    const res = await admin.post('/bike-models', { name: 'Unknown Kind 500', ...bikeWith('top-out-spring') }).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['front.dampers[2].kind']);
    const model = (await admin.post('/bike-models', { name: 'Known Kind 500', ...handBike() }).expect(201)).body.model;
    await admin.put(`/bike-models/${model.id}`, { name: 'Known Kind 500', ...bikeWith('top-out-spring') }).expect(400);
  });

  test('is taken once the admin has added it', async () => {
    await admin.post('/damper-kinds', { key: 'top-out-spring', label: 'Top-out spring', circuit: 'rebound', speed: 'all' }).expect(201);
    const bike = (await rider.post('/bikes', { nickname: 'Known now', ...bikeWith('top-out-spring') }).expect(201)).body.bike;
    expect(bike.front.dampers.map((d: { kind: string }) => d.kind)).toEqual(['rebound', 'compression', 'top-out-spring']);
  });
});

test('the way back names an adjuster by its label and counts turns in quarter turns', async () => {
  const bike = handBike();
  bike.rear!.dampers.push({ kind: 'hs-compression', unit: 'turns', maxPosition: 2.5, standard: 1.25, position: 1.25, dampingPerStepNsPerM: null });
  const bikeId = (await rider.post('/bikes', { nickname: 'Split shock', ...bike }).expect(201)).body.bike.id;
  const { entry } = (await rider.post(`/bikes/${bikeId}/setup-log`, { rear: { dampers: { 'hs-compression': 2 } } }).expect(201)).body;
  expect(entry.changes).toEqual([{ end: 'rear', setting: 'damper', adjuster: 'hs-compression', unit: 'turns', from: 1.25, to: 2 }]);
  await rider.post(`/bikes/${bikeId}/setup-log`, { rear: { dampers: { 'hs-compression': 2.1 } } }).expect(400);
  const { plan } = (await rider.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(200)).body;
  // 1.25 - 2 = -0.75: three quarter turns in.
  expect(plan.steps).toEqual(['Rear high-speed compression: 0.75 turns in, back to 1.25 out from fully closed.']);
});
