/** The garage over HTTP: bikes from a shop model and by hand, field errors, and who sees whose bikes. */
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, handBike } from './helpers';

let t: TestContext;
let riderA: User;
let riderB: User;
let a: Client;
let b: Client;
let desk: Client;
let tarnId: number;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  riderA = await createAccount(t, 'rider');
  riderB = await createAccount(t, 'rider');
  [a, b, desk] = [await as(t, riderA), await as(t, riderB), await as(t, await createAccount(t, 'desk'))];
  const models = (await a.get('/bike-models').expect(200)).body.models;
  tarnId = models.find((m: { name: string }) => m.name === 'Tarn 690 Roadster').id;
});
afterAll(() => t.dispose());

describe('from a shop model', () => {
  test('copies the model values and keeps the link', async () => {
    const res = await a.post('/bikes', { modelId: tarnId, nickname: 'Blue one' }).expect(201);
    const tarn = DEMO_BIKE_MODELS[0];
    expect(res.body.bike).toEqual(
      expect.objectContaining({ nickname: 'Blue one', ownerId: riderA.id, model: { id: tarnId, name: 'Tarn 690 Roadster' }, masses: tarn.masses, front: tarn.front, rear: tarn.rear, draft: null, lastSizing: null }),
    );
  });

  test("with the rider's own changes to a part, and an end left out", async () => {
    const rebound = { kind: 'rebound', unit: 'turns' as const, maxPosition: 3, standard: 1.5, position: 2, dampingPerStepNsPerM: null };
    const rear = { ...DEMO_BIKE_MODELS[0].rear!, rateNmm: 105, dampers: [rebound] };
    const res = await a.post('/bikes', { modelId: tarnId, nickname: 'Stiffer', rear, front: null }).expect(201);
    expect(res.body.bike.front).toBeNull();
    expect(res.body.bike.rear).toEqual(rear);
    expect(res.body.bike.masses).toEqual(DEMO_BIKE_MODELS[0].masses);
  });

  test('an unknown model is a field error', async () => {
    const res = await a.post('/bikes', { modelId: 99999, nickname: 'Ghost' }).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['modelId']);
  });

  test('a bike outlives its model: the values stay, the link goes', async () => {
    const admin = await as(t, await createAccount(t, 'admin'));
    const model = (await admin.post('/bike-models', { name: 'Short Lived 250', ...handBike() }).expect(201)).body.model;
    const bikeId = (await a.post('/bikes', { modelId: model.id, nickname: 'Orphan' }).expect(201)).body.bike.id;
    await admin.delete(`/bike-models/${model.id}`).expect(204);
    const bike = (await a.get(`/bikes/${bikeId}`).expect(200)).body.bike;
    expect(bike.model).toBeNull();
    expect(bike.front).toEqual(model.front);
  });
});

describe('by hand', () => {
  test('stores what was entered, nulls filled in for what was left out', async () => {
    const spec = handBike();
    const { secondRateNmm: _s, breakMm: _b, ...front } = spec.front!;
    const res = await a.post('/bikes', { nickname: 'By hand', masses: spec.masses, front, rear: spec.rear }).expect(201);
    expect(res.body.bike).toEqual(expect.objectContaining({ model: null, masses: spec.masses, front: spec.front, rear: spec.rear }));
  });

  test('every bad field gets its own message', async () => {
    const spec = handBike();
    const res = await a
      .post('/bikes', {
        nickname: '',
        masses: { ...spec.masses, frontShare: 1.3 },
        front: { ...spec.front, travelMm: 'lots', adjuster: { ...spec.front!.adjuster, addsPreload: 'sideways' } },
        rear: { ...spec.rear, shockStrokeMm: 5 },
      })
      .expect(400);
    expect(res.body.error.code).toBe('invalid');
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['nickname', 'masses.frontShare', 'front.travelMm', 'front.adjuster.addsPreload', 'rear.shockStrokeMm']),
    );
  });

  test('masses and one end at least are needed', async () => {
    const res = await a.post('/bikes', { nickname: 'Empty' }).expect(400);
    expect(res.body.error.fields).toEqual(expect.objectContaining({ masses: expect.any(String), ends: expect.any(String) }));
  });

  test('an update replaces the values and keeps the model link', async () => {
    const id = (await a.post('/bikes', { modelId: tarnId, nickname: 'To edit' }).expect(201)).body.bike.id;
    const spec = { ...DEMO_BIKE_MODELS[0], nickname: 'Edited', masses: { ...DEMO_BIKE_MODELS[0].masses, massKg: 199 } };
    const res = await a.put(`/bikes/${id}`, spec).expect(200);
    expect(res.body.bike).toEqual(expect.objectContaining({ nickname: 'Edited', model: { id: tarnId, name: 'Tarn 690 Roadster' } }));
    expect(res.body.bike.masses.massKg).toBe(199);
  });
});

describe('ownership', () => {
  let bikeId: number;
  beforeAll(async () => {
    bikeId = await addHandBike(a, "A's bike");
  });

  test("rider B cannot read, change or delete rider A's bike: 404, as for no bike at all", async () => {
    const missing = await b.get('/bikes/999999').expect(404);
    const read = await b.get(`/bikes/${bikeId}`).expect(404);
    expect(read.body).toEqual(missing.body);
    await b.put(`/bikes/${bikeId}`, { nickname: 'Mine now', ...handBike() }).expect(404);
    await b.delete(`/bikes/${bikeId}`).expect(404);
    await b.get(`/bikes?riderId=${riderA.id}`).expect(404);
    expect((await b.get('/bikes').expect(200)).body.bikes).toEqual([]);
    expect((await a.get(`/bikes/${bikeId}`).expect(200)).body.bike.nickname).toBe("A's bike");
  });

  test("the desk reads a customer's garage and puts a bike in it", async () => {
    const garage = (await desk.get(`/bikes?riderId=${riderA.id}`).expect(200)).body.bikes;
    expect(garage.map((bike: { id: number }) => bike.id)).toContain(bikeId);
    const walkIn = await desk.post('/bikes', { riderId: riderB.id, modelId: tarnId, nickname: 'Walk-in' }).expect(201);
    expect(walkIn.body.bike.ownerId).toBe(riderB.id);
    expect((await b.get('/bikes').expect(200)).body.bikes.map((bike: { nickname: string }) => bike.nickname)).toEqual(['Walk-in']);
    await desk.put(`/bikes/${bikeId}`, { nickname: 'Serviced', ...handBike() }).expect(200);
  });

  test("a rider cannot put a bike in someone else's garage", async () => {
    const res = await a.post('/bikes', { riderId: riderB.id, modelId: tarnId, nickname: 'Gift' }).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['riderId']);
  });

  test('a deleted bike is gone', async () => {
    const id = await addHandBike(a, 'Short-lived');
    await a.delete(`/bikes/${id}`).expect(204);
    await a.get(`/bikes/${id}`).expect(404);
  });
});

test('the bike models are listed for everyone signed in, with every demo model', async () => {
  const counter = await as(t, await createAccount(t, 'counter'));
  const models = (await counter.get('/bike-models').expect(200)).body.models;
  expect(models.map((m: { name: string }) => m.name)).toEqual(expect.arrayContaining(DEMO_BIKE_MODELS.map((m) => m.name)));
  const one = (await counter.get(`/bike-models/${tarnId}`).expect(200)).body.model;
  expect(one.front.family).toBe('F37x320');
  await counter.get('/bike-models/abc').expect(404);
});
