/**
 * Accounts in a real browser, at both sizes: each demo role signs in and lands on its own area
 * with only its own navigation, a reload keeps the session and signing out ends it, a protected
 * address leads through sign-in and back, and a new rider resets a forgotten password through the
 * mail the admin reads in the outbox screen. Nothing may log an error.
 *
 * The server's rate limits are set in code only (server/env.ts, DEFAULT_RATE_LIMITS), so this
 * file stays within them: per e-mail at most 6 of the 10 sign-ins per 15 minutes, 2 of the 5
 * sign-ups per hour, and 4 of the 5 reset calls per 15 minutes.
 */
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { currentNavLink, navLinkNames, openMailLink, signInThroughForm, waitForPath } from './auth-helpers';
import { openPage, screenshot, viewports, ViewportName } from './browser';
import { startLiveAppForFile } from './live-app';

/** What each role's navigation offers and the heading of the area it lands on. */
const AREAS = {
  rider: { heading: 'Garage', nav: ['Garage'] },
  desk: { heading: 'Quotes', nav: ['Quotes', 'Customers', 'Damping rules'] },
  counter: { heading: 'Spring catalogue', nav: ['Catalogue', 'Rates', 'Import', 'Low stock', 'Movements', 'Identify'] },
  admin: { heading: 'Shop', nav: ['Shop', 'Users', 'Outbox', 'Shop data', 'Service desk', 'Parts counter'] },
} as const;

const rider = DEMO_ACCOUNTS.find((account) => account.role === 'rider')!;
const admin = DEMO_ACCOUNTS.find((account) => account.role === 'admin')!;

const live = startLiveAppForFile();

