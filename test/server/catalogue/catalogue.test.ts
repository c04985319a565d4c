/**
 * The catalogue routes over HTTP against a real SQLite file: search with filters, sorting and
 * pages, detail with history, create, update, deactivate, the fits, the nearest rates of a fit,
 * the low-stock list and the re-order sheet, and identifying a spring.
 * Unit check values: NIST SP 811 (2008), B.8 (1 kgf = 9.80665 N exactly, 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm).
 */
import request from 'supertest';
import { parse } from 'csv-parse/sync';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, createSpring, springInput, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;

beforeAll(async () => {
  t = await makeTestContext();
  ({ tokens } = await accountsByRole(t));
  // A small fit of its own, so the figures below do not depend on anything else in the file.
  await createSpring(t, { sku: 'CAT-S-080', family: 'S60x160', rateNmm: 80, reorderPoint: 2, supplierCode: 'QX-880' }, 1);
  await createSpring(t, { sku: 'CAT-S-098', family: 'S60x160', rateNmm: 98.0665, reorderPoint: 1, supplierCode: 'QX-898' }, 4);
  await createSpring(t, { sku: 'CAT-S-105', family: 'S60x160', rateNmm: 105, reorderPoint: 0, supplierCode: 'QX-905' }, 0);
  await createSpring(t, { sku: 'CAT-F-090', kind: 'fork', family: 'F41x300', rateNmm: 9, freeLengthMm: 300, maxDeflectionMm: 180, innerDiameterMm: 28, outerDiameterMm: 38, wireDiameterMm: 5 }, 6);
});
afterAll(() => t.dispose());

const get = (path: string, role: keyof Tokens = 'counter') => request(t.app).get(`/api${path}`).set('Authorization', tokens[role]);
const skus = (res: request.Response) => res.body.springs.map((s: { sku: string }) => s.sku);

describe('search', () => {
  test('filters by kind and family, with the total and the rate in the unit asked for', async () => {
    const res = await get('/catalogue/springs?family=S60x160&kind=shock&unit=kgf/mm').expect(200);
    expect(skus(res)).toEqual(['CAT-S-080', 'CAT-S-098', 'CAT-S-105']);
    expect(res.body).toEqual(expect.objectContaining({ total: 3, page: 1, pageSize: 50, unit: 'kgf/mm' }));
    // 98.0665 N/mm / 9.80665 N/mm per kgf/mm = 10 kgf/mm.
    expect(res.body.springs[1].rateInUnit).toBeCloseTo(10, 12);
  });

  test('a rate range given in kgf/mm or lbf/in is converted before it filters', async () => {
    // 10 kgf/mm = 98.0665 N/mm exactly: the bound includes the spring at that rate.
    expect(skus(await get('/catalogue/springs?family=S60x160&rateMin=10&unit=kgf/mm').expect(200))).toEqual(['CAT-S-098', 'CAT-S-105']);
    // 500 lbf/in = 87.5634 N/mm, 580 lbf/in = 101.5735 N/mm (0.1751268 N/mm per lbf/in).
    expect(skus(await get('/catalogue/springs?family=S60x160&rateMin=500&rateMax=580&unit=lbf/in').expect(200))).toEqual(['CAT-S-098']);
  });

  test('in stock only, below reorder point, and text search on sku, family and supplier code', async () => {
    expect(skus(await get('/catalogue/springs?family=S60x160&inStock=true').expect(200))).toEqual(['CAT-S-080', 'CAT-S-098']);
    expect(skus(await get('/catalogue/springs?family=S60x160&belowReorder=true').expect(200))).toEqual(['CAT-S-080']);
    expect(skus(await get('/catalogue/springs?q=qx-9').expect(200))).toEqual(['CAT-S-105']);
    expect(skus(await get('/catalogue/springs?q=f41').expect(200))).toEqual(['CAT-F-090']);
    // A LIKE wildcard typed by the clerk is taken literally.
    expect((await get('/catalogue/springs?q=%25').expect(200)).body.total).toBe(0);
  });

  test('sorts by rate, family, on hand and available, either way, and pages', async () => {
    expect(skus(await get('/catalogue/springs?family=S60x160&sort=rate&order=desc').expect(200))).toEqual(['CAT-S-105', 'CAT-S-098', 'CAT-S-080']);
    expect(skus(await get('/catalogue/springs?q=cat-&sort=onHand&order=desc').expect(200))[0]).toBe('CAT-F-090');
    expect(skus(await get('/catalogue/springs?q=cat-&sort=available').expect(200))[0]).toBe('CAT-S-105');
    expect(skus(await get('/catalogue/springs?q=cat-&sort=family').expect(200))[0]).toBe('CAT-F-090');
    const page2 = await get('/catalogue/springs?q=cat-&sort=sku&pageSize=3&page=2').expect(200);
    expect(page2.body).toEqual(expect.objectContaining({ total: 4, page: 2, pageSize: 3 }));
    expect(skus(page2)).toEqual(['CAT-S-105']);
  });

  test('bad filters get a message per field, never a 500', async () => {
    const res = await get('/catalogue/springs?unit=stone&sort=price&pageSize=1000&rateMin=abc&kind=bicycle').expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['kind', 'pageSize', 'rateMin', 'sort', 'unit']);
    expect((await get('/catalogue/springs?rateMin=9&rateMax=3').expect(400)).body.error.fields.rateMax).toMatch(/below/);
  });
});

