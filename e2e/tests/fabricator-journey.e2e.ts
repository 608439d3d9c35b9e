import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectFitsWidth, expectTargetsAtLeast, expectText, expectVisible } from './support/expect-page';
import { expectReportShown, runFitCheck } from './support/fit-check';
import { signInAs } from './support/session';

describe('the fabricator checks the chassis waiting to be measured', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
    await signInAs(browser.page, 'fabricator');
  });

  afterAll(async () => {
    await browser.close();
  });

  it('opens the projects waiting to be measured and runs a fit check on one', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('table', { name: 'Projects' }).waitFor();
    expect(page.url()).toContain('status=intake');
    await saveScreenshot(page, 'fabricator-projects');
    // Another journey may already have moved the demo project on to the fit-check stage.
    await page.goto('/projects');
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await page.getByRole('button', { name: 'Fit check' }).click();
    const report = await runFitCheck(page);
    // The page opens on the newest older report and shows it until the run answers: check the one just run.
    await expectReportShown(page, report);
    await expectVisible(page.getByTestId('side-view'));
    await expectVisible(page.getByTestId('front-view'));
    await expectText(page.getByTestId('fit-caution'), /\S/);
    await saveScreenshot(page, 'fabricator-fit-report');

    // on a phone the report fits the screen and the top bar still names who is signed in
    await page.setViewportSize({ width: 390, height: 844 });
    await expectVisible(page.getByRole('button', { name: /^Account:/ }));
    await page.waitForTimeout(300);
    await expectFitsWidth(page);
    await saveScreenshot(page, 'fabricator-fit-report-phone');

    // on paper the report carries the shop, the customer and the vehicle
    await page.emulateMedia({ media: 'print' });
    const header = page.getByTestId('fit-print-header');
    await expectText(header, /Ironbark Swap Works/);
    await expectText(header, /Customer/);
    await expectText(header, /Vehicle/);
    await page.emulateMedia({ media: 'screen' });
  });

  it('on a phone, links and icons that act are thumb-sized targets, like the buttons', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 390, height: 844 });
    const link = { width: 44, height: 44 };
    // a home card's "All"
    await page.goto('/');
    await expectVisible(page.locator('.ant-card-extra > a'));
    await expectTargetsAtLeast(page, '.ant-card-extra > a', link);
    // a page's way back, on the project and on its measurement sheet
    await page.goto('/projects');
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await expectVisible(page.getByRole('link', { name: '← Projects' }));
    await expectTargetsAtLeast(page, 'a.back-link', link);
    await page.getByRole('button', { name: 'Measurement sheet' }).click();
    await expectVisible(page.getByRole('heading', { name: 'Measurement sheet' }));
    await expectTargetsAtLeast(page, 'a.back-link', link);
    // the "x" that clears a fit page's picker (it shows on hover or touch)
    await page.getByRole('button', { name: 'Fit check' }).click();
    const picker = page.locator('.ant-select').filter({ has: page.locator('.ant-select-clear') }).first();
    await picker.hover();
    await expectTargetsAtLeast(page, '.ant-select-clear', { width: 24, height: 24 });
    await expectFitsWidth(page);
  });

  it('on a phone, the password eye is a thumb-sized target', async () => {
    const fresh = await openBrowser();
    try {
      await fresh.page.setViewportSize({ width: 390, height: 844 });
      await fresh.page.goto('/');
      await expectVisible(fresh.page.getByLabel('Password', { exact: true }));
      await expectTargetsAtLeast(fresh.page, '.ant-input-password-icon', { width: 44, height: 24 });
    } finally {
      await fresh.close();
    }
  });
});
