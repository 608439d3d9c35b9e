import type { Page } from 'playwright-core';
import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { expectText, expectVisible } from './support/expect-page';
import { signInAs } from './support/session';

/** SKUs of this run, so the journey can run again on the same database. */
const RUN = Date.now().toString(36).toUpperCase();

function csvFile(name: string, lines: string[]) {
  return { name, mimeType: 'text/csv', buffer: Buffer.from(`${lines.join('\n')}\n`) };
}

/** `field` as the import form names it ("SKU (part number)", "Category"). */
async function chooseColumn(page: Page, field: string, header: string): Promise<void> {
  await page.getByLabel(`Column for ${field}`, { exact: true }).click();
  await page.locator('.ant-select-dropdown:not(.ant-select-dropdown-hidden) .ant-select-item-option', { hasText: header }).first().click();
}

async function searchParts(page: Page, text: string): Promise<void> {
  await page.getByRole('tab', { name: 'Parts and stock' }).click();
  const search = page.locator('input[aria-label="Search parts"]');
  await search.fill(text);
  await search.press('Enter');
}

describe('the counter imports a supplier file', () => {
  let browser: BrowserSession;

  beforeAll(async () => {
    browser = await openBrowser();
    await signInAs(browser.page, 'counter');
  });

  afterAll(async () => {
    await browser.close();
  });

  it('maps the columns of a file whose headers differ, sees the preview, imports, and finds the parts in the table', async () => {
    const { page } = browser;
    await page.getByRole('tab', { name: 'Import CSV' }).click();
    await page.locator('input[type=file]').setInputFiles(
      csvFile('brookfield-prices.csv', [
        'Item Code,Title,Kind,Retail,Vendor,Shelf Qty,Where',
        `IMP-${RUN}-1,Radiator hose kit upper and lower,hoses,64.50,Brookfield Parts,4,Main store`,
        // the category by its name, as a person writes it; the short form (hoses) is read as well
        `IMP-${RUN}-2,Electric fan 16 in,Fan,189.00,Brookfield Parts,2,Main store`,
      ]),
    );
    // The item code and the kind are not spellings the import knows: it asks which columns hold them.
    await expectText(page.getByRole('alert').filter({ hasText: 'Choose the file' }), /SKU \(part number\), Category/);
    await chooseColumn(page, 'SKU (part number)', 'Item Code');
    await chooseColumn(page, 'Category', 'Kind');
    await expectText(page.getByTestId('import-ready'), /2 rows ready to import/);
    await saveScreenshot(page, 'counter-import-preview');
    await page.getByRole('button', { name: 'Import 2 rows' }).click();
    await expectText(page.getByTestId('import-done'), /Imported: 2 new, 0 updated/);

    await searchParts(page, `IMP-${RUN}`);
    const row = page.getByRole('row').filter({ hasText: `IMP-${RUN}-1` });
    await expectVisible(row);
    await expectText(row, /Radiator hose kit upper and lower/);
    await expectText(row, /Brookfield Parts/);
    await expectVisible(page.getByRole('row').filter({ hasText: `IMP-${RUN}-2` }));
    await saveScreenshot(page, 'counter-imported-parts');
  });

  it('a file with bad rows shows every error and writes nothing', async () => {
    const { page } = browser;
    await page.getByRole('tab', { name: 'Import CSV' }).click();
    await page.locator('input[type=file]').setInputFiles(
      csvFile('bad-rows.csv', [
        'sku,description,category,price',
        `BAD-${RUN}-1,Good row,fan,10.00`,
        `,No SKU,fan,10.00`,
        `BAD-${RUN}-3,Bad price,fan,ten`,
        `BAD-${RUN}-4,Unknown category,spoiler,10.00`,
        `BAD-${RUN}-1,Duplicated SKU,fan,10.00`,
      ]),
    );
    await expectText(page.getByRole('alert').filter({ hasText: 'rows have errors' }), /4 of 5 rows have errors\. Nothing is imported/);
    const errors = page.getByRole('table').filter({ hasText: 'Problem' });
    for (const line of ['3', '4', '5', '6']) await expectVisible(errors.getByRole('row').filter({ has: page.getByRole('cell', { name: line, exact: true }) }));
    // the unknown category's line says which names the import accepts
    await expectText(errors.getByRole('row').filter({ has: page.getByRole('cell', { name: '5', exact: true }) }), /category "spoiler" is not one we know; write one of: Engine, Transmission, Oil pan/);
    expect(await page.getByRole('button', { name: 'Import 1 row', exact: true }).isDisabled()).toBe(true);
    await expectVisible(page.getByRole('button', { name: 'Download rejected rows' }));
    await saveScreenshot(page, 'counter-import-errors');

    await searchParts(page, `BAD-${RUN}`);
    // the shown empty table (the Jobs tab stays mounted, hidden, with its own empty state when no plan exists)
    await expectVisible(page.getByText('No data').or(page.locator('.ant-empty')).filter({ visible: true }));
    expect(await page.getByRole('row').filter({ hasText: `BAD-${RUN}-1` }).count()).toBe(0);
  });
});
