import type { Response } from 'playwright-core';
import { openBrowser, type BrowserSession } from './support/browser';

/** Budget for the JavaScript of the first page a person sees (the sign-in page), as transferred. */
const INITIAL_JAVASCRIPT_BUDGET_BYTES = 250_000;

describe('the built web app is delivered compressed and cached by content hash', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
  });

  afterAll(async () => {
    await browser.close();
  });

  it('loads the sign-in page with brotli scripts cached as immutable, the page itself not cached, within the size budget', async () => {
    const { page } = browser;
    const scripts: Response[] = [];
    page.on('response', (response) => {
      if (/\/assets\/[^/]+\.js$/.test(new URL(response.url()).pathname)) scripts.push(response);
    });
    const document = await page.goto('/sign-in');
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.waitForLoadState('networkidle');

    // Source: RFC 9111 §5.2.2.4 (no-cache: revalidate before each use), RFC 8246 (immutable), RFC 9110 §8.4 (Content-Encoding).
    const documentHeaders = await document!.allHeaders();
    expect(documentHeaders['cache-control']).toBe('no-cache');
    expect(documentHeaders['content-encoding']).toBe('br');
    expect(scripts.length).toBeGreaterThan(0);
    for (const script of scripts) {
      const headers = await script.allHeaders();
      // Files under 1 KB are not worth compressing (the build's threshold): they go as they are.
      const small = (await script.body()).length < 1024;
      expect({ url: script.url(), encoding: headers['content-encoding'], cache: headers['cache-control'] }).toEqual({
        url: script.url(),
        encoding: small ? undefined : 'br',
        cache: 'public, max-age=31536000, immutable',
      });
    }

    const transferred = await page.evaluate(() =>
      (performance.getEntriesByType('resource') as PerformanceResourceTiming[])
        .filter((entry) => /\.js$/.test(new URL(entry.name).pathname))
        .reduce((sum, entry) => sum + entry.encodedBodySize, 0),
    );
    expect(transferred).toBeGreaterThan(0);
    expect(transferred).toBeLessThan(INITIAL_JAVASCRIPT_BUDGET_BYTES);
  });
});
