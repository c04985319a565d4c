/**
 * The test-ride loop over HTTP on the fixture bike (fork rebound 12 and compression 10 of 20
 * clicks): report, one proposed change, made (bike and setup log before/after in one write),
 * judged, a worse change taken back, no change tried twice, and the loop ending where the
 * adjuster's range does. The moves follow the seeded table (shared/damping/seeded-rules.ts) and
 * the step rule (shared/damping/step-size.ts: a clear feeling is 2 clicks on a 20-click adjuster,
 * a strong one 4), both common practice, no source. 409 for a request that conflicts with the
 * stored state: RFC 9110 §15.5.10.
 */
import { TestRide } from '../../../server/entities/test-ride.entity';
import { SetupLogEntry } from '../../../server/entities/setup-log-entry.entity';
import type { TestRideView } from '../../../shared/types/test-ride';
import { handBike, READINGS, WEIGH_IN } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { LoopShop, positionsOf, setUpLoopShop } from './helpers';

let t: TestContext;
let shop: LoopShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpLoopShop(t);
});
afterAll(() => t.dispose());

const CHATTER = { end: 'front', symptom: 'chatters-corners', strength: 'clear' };

const logOf = async (bikeId: number) => (await shop.asRider.get(`/bikes/${bikeId}/setup-log`).expect(200)).body.entries;

async function newBike(nickname: string, spec = handBike()): Promise<number> {
  return (await shop.asRider.post('/bikes', { nickname, ...spec }).expect(201)).body.bike.id;
}

