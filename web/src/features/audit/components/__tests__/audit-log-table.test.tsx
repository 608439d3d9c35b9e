import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { pageOf } from '@/test/fixtures';
import { renderWithApp } from '@/test/render';
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
});
