import { Typography } from 'antd';
import { Fragment } from 'react';

/**
 * An address cut where a line may break: before the @ and before each dot, so "odile.straker@example.test" wraps as
 * "odile.straker" / "@example.test" and never inside a word.
 * Source: The Chicago Manual of Style, 17th ed., 7.42 (break an e-mail address or URL before a period or an @,
 * never after them and never at a hyphen added by the break).
 */
export function emailBreakParts(email: string): string[] {
  return email.split(/(?=[@.])/);
}

export type EmailAddressProps = {
  email: string;
  /** Smaller, as a second line under a name. */
  small?: boolean;
};

/** An e-mail address as a mailto link that wraps only before its @ or a dot, with the whole address in its title and a copy button. */
export function EmailAddress({ email, small = false }: EmailAddressProps) {
  return (
    <Typography.Text
      copyable={{ text: email, tooltips: ['Copy the address', 'Copied'] }}
      // a part longer than the column (rare) may still break, as a last resort, rather than push the page wider
      style={{ overflowWrap: 'break-word', ...(small ? { fontSize: 13 } : {}) }}
    >
      <a href={`mailto:${email}`} title={email} aria-label={email}>
        {emailBreakParts(email).map((part, i) => (
          <Fragment key={i}>
            {i > 0 && <wbr />}
            {part}
          </Fragment>
        ))}
      </a>
    </Typography.Text>
  );
}
