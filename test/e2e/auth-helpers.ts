/** Signing in, reading the navigation and waiting for mail in the browser tests. */
import { Page } from 'playwright-core';

/** Fills the sign-in form and submits it with Enter, as a person at a keyboard would. */
export async function signInThroughForm(page: Page, email: string, password: string): Promise<void> {
  await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByLabel('Password').press('Enter');
}

/** Waits until the address has this path (and, when given, this query). */
export async function waitForPath(page: Page, path: string, search = ''): Promise<void> {
  await page.waitForURL((url) => url.pathname === path && url.search === search);
}

/** The names of the links in the app frame's navigation, in order. */
export async function navLinkNames(page: Page): Promise<string[]> {
  const links = page.getByRole('navigation').getByRole('link');
  return (await links.allInnerTexts()).map((text) => text.trim());
}

/** The navigation link marked as the page being shown. */
export async function currentNavLink(page: Page): Promise<string | null> {
  const current = page.getByRole('navigation').locator('[aria-current="page"]');
  return (await current.count()) === 1 ? (await current.innerText()).trim() : null;
}

/**
 * The link in the first mail in the outbox screen whose subject and recipient match. The server
 * sends mail without waiting for it, so the list is checked again until the mail is there.
 */
export async function openMailLink(page: Page, subject: string, to: string): Promise<string> {
  const item = page.getByRole('button', { name: `${subject}, to ${to}` }).first();
  for (let attempt = 0; attempt < 20 && !(await item.isVisible()); attempt++) {
    await page.getByRole('button', { name: 'Check for new mail' }).click();
    await page.waitForTimeout(250);
  }
  await item.click();
  const link = page.getByTestId('mail-reader').getByRole('link').first();
  await link.waitFor();
  const href = await link.getAttribute('href');
  expect(href).toBeTruthy();
  return href!;
}