describe('the loop on one symptom', () => {
  let bikeId: number;
  let firstProposal: TestRideView;
  let ride: TestRideView;

  beforeAll(async () => {
    bikeId = await newBike('Chatter bike');
  });

  test('a report gets one change: the first row the fork can make, compression out 2 clicks', async () => {
    const res = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { ...CHATTER, note: 'Skips over ripples at the apex' }).expect(201);
    firstProposal = res.body.ride;
    expect(firstProposal).toEqual(
      expect.objectContaining({ end: 'front', strength: 'clear', note: 'Skips over ripples at the apex', status: 'to-make', made: null, outcome: null, undoPlan: null }),
    );
    expect(firstProposal.symptom).toEqual(expect.objectContaining({ key: 'chatters-corners', words: 'Chatters in corners' }));
    // Seeded rows for chatter at the front: hs-compression (the fork has none), then compression, less.
    expect(firstProposal.proposal).toEqual({
      kind: 'change',
      change: expect.objectContaining({
        adjuster: 'compression',
        direction: 'less',
        unit: 'clicks',
        from: 10,
        to: 12,
        delta: 2,
        instruction: 'Front compression: turn out (counter-clockwise) 2 clicks, from 10 to 12 out from fully closed.',
        endStopWarning: null,
      }),
    });
    expect(firstProposal.statusText).toContain('Front compression: turn out');
    expect(res.body.superseded).toEqual([]);
    expect((await shop.asRider.get(`/bikes/${bikeId}/test-rides`).expect(200)).body.open.id).toBe(firstProposal.id);
  });

  test('a new report before the change is made closes the waiting proposal and says so', async () => {
    const res = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201);
    ride = res.body.ride;
    expect(res.body.superseded).toEqual([firstProposal.id]);
    expect(res.body.supersededText).toContain(`test ride ${firstProposal.id} (Front compression: turn out`);
    // It was never made, so it was never tried: the same change is proposed again.
    expect(ride.proposal).toEqual(firstProposal.proposal);
    const list = (await shop.asRider.get(`/bikes/${bikeId}/test-rides`).expect(200)).body;
    expect(list.rides.map((r: TestRideView) => [r.id, r.status])).toEqual([
      [ride.id, 'to-make'],
      [firstProposal.id, 'superseded'],
    ]);
    expect(list.open.id).toBe(ride.id);
    expect((await shop.asRider.post(`/test-rides/${firstProposal.id}/made`).expect(409)).body.error.code).toBe('superseded');
  });

  test('made: the bike moves and one log entry holds the settings before and after', async () => {
    const entriesBefore = (await logOf(bikeId)).length;
    const res = await shop.asRider.post(`/test-rides/${ride.id}/made`).expect(200);
    expect(res.body.ride).toEqual(expect.objectContaining({ status: 'to-judge', made: expect.objectContaining({ byId: shop.rider.id, setupLogEntryId: res.body.entry.id }) }));
    expect(res.body.entry).toEqual(
      expect.objectContaining({
        kind: 'change',
        note: 'Test ride: Chatters in corners: Front compression: turn out (counter-clockwise) 2 clicks, from 10 to 12 out from fully closed.',
        changes: [{ end: 'front', setting: 'damper', adjuster: 'compression', unit: 'clicks', from: 10, to: 12 }],
      }),
    );
    expect([res.body.entry.before.front.dampers, res.body.entry.after.front.dampers]).toEqual([
      { rebound: 12, compression: 10 },
      { rebound: 12, compression: 12 },
    ]);
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 12 });
    expect(await logOf(bikeId)).toHaveLength(entriesBefore + 1);
  });

  test('while it waits for its ride, nothing else is proposed, made again or undone', async () => {
    const report = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { ...CHATTER, end: 'rear' }).expect(409);
    expect(report.body.error).toEqual(expect.objectContaining({ code: 'ride-open', message: expect.stringContaining('tell how the last change rode first') }));
    expect((await shop.asRider.post(`/test-rides/${ride.id}/made`).expect(409)).body.error.code).toBe('already-made');
    expect((await shop.asRider.post(`/test-rides/${ride.id}/undo`).expect(409)).body.error.code).toBe('not-worse');
    expect(await t.db.read.getRepository(TestRide).countBy({ bikeId })).toBe(2);
  });

  test('worse: the answer carries the undo as a plan of clicks', async () => {
    const res = await shop.asRider.post(`/test-rides/${ride.id}/outcome`, { outcome: 'worse', note: 'Skipped even more' }).expect(200);
    const judged: TestRideView = res.body.ride;
    expect(judged.outcome).toEqual(expect.objectContaining({ outcome: 'worse', note: 'Skipped even more', byId: shop.rider.id }));
    expect(judged.undoPlan).toEqual({
      end: 'front',
      steps: [{ end: 'front', adjuster: 'compression', unit: 'clicks', from: 12, to: 10, instruction: 'Front compression: turn in (clockwise) 2 clicks, back to 10 out from fully closed.' }],
      missing: [],
      atTarget: false,
    });
    expect(judged.statusText).toContain('take the change back (Front compression: turn in (clockwise) 2 clicks');
    expect((await shop.asRider.post(`/test-rides/${ride.id}/outcome`, { outcome: 'better' }).expect(409)).body.error.code).toBe('already-judged');
    const list = (await shop.asRider.get(`/bikes/${bikeId}/test-rides`).expect(200)).body;
    expect(list.open).toBeNull();
    expect(list.rides[0].undoPlan).toEqual(judged.undoPlan);
  });

  test('undo: the adjuster goes back and the undo is one log entry', async () => {
    const res = await shop.asRider.post(`/test-rides/${ride.id}/undo`).expect(200);
    expect(res.body.ride).toEqual(expect.objectContaining({ status: 'undone', undoPlan: null, undone: expect.objectContaining({ setupLogEntryId: res.body.entry.id }) }));
    expect(res.body.ride.statusText).toBe('Rode worse and was taken back: Front compression is at 10 again.');
    expect(res.body.entry.note).toBe('Test ride undone: Chatters in corners: Front compression: turn in (clockwise) 2 clicks, back to 10 out from fully closed.');
    expect(res.body.entry.changes).toEqual([{ end: 'front', setting: 'damper', adjuster: 'compression', unit: 'clicks', from: 12, to: 10 }]);
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 10 });
    expect((await shop.asRider.post(`/test-rides/${ride.id}/undo`).expect(409)).body.error.code).toBe('already-undone');
  });

  test('reported again: a different change, never the one that rode worse, then further while it rides better', async () => {
    // Compression (less) rode worse, so the next row is tried: rebound, less, 12 -> 14.
    const moves: [string, number, number][] = [];
    for (const strength of ['clear', 'clear', 'strong']) {
      const report = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { ...CHATTER, strength }).expect(201);
      const { change } = report.body.ride.proposal;
      moves.push([change.adjuster, change.from, change.to]);
      if (strength === 'strong') expect(change.endStopWarning).toMatch(/within 2 clicks of fully open/);
      await shop.asRider.post(`/test-rides/${report.body.ride.id}/made`).expect(200);
      await shop.asRider.post(`/test-rides/${report.body.ride.id}/outcome`, { outcome: 'better' }).expect(200);
    }
    expect(moves).toEqual([
      ['rebound', 12, 14],
      ['rebound', 14, 16],
      ['rebound', 16, 20],
    ]);
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 20, compression: 10 });
  });

  test("the loop stops once the table's moves are used up: one rode worse, the other is at its stop", async () => {
    const res = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201);
    expect(res.body.ride.status).toBe('no-change');
    expect(res.body.ride.proposal.kind).toBe('none');
    expect(res.body.ride.proposal.reason).toMatch(/compression \(less damping\) made it worse/);
    expect(res.body.ride.proposal.reason).toMatch(/rebound \(less damping\) has no range left \(fully open\)/);
    expect(res.body.ride.statusText).toBe(res.body.ride.proposal.reason);
    expect((await shop.asRider.post(`/test-rides/${res.body.ride.id}/made`).expect(409)).body.error.code).toBe('not-a-change');
    expect((await shop.asRider.post(`/test-rides/${res.body.ride.id}/outcome`, { outcome: 'better' }).expect(409)).body.error.code).toBe('not-a-change');
    // Made, undone, and three made: five entries, each the loop's.
    expect((await logOf(bikeId)).map((entry: { note: string }) => entry.note.split(':')[0])).toEqual([
      'Test ride',
      'Test ride undone',
      'Test ride',
      'Test ride',
      'Test ride',
    ]);
  });
});

