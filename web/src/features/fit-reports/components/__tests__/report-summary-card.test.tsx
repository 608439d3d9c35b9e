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

  it('with a preview, shows the stored report\'s counts beside the preview\'s and what to do next', () => {
    setWindowWidth(1440);
    renderWithApp(
      <ReportSummaryCard
        stored={stored}
        shown={{ ...report, summary: { ...report.summary, fails: 0, tight: 1 } }}
        isPreview
        previewActions={<button type="button">Save or undo this move</button>}
      />,
    );
    expect(screen.getByText('Preview, not saved')).toBeInTheDocument();
    expect(screen.getByTestId('stored-counts')).toHaveTextContent(/The stored report had/);
    expect(screen.getByRole('button', { name: 'Save or undo this move' })).toBeInTheDocument();
  });

  it('without a preview, shows no stored counts and no preview actions', () => {
    setWindowWidth(1440);
    renderWithApp(<ReportSummaryCard stored={stored} shown={report} isPreview={false} previewActions={<button type="button">Save or undo this move</button>} />);
    expect(screen.queryByTestId('stored-counts')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save or undo this move' })).toBeNull();
  });

  it('writes a figure in a note in the shop\'s units: an engine\'s rated power in hp for a shop in inches', () => {
    setWindowWidth(1440);
    const withPower = storedFitReportStub({ inputs: { ...storedFitReportStub().inputs, notes: ["No target power in the project's goals: used the engine's rated 270 kW."] } });
    renderWithApp(<ReportSummaryCard stored={withPower} shown={withPower.report} isPreview={false} />);
    // Source: NIST SP 811 (2008), Appendix B.9: 1 hp (550 ft·lbf/s) = 745.6999 W, so 270 kW = 362 hp.
    expect(screen.getByText(/used the engine's rated/)).toHaveTextContent("used the engine's rated 362 hp.");
  });
});
