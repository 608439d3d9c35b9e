import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectText, expectVisible } from './support/expect-page';
import { expectReportShown, runFitCheck } from './support/fit-check';

interface CapturedMail {
  to: string[];
  subject: string;
  text: string;
}

async function mailsTo(email: string): Promise<CapturedMail[]> {
  if (!process.env.MAIL_FAKE_URL) throw new Error('MAIL_FAKE_URL is not set: source .local/test/env.sh first.');
  // The background worker sends it within moments: wait up to 10 s for the first.
  for (let attempt = 0; ; attempt++) {
    const mails = (await (await fetch(process.env.MAIL_FAKE_URL)).json()) as CapturedMail[];
    const found = mails.filter((mail) => mail.to.includes(email));
    if (found.length > 0 || attempt >= 50) return found;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

describe('a new owner signs up and finishes through the e-mailed link', () => {
  let browser: BrowserSession;
  let signUpLink: string;
  let projectId: string;

  beforeAll(async () => {
    browser = await openBrowser();
  });

  afterAll(async () => {
    await browser.close();
  });

  it('is told to check the e-mail, opens the link and lands in the new shop', async () => {
    const { page } = browser;
    const email = `new.owner.${Date.now()}@example.test`;
    await page.goto('/sign-up');
    const form = page.getByRole('form', { name: 'Create your shop' });
    await form.getByLabel('Your name').fill('Corvin Ashdale');
    await form.getByLabel('Shop or garage name').fill('Ashdale Shed');
    await form.getByLabel('Email').fill(email);
    await form.getByLabel('Password', { exact: true }).fill('long-enough-password-1');
    await form.getByLabel('Repeat password').fill('long-enough-password-1');
    const sent = page.waitForResponse((r) => r.url().endsWith('/api/auth/sign-up') && r.request().method() === 'POST');
    await form.getByRole('button', { name: 'Create shop' }).click();
    expect((await sent).status()).toBe(202);
    await page.getByText('Check your e-mail', { exact: true }).waitFor();
    expect(await page.getByText(email, { exact: false }).count()).toBeGreaterThan(0);
    await saveScreenshot(page, 'sign-up-check-mail');

    const [mail] = await mailsTo(email);
    expect(mail.subject).toBe('Finish creating your Swapwright shop');
    const link = /https?:\/\/\S+\/sign-up\?token=[^\s"<>]+/.exec(mail.text)?.[0];
    expect(link).toBeDefined();
    signUpLink = link!;
    await page.goto(link!);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.waitFor();
    expect(await nav.getByRole('link', { name: 'Shop settings' }).count()).toBe(1);
    await saveScreenshot(page, 'sign-up-finished');
  });

  it('plans a swap for their own truck right away, without making a customer first', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('button', { name: 'New project' }).first().click();
    const form = page.getByRole('form', { name: 'Project' });
    await form.waitFor();
    // A shop with no customers yet starts on its own truck and shows no customer picker.
    await form.getByRole('radio', { name: 'My own truck' }).and(page.locator(':checked')).waitFor({ state: 'attached' });
    // The form hears of the choice a moment after the radio shows it checked, and only then drops the picker and shows
    // the note: look for the picker once the note is there.
    await expectVisible(form.getByTestId('own-truck-note'));
    expect(await form.getByRole('combobox', { name: 'Customer' }).count()).toBe(0);
    await form.getByLabel('Project title').fill('Own flatbed: diesel swap');
    await form.getByLabel('Vehicle').fill('Invented 1979 flatbed, long bed');
    await form.getByLabel('Planned rev limit').fill('5800');
    await saveScreenshot(page, 'sign-up-own-truck-project');
    const created = page.waitForResponse((r) => r.url().endsWith('/api/projects') && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Open project' }).click();
    const response = await created;
    expect(response.status()).toBe(201);
    const project = (await response.json()) as { id: string; customer: { name: string } };
    expect(project.customer.name).toBe('Corvin Ashdale');
    projectId = project.id;
    await page.waitForURL(new RegExp(`/projects/${project.id}`));
    await page.getByRole('heading', { name: 'Own flatbed: diesel swap' }).first().waitFor();
  });

  it('finds their own record in Customers marked as themselves, with nothing to remove or invite', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Customers' }).click();
    const table = page.getByTestId('customers-table');
    const mine = table.getByRole('row', { name: /Corvin Ashdale/ });
    await mine.waitFor();
    expect(await mine.getByTestId('own-record-tag').innerText()).toBe('You');
    expect(await mine.innerText()).toContain('Your own record, used for My own truck');
    expect(await mine.getByRole('button', { name: 'Remove Corvin Ashdale' }).count()).toBe(0);
    await saveScreenshot(page, 'sign-up-own-record-in-customers');
    await page.setViewportSize({ width: 390, height: 844 });
    await page.waitForTimeout(300);
    await expectVisible(mine.getByTestId('own-record-tag'));
    await saveScreenshot(page, 'sign-up-own-record-in-customers-phone');
    await page.setViewportSize({ width: 1366, height: 900 });

    // inviting a customer to follow their projects does not offer oneself
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Members' }).click();
    const invite = page.getByRole('form', { name: 'Invite a member' });
    await invite.getByRole('combobox', { name: 'Role' }).click();
    await page.locator('.ant-select-item-option').filter({ hasText: /^Customer$/ }).click();
    await invite.getByRole('combobox', { name: 'Customer record' }).click();
    // the shop's only customer record is their own: the list of records to invite is empty. The list shows empty while
    // the records still load too, so look only once the picker has put away its loading sign.
    const recordItem = invite.locator('.ant-form-item').filter({ has: page.getByRole('combobox', { name: 'Customer record' }) });
    await recordItem.locator('.anticon-loading').waitFor({ state: 'detached' });
    await page.locator('.ant-select-dropdown:visible .ant-select-item-empty').waitFor();
    expect(await page.locator('.ant-select-dropdown:visible .ant-select-item-option').filter({ hasText: 'Corvin Ashdale' }).count()).toBe(0);
  });

  it('on a phone, starts the empty catalog from the sample on the fit page and gets a fit report', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`/projects/${projectId}/fit`);
    const offer = page.getByTestId('sample-catalog-offer');
    await offer.waitFor();
    // Every empty picker says where to add that kind.
    expect(await page.getByTestId('empty-engineProfileId').getByRole('link', { name: 'Add an engine in the catalog' }).getAttribute('href')).toBe('/catalog?kind=engines');
    await expectVisible(page.getByTestId('empty-chassisModelId').getByRole('link', { name: 'Add a chassis in the catalog' }));
    await saveScreenshot(page, 'sign-up-fit-empty-catalog-phone');

    // Nothing to run yet: the button waits for an engine and a chassis (the API refuses such a run in the same words).
    expect(await page.getByRole('button', { name: 'Run fit check' }).isDisabled()).toBe(true);
    expect(await page.getByText(/engineProfileId|chassisModelId/).count()).toBe(0);

    const copied = page.waitForResponse((r) => r.url().endsWith('/api/catalog/sample') && r.request().method() === 'POST');
    await offer.getByRole('button', { name: 'Start from the sample catalog' }).click();
    const copy = await copied;
    expect(copy.status()).toBe(200);
    expect(((await copy.json()) as { added: number }).added).toBeGreaterThan(20);
    await offer.waitFor({ state: 'detached' });

    const choose = async (label: string, option: string, field: string) => {
      const saved = page.waitForResponse((r) => r.url().endsWith(`/api/projects/${projectId}`) && r.request().method() === 'PATCH');
      await page.getByRole('combobox', { name: label, exact: true }).click();
      await page.locator('.ant-select-dropdown:visible .ant-select-item-option').filter({ hasText: option }).click();
      const response = await saved;
      expect(response.status()).toBe(200);
      expect(((await response.json()) as Record<string, unknown>)[field]).toBeTruthy();
    };
    await choose('Engine', 'Kestrel 5.3 V8 (truck)', 'engineProfileId');
    await choose('Chassis', 'Harlan Ridgeback 1978 half-ton pickup', 'chassisModelId');

    const report = await runFitCheck(page);
    await page.getByText('Every check').first().waitFor();
    // Nothing on the page is wider than the phone: measured once the history, which loads on its own, lists the run too.
    await expectReportShown(page, report);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await saveScreenshot(page, 'sign-up-fit-report-phone');
  });

  it('home leads with their own projects, and the used sign-up link opened again leads home', async () => {
    const { page } = browser;
    await page.goto('/');
    await page.getByText('Next steps').first().waitFor();
    // The heading shows before the projects load: wait for the project itself, then look for what must not be there.
    await expectVisible(page.getByText('Own flatbed: diesel swap'));
    expect(await page.getByText('Needs a quote').count()).toBe(0);
    await saveScreenshot(page, 'sign-up-builder-home-phone');

    await page.goto(signUpLink);
    await page.getByText('You are already signed in').waitFor();
    expect(await page.getByText('not valid any more').count()).toBe(0);
    await saveScreenshot(page, 'sign-up-link-again-phone');
    await page.getByRole('button', { name: 'Go to my home page' }).click();
    await page.waitForURL((url) => url.pathname === '/');
    await page.getByText('Next steps').first().waitFor();
  });

  it('keeps the quote of their own truck as the budget, starts the build from it and lands on the work order', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`/projects/${projectId}`);
    const drafted = page.waitForResponse((r) => r.url().endsWith(`/api/projects/${projectId}/quotes`) && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Draft a budget' }).click();
    const draft = (await (await drafted).json()) as { label: string; forMyself: boolean };
    expect(draft.forMyself).toBe(true);
    const item = page.getByTestId(`quote-${draft.label}`);
    await expectText(item.getByTestId('own-truck-quote-note'), /no customer to send this quote to/);
    expect(await item.getByRole('button', { name: 'Send to customer' }).count()).toBe(0);

    // The builder adds work of their own to the budget as a free-text labor line.
    await item.getByRole('link', { name: 'Edit lines' }).click();
    await page.getByRole('button', { name: 'Add labor line' }).click();
    const line = page.getByRole('form', { name: 'Add a labor line' });
    await line.getByLabel('Description').fill('Remove and install engine');
    await line.getByLabel('Hours').fill('8.5');
    const saved = page.waitForResponse((r) => /\/api\/quotes\/[^/]+$/.test(r.url()) && r.request().method() === 'PATCH');
    await page.getByRole('button', { name: 'Add line' }).click();
    expect((await saved).status()).toBe(200);

    // The budget page says labor is counted as the builder's own time in a new garage (no labor rate yet).
    await expectText(page.getByTestId('own-time-labor'), /Labor is counted at \$0 per hour: [\d.]+ h of your own time/);
    // The budget prints as a budget, named as one.
    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF' }).click();
    expect((await download).suggestedFilename()).toBe(`budget-${draft.label}-revision-1.pdf`);
    await page.getByRole('button', { name: 'Start my build' }).click();
    const confirm = page.getByRole('dialog', { name: `Start your build from ${draft.label}?` });
    await confirm.waitFor({ state: 'visible' });
    await expectText(confirm, /frozen as the budget of your build, and the work order opens[\s\S]*No e-mail, no deposit/);
    // Before freezing, what is still open on the budget, each with where to fix it: nothing was measured on this truck.
    const open = confirm.getByTestId('own-build-open-items');
    await expectText(open, /Labor is counted at \$0 per hour: [\d.]+ h of your own time/);
    await expectText(open, /The chassis has not been measured/);
    await expectVisible(open.getByRole('link', { name: /set a labor rate in shop settings/ }));
    await expectVisible(open.getByRole('link', { name: 'Measure the chassis' }));
    await saveScreenshot(page, 'sign-up-start-own-build-confirm');
    const started = page.waitForResponse((r) => /\/start-own-build$/.test(r.url()));
    await confirm.getByRole('button', { name: 'Start anyway' }).click();
    expect((await started).status()).toBe(200);
    await page.waitForURL(/\/work-orders\/[^/]+$/);
    await expectText(page.getByRole('heading', { level: 2 }), new RegExp(`Work order`));
    await expectVisible(page.getByText(`From quote ${draft.label} revision`));
    await expectVisible(page.getByText('Remove and install engine').first());
    await saveScreenshot(page, 'sign-up-own-build-work-order');
  });
});
