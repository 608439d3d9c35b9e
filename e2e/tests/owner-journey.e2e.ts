import { randomUUID } from 'node:crypto';
import { DEMO_SHOP_ID } from '@swapwright/seed-data';
import { openBrowser, saveScreenshot, type BrowserSession } from './support/browser';
import { withE2eDatabase } from './support/database';
import { expectFitsWidth, expectText, expectVisible } from './support/expect-page';
import { signInAs } from './support/session';

interface CapturedMail {
  to: string[];
  subject: string;
  text: string;
}

describe('the owner sets the shop up and brings in a new estimator', () => {
  let owner: BrowserSession;

  beforeAll(async () => {
    owner = await openBrowser();
    await signInAs(owner.page, 'owner');
  });

  afterAll(async () => {
    await owner.close();
  });

  it('sets the labor rate in shop settings', async () => {
    const { page } = owner;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shop settings' }).click();
    const form = page.getByRole('form', { name: 'Shop settings' });
    await form.waitFor();
    await form.getByRole('spinbutton', { name: 'Labor rate per hour' }).fill('118');
    const saved = page.waitForResponse((r) => r.url().endsWith('/api/shops/current') && r.request().method() === 'PATCH');
    await page.getByRole('button', { name: 'Save settings' }).click();
    expect((await saved).status()).toBe(200);
    await saveScreenshot(page, 'owner-shop-settings');
  });

  it('sets the deposit share on the quote terms, and it is there after a reload', async () => {
    const { page } = owner;
    const terms = page.getByRole('form', { name: 'Quote terms' });
    const deposit = terms.getByRole('spinbutton', { name: 'Deposit' });
    await deposit.waitFor();
    // The form shows its boxes before it fills them with the stored terms: read the share to put back once it is in.
    await page.waitForFunction(() => ((document.querySelector('input[aria-label="Deposit"]') as HTMLInputElement | null)?.value ?? '') !== '');
    const before = await deposit.inputValue();
    const save = async (value: string) => {
      await deposit.fill(value);
      const saved = page.waitForResponse((r) => r.url().endsWith('/api/quote-settings') && r.request().method() === 'PUT');
      await terms.getByRole('button', { name: 'Save quote terms' }).click();
      expect((await saved).status()).toBe(200);
    };
    await save('35');
    await page.reload();
    await deposit.waitFor();
    await page.waitForFunction(() => (document.querySelector('input[aria-label="Deposit"]') as HTMLInputElement | null)?.value === '35.00');
    expect(await deposit.inputValue()).toBe('35.00');
    await saveScreenshot(page, 'owner-quote-terms');
    // other journeys quote with the demo shop's deposit
    await save(before);
  });

  it('invites an estimator, who joins through the e-mailed link', async () => {
    const { page } = owner;
    const email = `new.estimator.${Date.now()}@ironbark.test`;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Members' }).click();
    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('Email').fill(email);
    await form.getByRole('combobox', { name: 'Role' }).click();
    await page.locator('.ant-select-item-option', { hasText: 'Estimator' }).click();
    const sent = page.waitForResponse((r) => r.url().endsWith('/api/invitations') && r.request().method() === 'POST');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    expect((await sent).status()).toBe(201);
    await expectVisible(page.getByRole('table', { name: 'Invitations' }).getByText(email));
    await saveScreenshot(page, 'owner-members');

    // The local mail fake's own endpoint (scripts/stack.sh exports MAIL_FAKE_URL); /api/dev/mail is for owners only.
    if (!process.env.MAIL_FAKE_URL) throw new Error('MAIL_FAKE_URL is not set: source .local/test/env.sh first.');
    // The background worker sends it within moments.
    let invitation: CapturedMail | undefined;
    for (let attempt = 0; attempt < 50 && !invitation; attempt++) {
      const mails = (await (await page.request.get(process.env.MAIL_FAKE_URL)).json()) as CapturedMail[];
      invitation = mails.find((mail) => mail.to.includes(email));
      if (!invitation) await page.waitForTimeout(200);
    }
    expect(invitation).toBeDefined();
    const link = /https?:\/\/\S+accept-invite\?token=[^\s"<>]+/.exec(invitation!.text)?.[0];
    expect(link).toBeDefined();

    const invitee = await openBrowser();
    try {
      await invitee.page.goto(link!);
      const accept = invitee.page.getByRole('form', { name: 'Accept invitation' });
      await accept.getByLabel('Your name').fill('Tamsin Okafor-Reyes');
      await accept.getByLabel('Password', { exact: true }).fill('long-enough-password-1');
      await accept.getByLabel('Repeat password').fill('long-enough-password-1');
      await saveScreenshot(invitee.page, 'accept-invitation');
      await invitee.page.getByRole('button', { name: 'Join the shop' }).click();
      const nav = invitee.page.getByRole('navigation', { name: 'Main' });
      await expectVisible(nav.getByRole('link', { name: 'Customers' }));
      expect(await nav.getByRole('link', { name: 'Members' }).count()).toBe(0);
    } finally {
      await invitee.close();
    }
  });

  it('finds the invitation e-mail done under Background work, and tries a stopped e-mail again until it is sent', async () => {
    const { page } = owner;
    // An e-mail that ran out of attempts while the mail relay was down (its eight attempts take hours; the row is written as they leave it).
    const jobId = randomUUID();
    const to = `parts.desk.${Date.now()}@ironbark.test`;
    await withE2eDatabase((db) =>
      db.query(
        'INSERT INTO `jobs` (`id`, `kind`, `idempotencyKey`, `shopId`, `subject`, `state`, `payload`, `attempts`, `maxAttempts`, `runAt`, `lastError`) ' +
          "VALUES (?, 'mail', ?, ?, ?, 'dead', ?, 8, 8, UTC_TIMESTAMP(3), 'connect ECONNREFUSED 127.0.0.1:2525')",
        [jobId, `e2e-stopped:${jobId}`, DEMO_SHOP_ID, `E-mail to ${to}: “Order list for the week”`, JSON.stringify({ to, subject: 'Order list for the week', text: 'Gaskets, pan bolts, pickup tube.' })],
      ),
    );

    // The home page says so and leads to the stopped work.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Home' }).click();
    const notice = page.getByRole('alert').filter({ hasText: 'stopped after its last attempt' });
    await expectVisible(notice);
    await notice.getByRole('link', { name: 'Background work' }).click();
    await page.waitForURL(/\/settings\/background-work\?state=dead/);
    const list = page.getByRole('list', { name: 'Background work' });
    const row = list.getByTestId('job-row').filter({ hasText: to });
    await expectVisible(row.getByText(/The mail server could not be reached/));
    await expectFitsWidth(page);
    await saveScreenshot(page, 'owner-background-work-stopped');

    const tryAgain = row.getByRole('button', { name: /^Try again/ });
    const confirm = page.locator('.ant-popconfirm').filter({ hasText: /goes back in the queue now with 8 fresh attempts/ });
    await tryAgain.click();
    await confirm.waitFor({ state: 'visible', timeout: 15_000 });
    const retried = page.waitForResponse((r) => r.url().endsWith(`/api/jobs/${jobId}/retry`) && r.request().method() === 'POST');
    await confirm
      .getByRole('button', { name: 'Try again' })
      .click({ timeout: 5_000 })
      .catch(async () => {
        // Once, in a full run on a busy machine, the confirmation closed right after it opened (not seen again in
        // repeated runs); open it again as a person would rather than fail the journey on it.
        await tryAgain.click();
        await confirm.getByRole('button', { name: 'Try again' }).click();
      });
    expect((await retried).status()).toBe(200);
    await expectVisible(page.getByText('Queued again'));

    // The worker sends it a moment later; the list refreshes by itself while work is waiting.
    await page.getByText(/^All$/).click();
    await expectVisible(list.getByTestId('job-row').filter({ hasText: 'invites you to Swapwright' }).first());
    const done = list.getByTestId('job-row').filter({ hasText: to });
    await expectText(done, /Done/);
    await expectText(done, /Attempt 1 of 8/);
    const mails = (await (await page.request.get(process.env.MAIL_FAKE_URL!)).json()) as CapturedMail[];
    expect(mails.filter((mail) => mail.to.includes(to))).toHaveLength(1);
    await saveScreenshot(page, 'owner-background-work');
  });
});
