import { proposePlacement, type PlacementProposal } from '@swapwright/shared';
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

  it('a negative margin reads as over or short, never as room to spare', () => {
    // Common practice (no published source): a U-joint past its maximum angle is "over" it; a clearance under its
    // minimum is "short by" the amount.
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const proposal: PlacementProposal = {
      placement: { setbackMm: 700, heightMm: 590, tiltDeg: 3 },
      allPass: false,
      score: -8,
      boundedBy: [
        { checkId: 'drivetrain.u-joint-angles', against: 'driveline', margin: -2, unit: 'deg', limit: 'max', status: 'fails', normalizedMargin: -8 },
        { checkId: 'envelope.hood', against: 'hood', margin: -3.048, unit: 'mm', limit: 'min', status: 'fails', normalizedMargin: -0.5 },
        { checkId: 'envelope.ground-clearance', against: 'ground', margin: 12.7, unit: 'mm', limit: 'min', status: 'ok', normalizedMargin: 2 },
      ],
      margins: [],
      tilts: [],
    };
    renderWithApp(<ProposalBounds proposal={proposal} findings={[]} />);
    const items = screen.getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual([
      'drivetrain.u-joint-angles: 2.0° over',
      'envelope.hood: short by 0.12 in',
      'envelope.ground-clearance: 0.50 in to spare',
    ]);
  });

  it('does not claim every clearance passes when some could not be checked', () => {
    // Common practice (no published source): a clearance without its input (no oil pan chosen) is not a pass.
    const noPan = { ...DEMO_FIT_SPEC };
    delete noPan.oilPan;
    const proposal = proposePlacement(noPan)!;
    expect(proposal.allPass).toBe(true);
    const findings = previewFitCheck(noPan, proposal.placement).findings;
    const unknown = findings.filter((f) => f.group === 'envelope' && f.status === 'unknown').length;
    expect(unknown).toBeGreaterThan(0);
    renderWithApp(<ProposalBounds proposal={proposal} findings={findings} />);
    const box = screen.getByTestId('placement-proposal');
    expect(box.textContent).toContain(`with every clearance that could be checked and the U-joint angles passing; ${unknown} clearances need input first`);
    expect(box.textContent).not.toContain('with every clearance and the U-joint angles passing');
  }, 60_000);
});
