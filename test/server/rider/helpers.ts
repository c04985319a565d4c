/**
 * Bikes, weigh-ins and readings for the rider-flow tests, made through the real API. The hand-made
 * bike and the weigh-in are the ones of test/server/fixtures/sizing-two-ends.json, so a pass built
 * from them sends the engine that same request.
 */
import request from 'supertest';
import type { BikeSpec } from '../../../shared/types/bike';
import type { WeighIn } from '../../../shared/types/garage';
import type { Readings } from '../../../shared/types/sizing';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { bearer } from '../auth/helpers';
import { TestContext } from '../test-context';
import fixture from '../fixtures/sizing-two-ends.json';

/** 82 kg rider in 8 kg of gear, neutral position (rear share 0.65), road: the fixture's rider. */
export const WEIGH_IN: WeighIn = {
  bodyKg: 82,
  gear: { helmet: 1.5, jacket: 2.5, trousers: 1.5, boots: 2.5 },
  loads: [],
  discipline: 'road',
  position: 'neutral',
  rearShare: 0.65,
};

export const READINGS = { front: fixture.front.readings as Readings, rear: fixture.rear.readings as Readings };

/**
 * The fixture's bike, with what only the garage keeps: each adjuster's zero and direction, and the
 * damping adjusters (fork rebound 12 and compression 10 of 20 clicks; shock rebound 14 of 24).
 */
export function handBike(): BikeSpec {
  const { readings: _front, ...front } = fixture.front;
  const { readings: _rear, ...rear } = fixture.rear;
  return {
    masses: { ...fixture.bike },
    front: {
      ...front,
      springCount: 2,
      secondRateNmm: null,
      breakMm: null,
      adjuster: { ...front.adjuster, kind: 'threaded', zeroReference: 'caps fully out', addsPreload: 'clockwise' },
      dampers: [
        { kind: 'rebound', unit: 'clicks', maxPosition: 20, standard: null, position: 12, dampingPerStepNsPerM: null },
        { kind: 'compression', unit: 'clicks', maxPosition: 20, standard: null, position: 10, dampingPerStepNsPerM: null },
      ],
    },
    rear: {
      ...rear,
      linkage: null,
      secondRateNmm: null,
      breakMm: null,
      adjuster: { ...rear.adjuster, kind: 'threaded', zeroReference: 'collar backed off', addsPreload: 'clockwise' },
      dampers: [{ kind: 'rebound', unit: 'clicks', maxPosition: 24, standard: null, position: 14, dampingPerStepNsPerM: null }],
    },
  };
}

export type Client = Awaited<ReturnType<typeof as>>;

/** Supertest calls signed in as one user. */
export async function as(t: TestContext, user: Pick<User, 'id'>) {
  const auth = await bearer(t, user);
  const call = (method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string, body?: object) => {
    const req = request(t.app)[method](`/api${path}`).set('Authorization', auth);
    return body === undefined ? req : req.send(body);
  };
  return {
    get: (path: string) => call('get', path),
    post: (path: string, body: object = {}) => call('post', path, body),
    put: (path: string, body: object = {}) => call('put', path, body),
    patch: (path: string, body: object = {}) => call('patch', path, body),
    delete: (path: string) => call('delete', path),
  };
}

export async function addHandBike(client: Client, nickname = 'Test bike'): Promise<number> {
  const res = await client.post('/bikes', { nickname, ...handBike() }).expect(201);
  return res.body.bike.id;
}

/**
 * Real ids for the authorization matrix: bike models and bikes of `rider` (one of each only to be
 * deleted, since the matrix walks the delete routes among the others), a weigh-in and a saved pass.
 */
export async function makeRiderFlowFixtures(t: TestContext, rider: User, admin: User) {
  await seed(t.db, { demo: false });
  const [asRider, asAdmin] = [await as(t, rider), await as(t, admin)];
  const model = await asAdmin.post('/bike-models', { name: 'Matrix 500 Test', ...handBike() }).expect(201);
  const doomedModel = await asAdmin.post('/bike-models', { name: 'Matrix 501 Test', ...handBike() }).expect(201);
  const bikeId = await addHandBike(asRider, 'Matrix bike');
  const doomedBikeId = await addHandBike(asRider, 'Matrix bike to delete');
  await asRider.put('/weigh-in', WEIGH_IN).expect(200);
  const record = await asRider.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201);
  return {
    modelId: String(model.body.model.id),
    doomedModelId: String(doomedModel.body.model.id),
    bikeId: String(bikeId),
    doomedBikeId: String(doomedBikeId),
    recordId: String(record.body.record.id),
  };
}
