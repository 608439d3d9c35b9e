import { render, screen } from '@testing-library/react';
import type { NotificationInstance } from 'antd/es/notification/interface';
import { describe, expect, it, vi } from 'vitest';
import { notifySuccess, registerNotifier, withReference } from '../notifier';

describe('error notices', () => {
  it('keep the sentence plain and put the request reference in small print of its own', () => {
    render(<div data-testid="notice">{withReference('Add at least one parts or labor line before sending the quote.', '9c417483-8465-4108-8a34-e9e931411aa6')}</div>);
    const notice = screen.getByTestId('notice');
    expect(notice.firstChild?.textContent).toBe('Add at least one parts or labor line before sending the quote.');
    expect(notice).not.toHaveTextContent('(ref');
    expect(screen.getByTestId('error-reference')).toHaveTextContent('Reference 9c417483-8465-4108-8a34-e9e931411aa6');
  });

  it('without a reference is the sentence alone', () => {
    expect(withReference('The server could not be reached.', undefined)).toBe('The server could not be reached.');
  });
});

describe('success notices', () => {
  it('close on time even under the pointer, so they never keep covering the button just clicked', () => {
    const success = vi.fn();
    registerNotifier({ success } as unknown as NotificationInstance);
    notifySuccess({ title: 'Quote Q-1 sent' });
    registerNotifier(null);
    expect(success).toHaveBeenCalledWith(expect.objectContaining({ title: 'Quote Q-1 sent', duration: 3, pauseOnHover: false }));
  });
});