describe('the spring first', () => {
  test("a symptom the spring can cause is referred to the sizing when the bike's latest pass says change the spring", async () => {
    // A 5.5 N/mm fork spring under the fixture rider sinks to 46 mm of 120 (rider readings 131/135 from 180):
    // the engine's decision is "change" (too soft), the rest as the fixture.
    const spec = handBike();
    spec.front!.rateNmm = 5.5;
    const bikeId = await newBike('Soft fork', spec);
    await shop.asRider.put('/weigh-in', WEIGH_IN).expect(200);
    const readings = { ...READINGS, front: { ...READINGS.front, riderMm: { pushedMm: 131, liftedMm: 135 } } };
    const record = (await shop.asRider.post(`/bikes/${bikeId}/sizing-records`, { readings }).expect(201)).body.record;
    const sized = (await shop.asRider.get(`/sizing-records/${record.id}`).expect(200)).body.record.result.front.decision;
    expect(sized.kind).toBe('change');

    const res = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { end: 'front', symptom: 'dives-braking', strength: 'strong' }).expect(201);
    expect(res.body.ride.status).toBe('no-change');
    expect(res.body.ride.proposal).toEqual({ kind: 'spring', recordId: record.id, reason: expect.stringContaining(sized.text.headline.replace(/\.$/, '')) });
    expect((await shop.asRider.post(`/test-rides/${res.body.ride.id}/made`).expect(409)).body.error.code).toBe('not-a-change');

    // A feeling the spring does not give still gets a damper change on that bike.
    const bounce = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { end: 'front', symptom: 'bounces-after-bump', strength: 'slight' }).expect(201);
    expect(bounce.body.ride.proposal.change).toEqual(expect.objectContaining({ adjuster: 'rebound', direction: 'more', from: 12, to: 11 }));
  });
});

