/** The admin's shop data editors over HTTP: bike models, target profiles, engine settings, and the audit of each write. */
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import fixture from '../fixtures/sizing-two-ends.json';
import { makeTestContext, TestContext } from '../test-context';
import { as, Client, handBike } from './helpers';

let t: TestContext;
let adminUser: User;
let admin: Client;
let rider: Client;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  adminUser = await createAccount(t, 'admin');
  admin = await as(t, adminUser);
  rider = await as(t, await createAccount(t, 'rider'));
});
afterAll(() => t.dispose());

async function auditOf(entity: string) {
  return (await admin.get(`/audit?entity=${entity}`).expect(200)).body;
}

describe('bike models', () => {
  test('create, update and delete, each with an audit row holding before and after', async () => {
    const created = (await admin.post('/bike-models', { name: 'Fenn 300 Scrambler', description: 'Invented.', ...handBike() }).expect(201)).body.model;
    expect(created).toEqual(expect.objectContaining({ name: 'Fenn 300 Scrambler', masses: handBike().masses, front: handBike().front }));
    const changed = { ...created, name: 'Fenn 310 Scrambler', masses: { ...created.masses, massKg: 170 } };
    const updated = (await admin.put(`/bike-models/${created.id}`, changed).expect(200)).body.model;
    expect(updated.masses.massKg).toBe(170);
    await admin.delete(`/bike-models/${created.id}`).expect(204);
    await admin.get(`/bike-models/${created.id}`).expect(404);

    const { entries } = await auditOf('bike-model');
    const mine = entries.filter((e: { entityKey: string }) => e.entityKey === String(created.id));
    expect(mine.map((e: { action: string }) => e.action)).toEqual(['delete', 'update', 'create']);
    expect(mine[2]).toEqual(expect.objectContaining({ actorId: adminUser.id, actorName: adminUser.name, before: null, after: created }));
    expect(mine[1].before.name).toBe('Fenn 300 Scrambler');
    expect(mine[1].after).toEqual(updated);
    expect(mine[0]).toEqual(expect.objectContaining({ before: updated, after: null }));
  });

  test('validation by field, a name taken in any case, an unknown id', async () => {
    const bad = await admin.post('/bike-models', { name: '', ...handBike(), masses: { ...handBike().masses, massKg: 5 } }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['masses.massKg', 'name']);
    const taken = await admin.post('/bike-models', { name: 'tarn 690 roadster', ...handBike() }).expect(409);
    expect(taken.body.error.fields).toEqual({ name: expect.any(String) });
    await admin.put('/bike-models/999999', { name: 'Nobody', ...handBike() }).expect(404);
    await rider.post('/bike-models', { name: 'Rider Made', ...handBike() }).expect(403);
  });
});

describe('target profiles', () => {
  const road = () => ({
    label: 'Road',
    note: 'Edited by the shop.',
    front: { riderSagPct: [30, 35], staticSagPct: [15, 22] },
    rear: { riderSagPct: [28, 33], staticSagPct: [5, 12] },
  });

  test('a changed window shows in the next sizing at once, and is audited', async () => {
    // Seeded road front rider window: 28-33 % (sizing-defaults.ts, common practice).
    const before = (await rider.post('/sizing', fixture).expect(200)).body.front.target.riderSagPct;
    expect(before).toEqual({ min: expect.closeTo(28, 9), max: expect.closeTo(33, 9) });
    const saved = (await admin.put('/target-profiles/road', road()).expect(200)).body.profile;
    expect(saved).toEqual({ discipline: 'road', ...road() });
    const after = (await rider.post('/sizing', fixture).expect(200)).body.front.target.riderSagPct;
    expect(after).toEqual({ min: expect.closeTo(30, 9), max: expect.closeTo(35, 9) });

    const [entry] = (await auditOf('target-profile')).entries;
    expect(entry).toEqual(expect.objectContaining({ entityKey: 'road', action: 'update', after: saved }));
    expect(entry.before.front.riderSagPct).toEqual([28, 33]);
  });

  test('windows must be ordered, within 0-100 %, the rider window above the static one', async () => {
    const bad = road();
    bad.front.riderSagPct = [35, 30];
    bad.rear.staticSagPct = [-1, 40];
    const res = await admin.put('/target-profiles/road', bad).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['front.riderSagPct[1]', 'rear.riderSagPct[0]', 'rear.staticSagPct[0]']);
    await admin.put('/target-profiles/ice-racing', road()).expect(404);
  });
});

describe('engine settings', () => {
  test('listed with their units and sources', async () => {
    const { settings } = (await admin.get('/engine-settings').expect(200)).body;
    expect(settings).toContainEqual(expect.objectContaining({ key: 'dampingRatio', value: 0.3, unit: '', source: 'from memory' }));
  });

  test('a bad value is refused per key and nothing is written', async () => {
    const auditBefore = (await auditOf('engine-setting')).total;
    const res = await admin.patch('/engine-settings', { values: { dampingRatio: 0.5, coilBindMarginMm: -1, 'plausible.gearKg.max': 1, unknownKey: 2 } }).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['coilBindMarginMm', 'plausible.gearKg.max', 'unknownKey']);
    const { settings } = (await admin.get('/engine-settings').expect(200)).body;
    expect(settings.find((s: { key: string }) => s.key === 'dampingRatio').value).toBe(0.3);
    expect((await auditOf('engine-setting')).total).toBe(auditBefore);
    await admin.patch('/engine-settings', {}).expect(400);
  });

  test('a change reaches the next sizing at once, one audit row per changed key', async () => {
    // The preview's assumed damping ratio is the setting's when the request gives none.
    expect((await rider.post('/sizing', fixture).expect(200)).body.front.preview.assumedDampingRatio).toBe(0.3);
    const { settings } = (await admin.patch('/engine-settings', { values: { dampingRatio: '0,45', sameRatePct: 2 } }).expect(200)).body;
    expect(settings.find((s: { key: string }) => s.key === 'dampingRatio').value).toBe(0.45);
    expect((await rider.post('/sizing', fixture).expect(200)).body.front.preview.assumedDampingRatio).toBe(0.45);
    const { entries } = await auditOf('engine-setting');
    // sameRatePct was already 2: no change, no row.
    expect(entries.map((e: { entityKey: string }) => e.entityKey)).toEqual(['dampingRatio']);
    expect([entries[0].before.value, entries[0].after.value]).toEqual([0.3, 0.45]);
  });
});

test('the audit list pages, newest first', async () => {
  const all = (await admin.get('/audit').expect(200)).body;
  expect(all.total).toBeGreaterThanOrEqual(5);
  const page = (await admin.get('/audit?page=2&pageSize=2').expect(200)).body;
  expect(page.entries.map((e: { id: number }) => e.id)).toEqual(all.entries.slice(2, 4).map((e: { id: number }) => e.id));
  expect(all.entries[0].id).toBeGreaterThan(all.entries[1].id);
  await admin.get('/audit?entity=bike').expect(400);
});