describe('detail, create and update', () => {
  test('the detail carries the movement history, newest first, paged', async () => {
    const spring = await createSpring(t, {}, 2);
    await request(t.app).post(`/api/stock/${spring.id}/receive`).set('Authorization', tokens.counter).send({ quantity: 3, reason: 'Delivery note 4411' }).expect(201);
    const res = await get(`/catalogue/springs/${spring.id}?pageSize=1`).expect(200);
    expect(res.body.spring).toEqual(expect.objectContaining({ sku: spring.sku, onHand: 5, available: 5, supplier: 'Test Coil Supply' }));
    expect(res.body.movements).toEqual(expect.objectContaining({ total: 2, page: 1, pageSize: 1 }));
    expect(res.body.movements.movements[0]).toEqual(expect.objectContaining({ kind: 'receive', onHandDelta: 3, onHandAfter: 5, reason: 'Delivery note 4411' }));
    expect(res.body.movements.movements[0].user.name).toMatch(/counter/);
    await get('/catalogue/springs/999999').expect(404);
    await get('/catalogue/springs/abc').expect(404);
  });

  test('creates a spring with no stock; a taken SKU is a 409 on the sku field', async () => {
    const body = springInput({ sku: 'NEW-001', kind: 'fork', family: 'F41x300', rateNmm: 8.5, secondRateNmm: 11, breakMm: 100, freeLengthMm: 300, maxDeflectionMm: 180, innerDiameterMm: 28, outerDiameterMm: 38, wireDiameterMm: 5 });
    const res = await request(t.app).post('/api/catalogue/springs').set('Authorization', tokens.admin).send(body).expect(201);
    expect(res.body.spring).toEqual(expect.objectContaining({ sku: 'NEW-001', onHand: 0, reserved: 0, secondRateNmm: 11, breakMm: 100, active: true }));
    const again = await request(t.app).post('/api/catalogue/springs').set('Authorization', tokens.counter).send(body).expect(409);
    expect(again.body.error).toEqual(expect.objectContaining({ code: 'sku-taken', fields: { sku: expect.any(String) } }));
  });

  test('refuses bad fields one by one, stock set directly, and fields that contradict each other', async () => {
    const res = await request(t.app)
      .post('/api/catalogue/springs')
      .set('Authorization', tokens.counter)
      .send({ sku: '=HYPERLINK()', kind: 'bicycle', rateNmm: -3, freeLengthMm: 'long', costCents: 12.5, onHand: 7 })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['costCents', 'family', 'freeLengthMm', 'kind', 'maxDeflectionMm', 'onHand', 'rateNmm', 'sku']);
    expect(res.body.error.fields.onHand).toMatch(/receive|count/);
    const dual = await request(t.app).post('/api/catalogue/springs').set('Authorization', tokens.counter).send(springInput({ secondRateNmm: 120 })).expect(400);
    expect(dual.body.error.fields.breakMm).toMatch(/break point/);
  });

  test('updates the fields given, never the stock, and checks the spring as it will be', async () => {
    const spring = await createSpring(t, {}, 2);
    const patch = (body: object) => request(t.app).patch(`/api/catalogue/springs/${spring.id}`).set('Authorization', tokens.counter).send(body);
    const res = await patch({ bin: 'Z-99', priceCents: 15500 }).expect(200);
    expect(res.body.spring).toEqual(expect.objectContaining({ bin: 'Z-99', priceCents: 15500, rateNmm: 90, onHand: 2 }));
    expect((await patch({ onHand: 40, reserved: 1 }).expect(400)).body.error.fields).toEqual({ onHand: expect.any(String), reserved: expect.any(String) });
    expect((await patch({ maxDeflectionMm: 200 }).expect(400)).body.error.fields.maxDeflectionMm).toMatch(/free length/);
    expect((await patch({ sku: 'CAT-S-080' }).expect(409)).body.error.code).toBe('sku-taken');
    expect((await patch({ rateNmm: null }).expect(400)).body.error.fields.rateNmm).toBeDefined();
    const stored = await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id });
    expect(stored).toEqual(expect.objectContaining({ onHand: 2, reserved: 0, bin: 'Z-99', sku: spring.sku }));
  });

  test('deactivating hides a spring from the desk and riders; not while units are reserved', async () => {
    const spring = await createSpring(t, {}, 2);
    const held = await request(t.app).post(`/api/stock/${spring.id}/reserve`).set('Authorization', tokens.desk).send({ quantity: 1, name: 'Job 7', reason: 'Promised' }).expect(201);
    const refused = await request(t.app).post(`/api/catalogue/springs/${spring.id}/deactivate`).set('Authorization', tokens.counter).expect(409);
    expect(refused.body.error.code).toBe('has-reservations');
    await request(t.app).post(`/api/stock/${spring.id}/release`).set('Authorization', tokens.desk).send({ holdId: held.body.hold.id, reason: 'Job 7 declined' }).expect(201);
    await request(t.app).post(`/api/catalogue/springs/${spring.id}/deactivate`).set('Authorization', tokens.counter).expect(200);
    await get(`/catalogue/springs/${spring.id}`, 'rider').expect(404);
    expect((await get(`/catalogue/springs/${spring.id}`).expect(200)).body.spring.active).toBe(false);
    expect(skus(await get(`/catalogue/springs?q=${spring.sku}&status=inactive`).expect(200))).toEqual([spring.sku]);
    expect(skus(await get(`/catalogue/springs?q=${spring.sku}`).expect(200))).toEqual([]);
    await request(t.app).post(`/api/catalogue/springs/${spring.id}/reactivate`).set('Authorization', tokens.admin).expect(200);
    await get(`/catalogue/springs/${spring.id}`, 'rider').expect(200);
  });
});

