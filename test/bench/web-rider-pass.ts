/**
 * The rider's way in, driven in Chromium for the web benchmark: a bike in the demo rider's garage,
 * then signing in and reaching the garage or the first measuring step.
 */
import type { Browser, Locator, Page } from 'playwright-core';

import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { openPage } from '../e2e/browser';

export const rider = DEMO_ACCOUNTS.find((account) => account.role === 'rider')!;

const STEP_TIMEOUT_MS = 60_000;

async function api<T>(url: string, init: RequestInit = {}): Promise<T> {
  const response = await fetch(url, { ...init, headers: { 'Content-Type': 'application/json', ...init.headers } });
  if (!response.ok) throw new Error(`${init.method ?? 'GET'} ${url} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

/** Puts a bike made from the first shop model in the rider's garage and answers its id. */
export async function addBenchBike(serverUrl: string): Promise<number> {
  const { token } = await api<{ token: string }>(`${serverUrl}/api/auth/sign-in`, {
    method: 'POST',
    body: JSON.stringify({ email: rider.email, password: DEMO_PASSWORD }),
  });
  const auth = { Authorization: `Bearer ${token}` };
  const { models } = await api<{ models: { id: number }[] }>(`${serverUrl}/api/bike-models`, { headers: auth });
  const { bike } = await api<{ bike: { id: number } }>(`${serverUrl}/api/bikes`, {
    method: 'POST',
    headers: auth,
    body: JSON.stringify({ modelId: models[0].id, nickname: 'Bench bike' }),
  });
  return bike.id;
}

export const measuringPath = (bikeId: number) => `/rider/measure/${bikeId}/weigh-in`;

/** The first input of the first measuring step: the rider's body mass. */
export const firstMeasuringInput = (page: Page): Locator => page.locator('[data-testid="field-bodyKg"]:visible');

/** Fills the sign-in form without submitting it. */
export async function fillSignIn(page: Page): Promise<void> {
  await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor({ timeout: STEP_TIMEOUT_MS });
  await page.getByLabel('E-mail').fill(rider.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
}

/** Types into the step's first input and checks the form took it: the step is interactive. */
export async function typeIntoFirstInput(page: Page): Promise<void> {
  const input = firstMeasuringInput(page);
  await input.fill('81', { timeout: STEP_TIMEOUT_MS });
  const value = await input.inputValue();
  if (value !== '81') throw new Error(`the first measuring input shows "${value}" after typing 81`);
}

/**
 * Milliseconds from pressing Enter on the sign-in form, opened by a link to the first measuring
 * step, until that step's first input accepts typing. A fresh context each time, so nothing is
 * cached; the CPU is slowed `cpuSlowdown` times through the DevTools protocol.
 */
export async function timeSignInToMeasuring(browser: Browser, serverUrl: string, bikeId: number, cpuSlowdown: number): Promise<number> {
  const { context, page, errors } = await openPage(browser, 'phone');
  try {
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: cpuSlowdown });
    await page.goto(`${serverUrl}${measuringPath(bikeId)}`);
    await fillSignIn(page);
    const started = performance.now();
    await page.getByLabel('Password').press('Enter');
    await typeIntoFirstInput(page);
    const elapsed = performance.now() - started;
    if (errors.length > 0) throw new Error(`the page logged errors: ${errors.join('; ')}`);
    return elapsed;
  } finally {
    await context.close();
  }
}
