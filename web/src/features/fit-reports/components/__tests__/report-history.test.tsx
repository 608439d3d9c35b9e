import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { FitReportComparison, FitReportListItem } from '../../types';
import { ReportHistory } from '../report-history';

afterEach(() => vi.restoreAllMocks());

const summary = (id: string, createdAt: string, createdByName: string | null): FitReportListItem => ({
  id,
  projectId: 'p1',
  createdAt,
  createdById: createdByName ? 'u1' : null,
  createdByName,
  engineVersion: '1.0.0',
  placement: { setbackMm: 660, heightMm: 500, tiltDeg: 3 },
  placementSource: 'project',
  counts: { total: 3, ok: 2, tight: 0, fails: 1, unknown: 0 },
  worstStatus: 'fails',
  caution: 'A planning aid.',
});

const page = { items: [summary('r2', '2026-11-03T10:00:00.000Z', 'Sam Reyes'), summary('r1', '2026-11-02T10:00:00.000Z', null)], total: 2, page: 1, pageSize: 50 };

function wideScreen() {
  vi.spyOn(window, 'matchMedia').mockImplementation(
    (query: string) =>
      ({ matches: true, media: query, onchange: null, addListener: () => undefined, removeListener: () => undefined, addEventListener: () => undefined, removeEventListener: () => undefined, dispatchEvent: () => false }) as MediaQueryList,
  );
}

describe('ReportHistory', () => {
  it('shows who ran each report when the list names them', async () => {
    wideScreen();
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: page });
    renderWithApp(<ReportHistory projectId="p1" onOpen={vi.fn()} />);
    const table = await screen.findByRole('table');
    await within(table).findByText('Sam Reyes');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(within(rows[0]).getByText('Sam Reyes')).toBeInTheDocument();
    expect(within(rows[1]).queryByText('Sam Reyes')).toBeNull();
    expect(within(rows[1]).getAllByText('—').length).toBeGreaterThan(0);
    expect(within(rows[0]).getByText(/Nov 3, 2026/)).toBeInTheDocument();
    expect(within(rows[0]).getByText('1 blocked')).toBeInTheDocument();
  });

  it('asks the server to compare the two picked reports, older first', { timeout: 60_000 }, async () => {
    wideScreen();
    const comparison: FitReportComparison = {
      a: page.items[1],
      b: page.items[0],
      changes: [
        { checkId: 'envelope.sump-crossmember', title: 'Oil pan vs front crossmember', before: { status: 'fails', measured: -96, margin: -108.7 }, after: { status: 'ok', measured: 20, margin: 7.3 }, change: 'improved', statusChanged: true, marginDelta: 116 },
        { checkId: 'envelope.hood', title: 'Hood clearance', before: { status: 'ok', measured: 40, margin: 27.3 }, after: { status: 'ok', measured: 40, margin: 27.3 }, change: 'same', statusChanged: false, marginDelta: 0 },
      ],
    };
    const get = vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/fit-reports/compare' ? comparison : page }));
    renderWithApp(<ReportHistory projectId="p1" onOpen={vi.fn()} />);
    await screen.findByText('Sam Reyes');
    for (const box of screen.getAllByRole('checkbox')) fireEvent.click(box);
    fireEvent.click(screen.getByRole('button', { name: 'Compare the two picked' }));
    const result = await screen.findByTestId('report-comparison');
    await waitFor(() => expect(result.textContent).toContain('1 of 2 checks changed between the two reports.'));
    expect(within(result).getByText('Oil pan vs front crossmember')).toBeInTheDocument();
    expect(within(result).getByText('Better')).toBeInTheDocument();
    const call = get.mock.calls.find((c) => c[0] === '/fit-reports/compare');
    expect(call?.[1]).toMatchObject({ params: { a: 'r1', b: 'r2' } });
  });

  it('offers no picking or comparing until there are two reports to compare', async () => {
    wideScreen();
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: { ...page, items: [page.items[0]], total: 1 } });
    renderWithApp(<ReportHistory projectId="p1" onOpen={vi.fn()} />);
    await screen.findByText('Sam Reyes');
    expect(screen.queryByRole('checkbox')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Compare the two picked' })).toBeNull();
  });
});
