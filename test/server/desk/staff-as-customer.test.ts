/**
 * A customer is a rider. Desk and admin name a customer with `?riderId=` (garage, weigh-in) or
 * `riderId` in a new bike's body; naming a staff account there gets exactly what an unknown id
 * gets, and its garage and weigh-in stay as they were. Staff ids answering like unknown ones: OWASP
 * API Security Top 10 (2023), API1 Broken Object Level Authorization.
 */
import { Bike } from '../../../server/entities/bike.entity';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import { as, Client, handBike, WEIGH_IN } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';

let t: TestContext;
let staff: User[];
let rider: User;
let callers: [string, Client][];
const UNKNOWN = 999_999;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
  const desk = await createAccount(t, 'desk');
  const admin = await createAccount(t, 'admin');
  staff = [await createAccount(t, 'desk'), await createAccount(t, 'counter'), await createAccount(t, 'admin')];
  rider = await createAccount(t, 'rider');
  // Staff accounts keep a garage and a weigh-in of their own, as anyone may.
  for (const user of [...staff, rider]) {
    const self = await as(t, user);
    await self.put('/weigh-in', WEIGH_IN).expect(200);
    await self.post('/bikes', { nickname: `Own bike of ${user.role}`, ...handBike() }).expect(201);
  }
  callers = [
    ['desk', await as(t, desk)],
    ['admin', await as(t, admin)],
  ];
});
afterAll(() => t.dispose());

const bikesOf = (ownerId: number) => t.db.read.getRepository(Bike).countBy({ ownerId });

describe.each([
  ['another desk account', 0],
  ['a counter account', 1],
  ['another admin account', 2],
])('%s named as a customer', (_label, index) => {
  test.each(['desk', 'admin'])("by the %s: garage and weigh-in answer as an unknown id does, nothing changes, and a rider's still answer", async (callerRole) => {
    const target = staff[index];
    const caller = callers.find(([role]) => role === callerRole)![1];
    const bikesBefore = await bikesOf(target.id);

    const unknownGarage = await caller.get(`/bikes?riderId=${UNKNOWN}`).expect(404);
    expect((await caller.get(`/bikes?riderId=${target.id}`).expect(404)).body).toEqual(unknownGarage.body);

    const unknownWeighIn = await caller.get(`/weigh-in?riderId=${UNKNOWN}`).expect(404);
    expect((await caller.get(`/weigh-in?riderId=${target.id}`).expect(404)).body).toEqual(unknownWeighIn.body);
    const unknownSet = await caller.put(`/weigh-in?riderId=${UNKNOWN}`, { ...WEIGH_IN, bodyKg: 120 }).expect(404);
    expect((await caller.put(`/weigh-in?riderId=${target.id}`, { ...WEIGH_IN, bodyKg: 120 }).expect(404)).body).toEqual(unknownSet.body);

    const unknownBike = await caller.post('/bikes', { riderId: UNKNOWN, nickname: 'Planted', ...handBike() }).expect(400);
    expect((await caller.post('/bikes', { riderId: target.id, nickname: 'Planted', ...handBike() }).expect(400)).body).toEqual(unknownBike.body);

    expect(await bikesOf(target.id)).toBe(bikesBefore);
    expect((await (await as(t, target)).get('/weigh-in').expect(200)).body.weighIn).toEqual(WEIGH_IN);

    // A rider is still a customer.
    expect((await caller.get(`/bikes?riderId=${rider.id}`).expect(200)).body.bikes).toHaveLength(await bikesOf(rider.id));
    expect((await caller.get(`/weigh-in?riderId=${rider.id}`).expect(200)).body.weighIn).toEqual(WEIGH_IN);
    await caller.post('/bikes', { riderId: rider.id, nickname: `Booked in by the ${callerRole}`, ...handBike() }).expect(201);
  });
});
