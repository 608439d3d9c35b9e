import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { FitReportComparison, FitReportListItem } from '../../types';
import { ReportHistory } from '../report-history';

afterEach(() => {
  vi.restoreAllMocks();
  window.localStorage.removeItem('swapwright.unitSystem');
});

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

function wideScreen(wide = true) {
  vi.spyOn(window, 'matchMedia').mockImplementation(
    (query: string) =>
      ({ matches: wide, media: query, onchange: null, addListener: () => undefined, removeListener: () => undefined, addEventListener: () => undefined, removeEventListener: () => undefined, dispatchEvent: () => false }) as MediaQueryList,
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
        { checkId: 'envelope.sump-crossmember', title: 'Oil pan vs front crossmember', unit: 'mm', before: { status: 'fails', measured: -96, margin: -108.7 }, after: { status: 'ok', measured: 20, margin: 7.3 }, change: 'improved', statusChanged: true, marginDelta: 116 },
        { checkId: 'envelope.hood', title: 'Hood clearance', unit: 'mm', before: { status: 'ok', measured: 40, margin: 27.3 }, after: { status: 'ok', measured: 40, margin: 27.3 }, change: 'same', statusChanged: false, marginDelta: 0 },
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
    // The result column is responsive: it appears once the table has read the screen's width.
    expect(await within(result).findByText('Better')).toBeInTheDocument();
    const call = get.mock.calls.find((c) => c[0] === '/fit-reports/compare');
    expect(call?.[1]).toMatchObject({ params: { a: 'r1', b: 'r2' } });
  });

  /** Picks both reports, compares them and gives the margin change shown on each check's row, by check id. */
  async function compareAndReadMargins(comparison: FitReportComparison): Promise<Record<string, string>> {
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/fit-reports/compare' ? comparison : page }));
    const view = renderWithApp(<ReportHistory projectId="p1" onOpen={vi.fn()} />);
    await screen.findByText(/Nov 3, 2026/);
    for (const box of screen.getAllByRole('checkbox')) fireEvent.click(box);
    fireEvent.click(screen.getByRole('button', { name: 'Compare the two picked' }));
    const table = await within(await screen.findByTestId('report-comparison')).findByRole('table', { name: 'Changes between the two reports' });
    // antd shows its screen-dependent columns once it has read the screen: read the rows when headers and cells agree.
    const margins = await waitFor(() => {
      const headers = within(table).getAllByRole('columnheader');
      const marginColumn = headers.findIndex((header) => header.textContent === 'Margin change');
      const read: Record<string, string> = {};
      for (const row of within(table).getAllByRole('row').slice(1)) {
        const cells = within(row).getAllByRole('cell');
        expect(cells).toHaveLength(headers.length);
        read[row.getAttribute('data-row-key') ?? ''] = cells[marginColumn].textContent ?? '';
      }
      return read;
    });
    expect(screen.queryByText(/shown in length/)).toBeNull();
    view.unmount();
    return margins;
  }

  // Derived from the published driveline-maker worked example: pinion 1.5° down turns a 1° margin on the U-joint
  // difference into −3.5°, a −4.5° change; the clearance figures are the demo crossmember's (116 mm = 4.57 in).
  const mixedUnits: FitReportComparison = {
    a: page.items[1],
    b: page.items[0],
    changes: [
      { checkId: 'drivetrain.u-joint-angles', title: 'U-joint operating angles', unit: 'deg', before: { status: 'ok', measured: 0, margin: 1 }, after: { status: 'fails', measured: 4.5, margin: -3.5 }, change: 'worse', statusChanged: true, marginDelta: -4.5 },
      { checkId: 'envelope.sump-crossmember', title: 'Oil pan vs front crossmember', unit: 'mm', before: { status: 'fails', measured: -96, margin: -108.7 }, after: { status: 'ok', measured: 20, margin: 7.3 }, change: 'improved', statusChanged: true, marginDelta: 116 },
      { checkId: 'fuel.pump-flow', title: 'Fuel pump flow for the target power', unit: 'L/h', before: { status: 'tight', measured: 150, margin: 5 }, after: { status: 'ok', measured: 190, margin: 45 }, change: 'improved', statusChanged: true, marginDelta: 40 },
      { checkId: 'oiling.pan-pickup-pump', title: 'Oil pan, pickup and pump agree', unit: 'count', before: { status: 'fails', measured: 0, margin: -1 }, after: { status: 'ok', measured: 1, margin: 0 }, change: 'improved', statusChanged: true, marginDelta: null },
    ],
  };

  // An angle stays in degrees in both systems (never a length); a clearance and a flow follow the person's system.
  // Source: NIST SP 811 (1 in = 25.4 mm exactly, 1 US gal = 3.785411784 L): 116 mm = 4.567 in, 40 L/h = 10.57 gal/h.
  it.each([
    { system: 'in', angle: '\u22124.50°', clearance: '+4.57 in', flow: '+10.6 gal/h' },
    { system: 'mm', angle: '\u22124.50°', clearance: '+116.0 mm', flow: '+40.0 L/h' },
  ])('shows each margin change in its own unit, in $system mode', { timeout: 60_000 }, async ({ system, angle, clearance, flow }) => {
    wideScreen();
    window.localStorage.setItem('swapwright.unitSystem', system);
    expect(await compareAndReadMargins(mixedUnits)).toEqual({
      'drivetrain.u-joint-angles': angle,
      'envelope.sump-crossmember': clearance,
      'fuel.pump-flow': flow,
      // A must-match rule has no margin to change (as the report shows none for it).
      'oiling.pan-pickup-pump': '—',
    });
  });

  it('on a phone keeps the margin change in view: statuses and result sit under the check', { timeout: 60_000 }, async () => {
    wideScreen(false);
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const margins = await compareAndReadMargins(mixedUnits);
    expect(margins['drivetrain.u-joint-angles']).toBe('\u22124.50°');
    expect(margins['envelope.sump-crossmember']).toBe('+4.57 in');
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
