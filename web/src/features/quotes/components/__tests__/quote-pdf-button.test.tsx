import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { QuotePdfButton } from '../quote-pdf-button';

describe('QuotePdfButton', () => {
  afterEach(() => vi.restoreAllMocks());

  function stubDownload() {
    const get = vi.spyOn(apiClient, 'get').mockResolvedValue({ data: new Blob(['%PDF-1.3'], { type: 'application/pdf' }) });
    URL.createObjectURL = vi.fn(() => 'blob:quote');
    URL.revokeObjectURL = vi.fn();
    const names: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      names.push(this.download);
    });
    return { get, names };
  }

  it('downloads the revision shown, named after the quote', async () => {
    const { get, names } = stubDownload();
    renderWithApp(<QuotePdfButton quoteId="quote-7" label="Q-0007" revision={2} />);
    await userEvent.click(screen.getByRole('button', { name: 'Download PDF' }));
    await waitFor(() => expect(names).toEqual(['quote-Q-0007-revision-2.pdf']));
    expect(get).toHaveBeenCalledWith('/quotes/quote-7/pdf', { responseType: 'blob', params: { revision: 2 } });
  });

  it("names a builder's own budget as a budget", async () => {
    const { names } = stubDownload();
    renderWithApp(<QuotePdfButton quoteId="quote-8" label="Q-0008" revision={1} forMyself />);
    await userEvent.click(screen.getByRole('button', { name: 'Download PDF' }));
    await waitFor(() => expect(names).toEqual(['budget-Q-0008-revision-1.pdf']));
  });
});
