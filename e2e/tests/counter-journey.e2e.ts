import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectText, expectVisible } from './support/expect-page';
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

  it('sees on the home page what is coming and what can be done now', async () => {
    const { page } = browser;
    const home = page.getByTestId('counter-placeholder');
    await expectText(home, /Coming next/);
    await expectVisible(home.getByRole('link', { name: 'Look up oil pans' }));
    await expectVisible(home.getByRole('link', { name: 'Look up accessory drive belts' }));
    await saveScreenshot(page, 'counter-home');
  });

  it('finds the rear-sump swap pan among the oil pans', async () => {
    const { page } = browser;
    await page.getByTestId('counter-placeholder').getByRole('link', { name: 'Look up oil pans' }).click();
    expect(page.url()).toContain('kind=oil-pans');
    expect(await page.getByRole('tab', { name: /Oil pans/i }).getAttribute('aria-selected')).toBe('true');
    const row = page.getByRole('row').filter({ hasText: 'Trailhand TR-4410 rear-sump swap pan' });
    await expectVisible(row);
    await expectText(row, /Rear/);
    await saveScreenshot(page, 'counter-catalog-oil-pans');
  });

  it('finds the belts under the same name the fit page gives the choice', async () => {
    const { page } = browser;
    await page.getByRole('tab', { name: 'Accessory drive belts' }).click();
    await expectVisible(page.getByRole('columnheader', { name: 'Designation' }));
    expect(await page.getByRole('tab', { name: /^Belts$/ }).count()).toBe(0);
  });
});
