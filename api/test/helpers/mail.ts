/** Reads the local mail fake's own HTTP endpoint (MAIL_FAKE_URL, written by scripts/stack.sh). */
export interface CapturedMail {
  to: string[];
  subject: string;
  text: string;
}

/** The captured mail to `email`, newest first, as it is now. */
export async function mailsNowTo(email: string): Promise<CapturedMail[]> {
  const response = await fetch(process.env.MAIL_FAKE_URL!);
  const mails = (await response.json()) as CapturedMail[];
  return mails.filter((mail) => mail.to.includes(email));
}

/** The captured mail to `email`, newest first, waiting up to 5 s for the first (the background worker sends it). */
export async function mailsTo(email: string): Promise<CapturedMail[]> {
  for (let attempt = 0; ; attempt++) {
    const mails = await mailsNowTo(email);
    if (mails.length > 0 || attempt >= 50) return mails;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

export function resetTokenFrom(mail: CapturedMail): string {
  const match = /reset-password\?token=([A-Za-z0-9_%-]+)/.exec(mail.text);
  if (!match) throw new Error(`no reset link in: ${mail.text}`);
  return decodeURIComponent(match[1]);
}

/** The token of the newest "finish creating your shop" link mailed to `email`. */
export async function signUpTokenFor(email: string): Promise<string> {
  let mail: CapturedMail | undefined;
  for (let attempt = 0; attempt < 50 && !mail; attempt++) {
    mail = (await mailsNowTo(email.toLowerCase())).find((m) => /Finish creating your Swapwright shop/.test(m.subject));
    if (!mail) await new Promise((resolve) => setTimeout(resolve, 100));
  }
  const match = mail && /sign-up\?token=([A-Za-z0-9_%-]+)/.exec(mail.text);
  if (!match) throw new Error(`no sign-up link mailed to ${email}`);
  return decodeURIComponent(match[1]);
}
