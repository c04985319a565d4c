/**
 * The shell in a real browser: the home screen renders in the shipped font (the file is served
 * and the browser reports the face as loaded, since a computed font-family alone passes even
 * when the file fails), the client reaches /api/health, and nothing logs an error.
 */
import { openPage, screenshot, viewports, ViewportName } from './browser';
import { startLiveAppForFile } from './live-app';

const live = startLiveAppForFile();

describe.each(Object.keys(viewports) as ViewportName[])('home screen at %s size', (size) => {
  test('renders in the shipped fonts, shows the safety notice and reaches the API', async () => {
    const { page, errors, context } = await openPage(live.browser, size);
    const fontResponses: { url: string; status: number }[] = [];
    page.on('response', (res) => {
      if (/\.ttf(\?|$)/.test(res.url())) fontResponses.push({ url: res.url(), status: res.status() });
    });
    const health = page.waitForResponse((res) => res.url().endsWith('/api/health'));

    await page.goto(live.server.url);
    expect((await health).status()).toBe(200);

    const heading = page.getByRole('heading', { name: 'Sagwright' }).first();
    await heading.waitFor();
    await page.evaluate(() => document.fonts.ready);
    const family = await heading.evaluate((el) => getComputedStyle(el).fontFamily.split(',')[0].trim().replace(/["']/g, ''));
    expect(family).not.toMatch(/^(serif|sans-serif|system-ui|-apple-system)$/);
    // check() alone is also true for a family with no @font-face at all, so look for the face too.
    const face = await page.evaluate((f) => {
      const faces = [...document.fonts].filter((ff) => ff.family.replace(/["']/g, '') === f);
      return { declared: faces.length, loaded: faces.some((ff) => ff.status === 'loaded'), check: document.fonts.check(`16px "${f}"`) };
    }, family);
    expect(face).toEqual({ declared: expect.any(Number), loaded: true, check: true });
    expect(face.declared).toBeGreaterThan(0);
    expect(fontResponses.length).toBeGreaterThan(0);
    expect(fontResponses.filter((r) => r.status !== 200)).toEqual([]);

    await page.getByText(/spring compressor/i).first().waitFor();
    await page.getByText('Server up').waitFor();
    await page.getByText(/^SQLite 3\./).waitFor();

    await screenshot(page, `home-${size}`);
    expect(errors).toEqual([]);
    await context.close();
  });
});
