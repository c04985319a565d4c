/**
 * A shop for the test-ride loop tests, made through the real services and API: the baseline seed
 * (the damping table's common-practice rows, the six adjuster kinds of the trade), an account per
 * role, a second rider, and the rider's fixture bike (fork rebound 12 and compression 10 of 20
 * clicks, shock rebound 14 of 24; test/server/rider/helpers.ts).
 */
import { DampingRule } from '../../../server/entities/damping-rule.entity';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import type { BikeSpec } from '../../../shared/types/bike';
import type { DamperAdjuster } from '../../../shared/types/damping';
import { createAccount } from '../auth/helpers';
import { addHandBike, as, Client, handBike } from '../rider/helpers';
import { TestContext } from '../test-context';

export interface LoopShop {
  rider: User;
  otherRider: User;
  desk: User;
  counter: User;
  admin: User;
  asRider: Client;
  asOtherRider: Client;
  asDesk: Client;
  asCounter: Client;
  asAdmin: Client;
  bikeId: number;
}

export async function setUpLoopShop(t: TestContext): Promise<LoopShop> {
  await seed(t.db, { demo: false });
  const [rider, otherRider, desk, counter, admin] = [
    await createAccount(t, 'rider'),
    await createAccount(t, 'rider'),
    await createAccount(t, 'desk'),
    await createAccount(t, 'counter'),
    await createAccount(t, 'admin'),
  ];
  const asRider = await as(t, rider);
  return {
    rider,
    otherRider,
    desk,
    counter,
    admin,
    asRider,
    asOtherRider: await as(t, otherRider),
    asDesk: await as(t, desk),
    asCounter: await as(t, counter),
    asAdmin: await as(t, admin),
    bikeId: await addHandBike(asRider, 'Loop bike'),
  };
}

/** The fixture bike with other damping adjusters. */
export function bikeWithDampers(front: DamperAdjuster[], rear: DamperAdjuster[]): BikeSpec {
  const bike = handBike();
  return { ...bike, front: { ...bike.front!, dampers: front }, rear: { ...bike.rear!, dampers: rear } };
}

export function clicks(kind: string, position: number, maxPosition: number, standard: number | null = null): DamperAdjuster {
  return { kind, unit: 'clicks', maxPosition, standard, position, dampingPerStepNsPerM: null };
}

/** The bike's adjuster positions at one end, by kind. */
export async function positionsOf(client: Client, bikeId: number, end: 'front' | 'rear'): Promise<Record<string, number>> {
  const res = await client.get(`/bikes/${bikeId}`).expect(200);
  return Object.fromEntries((res.body.bike[end].dampers as DamperAdjuster[]).map((damper) => [damper.kind, damper.position]));
}

/** Real ids for the route tables' walks (authorization matrix, fuzz): a ride proposed on `bikeId` and a row of the table. */
export async function makeLoopFixtures(t: TestContext, rider: User, bikeId: string): Promise<{ rideId: string; ruleId: string }> {
  const report = await (await as(t, rider)).post(`/bikes/${bikeId}/test-rides`, { end: 'front', symptom: 'chatters-corners', strength: 'clear' }).expect(201);
  const [rule] = await t.db.read.getRepository(DampingRule).find({ select: { id: true }, order: { id: 'ASC' }, take: 1 });
  return { rideId: String(report.body.ride.id), ruleId: String(rule.id) };
}
