/**
 * The rider's whole pass in a real browser at phone size: add a bike from a shop model, weigh in,
 * measure both ends with pushed and lifted readings (closing the tab halfway and resuming), and
 * read the result; every figure on it must equal the engine's own answer (POST /api/sizing) to
 * the stored request. Then the preload change goes in the setup log, a re-measure follows, and
 * back to baseline lists the undo. At wide size the result sits in two columns.
 *
 * Hand-worked check: static sag = extended − mean(pushed, lifted) = 560 − (534 + 538) / 2 = 24 mm.
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { formatNumber } from '../../shared/sizing/format';
import type { BikeSpec } from '../../shared/types/bike';
import type { SizingRecord } from '../../shared/types/garage';
import type { EndResult, SizingResult } from '../../shared/types/sizing';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(240_000);

const rider = DEMO_ACCOUNTS.find((account) => account.role === 'rider')!;

/** Readings in mm: extended, then [pushed, lifted] on its wheels and with the rider aboard. */
type EndReadings = { extended: string; static: readonly [string, string]; rider: readonly [string, string] };

const READINGS: Record<'front' | 'rear', EndReadings> = {
  front: { extended: '560', static: ['534', '538'], rider: ['517', '523'] },
  rear: { extended: '600', static: ['564', '567'], rider: ['514', '518'] },
};

const REMEASURE: Record<'front' | 'rear', EndReadings> = {
  front: { extended: '560', static: ['535', '538'], rider: ['518', '523'] },
  rear: { extended: '600', static: ['585', '588'], rider: ['535', '539'] },
};

