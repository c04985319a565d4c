/**
 * The setup log over HTTP, with the worked example of the issue: front preload baseline 5 turns,
 * changed to 7 then 6.5, so the undo removes 1.5 turns, counter-clockwise as clockwise adds;
 * rebound 12 -> 9 clicks out, so 3 clicks back out; and a spring swap undone. Arithmetic, no source.
 * Adjusters are named by the seeded list of kinds ("Rebound").
 */
import { Bike } from '../../../server/entities/bike.entity';
import { SetupLogEntry } from '../../../server/entities/setup-log-entry.entity';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, READINGS, WEIGH_IN } from './helpers';

let t: TestContext;
let rider: User;
let a: Client;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
  rider = await createAccount(t, 'rider');
  a = await as(t, rider);
  await a.put('/weigh-in', WEIGH_IN).expect(200);
});
afterAll(() => t.dispose());

describe('the worked example', () => {
  let bikeId: number;
  beforeAll(async () => {
    // helpers.handBike: front threaded, 1 mm a turn, at 5 turns, 10 mm preload, rebound 12 of 20, 8.5 N/mm;
    // rear threaded, 1.5 mm a turn, at 4 turns, 8 mm preload; clockwise adds preload on both.
    bikeId = await addHandBike(a);
    await a.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201);
  });

  test('no change yet: the baseline is the first pass, nothing to undo', async () => {
    const answer = (await a.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(200)).body;
    expect(answer.baseline).toEqual(answer.current);
    expect(answer.plan).toEqual(expect.objectContaining({ atBaseline: true, steps: [] }));
  });

  test('each change is an entry with before and after, and the bike follows it', async () => {
    const first = (await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 7 }, note: 'too soft on the brakes' }).expect(201)).body;
    expect(first.entry.changes).toEqual([{ end: 'front', setting: 'preload', from: 5, to: 7, fromMm: 10, toMm: 12 }]);
    expect(first.bike.front.adjuster.position).toBe(7);
    // 2 turns of a 1 mm pitch add 2 mm: 10 -> 12 mm.
    expect(first.bike.front.preloadMm).toBe(12);

    const second = (await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 6.5, dampers: { rebound: 9 }, spring: { rateNmm: 9.5 } }, rear: { preloadPosition: 6 } }).expect(201)).body;
    expect(second.entry.changes).toEqual([
      { end: 'front', setting: 'spring', from: { rateNmm: 8.5, secondRateNmm: null, breakMm: null, family: 'F37x320' }, to: { rateNmm: 9.5, secondRateNmm: null, breakMm: null, family: 'F37x320' } },
      { end: 'front', setting: 'preload', from: 7, to: 6.5, fromMm: 12, toMm: 11.5 },
      { end: 'front', setting: 'damper', adjuster: 'rebound', unit: 'clicks', from: 12, to: 9 },
      // 2 turns of a 1.5 mm pitch: 8 -> 11 mm.
      { end: 'rear', setting: 'preload', from: 4, to: 6, fromMm: 8, toMm: 11 },
    ]);
    const bike = (await a.get(`/bikes/${bikeId}`).expect(200)).body.bike;
    expect([bike.front.rateNmm, bike.front.adjuster.position, bike.front.dampers[0].position, bike.front.dampers[1].position, bike.rear.preloadMm]).toEqual([9.5, 6.5, 9, 10, 11]);
  });

  test('back to baseline: remove 1.5 turns counter-clockwise, rebound 3 clicks out, the 8.5 N/mm spring back', async () => {
    const { plan } = (await a.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(200)).body;
    expect(plan.front.preload).toEqual(expect.objectContaining({ changeUnits: -1.5, amount: 1.5, unit: 'turns', direction: 'remove', way: 'counter-clockwise', toPosition: 5 }));
    expect(plan.front.dampers).toEqual([expect.objectContaining({ adjuster: 'rebound', unit: 'clicks', from: 9, to: 12, amount: 3, direction: 'out' })]);
    expect(plan.front.spring).toEqual(expect.objectContaining({ from: expect.objectContaining({ rateNmm: 9.5 }), to: expect.objectContaining({ rateNmm: 8.5 }) }));
    // Rear: 4 - 6 = -2 turns.
    expect(plan.rear.preload).toEqual(expect.objectContaining({ changeUnits: -2, way: 'counter-clockwise' }));
    expect(plan.steps).toEqual([
      'Front spring: fit the 8.5 N/mm spring (F37x320) again in place of the 9.5 N/mm spring (F37x320).',
      'Front preload: turn the adjuster 1.5 turns counter-clockwise (less preload), back to 5 turns from caps fully out.',
      'Rear preload: turn the adjuster 2 turns counter-clockwise (less preload), back to 4 turns from collar backed off.',
      'Front rebound: 3 clicks out, back to 12 out from fully closed.',
    ]);
  });

  test('the log lists every entry in order, the baseline and the current settings', async () => {
    const log = (await a.get(`/bikes/${bikeId}/setup-log`).expect(200)).body;
    expect(log.entries.map((e: { kind: string }) => e.kind)).toEqual(['pass', 'change', 'change']);
    expect(log.entries[1].note).toBe('too soft on the brakes');
    expect(log.baseline.front).toEqual(expect.objectContaining({ preloadPosition: 5, dampers: { rebound: 12, compression: 10 }, rateNmm: 8.5 }));
    expect(log.current.front).toEqual(expect.objectContaining({ preloadPosition: 6.5, dampers: { rebound: 9, compression: 10 }, rateNmm: 9.5 }));
  });

  test('undoing every step by hand brings the plan to nothing to do', async () => {
    await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 5, dampers: { rebound: 12 }, spring: { rateNmm: 8.5, preloadMm: 10 } }, rear: { preloadPosition: 4 } }).expect(201);
    const { plan } = (await a.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(200)).body;
    expect(plan.atBaseline).toBe(true);
  });
});

