/**
 * The customer link in a quote mail is built on the shop's public address, never on the request's
 * Host or Origin (OWASP WSTG v4.2 WSTG-INPV-17, Host header injection; the same rule as reset links,
 * OWASP Forgot Password Cheat Sheet). In production without an address, sending is refused before
 * the quote changes.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { SmtpOutbox } from '../../../server/fakes/smtp-outbox';
import { makeTestContext, tempDir, TestContext } from '../test-context';
import { createQuote, sendQuote, setUpDeskShop, TEST_SETTINGS } from './helpers';

const FORGED = { Host: 'any-host.example', 'X-Forwarded-Host': 'any-host.example', Origin: 'http://localhost:8081' };

test('a quote sent with a forged Host links to the listening address, then to the address the admin sets', async () => {
  const t: TestContext = await makeTestContext();
  try {
    const shop = await setUpDeskShop(t);
    const first = await createQuote(shop);
    const forged = await shop.asDesk.post(`/quotes/${first.id}/send`).set(FORGED).expect(200);
    expect(forged.body.mailed).toBe(true);
    const { text, html } = await sendQuote(t, shop, first.id);
    expect(text).toMatch(new RegExp(`^View, accept or decline it here: http://localhost:${t.config.port}/q/[A-Za-z0-9_-]{43}$`, 'm'));
    expect(html).toMatch(new RegExp(`href="http://localhost:${t.config.port}/q/`));
    const mails = t.outbox!.list().filter((m) => m.to.includes(shop.rider.email));
    for (const entry of mails) expect(t.outbox!.read(entry.id)!.text).not.toContain('any-host.example');

    await shop.asAdmin.put('/shop-settings', { ...TEST_SETTINGS, publicUrl: 'https://shop.example' }).expect(200);
    const second = await sendQuote(t, shop, (await createQuote(shop)).id);
    expect(second.text).toContain(`https://shop.example/q/${second.token}`);
  } finally {
    await t.dispose();
  }
});

test('in production without an address, sending is refused (409) and the quote stays a draft; with one set it is sent', async () => {
  const outbox = await SmtpOutbox.start(path.join(tempDir(), 'outbox'), () => {});
  const t = await makeTestContext({ production: true, corsOrigins: [], smtp: outbox.smtp });
  try {
    const shop = await setUpDeskShop(t);
    const quote = await createQuote(shop);
    const refused = await shop.asDesk.post(`/quotes/${quote.id}/send`).set(FORGED).expect(409);
    expect(refused.body.error).toEqual({ code: 'no-public-address', message: expect.stringMatching(/address/) });
    const after = await shop.asDesk.get(`/quotes/${quote.id}`).expect(200);
    expect(after.body.quote.status).toBe('draft');
    expect(outbox.list()).toEqual([]);

    await shop.asAdmin.put('/shop-settings', { ...TEST_SETTINGS, publicUrl: 'https://shop.example' }).expect(200);
    const sent = await shop.asDesk.post(`/quotes/${quote.id}/send`).set(FORGED).expect(200);
    expect(sent.body).toMatchObject({ mailed: true, quote: { status: 'sent' } });
    const [mail] = outbox.list();
    expect(outbox.read(mail.id)!.text).toMatch(/^View, accept or decline it here: https:\/\/shop\.example\/q\/[A-Za-z0-9_-]{43}$/m);
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(outbox.read(mail.id)!.text!)![1];
    await request(t.app).get(`/api/customer-quotes/${token}`).expect(200);
  } finally {
    await t.dispose();
    await outbox.close();
    fs.rmSync(path.dirname(outbox.dir), { recursive: true, force: true });
  }
});
