import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectVisible } from './support/expect-page';
import { signInAs } from './support/session';

describe('the estimator opens a customer and a swap project', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
    await signInAs(browser.page, 'estimator');
  });

  afterAll(async () => {
    await browser.close();
  });

  const customerName = `Rowan Castellane ${Date.now() % 100000}`;
  const projectTitle = `Castellane flatbed V8 ${Date.now() % 100000}`;

  it('adds a customer and finds it in the customers table', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Customers' }).click();
    await page.getByRole('table', { name: 'Customers' }).waitFor();
    await saveScreenshot(page, 'estimator-customers');
    await page.getByRole('button', { name: 'New customer' }).click();
    const form = page.getByRole('form', { name: 'Customer' });
    await form.getByLabel('Name').fill(customerName);
    await form.getByLabel('Email').fill('rowan.castellane@example.test');
    await saveScreenshot(page, 'estimator-new-customer');
    const created = page.waitForResponse((r) => r.url().endsWith('/api/customers') && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Add customer' }).click();
    expect((await created).status()).toBe(201);
    await page.getByRole('searchbox', { name: 'Search customers' }).fill(customerName);
    await page.getByRole('searchbox', { name: 'Search customers' }).press('Enter');
    await expectVisible(page.getByRole('table', { name: 'Customers' }).getByText(customerName));
  });

  it('opens a project for that customer and finds it in the projects table', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('table', { name: 'Projects' }).waitFor();
    await saveScreenshot(page, 'estimator-projects');
    await page.getByRole('button', { name: 'New project' }).click();
    const form = page.getByRole('form', { name: 'Project' });
    await form.getByLabel('Project title').fill(projectTitle);
    await form.getByRole('combobox', { name: 'Customer' }).click();
    await form.getByRole('combobox', { name: 'Customer' }).fill(customerName.split(' ')[0]);
    await page.locator('.ant-select-item-option', { hasText: customerName }).click();
    await form.getByLabel('Vehicle').fill('1969 Tolvane Haymaker one-ton flatbed');
    await form.getByText('Towing', { exact: true }).click();
    await form.getByRole('spinbutton', { name: 'Target power' }).fill('300');
    await form.getByRole('spinbutton', { name: 'Planned rev limit' }).fill('5500');
    await saveScreenshot(page, 'estimator-new-project');
    const created = page.waitForResponse((r) => r.url().endsWith('/api/projects') && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Open project' }).click();
    expect((await created).status()).toBe(201);
    await page.goto('/projects');
    await page.getByRole('searchbox', { name: 'Search projects' }).fill(projectTitle);
    await page.getByRole('searchbox', { name: 'Search projects' }).press('Enter');
    await expectVisible(page.getByRole('table', { name: 'Projects' }).getByText(projectTitle));
    await saveScreenshot(page, 'estimator-project-found');
  });
});