describe.each(Object.keys(viewports) as ViewportName[])('accounts at %s size', (size) => {
  test.each(DEMO_ACCOUNTS.map((account) => [account.role, account] as const))(
    'the %s signs in and lands on its own area',
    async (role, account) => {
      const { page, errors, context } = await openPage(live.browser, size);
      await page.goto(`${live.server.url}/sign-in`);
      await signInThroughForm(page, account.email, DEMO_PASSWORD);

      await waitForPath(page, `/${role}`);
      await page.getByRole('heading', { name: AREAS[role].heading, level: 1 }).waitFor();
      expect(await navLinkNames(page)).toEqual(AREAS[role].nav);
      expect(await currentNavLink(page)).toBe(AREAS[role].nav[0]);
      await page.getByText(account.name, { exact: true }).waitFor();
      await page.getByRole('button', { name: 'Sign out' }).waitFor();
      await screenshot(page, `auth-${role}-${size}`);

      if (role === 'admin') {
        await page.getByRole('navigation').getByRole('link', { name: 'Users' }).click();
        await waitForPath(page, '/admin/users');
        expect(await currentNavLink(page)).toBe('Users');
        // A table on a wide window, cards on a phone; either way one entry per account.
        const entries = page.getByRole(size === 'wide' ? 'row' : 'listitem');
        for (const { email } of DEMO_ACCOUNTS) await entries.filter({ hasText: email }).waitFor();
        expect(await page.getByRole('table').count()).toBe(size === 'wide' ? 1 : 0);
        await screenshot(page, `auth-admin-users-${size}`);
      } else {
        // Another role's address sends the person back to their own area.
        await page.goto(`${live.server.url}/admin/users`);
        await waitForPath(page, `/${role}`);
      }

      expect(errors).toEqual([]);
      await context.close();
    },
  );

  test('a reload keeps the session and signing out ends it', async () => {
    const { page, errors, context } = await openPage(live.browser, size);
    await page.goto(`${live.server.url}/sign-in`);
    await signInThroughForm(page, rider.email, DEMO_PASSWORD);
    await waitForPath(page, '/rider');

    await page.reload();
    await page.getByRole('heading', { name: 'Garage', level: 1 }).waitFor();
    await page.getByText(rider.name, { exact: true }).waitFor();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await waitForPath(page, '/sign-in', `?next=${encodeURIComponent('/rider')}`);
    expect(await navLinkNames(page)).toEqual(['Home', 'Sign in']);

    // The server cleared the cookie: a reload finds no session to restore.
    await page.goto(`${live.server.url}/rider`);
    await waitForPath(page, '/sign-in', `?next=${encodeURIComponent('/rider')}`);
    await screenshot(page, `auth-signed-out-${size}`);
    expect(errors).toEqual([]);
    await context.close();
  });

  test('a protected address leads through sign-in and back to it', async () => {
    const { page, errors, context } = await openPage(live.browser, size);
    await page.goto(`${live.server.url}/admin/users`);
    await waitForPath(page, '/sign-in', `?next=${encodeURIComponent('/admin/users')}`);
    await page.getByText('That page needs an account.', { exact: false }).waitFor();
    await screenshot(page, `auth-sign-in-${size}`);

    // The shared schema's messages, before anything goes to the server.
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Enter your e-mail address.').waitFor();
    await page.getByText('Enter your password.').waitFor();
    await screenshot(page, `auth-sign-in-checks-${size}`);

    await signInThroughForm(page, admin.email, DEMO_PASSWORD);
    await waitForPath(page, '/admin/users');
    await page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
    expect(errors).toEqual([]);
    await context.close();
  });

  test('a new rider signs up, resets a forgotten password by mail and signs in with the new one', async () => {
    const newcomer = { name: `Tess Varga ${size}`, email: `tess-${size}@example.test` };
    const firstPassword = 'gravel road at dawn';
    const newPassword = 'switchbacks in the rain';
    const { page, errors, context } = await openPage(live.browser, size);

    await page.goto(live.server.url);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByRole('heading', { name: 'Create an account', level: 1 }).waitFor();
    await page.getByLabel('Name').fill(newcomer.name);
    await page.getByLabel('E-mail').fill(newcomer.email);
    await page.getByLabel('Password').fill(firstPassword);
    await page.getByLabel('Password').press('Enter');
    await waitForPath(page, '/rider');
    await page.getByText(newcomer.name, { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await waitForPath(page, '/sign-in', `?next=${encodeURIComponent('/rider')}`);

    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('heading', { name: 'Reset your password', level: 1 }).waitFor();
    await page.getByLabel('E-mail').fill(newcomer.email);
    await page.getByRole('button', { name: 'Mail me a link' }).click();
    await page.getByText('a reset link is on its way', { exact: false }).waitFor();
    await screenshot(page, `auth-reset-requested-${size}`);

    // The admin reads the mail in the outbox screen, in a browser of their own.
    const desk = await openPage(live.browser, size);
    await desk.page.goto(`${live.server.url}/admin/outbox`);
    await signInThroughForm(desk.page, admin.email, DEMO_PASSWORD);
    await waitForPath(desk.page, '/admin/outbox');
    const link = await openMailLink(desk.page, 'Reset your Sagwright password', newcomer.email);
    expect(link.startsWith(`${live.server.url}/reset?token=`)).toBe(true);
    await screenshot(desk.page, `auth-outbox-mail-${size}`);
    expect(desk.errors).toEqual([]);
    await desk.context.close();

    await page.goto(link);
    await page.getByRole('heading', { name: 'Choose a new password', level: 1 }).waitFor();
    await page.getByLabel('New password').fill(newPassword);
    await page.getByLabel('New password').press('Enter');
    await page.getByText('Your password is changed', { exact: false }).waitFor();
    await page.getByRole('link', { name: 'Sign in with the new password' }).click();
    await signInThroughForm(page, newcomer.email, newPassword);
    await waitForPath(page, '/rider');
    await page.getByText(newcomer.name, { exact: true }).waitFor();
    expect(errors).toEqual([]);
    await context.close();
  });
});
