/**
 * The counter's search totals are kept between requests; every write that can change one (a
 * receive, a reservation, a new spring, a deactivation, a confirmed import) shows in the next
 * search's total over HTTP, against a real SQLite file. Springs here are invented test data.
 */
import request from 'supertest';
import { seed } from '../../../server/seed';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, confirmImport, createSpring, dryRun, springInput, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;

beforeAll(async () => {
  t = await makeTestContext();
  await seed(t.db, { demo: true });
  tokens = (await accountsByRole(t)).tokens;
});
afterAll(() => t.dispose());

/** A fit of its own, so the demo catalogue does not move these totals. */
const FAMILY = 'S48x172';

async function total(query: string): Promise<number> {
  const answer = await request(t.app).get(`/api/catalogue/springs?${query}`).set('Authorization', tokens.counter).expect(200);
  return answer.body.total;
}

const post = (path: string, payload: object) => request(t.app).post(`/api${path}`).set('Authorization', tokens.counter).send(payload);

test('a stock movement changes the in-stock total at once', async () => {
  const spring = await createSpring(t, { sku: 'TOT-0001', family: FAMILY }, 0);
  const inStock = `kind=shock&family=${FAMILY}&inStock=true`;
  expect(await total(inStock)).toBe(0);
  await post(`/stock/${spring.id}/receive`, { quantity: 2, reason: 'Delivery 7' }).expect(201);
  expect(await total(inStock)).toBe(1);
  await post(`/stock/${spring.id}/reserve`, { quantity: 2, name: 'Job 7', reason: 'Promised' }).expect(201);
  expect(await total(inStock)).toBe(0);
});

test('a new spring and a deactivation change the totals at once', async () => {
  const fit = `kind=shock&family=${FAMILY}`;
  const before = await total(fit);
  const all = await total('');
  const created = await post('/catalogue/springs', springInput({ sku: 'TOT-0002', family: FAMILY })).expect(201);
  expect(await total(fit)).toBe(before + 1);
  expect(await total('')).toBe(all + 1);
  await post(`/catalogue/springs/${created.body.spring.id}/deactivate`, {}).expect(200);
  expect(await total(fit)).toBe(before);
  expect(await total('status=inactive')).toBeGreaterThanOrEqual(1);
});

test('a confirmed import changes the totals at once', async () => {
  const fit = `kind=shock&family=${FAMILY}`;
  const before = await total(fit);
  const csv = `sku,kind,family,rate,unit,free_length_mm,max_deflection_mm\nTOT-0003,shock,${FAMILY},95,N/mm,172,70\n`;
  const dry = await dryRun(t, tokens.counter, csv).expect(200);
  await confirmImport(t, tokens.counter, csv, dry.body.token).expect(201);
  expect(await total(fit)).toBe(before + 1);
});
