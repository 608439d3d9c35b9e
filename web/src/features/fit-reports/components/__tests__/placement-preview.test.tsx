import { type Placement } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useMemo, useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { previewFitCheck } from '../../lib/fit-engine';
import { ShortfallList } from '../shortfall-list';
import { PlacementControls, samePlacement } from '../placement-controls';

const saved = DEMO_FIT_SPEC.placement;

function PreviewHarness() {
  const [placement, setPlacement] = useState<Placement>(saved);
  const report = useMemo(() => previewFitCheck(DEMO_FIT_SPEC, placement), [placement]);
  return (
    <>
      <PlacementControls value={placement} onChange={setPlacement} saved={saved} isPreview={!samePlacement(placement, saved)} />
      <ShortfallList shortfalls={report.shortfalls} />
    </>
  );
}

describe('placement preview', () => {
  it('re-runs the fit engine when the crank height changes and updates the figures', { timeout: 40_000 }, async () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<PreviewHarness />);
    const row = () => screen.getByTestId('shortfall-envelope.sump-crossmember');
    expect(within(row()).getByText('−96.0 mm')).toBeInTheDocument();
    expect(row().getAttribute('data-status')).toBe('fails');
    expect(screen.queryByTestId('preview-badge')).toBeNull();

    const height = screen.getByRole('spinbutton', { name: 'Crank height' });
    fireEvent.change(height, { target: { value: '560' } });

    await waitFor(() => expect(within(row()).getByText('−36.0 mm')).toBeInTheDocument());
    expect(screen.getByTestId('preview-badge').textContent).toBe('Preview, not saved');
  });

  it('takes the height in inches when the person works in inches', { timeout: 40_000 }, async () => {
    renderWithApp(<PreviewHarness />);
    const height = screen.getByRole('spinbutton', { name: 'Crank height' });
    expect((height as HTMLInputElement).value).toBe('19.69');
    fireEvent.change(height, { target: { value: '22.05' } });
    // 22.05 in = 560.07 mm: the pan still overlaps the crossmember by about 1.4 in
    await waitFor(() => expect(within(screen.getByTestId('shortfall-envelope.sump-crossmember')).getByText('−1.41 in')).toBeInTheDocument());
  });
});
