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

/**
 * Waits until the image has its picture: an <img> shows (with its box) while its file is still being fetched or decoded,
 * and reads naturalWidth 0 until then.
 */
export async function waitForPicture(image: Locator, timeout = 15_000): Promise<void> {
  const element = await image.elementHandle({ timeout });
  await image.page().waitForFunction((img) => img instanceof HTMLImageElement && img.complete && img.naturalWidth > 0, element, { timeout });
}

/** The page is no wider than the window: nothing makes the person scroll sideways. */
export async function expectFitsWidth(page: Page): Promise<void> {
  const { scrollWidth, clientWidth } = await page.evaluate(() => ({
    scrollWidth: document.documentElement.scrollWidth,
    clientWidth: document.documentElement.clientWidth,
  }));
  expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
}

/**
 * Every visible button inside the locator is thumb-sized, as the phone theme holds below 768 px: at least 44 CSS px
 * high, 40 for a small one. Source: W3C WCAG 2.2, Success Criterion 2.5.5 Target Size (Enhanced), 44 x 44 CSS px;
 * 40 px for a small control is Common practice (no published source). Answers the heights it measured, by name.
 */
export async function expectThumbSizedButtons(scope: Locator): Promise<Array<{ name: string; height: number; small: boolean }>> {
  const buttons = await scope.locator('button:visible').evaluateAll((elements) =>
    elements.map((element) => ({
      name: (element.getAttribute('aria-label') ?? element.textContent ?? '').trim(),
      // the laid-out height: a popup's opening zoom scales its box for a moment, not the button's size
      height: (element as HTMLElement).offsetHeight,
      small: element.classList.contains('ant-btn-sm'),
    })),
  );
  expect(buttons.length).toBeGreaterThan(0);
  // a failure lists each button under the floor with its measured height
  expect(buttons.filter((button) => button.height < (button.small ? 40 : 44) - 0.5)).toEqual([]);
  return buttons;
}

/**
 * Every visible element matching `selector` inside the scope (links standing alone as controls, an icon that acts)
 * is at least `min` CSS px: 44 px high for a link, as the phone rule holds buttons; at least 24 x 24 for an icon's
 * target. Source: W3C WCAG 2.2, Success Criterion 2.5.8 Target Size (Minimum), 24 x 24 CSS px; 2.5.5 (Enhanced),
 * 44 x 44 CSS px. Answers the sizes it measured, by name.
 */
export async function expectTargetsAtLeast(
  scope: Locator | Page,
  selector: string,
  min: { width: number; height: number },
): Promise<Array<{ name: string; width: number; height: number }>> {
  const targets = await scope.locator(`${selector} >> visible=true`).evaluateAll((elements) =>
    elements.map((element) => {
      const box = element.getBoundingClientRect();
      return { name: (element.getAttribute('aria-label') ?? element.textContent ?? '').trim(), width: box.width, height: box.height };
    }),
  );
  expect(targets.length).toBeGreaterThan(0);
  // a failure lists each target under the floor with its measured size
  expect(targets.filter((target) => target.width < min.width - 0.5 || target.height < min.height - 0.5)).toEqual([]);
  return targets;
}
