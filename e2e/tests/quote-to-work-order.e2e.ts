import { join } from 'node:path';
import { ARTIFACTS_DIR, openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { makeJpeg } from './support/images';
import { expectFitsWidth, expectText, expectVisible, waitForPicture } from './support/expect-page';
import { demoSignIn, signInAs } from './support/session';

const DEMO_PROJECT = 'Harlan Ridgeback 1978: Kestrel 5.3 V8 swap';

interface CapturedMail {
  to: string[];
  subject: string;
  text: string;
}

async function capturedMails(page: BrowserSession['page']): Promise<CapturedMail[]> {
  // The local mail fake's own endpoint (scripts/stack.sh exports MAIL_FAKE_URL).
  if (!process.env.MAIL_FAKE_URL) throw new Error('MAIL_FAKE_URL is not set: source .local/test/env.sh first.');
  return (await (await page.request.get(process.env.MAIL_FAKE_URL)).json()) as CapturedMail[];
}

interface DraftLine {
  key: string;
  kind: 'part' | 'labor';
  description: string;
  quantity: number;
}

const moneyText = (cents: number) => (cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** On the quote page: edits a part line's quantity and waits for the total the API priced to show. */
async function changeQuantity(page: BrowserSession['page'], line: DraftLine, quantity: number): Promise<void> {
  const total = page.getByTestId('quote-total');
  await expectVisible(total);
  const before = await total.innerText();
  await page.getByTestId(`quote-line-${line.key}`).getByRole('button', { name: `Edit ${line.description}` }).click();
  const form = page.getByRole('form', { name: 'Edit parts line' });
  await form.getByRole('spinbutton', { name: 'Quantity' }).fill(String(quantity));
  const saved = page.waitForResponse((r) => /\/quotes\/[^/]+$/.test(r.url()) && r.request().method() === 'PATCH');
  await page.getByRole('button', { name: 'Save line' }).click();
  const answer = await saved;
  expect(answer.status()).toBe(200);
  const quote = (await answer.json()) as { revision: { lines: DraftLine[]; totals: { totalCents: number } } };
  expect(quote.revision.lines.find((candidate) => candidate.key === line.key)?.quantity).toBe(quantity);
  await expectText(total, new RegExp(moneyText(quote.revision.totals.totalCents).replace(/[.,]/g, '\\$&')));
  expect(await total.innerText()).not.toBe(before);
  await expectVisible(page.getByTestId(`quote-line-${line.key}`).getByRole('cell', { name: String(quantity), exact: true }));
}

describe('from the quote to the work order: estimator, customer, fabricator', () => {
  let estimator: BrowserSession;
  let quoteLabel: string;
  let workOrderPath: string;

  beforeAll(async () => {
    estimator = await openBrowser();
    await signInAs(estimator.page, 'estimator');
  });

  afterAll(async () => {
    await estimator.close();
  });

  it('the estimator plans the parts, drafts the quote from the plan and sends it', async () => {
    const { page } = estimator;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    // the projects list, not the home page's panels (which also link the project) that may still be on screen
    await page.getByRole('table', { name: 'Projects' }).getByRole('link', { name: DEMO_PROJECT }).click();
    // The plan needs a stored fit report first.
    await page.getByRole('button', { name: 'Fit check' }).click();
    const ran = page.waitForResponse((r) => /\/fit-reports$/.test(r.url()) && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Run fit check' }).click();
    expect((await ran).status()).toBe(201);
    await page.goBack();
    const plan = page.getByTestId('parts-plan-card');
    const built = page.waitForResponse((r) => /\/parts-plans$/.test(r.url()) && r.request().method() === 'POST');
    await plan.getByRole('button', { name: 'Build plan' }).click();
    expect((await built).status()).toBe(201);
    const drafted = page.waitForResponse((r) => /\/quotes$/.test(r.url()) && r.request().method() === 'POST');
    await page.getByRole('button', { name: 'Draft a quote' }).click();
    const draft = await (await drafted).json();
    quoteLabel = draft.label;
    expect(draft.revision.partsPlanVersion).not.toBeNull();
    const item = page.getByTestId(`quote-${quoteLabel}`);

    // On the draft, the estimator changes a part line's quantity: the API prices it again and the page shows its total.
    const part = (draft.revision.lines as DraftLine[]).find((line) => line.kind === 'part');
    expect(part).toBeDefined();
    await item.getByRole('link', { name: 'Edit lines' }).click();
    await changeQuantity(page, part!, part!.quantity + 1);
    await page.getByRole('button', { name: 'Back to the project' }).click();

    await item.getByRole('button', { name: 'Send to customer' }).click();
    // Sending e-mails the customer: it asks first, naming where the e-mail goes, the total and the deposit.
    const sendConfirm = page.locator('.ant-popconfirm').filter({ hasText: `Send revision 1 of ${quoteLabel} to` });
    await sendConfirm.waitFor({ state: 'visible' });
    await expectText(sendConfirm, /It is e-mailed to .+ \(\S+@\S+\) with the PDF: total \$[\d,]+\.\d\d, deposit on approval \$[\d,]+\.\d\d\./);
    await saveScreenshot(page, 'estimator-quote-send-confirm');
    await sendConfirm.getByRole('button', { name: 'Send', exact: true }).click();
    await expectText(item, /Awaiting the customer/);
    await expectText(page.locator('[aria-label="Project stage"]'), /Quote sent/);
    await saveScreenshot(page, 'estimator-quote-sent');

    // Revision 1 is frozen once sent: the estimator starts revision 2, changes the quantity again, compares and sends it.
    await item.getByRole('link', { name: 'Open quote' }).click();
    await expectText(page.getByTestId('quote-revision'), /Revision 1 \(sent, frozen\)/);
    await page.getByRole('button', { name: 'Start revision 2' }).click();
    await expectText(page.getByTestId('quote-revision'), /Revision 2 \(being written\)/);
    await changeQuantity(page, part!, part!.quantity + 2);
    const compare = page.getByTestId('revision-compare');
    const changed = compare.getByRole('table', { name: 'Lines changed' }).getByRole('row').filter({ hasText: part!.description });
    await expectText(changed, new RegExp(`Changed[\\s\\S]*${part!.quantity + 1} → ${part!.quantity + 2}`));
    await expectVisible(compare.getByRole('table', { name: 'Totals changed' }).getByRole('row', { name: /^Total / }));
    await page.setViewportSize({ width: 1440, height: 900 });
    await saveScreenshot(page, 'estimator-quote-revision-compare');
    await page.setViewportSize({ width: 1366, height: 900 });
    const resent = page.waitForResponse((r) => /\/quotes\/[^/]+\/send$/.test(r.url()));
    await page.getByRole('button', { name: 'Send revision 2 to the customer' }).click();
    const resendConfirm = page.locator('.ant-popconfirm').filter({ hasText: `Send revision 2 of ${quoteLabel} to` });
    await resendConfirm.waitFor({ state: 'visible' });
    await resendConfirm.getByRole('button', { name: 'Send', exact: true }).click();
    expect((await resent).status()).toBe(200);
    await expectText(page.getByTestId('quote-revision'), /Revision 2 \(sent, frozen\)/);
    await page.getByRole('button', { name: 'Back to the project' }).click();

    // The customer, signed in, opens the quote from their project and accepts it after a confirmation.
    const signedIn = await openBrowser();
    try {
      const { page: mine } = signedIn;
      await signInAs(mine, 'customer');
      await mine.setViewportSize({ width: 390, height: 844 });
      await mine.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
      const row = mine.getByTestId(`quote-${quoteLabel}`);
      await row.scrollIntoViewIfNeeded();
      await expectFitsWidth(mine);
      await row.screenshot({ path: join(ARTIFACTS_DIR, 'screenshots', 'customer-project-quote-row-phone.png') });
      await row.getByRole('button', { name: 'Read and answer' }).click();
      await expectText(mine.getByRole('heading', { level: 2 }), /Your quote/);
      await expectVisible(mine.getByText(`Quote ${quoteLabel} · revision 2`));
      await expectVisible(mine.getByTestId('quote-total'));
      await expectText(mine.getByTestId('answer-money'), /Nothing is charged when you accept/);
      await expectFitsWidth(mine);
      await saveScreenshot(mine, 'customer-signed-in-quote-phone');
      await mine.setViewportSize({ width: 1440, height: 900 });
      await mine.getByRole('button', { name: 'Accept this quote' }).click();
      const confirm = mine.locator('.ant-popconfirm').filter({ hasText: `Accept quote ${quoteLabel}` });
      await confirm.waitFor({ state: 'visible' });
      await mine.screenshot({ path: join(ARTIFACTS_DIR, 'screenshots', 'customer-signed-in-quote-confirm.png') });
      const answered = mine.waitForResponse((r) => /\/quotes\/[^/]+\/answer$/.test(r.url()));
      await confirm.getByRole('button', { name: 'Accept', exact: true }).click();
      expect((await answered).status()).toBe(200);
      await expectVisible(mine.getByLabel('Card number (local test payment service)'));
      await saveScreenshot(mine, 'customer-signed-in-quote-accepted');
      // back on the project, the quote now waits for the deposit
      await mine.getByRole('button', { name: 'Back to the project' }).click();
      await expectVisible(mine.getByTestId(`quote-${quoteLabel}`).getByRole('button', { name: 'Pay the deposit' }));
      // a quote id that is not theirs: the not-found state, nothing of any quote
      await mine.goto('/quotes/00000000-0000-4000-8000-000000000000');
      await expectVisible(mine.getByText('Not found in this shop'));
      expect(await mine.getByTestId('quote-total').count()).toBe(0);
      await saveScreenshot(mine, 'customer-quote-not-found');
    } finally {
      await signedIn.close();
    }

    // The same quote through the link in the e-mail: it reads as accepted, and the deposit is paid there on the local payment fake.
    let mail: CapturedMail | undefined;
    for (let attempt = 0; attempt < 50 && !mail; attempt++) {
      // the newest revision's mail: the link in the first one is superseded by revision 2
      mail = (await capturedMails(page)).find((m) => m.to.includes(demoSignIn('customer').email) && m.subject.includes(quoteLabel) && m.text.includes('(revision 2)'));
      if (!mail) await page.waitForTimeout(200);
    }
    expect(mail).toBeDefined();
    const link = /https?:\/\/\S+\/quote-answer\/[A-Za-z0-9_\-.]+/.exec(mail!.text)?.[0];
    expect(link).toBeDefined();
    const customer = await openBrowser();
    try {
      const answerPage = customer.page;
      await answerPage.goto(new URL(link!).pathname);
      await expectVisible(answerPage.getByTestId('quote-total'));
      expect(await answerPage.getByRole('button', { name: 'Accept this quote' }).count()).toBe(0);
      await answerPage.getByLabel('Card number (local test payment service)').fill('4242 4242 4242 4242');
      await saveScreenshot(answerPage, 'customer-quote-accepted');
      await answerPage.getByRole('button', { name: 'Pay the deposit' }).click();
      await expectVisible(answerPage.getByText('Deposit paid. Thank you'));
      await saveScreenshot(answerPage, 'customer-deposit-paid');
    } finally {
      await customer.close();
    }
  });

  it('the estimator sees the stage move on and opens the work order', async () => {
    const { page } = estimator;
    await page.reload();
    await expectText(page.locator('[aria-label="Project stage"]'), /Deposit paid/);
    const card = page.getByTestId('project-work-order');
    await card.getByRole('link', { name: /Open work order/ }).click();
    await expectVisible(page.getByRole('list', { name: 'Operations in build order' }));
    await expectText(page.getByTestId('work-order-cautions'), /rated stands|axle stands/);
    // Source: NIST SP 811 (2008), Appendix B.9: 18 lbf·ft ≈ 24.4 N·m.
    await expectText(page.getByTestId('step-oil-pan-pickup').getByTestId('torque-specs'), /18\.0 lbf·ft · 24\.4 N·m/);
    await expectText(page.getByTestId('step-oil-pan-pickup').getByTestId('torque-specs'), /crisscross from the centre out/i);
    workOrderPath = new URL(page.url()).pathname;
    await saveScreenshot(page, 'estimator-work-order');
  });

  it('the fabricator records two checks at the bench on a phone: one in range passes, one outside shows failed', async () => {
    const fabricator = await openBrowser();
    try {
      const { page } = fabricator;
      await signInAs(page, 'fabricator');
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(workOrderPath);
      // Nobody at the counter has set the job's parts aside yet: the sheet says so, and starting asks first, naming them.
      await expectText(page.getByTestId('parts-at-counter'), /Parts: 0 of \d+ counter lines? with the job[\s\S]*waiting:/);
      await page.getByRole('button', { name: 'Start in the bay' }).click();
      const confirm = page.locator('.ant-popconfirm').filter({ hasText: 'Start with parts still waiting?' });
      await confirm.waitFor({ state: 'visible' });
      await expectText(confirm, /Not with the job yet: \d+ × /);
      await saveScreenshot(page, 'fabricator-start-with-parts-waiting-phone');
      await confirm.getByRole('button', { name: 'Start in the bay' }).click();
      await expectText(page.getByRole('heading', { level: 2 }), /In the bay/);

      const tabs = page.getByTestId('check-oil-pan-pickup.pickup-tabs');
      await tabs.getByRole('button', { name: 'Done as described' }).click();
      await expectText(tabs.getByTestId('check-result'), /^Pass$/);
      await expectText(tabs, /Recorded by/);

      // A photo of the tabs from the phone's camera button: it goes up, then shows as a thumbnail on the check.
      const uploaded = page.waitForResponse((r) => /\/checks\/[^/]+\/photos$/.test(r.url()) && r.request().method() === 'POST');
      await tabs.getByLabel('Take or add photos: Pickup bolted at both tabs').setInputFiles({ name: 'pickup-tabs.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page) });
      expect((await uploaded).status()).toBe(201);
      const thumb = tabs.getByTestId('check-photo').getByRole('img');
      await expectVisible(thumb);
      await waitForPicture(thumb);
      expect(await thumb.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBe(320);
      await tabs.scrollIntoViewIfNeeded();
      await tabs.screenshot({ path: join(ARTIFACTS_DIR, 'screenshots', 'fabricator-check-photo-phone.png') });

      // A wrong photo (another bay's truck) goes up by mistake: the fabricator removes it after a confirmation.
      const second = page.waitForResponse((r) => /\/checks\/[^/]+\/photos$/.test(r.url()) && r.request().method() === 'POST');
      await tabs.getByLabel('Take or add photos: Pickup bolted at both tabs').setInputFiles({ name: 'wrong-truck.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(page, { shade: '#b07a52' }) });
      expect((await second).status()).toBe(201);
      const photos = tabs.getByTestId('check-photo');
      await expectVisible(photos.nth(1).getByRole('img'));
      expect(await photos.count()).toBe(2);
      await photos.nth(1).getByRole('button', { name: /^Remove photo/ }).click();
      const confirmRemoval = page.locator('.ant-popconfirm').filter({ hasText: 'Remove this photo?' });
      await confirmRemoval.waitFor({ state: 'visible' });
      await expectFitsWidth(page);
      await saveScreenshot(page, 'fabricator-check-photo-remove-phone');
      const removed = page.waitForResponse((r) => /\/work-order-photos\/[^/]+$/.test(r.url()) && r.request().method() === 'DELETE');
      await confirmRemoval.getByRole('button', { name: 'Remove', exact: true }).click();
      expect((await removed).status()).toBe(204);
      await photos.nth(1).waitFor({ state: 'detached' });
      expect(await photos.count()).toBe(1);
      await expectVisible(thumb);

      // Common practice (no published source): the pickup screen sits 6–10 mm above the sump floor; 14 mm is outside.
      // The demo shop works in inches: the range and the recording read in inches (Source: NIST SP 811, 1 in = 25.4 mm:
      // 6 mm = 0.24 in, 9 mm = 0.35 in, 10 mm = 0.39 in, 14 mm = 0.55 in), and a figure typed in millimetres is read as such.
      const screen = page.getByTestId('check-oil-pan-pickup.screen-height');
      await expectText(screen, /Allowed 0\.24–0\.(35|39) in/);
      await screen.getByRole('textbox', { name: /Value for/ }).fill('14 mm');
      await expectText(screen.getByTestId('check-reading'), /Reads as 0\.55 in \(14 mm\)/);
      await screen.getByRole('button', { name: 'Record value' }).click();
      await expectText(screen.getByTestId('check-result'), /Failed · 0\.55 in/);
      await expectText(page.getByTestId('work-order-progress'), /1 failed/);
      await screen.scrollIntoViewIfNeeded();
      await expectFitsWidth(page);
      await saveScreenshot(page, 'fabricator-work-order-phone');
    } finally {
      await fabricator.close();
    }
  });
});
