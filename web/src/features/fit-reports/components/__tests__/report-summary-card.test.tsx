import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { storedFitReportStub } from '@/test/fixtures';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { StoredFitReport } from '../../types';
import { ReportSummaryCard } from '../report-summary-card';

const stored: StoredFitReport = storedFitReportStub({
  createdAt: '2026-12-03T10:59:00.000Z',
  inputs: { ...storedFitReportStub().inputs, notes: ['22 chassis inputs from the measurement sheet in place of the catalog.'] },
});
const report = stored.report;

describe('ReportSummaryCard', () => {
  it('names the rule set in words a person reads, not as a version tag', () => {
    setWindowWidth(1440);
    renderWithApp(<ReportSummaryCard stored={stored} shown={report} isPreview={false} />);
    expect(screen.getByTestId('report-rule-set')).toHaveTextContent(`Checked with rule set ${report.engineVersion}`);
    expect(document.body.textContent).not.toMatch(/rules v\d/);
  });

  it('on a phone the stored date and the counts sit in the body, where they wrap, never in the clipped card head', () => {
    // The card head's title is one line cut with an ellipsis (antd); with four counts beside it the date was cut.
    setWindowWidth(390);
    renderWithApp(<ReportSummaryCard stored={stored} shown={{ ...report, summary: { ...report.summary, tight: 3, unknown: 11 } }} isPreview={false} />);
    const storedAt = screen.getByTestId('report-stored-at');
    expect(storedAt.textContent).toMatch(/^Stored Dec 3, 2026/);
    expect(storedAt.closest('.ant-card-head')).toBeNull();
    expect(screen.getByText(/need input$/).closest('.ant-card-head')).toBeNull();
  });
});
