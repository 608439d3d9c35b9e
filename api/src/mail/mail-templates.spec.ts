import { escapeHtml, MailTemplates } from './mail-templates';

describe('mail templates', () => {
  it('escapes the five characters HTML gives meaning to', () => {
    // Source: HTML Living Standard, 13.1.2.6 "Restrictions on the contents of raw text and escapable raw text elements"
    // and the OWASP XSS Prevention Cheat Sheet, rule 1 (& < > " ' encoded in HTML element content).
    expect(escapeHtml(`<b class="x">Tom & 'Jo'</b>`)).toBe('&#60;b class=&#34;x&#34;&#62;Tom &#38; &#39;Jo&#39;&#60;/b&#62;');
  });

  it('puts names into the HTML part escaped and into the text part as typed', () => {
    const mail = MailTemplates.invitation({ inviter: '<script>x</script>', shopName: 'Rust & Bolt', role: 'estimator', link: 'http://app/accept?token=a' });
    expect(mail.html).toContain('&#60;script&#62;x&#60;/script&#62;');
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('<strong>Rust &#38; Bolt</strong>');
    expect(mail.text).toContain('<script>x</script> invites you to join Rust & Bolt on Swapwright as estimator.');
    expect(mail.subject).toBe('Rust & Bolt invites you to Swapwright');
  });
});
