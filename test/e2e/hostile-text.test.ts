/**
 * Names that are markup, in a real browser at phone size: a rider account, a bike, a walk-in
 * customer and a spring named with script and image tags (the OWASP XSS Filter Evasion Cheat
 * Sheet's first samples) are made through the API, then the rider's garage, the desk's customer
 * list and the counter's spring page show them. Each must appear as literal text, no dialog may
 * open, no handler of the payload may run, and no element of the payload may be in the page.
 */
import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { apiFor } from './api-helpers';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot } from './browser';
import { startLiveAppForFile } from './live-app';

jest.setTimeout(240_000);

const SCRIPT_NAME = '<script>alert(1)</script>';
const IMG_BIKE = '<img src=x onerror="window.__injected=1;alert(2)">';
const IMG_CUSTOMER = '<img src=x onerror=alert(3)>';
const SVG_SKU = '<svg onload=alert(4)>';
const SCRIPT_FAMILY = '<script>window.__injected=5</script>';
const RIDER_EMAIL = 'hostile.rider@example.test';
const RIDER_PASSWORD = 'a long enough password';

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

const live = startLiveAppForFile();
const { call, signInApi } = apiFor(live);
let bikeId: number;
let springId: number;

beforeAll(async () => {
  const { token } = await call<{ token: string }>('POST', '/auth/sign-up', undefined, { name: SCRIPT_NAME, email: RIDER_EMAIL, password: RIDER_PASSWORD });
  const { models } = await call<{ models: { id: number }[] }>('GET', '/bike-models', token);
  ({ bike: { id: bikeId } } = await call<{ bike: { id: number } }>('POST', '/bikes', token, { modelId: models[0].id, nickname: IMG_BIKE }));
  const desk = await signInApi(account('desk').email);
  await call('POST', '/customers', desk, { name: IMG_CUSTOMER, email: 'hostile.walk-in@example.test' });
  const counter = await signInApi(account('counter').email);
  ({ spring: { id: springId } } = await call<{ spring: { id: number } }>('POST', '/catalogue/springs', counter, {
    sku: SVG_SKU,
    kind: 'fork',
    family: SCRIPT_FAMILY,
    rateNmm: 9,
    freeLengthMm: 320,
    maxDeflectionMm: 150,
    supplier: SCRIPT_NAME,
  }));
});

/** A phone-sized page that records every dialog (and dismisses it, so a payload cannot stall the test). */
async function phonePage() {
  const watched = await openPage(live.browser, 'phone');
  const dialogs: string[] = [];
  watched.page.on('dialog', (dialog) => {
    dialogs.push(dialog.message());
    void dialog.dismiss();
  });
  return { ...watched, dialogs };
}

/** What of the payloads made it into the page as markup rather than text. */
function injected(page: Page) {
  return page.evaluate(() => ({
    flag: (window as unknown as { __injected?: number }).__injected ?? null,
    images: document.querySelectorAll('img[src="x"]').length,
    svgs: document.querySelectorAll('svg[onload]').length,
    scripts: [...document.querySelectorAll('script')].filter((s) => /alert\(|__injected/.test(s.textContent ?? '')).length,
    handlers: [...document.querySelectorAll('*')].flatMap((el) => [...el.attributes].filter((a) => a.name.startsWith('on') && /alert\(|__injected/.test(a.value)).map((a) => a.name)),
  }));
}

async function expectOnlyText(page: Page, dialogs: string[], texts: string[]) {
  for (const text of texts) await page.getByText(text).first().waitFor({ state: 'visible' });
  // Give an onerror or onload a moment to fire, had the markup been parsed.
  await page.waitForTimeout(300);
  expect(dialogs).toEqual([]);
  expect(await injected(page)).toEqual({ flag: null, images: 0, svgs: 0, scripts: 0, handlers: [] });
}

test("the rider's garage shows a bike named with an img tag as text", async () => {
  const { page, dialogs, errors } = await phonePage();
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, RIDER_EMAIL, RIDER_PASSWORD);
  await waitForPath(page, '/rider');
  await expectOnlyText(page, dialogs, [IMG_BIKE]);
  await screenshot(page, 'hostile-text-garage-phone');
  await page.goto(`${live.server.url}/rider/bikes/${bikeId}`);
  await expectOnlyText(page, dialogs, [IMG_BIKE]);
  await screenshot(page, 'hostile-text-bike-phone');
  expect(errors).toEqual([]);
});

test("the desk's customer list shows a rider and a walk-in named with tags as text", async () => {
  const { page, dialogs, errors } = await phonePage();
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, account('desk').email, DEMO_PASSWORD);
  await waitForPath(page, '/desk');
  await page.goto(`${live.server.url}/desk/customers`);
  await page.getByLabel('Search by name or e-mail').fill('hostile');
  await expectOnlyText(page, dialogs, [SCRIPT_NAME, IMG_CUSTOMER]);
  await screenshot(page, 'hostile-text-customers-phone');
  expect(errors).toEqual([]);
});

test("the counter's spring page shows an SKU and a family that are tags as text", async () => {
  const { page, dialogs, errors } = await phonePage();
  await page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(page, account('counter').email, DEMO_PASSWORD);
  await waitForPath(page, '/counter');
  await page.goto(`${live.server.url}/counter/springs/${springId}`);
  await page.getByRole('heading', { name: SVG_SKU, level: 1 }).waitFor();
  await expectOnlyText(page, dialogs, [SVG_SKU, SCRIPT_FAMILY]);
  await screenshot(page, 'hostile-text-spring-phone');
  expect(errors).toEqual([]);
});
