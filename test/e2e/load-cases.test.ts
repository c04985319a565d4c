/**
 * Load cases in a real browser at phone size: a rider weighed in with a passenger and a top box
 * measures a bike; the result says what each load needs on the spring the solo rider chose, and
 * the bike page switches between solo and a load, each switch in the setup log and solo restored
 * exactly. Every sentence is compared with the one the shared code writes from the API's answer.
 */
import { DEMO_ACCOUNTS } from '../../server/seed/demo-accounts';
import { describeLoadCase, describeLoadCaseSetting, SI_FORMAT } from '../../shared/sizing/decision-text';
import type { Bike } from '../../shared/types/bike';
import type { SizingRecord } from '../../shared/types/garage';
import type { LoadCasesAnswer } from '../../shared/types/load-case';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(240_000);

const rider = DEMO_ACCOUNTS.find((account) => account.role === 'rider')!;
const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);

/** The rider of rider-flow.test.ts (82 kg, the form's typical gear, 12.1 kg), with a passenger and a top box. */
const WEIGH_IN = {
  bodyKg: 82,
  gear: { helmet: 1.5, jacket: 2.5, trousers: 1.5, boots: 2.5, gloves: 0.3, backProtector: 0.8, pack: 3 },
  loads: [
    { kind: 'passenger', massKg: 70, rearShare: 0.95 },
    { kind: 'top-box', massKg: 10, rearShare: 1.2 },
  ],
  discipline: 'road',
  position: 'neutral',
};

/** Readings that agree with that rider's weights on the shop's first model (as in rider-flow.test.ts). */
const READINGS = {
  front: { extendedMm: 560, staticMm: { pushedMm: 534, liftedMm: 538 }, riderMm: { pushedMm: 517, liftedMm: 523 } },
  rear: { extendedMm: 600, staticMm: { pushedMm: 564, liftedMm: 567 }, riderMm: { pushedMm: 514, liftedMm: 518 } },
};

test('the result sets each load on the solo spring, and the bike switches between them at phone size', async () => {
  const token = await signInApi(rider.email);
  await call('PUT', '/weigh-in', token, WEIGH_IN);
  const { models } = await call<{ models: { id: number; name: string }[] }>('GET', '/bike-models', token);
  const model = models.find((m) => m.name === 'Tarn 690 Roadster')!;
  const { bike } = await call<{ bike: Bike }>('POST', '/bikes', token, { modelId: model.id, nickname: 'Two-up Tarn' });
  const { record } = await call<{ record: SizingRecord }>('POST', `/bikes/${bike.id}/sizing-records`, token, { readings: READINGS });
  expect(record.request.loadCases?.map((c) => c.name)).toEqual(['With passenger', 'With luggage', 'With passenger and luggage']);

  const { page, errors, context } = await openPage(live.browser, 'phone');
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, rider.email, 'sagwright-demo');
  await waitForPath(page, '/rider');

  // The result: each load as the shared code words it from the stored answer.
  await page.goto(`${live.server.url}/rider/results/${record.id}`);
  const front = record.result.front!;
  const firstLine = page.locator('[data-testid="result-front-load-case-0"]:visible');
  await firstLine.scrollIntoViewIfNeeded();
  expect(await firstLine.innerText()).toBe(describeLoadCase(front.loadCases[0], SI_FORMAT));
  await screenshot(page, 'load-cases-result-phone');

  // The bike page: solo and the three loads, each with its settings; switch to luggage and back.
  await page.goto(`${live.server.url}/rider/bikes/${bike.id}`);
  const panel = page.locator('[data-testid="load-cases"]:visible');
  await panel.waitFor();
  const cases = await call<LoadCasesAnswer>('GET', `/bikes/${bike.id}/load-cases`, token);
  const luggage = cases.cases[1];
  const luggageRow = page.locator('[data-testid="load-case-1"]:visible');
  expect(await luggageRow.innerText()).toContain(`Fork: ${describeLoadCaseSetting(luggage.ends.front!, SI_FORMAT)}`);
  expect(await luggageRow.innerText()).toContain(`Shock: ${describeLoadCaseSetting(luggage.ends.rear!, SI_FORMAT)}`);
  // Nothing reaches past the phone's width.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await panel.scrollIntoViewIfNeeded();
  await screenshot(page, 'load-cases-bike-phone');

  await page.locator('[data-testid="load-case-1-set"]:visible').click();
  await page.locator('[data-testid="load-case-done"]:visible').waitFor();
  expect(await page.locator('[data-testid="load-case-done"]:visible').innerText()).toBe('Load case: solo to With luggage (10 kg): in the setup log.');
  expect(await luggageRow.innerText()).toContain('With luggage · set now');
  const set = (await call<{ bike: Bike }>('GET', `/bikes/${bike.id}`, token)).bike;
  expect([set.front!.adjuster.position, set.rear!.adjuster.position]).toEqual([luggage.ends.front!.position, luggage.ends.rear!.position]);
  await screenshot(page, 'load-cases-set-phone');

  await page.locator('[data-testid="load-case-solo-set"]:visible').click();
  await page.locator('[data-testid="load-case-solo"]:visible', { hasText: 'set now' }).waitFor();
  const back = (await call<{ bike: Bike }>('GET', `/bikes/${bike.id}`, token)).bike;
  expect([back.front!.adjuster.position, back.rear!.adjuster.position]).toEqual([bike.front!.adjuster.position, bike.rear!.adjuster.position]);
  const log = await call<{ entries: { note: string }[] }>('GET', `/bikes/${bike.id}/setup-log`, token);
  expect(log.entries.map((e) => e.note).slice(-2)).toEqual(['Load case: solo to With luggage (10 kg)', 'Load case: With luggage to solo']);
  expect(errors).toEqual([]);
  await context.close();
});
