import { DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import type { Page } from 'playwright-core';
import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { makeJpeg } from './support/images';
import { expectFitsWidth, expectText, expectThumbSizedButtons, expectVisible } from './support/expect-page';
import { demoSignIn, signInAs } from './support/session';

const PHONE = { width: 390, height: 844 };
const PROJECT = DEMO_PROJECT_IDS.ridgeback;

async function enterReading(page: Page, label: string, text: string): Promise<void> {
  const card = page.getByTestId('point-card').filter({ hasText: label }).first();
  await card.getByRole('textbox', { name: `Reading: ${label}` }).fill(text);
  const saved = page.waitForResponse((r) => r.url().includes('/measurement-sheet/values/') && r.request().method() === 'PUT');
  await card.getByRole('button', { name: /^Save (new )?reading$/ }).click();
  expect((await saved).status()).toBe(200);
}

describe('the fabricator measures the demo truck on a phone; the estimator sees the readings in the fit report', () => {
  let browser: BrowserSession;

  afterEach(async () => {
    await browser?.close();
  });

  it('the fabricator fills in what is missing, photographs a point and signs the sheet off', async () => {
    browser = await openBrowser();
    const { page } = browser;
    // thumbnails are blob: URLs of fetched photos; the server's content security policy must allow them
    const policyViolations: string[] = [];
    page.on('console', (message) => {
      if (/Content Security Policy/i.test(message.text())) policyViolations.push(message.text());
    });
    await signInAs(page, 'fabricator');
    // the rest on a phone (the main navigation folds into a menu there)
    await page.setViewportSize(PHONE);

    await page.goto('/projects');
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await page.getByRole('button', { name: 'Measurement sheet' }).click();
    await expectVisible(page.getByRole('heading', { name: 'Measurement sheet' }));
    await expectText(page.getByTestId('measurement-safety'), /never work under a vehicle held only by a jack/);
    // The demo sheet is started: the list opens on the three points still to read.
    await expectText(page.getByTestId('sheet-counts'), /22 of 25 required points measured/);
    // one point a line, a list to work down at the truck
    await expectText(page.getByTestId('missing-list'), /Still to measure \(3\)/);
    expect(await page.getByTestId('missing-list').getByRole('listitem').allInnerTexts()).toEqual(['Front crossmember: top', 'Pinion: centre height', 'Pinion: angle']);
    await expect(page.getByTestId('point-card').count()).resolves.toBe(3);
    await expectVisible(page.getByRole('img', { name: 'Where to measure: Front crossmember: top' }));
    await page.waitForTimeout(300);
    await expectFitsWidth(page);
    await saveScreenshot(page, 'measurement-sheet-phone');

    // A photo of the crossmember top: progress, then the thumbnail.
    const card = page.getByTestId('point-card').filter({ hasText: 'Front crossmember: top' }).first();
    const uploaded = page.waitForResponse((r) => r.url().endsWith('/measurement-sheet/photos') && r.request().method() === 'POST');
    await card.getByLabel('Take or add photos: Front crossmember: top').setInputFiles({ name: 'crossmember-top.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page) });
    expect((await uploaded).status()).toBe(201);
    const thumb = card.getByTestId('photo-thumb');
    await expectText(thumb, /Uploaded/);
    await expect(thumb.getByRole('progressbar').getAttribute('aria-valuenow')).resolves.toBe('100');
    await expectVisible(thumb.getByRole('img', { name: 'Photo: Front crossmember: top' }));
    await saveScreenshot(page, 'measurement-photo-phone');
    // The photo's Delete, and the question it asks first, are thumb-sized like every other control on a phone.
    await expectVisible(thumb.getByRole('button', { name: 'Delete' }));
    const sizes = await expectThumbSizedButtons(thumb);
    expect(sizes.map((button) => button.name)).toContain('Delete');
    await thumb.getByRole('button', { name: 'Delete' }).click();
    const question = page.locator('.ant-popconfirm').filter({ hasText: 'Delete this photo?' });
    await expectVisible(question);
    await expectThumbSizedButtons(question);
    await question.getByRole('button', { name: 'Cancel' }).click();
    await question.waitFor({ state: 'hidden' });

    // Readings typed as the tape shows them: a fraction of an inch, millimetres, degrees.
    const box = card.getByRole('textbox', { name: 'Reading: Front crossmember: top' });
    await box.fill('13.976 in');
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly; 13.976 in = 354.99 mm, the catalog's 355 mm to 0.01 mm.
    await expectText(card.getByTestId('reading-preview'), /\(355 mm\)/);
    await enterReading(page, 'Front crossmember: top', '13.976 in');
    await enterReading(page, 'Pinion: centre height', '370 mm');
    await enterReading(page, 'Pinion: angle', '3');
    await expectText(page.getByTestId('sheet-counts'), /25 of 25 required points measured/);

    await page.getByRole('button', { name: 'Sign off the sheet' }).click();
    const signed = page.waitForResponse((r) => r.url().endsWith('/measurement-sheet/sign-off'));
    await page.getByRole('button', { name: 'Sign off', exact: true }).click();
    expect((await signed).status()).toBe(200);
    await expectText(page.getByTestId('signed-off'), new RegExp(`Signed off by ${demoSignIn('fabricator').name}`));

    // After sign-off the measured list shows who measured; a change now asks for a reason.
    await page.getByTestId('sheet-overview').getByText('Done', { exact: true }).click();
    const top = page.getByTestId('point-card').filter({ hasText: 'Front crossmember: top' }).first();
    await expectText(top.getByTestId('measured-by'), new RegExp(`Measured by ${demoSignIn('fabricator').name}`));
    await top.getByRole('textbox', { name: 'Reading: Front crossmember: top' }).fill('355 mm');
    await top.getByRole('button', { name: 'Save new reading' }).click();
    await expectVisible(page.getByRole('button', { name: 'Save with this reason' }));
    await page.getByRole('textbox', { name: 'Reason for the change' }).fill('Read again off the flat of the crossmember');
    const changed = page.waitForResponse((r) => r.url().includes('/measurement-sheet/values/') && r.request().method() === 'PUT');
    await page.getByRole('button', { name: 'Save with this reason' }).click();
    expect((await changed).status()).toBe(200);
    await top.getByText(/^History \(\d+\)$/).click();
    await expectText(top.getByRole('list', { name: 'History: Front crossmember: top' }), /reason: Read again off the flat of the crossmember/);
    expect(policyViolations).toEqual([]);
  });

  it('the estimator re-runs the fit check and the report names the measured values and who took them', async () => {
    browser = await openBrowser();
    const { page } = browser;
    await signInAs(page, 'estimator');
    await page.setViewportSize(PHONE);
    await page.goto(`/projects/${PROJECT}/fit`);
    const ran = page.waitForResponse((r) => /\/fit-reports$/.test(r.url()) && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Run fit check' }).click();
    expect((await ran).status()).toBe(201);

    const sources = page.getByTestId('report-sources');
    await expectText(sources, /25 chassis figures from the measurement sheet/);
    await sources.getByText('Oil pan to front crossmember').click();
    const inputs = sources.getByRole('list', { name: 'Inputs of Oil pan to front crossmember' });
    await expectText(inputs, /Front crossmember: top/);
    await expectText(inputs, new RegExp(`From the sheet: measured by ${demoSignIn('fabricator').name}`));
    await sources.scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await expectFitsWidth(page);
    await saveScreenshot(page, 'fit-report-sources-phone');
  });
});
