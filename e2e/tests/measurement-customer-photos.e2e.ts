import { DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { makeJpeg } from './support/images';
import { expectFitsWidth, expectText, expectThumbSizedButtons, expectVisible } from './support/expect-page';
import { signInAs } from './support/session';
import { withE2eDatabase } from './support/database';

const PHONE = { width: 390, height: 844 };
const PROJECT = DEMO_PROJECT_IDS.ridgeback;

describe("the customer's own photos: added before the truck arrives, accepted or replaced by the fabricator", () => {
  let browser: BrowserSession;
  let signOff: { signedOffAt: Date | null; signedOffById: string | null } | undefined;

  // The measurement journey signs this sheet off, and a signed-off sheet keeps its photos; these steps need it open
  // whichever journey ran first, and leave the sign-off as they found it.
  beforeAll(async () => {
    signOff = await withE2eDatabase(async (db) => {
      const [rows] = await db.query('SELECT signedOffAt, signedOffById FROM measurement_sheets WHERE projectId = ?', [PROJECT]);
      await db.query('UPDATE measurement_sheets SET signedOffAt = NULL, signedOffById = NULL WHERE projectId = ?', [PROJECT]);
      return (rows as Array<{ signedOffAt: Date | null; signedOffById: string | null }>)[0];
    });
  });

  afterAll(async () => {
    if (!signOff?.signedOffAt) return;
    await withE2eDatabase((db) =>
      db.query('UPDATE measurement_sheets SET signedOffAt = ?, signedOffById = ? WHERE projectId = ?', [signOff!.signedOffAt, signOff!.signedOffById, PROJECT]),
    );
  });

  afterEach(async () => {
    await browser?.close();
  });

  it('the customer adds two photos of the truck on a phone; they wait for the shop', async () => {
    browser = await openBrowser();
    const { page } = browser;
    await signInAs(page, 'customer');
    await page.setViewportSize(PHONE);
    await page.goto('/my-projects');
    await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
    await page.getByRole('button', { name: 'Measurements and photos' }).click();
    await expectVisible(page.getByRole('heading', { name: 'Measurement sheet' }));
    await expectText(page.getByTestId('customer-photo-help'), /accepts it or takes a better one/);

    const general = page.getByTestId('general-photos');
    let stored = 0;
    page.on('response', (r) => {
      if (r.url().endsWith('/measurement-sheet/photos') && r.request().method() === 'POST' && r.status() === 201) stored += 1;
    });
    await general.getByLabel('Take or add photos: the truck').setInputFiles([
      { name: 'driver-side.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page, { shade: '#7d8a94', bar: false }) },
      { name: 'engine-bay.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page, { shade: '#4a5560' }) },
    ]);
    // each photo goes up on its own, with its own progress, and ends as a thumbnail waiting for the shop
    await general.getByTestId('photo-thumb').nth(1).waitFor();
    await expectText(general.getByTestId('photo-thumb').nth(0), /Uploaded[\s\S]*Waiting for the shop/);
    await expectText(general.getByTestId('photo-thumb').nth(1), /Uploaded[\s\S]*Waiting for the shop/);
    expect(stored).toBe(2);
    // only the shop accepts or replaces them
    expect(await general.getByRole('button', { name: /^Accept/ }).count()).toBe(0);
    // the customer may take back their own photo: its Delete is thumb-sized on the phone
    const own = general.getByTestId('photo-thumb').nth(0);
    await expectVisible(own.getByRole('button', { name: 'Delete' }));
    expect((await expectThumbSizedButtons(own)).map((button) => button.name)).toContain('Delete');
    await general.scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await expectFitsWidth(page);
    await saveScreenshot(page, 'customer-photos-phone');
  });

  it('the fabricator accepts one photo and replaces the other with a better one', async () => {
    browser = await openBrowser();
    const { page } = browser;
    await signInAs(page, 'fabricator');
    await page.setViewportSize(PHONE);
    await page.goto(`/projects/${PROJECT}/measurements`);
    await expectVisible(page.getByRole('heading', { name: 'Measurement sheet' }));

    const general = page.getByTestId('general-photos');
    const pending = general.getByTestId('photo-thumb').filter({ hasText: 'From the customer' });
    await pending.nth(1).waitFor();
    expect(await pending.count()).toBe(2);
    await general.scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await expectFitsWidth(page);
    await saveScreenshot(page, 'customer-photos-review-phone');
    // Accept and Replace under a narrow thumbnail are thumb-sized too
    await expectVisible(pending.first().getByRole('button', { name: 'Replace' }));
    expect((await expectThumbSizedButtons(pending.first())).map((button) => button.name)).toEqual(expect.arrayContaining([expect.stringMatching(/^Accept the customer's photo/), 'Replace']));

    const accepted = page.waitForResponse((r) => /\/measurement-photos\/[0-9a-f-]+\/accept$/.test(r.url()));
    await pending.first().getByRole('button', { name: /^Accept the customer's photo/ }).click();
    expect((await accepted).status()).toBe(200);
    await general.getByTestId('photo-thumb').filter({ hasText: 'From the customer' }).nth(1).waitFor({ state: 'detached' });

    const replaced = page.waitForResponse((r) => r.url().endsWith('/measurement-sheet/photos') && r.request().method() === 'POST');
    await pending
      .first()
      .getByLabel(/^Replace the customer's photo/)
      .setInputFiles({ name: 'engine-bay-from-the-lift.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page, { shade: '#5b6670' }) });
    const response = await replaced;
    expect(response.status()).toBe(201);
    expect(((await response.json()) as Array<{ status: string }>)[0].status).toBe('accepted');
    // the customer's photo is gone, the replacement and the accepted one stay, nothing waits any more
    await pending.first().waitFor({ state: 'detached' });
    await expectText(general, /Uploaded/);
    expect(await general.getByTestId('photo-thumb').count()).toBe(2);

    await page.reload();
    await general.getByTestId('photo-thumb').nth(1).waitFor();
    expect(await general.getByTestId('photo-thumb').count()).toBe(2);
    expect(await general.getByText('From the customer').count()).toBe(0);
  });
});
