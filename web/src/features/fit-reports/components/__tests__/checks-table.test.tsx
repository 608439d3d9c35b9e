import { runFitCheck } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { ChecksTable } from '../checks-table';

const findings = runFitCheck(DEMO_FIT_SPEC).findings;
const passing = findings.filter((f) => f.status === 'ok');
const open = findings.filter((f) => f.status !== 'ok');

describe('ChecksTable', () => {
  it('on a wide screen lists every check, with the limit behind each in customer words', async () => {
    setWindowWidth(1440);
    renderWithApp(<ChecksTable findings={findings} />);
    expect((await screen.findAllByRole('columnheader', { name: 'Limit based on' })).length).toBeGreaterThan(0);
    for (const f of findings) expect(screen.getByTestId(`check-${f.checkId}`)).toBeVisible();
    expect(screen.queryByTestId('passing-checks')).toBeNull();
    // the engine's internal marker never reaches the reader; the honesty about it does
    expect(document.body.textContent).not.toMatch(/common practice|no published source/i);
    const driveshaft = screen.getByTestId('check-drivetrain.driveshaft-length');
    expect(driveshaft).toHaveTextContent('Shop rule of thumb, not a published standard: an inch of spline engagement left at full extension.');
  });

  it('on a phone puts the checks that do not pass first and folds the passing ones behind one section', async () => {
    expect(passing.length).toBeGreaterThan(5);
    expect(open.length).toBeGreaterThan(0);
    setWindowWidth(390);
    renderWithApp(<ChecksTable findings={findings} />);
    const section = await screen.findByTestId('passing-checks');
    const toggle = within(section).getByRole('button', { name: `All ${passing.length} checks that pass` });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    for (const f of open) expect(screen.getByTestId(`check-${f.checkId}`)).toBeVisible();
    // the passing checks are on the page (printing opens the section) but folded away on screen
    for (const f of passing) {
      const row = within(section).getByTestId(`check-${f.checkId}`);
      expect(row.closest('.ant-collapse-panel')).not.toHaveClass('ant-collapse-panel-active');
    }
    const firstOpen = open[0];
    const rows = screen.getAllByTestId(/^check-/);
    expect(rows.findIndex((r) => r.getAttribute('data-status') === 'ok')).toBeGreaterThan(rows.findIndex((r) => r.getAttribute('data-testid') === `check-${firstOpen.checkId}`));
    expect(rows.slice(0, open.length).map((r) => r.getAttribute('data-status'))).not.toContain('ok');

    await userEvent.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(within(section).getByTestId(`check-${passing[0].checkId}`).closest('.ant-collapse-panel')).toHaveClass('ant-collapse-panel-active');
  });
});
