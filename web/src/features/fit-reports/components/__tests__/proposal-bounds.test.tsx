import { proposePlacement } from '@swapwright/shared';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN, DEMO_REAR_SUMP_PICKUP } from '@swapwright/shared/fixtures';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { previewFitCheck } from '../../lib/fit-engine';
import { ProposalBounds } from '../proposal-bounds';

describe('ProposalBounds', () => {
  it('shows the proposed placement and names the check that limits it', { timeout: 60_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    // with the rear-sump pan the demo engine clears the crossmember somewhere in the searched range
    const spec = { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN, oilPickup: DEMO_REAR_SUMP_PICKUP };
    const proposal = proposePlacement(spec);
    expect(proposal).not.toBeNull();
    if (!proposal) return;
    const findings = previewFitCheck(spec, proposal.placement).findings;
    renderWithApp(<ProposalBounds proposal={proposal} findings={findings} />);
    const box = screen.getByTestId('placement-proposal');
    expect(box.textContent).toContain(`tilted ${proposal.placement.tiltDeg.toFixed(1)}°`);
    const first = proposal.boundedBy[0];
    const title = findings.find((f) => f.checkId === first.checkId)?.title ?? first.checkId;
    expect(box.textContent).toContain(title);
  });
});
