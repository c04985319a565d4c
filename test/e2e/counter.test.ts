/**
 * The parts counter in a real browser: the demo clerk searches the catalogue by rate range,
 * receives stock on one spring, holds two of it by name and releases one of them by the hold's
 * number (the ledger names the hold), and imports a CSV through the file picker (a bad row first,
 * then the fixed file), after which the new spring is in the catalogue; it also adds a spring by
 * hand and reads the stock ledger filtered to it. A quote's hold taken over the quote is
 * desk-flows.test.ts's. Phone and wide screenshots;
 * nothing may log an error, so the flow makes no request the server would refuse.
 */
import fs from 'node:fs';

import { Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot, ViewportName } from './browser';
import { startLiveAppForFile } from './live-app';

const clerk = DEMO_ACCOUNTS.find((account) => account.role === 'counter')!;

const HEADER = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm,on_hand,reorder_point';
const BAD_CSV = `${HEADER}\nKF37-E2E1,fork,F37x320,9.25,320,190,2,1\nKF37-E2E2,fork,F37x320,lots,320,190,1,1\n`;
const GOOD_CSV = `${HEADER}\nKF37-E2E1,fork,F37x320,9.25,320,190,2,1\nKF37-E2E2,fork,F37x320,9.75,320,190,1,1\n`;

const live = startLiveAppForFile();

async function signIn(size: ViewportName) {
  const watched = await openPage(live.browser, size);
  await watched.page.goto(`${live.server.url}/sign-in`);
  await signInThroughForm(watched.page, clerk.email, DEMO_PASSWORD);
  await waitForPath(watched.page, '/counter');
  await watched.page.getByRole('heading', { name: 'Spring catalogue', level: 1 }).waitFor();
  return watched;
}

async function searchRates(page: Page, from: string, to: string) {
  await page.getByLabel(/Lowest rate/).fill(from);
  await page.getByLabel(/Highest rate/).fill(to);
  await page.getByLabel(/Highest rate/).press('Enter');
}

async function pickFile(page: Page, buttonName: RegExp, name: string, csv: string) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: buttonName }).click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(csv) });
}

