/**
 * The service desk's later steps in a real browser, against the real server:
 * - the desk sizes a customer's bike in the shop from readings, makes a quote of the result,
 *   sends it, revises it into version 2 and sends that; the customer accepts and pays through
 *   the API (the card page has its own browser test in desk.test.ts); the desk books the fitting
 *   with the day and time picker, the customer sees the booking on the quote page, the desk marks
 *   it fitted (balance due shown) and the customer finds the spring swap in the setup log;
 * - a paid quote cancelled at the desk shows the refund;
 * - the counter releases a paid quote's spring over the quote on the spring's page; the desk and
 *   the customer's page show the quote as "Springs released", and the desk's cancel refunds it;
 * - the desk screens at phone size (390x844) and wide (1280x800), with screenshots.
 * Chromium logs every 4xx as a console error and a test fails on any, so nothing here asks for
 * what the server refuses: a declined card is tested over HTTP in test/server, not here.
 *
 * Hand-worked check of the readings (the sag definitions in /work/shared/domain/sizing.md):
 * static sag = extended − mean(pushed, lifted) = 560 − (532 + 540) / 2 = 24 mm at the fork,
 * 600 − (586 + 592) / 2 = 11 mm at the shock; rider sag 560 − (512 + 520) / 2 = 44 mm and
 * 600 − (541 + 549) / 2 = 55 mm.
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { formatNumber } from '../../shared/sizing/format';
import type { SizingRecord } from '../../shared/types/garage';
import type { QuoteView, SpringOption } from '../../shared/types/quote';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot, type ViewportName } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(300_000);

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
const rider = account('rider');
const desk = account('desk');
const admin = account('admin');
const counter = account('counter');

const READINGS = {
  front: { extended: '560', static: ['532', '540'], rider: ['512', '520'] },
  rear: { extended: '600', static: ['586', '592'], rider: ['541', '549'] },
} as const;

const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

const WEIGH_IN = { bodyKg: 82, gear: {}, loads: [], discipline: 'road', position: 'neutral' };

/** The demo rider with a new bike from the first shop model, weighed in; nothing sized yet. */
async function riderBike(nickname: string): Promise<{ riderToken: string; bikeId: number }> {
  const riderToken = await signInApi(rider.email);
  const { models } = await call<{ models: { id: number; name: string }[] }>('GET', '/bike-models', riderToken);
  const model = models.find((m) => m.name === 'Tarn 690 Roadster') ?? models[0];
  const { bike } = await call<{ bike: { id: number } }>('POST', '/bikes', riderToken, { modelId: model.id, nickname });
  await call('PUT', '/weigh-in', riderToken, WEIGH_IN);
  return { riderToken, bikeId: bike.id };
}

async function riderId(deskToken: string): Promise<number> {
  const { customers } = await call<{ customers: { id: number; email: string }[] }>(
    'GET',
    `/customers?q=${encodeURIComponent(rider.email)}`,
    deskToken,
  );
  return customers.find((c) => c.email === rider.email)!.id;
}

