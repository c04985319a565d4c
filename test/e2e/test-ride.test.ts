/**
 * The test-ride loop in a real browser at phone size. The rider enters a low-speed rebound
 * adjuster and its maker's standard through the bike form, reports that the rear keeps bouncing
 * after a bump, makes the proposed rebound change, finds it worse and turns it back; the same
 * report then gets a different change (the low-speed rebound), which rides better; the rear goes
 * back to the maker's standard. The setup log lists each move with its units and the printed sheet
 * carries the plans. Every sentence on screen is compared with the API's own answer.
 *
 * Hand-worked steps (shared/damping/step-size.ts, a clear feeling): rebound, 24 clicks:
 * min(2, floor(24 / 6)) = 2 clicks in, 12 -> 10. Low-speed rebound, 20 clicks: min(2, floor(20 / 6))
 * = 2 clicks in, 14 -> 12; its standard is 10. The tourer's figures are the demo seed's (invented).
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import type { Bike } from '../../shared/types/bike';
import type { SizingRecord } from '../../shared/types/garage';
import type { SetupLog } from '../../shared/types/setup-log';
import type { DamperPlans, TestRideList } from '../../shared/types/test-ride';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(240_000);

const rider = DEMO_ACCOUNTS.find((account) => account.role === 'rider')!;
const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

const WEIGH_IN = {
  bodyKg: 82,
  gear: { helmet: 1.5, jacket: 2.5, trousers: 1.5, boots: 2.5, gloves: 0.3 },
  loads: [],
  discipline: 'road',
  position: 'neutral',
};

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]:visible`);

async function expectNoSideScroll(page: Page, width: number) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
}

/** Reports a symptom at the rear through the form and waits for the proposal card. */
async function reportBounce(page: Page) {
  const form = byTestId(page, 'ride-report');
  await form.getByRole('radio', { name: 'Rear (shock)' }).click();
  await form.getByRole('radio', { name: 'Keeps bouncing after a bump' }).click();
  await form.getByRole('radio', { name: 'Clear' }).click();
  await form.getByRole('button', { name: 'Propose one change' }).click();
  await byTestId(page, 'ride-proposal').waitFor();
}

/** The proposal card's words, as shown. */
async function proposalOnScreen(page: Page) {
  const text = (id: string) => byTestId(page, id).innerText();
  return { adjuster: await text('proposal-adjuster'), way: await text('proposal-way'), amount: await text('proposal-amount'), fromTo: await text('proposal-from-to') };
}

async function judge(page: Page, outcome: 'Better' | 'Worse', note: string) {
  const form = byTestId(page, 'ride-outcome');
  await form.waitFor();
  await form.getByRole('radio', { name: outcome }).click();
  await byTestId(page, 'ride-outcome-note').fill(note);
  await form.getByRole('button', { name: 'Save how it rode' }).click();
  // Judged: the card closes once the server has the verdict and the rides are read again.
  await form.waitFor({ state: 'detached' });
}

