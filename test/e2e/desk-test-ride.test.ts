/**
 * The test-ride loop at the service desk and the damping rules, in a real browser against the real
 * server, wide (1280x800):
 * - over the API, the demo rider adds a bike from the demo tourer (fork rebound, shock rebound and
 *   compression, each at its maker's standard), reports a ride and makes the proposed change;
 * - the desk opens the rider's customer page and finds the bike's dampers (set now and the maker's
 *   standard) and that ride with its status; opens the loop, says how the change rode, reports a
 *   new ride for the customer, makes the change and finds its entry in the setup log and the new
 *   setting among the dampers;
 * - the quote's fitting page lists the dampers to the maker's standard, then to the baseline;
 * - the admin adds a rule of the shop's own and finds it listed in its place, and the audit names it;
 * - the rules screen at phone size (390x844) for the desk and the admin, with screenshots.
 * Every sentence checked is the server's own (a ride's status, a log entry's note, a plan's step).
 * Chromium logs every 4xx as a console error and the pages must log none, so nothing here asks for
 * what the server refuses.
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import type { GarageBike } from '../../shared/types/garage';
import type { SetupLog } from '../../shared/types/setup-log';
import type { DampingRuleList, DamperPlans, TestRideChanged, TestRideList, TestRideReported } from '../../shared/types/test-ride';
import type { QuoteView } from '../../shared/types/quote';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot, type ViewportName } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(300_000);

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
const rider = account('rider');
const desk = account('desk');
const admin = account('admin');

const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

const WEIGH_IN = { bodyKg: 82, gear: {}, loads: [], discipline: 'road', position: 'neutral' };

const visible = (page: Page, id: string) => page.locator(`[data-testid="${id}"]:visible`);

/**
 * What inside `within` is drawn past the window's right edge: each element's test id or its first
 * words.
 * react-native-web's scroll views hide what overflows sideways instead of scrolling the document,
 * so a row cut at the screen's edge shows here and not in the document's width.
 */
const pastRightEdge = (page: Page, within: string) =>
  page.evaluate(
    (selector) =>
      [...document.querySelectorAll(`${selector} *`)]
        .filter((node) => (node as HTMLElement).offsetParent !== null && node.getBoundingClientRect().right > window.innerWidth + 0.5)
        .map((node) => node.getAttribute('data-testid') ?? (node.textContent ?? '').slice(0, 40)),
    within,
  );

async function signedIn(size: ViewportName, email: string, landing: string) {
  const watched = await openPage(live.browser, size);
  await watched.page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(watched.page, email, DEMO_PASSWORD);
  await waitForPath(watched.page, landing);
  return watched;
}

/** The demo rider's new tourer, with one ride reported at the shock and its change made. */
async function bikeWithOneRide() {
  const riderToken = await signInApi(rider.email);
  const { models } = await call<{ models: { id: number; name: string }[] }>('GET', '/bike-models', riderToken);
  const model = models.find((m) => m.name === 'Harrow 900 Tourer')!;
  const { bike } = await call<{ bike: GarageBike }>('POST', '/bikes', riderToken, { modelId: model.id, nickname: 'Loop tourer' });
  const report = await call<TestRideReported>('POST', `/bikes/${bike.id}/test-rides`, riderToken, {
    end: 'rear',
    symptom: 'bounces-after-bump',
    strength: 'clear',
    note: 'Over the level crossing.',
  });
  expect(report.ride.proposal.kind).toBe('change');
  const made = await call<TestRideChanged>('POST', `/test-rides/${report.ride.id}/made`, riderToken);
  return { riderToken, bike, rideId: report.ride.id, firstEntryId: made.entry.id };
}

