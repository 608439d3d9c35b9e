import type { Locator, Page } from 'playwright-core';

/** Waits until the locator is shown (auto-waiting, like a web-first assertion), then asserts it is visible. */
export async function expectVisible(locator: Locator, timeout = 15_000): Promise<void> {
  await locator.first().waitFor({ state: 'visible', timeout });
  expect(await locator.first().isVisible()).toBe(true);
}

/** Waits until the locator's text matches, then asserts it. */
export async function expectText(locator: Locator, pattern: RegExp, timeout = 15_000): Promise<void> {
  await locator.filter({ hasText: pattern }).first().waitFor({ state: 'visible', timeout });
  expect(await locator.first().innerText()).toMatch(pattern);
}

/** The page is no wider than the window: nothing makes the person scroll sideways. */
export async function expectFitsWidth(page: Page): Promise<void> {
  const { scrollWidth, clientWidth } = await page.evaluate(() => ({
    scrollWidth: document.documentElement.scrollWidth,
    clientWidth: document.documentElement.clientWidth,
  }));
  expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
}