/** Mails to the rider that carry a quote link, oldest first. */
async function quoteLinks(): Promise<string[]> {
  const token = await signInApi(admin.email);
  const { mails } = await call<{ mails: { id: string; to: string | string[] }[] }>('GET', '/dev/outbox', token);
  const links: string[] = [];
  for (const summary of mails) {
    if (!String(summary.to).includes(rider.email)) continue;
    const { mail } = await call<{ mail: { text?: string; html?: string } }>('GET', `/dev/outbox/${encodeURIComponent(summary.id)}`, token);
    const link = /https?:\/\/[^\s"'<>]+\/q\/[A-Za-z0-9_-]+/.exec(`${mail.text ?? ''} ${mail.html ?? ''}`);
    if (link) links.push(new URL(link[0]).pathname);
  }
  return links;
}

/** The link of a quote mail that arrived after `known` were there (the outbox's order is its own). */
async function nextQuoteLink(known: readonly string[]): Promise<string> {
  for (let attempt = 0; attempt < 40; attempt++) {
    const fresh = (await quoteLinks()).filter((link) => !known.includes(link));
    if (fresh.length > 0) return fresh[0];
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error('No new quote mail reached the outbox.');
}

const visible = (page: Page, id: string) => page.locator(`[data-testid="${id}"]:visible`);

async function signedIn(size: ViewportName, email: string, landing: string) {
  const watched = await openPage(live.browser, size);
  await watched.page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(watched.page, email, DEMO_PASSWORD);
  await waitForPath(watched.page, landing);
  return watched;
}

async function fillReadings(page: Page) {
  for (const end of ['front', 'rear'] as const) {
    const values = READINGS[end];
    await visible(page, `reading-${end}-extended-value`).fill(values.extended);
    for (const stage of ['static', 'rider'] as const) {
      await visible(page, `reading-${end}-${stage}-pushed`).fill(values[stage][0]);
      await visible(page, `reading-${end}-${stage}-lifted`).fill(values[stage][1]);
    }
  }
}

/** A draft for the rider's bike sized from the weights, with one spring on the shelf as its line. */
async function draftWithStockedSpring(deskToken: string, riderToken: string, bikeId: number): Promise<QuoteView> {
  const { record } = await call<{ record: { id: number } }>('POST', `/bikes/${bikeId}/sizing-records`, riderToken, {
    ends: ['front', 'rear'],
  });
  const { quote } = await call<{ quote: QuoteView }>('POST', '/quotes', deskToken, { sizingRecordId: record.id });
  const options = await call<{ front: SpringOption[]; rear: SpringOption[] }>('GET', `/quotes/${quote.id}/spring-options`, deskToken);
  const spring = [...options.rear, ...options.front].find((option) => option.available > 0 && option.priceCents !== null)!;
  const end = options.rear.includes(spring) ? 'rear' : 'front';
  const { quote: priced } = await call<{ quote: QuoteView }>('PUT', `/quotes/${quote.id}/lines`, deskToken, {
    lines: [
      { kind: 'spring', springId: spring.springId, end, quantity: 1 },
      { kind: 'labour', operationCode: end === 'rear' ? 'shock-spring-swap' : 'fork-spring-swap', quantity: 1 },
    ],
  });
  return priced;
}

test('the desk sizes a bike from readings, revises the sent quote, books, and marks it fitted', async () => {
  const { bikeId } = await riderBike('Bench bike');
  const deskToken = await signInApi(desk.email);
  const customerId = await riderId(deskToken);

  const wide = await signedIn('wide', desk.email, '/desk');
  await wide.page.goto(`${live.server.url}/desk/customers/${customerId}?name=${encodeURIComponent(rider.name)}`);
  await visible(wide.page, `size-from-readings-${bikeId}`).click();
  await wide.page.waitForURL((url) => url.pathname === `/desk/customers/${customerId}/readings/${bikeId}`);
  await wide.page.getByRole('heading', { name: 'Readings: Bench bike', level: 1 }).waitFor();
  await fillReadings(wide.page);
  await screenshot(wide.page, 'desk-readings-filled-wide');
  await visible(wide.page, 'readings-save').click();
  await visible(wide.page, 'readings-saved').waitFor();
  expect(await visible(wide.page, 'result-front-static-sag').innerText()).toBe('24 mm');
  expect(await visible(wide.page, 'result-front-rider-sag').innerText()).toBe('44 mm');
  expect(await visible(wide.page, 'result-rear-static-sag').innerText()).toBe('11 mm');
  expect(await visible(wide.page, 'result-rear-rider-sag').innerText()).toBe('55 mm');
  await screenshot(wide.page, 'desk-readings-result-wide');

  // The saved pass is the desk's, on the customer's bike, sized from the readings.
  const { records } = await call<{ records: { id: number; source: string }[] }>('GET', `/bikes/${bikeId}/sizing-records`, deskToken);
  expect(records.map((r) => r.source)).toEqual(['desk']);
  // The desk reads the same decision the rider's result shows, written by the same code.
  const saved = (await call<{ record: SizingRecord }>('GET', `/sizing-records/${records[0].id}`, deskToken)).record;
  for (const end of ['front', 'rear'] as const) {
    expect(await visible(wide.page, `result-${end}-decision-headline`).innerText()).toBe(saved.result[end]!.decision.text.headline);
  }

  await visible(wide.page, 'readings-make-quote').click();
  await wide.page.waitForURL((url) => url.pathname.startsWith('/desk/quotes/'));
  await wide.page.getByRole('heading', { name: /^Quote Q-/, level: 1 }).waitFor();
  const firstId = Number(new URL(wide.page.url()).pathname.split('/').at(-1));
  // The editor marks the spring the decision puts forward, and only that one.
  for (const end of ['front', 'rear'] as const) {
    const pick = saved.result[end]!.decision.pick;
    if (pick) await visible(wide.page, `spring-option-${pick.sku}`).getByText(`${pick.sku} · ${pick.rateNmm} N/mm · recommended`).waitFor();
  }
  const marked = wide.page.locator('[data-testid^="spring-option-"]:visible', { hasText: '· recommended' });
  expect(await marked.count()).toBe(['front', 'rear'].filter((end) => saved.result[end as 'front' | 'rear']!.decision.pick).length);
  // The fork spring the result recommends, from the shelf.
  const { record } = await call<{ record: { result: { front: { recommendation: { inStock: { sku: string; rateNmm: number } } } } } }>(
    'GET',
    `/sizing-records/${records[0].id}`,
    deskToken,
  );
  const forkSpring = record.result.front.recommendation.inStock;
  const before = await visible(wide.page, 'total-total').innerText();
  await wide.page.getByRole('button', { name: `Add ${forkSpring.sku}` }).click();
  await wide.page.waitForFunction((previous) => document.querySelector('[data-testid="total-total"]')?.textContent !== previous, before);
  const firstKnown = await quoteLinks();
  await wide.page.getByRole('button', { name: 'Send to the customer' }).click();
  await wide.page.getByRole('status').getByText(`Sent to ${rider.email}.`).waitFor();
  const firstLink = await nextQuoteLink(firstKnown);

  await wide.page.getByRole('button', { name: 'Revise (new version)' }).click();
  await wide.page.getByRole('heading', { name: /^Quote Q-\d{4}-\d{4} \(version 2\)$/, level: 1 }).waitFor();
  const secondId = Number(new URL(wide.page.url()).pathname.split('/').at(-1));
  expect(secondId).not.toBe(firstId);
  await visible(wide.page, 'quote-status').getByText('Draft').waitFor();
  const old = await call<{ quote: QuoteView }>('GET', `/quotes/${firstId}`, deskToken);
  expect(old.quote.status).toBe('superseded');
  expect(old.quote.supersededById).toBe(secondId);
  await screenshot(wide.page, 'desk-quote-version-2-wide');
  await wide.page.getByRole('button', { name: 'Send to the customer' }).click();
  await wide.page.getByRole('status').getByText(`Sent to ${rider.email}.`).waitFor();
  const link = await nextQuoteLink([...firstKnown, firstLink]);

  // The customer answers from the link (the card page itself is desk.test.ts's).
  const token = link.split('/').at(-1)!;
  await call('POST', `/customer-quotes/${token}/accept`, undefined, {});
  const paid = await call<{ quote: QuoteView }>('POST', `/customer-quotes/${token}/pay-deposit`, undefined, { paymentMethod: 'pm_card_visa' });
  expect(paid.quote.status).toBe('deposit-paid');

  await wide.page.reload();
  await visible(wide.page, 'quote-status').getByText('Deposit paid').waitFor();
  await visible(wide.page, 'fitting-picker').waitFor();
  const secondDay = wide.page.locator('[data-testid^="fitting-day-"]:visible').nth(1);
  const dayKey = (await secondDay.getAttribute('data-testid'))!.replace('fitting-day-', '');
  await secondDay.click();
  await visible(wide.page, 'fitting-slot-10:30').click();
  const [year, month, day] = dayKey.split('-').map(Number);
  const chosen = new Date(year, month - 1, day, 10, 30);
  await screenshot(wide.page, 'desk-quote-book-wide');
  await visible(wide.page, 'book-fitting').click();
  await wide.page.getByRole('status').getByText(/^Fitting booked for /).waitFor();
  await visible(wide.page, 'quote-status').getByText('Booked').waitFor();
  const booked = await call<{ quote: QuoteView }>('GET', `/quotes/${secondId}`, deskToken);
  expect(booked.quote.fittingAt).toBe(chosen.toISOString());

  const customer = await openPage(live.browser, 'phone');
  await customer.page.goto(`${live.server.url}${link}`);
  await visible(customer.page, 'fitting-time').waitFor();
  const shown = await visible(customer.page, 'fitting-time').innerText();
  expect(shown).toContain('Fitting booked');
  expect(shown).toContain('10:30');
  await screenshot(customer.page, 'desk-customer-booking-phone');

  await wide.page.getByRole('button', { name: 'Mark as fitted' }).click();
  await visible(wide.page, 'balance-due').waitFor();
  const fitted = await call<{ quote: QuoteView }>('GET', `/quotes/${secondId}`, deskToken);
  expect(fitted.quote.status).toBe('fitted');
  // Balance due = total − deposit paid, nothing refunded (docs/service-desk.md).
  expect(fitted.quote.balanceDueCents).toBe(fitted.quote.totalCents - fitted.quote.paidCents);
  expect(await visible(wide.page, 'balance-due').innerText()).toBe(`Fitted. Balance due: ${await visible(wide.page, 'total-balance').innerText()}`);
  await screenshot(wide.page, 'desk-quote-fitted-wide');
  expect(wide.errors).toEqual([]);

  const riderPage = await signedIn('phone', rider.email, '/rider');
  await riderPage.page.goto(`${live.server.url}/rider/bikes/${bikeId}/log`);
  await riderPage.page.getByRole('heading', { name: 'Setup log', level: 1 }).waitFor();
  await riderPage.page.getByText(`Spring swap, quote ${fitted.quote.number} v2`).waitFor();
  await riderPage.page.getByText(new RegExp(`^Front spring .* → ${formatNumber(forkSpring.rateNmm, 1)} N/mm$`)).waitFor();
  await screenshot(riderPage.page, 'desk-rider-setup-log-phone');
  expect(customer.errors).toEqual([]);
  expect(riderPage.errors).toEqual([]);

  await Promise.all([wide.context.close(), customer.context.close(), riderPage.context.close()]);
});

test('a paid quote cancelled at the desk shows the deposit refunded', async () => {
  const { riderToken, bikeId } = await riderBike('Cancel bike');
  const deskToken = await signInApi(desk.email);
  const draft = await draftWithStockedSpring(deskToken, riderToken, bikeId);
  await call('POST', `/quotes/${draft.id}/send`, deskToken);
  await call('POST', `/quotes/${draft.id}/accept`, deskToken, {});
  const paid = await call<{ quote: QuoteView }>('POST', `/quotes/${draft.id}/pay-deposit`, deskToken, { paymentMethod: 'pm_card_visa' });
  expect(paid.quote.paidCents).toBeGreaterThan(0);

  const phone = await signedIn('phone', desk.email, '/desk');
  await phone.page.goto(`${live.server.url}/desk/quotes/${draft.id}`);
  await visible(phone.page, 'quote-status').getByText('Deposit paid').waitFor();
  await phone.page.getByRole('button', { name: 'Cancel the quote' }).click();
  await visible(phone.page, 'quote-status').getByText('Cancelled').waitFor();
  const refunded = await visible(phone.page, 'total-refunded').innerText();
  await phone.page.getByRole('status').getByText(`Cancelled; ${refunded} refunded.`).waitFor();
  expect(await visible(phone.page, 'closed-note').innerText()).toBe(`Cancelled. The deposit of ${refunded} went back to the customer's card.`);
  const after = await call<{ quote: QuoteView }>('GET', `/quotes/${draft.id}`, deskToken);
  // A cancelled paid quote refunds the whole deposit (issue 7).
  expect(after.quote.refundedCents).toBe(paid.quote.paidCents);
  await screenshot(phone.page, 'desk-quote-cancelled-phone');
  expect(phone.errors).toEqual([]);
  await phone.context.close();
});

test("the counter takes a paid quote's spring over the quote; the desk and the customer see it, and the cancel refunds the deposit", async () => {
  const { riderToken, bikeId } = await riderBike('Override bike');
  const deskToken = await signInApi(desk.email);
  const draft = await draftWithStockedSpring(deskToken, riderToken, bikeId);
  const known = await quoteLinks();
  await call('POST', `/quotes/${draft.id}/send`, deskToken);
  const link = await nextQuoteLink(known);
  const token = link.split('/').at(-1)!;
  await call('POST', `/customer-quotes/${token}/accept`, undefined, {});
  const paid = await call<{ quote: QuoteView }>('POST', `/customer-quotes/${token}/pay-deposit`, undefined, { paymentMethod: 'pm_card_visa' });
  expect(paid.quote.status).toBe('deposit-paid');
  const springId = draft.lines.find((line) => line.kind === 'spring')!.springId!;

  const clerk = await signedIn('wide', counter.email, '/counter');
  await clerk.page.goto(`${live.server.url}/counter/springs/${springId}`);
  const hold = clerk.page.locator('[data-testid^="hold-"]:visible').filter({ hasText: `Quote ${draft.number}` });
  await hold.getByText(/Deposit paid · 1 held$/).waitFor();
  await hold.getByRole('button', { name: /over the quote…$/ }).click();
  await hold.getByLabel('Why the quote cannot keep them').fill('Needed for a walk-in');
  await screenshot(clerk.page, 'counter-release-over-quote-wide');
  await hold.getByRole('button', { name: 'Release over the quote' }).click();
  await clerk.page.getByRole('status').getByText(/^Released from hold #\d+: reserved is now \d+\.$/).waitFor();
  expect(await hold.count()).toBe(0);

  const phone = await signedIn('phone', desk.email, '/desk');
  await phone.page.goto(`${live.server.url}/desk/quotes/${draft.id}`);
  await visible(phone.page, 'quote-status').getByText('Springs released').waitFor();
  await visible(phone.page, 'springs-released-note').getByText(/cannot be fitted as quoted\. Cancel it to refund the deposit of /).waitFor();
  await visible(phone.page, 'quote-history').getByText(/Needed for a walk-in/).waitFor();
  expect(await phone.page.getByRole('button', { name: 'Mark as fitted' }).count()).toBe(0);
  await screenshot(phone.page, 'desk-quote-springs-released-phone');

  const customer = await openPage(live.browser, 'phone');
  await customer.page.goto(`${live.server.url}${link}`);
  await visible(customer.page, 'quote-status').getByText('Springs released').waitFor();
  await visible(customer.page, 'springs-released').getByText(/is refunded in full when the quote is closed\.$/).waitFor();
  await screenshot(customer.page, 'desk-customer-springs-released-phone');

  await phone.page.getByRole('button', { name: 'Cancel the quote' }).click();
  await visible(phone.page, 'quote-status').getByText('Cancelled').waitFor();
  const after = await call<{ quote: QuoteView }>('GET', `/quotes/${draft.id}`, deskToken);
  expect(after.quote.refundedCents).toBe(paid.quote.paidCents);
  expect([...clerk.errors, ...phone.errors, ...customer.errors]).toEqual([]);
  await Promise.all([clerk.context.close(), phone.context.close(), customer.context.close()]);
});

describe.each(['phone', 'wide'] as const)('the desk screens at %s size', (size) => {
  test('board, customer page, readings screen and quote editor', async () => {
    const { riderToken, bikeId } = await riderBike(`Screens bike ${size}`);
    const deskToken = await signInApi(desk.email);
    const draft = await draftWithStockedSpring(deskToken, riderToken, bikeId);
    const customerId = await riderId(deskToken);

    const { page, errors, context } = await signedIn(size, desk.email, '/desk');
    await page.getByRole('heading', { name: 'Quotes', level: 1 }).waitFor();
    if (size === 'phone') {
      // A phone shows one status at a time: the drafts, then the cancelled ones.
      await visible(page, `quote-card-${draft.number}`).waitFor();
      await screenshot(page, 'desk-board-drafts-phone');
      await page.getByRole('radio', { name: /^Cancelled/ }).click();
      await page.getByText('No quotes are cancelled.').or(page.locator('[data-testid^="quote-card-"]:visible')).first().waitFor();
      expect(await visible(page, `quote-card-${draft.number}`).count()).toBe(0);
      await screenshot(page, 'desk-board-cancelled-phone');
    } else {
      await visible(page, 'board-column-draft').getByText(rider.name).first().waitFor();
      await screenshot(page, 'desk-board-columns-wide');
    }

    await page.goto(`${live.server.url}/desk/customers/${customerId}?name=${encodeURIComponent(rider.name)}`);
    await visible(page, `customer-bike-${bikeId}`).waitFor();
    await screenshot(page, `desk-customer-page-${size}`);

    await visible(page, `size-from-readings-${bikeId}`).click();
    await page.getByRole('heading', { name: `Readings: Screens bike ${size}`, level: 1 }).waitFor();
    await screenshot(page, `desk-readings-${size}`);

    await page.goto(`${live.server.url}/desk/quotes/${draft.id}`);
    await page.getByRole('heading', { name: `Quote ${draft.number}`, level: 1 }).waitFor();
    await visible(page, 'total-total').waitFor();
    await page.locator('[role="button"][aria-label^="Add KF"]:visible').first().waitFor();
    await screenshot(page, `desk-quote-editor-${size}`);
    expect(errors).toEqual([]);
    await context.close();
  });
});
