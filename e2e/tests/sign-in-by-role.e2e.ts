import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectVisible } from './support/expect-page';
import { mainNavigationLabels, signInAs, type DemoRole } from './support/session';

const EXPECTED_NAVIGATION: Record<DemoRole, string[]> = {
  owner: ['Home', 'Projects', 'Customers', 'Work orders', 'Parts counter', 'Catalog', 'Members', 'Shop settings', 'Background work'],
  estimator: ['Home', 'Projects', 'Customers', 'Catalog'],
  fabricator: ['Home', 'Projects', 'Work orders', 'Catalog'],
  counter: ['Home', 'Parts counter', 'Catalog'],
  customer: ['My projects'],
};

describe('each demo role signs in and sees its own navigation', () => {
  let browser: BrowserSession;

  beforeEach(async () => {
    browser = await openBrowser();
  });

  afterEach(async () => {
    await browser.close();
  });

  it('shows the sign-in page to a visitor', async () => {
    await browser.page.goto('/');
    await expectVisible(browser.page.getByRole('button', { name: 'Sign in' }));
    await expectVisible(browser.page.getByLabel('Email'));
    await saveScreenshot(browser.page, 'sign-in');
  });

  it.each(Object.keys(EXPECTED_NAVIGATION) as DemoRole[])('%s', async (role) => {
    await signInAs(browser.page, role);
    expect(await mainNavigationLabels(browser.page)).toEqual(EXPECTED_NAVIGATION[role]);
    await browser.page.waitForLoadState('networkidle');
    await saveScreenshot(browser.page, `home-${role}`);
  });
});