const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]:visible`);

async function signIn(page: Page) {
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, rider.email, DEMO_PASSWORD);
  await waitForPath(page, '/rider');
  await page.getByRole('heading', { name: 'Garage', level: 1 }).waitFor();
}

async function next(page: Page) {
  await byTestId(page, 'flow-next').click();
}

async function measureEnd(page: Page, end: 'front' | 'rear', values: EndReadings, shots: boolean) {
  await page.waitForURL((url) => url.pathname.endsWith(`/${end}-extended`));
  if (shots) await screenshot(page, `rider-measure-${end}-extended-phone`);
  await byTestId(page, 'reading-value').fill(values.extended);
  await next(page);
  for (const stage of ['static', 'rider'] as const) {
    await page.waitForURL((url) => url.pathname.endsWith(`/${end}-${stage}`));
    if (shots) await screenshot(page, `rider-measure-${end}-${stage}-phone`);
    await byTestId(page, 'reading-pushed').fill(values[stage][0]);
    await byTestId(page, 'reading-lifted').fill(values[stage][1]);
    await next(page);
  }
}

async function engineAnswer(recordId: number): Promise<SizingResult> {
  const token = await signInApi(rider.email);
  const { record } = await call<{ record: SizingRecord }>('GET', `/sizing-records/${recordId}`, token);
  return call<SizingResult>('POST', '/sizing', token, record.request);
}

const mm = (value: number | null) => (value === null ? '–' : `${formatNumber(value, 1)} mm`);
const pct = (value: number | null) => `${formatNumber(value ?? 0, 1)} %`;

/**
 * What the screen shows for an end against the engine's own answer: the decision (headline, steps,
 * pick and damping hint), both windows beside the sags, and the figures. The decision must also
 * agree with itself and with the bike: a preload card only for a preload step, a damping hint only
 * with a spring to fit, and the advised setting inside the adjuster's range.
 */
async function expectFigures(page: Page, result: EndResult, bike: BikeSpec) {
  const testId = (name: string) => byTestId(page, `result-${result.end}-${name}`);
  const text = (name: string) => testId(name).innerText();
  const { decision } = result;
  expect(await text('decision-headline')).toBe(decision.text.headline);
  for (const [i, step] of decision.text.steps.entries()) expect(await text(`decision-step-${i}`)).toBe(step);
  expect(await text('static-window')).toBe(`window ${mm(result.target.staticSagMm.min)} to ${mm(result.target.staticSagMm.max)}`);
  expect(await text('rider-window')).toBe(`window ${mm(result.target.riderSagMm.min)} to ${mm(result.target.riderSagMm.max)}`);
  expect(await text('static-sag')).toBe(mm(result.staticSagMm));
  expect(await text('rider-sag')).toBe(mm(result.riderSagMm));
  expect(await text('static-sag-pct')).toBe(pct(result.staticSagPct));
  expect(await text('rider-sag-pct')).toBe(pct(result.riderSagPct));
  expect(await text('travel')).toBe(mm(result.travelMm));
  expect(await text('installed-spring')).toBe(`${formatNumber(result.installedSpring.rateNmm, 1)} N/mm`);
  const preloadStep = decision.steps.find((s) => s.kind === 'preload');
  expect(await testId('preload-card').count()).toBe(preloadStep ? 1 : 0);
  if (preloadStep && result.preload) {
    expect(await text('rider-sag-after')).toBe(mm(result.preload.riderSagAfterMm));
    const adjuster = bike[result.end]!.adjuster;
    expect(result.preload.position).toBeGreaterThanOrEqual(adjuster.minPosition ?? 0);
    expect(result.preload.position).toBeLessThanOrEqual(adjuster.maxPosition);
  }
  expect(await testId('spring-pick').count()).toBe(decision.pick ? 1 : 0);
  if (decision.pick) expect(await text('spring-pick')).toBe(`${formatNumber(decision.pick.rateNmm, 1)} N/mm`);
  expect(await testId('decision-damping').count()).toBe(decision.text.damping ? 1 : 0);
  if (decision.kind === 'keep') expect(decision.pick).toBeNull();
  const hz = (value: number | null) => (value === null ? '–' : `${formatNumber(value, 2)} Hz`);
  expect(await text('freq-current')).toBe(hz(result.rideFrequencyHz.current));
  expect(await text('freq-after')).toBe(hz(result.rideFrequencyHz.after));
}

test('a rider measures a bike from a shop model, resumes, adjusts and re-measures', async () => {
  let { page, errors, context } = await openPage(live.browser, 'phone');
  await signIn(page);
  await screenshot(page, 'rider-garage-phone');

  await byTestId(page, 'add-bike').click();
  await waitForPath(page, '/rider/bikes/new');
  await page.getByRole('button', { name: 'Tarn 690 Roadster' }).click();
  await byTestId(page, 'field-nickname').fill('Test Tarn');
  await screenshot(page, 'rider-add-bike-phone');
  await page.getByRole('button', { name: 'Add to garage' }).click();
  await waitForPath(page, '/rider');
  const card = page.locator('[data-testid^="bike-"]:visible', { hasText: 'Test Tarn' });
  await card.waitFor();
  const bikeId = Number((await card.getAttribute('data-testid'))!.replace('bike-', ''));

  await byTestId(page, `measure-${bikeId}`).click();
  await page.waitForURL((url) => url.pathname === `/rider/measure/${bikeId}/weigh-in`);
  await byTestId(page, 'field-bodyKg').fill('82');
  await screenshot(page, 'rider-measure-weigh-in-phone');
  await page.getByRole('button', { name: 'Confirm and go on' }).click();
  await page.waitForURL((url) => url.pathname.endsWith('/ends'));
  await screenshot(page, 'rider-measure-ends-phone');
  await next(page);

  // Front extended and static, then the tab is closed as a flat battery would.
  await page.waitForURL((url) => url.pathname.endsWith('/front-extended'));
  await byTestId(page, 'reading-value').fill(READINGS.front.extended);
  await next(page);
  await page.waitForURL((url) => url.pathname.endsWith('/front-static'));
  // A static length above the extended one is refused as typed, naming what to re-measure.
  await byTestId(page, 'reading-pushed').fill('570');
  await page.getByText('The static length is longer than the extended length').waitFor();
  await screenshot(page, 'rider-measure-front-static-error-phone');
  await byTestId(page, 'reading-pushed').fill(READINGS.front.static[0]);
  await byTestId(page, 'reading-lifted').fill(READINGS.front.static[1]);
  await next(page);
  await page.waitForURL((url) => url.pathname.endsWith('/front-rider'));
  expect(errors).toEqual([]);
  await context.close();

  ({ page, errors, context } = await openPage(live.browser, 'phone'));
  await signIn(page);
  await byTestId(page, `resume-${bikeId}`).click();
  await page.waitForURL((url) => url.pathname.endsWith('/front-rider'));
  await byTestId(page, 'flow-back').click();
  await page.waitForURL((url) => url.pathname.endsWith('/front-static'));
  expect(await byTestId(page, 'reading-pushed').inputValue()).toBe(READINGS.front.static[0]);
  expect(await byTestId(page, 'reading-lifted').inputValue()).toBe(READINGS.front.static[1]);
  await screenshot(page, 'rider-measure-resumed-phone');
  await next(page);
  await page.waitForURL((url) => url.pathname.endsWith('/front-rider'));
  await byTestId(page, 'reading-pushed').fill(READINGS.front.rider[0]);
  await byTestId(page, 'reading-lifted').fill(READINGS.front.rider[1]);
  await screenshot(page, 'rider-measure-front-rider-phone');
  await next(page);
  await measureEnd(page, 'rear', READINGS.rear, true);

  await page.waitForURL((url) => url.pathname.endsWith('/review'));
  // 560 − (534 + 538) / 2 = 560 − 536 = 24 mm, worked by hand.
  expect(await byTestId(page, 'review-front-static-sag').innerText()).toBe('24 mm');
  await screenshot(page, 'rider-measure-review-phone');
  await page.getByRole('button', { name: 'Work it out' }).click();
  await page.waitForURL((url) => /^\/rider\/results\/\d+$/.test(url.pathname));
  const recordId = Number(page.url().split('/').pop());
  await byTestId(page, 'result-front-decision-headline').waitFor();
  await screenshot(page, 'rider-result-phone');
  // The ride preview: road step by default; the damping ratio is the result's until changed.
  const damping = byTestId(page, 'result-rear-preview-damping');
  await damping.scrollIntoViewIfNeeded();
  const assumed = await damping.innerText();
  await page.getByRole('button', { name: 'More damping' }).last().click();
  expect(await damping.innerText()).not.toBe(assumed);
  await screenshot(page, 'rider-result-preview-phone');
  await byTestId(page, 'result-actions').scrollIntoViewIfNeeded();
  await screenshot(page, 'rider-result-actions-phone');

  const answer = await engineAnswer(recordId);
  const { record: saved } = await call<{ record: SizingRecord }>('GET', `/sizing-records/${recordId}`, await signInApi(rider.email));
  const bikeSpec = (await call<{ bike: BikeSpec }>('GET', `/bikes/${saved.bikeId}`, await signInApi(rider.email))).bike;
  await expectFigures(page, answer.front!, bikeSpec);
  await expectFigures(page, answer.rear!, bikeSpec);
  // The hand-worked figure again, on the result itself.
  expect(await byTestId(page, 'result-front-static-sag').innerText()).toBe('24 mm');

  await byTestId(page, 'ask-quote').click();
  await byTestId(page, 'quote-requested').waitFor();
  expect(await byTestId(page, 'quote-requested').innerText()).toMatch(/^The shop has your result: quote Q-\d{4}-\d{4}/);

  await byTestId(page, 'apply-preload').click();
  await byTestId(page, 'preload-recorded').waitFor();
  await byTestId(page, 'remeasure').click();
  await page.waitForURL((url) => url.pathname === `/rider/measure/${bikeId}/weigh-in`);
  await page.getByRole('button', { name: 'Confirm and go on' }).click();
  await page.waitForURL((url) => url.pathname.endsWith('/ends'));
  await next(page);
  await page.waitForURL((url) => url.pathname.endsWith('/front-extended'));
  await byTestId(page, 'remeasure-hint').waitFor();
  await screenshot(page, 'rider-remeasure-hint-phone');
  await byTestId(page, 'reading-value').fill(REMEASURE.front.extended);
  await next(page);
  for (const stage of ['static', 'rider'] as const) {
    await page.waitForURL((url) => url.pathname.endsWith(`/front-${stage}`));
    await byTestId(page, 'reading-pushed').fill(REMEASURE.front[stage][0]);
    await byTestId(page, 'reading-lifted').fill(REMEASURE.front[stage][1]);
    await next(page);
  }
  await measureEnd(page, 'rear', REMEASURE.rear, false);
  await page.waitForURL((url) => url.pathname.endsWith('/review'));
  await page.getByRole('button', { name: 'Work it out' }).click();
  await page.waitForURL((url) => /^\/rider\/results\/\d+$/.test(url.pathname) && !url.pathname.endsWith(`/${recordId}`));

  await byTestId(page, 'open-log').click();
  await waitForPath(page, `/rider/bikes/${bikeId}/log`);
  await page.locator('[data-testid^="log-entry-"]').nth(2).waitFor();
  expect(await page.locator('[data-testid^="log-entry-"]').count()).toBe(3);
  await page.getByText(/preload .* → /).first().waitFor();
  await byTestId(page, 'back-to-baseline').click();
  await byTestId(page, 'baseline-step-0').waitFor();
  await screenshot(page, 'rider-setup-log-phone');
  expect(errors).toEqual([]);
  await context.close();

  // Wide: the first result in two columns, front beside rear.
  ({ page, errors, context } = await openPage(live.browser, 'wide'));
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, rider.email, DEMO_PASSWORD);
  await waitForPath(page, '/rider');
  await page.goto(`${live.server.url}/rider/results/${recordId}`);
  await byTestId(page, 'result-front-decision-headline').waitFor();
  const front = (await byTestId(page, 'result-front').boundingBox())!;
  const rear = (await byTestId(page, 'result-rear').boundingBox())!;
  expect(rear.x).toBeGreaterThan(front.x + front.width - 1);
  expect(Math.abs(rear.y - front.y)).toBeLessThan(2);
  await screenshot(page, 'rider-result-wide');
  await page.goto(`${live.server.url}/rider/bikes/${bikeId}/log`);
  await byTestId(page, 'log-table').waitFor();
  await screenshot(page, 'rider-setup-log-wide');
  await page.goto(`${live.server.url}/rider/results/${recordId}/sheet`);
  await byTestId(page, 'setup-sheet').waitFor();
  await screenshot(page, 'rider-setup-sheet-wide');

  // Imperial: the same stored sag in inches (24 mm / 25.4 = 0.94 in), then back to metric.
  await page.goto(`${live.server.url}/rider`);
  await page.getByRole('radio', { name: 'in · lb' }).click();
  await page.goto(`${live.server.url}/rider/results/${recordId}`);
  await byTestId(page, 'result-front-static-sag').filter({ hasText: 'in' }).waitFor();
  expect(await byTestId(page, 'result-front-static-sag').innerText()).toBe('0.94 in');
  // 1 lbf/in = 0.1751268 N/mm (NIST SP 811): the fitted spring and the headline both in the rider's units.
  expect(await byTestId(page, 'result-rear-installed-spring').innerText()).toBe(`${formatNumber(answer.rear!.installedSpring.rateNmm / 0.1751268, 0)} lbf/in`);
  expect(await byTestId(page, 'result-rear-decision-headline').innerText()).toContain(`${formatNumber(answer.rear!.installedSpring.rateNmm / 0.1751268, 0)} lbf/in`);
  await screenshot(page, 'rider-result-imperial-wide');
  await page.goto(`${live.server.url}/rider`);
  await page.getByRole('radio', { name: 'mm · kg' }).click();
  await page.getByRole('radio', { name: 'N/mm' }).waitFor();
  expect(errors).toEqual([]);
  await context.close();
});

test('the admin opens the shop data editors', async () => {
  const admin = DEMO_ACCOUNTS.find((account) => account.role === 'admin')!;
  const { page, errors, context } = await openPage(live.browser, 'wide');
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, admin.email, DEMO_PASSWORD);
  await waitForPath(page, '/admin');
  for (const [path, heading] of [
    ['bike-models', 'Bike models'],
    ['target-profiles', 'Target profiles'],
    ['engine-settings', 'Engine settings'],
    ['audit', 'Audit'],
  ] as const) {
    if (path === 'bike-models') await page.getByRole('navigation').getByRole('link', { name: 'Shop data' }).click();
    else await byTestId(page, 'shop-data-links').getByRole('link', { name: heading }).click();
    await waitForPath(page, `/admin/${path}`);
    await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await page.getByRole('status').waitFor({ state: 'detached' });
    await screenshot(page, `rider-admin-${path}-wide`);
  }
  await page.goto(`${live.server.url}/admin/bike-models?edit=1`);
  await byTestId(page, 'field-nickname').waitFor();
  await screenshot(page, 'rider-admin-bike-model-edit-wide');
  expect(errors).toEqual([]);
  await context.close();
});
