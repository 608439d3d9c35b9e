import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { signInAs } from './support/session';

describe('the parts counter looks up the shop catalog', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
    await signInAs(browser.page, 'counter');
  });

  afterAll(async () => {
    await browser.close();
  });

  it('finds the rear-sump swap pan among the oil pans', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalog' }).click();
    await page.getByRole('tab', { name: /Oil pans/i }).click();
    await page.getByText('Trailhand TR-4410 rear-sump swap pan').first().waitFor();
    await saveScreenshot(page, 'counter-catalog-oil-pans');
  });
});
