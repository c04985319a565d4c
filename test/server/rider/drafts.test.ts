/** The measuring flow's draft over HTTP: saved at every step, read back as saved, finished by a saved pass. */
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { createAccount } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { addHandBike, as, Client, READINGS, WEIGH_IN } from './helpers';

let t: TestContext;
let rider: User;
let a: Client;
let bikeId: number;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: false });
  rider = await createAccount(t, 'rider');
  a = await as(t, rider);
  await a.put('/weigh-in', WEIGH_IN).expect(200);
});
beforeEach(async () => {
  bikeId = await addHandBike(a);
});
afterAll(() => t.dispose());

const partial = {
  step: 'front-static',
  answers: { weighInConfirmed: true, ends: ['front', 'rear'], front: { extendedMm: 180, staticMm: { pushedMm: 158 } } },
};

test('no draft at first', async () => {
  expect((await a.get(`/bikes/${bikeId}/draft`).expect(200)).body).toEqual({ draft: null });
});

test('a partial save reads back identical, and shows in the garage', async () => {
  const saved = (await a.put(`/bikes/${bikeId}/draft`, partial).expect(200)).body.draft;
  expect(saved).toEqual(expect.objectContaining({ bikeId, ...partial, hints: null }));
  const read = (await a.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft;
  expect(read).toEqual(saved);
  const garage = (await a.get('/bikes').expect(200)).body.bikes;
  expect(garage.find((bike: { id: number }) => bike.id === bikeId).draft).toEqual({ step: 'front-static', updatedAt: saved.updatedAt });
});

test('saving the same twice leaves the same draft; a later save replaces it whole', async () => {
  const first = (await a.put(`/bikes/${bikeId}/draft`, partial).expect(200)).body.draft;
  t.advanceClock(1000);
  const again = (await a.put(`/bikes/${bikeId}/draft`, partial).expect(200)).body.draft;
  expect({ ...again, updatedAt: first.updatedAt }).toEqual(first);
  const next = { step: 'rear-extended', answers: { ends: ['rear'], rear: { extendedMm: 600 } } };
  const replaced = (await a.put(`/bikes/${bikeId}/draft`, next).expect(200)).body.draft;
  expect(replaced).toEqual(expect.objectContaining({ ...next, createdAt: first.createdAt }));
  expect(replaced.answers.front).toBeUndefined();
});

test('invalid values get field errors and leave the saved draft as it was', async () => {
  await a.put(`/bikes/${bikeId}/draft`, partial).expect(200);
  const res = await a
    .put(`/bikes/${bikeId}/draft`, { step: 'front-rider', answers: { front: { extendedMm: 180, staticMm: 'x', riderMm: { pushedMm: 185, liftedMm: 187 } } } })
    .expect(400);
  expect(Object.keys(res.body.error.fields).sort()).toEqual(['answers.front.riderMm', 'answers.front.staticMm']);
  // The fork's travel is 120 mm, so 180 - 40 = 140 mm of rider sag cannot be.
  const beyond = await a.put(`/bikes/${bikeId}/draft`, { step: 'front-rider', answers: { front: { extendedMm: 180, riderMm: 40 } } }).expect(400);
  expect(beyond.body.error.fields['answers.front.riderMm']).toMatch(/more than the travel/);
  await a.put(`/bikes/${bikeId}/draft`, { step: 'nowhere' }).expect(400);
  expect((await a.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft.answers).toEqual(partial.answers);
});

test('saving a pass finishes the draft', async () => {
  const complete = { step: 'review', answers: { weighInConfirmed: true, ends: ['front', 'rear'], ...READINGS } };
  await a.put(`/bikes/${bikeId}/draft`, complete).expect(200);
  const record = (await a.post(`/bikes/${bikeId}/sizing-records`, { useDraft: true }).expect(201)).body.record;
  expect(record.request.front.readings).toEqual(READINGS.front);
  expect((await a.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft).toBeNull();
});

test('a draft with readings missing cannot be saved as a pass', async () => {
  await a.put(`/bikes/${bikeId}/draft`, partial).expect(200);
  const res = await a.post(`/bikes/${bikeId}/sizing-records`, { useDraft: true }).expect(400);
  expect(Object.keys(res.body.error.fields).sort()).toEqual(['readings.front', 'readings.rear']);
  expect((await a.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft).not.toBeNull();
});

test('re-measuring after adjusting starts afresh with the last readings as hints', async () => {
  const record = (await a.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201)).body.record;
  await a.put(`/bikes/${bikeId}/draft`, partial).expect(200);
  const draft = (await a.post(`/bikes/${bikeId}/draft`, { remeasure: true }).expect(201)).body.draft;
  expect(draft).toEqual(expect.objectContaining({ step: 'weigh-in', answers: {} }));
  expect(draft.hints).toEqual({ fromRecordId: record.id, measuredAt: record.createdAt, ends: ['front', 'rear'], front: READINGS.front, rear: READINGS.rear });
  // Saving steps keeps the hints.
  const saved = (await a.put(`/bikes/${bikeId}/draft`, partial).expect(200)).body.draft;
  expect(saved.hints).toEqual(draft.hints);
  expect((await a.post(`/bikes/${bikeId}/draft`, {}).expect(201)).body.draft.hints).toBeNull();
});

test('delete is idempotent', async () => {
  await a.put(`/bikes/${bikeId}/draft`, partial).expect(200);
  await a.delete(`/bikes/${bikeId}/draft`).expect(204);
  await a.delete(`/bikes/${bikeId}/draft`).expect(204);
  expect((await a.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft).toBeNull();
});

test("another rider cannot read, save or delete this rider's draft; the desk can", async () => {
  await a.put(`/bikes/${bikeId}/draft`, partial).expect(200);
  const b = await as(t, await createAccount(t, 'rider'));
  await b.get(`/bikes/${bikeId}/draft`).expect(404);
  await b.put(`/bikes/${bikeId}/draft`, partial).expect(404);
  await b.post(`/bikes/${bikeId}/draft`, {}).expect(404);
  await b.delete(`/bikes/${bikeId}/draft`).expect(404);
  const desk = await as(t, await createAccount(t, 'desk'));
  expect((await desk.get(`/bikes/${bikeId}/draft`).expect(200)).body.draft.answers).toEqual(partial.answers);
});
