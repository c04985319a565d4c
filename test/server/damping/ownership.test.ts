/**
 * Whose rides a caller reaches: a rider only their own bikes' (another rider's ride or bike
 * answers exactly as an unknown id does, and nothing changes), the desk and the admin any
 * customer's, with the whole loop run for the customer at the counter. The counter role, like any
 * account, reaches its own bikes only, as the bike routes allow. Ids of others answering like
 * unknown ones: OWASP API Security Top 10 (2023), API1 Broken Object Level Authorization.
 */
import { TestRide } from '../../../server/entities/test-ride.entity';
import { makeTestContext, TestContext } from '../test-context';
import { databaseChecksum } from '../security/db-checksum';
import { LoopShop, positionsOf, setUpLoopShop } from './helpers';
import { addHandBike, Client } from '../rider/helpers';

let t: TestContext;
let shop: LoopShop;

const CHATTER = { end: 'front', symptom: 'chatters-corners', strength: 'clear' };
const UNKNOWN = 999_999;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpLoopShop(t);
});
afterAll(() => t.dispose());

/** Every ride and plan route of the loop, for one bike and one ride. */
function loopCalls(client: Client, bikeId: number, rideId: number) {
  return [
    () => client.get(`/bikes/${bikeId}/test-rides`),
    () => client.post(`/bikes/${bikeId}/test-rides`, CHATTER),
    () => client.post(`/test-rides/${rideId}/made`),
    () => client.post(`/test-rides/${rideId}/outcome`, { outcome: 'worse' }),
    () => client.post(`/test-rides/${rideId}/undo`),
    () => client.get(`/bikes/${bikeId}/damper-plans`),
    () => client.post(`/bikes/${bikeId}/damper-plans/standard`, { end: 'front' }),
    () => client.post(`/bikes/${bikeId}/damper-plans/baseline`, { end: 'front' }),
  ];
}

test("another rider gets, on every route, what an unknown id gets, and nothing of the rider's changes", async () => {
  const ride = (await shop.asRider.post(`/bikes/${shop.bikeId}/test-rides`, CHATTER).expect(201)).body.ride;
  const before = await databaseChecksum(t);
  const theirs = loopCalls(shop.asOtherRider, shop.bikeId, ride.id);
  const unknown = loopCalls(shop.asOtherRider, UNKNOWN, UNKNOWN);
  for (const [index, call] of theirs.entries()) {
    const [res, nobody] = [await call(), await unknown[index]()];
    expect([res.status, res.body]).toEqual([404, nobody.body]);
    expect(nobody.status).toBe(404);
  }
  expect(await databaseChecksum(t)).toBe(before);
});

test.each(['desk', 'admin'] as const)("the %s runs the customer's loop: report, made, worse, undo", async (role) => {
  const client = role === 'desk' ? shop.asDesk : shop.asAdmin;
  const staff = role === 'desk' ? shop.desk : shop.admin;
  const bikeId = await addHandBike(shop.asRider, `Customer bike for the ${role}`);
  const report = await client.post(`/bikes/${bikeId}/test-rides`, { ...CHATTER, note: 'Customer at the counter' }).expect(201);
  expect(report.body.ride.reported.byId).toBe(staff.id);
  const made = await client.post(`/test-rides/${report.body.ride.id}/made`).expect(200);
  expect(made.body.entry.createdById).toBe(staff.id);
  await client.post(`/test-rides/${report.body.ride.id}/outcome`, { outcome: 'worse' }).expect(200);
  await client.post(`/test-rides/${report.body.ride.id}/undo`).expect(200);
  expect(await positionsOf(shop.asRider, bikeId, 'front')).toEqual({ rebound: 12, compression: 10 });
  // The rider sees the same rides the desk made for them.
  const list = (await shop.asRider.get(`/bikes/${bikeId}/test-rides`).expect(200)).body;
  expect(list.rides.map((r: { status: string }) => r.status)).toEqual(['undone']);
  await client.get(`/bikes/${bikeId}/damper-plans`).expect(200);
});

test("the counter reaches its own bike's loop and no customer's", async () => {
  const ownBikeId = await addHandBike(shop.asCounter, 'Counter clerk’s own bike');
  const own = await shop.asCounter.post(`/bikes/${ownBikeId}/test-rides`, CHATTER).expect(201);
  await shop.asCounter.post(`/test-rides/${own.body.ride.id}/made`).expect(200);

  const customerRide = (await shop.asRider.post(`/bikes/${shop.bikeId}/test-rides`, CHATTER).expect(201)).body.ride;
  const rides = await t.db.read.getRepository(TestRide).count();
  for (const call of loopCalls(shop.asCounter, shop.bikeId, customerRide.id)) expect((await call()).status).toBe(404);
  expect(await t.db.read.getRepository(TestRide).count()).toBe(rides);
});
