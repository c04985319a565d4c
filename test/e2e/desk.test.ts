/**
 * The service desk in a real browser. The demo rider's bike, weigh-in and a pass sized from the
 * weights are made through the API; then the demo desk user (wide) finds the rider under
 * Customers, makes a quote from that pass and sends it. The mailed /q/ link is read from the dev
 * outbox, and the rider opens it at phone size with no session, accepts, pays the deposit with
 * the card that pays and sees the receipt. Nothing may log an error, so no step asks for
 * something the server would refuse.
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(240_000);

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
const rider = account('rider');
const desk = account('desk');
const admin = account('admin');

const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

/** The rider's new bike and a pass sized from the weights alone. */
async function riderWithPass(): Promise<{ bikeId: number; recordId: number }> {
  const token = await signInApi(rider.email);
  const { models } = await call<{ models: { id: number }[] }>('GET', '/bike-models', token);
  const { bike } = await call<{ bike: { id: number } }>('POST', '/bikes', token, {
    modelId: models[0].id,
    nickname: 'Desk test bike',
  });
  const weighIn = { bodyKg: 92, gear: {}, loads: [], discipline: 'road', position: 'neutral' };
  await call('PUT', '/weigh-in', token, weighIn);
  const { record } = await call<{ record: { id: number } }>('POST', `/bikes/${bike.id}/sizing-records`, token, {
    ends: ['front', 'rear'],
    weighIn,
  });
  return { bikeId: bike.id, recordId: record.id };
}

/** The link in the newest mail to the rider that carries one to a quote. */
async function quoteLinkFromOutbox(): Promise<string> {
  const token = await signInApi(admin.email);
  for (let attempt = 0; attempt < 40; attempt++) {
    const { mails } = await call<{ mails: { id: string; to: string | string[] }[] }>('GET', '/dev/outbox', token);
    for (const summary of [...mails].reverse()) {
      if (!String(summary.to).includes(rider.email)) continue;
      const { mail } = await call<{ mail: { text?: string; html?: string } }>(
        'GET',
        `/dev/outbox/${encodeURIComponent(summary.id)}`,
        token,
      );
      const link = /https?:\/\/[^\s"'<>]+\/q\/[A-Za-z0-9_-]+/.exec(`${mail.text ?? ''} ${mail.html ?? ''}`);
      if (link) return link[0];
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error('No quote mail reached the outbox.');
}

const visible = (page: Page, id: string) => page.locator(`[data-testid="${id}"]:visible`);

test('the desk builds and sends a quote; the rider accepts and pays the deposit by card', async () => {
  const { bikeId, recordId } = await riderWithPass();

  const wide = await openPage(live.browser, 'wide');
  await wide.page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(wide.page, desk.email, DEMO_PASSWORD);
  await waitForPath(wide.page, '/desk');
  await wide.page.getByRole('heading', { name: 'Quotes', level: 1 }).waitFor();
  await screenshot(wide.page, 'desk-board-wide');

  await wide.page.getByRole('link', { name: 'Customers' }).click();
  await wide.page.getByRole('heading', { name: 'Customers', level: 1 }).waitFor();
  await wide.page.getByLabel('Search by name or e-mail').fill('Linden');
  await screenshot(wide.page, 'desk-customers-wide');
  await wide.page.getByRole('link', { name: `${rider.name}, ${rider.email}` }).click();
  await visible(wide.page, `customer-bike-${bikeId}`).waitFor();
  await screenshot(wide.page, 'desk-customer-wide');
  await visible(wide.page, `sizing-record-${recordId}`).getByRole('button', { name: 'Make a quote' }).click();

  await wide.page.waitForURL((url) => url.pathname.startsWith('/desk/quotes/'));
  await wide.page.getByRole('heading', { name: /^Quote Q-/, level: 1 }).waitFor();
  const before = await visible(wide.page, 'total-total').innerText();
  expect(before).toMatch(/^€[\d,]+\.\d{2}$/);
  // A spring in stock goes on the draft; the totals are the server's answer to the saved lines.
  await wide.page.locator('[role="button"][aria-label^="Add KF"]:not([aria-disabled="true"])').first().click();
  await wide.page.waitForFunction(
    (previous) => document.querySelector('[data-testid="total-total"]')?.textContent !== previous,
    before,
  );
  const total = await visible(wide.page, 'total-total').innerText();
  await screenshot(wide.page, 'desk-quote-draft-wide');
  await wide.page.getByRole('button', { name: 'Send to the customer' }).click();
  await wide.page.getByRole('status').getByText(`Sent to ${rider.email}.`).waitFor();
  await visible(wide.page, 'quote-status').getByText('Sent').waitFor();
  await screenshot(wide.page, 'desk-quote-sent-wide');
  await wide.page.getByRole('link', { name: '← All quotes' }).click();
  await visible(wide.page, 'board-column-sent').getByText('Mara Linden').waitFor();
  await screenshot(wide.page, 'desk-board-sent-wide');
  expect(wide.errors).toEqual([]);

  const link = new URL(await quoteLinkFromOutbox());
  const phone = await openPage(live.browser, 'phone');
  await phone.page.goto(`${live.server.url}${link.pathname}`);
  await phone.page.getByRole('heading', { name: /^Quote Q-/, level: 1 }).waitFor();
  expect(await visible(phone.page, 'total-total').innerText()).toBe(total);
  await phone.page.getByText(/loaded spring stores dangerous energy/).waitFor();
  await screenshot(phone.page, 'desk-customer-quote-phone');

  await phone.page.getByRole('button', { name: 'Accept the quote' }).click();
  await phone.page.getByRole('heading', { name: 'Pay the deposit by card' }).waitFor();
  await phone.page.getByRole('radio', { name: 'A card that pays' }).click();
  await screenshot(phone.page, 'desk-customer-pay-phone');
  await phone.page.getByRole('button', { name: /^Pay €/ }).click();
  await visible(phone.page, 'payment-receipt').waitFor();
  await visible(phone.page, 'quote-status').getByText('Deposit paid').waitFor();
  await screenshot(phone.page, 'desk-customer-receipt-phone');
  expect(phone.errors).toEqual([]);

  await wide.context.close();
  await phone.context.close();
});
