/**
 * What the desk and riders see of the catalogue: rates and availability, never cost, supplier,
 * bin or stock counts, on any route that shows springs to them, while the counter and the admin
 * see everything. (The authorization matrix covers who may call which route at all.)
 */
import request from 'supertest';
import { Role } from '../../../shared/types/roles';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, createSpring, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;
let id: number;

beforeAll(async () => {
  t = await makeTestContext();
  ({ tokens } = await accountsByRole(t));
  id = (await createSpring(t, { sku: 'VIEW-1', family: 'S58x155', rateNmm: 95, reorderPoint: 9 }, 3)).id;
});
afterAll(() => t.dispose());

const HIDDEN = ['costCents', 'supplier', 'supplierCode', 'bin', 'onHand', 'reserved', 'reorderPoint', 'belowReorderPoint'];

/** Every key anywhere in the answer. */
function keysIn(value: unknown, out = new Set<string>()): Set<string> {
  if (Array.isArray(value)) value.forEach((v) => keysIn(v, out));
  else if (value && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      out.add(key);
      keysIn(inner, out);
    }
  }
  return out;
}

const reads: [string, (role: Role) => request.Test][] = [
  ['list', (role) => request(t.app).get('/api/catalogue/springs?q=view').set('Authorization', tokens[role])],
  ['detail', (role) => request(t.app).get(`/api/catalogue/springs/${id}`).set('Authorization', tokens[role])],
  ['rates for a fit', (role) => request(t.app).get('/api/catalogue/rates-for-fit?kind=shock&family=S58x155&rate=90').set('Authorization', tokens[role])],
];

test.each(reads)('%s: riders and the desk get no cost, supplier, bin or stock counts; staff get them', async (_name, call) => {
  for (const role of ['rider', 'desk'] as const) {
    const res = await call(role).expect(200);
    expect(JSON.stringify(res.body)).toMatch(/VIEW-1/);
    expect([...keysIn(res.body)].filter((k) => HIDDEN.includes(k))).toEqual([]);
    expect(keysIn(res.body).has('available')).toBe(true);
  }
  for (const role of ['counter', 'admin'] as const) {
    expect([...keysIn((await call(role).expect(200)).body)]).toEqual(expect.arrayContaining(HIDDEN));
  }
});

test('identify answers the desk with the summary view too', async () => {
  const res = await request(t.app)
    .post('/api/catalogue/identify')
    .set('Authorization', tokens.desk)
    .send({ wireDiameterMm: 12, outerDiameterMm: 82, activeCoils: 8, material: 'chrome-silicon', kind: 'shock', family: 'S58x155' })
    .expect(200);
  expect(res.body.matches[0].spring.sku).toBe('VIEW-1');
  expect([...keysIn(res.body)].filter((k) => HIDDEN.includes(k))).toEqual([]);
});

test('riders cannot search by supplier code or filter on what they do not see', async () => {
  await createSpring(t, { sku: 'VIEW-2', supplierCode: 'SECRET-CODE' }, 1);
  expect((await request(t.app).get('/api/catalogue/springs?q=secret').set('Authorization', tokens.rider).expect(200)).body.total).toBe(0);
  expect((await request(t.app).get('/api/catalogue/springs?q=secret').set('Authorization', tokens.counter).expect(200)).body.total).toBe(1);
  const refused = await request(t.app).get('/api/catalogue/springs?belowReorder=true&sort=onHand&status=all').set('Authorization', tokens.rider).expect(400);
  expect(Object.keys(refused.body.error.fields).sort()).toEqual(['belowReorder', 'sort', 'status']);
});