describe('refusals', () => {
  test('a change the adjuster can no longer take is refused, and nothing moves', async () => {
    const bikeId = await newBike('Short compression');
    const report = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201);
    expect(report.body.ride.proposal.change).toEqual(expect.objectContaining({ adjuster: 'compression', from: 10, to: 12 }));
    // The fork's compression turns out to have 11 clicks, corrected on the bike before the change is made.
    const spec = handBike();
    spec.front!.dampers[1] = { ...spec.front!.dampers[1], maxPosition: 11 };
    await shop.asRider.put(`/bikes/${bikeId}`, { nickname: 'Short compression', ...spec }).expect(200);
    const res = await shop.asRider.post(`/test-rides/${report.body.ride.id}/made`).expect(409);
    expect(res.body.error).toEqual(expect.objectContaining({ code: 'cannot-set', message: expect.stringContaining('from 0 (fully closed) to 11 clicks out') }));
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 10 });
    expect(await t.db.read.getRepository(SetupLogEntry).countBy({ bikeId })).toBe(0);
  });

  test('an adjuster moved by hand since the proposal is a 409: the proposal is from where it was', async () => {
    const bikeId = await newBike('Moved by hand');
    const report = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201);
    await shop.asRider.post(`/bikes/${bikeId}/setup-log`, { front: { dampers: { compression: 8 } } }).expect(201);
    const res = await shop.asRider.post(`/test-rides/${report.body.ride.id}/made`).expect(409);
    expect(res.body.error).toEqual(expect.objectContaining({ code: 'adjuster-moved', message: expect.stringContaining('is at 8 now, not at 10') }));
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 8 });
  });

  test('a worse change left on the bike is not undone while a later change waits for its ride; the same offers no undo', async () => {
    const bikeId = await newBike('Left worse');
    const first = (await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201)).body.ride;
    await shop.asRider.post(`/test-rides/${first.id}/made`).expect(200);
    await shop.asRider.post(`/test-rides/${first.id}/outcome`, { outcome: 'worse' }).expect(200);
    // The rider may report again without taking it back; the next row is tried from where the bike is.
    const second = (await shop.asRider.post(`/bikes/${bikeId}/test-rides`, CHATTER).expect(201)).body.ride;
    expect(second.proposal.change).toEqual(expect.objectContaining({ adjuster: 'rebound', from: 12, to: 14 }));
    await shop.asRider.post(`/test-rides/${second.id}/made`).expect(200);
    expect((await shop.asRider.post(`/test-rides/${first.id}/undo`).expect(409)).body.error.code).toBe('ride-open');
    const same = (await shop.asRider.post(`/test-rides/${second.id}/outcome`, { outcome: 'same' }).expect(200)).body.ride;
    expect([same.undoPlan, same.statusText]).toEqual([null, expect.stringMatching(/^Made no difference/)]);
    await shop.asRider.post(`/test-rides/${first.id}/undo`).expect(200);
    expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 14, compression: 10 });
  });

  test.each([
    ['an unknown symptom', { ...CHATTER, symptom: 'wobbles' }, 'symptom', /Choose a symptom/],
    ['a symptom the end cannot have', { end: 'rear', symptom: 'dives-braking', strength: 'clear' }, 'symptom', /at the front only, not the rear/],
    ['no strength', { end: 'front', symptom: 'chatters-corners' }, 'strength', /slight, clear or strong/],
    ['an unknown end', { ...CHATTER, end: 'middle' }, 'end', /front or rear/],
    ['a note past 500 characters', { ...CHATTER, note: 'x'.repeat(501) }, 'note', /500 characters/],
  ])('a report with %s is a 400 naming the field, and nothing is stored', async (_label, body, field, message) => {
    const before = await t.db.read.getRepository(TestRide).count();
    const res = await shop.asRider.post(`/bikes/${shop.bikeId}/test-rides`, body).expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await t.db.read.getRepository(TestRide).count()).toBe(before);
  });

  test('a report for an end the bike does not have is a 400 on the end', async () => {
    const bikeId = await newBike('No shock', { ...handBike(), rear: null });
    const res = await shop.asRider.post(`/bikes/${bikeId}/test-rides`, { end: 'rear', symptom: 'chatters-corners', strength: 'clear' }).expect(400);
    expect(res.body.error.fields.end).toMatch(/no shock recorded/);
  });

  test('an outcome that is not better, worse or same is a 400; an unknown ride a 404', async () => {
    const report = await shop.asRider.post(`/bikes/${shop.bikeId}/test-rides`, CHATTER).expect(201);
    expect((await shop.asRider.post(`/test-rides/${report.body.ride.id}/outcome`, { outcome: 'great' }).expect(400)).body.error.fields.outcome).toMatch(/better, worse or same/);
    expect((await shop.asRider.post(`/test-rides/${report.body.ride.id}/outcome`, { outcome: 'better' }).expect(409)).body.error.code).toBe('not-made');
    await shop.asRider.post('/test-rides/999999/made').expect(404);
    await shop.asRider.get('/bikes/999999/test-rides').expect(404);
  });
});