test('a change the bike cannot take is refused by field and changes nothing', async () => {
  const bikeId = await addHandBike(a);
  const res = await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 16, dampers: { rebound: 25 } }, rear: { dampers: { compression: 3, rebound: 14.5 } } }).expect(400);
  expect(res.body.error.fields).toEqual({
    'front.preloadPosition': expect.stringMatching(/preload adjuster goes from/),
    'front.dampers.rebound': 'The setting must be from 0 (fully closed) to 20 clicks out (fully open).',
    'rear.dampers.compression': 'The shock has no compression adjuster recorded: add it to the bike first.',
    'rear.dampers.rebound': 'Set whole clicks.',
  });
  // The fork's rate limit is the bike's (50 N/mm), answered under the change's own path.
  const stiff = await a.post(`/bikes/${bikeId}/setup-log`, { front: { spring: { rateNmm: 60 } } }).expect(400);
  expect(Object.keys(stiff.body.error.fields)).toEqual(['front.spring.rateNmm']);
  await a.post(`/bikes/${bikeId}/setup-log`, {}).expect(400);
  expect((await a.get(`/bikes/${bikeId}/setup-log`).expect(200)).body.entries).toEqual([]);
  expect((await a.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(200)).body.plan).toBeNull();
});

test('the entry and the bike change in one transaction: a failed entry leaves the bike as it was', async () => {
  const bikeId = await addHandBike(a);
  await t.db.write((m) =>
    m.query(`CREATE TRIGGER "test_refuse_entry" BEFORE INSERT ON "setup_log_entry" WHEN NEW."note" = 'refuse' BEGIN SELECT RAISE(ABORT, 'refused by the test'); END`),
  );
  try {
    await a.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 9 }, note: 'refuse' }).expect(500);
  } finally {
    await t.db.write((m) => m.query(`DROP TRIGGER "test_refuse_entry"`));
  }
  const bike = await t.db.read.getRepository(Bike).findOneByOrFail({ id: bikeId });
  expect([bike.front?.adjuster.position, bike.front?.preloadMm]).toEqual([5, 10]);
  expect(await t.db.read.getRepository(SetupLogEntry).countBy({ bikeId })).toBe(0);
});

test("another rider cannot read or change this rider's log; the desk can, as itself", async () => {
  const bikeId = await addHandBike(a);
  const b = await as(t, await createAccount(t, 'rider'));
  await b.get(`/bikes/${bikeId}/setup-log`).expect(404);
  await b.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 6 } }).expect(404);
  await b.get(`/bikes/${bikeId}/setup-log/back-to-baseline`).expect(404);
  const deskUser = await createAccount(t, 'desk');
  const desk = await as(t, deskUser);
  const { entry } = (await desk.post(`/bikes/${bikeId}/setup-log`, { front: { preloadPosition: 6 } }).expect(201)).body;
  expect(entry.createdById).toBe(deskUser.id);
});
