import type { Page } from 'playwright-core';
import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { ensureDemoPartsPlan } from './support/demo-state';
import { expectFitsWidth, expectText, expectVisible } from './support/expect-page';
import { signInAs } from './support/session';

const OWN_PROJECT = /Harlan Ridgeback 1978/;

/** The parts of the customer's view of a plan this journey reads back from the page's own request. */
interface SeenPlan {
  status: string;
  version: number;
  parts: Array<{ sku: string; description: string }>;
  totals: { totalCents: number };
}

/** Opens the customer's own project from My projects and answers the plans the page loaded for its plan card. */
async function openOwnProject(page: Page): Promise<SeenPlan[]> {
  await page.goto('/my-projects');
  const loaded = page.waitForResponse((r) => /\/parts-plans$/.test(r.url()) && r.request().method() === 'GET');
  await page.getByRole('link', { name: OWN_PROJECT }).first().click();
  const response = await loaded;
  expect(response.status()).toBe(200);
  return (await response.json()) as SeenPlan[];
}

describe('the customer follows their own swap', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    // The journeys' seed holds no plans: the shop plans the customer's project first (through the estimator's route).
    await ensureDemoPartsPlan();
    browser = await openBrowser();
    await signInAs(browser.page, 'customer');
  });

  afterAll(async () => {
    await browser.close();
  });

  it('sees only their own project and opens it', async () => {
    const { page } = browser;
    await page.getByRole('link', { name: OWN_PROJECT }).first().click();
    await expectVisible(page.getByRole('heading', { name: OWN_PROJECT }));
    await saveScreenshot(page, 'customer-project');
    await page.goto('/my-projects');
    await expectVisible(page.getByRole('link', { name: OWN_PROJECT }));
    expect(await page.getByText('Pellam Stag 1984').count()).toBe(0);
    await saveScreenshot(page, 'customer-my-projects');
  });

  it("reads the shop's parts plan for the project, on a desk and on a phone, without shop-only figures", async () => {
    const { page } = browser;
    for (const [width, height] of [
      [1440, 900],
      [390, 844],
    ]) {
      await page.setViewportSize({ width, height });
      const plans = await openOwnProject(page);
      expect(plans.length).toBeGreaterThan(0);
      // the locked version (the one a quote is drawn from), else the newest
      const shown = plans.find((plan) => plan.status === 'locked') ?? plans[0];
      const card = page.getByTestId('customer-parts-plan');
      await expectVisible(card.getByText('Parts plan', { exact: true }));
      await expectText(card, new RegExp(`Version ${shown.version}\\b`));
      const total = (shown.totals.totalCents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
      await expectText(card.getByTestId('customer-plan-total'), new RegExp(total.replace(/[.,]/g, '\\$&')));
      if (shown.parts.length > 0) await expectVisible(card.getByText(shown.parts[0].sku, { exact: false }));
      await expectText(card.getByTestId('plan-caution'), /welding and lifting work carry risks/);
      // nothing to build, lock or reserve on the customer's card, and no stock or bin words
      expect(await card.getByRole('button').count()).toBe(0);
      expect(await card.innerText()).not.toMatch(/\bon hand\b|\bbin\b|\bavailable\b|cheaper, not chosen/i);
      // the page keeps within the window: no sideways scroll
      await expectFitsWidth(page);
      await card.scrollIntoViewIfNeeded();
      await saveScreenshot(page, `customer-parts-plan-${width}`);
    }
    await page.setViewportSize({ width: 1366, height: 900 });
  });
});
