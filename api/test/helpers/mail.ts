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
