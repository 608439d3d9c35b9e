import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
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

  it('opens the projects in measuring and runs a fit check on one', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('table', { name: 'Projects' }).waitFor();
    expect(page.url()).toContain('status=measuring');
    await saveScreenshot(page, 'fabricator-projects');
    // Another journey may already have moved the demo project on to the fit-check stage.
    await page.goto('/projects');
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await page.getByRole('button', { name: 'Fit check' }).click();
    const ran = page.waitForResponse((r) => /\/fit-reports$/.test(r.url()) && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Run fit check' }).click();
    expect((await ran).status()).toBe(201);
    await page.getByTestId('side-view').waitFor();
    await page.getByTestId('front-view').waitFor();
    await saveScreenshot(page, 'fabricator-fit-report');
  });
});