describe('fits', () => {
  test('lists the families of each kind with their springs and availability', async () => {
    const res = await get('/catalogue/families?kind=shock', 'rider').expect(200);
    expect(res.body.families).toEqual(expect.arrayContaining([{ kind: 'shock', family: 'S60x160', springs: 3, available: 5 }]));
    expect(res.body.families.every((f: { kind: string }) => f.kind === 'shock')).toBe(true);
  });

  test('rates for a fit: the nearest to a target in any unit, with their availability', async () => {
    // 10 kgf/mm = 98.0665 N/mm: CAT-S-098 exactly, then 105 (6.93 away), then 80 (18.07 away).
    const res = await get('/catalogue/rates-for-fit?kind=shock&family=S60x160&rate=10&unit=kgf/mm&limit=2', 'desk').expect(200);
    expect(res.body.targetNmm).toBeCloseTo(98.0665, 12);
    expect(res.body.matches.map((m: { spring: { sku: string } }) => m.spring.sku)).toEqual(['CAT-S-098', 'CAT-S-105']);
    expect(res.body.matches[0]).toEqual(expect.objectContaining({ differenceNmm: expect.any(Number), differencePct: expect.any(Number) }));
    expect(res.body.matches[1].spring.available).toBe(0);
    expect(res.body.matches[1].differenceNmm).toBeCloseTo(105 - 98.0665, 9);
    const inStock = await get('/catalogue/rates-for-fit?kind=shock&family=S60x160&rate=104&inStock=true&limit=1').expect(200);
    expect(inStock.body.matches[0].spring.sku).toBe('CAT-S-098');
    expect((await get('/catalogue/rates-for-fit?kind=shock').expect(400)).body.error.fields).toEqual(
      expect.objectContaining({ family: expect.any(String), rate: expect.any(String) }),
    );
  });
});

