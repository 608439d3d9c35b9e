import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { ReportHistory } from '../report-history';

afterEach(() => vi.restoreAllMocks());

describe('ReportHistory', () => {
  it('shows who ran each report when the list names them', async () => {
    // a wide screen, so the responsive columns show
    vi.spyOn(window, 'matchMedia').mockImplementation(
      (query: string) =>
        ({ matches: true, media: query, onchange: null, addListener: () => undefined, removeListener: () => undefined, addEventListener: () => undefined, removeEventListener: () => undefined, dispatchEvent: () => false }) as MediaQueryList,
    );
    vi.spyOn(apiClient, 'get').mockResolvedValue({
      data: [
        { id: 'r2', projectId: 'p1', createdAt: '2026-11-03T10:00:00.000Z', createdByName: 'Sam Reyes' },
        { id: 'r1', projectId: 'p1', createdAt: '2026-11-02T10:00:00.000Z' },
      ],
    });
    renderWithApp(<ReportHistory projectId="p1" onOpen={vi.fn()} />);
    const table = await screen.findByRole('table');
    await within(table).findByText('Sam Reyes');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(within(rows[0]).getByText('Sam Reyes')).toBeInTheDocument();
    expect(within(rows[1]).queryByText('Sam Reyes')).toBeNull();
    expect(within(rows[1]).getAllByText('—').length).toBeGreaterThan(0);
    expect(within(rows[0]).getByText(/Nov 3, 2026/)).toBeInTheDocument();
  });
});
