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

  it('lands on the counter itself, not a dead end', async () => {
    const { page } = browser;
    await expectVisible(page.getByRole('tab', { name: 'Jobs' }));
    await expectVisible(page.getByRole('tab', { name: 'Parts and stock' }));
    await saveScreenshot(page, 'counter-home');
  });

  it('finds the rear-sump swap pan among the oil pans', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalog' }).click();
    const oilPans = page.getByRole('tab', { name: /Oil pans/i });
    await expectVisible(oilPans);
    await oilPans.click();
    // antd marks the tab selected after its own state update: wait for it rather than read it at once.
    await expectVisible(page.getByRole('tab', { name: /Oil pans/i, selected: true }));
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
