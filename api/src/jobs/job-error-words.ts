/**
 * Turns the technical reason a job's last attempt failed (as the worker stored it: an error message, never a stack)
 * into a sentence the shop owner can act on. The technical text stays available beside it for whoever runs the server.
 */
interface Rule {
  test: RegExp;
  words: (kind: string) => string;
}

const isMail = (kind: string) => kind === 'mail' || kind === 'quote.mail';
const what = (kind: string) => (kind === 'payment.event' ? 'the payment event' : isMail(kind) ? 'the e-mail' : 'this work');

const RULES: Rule[] = [
  {
    test: /process ended|worker stopped/i,
    words: (kind) =>
      `The server stopped (restarted or crashed) while it was working on ${what(kind)}, on its last attempt. Try again; if it stops again, tell whoever runs the server.`,
  },
  {
    test: /no handler for jobs of kind/i,
    words: () => 'This version of Swapwright cannot do this kind of work. Make sure every server runs the same version, then try again.',
  },
  {
    test: /no e-mail address/i,
    words: () => "The customer has no e-mail address. Add one on the customer's page, then try again.",
  },
  {
    test: /has no sent revision|quote_not_found|quote does not exist/i,
    words: () => 'The quote this e-mail belongs to was changed or removed since. Open the quote and send it again from there instead.',
  },
  {
    test: /ECONNREFUSED|ECONNRESET|ETIMEDOUT|ENOTFOUND|EAI_AGAIN|ESOCKET|ECONNECTION|connection timeout|greeting never received|connection closed/i,
    words: (kind) =>
      isMail(kind)
        ? 'The mail server could not be reached. Check that it is running and that the mail settings (host and port) are right, then try again.'
        : 'A service this work needs could not be reached. Try again in a few minutes; if it keeps failing, tell whoever runs the server.',
  },
  {
    // SMTP 4yz replies are transient: the same message may go through later (RFC 5321 §4.2.1).
    test: /\b4[25]\d[ -]4\.\d|temporar(il)?y|try again later|greylist/i,
    words: () => 'The mail server asked us to come back later (busy or limiting how much we send). Try again in a few minutes.',
  },
  {
    test: /\bEAUTH\b|invalid login|authentication|\b535\b/i,
    words: () => 'The mail server refused our sign-in. Check the mail account settings (SMTP user and password) with whoever runs the server, then try again.',
  },
  {
    test: /rejected:? 55\d|recipient address rejected|\bEENVELOPE\b|\b55[0-3][ -]5\.\d/i,
    words: () => 'The mail server refused the address this e-mail goes to. Check the address (customer or member) for typing errors, correct it, then try again.',
  },
  {
    test: /deadlock|lock wait timeout|ER_|database|too many connections|PROTOCOL_CONNECTION_LOST/i,
    words: () => 'The database was busy or unavailable at the time. Try again; the work is applied at most once.',
  },
];

/** A sentence for the shop owner, from a job's kind and the technical reason its last attempt failed. */
export function describeJobError(kind: string, technical: string): string {
  const rule = RULES.find((candidate) => candidate.test.test(technical));
  if (rule) return rule.words(kind);
  const reason = technical.trim().replace(/\s+/g, ' ').replace(/[.\s]+$/, '');
  return `The last attempt failed: ${reason || 'no reason was given'}. Fix what it names, then try again.`;
}
