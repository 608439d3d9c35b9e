import { ARTIFACTS_DIR, openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
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

  it("adds a part whose length attribute is typed in inches (the demo shop's units): stored in mm, shown again in inches", async () => {
    const { page } = browser;
    // A SKU of this run, so the journey can run again on the same database; 'Other' keeps it out of the demo plans.
    const sku = `E2E-BR-${Date.now().toString(36).toUpperCase()}`;
    await page.goto('/parts-counter');
    await page.getByRole('tab', { name: 'Parts and stock' }).click();
    await page.getByRole('button', { name: 'New part' }).click();
    const form = page.getByRole('form', { name: 'Part' });
    await form.getByLabel('SKU', { exact: true }).fill(sku);
    await form.getByRole('combobox', { name: 'Category' }).click();
    await form.getByRole('combobox', { name: 'Category' }).fill('Other');
    await page.locator('.ant-select-item-option', { hasText: /^Other$/ }).click();
    await form.getByLabel('Description', { exact: true }).fill('Spacer plate');
    await form.getByLabel('Price', { exact: true }).fill('12.50');
    await form.getByRole('button', { name: 'Add attribute' }).click();
    await form.getByRole('combobox', { name: 'Attribute name' }).fill('length');
    await form.getByRole('combobox', { name: 'Attribute name' }).press('Escape');
    const value = form.getByLabel('Attribute value');
    await value.fill('2 1/2');
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 2 1/2 in = 63.5 mm.
    await expectText(form.getByTestId('attribute-hint'), /effective length 2\.50 in/);
    for (const [width, height] of [[1440, 900], [390, 844]]) {
      await page.setViewportSize({ width, height });
      await value.scrollIntoViewIfNeeded();
      await page.screenshot({ path: `${ARTIFACTS_DIR}/screenshots/part-form-length-attribute-${width}.png` });
    }
    await page.setViewportSize({ width: 1366, height: 900 });
    const created = page.waitForResponse((r) => r.url().endsWith('/api/parts') && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Add part' }).click();
    const response = await created;
    expect(response.status()).toBe(201);
    expect((response.request().postDataJSON() as { attributes: Record<string, unknown> }).attributes).toEqual({ effectiveLengthMm: 63.5 });

    await page.getByLabel('Search parts').fill(sku);
    await page.getByLabel('Search parts').press('Enter');
    await page.getByRole('button', { name: `Edit ${sku}` }).click();
    const edit = page.getByRole('form', { name: 'Part' });
    await expectVisible(edit.getByLabel('Attribute value'));
    expect(await edit.getByLabel('Attribute value').inputValue()).toBe('2.500');
    await page.getByRole('button', { name: 'Cancel' }).click();
  });
});
