/**
 * The service desk's migration (up, CHECKs, down), the payment keys read from the environment, and
 * the stand-in's signature, checked with the provider SDK's own verifier.
 */
import path from 'node:path';
import Stripe from 'stripe';
import { DataSource } from 'typeorm';
import { Database, DATABASE_FILE, dataSourceOptions } from '../../../server/data-source';
import { readConfig } from '../../../server/env';
import { signWebhookPayload } from '../../../server/fakes/payment-service';
import { migrations } from '../../../server/migrations';
import { ServiceDesk1764634200000 } from '../../../server/migrations/1764634200000-service-desk';
import { seed } from '../../../server/seed';
import { ShopSettingsService } from '../../../server/services/shop-settings.service';
import { tempDir } from '../test-context';

const DESK_TABLES = ['payment', 'payment_webhook_event', 'quote', 'quote_line', 'quote_status_event', 'shop_settings'];

const tables = async (source: DataSource) =>
  ((await source.query(`SELECT name FROM sqlite_master WHERE type = 'table' AND name IN (${DESK_TABLES.map((n) => `'${n}'`).join(', ')}) ORDER BY name`)) as { name: string }[]).map((r) => r.name);

test('the migration creates the desk tables, refuses bad settings, and down removes them', async () => {
  const mine = migrations.indexOf(ServiceDesk1764634200000);
  expect(mine).toBeGreaterThan(0);
  const source = new DataSource({ ...dataSourceOptions(path.join(tempDir(), DATABASE_FILE)), migrations: migrations.slice(0, mine + 1) });
  await source.initialize();
  try {
    await source.runMigrations({ transaction: 'each' });
    expect(await tables(source)).toEqual(DESK_TABLES);
    const insert = (rate: number) =>
      source.query(`INSERT INTO "shop_settings" ("id", "labourRateCentsPerHour", "taxBasisPoints", "deposit", "operations", "quoteValidityDays", "updatedAt") VALUES (1, ?, 2000, '{}', '[]', 30, '2026-01-01')`, [rate]);
    await expect(insert(0)).rejects.toThrow(/CHECK/);
    await insert(7000);
    await source.undoLastMigration({ transaction: 'each' });
    expect(await tables(source)).toEqual([]);
  } finally {
    await source.destroy();
  }
});

test('payment keys come both or neither', () => {
  expect(readConfig({}).payments).toBeUndefined();
  expect(readConfig({ STRIPE_SECRET_KEY: 'sk_test_x', STRIPE_WEBHOOK_SECRET: 'whsec_x' }).payments).toEqual({ secretKey: 'sk_test_x', webhookSecret: 'whsec_x' });
  expect(() => readConfig({ STRIPE_SECRET_KEY: 'sk_test_x' })).toThrow(/both/);
});

test("the stand-in signs webhooks as the provider's SDK verifies them", () => {
  const payload = JSON.stringify({ id: 'evt_1', object: 'event', type: 'payment_intent.succeeded', data: { object: {} } });
  const sdk = new Stripe('sk_test_unused');
  const event = sdk.webhooks.constructEvent(payload, signWebhookPayload(payload, 'whsec_test'), 'whsec_test');
  expect(event.id).toBe('evt_1');
  expect(() => sdk.webhooks.constructEvent(payload + ' ', signWebhookPayload(payload, 'whsec_test'), 'whsec_test')).toThrow();
});

test('the demo seed gives the workshop terms it can quote with', async () => {
  const db = await Database.open(tempDir());
  try {
    expect(await seed(db, { demo: true })).toContain('demo-shop-settings');
    const settings = await new ShopSettingsService({ db, now: () => new Date() }).get();
    expect(settings.operations.map((o) => o.code)).toEqual(expect.arrayContaining(['fork-spring-swap', 'shock-spring-swap', 'fork-oil', 'sag-setup']));
    expect(Number.isInteger(settings.labourRateCentsPerHour)).toBe(true);
  } finally {
    await db.close();
  }
});
