import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { EmailAddress, emailBreakParts } from '../email-address';

describe('EmailAddress', () => {
  it('lets an address break only before its @ and before a dot', () => {
    // Source: The Chicago Manual of Style, 17th ed., 7.42: break before a period or an @, never inside a word.
    expect(emailBreakParts('odile.straker@example.test')).toEqual(['odile', '.straker', '@example', '.test']);
    expect(emailBreakParts('customer@ironbark.test')).toEqual(['customer', '@ironbark', '.test']);
    expect(emailBreakParts('plain')).toEqual(['plain']);
  });

  it('is a mailto link that reads as the whole address, with the address in its title and a copy button', () => {
    const { container } = renderWithApp(<EmailAddress email="odile.straker@example.test" />);
    const link = screen.getByRole('link', { name: 'odile.straker@example.test' });
    expect(link).toHaveAttribute('href', 'mailto:odile.straker@example.test');
    expect(link).toHaveAttribute('title', 'odile.straker@example.test');
    expect(link.textContent).toBe('odile.straker@example.test');
    // the break opportunities sit exactly before the @ and the dots
    expect(link.innerHTML).toBe('odile<wbr>.straker<wbr>@example<wbr>.test');
    // never cut anywhere inside a word
    expect(container.innerHTML).not.toMatch(/overflow-wrap: anywhere|word-break: break-all/);
    expect(screen.getByRole('button', { name: /copy/i })).toBeInTheDocument();
  });
});
