import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';
export const ARTIFACTS_DIR = join(__dirname, '..', '..', 'test-results');

export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

export async function openBrowser(): Promise<BrowserSession> {
  const profileDir = mkdtempSync(join(tmpdir(), 'swapwright-e2e-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1366, height: 900 },
    baseURL: BASE_URL,
  });
  context.setDefaultTimeout(15_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profileDir, { recursive: true, force: true });
    },
  };
}

export async function saveScreenshot(page: Page, name: string): Promise<string> {
  const dir = join(ARTIFACTS_DIR, 'screenshots');
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${name}.png`);
  // A full-page capture of a long report can take a while on a busy 2-core machine.
  await page.screenshot({ path, fullPage: true, timeout: 60_000 });
  return path;
}
