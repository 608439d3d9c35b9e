import type { Page } from 'playwright-core';
import { openBrowser, type BrowserSession } from './support/browser';
import { expectReportShown, runFitCheck } from './support/fit-check';
import { signInAs } from './support/session';

const DEMO_PROJECT = /Harlan Ridgeback 1978: Kestrel 5\.3 V8 swap/;

/** Records every content-security-policy violation the page reports, from the first script on. */
async function watchViolations(page: Page): Promise<string[]> {
  const violations: string[] = [];
  await page.exposeFunction('reportCspViolation', (text: string) => violations.push(text));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      (window as unknown as { reportCspViolation(text: string): void }).reportCspViolation(
        `${event.violatedDirective} blocked ${event.blockedURI || 'inline'} (${event.sourceFile}:${event.lineNumber})`,
      );
    });
  });
  page.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.push(message.text());
  });
  return violations;
}

describe('the built web app runs under the server\'s content security policy', () => {
  let browser: BrowserSession;
  let violations: string[];

  beforeAll(async () => {
    browser = await openBrowser();
    violations = await watchViolations(browser.page);
  });

  afterAll(async () => {
    await browser.close();
  });

  it('serves the app with a policy that allows only its own scripts', async () => {
    const response = await browser.page.goto('/sign-in');
    const csp = response?.headers()['content-security-policy'] ?? '';
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
  });

  it('signs in, opens the main pages and a fit report with no policy violation', async () => {
    const { page } = browser;
    await signInAs(page, 'owner');
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const name of ['Customers', 'Catalog', 'Members', 'Shop settings', 'Projects']) {
      await nav.getByRole('link', { name }).click();
      await page.waitForLoadState('networkidle');
    }
    await page.getByRole('link', { name: DEMO_PROJECT }).first().click();
    await page.getByRole('button', { name: 'Fit check' }).click();
    const report = await runFitCheck(page);
    // The page may still show an older report when the run answers: look for violations once the new one is drawn.
    await expectReportShown(page, report);
    await page.getByTestId('side-view').waitFor();
    expect(violations).toEqual([]);
  });

  it('shows the API documentation with no policy violation', async () => {
    const { page } = browser;
    await page.goto('/api/docs');
    await page.locator('.swagger-ui').first().waitFor();
    expect(violations).toEqual([]);
  });
});