test('a bounce is worked through one change at a time, undone when worse, and set back to the maker’s standard', async () => {
  const token = await signInApi(rider.email);
  await call('PUT', '/weigh-in', token, WEIGH_IN);
  const { models } = await call<{ models: { id: number; name: string }[] }>('GET', '/bike-models', token);
  const model = models.find((m) => m.name === 'Harrow 900 Tourer')!;
  const { bike } = await call<{ bike: Bike }>('POST', '/bikes', token, { modelId: model.id, nickname: 'Loop Harrow' });
  const rides = () => call<TestRideList>('GET', `/bikes/${bike.id}/test-rides`, token);

  const { page, errors, context } = await openPage(live.browser, 'phone');
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, rider.email, DEMO_PASSWORD);
  await waitForPath(page, '/rider');

  // The bike form: the shock's low-speed rebound, with its maker's standard, set 4 clicks out from it.
  await page.goto(`${live.server.url}/rider/bikes/${bike.id}`);
  await byTestId(page, 'add-damper-rear-ls-rebound').click();
  await byTestId(page, 'field-rear-damper-ls-rebound-maxPosition').fill('20');
  await byTestId(page, 'field-rear-damper-ls-rebound-standard').fill('10');
  await byTestId(page, 'field-rear-damper-ls-rebound-position').fill('14');
  await page.getByRole('button', { name: 'Save corrections' }).click();
  const summary = byTestId(page, 'dampers-summary');
  await byTestId(page, 'dampers-rear-ls-rebound').waitFor();
  expect(await byTestId(page, 'dampers-rear-ls-rebound-now').innerText()).toBe('14 clicks out');
  expect(await byTestId(page, 'dampers-rear-ls-rebound-standard').innerText()).toBe('maker’s standard 10 clicks out');
  expect(await byTestId(page, 'dampers-rear-rebound-now').innerText()).toBe('12 clicks out');
  expect(await byTestId(page, 'dampers-rear-rebound-standard').innerText()).toBe('maker’s standard 12 clicks out');
  const stored = (await call<{ bike: Bike }>('GET', `/bikes/${bike.id}`, token)).bike;
  expect(stored.rear!.dampers.find((d) => d.kind === 'ls-rebound')).toEqual({ kind: 'ls-rebound', unit: 'clicks', maxPosition: 20, standard: 10, position: 14, dampingPerStepNsPerM: null });
  await summary.scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-bike-phone');

  // A pass from the weights: the first setup-log entry, whose settings are the baseline.
  const { record } = await call<{ record: SizingRecord }>('POST', `/bikes/${bike.id}/sizing-records`, token, { ends: ['front', 'rear'] });

  await page.goto(`${live.server.url}/rider/bikes/${bike.id}`);
  await byTestId(page, 'open-test-ride').click();
  await waitForPath(page, `/rider/bikes/${bike.id}/ride`);
  await page.getByRole('heading', { name: 'Test ride', level: 1 }).waitFor();
  await screenshot(page, 'test-ride-start-phone');

  // First report: rebound, turned in 2 clicks.
  await reportBounce(page);
  const first = (await rides()).open!;
  expect(first.proposal.kind).toBe('change');
  const firstChange = first.proposal.kind === 'change' ? first.proposal.change : null;
  expect(firstChange).toMatchObject({ end: 'rear', adjuster: 'rebound', direction: 'more', from: 12, to: 10 });
  expect(await proposalOnScreen(page)).toEqual({ adjuster: 'Rear rebound', way: 'Turn in (clockwise)', amount: '2 clicks', fromTo: 'from 12 to 10 clicks out from fully closed' });
  expect(firstChange!.instruction).toBe('Rear rebound: turn in (clockwise) 2 clicks, from 12 to 10 out from fully closed.');
  await expectNoSideScroll(page, 390);
  await byTestId(page, 'ride-proposal').scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-proposal-phone');

  await page.getByRole('button', { name: 'I made this change' }).click();
  await judge(page, 'Worse', 'Kicks on the bypass');

  // Worse: the way back, as the API plans it.
  const undo = byTestId(page, `ride-undo-${first.id}`);
  await undo.waitFor();
  const worse = (await rides()).rides.find((ride) => ride.id === first.id)!;
  expect(worse.undoPlan!.steps.map((step) => step.instruction)).toEqual(['Rear rebound: turn out (counter-clockwise) 2 clicks, back to 12 out from fully closed.']);
  expect(await byTestId(page, 'ride-undo-step-0').innerText()).toBe(`1. ${worse.undoPlan!.steps[0].instruction}`);
  expect(await page.getByRole('button', { name: 'I made this change' }).count()).toBe(0);
  await undo.scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-undo-phone');
  await byTestId(page, `ride-undone-${first.id}`).click();
  await undo.waitFor({ state: 'detached' });
  expect((await call<{ bike: Bike }>('GET', `/bikes/${bike.id}`, token)).bike.rear!.dampers.find((d) => d.kind === 'rebound')!.position).toBe(12);

  // The same report again: the rebound rode worse, so the next row, the low-speed rebound.
  await reportBounce(page);
  const second = (await rides()).open!;
  const secondChange = second.proposal.kind === 'change' ? second.proposal.change : null;
  expect(secondChange).toMatchObject({ end: 'rear', adjuster: 'ls-rebound', direction: 'more', from: 14, to: 12 });
  const secondWords = await proposalOnScreen(page);
  expect(secondWords).toEqual({ adjuster: 'Rear low-speed rebound', way: 'Turn in (clockwise)', amount: '2 clicks', fromTo: 'from 14 to 12 clicks out from fully closed' });
  expect(secondWords.adjuster).not.toBe('Rear rebound');
  await byTestId(page, 'ride-proposal').scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-second-proposal-phone');
  await page.getByRole('button', { name: 'I made this change' }).click();
  await judge(page, 'Better', 'Settles in one');
  const better = (await rides()).rides[0];
  expect(better.outcome?.outcome).toBe('better');
  // The notice said "Made" a moment ago; it now says where the judged ride stands.
  await byTestId(page, 'ride-notice').getByText(better.statusText).waitFor();

  // Back to the maker's standard for the rear: the low-speed rebound from the closed stop to 10.
  const plans = await call<DamperPlans>('GET', `/bikes/${bike.id}/damper-plans`, token);
  const standard = plans.rear!.standard;
  expect(standard.steps.map((step) => step.instruction)).toEqual(['Rear low-speed rebound: turn in (clockwise) until it stops, then out 10 clicks.']);
  expect(await byTestId(page, 'plan-rear-standard-step-0').innerText()).toBe(`1. ${standard.steps[0].instruction}`);
  expect(await byTestId(page, 'plan-rear-baseline-step-0').innerText()).toBe(`1. ${plans.rear!.baseline.steps[0].instruction}`);
  expect(await byTestId(page, 'plan-front-standard-apply').isDisabled()).toBe(true);
  await byTestId(page, 'plans-rear').scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-plans-phone');
  await byTestId(page, 'plan-rear-standard-apply').click();
  expect(await byTestId(page, 'plan-rear-standard-done').innerText()).toBe("Back to the maker's standard (rear damping): in the setup log.");
  await byTestId(page, 'plan-rear-standard-at-target').waitFor();
  expect(await byTestId(page, 'plan-rear-standard-apply').isDisabled()).toBe(true);
  await expectNoSideScroll(page, 390);
  await byTestId(page, 'ride-history').scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-history-phone');

  // The setup log: the pass, then each move with its units and its note.
  const log = await call<SetupLog>('GET', `/bikes/${bike.id}/setup-log`, token);
  expect(log.entries.map((entry) => entry.kind)).toEqual(['pass', 'change', 'change', 'change', 'change']);
  const expected = [
    ['Rear rebound 12 → 10 clicks out', 'Test ride: Keeps bouncing after a bump: Rear rebound: turn in (clockwise) 2 clicks, from 12 to 10 out from fully closed.'],
    ['Rear rebound 10 → 12 clicks out', 'Test ride undone: Keeps bouncing after a bump: Rear rebound: turn out (counter-clockwise) 2 clicks, back to 12 out from fully closed.'],
    ['Rear low-speed rebound 14 → 12 clicks out', 'Test ride: Keeps bouncing after a bump: Rear low-speed rebound: turn in (clockwise) 2 clicks, from 14 to 12 out from fully closed.'],
    ['Rear low-speed rebound 12 → 10 clicks out', "Back to the maker's standard (rear damping)"],
  ];
  await page.goto(`${live.server.url}/rider/bikes/${bike.id}/log`);
  for (const [index, [change, note]] of expected.entries()) {
    const entry = log.entries[index + 1];
    expect(entry.note).toBe(note);
    const card = byTestId(page, `log-entry-${entry.id}`);
    await card.waitFor();
    const text = await card.innerText();
    expect(text).toContain(change);
    expect(text).toContain(note);
  }
  await byTestId(page, `log-entry-${log.entries[1].id}`).scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-log-phone');

  // The printed sheet of the pass: the dampers as set, and both ways back per end.
  await page.goto(`${live.server.url}/rider/results/${record.id}/sheet`);
  const sheet = byTestId(page, 'sheet-dampers');
  await sheet.waitFor();
  const after = await call<DamperPlans>('GET', `/bikes/${bike.id}/damper-plans`, token);
  expect(after.rear!.standard.atTarget).toBe(true);
  expect(await byTestId(page, 'sheet-plan-rear-standard').innerText()).toContain('Already there.');
  // Back to the baseline (the pass's settings): the low-speed rebound to 14 again.
  expect(after.rear!.baseline.steps.map((step) => step.instruction)).toEqual(['Rear low-speed rebound: turn in (clockwise) until it stops, then out 14 clicks.']);
  expect(await byTestId(page, 'sheet-plan-rear-baseline').innerText()).toContain(`1. ${after.rear!.baseline.steps[0].instruction}`);
  expect(await byTestId(page, 'sheet-dampers-rear-ls-rebound-now').innerText()).toBe('10 clicks out');
  expect(await byTestId(page, 'sheet-dampers-rear-ls-rebound-standard').innerText()).toBe('maker’s standard 10 clicks out');
  expect(await byTestId(page, 'sheet-dampers-front-rebound-now').innerText()).toBe('8 clicks out');
  expect(await byTestId(page, 'sheet-dampers-front-rebound-standard').innerText()).toBe('maker’s standard 8 clicks out');
  await expectNoSideScroll(page, 390);
  await sheet.scrollIntoViewIfNeeded();
  await screenshot(page, 'test-ride-sheet-phone');
  expect(errors).toEqual([]);
  await context.close();

  // The same screen on a laptop.
  const wide = await openPage(live.browser, 'wide');
  await wide.page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(wide.page, rider.email, DEMO_PASSWORD);
  await waitForPath(wide.page, '/rider');
  await wide.page.goto(`${live.server.url}/rider/bikes/${bike.id}/ride`);
  await byTestId(wide.page, 'ride-report').waitFor();
  await expectNoSideScroll(wide.page, 1280);
  await screenshot(wide.page, 'test-ride-wide');
  expect(wide.errors).toEqual([]);
  await wide.context.close();
});
