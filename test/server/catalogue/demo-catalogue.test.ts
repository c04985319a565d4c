/**
 * The invented demo catalogue: every spring passes the catalogue's own rules, carries the counter's
 * fields, has its stock as opening movements, and identifying one from its measurements finds it.
 */
import request from 'supertest';
import { findSpringConflicts } from '../../../shared/schemas/catalogue.schema';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { seedDemoCatalogue } from '../../../server/seed/demo-catalogue';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, ledgerMismatches } from './helpers';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
  await t.db.write(seedDemoCatalogue);
});
afterAll(() => t.dispose());

test('every demo spring is complete, consistent and in the ledger', async () => {
  const springs = await t.db.read.getRepository(SpringRate).find();
  expect(springs.length).toBeGreaterThan(50);
  for (const spring of springs) {
    expect(findSpringConflicts(spring)).toEqual({});
    expect(spring).toEqual(
      expect.objectContaining({ supplier: expect.any(String), supplierCode: expect.any(String), bin: expect.any(String), costCents: expect.any(Number), priceCents: expect.any(Number) }),
    );
    expect(spring.priceCents!).toBeGreaterThan(spring.costCents!);
  }
  expect(springs.filter((s) => s.secondRateNmm !== null)).toHaveLength(2);
  expect(springs.some((s) => s.onHand - s.reserved < s.reorderPoint)).toBe(true);
  expect(await ledgerMismatches(t)).toEqual([]);
});

test('identifying a demo spring from its wire, outer diameter and coils finds it first', async () => {
  const { tokens } = await accountsByRole(t);
  const spring = await t.db.read.getRepository(SpringRate).findOneByOrFail({ sku: 'KS56-1000' });
  // The demo shock ladders are chrome-silicon with 8 active coils (server/seed/demo-catalogue.ts).
  const res = await request(t.app)
    .post('/api/catalogue/identify')
    .set('Authorization', tokens.counter)
    .send({ wireDiameterMm: spring.wireDiameterMm, outerDiameterMm: spring.outerDiameterMm, activeCoils: 8, material: 'chrome-silicon', kind: 'shock', family: 'S56x150' })
    .expect(200);
  // The wire is rounded to 0.01 mm: about 4 x 0.01 / 12.8, under half a percent of the rate.
  expect(Math.abs(res.body.rateNmm - 100) / 100).toBeLessThan(0.005);
  expect(res.body.matches[0].spring.sku).toBe('KS56-1000');
});