describe('low stock', () => {
  test('lists what is below its reorder point with the shortfall, and exports it as a re-order sheet', async () => {
    const res = await get('/catalogue/low-stock?kind=shock').expect(200);
    const line = res.body.lines.find((l: { spring: { sku: string } }) => l.spring.sku === 'CAT-S-080');
    // Reorder point 2, 1 available: 1 short.
    expect(line).toEqual(expect.objectContaining({ shortfall: 1 }));
    expect(res.body.lines.some((l: { spring: { sku: string } }) => l.spring.sku === 'CAT-S-105')).toBe(false);
    const sheet = await get('/catalogue/low-stock.csv?kind=shock').expect(200);
    expect(sheet.headers['content-type']).toMatch(/^text\/csv/);
    expect(sheet.headers['content-disposition']).toMatch(/^attachment; filename="?reorder-\d{4}-\d\d-\d\d\.csv"?$/);
    const rows = parse(sheet.text, { columns: true }) as Record<string, string>[];
    expect(rows.find((r) => r.sku === 'CAT-S-080')).toEqual(expect.objectContaining({ supplier: 'Test Coil Supply', available: '1', reorder_point: '2', shortfall: '1' }));
  });
});

describe('identify a spring', () => {
  test('computes the rate from wire, diameter and coils and names the nearest catalogue rates', async () => {
    await createSpring(t, { sku: 'ID-12', kind: 'fork', family: 'F45x250', rateNmm: 12, freeLengthMm: 250, maxDeflectionMm: 150, innerDiameterMm: 35, outerDiameterMm: 45, wireDiameterMm: 5 }, 1);
    await createSpring(t, { sku: 'ID-14', kind: 'fork', family: 'F45x250', rateNmm: 14, freeLengthMm: 250, maxDeflectionMm: 150, innerDiameterMm: 35, outerDiameterMm: 45, wireDiameterMm: 5 }, 1);
    // The hand calculation of the formula test: d = 5, OD = 45, Na = 8, music wire: 12.0544 N/mm.
    const res = await request(t.app)
      .post('/api/catalogue/identify')
      .set('Authorization', tokens.desk)
      .send({ wireDiameterMm: 5, outerDiameterMm: 45, activeCoils: 8, material: 'music-wire', kind: 'fork', family: 'F45x250', unit: 'kgf/mm' })
      .expect(200);
    expect(res.body.rateNmm).toBeCloseTo(12.0544, 4);
    // 12.0544 / 9.80665 = 1.22921 kgf/mm.
    expect(res.body.rateInUnit).toBeCloseTo(1.22921, 5);
    expect(res.body.matches.map((m: { spring: { sku: string } }) => m.spring.sku)).toEqual(['ID-12', 'ID-14']);
    expect(res.body.matches[0].spring.costCents).toBeUndefined();
    expect(res.body.notes.join(' ')).toMatch(/4 %/);
  });

  test('takes total coils with closed-and-ground ends, and explains bad measurements', async () => {
    const total = await request(t.app)
      .post('/api/catalogue/identify')
      .set('Authorization', tokens.counter)
      .send({ wireDiameterMm: 5, outerDiameterMm: 45, totalCoils: 10, material: 'music-wire' })
      .expect(200);
    expect(total.body.activeCoils).toBe(8);
    expect(total.body.rateNmm).toBeCloseTo(12.0544, 4);
    const bad = await request(t.app).post('/api/catalogue/identify').set('Authorization', tokens.counter).send({ wireDiameterMm: 25, outerDiameterMm: 45, material: 'unobtainium' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['activeCoils', 'material']);
    const both = await request(t.app).post('/api/catalogue/identify').set('Authorization', tokens.counter).send({ wireDiameterMm: 25, outerDiameterMm: 45, activeCoils: 3, material: 'titanium' }).expect(400);
    expect(both.body.error.fields.outerDiameterMm).toMatch(/two wire diameters/);
  });
});
