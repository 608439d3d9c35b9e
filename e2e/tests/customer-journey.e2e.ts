import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectVisible } from './support/expect-page';
import { signInAs } from './support/session';

describe('the customer follows their own swap', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
    await signInAs(browser.page, 'customer');
  });

  afterAll(async () => {
    await browser.close();
  });

  it('sees only their own project and opens it', async () => {
    const { page } = browser;
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await expectVisible(page.getByRole('heading', { name: /Harlan Ridgeback 1978/ }));
    await saveScreenshot(page, 'customer-project');
    await page.goto('/my-projects');
    await expectVisible(page.getByRole('link', { name: /Harlan Ridgeback 1978/ }));
    expect(await page.getByText('Pellam Stag 1984').count()).toBe(0);
    await saveScreenshot(page, 'customer-my-projects');
  });
});