test('the clerk searches by rate, receives stock and imports a CSV (wide)', async () => {
  const { page, errors, context } = await signIn('wide');

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export the catalogue' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('catalogue.csv');
  const csv = fs.readFileSync((await file.path())!, 'utf8');
  expect(csv.split(/\r?\n/)[0]).toMatch(/^sku,kind,family,rate_n_mm,/);
  expect(csv).toContain('KF37-0090,fork,F37x320');

  await searchRates(page, '9', '9.5');
  const row = page.getByTestId('spring-row-KF37-0090');
  await row.waitFor();
  await page.getByTestId('spring-row-KF37-0100').waitFor({ state: 'detached' });
  await screenshot(page, 'counter-catalogue-wide');

  await row.click();
  await page.getByRole('heading', { name: 'KF37-0090', level: 1 }).waitFor();
  const before = Number(await page.getByTestId('fact-On hand').innerText());
  await page.getByRole('button', { name: 'Receive stock' }).click();
  await page.getByLabel('Quantity received').fill('3');
  await page.getByLabel('Reason').fill('Delivery note 4711');
  await page.getByRole('button', { name: 'Receive', exact: true }).click();
  await page.getByRole('status').getByText(`Received: on hand is now ${before + 3}.`).waitFor();
  expect(Number(await page.getByTestId('fact-On hand').innerText())).toBe(before + 3);
  await page.getByText('Delivery note 4711').first().waitFor();
  await screenshot(page, 'counter-spring-wide');

  const reserved = Number(await page.getByTestId('fact-Reserved').innerText());
  await page.getByRole('button', { name: 'Hold springs' }).click();
  await page.getByLabel('Quantity to hold').fill('2');
  await page.getByLabel('Held for').fill('Race team, bike 7');
  await page.getByLabel('Reason', { exact: true }).fill('Promised by phone');
  await page.getByRole('button', { name: 'Hold', exact: true }).click();
  const made = page.getByRole('status').getByText(new RegExp(`^Made hold #\\d+: reserved is now ${reserved + 2}\\.$`));
  await made.waitFor();
  const holdId = /#(\d+)/.exec(await made.innerText())![1];
  const held = page.getByTestId(`hold-${holdId}`);
  await held.getByText(`#${holdId} · Held for Race team, bike 7 · 2 held`).waitFor();
  await held.getByRole('button', { name: `Release #${holdId}…` }).click();
  await held.getByLabel('Quantity to release').fill('1');
  await held.getByLabel('Reason for the release').fill('One collected');
  await held.getByRole('button', { name: `Release hold #${holdId}` }).click();
  await page.getByRole('status').getByText(`Released from hold #${holdId}: reserved is now ${reserved + 1}.`).waitFor();
  await held.getByText(`#${holdId} · Held for Race team, bike 7 · 1 held`).waitFor();
  await page.getByRole('list', { name: 'Stock history' }).getByText(new RegExp(`One collected · hold #${holdId}$`)).waitFor();
  await screenshot(page, 'counter-spring-holds-wide');

  await page.goto(`${live.server.url}/counter/import`);
  await page.getByRole('heading', { name: 'Import a CSV', level: 1 }).waitFor();
  await pickFile(page, /Choose a CSV file/, 'springs.csv', BAD_CSV);
  const badRow = page.getByTestId('import-row-3');
  await badRow.waitFor();
  expect(await badRow.innerText()).toMatch(/Line 3[\s\S]*Error[\s\S]*rate_n_mm/);
  expect(await page.getByTestId('import-counts').innerText()).toMatch(/1 new.*1 with errors/);
  expect(await page.getByRole('button', { name: /^Import \d+ rows$/ }).count()).toBe(0);
  await screenshot(page, 'counter-import-errors-wide');

  await pickFile(page, /Choose another file/, 'springs.csv', GOOD_CSV);
  await page.getByTestId('import-counts').getByText(/2 new.*0 with errors/).waitFor();
  await page.getByRole('button', { name: 'Import 2 rows' }).click();
  await page.getByRole('status').getByText(/Imported as batch #\d+: 2 rows: 2 new/).waitFor();
  await page.getByRole('listitem').getByText(/springs\.csv/).first().waitFor();
  await screenshot(page, 'counter-import-done-wide');

  await page.getByRole('link', { name: '← Spring catalogue' }).click();
  await page.getByLabel('Search springs').fill('E2E');
  await page.getByLabel('Search springs').press('Enter');
  await page.getByTestId('spring-row-KF37-E2E2').waitFor();

  expect(errors).toEqual([]);
  await context.close();
});

test('the clerk adds a spring by hand, receives its opening stock and finds it in the ledger (phone)', async () => {
  const { page, errors, context } = await signIn('phone');
  await page.getByRole('link', { name: 'New spring' }).click();
  await page.getByRole('heading', { name: 'New spring', level: 1 }).waitFor();
  await page.getByLabel('SKU', { exact: true }).fill('KS46-HAND');
  await page.getByRole('radio', { name: 'Shock' }).click();
  await page.getByLabel('Family', { exact: true }).fill('S46x150');
  await page.getByRole('button', { name: 'Add the spring' }).click();
  await page.getByText('Rate is missing: give it in N/mm.').waitFor();
  await page.getByLabel('Rate, N/mm', { exact: true }).fill('95');
  await page.getByLabel('Free length, mm', { exact: true }).fill('150');
  await page.getByLabel('Maximum deflection, mm', { exact: true }).fill('60');
  await page.getByLabel('Outer diameter, mm', { exact: true }).fill('78');
  await page.getByLabel('Wire diameter, mm', { exact: true }).fill('11');
  await page.getByLabel('Sale price, in cents', { exact: true }).fill('14900');
  await screenshot(page, 'counter-new-spring-phone');
  await page.getByRole('button', { name: 'Add the spring' }).click();

  await page.getByRole('heading', { name: 'KS46-HAND', level: 1 }).waitFor();
  expect(Number(await page.getByTestId('fact-On hand').innerText())).toBe(0);
  await page.getByRole('button', { name: 'Receive stock' }).click();
  await page.getByLabel('Quantity received').fill('2');
  await page.getByLabel('Reason').fill('Opening stock');
  await page.getByRole('button', { name: 'Receive', exact: true }).click();
  await page.getByRole('status').getByText('Received: on hand is now 2.').waitFor();

  await page.getByRole('link', { name: 'This spring in the stock ledger' }).click();
  await page.getByRole('heading', { name: 'Stock movements', level: 1 }).waitFor();
  const ledger = page.getByRole('list', { name: 'Stock movements' });
  await ledger.getByText('KS46-HAND · Received: on hand +2 → 2').waitFor();
  expect(await ledger.getByRole('listitem').count()).toBe(1);
  await page.getByRole('radio', { name: 'Fitted' }).click();
  await page.getByText('No movement matches these filters.').waitFor();
  await page.getByRole('radio', { name: 'All', exact: true }).click();
  await ledger.waitFor();
  await screenshot(page, 'counter-movements-phone');

  await page.goto(`${live.server.url}/counter`);
  await page.getByLabel('Search springs').fill('HAND');
  await page.getByLabel('Search springs').press('Enter');
  await page.getByTestId('spring-card-KS46-HAND').waitFor();
  expect(errors).toEqual([]);
  await context.close();
});

test('the catalogue and a spring read on a phone', async () => {
  const { page, errors, context } = await signIn('phone');
  await searchRates(page, '9', '9.5');
  await page.getByTestId('spring-card-KF37-0090').waitFor();
  await screenshot(page, 'counter-catalogue-phone');
  await page.getByTestId('spring-card-KF37-0090').click();
  await page.getByRole('heading', { name: 'KF37-0090', level: 1 }).waitFor();
  await page.getByText('Stock history').waitFor();
  await screenshot(page, 'counter-spring-phone');

  await page.goto(`${live.server.url}/counter/low-stock`);
  await page.getByRole('heading', { name: 'Low stock', level: 1 }).waitFor();
  await page.getByRole('table', { name: 'Re-order sheet' }).waitFor();
  await screenshot(page, 'counter-low-stock-phone');
  await page.emulateMedia({ media: 'print' });
  await screenshot(page, 'counter-low-stock-print');
  await page.emulateMedia({ media: 'screen' });

  await page.goto(`${live.server.url}/counter/rates`);
  await page.getByRole('radio', { name: /^F37x320/ }).click();
  await page.getByLabel(/Target rate/).fill('9.2');
  await page.getByRole('button', { name: 'Find rates' }).click();
  await page.getByRole('list', { name: 'Nearest rates' }).getByText(/KF37-0090/).waitFor();
  await screenshot(page, 'counter-rates-phone');

  await page.goto(`${live.server.url}/counter/identify`);
  await page.getByText(/Measure a spring only when it is off the bike and unloaded/).waitFor();
  await page.getByLabel('Wire diameter, mm', { exact: true }).fill('4.6');
  await page.getByLabel('Outer diameter, mm', { exact: true }).fill('37');
  await page.getByLabel('Active coils').fill('30');
  await page.getByRole('button', { name: 'Work out the rate' }).click();
  const rate = page.getByRole('heading', { name: /^About .* N\/mm$/ });
  await rate.waitFor();
  await rate.scrollIntoViewIfNeeded();
  await screenshot(page, 'counter-identify-phone');
  expect(errors).toEqual([]);
  await context.close();
});
