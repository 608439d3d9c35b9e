/**
 * The web app's first load in headless Chromium (playwright-core with Debian's /usr/bin/chromium): the JavaScript
 * the sign-in page loads before it is usable, as transferred over the wire (compressed bytes, headers excluded),
 * and first contentful paint from the browser's own paint timing. Beside it, the paint floor of this machine at this
 * moment: the same browser's first contentful paint of a bare one-line HTML page from a local server (sent with the
 * app page's own security headers), measured in the same run (on a busy machine the browser's own start of rendering
 * dominates both).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS } from '../../e2e/tests/support/browser';

export interface WebLoadFigures {
  scripts: number;
  javascriptTransferredBytes: number;
  javascriptDecodedBytes: number;
  firstContentfulPaintMs: number;
  /** First contentful paint of a bare HTML page in the same conditions (see above). */
  bareFirstContentfulPaintMs: number;
}

/** One cold load (fresh profile, empty cache) of `url`, waiting for the sign-in form unless `bare`. */
export async function measureFirstLoad(
  url: string,
  bare = false,
  executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
): Promise<Omit<WebLoadFigures, 'bareFirstContentfulPaintMs'>> {
  const profile = mkdtempSync(join(tmpdir(), 'swapwright-bench-'));
  const context = await chromium.launchPersistentContext(profile, { executablePath, headless: true, args: CHROMIUM_ARGS });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    // The browser's own processes start first (a person's browser is already running); the page's cache stays empty.
    await page.goto('about:blank');
    await page.goto(url, { waitUntil: 'load' });
    if (!bare) {
      await page.getByRole('button', { name: /sign in/i }).first().waitFor({ timeout: 30_000 });
      await page.waitForLoadState('networkidle');
    }
    // A small page can fire `load` before its first paint is recorded: wait for the entry itself.
    const firstContentfulPaintMs = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          new PerformanceObserver((list) => {
            const entry = list.getEntriesByName('first-contentful-paint')[0];
            if (entry) resolve(entry.startTime);
          }).observe({ type: 'paint', buffered: true });
          setTimeout(() => resolve(Number.NaN), 15_000);
        }),
    );
    const transfer = await page.evaluate(() => {
      const scripts = (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).filter((entry) =>
        /\.m?js(\?|$)/.test(new URL(entry.name).pathname),
      );
      return {
        scripts: scripts.length,
        javascriptTransferredBytes: scripts.reduce((sum, entry) => sum + entry.encodedBodySize, 0),
        javascriptDecodedBytes: scripts.reduce((sum, entry) => sum + entry.decodedBodySize, 0),
      };
    });
    return { ...transfer, firstContentfulPaintMs };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

/** Response headers the bare page copies from the app's page (the security policy, opener isolation and the like). */
const NOT_COPIED = new Set(['content-type', 'content-length', 'content-encoding', 'etag', 'last-modified', 'cache-control', 'vary', 'date', 'connection', 'keep-alive', 'transfer-encoding', 'accept-ranges']);

/** Serves one line of HTML on 127.0.0.1, with the app page's own security headers, while `use` runs. */
async function withBarePage<T>(appUrl: string, use: (url: string) => Promise<T>): Promise<T> {
  const appResponse = await fetch(appUrl);
  await appResponse.arrayBuffer();
  const headers: Record<string, string> = { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' };
  appResponse.headers.forEach((value, name) => {
    if (!NOT_COPIED.has(name)) headers[name] = value;
  });
  const server = createServer((_request, response) => {
    response.writeHead(200, headers);
    response.end('<!doctype html><html lang="en"><title>Bare page</title><p>One line of text.</p></html>');
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  try {
    return await use(`http://127.0.0.1:${(server.address() as AddressInfo).port}/`);
  } finally {
    await new Promise((resolve) => server.close(resolve));
  }
}

/** The median of `runs` cold loads (each figure on its own), each followed by a load of the bare page. */
export async function measureFirstLoads(url: string, runs = 5): Promise<WebLoadFigures> {
  const all: WebLoadFigures[] = [];
  await withBarePage(url, async (bareUrl) => {
    for (let run = 0; run < runs; run += 1) {
      const app = await measureFirstLoad(url);
      const bare = await measureFirstLoad(bareUrl, true);
      all.push({ ...app, bareFirstContentfulPaintMs: bare.firstContentfulPaintMs });
      if (process.env.BENCH_VERBOSE) console.error(`first load ${run + 1}: ${app.firstContentfulPaintMs.toFixed(0)} ms, bare ${bare.firstContentfulPaintMs.toFixed(0)} ms`);
    }
  });
  const median = (pick: (f: WebLoadFigures) => number) => {
    const values = all.map(pick).sort((a, b) => a - b);
    return values[Math.floor(values.length / 2)];
  };
  return {
    scripts: median((f) => f.scripts),
    javascriptTransferredBytes: median((f) => f.javascriptTransferredBytes),
    javascriptDecodedBytes: median((f) => f.javascriptDecodedBytes),
    firstContentfulPaintMs: median((f) => f.firstContentfulPaintMs),
    bareFirstContentfulPaintMs: median((f) => f.bareFirstContentfulPaintMs),
  };
}

if (require.main === module) {
  void measureFirstLoads(process.argv[2] ?? 'http://127.0.0.1:3000/sign-in', Number(process.argv[3] ?? 3)).then((f) => console.log(f));
}
