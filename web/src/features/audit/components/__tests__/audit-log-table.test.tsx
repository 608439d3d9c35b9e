import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { pageOf } from '@/test/fixtures';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { AuditEvent } from '../../types';
import { AuditLogTable } from '../audit-log-table';

describe('AuditLogTable', () => {
  it('says what lands in an empty log, and names the kind when one is picked', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([], 1, 20, 0) });
    renderWithApp(<AuditLogTable />);
    expect(await screen.findByText(/Nothing recorded yet\. Sending or answering a quote/)).toBeInTheDocument();
    // antd's own empty text (its picture keeps "No data" as an SVG title)
    expect(screen.queryByText('No data', { selector: 'div' })).toBeNull();

    await userEvent.click(screen.getByText('Stock'));
    expect(await screen.findByText('No stock changes recorded yet.')).toBeInTheDocument();
  });

  const entry: AuditEvent = {
    id: 'ev-1',
    createdAt: '2026-12-01T15:30:00.000Z',
    actorUserId: null,
    actorName: 'Quote acceptance',
    kind: 'stock',
    action: 'counter.matched-to-quote',
    subjectId: 'plan-1',
    summary: 'Counter list matched to the accepted quote Q-0006: SW-90 +1.',
    before: { lines: ['SW-90 ×1 (Not set aside)'] },
    after: { changes: ['SW-90 +1'] },
  };

  it('on a phone shows each entry as one stacked cell (kind, when, who, what, before and after), no column to scroll to', async () => {
    setWindowWidth(390);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([entry], 1, 20, 1) });
    renderWithApp(<AuditLogTable />);
    const cell = await screen.findByTestId('audit-entry');
    expect(cell).toHaveTextContent('Stock');
    expect(cell).toHaveTextContent('Quote acceptance');
    expect(cell).toHaveTextContent('Counter list matched to the accepted quote Q-0006: SW-90 +1.');
    expect(within(cell).getByText(/Lines: SW-90 ×1 \(Not set aside\) → Changes: SW-90 \+1/)).toBeInTheDocument();
    expect(screen.getAllByRole('columnheader').map((header) => header.textContent)).toEqual(['Change']);
  });

  it('on a wide screen keeps a column for when, who, kind, what and the change', async () => {
    setWindowWidth(1440);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([entry], 1, 20, 1) });
    renderWithApp(<AuditLogTable />);
    await screen.findByText('Counter list matched to the accepted quote Q-0006: SW-90 +1.');
    expect(screen.getAllByRole('columnheader').map((header) => header.textContent)).toEqual(['When', 'Who', 'Kind', 'What', 'Before → after']);
  });
});
