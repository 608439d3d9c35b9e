/**
 * The web app's first load in headless Chromium (playwright-core with Debian's /usr/bin/chromium): the JavaScript
 * the sign-in page loads before it is usable, as transferred over the wire (compressed bytes, headers excluded),
 * and first contentful paint from the browser's own paint timing.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS } from '../../e2e/tests/support/browser';

export interface WebLoadFigures {
  scripts: number;
  javascriptTransferredBytes: number;
  javascriptDecodedBytes: number;
  firstContentfulPaintMs: number;
}

/** One cold load (fresh profile, empty cache) of `url`, waiting for the sign-in form. */
export async function measureFirstLoad(url: string, executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'): Promise<WebLoadFigures> {
  const profile = mkdtempSync(join(tmpdir(), 'swapwright-bench-'));
  const context = await chromium.launchPersistentContext(profile, { executablePath, headless: true, args: CHROMIUM_ARGS });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(url, { waitUntil: 'load' });
    await page.getByRole('button', { name: /sign in/i }).first().waitFor({ timeout: 30_000 });
    await page.waitForLoadState('networkidle');
    return await page.evaluate(() => {
      const scripts = (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).filter((entry) =>
        /\.m?js(\?|$)/.test(new URL(entry.name).pathname),
      );
      const paint = performance.getEntriesByName('first-contentful-paint')[0];
      return {
        scripts: scripts.length,
        javascriptTransferredBytes: scripts.reduce((sum, entry) => sum + entry.encodedBodySize, 0),
        javascriptDecodedBytes: scripts.reduce((sum, entry) => sum + entry.decodedBodySize, 0),
        firstContentfulPaintMs: paint ? paint.startTime : NaN,
      };
    });
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

/** The median of `runs` cold loads (each figure on its own). */
export async function measureFirstLoads(url: string, runs = 5): Promise<WebLoadFigures> {
  const all: WebLoadFigures[] = [];
  for (let run = 0; run < runs; run += 1) all.push(await measureFirstLoad(url));
  const median = (pick: (f: WebLoadFigures) => number) => {
    const values = all.map(pick).sort((a, b) => a - b);
    return values[Math.floor(values.length / 2)];
  };
  return {
    scripts: median((f) => f.scripts),
    javascriptTransferredBytes: median((f) => f.javascriptTransferredBytes),
    javascriptDecodedBytes: median((f) => f.javascriptDecodedBytes),
    firstContentfulPaintMs: median((f) => f.firstContentfulPaintMs),
  };
}

if (require.main === module) {
  void measureFirstLoads(process.argv[2] ?? 'http://127.0.0.1:3000/sign-in', Number(process.argv[3] ?? 3)).then((f) => console.log(f));
}
