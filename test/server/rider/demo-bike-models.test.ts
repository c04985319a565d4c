/** The demo's invented bike models: fitted from the demo catalogue's families, one on a linkage, each sizeable. */
import { seed } from '../../../server/seed';
import { demoLadders } from '../../../server/seed/demo-catalogue';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';
import { createAccount } from '../auth/helpers';
import { as, WEIGH_IN } from './helpers';
import { makeTestContext, TestContext } from '../test-context';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
});
afterAll(() => t.dispose());

test('the models use the catalogue families, every one of them, and one a linkage curve', () => {
  const families = new Set(demoLadders.map((l) => l.family));
  const used = DEMO_BIKE_MODELS.flatMap((m) => [m.front?.family, m.rear?.family]);
  expect(new Set(used)).toEqual(families);
  expect(DEMO_BIKE_MODELS.filter((m) => m.rear?.linkage).length).toBe(1);
});

test('a bike made from each model sizes from the weights, with catalogue springs to choose from', async () => {
  const rider = await as(t, await createAccount(t, 'rider'));
  await rider.put('/weigh-in', WEIGH_IN).expect(200);
  const models = (await rider.get('/bike-models').expect(200)).body.models as { id: number; name: string }[];
  for (const model of DEMO_BIKE_MODELS) {
    const id = models.find((m) => m.name === model.name)?.id;
    const bike = (await rider.post('/bikes', { modelId: id, nickname: model.name }).expect(201)).body.bike;
    const { result } = (await rider.post(`/bikes/${bike.id}/sizing-records`, {}).expect(201)).body.record;
    for (const end of [result.front, result.rear]) {
      expect([model.name, end.mode, end.recommendation.candidates.length > 0]).toEqual([model.name, 'weights', true]);
    }
  }
});
