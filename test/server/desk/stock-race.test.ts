/**
 * Two riders accept quotes for the last shock spring at the same moment, over separate sockets:
 * exactly one gets it, the other is told it is no longer available and nothing of theirs changes.
 */
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { makeTestContext, TestContext } from '../test-context';
import { createQuote, DeskShop, listen, sendQuote, setUpDeskShop } from './helpers';

let t: TestContext;
let shop: DeskShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t, { fork: 4, shock: 1 });
});
afterAll(() => t.dispose());

test('the last spring goes to one acceptance; the other answers 409 out-of-stock', async () => {
  const lines = [
    { kind: 'spring', springId: shop.shockSpring.id, end: 'rear', quantity: 1 },
    { kind: 'labour', operationCode: 'shock-spring-swap' },
  ];
  const [a, b] = [await createQuote(shop, lines), await createQuote(shop, lines)];
  const [linkA, linkB] = [await sendQuote(t, shop, a.id), await sendQuote(t, shop, b.id)];
  const server = await listen(t);
  try {
    const answers = await Promise.all(
      [linkA.token, linkB.token].map((token) => fetch(`${server.base}/api/customer-quotes/${token}/accept`, { method: 'POST' }).then(async (r) => ({ status: r.status, body: await r.json() }))),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    const refused = answers.find((r) => r.status === 409)!;
    expect(refused.body.error.code).toBe('out-of-stock');
    expect(refused.body.error.message).toMatch(/no longer available/);
    const statuses = await Promise.all([a.id, b.id].map(async (id) => (await shop.asDesk.get(`/quotes/${id}`).expect(200)).body.quote.status));
    expect(statuses.sort()).toEqual(['accepted', 'sent']);
    expect(await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: shop.shockSpring.id })).toMatchObject({ onHand: 1, reserved: 1 });
  } finally {
    await server.close();
  }
});
