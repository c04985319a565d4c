/**
 * Every CSV export guards every text cell against formula injection, by the OWASP "CSV Injection"
 * guidance: a cell starting with =, +, -, @, a tab or a carriage return gets a leading single
 * quote, so a spreadsheet shows it as text instead of running it. Names come in as people type
 * them (sign-up over HTTP); spring fields, which the input rules refuse with such a start, are
 * written straight to the file as rows stored before those rules would be. Numbers stay numbers.
 */
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { RAISED_LIMITS } from '../auth/helpers';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, createSpring, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;
beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  ({ tokens } = await accountsByRole(t));
});
afterAll(() => t.dispose());

/** One text per trigger character of the guidance; tab and carriage return only inside, as a name is trimmed. */
const HOSTILE = ['=HYPERLINK("http://example.invalid","x")', '+1+cmd|" /C calc"!A0', '-2+3', '@SUM(1+1)'];
const CONTROL_START = ['\t=1+1', '\r=1+1'];

async function exportRows(path: string): Promise<Record<string, string>[]> {
  const res = await request(t.app).get(`/api${path}`).set('Authorization', tokens.admin).expect(200);
  expect(res.headers['content-type']).toMatch(/^text\/csv/);
  return parse(res.text, { columns: true, relax_column_count: false });
}

test('the movements export guards the names people signed up with', async () => {
  const spring = await createSpring(t, { sku: 'CSV-MOVES' });
  for (const [i, name] of HOSTILE.entries()) {
    const signedUp = await request(t.app).post('/api/auth/sign-up').send({ name, email: `formula-${i}@example.test`, password: 'correct horse battery' }).expect(201);
    expect(signedUp.body.user.name).toBe(name);
    await request(t.app).patch(`/api/users/${signedUp.body.user.id}/role`).set('Authorization', tokens.admin).send({ role: 'counter' }).expect(200);
    const signedIn = await request(t.app).post('/api/auth/sign-in').send({ email: `formula-${i}@example.test`, password: 'correct horse battery' }).expect(200);
    await request(t.app)
      .post(`/api/stock/${spring.id}/receive`)
      .set('Authorization', `Bearer ${signedIn.body.token}`)
      .send({ quantity: 1, reason: `Delivery ${i + 1}` })
      .expect(201);
  }

  const rows = (await exportRows(`/stock/movements.csv?springId=${spring.id}`)).sort((a, b) => Number(a.id) - Number(b.id));
  expect(rows.map((r) => r.user)).toEqual(HOSTILE.map((name) => `'${name}`));
  expect(rows.map((r) => r.reason)).toEqual(['Delivery 1', 'Delivery 2', 'Delivery 3', 'Delivery 4']);
  expect(rows.map((r) => r.on_hand_delta)).toEqual(['1', '1', '1', '1']);
});

test('the catalogue and re-order exports guard every text field of a spring', async () => {
  const spring = await createSpring(t, { sku: 'CSV-SPRING', reorderPoint: 2 });
  const texts = { family: HOSTILE[0], supplier: HOSTILE[1], supplierCode: HOSTILE[2], bin: HOSTILE[3] };
  await t.db.write((m) => m.update(SpringRate, spring.id, texts));

  const [catalogue] = (await exportRows('/catalogue/springs.csv')).filter((r) => r.sku === 'CSV-SPRING');
  expect([catalogue.family, catalogue.supplier, catalogue.supplier_code, catalogue.bin]).toEqual(Object.values(texts).map((text) => `'${text}`));
  const [reorder] = (await exportRows('/catalogue/low-stock.csv')).filter((r) => r.sku === 'CSV-SPRING');
  expect([reorder.family, reorder.supplier, reorder.supplier_code, reorder.bin]).toEqual(Object.values(texts).map((text) => `'${text}`));
  expect(reorder.shortfall).toBe('2');

  await t.db.write((m) => m.update(SpringRate, spring.id, { family: CONTROL_START[0], bin: CONTROL_START[1] }));
  const [controls] = (await exportRows('/catalogue/springs.csv')).filter((r) => r.sku === 'CSV-SPRING');
  expect([controls.family, controls.bin]).toEqual(CONTROL_START.map((text) => `'${text}`));
});
