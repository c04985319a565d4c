/**
 * A shop ready to quote, made through the real services and API: the shop row, its quote settings
 * (invented test values), fork and shock springs of the fixture bike's fits with stock, a rider
 * with the fixture bike, a weigh-in and a saved pass.
 */
import http from 'node:http';
import { AddressInfo } from 'node:net';
import request from 'supertest';
import { Shop } from '../../../server/entities/shop.entity';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { User } from '../../../server/entities/user.entity';
import { seed } from '../../../server/seed';
import { writeShopSettings } from '../../../server/services/shop-settings.service';
import { bearer, createAccount } from '../auth/helpers';
import { createSpring } from '../catalogue/helpers';
import { addHandBike, as, Client, READINGS, WEIGH_IN } from '../rider/helpers';
import { TestContext } from '../test-context';

/** Invented for the tests. */
export const TEST_SETTINGS = {
  labourRateCentsPerHour: 7000,
  taxBasisPoints: 2000,
  deposit: { kind: 'percent' as const, basisPoints: 3000 },
  operations: [
    { code: 'fork-spring-swap', label: 'Fork spring swap', minutes: 60 },
    { code: 'shock-spring-swap', label: 'Shock spring swap', minutes: 45 },
    { code: 'fork-oil', label: 'Fork oil change', minutes: 40 },
    { code: 'sag-setup', label: 'Sag set-up', minutes: 20 },
  ],
  quoteValidityDays: 30,
  cautions: 'Test cautions.',
};

export interface DeskShop {
  desk: User;
  admin: User;
  counter: User;
  rider: User;
  otherRider: User;
  asDesk: Client;
  asAdmin: Client;
  asRider: Client;
  asOtherRider: Client;
  bikeId: number;
  recordId: number;
  forkSpring: SpringRate;
  shockSpring: SpringRate;
}

export async function setUpDeskShop(t: TestContext, stock = { fork: 4, shock: 2 }): Promise<DeskShop> {
  await seed(t.db, { demo: false });
  await t.db.write(async (manager) => {
    await manager.insert(Shop, { name: 'Test Suspension Works', address: '1 Test Lane', email: 'shop@example.test', phone: '+00 555 0100', currency: 'EUR' });
    await writeShopSettings(manager, TEST_SETTINGS, null, t.now());
  });
  const [desk, admin, counter, rider, otherRider] = [
    await createAccount(t, 'desk'),
    await createAccount(t, 'admin'),
    await createAccount(t, 'counter'),
    await createAccount(t, 'rider'),
    await createAccount(t, 'rider'),
  ];
  const forkSpring = await createSpring(t, { kind: 'fork', family: 'F37x320', rateNmm: 9.5, freeLengthMm: 320, innerDiameterMm: 20, outerDiameterMm: 37, wireDiameterMm: 4.5, maxDeflectionMm: 150, priceCents: 6550 }, stock.fork);
  const shockSpring = await createSpring(t, { kind: 'shock', family: 'S56x150', rateNmm: 100, priceCents: 13000 }, stock.shock);
  const asRider = await as(t, rider);
  const bikeId = await addHandBike(asRider, 'Test tourer');
  await asRider.put('/weigh-in', WEIGH_IN).expect(200);
  const record = await asRider.post(`/bikes/${bikeId}/sizing-records`, { readings: READINGS }).expect(201);
  return {
    desk,
    admin,
    counter,
    rider,
    otherRider,
    asDesk: await as(t, desk),
    asAdmin: await as(t, admin),
    asRider,
    asOtherRider: await as(t, otherRider),
    bikeId,
    recordId: record.body.record.id,
    forkSpring,
    shockSpring,
  };
}

/** Two fork springs and one shock spring with their swaps and a sag set-up. */
export function fullSwapLines(shop: DeskShop) {
  return [
    { kind: 'spring', springId: shop.forkSpring.id, end: 'front', quantity: 2 },
    { kind: 'labour', operationCode: 'fork-spring-swap' },
    { kind: 'spring', springId: shop.shockSpring.id, end: 'rear', quantity: 1 },
    { kind: 'labour', operationCode: 'shock-spring-swap' },
    { kind: 'labour', operationCode: 'sag-setup' },
  ];
}

export async function createQuote(shop: DeskShop, lines: object[] = fullSwapLines(shop)) {
  const res = await shop.asDesk.post('/quotes', { sizingRecordId: shop.recordId, lines }).expect(201);
  return res.body.quote;
}

/** Sends the quote and answers the token of the link the mail carries. */
export async function sendQuote(t: TestContext, shop: DeskShop, quoteId: number): Promise<{ token: string; mailId: string; text: string; html: string }> {
  const seen = new Set(t.outbox!.list().map((m) => m.id));
  await shop.asDesk.post(`/quotes/${quoteId}/send`).expect(200);
  const fresh = () => t.outbox!.list().find((m) => !seen.has(m.id) && m.to.includes(shop.rider.email));
  const deadline = Date.now() + 5000;
  while (!fresh() && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 20));
  const entry = fresh();
  if (!entry) throw new Error('the quote mail did not arrive');
  const mail = await request(t.app).get(`/api/dev/outbox/${entry.id}`).set('Authorization', await bearer(t, shop.admin)).expect(200);
  const text: string = mail.body.mail.text;
  const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(text)?.[1];
  if (!token) throw new Error(`no quote link in the mail: ${text}`);
  return { token, mailId: entry.id, text, html: mail.body.mail.html };
}

/** The app on a real loopback socket, for concurrent calls and the stand-in's webhooks. */
export async function listen(t: TestContext): Promise<{ base: string; close: () => Promise<void> }> {
  const server = http.createServer(t.app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return { base, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

/** Every key ending in Cents anywhere in the JSON, with its path. */
export function centsFields(value: unknown, path = ''): { path: string; value: unknown }[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => centsFields(v, `${path}[${i}]`));
  if (value && typeof value === 'object') {
    return Object.entries(value).flatMap(([k, v]) => [...(k.endsWith('Cents') ? [{ path: `${path}.${k}`, value: v }] : []), ...centsFields(v, `${path}.${k}`)]);
  }
  return [];
}

/** Real ids for the authorization matrix: a shop that can quote and one labour-only quote on `recordId`. */
export async function makeDeskFixtures(t: TestContext, desk: User, recordId: string): Promise<{ quoteId: string }> {
  await t.db.write(async (manager) => {
    if (!(await manager.count(Shop))) await manager.insert(Shop, { name: 'Matrix Works', address: '1 Matrix Lane', email: 'matrix@example.test', phone: '+00 555 0101', currency: 'EUR' });
    await writeShopSettings(manager, TEST_SETTINGS, null, t.now());
  });
  const res = await (await as(t, desk)).post('/quotes', { sizingRecordId: Number(recordId), lines: [{ kind: 'labour', operationCode: 'sag-setup' }] }).expect(201);
  return { quoteId: String(res.body.quote.id) };
}
