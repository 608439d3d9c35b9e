/** Reads the local mail fake (scripts/fakes/mail-fake.ts) the test services run; MAIL_FAKE_URL comes from .local/test/env.sh. */
export interface CapturedMail {
  id: number;
  /** The Message-ID header (every attempt of one background job sends the same one). */
  messageId: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number; contentBase64: string }[];
}

export async function capturedMail(): Promise<CapturedMail[]> {
  const url = process.env.MAIL_FAKE_URL;
  if (!url) throw new Error('MAIL_FAKE_URL is not set: source .local/test/env.sh first');
  const response = await fetch(url);
  return (await response.json()) as CapturedMail[];
}

/** The newest message to `to` whose subject matches, waiting briefly for delivery. */
export async function waitForMail(to: string, subject: RegExp, after = 0): Promise<CapturedMail> {
  for (let attempt = 0; attempt < 50; attempt++) {
    const found = (await capturedMail()).find((mail) => mail.id > after && mail.to.includes(to) && subject.test(mail.subject));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no mail to ${to} matching ${subject}`);
}

export async function lastMailId(): Promise<number> {
  return (await capturedMail())[0]?.id ?? 0;
}
