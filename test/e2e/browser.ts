/** Debian's Chromium driven by playwright-core, at the two sizes the product is laid out for. */
import fs from 'node:fs';
import path from 'node:path';
import { Browser, BrowserContext, Page, chromium } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

export const viewports = {
  phone: { width: 390, height: 844 },
  wide: { width: 1280, height: 800 },
} as const;
export type ViewportName = keyof typeof viewports;

const ARTIFACTS = path.resolve(__dirname, '../artifacts');

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    // Without the background-networking flags Chromium keeps dialling out on a closed network.
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export interface WatchedPage {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught exceptions seen so far. */
  errors: string[];
}

/** A fresh context (its own storage) and page, collecting console errors. */
export async function openPage(browser: Browser, size: ViewportName): Promise<WatchedPage> {
  const context = await browser.newContext({ viewport: viewports[size] });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error') errors.push(msg.text());
  });
  page.on('pageerror', (err) => errors.push(err.message));
  return { context, page, errors };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  const file = path.join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
