/** Reads the local mail fake's own HTTP endpoint (MAIL_FAKE_URL, written by scripts/stack.sh). */
export interface CapturedMail {
  to: string[];
  subject: string;
  text: string;
}

export async function mailsTo(email: string): Promise<CapturedMail[]> {
  const response = await fetch(process.env.MAIL_FAKE_URL!);
  const mails = (await response.json()) as CapturedMail[];
  return mails.filter((mail) => mail.to.includes(email));
}

export function resetTokenFrom(mail: CapturedMail): string {
  const match = /reset-password\?token=([A-Za-z0-9_%-]+)/.exec(mail.text);
  if (!match) throw new Error(`no reset link in: ${mail.text}`);
  return decodeURIComponent(match[1]);
}

/** The token of the newest "finish creating your shop" link mailed to `email`. */
export async function signUpTokenFor(email: string): Promise<string> {
  const mail = (await mailsTo(email.toLowerCase())).find((m) => /Finish creating your Swapwright shop/.test(m.subject));
  const match = mail && /sign-up\?token=([A-Za-z0-9_%-]+)/.exec(mail.text);
  if (!match) throw new Error(`no sign-up link mailed to ${email}`);
  return decodeURIComponent(match[1]);
}