test('the desk runs the test-ride loop with the customer, and the admin adds a damping rule', async () => {
  const { riderToken, bike, rideId, firstEntryId } = await bikeWithOneRide();
  const deskToken = await signInApi(desk.email);
  const { customers } = await call<{ customers: { id: number; email: string }[] }>('GET', `/customers?q=${encodeURIComponent(rider.email)}`, deskToken);
  const customerId = customers.find((c) => c.email === rider.email)!.id;
  const rides = await call<TestRideList>('GET', `/bikes/${bike.id}/test-rides`, deskToken);
  const shockRebound = bike.rear!.dampers.find((damper) => damper.kind === 'rebound')!;

  // The customer page, closed: the dampers as set and their standard, and the ride with where it stands.
  const wide = await signedIn('wide', desk.email, '/desk');
  await wide.page.goto(`${live.server.url}/desk/customers/${customerId}?name=${encodeURIComponent(rider.name)}`);
  const card = visible(wide.page, `customer-bike-${bike.id}`);
  await visible(wide.page, `bike-ride-${rideId}-status`).waitFor();
  expect(await visible(wide.page, `bike-ride-${rideId}-status`).innerText()).toBe(rides.rides[0].statusText);
  const { bike: afterFirst } = await call<{ bike: GarageBike }>('GET', `/bikes/${bike.id}`, deskToken);
  const reboundNow = afterFirst.rear!.dampers.find((damper) => damper.kind === 'rebound')!.position;
  expect(reboundNow).not.toBe(shockRebound.position);
  expect(await visible(wide.page, `bike-damper-${bike.id}-rear-rebound`).innerText()).toBe(
    `Rebound ${reboundNow} clicks out · maker’s standard ${shockRebound.standard} clicks out`,
  );
  expect(await visible(wide.page, `bike-damper-${bike.id}-front-rebound`).innerText()).toBe('Rebound 8 clicks out · maker’s standard 8 clicks out');
  await card.scrollIntoViewIfNeeded();
  await screenshot(wide.page, 'desk-test-ride-customer-wide');

  // Opened: the loop and the setup log, newest first.
  await visible(wide.page, `bike-damping-toggle-${bike.id}`).click();
  const loop = card.locator('[data-testid="ride-loop"]');
  await loop.waitFor();
  const firstEntry = visible(wide.page, `desk-log-entry-${firstEntryId}`);
  await firstEntry.waitFor();
  const log = await call<SetupLog>('GET', `/bikes/${bike.id}/setup-log`, deskToken);
  expect(await firstEntry.innerText()).toContain(log.entries.at(-1)!.note);

  // The customer says the change rode better, then reports the fork bouncing after a bump.
  await loop.getByTestId('ride-outcome').getByRole('radio', { name: 'Better' }).click();
  await loop.getByRole('button', { name: 'Save how it rode' }).click();
  const report = loop.getByTestId('ride-report');
  await report.waitFor();
  await report.getByRole('radio', { name: 'Front (fork)' }).click();
  await report.getByTestId('symptom-bounces-after-bump').click();
  await report.getByLabel('Note (optional)').fill('Told at the counter: the fork bobs after speed humps.');
  await report.getByRole('button', { name: 'Propose one change' }).click();
  const proposal = loop.getByTestId('ride-proposal');
  await proposal.getByTestId('ride-made').waitFor();
  await screenshot(wide.page, 'desk-test-ride-proposal-wide');
  const open = (await call<TestRideList>('GET', `/bikes/${bike.id}/test-rides`, deskToken)).open!;
  expect(open.proposal.kind).toBe('change');
  expect(open.end).toBe('front');
  await proposal.getByTestId('ride-made').click();
  await loop.getByTestId('ride-notice').waitFor();

  // The change is in the log, newest first, as the server wrote it, and the fork's rebound moved.
  const after = await call<SetupLog>('GET', `/bikes/${bike.id}/setup-log`, deskToken);
  const newest = after.entries.at(-1)!;
  expect(newest.id).not.toBe(firstEntryId);
  const newEntry = visible(wide.page, `desk-log-entry-${newest.id}`);
  await newEntry.waitFor();
  expect(await newEntry.innerText()).toContain(newest.note);
  const entries = card.locator('[data-testid^="desk-log-entry-"]');
  expect(await entries.first().getAttribute('data-testid')).toBe(`desk-log-entry-${newest.id}`);
  const change = open.proposal.kind === 'change' ? open.proposal.change : null;
  expect(newest.changes).toEqual([expect.objectContaining({ end: 'front', setting: 'damper', adjuster: change!.adjuster, from: change!.from, to: change!.to })]);
  await newEntry.scrollIntoViewIfNeeded();
  await screenshot(wide.page, 'desk-test-ride-made-wide');

  // Closed again, the bike's lines show the new setting and the rides newest first.
  await visible(wide.page, `bike-damping-toggle-${bike.id}`).click();
  await visible(wide.page, `bike-damper-${bike.id}-front-rebound`).getByText(`Rebound ${change!.to} clicks out`).waitFor();
  const rideIds = await card.locator('[data-testid^="bike-ride-"][data-testid$="-status"]').evaluateAll((nodes) => nodes.map((node) => node.getAttribute('data-testid')));
  expect(rideIds).toEqual([`bike-ride-${open.id}-status`, `bike-ride-${rideId}-status`]);
  expect(wide.errors).toEqual([]);

  // The same page on a phone: nothing wider than the screen, closed and open.
  const phoneDesk = await signedIn('phone', desk.email, '/desk');
  await phoneDesk.page.goto(`${live.server.url}/desk/customers/${customerId}?name=${encodeURIComponent(rider.name)}`);
  const phoneCard = visible(phoneDesk.page, `customer-bike-${bike.id}`);
  await visible(phoneDesk.page, `bike-damper-${bike.id}-front-rebound`).scrollIntoViewIfNeeded();
  await screenshot(phoneDesk.page, 'desk-test-ride-customer-phone');
  await visible(phoneDesk.page, `bike-damping-toggle-${bike.id}`).click();
  await phoneCard.locator('[data-testid="ride-loop"]').waitFor();
  await visible(phoneDesk.page, `desk-log-entry-${firstEntryId}`).scrollIntoViewIfNeeded();
  await screenshot(phoneDesk.page, 'desk-test-ride-customer-open-phone');
  expect(await pastRightEdge(phoneDesk.page, `[data-testid="customer-bike-${bike.id}"]`)).toEqual([]);
  expect(phoneDesk.errors).toEqual([]);
  await phoneDesk.context.close();

  // The fitting page of a quote for the bike: to the maker's standard, then back to the baseline.
  await call('PUT', '/weigh-in', riderToken, WEIGH_IN);
  const { record } = await call<{ record: { id: number } }>('POST', `/bikes/${bike.id}/sizing-records`, riderToken, { ends: ['front', 'rear'] });
  const { quote } = await call<{ quote: QuoteView }>('POST', '/quotes', deskToken, { sizingRecordId: record.id });
  const plans = await call<DamperPlans>('GET', `/bikes/${bike.id}/damper-plans`, deskToken);
  await wide.page.goto(`${live.server.url}/desk/quotes/${quote.id}/print`);
  await visible(wide.page, 'fitting-dampers').waitFor();
  for (const end of ['front', 'rear'] as const) {
    const steps = plans[end]!.standard.steps;
    expect(steps.length).toBeGreaterThan(0);
    for (const [index, step] of steps.entries()) {
      expect(await visible(wide.page, `fitting-${end}-standard-step-${index}`).innerText()).toBe(step.instruction);
    }
  }
  // The shock's compression was never moved; and the demo bike came at its standards, so the
  // baseline is the standard: nothing more to turn after step 1.
  expect(await visible(wide.page, 'fitting-rear-standard-already').innerText()).toBe('Already there: Rear compression at 10 clicks out.');
  expect(await visible(wide.page, 'fitting-rear-baseline-already').innerText()).toBe(
    'Nothing to turn; already there: Rear rebound at 12 clicks out, Rear compression at 10 clicks out.',
  );
  await visible(wide.page, 'fitting-dampers-caution').getByText(/maker’s manual/).waitFor();
  await visible(wide.page, 'fitting-dampers').scrollIntoViewIfNeeded();
  await screenshot(wide.page, 'desk-test-ride-fitting-wide');
  expect(wide.errors).toEqual([]);
  await wide.context.close();

  // The admin adds a row of the shop's own; it is listed in its group, tried after the seeded rows.
  const adminPage = await signedIn('wide', admin.email, '/admin');
  await adminPage.page.goto(`${live.server.url}/admin/damping-rules`);
  await adminPage.page.getByRole('heading', { name: 'Damping rules', level: 1 }).waitFor();
  await visible(adminPage.page, 'damper-kind-rebound').waitFor();
  await visible(adminPage.page, 'rule-add-open').click();
  const form = visible(adminPage.page, 'rule-add');
  await form.getByRole('radio', { name: 'Squats under power' }).click();
  await form.getByRole('radio', { name: 'Rear (shock)' }).click();
  await form.getByRole('radio', { name: 'High-speed compression' }).click();
  await form.getByRole('radio', { name: 'More damping (turn in)' }).click();
  await form.getByLabel('Priority').fill('5');
  await form.getByLabel('Why this change helps').fill('On the workshop’s demo shocks a hard squat over broken tarmac also rides on the high-speed circuit.');
  await form.getByLabel('What to feel for on the next ride').fill('The rear stays up when you open the throttle over bumps.');
  await screenshot(adminPage.page, 'desk-test-ride-rule-form-wide');
  await form.getByRole('button', { name: 'Add the rule' }).click();
  await visible(adminPage.page, 'rule-added').waitFor();
  const adminToken = await signInApi(admin.email);
  const { rules } = await call<DampingRuleList>('GET', '/damping-rules', adminToken);
  const added = rules.find((rule) => rule.source === 'shop' && rule.symptom === 'squats-throttle')!;
  expect(added).toMatchObject({ end: 'rear', adjuster: 'hs-compression', direction: 'more', priority: 5, active: true });
  const group = visible(adminPage.page, 'rule-group-squats-throttle-rear');
  const row = group.locator(`[data-testid="rule-${added.id}"]`);
  await row.waitFor();
  expect(await row.getByTestId(`rule-${added.id}-direction`).innerText()).toBe('more damping (turn in)');
  expect(await row.getByTestId(`rule-${added.id}-source`).innerText()).toBe('added by the shop');
  // The seed has two rows for a squatting shock (low-speed compression 1, compression 2): priority 5 comes third.
  const seeded = rules.filter((rule) => rule.symptom === 'squats-throttle' && rule.end === 'rear' && rule.source === 'common-practice');
  expect(seeded.map((rule) => [rule.adjuster, rule.priority])).toEqual([
    ['ls-compression', 1],
    ['compression', 2],
  ]);
  expect(await row.getByTestId(`rule-${added.id}-state`).innerText()).toBe('Active, tried 3rd');
  const groupRows = await group.locator('[data-testid^="rule-"][role="listitem"]').evaluateAll((nodes) => nodes.map((node) => node.getAttribute('data-testid')));
  expect(groupRows.at(-1)).toBe(`rule-${added.id}`);
  await row.scrollIntoViewIfNeeded();
  await screenshot(adminPage.page, 'desk-test-ride-rules-admin-wide');

  // The audit names the new row in words.
  await adminPage.page.goto(`${live.server.url}/admin/audit`);
  await adminPage.page.getByRole('radio', { name: 'Damping rules' }).click();
  await adminPage.page.getByText(`Damping rule ${added.id} created`).waitFor();
  await adminPage.page.getByText('Squats under power, rear (shock): High-speed compression, more damping (turn in)').waitFor();
  await screenshot(adminPage.page, 'desk-test-ride-audit-wide');
  expect(adminPage.errors).toEqual([]);
  await adminPage.context.close();

  // The rules screen at phone size, for the desk (read and add) and the admin (edit too).
  for (const [who, email, path] of [
    ['desk', desk.email, '/desk'],
    ['admin', admin.email, '/admin'],
  ] as const) {
    const phone = await signedIn('phone', email, path);
    await phone.page.goto(`${live.server.url}${path}/damping-rules`);
    await visible(phone.page, `rule-${added.id}`).waitFor();
    expect(await visible(phone.page, `rule-${added.id}-edit`).count()).toBe(who === 'admin' ? 1 : 0);
    await screenshot(phone.page, `desk-test-ride-rules-${who}-phone`);
    expect(await pastRightEdge(phone.page, '#root')).toEqual([]);
    if (who === 'desk') {
      await visible(phone.page, 'rule-add-open').click();
      await visible(phone.page, 'rule-add').getByRole('radio', { name: 'Chatters in corners' }).scrollIntoViewIfNeeded();
      await screenshot(phone.page, 'desk-test-ride-rule-form-phone');
    }
    if (who === 'admin') {
      await visible(phone.page, `rule-${added.id}-edit`).click();
      await visible(phone.page, `rule-${added.id}-priority`).waitFor();
      await visible(phone.page, `rule-${added.id}`).scrollIntoViewIfNeeded();
      await screenshot(phone.page, 'desk-test-ride-rule-edit-phone');
    }
    expect(phone.errors).toEqual([]);
    await phone.context.close();
  }
});
