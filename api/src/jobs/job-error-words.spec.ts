import { describeJobError } from './job-error-words';

describe('describeJobError', () => {
  it('names an unreachable mail server, not the socket error', () => {
    // Source: Node.js documentation, "Common system errors" (ECONNREFUSED, ETIMEDOUT, ENOTFOUND).
    for (const raw of ['connect ECONNREFUSED 127.0.0.1:2535', 'getaddrinfo ENOTFOUND mail.ironbark.test', 'Connection timeout']) {
      const words = describeJobError('mail', raw);
      expect(words).toMatch(/^The mail server could not be reached\./);
      expect(words).not.toContain('ECONN');
    }
    expect(describeJobError('payment.event', 'connect ECONNREFUSED 127.0.0.1:3317')).toMatch(/could not be reached/);
  });

  it('tells a refused address from a refused sign-in and a request to come back later', () => {
    // Source: RFC 5321 §4.2.2–4.2.3 (550/553 mailbox unavailable or not allowed; 4yz transient), RFC 4954 §6 (535 authentication failed).
    expect(describeJobError('quote.mail', "Can't send mail - all recipients were rejected: 550 5.1.1 <nobody@customer.test>: Recipient address rejected")).toMatch(
      /refused the address/,
    );
    expect(describeJobError('mail', 'Invalid login: 535 5.7.8 Authentication credentials invalid')).toMatch(/refused our sign-in/);
    expect(describeJobError('mail', "Can't send mail - all recipients were rejected: 451 4.7.1 Greylisted, try again later")).toMatch(/come back later/);
  });

  it('says what to change for a quote mail that cannot be built', () => {
    expect(describeJobError('quote.mail', 'the customer of this quote has no e-mail address any more')).toBe(
      "The customer has no e-mail address. Add one on the customer's page, then try again.",
    );
    expect(describeJobError('quote.mail', 'That quote does not exist in your shop.')).toMatch(/send it again from there/);
  });

  it('explains a worker lost on the last attempt, and keeps an unknown reason in one readable line', () => {
    expect(describeJobError('payment.event', 'the worker stopped during attempt 8 of 8 (its process ended)')).toMatch(/^The server stopped .* the payment event/);
    expect(describeJobError('mail', 'the relay refused the message (test)\n')).toBe(
      'The last attempt failed: the relay refused the message (test). Fix what it names, then try again.',
    );
    expect(describeJobError('mail', '   ')).toMatch(/no reason was given/);
  });
});
