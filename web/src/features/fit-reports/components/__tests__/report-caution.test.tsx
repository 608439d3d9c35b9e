import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { ReportCaution } from '../report-caution';

const SAFETY = [
  'Support the vehicle on rated stands on firm ground; never work under a vehicle held only by a jack.',
  'Have frame welding done by a qualified welder.',
];

describe('ReportCaution', () => {
  it('on a desk-sized screen shows the caution and every work-safety note open', () => {
    setWindowWidth(1440);
    renderWithApp(<ReportCaution caution="Measure before you cut." safety={SAFETY} />);
    expect(screen.getByText('Measure before you cut.')).toBeVisible();
    expect(screen.queryByTestId('fit-safety-notes')).toBeNull();
    for (const note of SAFETY) expect(screen.getByText(note)).toBeInTheDocument();
  });

  it('on a phone keeps the caution in view and folds the notes under one line that counts them', () => {
    setWindowWidth(390);
    renderWithApp(<ReportCaution caution="Measure before you cut." safety={SAFETY} />);
    expect(screen.getByText('Measure before you cut.')).toBeVisible();
    const folded = screen.getByTestId('fit-safety-notes');
    expect(folded.tagName).toBe('DETAILS');
    expect(folded).not.toHaveAttribute('open');
    expect(screen.getByText('Work-safety notes for this job (2)')).toBeInTheDocument();
    for (const note of SAFETY) expect(folded).toHaveTextContent(note);
  });

  it('without notes says the planning caution alone, on any screen', () => {
    setWindowWidth(390);
    renderWithApp(<ReportCaution />);
    expect(screen.getByText(/This report is a planning aid/)).toBeVisible();
    expect(screen.queryByTestId('fit-safety-notes')).toBeNull();
  });
});
