/**
 * Back to the maker's standard and back to the baseline, per end, over HTTP: the plans as turns
 * from the closed stop, and either one put on the bike as a single setup-log entry. The bike's
 * standards are invented test values (fork rebound 10 and compression 8 of 20 clicks; the shock's
 * compression 6 of 16, its rebound's standard unknown); counting from the closed stop is service-
 * manual practice (common practice, no source).
 */
import { SetupLogEntry } from '../../../server/entities/setup-log-entry.entity';
import type { DamperPlans } from '../../../shared/types/test-ride';
import { makeTestContext, TestContext } from '../test-context';
import { bikeWithDampers, clicks, LoopShop, positionsOf, setUpLoopShop } from './helpers';

let t: TestContext;
let shop: LoopShop;
let bikeId: number;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpLoopShop(t);
  const spec = bikeWithDampers([clicks('rebound', 12, 20, 10), clicks('compression', 10, 20, 8)], [clicks('rebound', 14, 24), clicks('compression', 6, 16, 6)]);
  bikeId = (await shop.asRider.post('/bikes', { nickname: 'Standards known', ...spec }).expect(201)).body.bike.id;
});
afterAll(() => t.dispose());

const plansOf = async (): Promise<DamperPlans> => (await shop.asRider.get(`/bikes/${bikeId}/damper-plans`).expect(200)).body;
const entries = () => t.db.read.getRepository(SetupLogEntry).find({ where: { bikeId }, order: { id: 'ASC' } });

test('with an empty log the settings now are the baseline; the standard is counted from the closed stop', async () => {
  const plans = await plansOf();
  expect(plans.baselineText).toMatch(/log is empty/);
  expect(plans.front!.baseline).toEqual({ end: 'front', steps: [], missing: [], atTarget: true });
  expect(plans.front!.standard.steps).toEqual([
    { end: 'front', adjuster: 'rebound', unit: 'clicks', from: 12, to: 10, instruction: 'Front rebound: turn in (clockwise) until it stops, then out 10 clicks.' },
    { end: 'front', adjuster: 'compression', unit: 'clicks', from: 10, to: 8, instruction: 'Front compression: turn in (clockwise) until it stops, then out 8 clicks.' },
  ]);
  // The shock's compression is at its standard; its rebound has none known, so it is listed, not planned.
  expect(plans.rear!.standard).toEqual({ end: 'rear', steps: [], missing: ['Rear rebound: no standard setting is known.'], atTarget: true });
  const res = await shop.asRider.post(`/bikes/${bikeId}/damper-plans/standard`, { end: 'rear' }).expect(409);
  expect(res.body.error).toEqual(expect.objectContaining({ code: 'at-target', message: expect.stringContaining("at the maker's standard already") }));
});

test("back to the maker's standard is one log entry; afterwards the standard is reached and the baseline is a plan", async () => {
  await shop.asRider.post(`/bikes/${bikeId}/setup-log`, { front: { dampers: { rebound: 15 } } }).expect(201);
  expect((await plansOf()).front!.baseline.steps.map((step) => [step.adjuster, step.from, step.to])).toEqual([['rebound', 15, 12]]);

  const before = (await entries()).length;
  const res = await shop.asRider.post(`/bikes/${bikeId}/damper-plans/standard`, { end: 'front' }).expect(201);
  expect(res.body.target).toBe('standard');
  expect(res.body.entry.note).toBe("Back to the maker's standard (front damping)");
  expect(res.body.entry.changes).toEqual([
    { end: 'front', setting: 'damper', adjuster: 'rebound', unit: 'clicks', from: 15, to: 10 },
    { end: 'front', setting: 'damper', adjuster: 'compression', unit: 'clicks', from: 10, to: 8 },
  ]);
  expect(await entries()).toHaveLength(before + 1);
  expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 10, compression: 8 });

  const plans = await plansOf();
  expect(plans.front!.standard).toEqual({ end: 'front', steps: [], missing: [], atTarget: true });
  expect(plans.baselineText).toMatch(/before the first setup-log entry/);
  expect(plans.front!.baseline.steps.map((step) => [step.adjuster, step.from, step.to])).toEqual([
    ['rebound', 10, 12],
    ['compression', 8, 10],
  ]);
  expect((await shop.asRider.post(`/bikes/${bikeId}/damper-plans/standard`, { end: 'front' }).expect(409)).body.error.code).toBe('at-target');
});

test('back to the baseline is one log entry, and then the baseline is reached', async () => {
  const before = (await entries()).length;
  const res = await shop.asRider.post(`/bikes/${bikeId}/damper-plans/baseline`, { end: 'front' }).expect(201);
  expect(res.body.entry.note).toBe('Back to the baseline (front damping)');
  expect(await entries()).toHaveLength(before + 1);
  expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 10 });
  expect((await plansOf()).front!.baseline.atTarget).toBe(true);
});

test('an adjuster without a target is left as it is and listed in the answer', async () => {
  await shop.asRider.post(`/bikes/${bikeId}/setup-log`, { rear: { dampers: { rebound: 20, compression: 4 } } }).expect(201);
  const res = await shop.asRider.post(`/bikes/${bikeId}/damper-plans/standard`, { end: 'rear' }).expect(201);
  expect(res.body.plan.missing).toEqual(['Rear rebound: no standard setting is known.']);
  expect(res.body.entry.changes).toEqual([{ end: 'rear', setting: 'damper', adjuster: 'compression', unit: 'clicks', from: 4, to: 6 }]);
  expect(await positionsOf(shop.asRider, bikeId, 'rear')).toEqual({ rebound: 20, compression: 6 });
});

test('a target the path cannot name is a 404, a body without an end a 400, an end without adjusters a 400', async () => {
  await shop.asRider.post(`/bikes/${bikeId}/damper-plans/factory`, { end: 'front' }).expect(404);
  expect((await shop.asRider.post(`/bikes/${bikeId}/damper-plans/standard`, {}).expect(400)).body.error.fields.end).toMatch(/front or rear/);
  const bare = bikeWithDampers([], [clicks('rebound', 14, 24)]);
  const bareId = (await shop.asRider.post('/bikes', { nickname: 'No fork adjusters', ...bare }).expect(201)).body.bike.id;
  expect((await shop.asRider.get(`/bikes/${bareId}/damper-plans`).expect(200)).body.front).toBeNull();
  expect((await shop.asRider.post(`/bikes/${bareId}/damper-plans/baseline`, { end: 'front' }).expect(400)).body.error.fields.end).toMatch(/no damping adjusters at the front/);
});
