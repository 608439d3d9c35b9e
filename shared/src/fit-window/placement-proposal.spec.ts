import { ENVELOPE_CHECKS } from '../checks/envelope';
import { U_JOINT_ANGLES_CHECK } from '../checks/drivetrain/u-joint-angles';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { resolveFitSettings } from '../settings/fit-settings';
import type { FitSpec } from '../types/fit-spec';
import { computeFitWindow } from './fit-window';
import { proposePlacement } from './placement-proposal';

const settings = resolveFitSettings();
const checksAt = (spec: FitSpec, placement: FitSpec['placement']) =>
  [...ENVELOPE_CHECKS, U_JOINT_ANGLES_CHECK].map((c) => c.run({ spec: { ...spec, placement }, settings }));
const withPinion = (angleDeg: number): FitSpec => ({
  ...DEMO_FIT_SPEC,
  oilPan: DEMO_REAR_SUMP_PAN,
  chassis: { ...DEMO_FIT_SPEC.chassis, pinion: { ...DEMO_FIT_SPEC.chassis.pinion, angleDeg } },
});

describe('proposePlacement (setback, height and tilt, driveline weighed)', () => {
  it('proposes a placement where the checks themselves pass, and names what bounds it', () => {
    // Source: published driveline-maker guidance (joint angles) and the shop's clearances, run as the checks.
    const rearSump = { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN };
    const proposal = proposePlacement(rearSump)!;
    expect(proposal.allPass).toBe(true);
    for (const finding of checksAt(rearSump, proposal.placement)) {
      expect(finding.status === 'ok' || finding.status === 'tight' || finding.status === 'unknown').toBe(true);
    }
    expect(proposal.boundedBy.length).toBeGreaterThan(0);
    expect(proposal.boundedBy[0].normalizedMargin).toBeCloseTo(proposal.score, 9);
    expect(proposal.tilts.map((t) => t.tiltDeg)).toEqual([-2, -1, 0, 1, 2, 3, 4, 5, 6]);
  }, 60_000);

  it('does not propose a placement whose pan clears but whose U-joints fail', () => {
    // Source: published driveline-maker guidance: front and rear operating angles equal within 1°. With the
    // pinion at 1°, the clearance-only best (tilt 3°) leaves the U-joints failing; another tilt passes both.
    const spec = withPinion(1);
    const clearanceOnly = computeFitWindow(spec, { stepMm: 10 }).best!;
    expect(U_JOINT_ANGLES_CHECK.run({ spec: { ...spec, placement: clearanceOnly.placement }, settings }).status).toBe('fails');
    const proposal = proposePlacement(spec)!;
    expect(proposal.placement.tiltDeg).not.toBe(3);
    expect(proposal.allPass).toBe(true);
    expect(U_JOINT_ANGLES_CHECK.run({ spec: { ...spec, placement: proposal.placement }, settings }).status).not.toBe('fails');
    expect(proposal.margins.some((m) => m.checkId === 'drivetrain.u-joint-angles' && m.unit === 'deg')).toBe(true);
  }, 60_000);

  it('returns null when nothing clears in the searched range', () => {
    // Common practice (no published source): a window that is empty everywhere has no proposal.
    expect(proposePlacement(DEMO_FIT_SPEC, { setbackFromMm: 660, setbackToMm: 660, lowestHeightMm: 0, highestHeightMm: 10 })).toBeNull();
  }, 60_000);

  it('without a pan or a driveline nothing bounds the height: no proposal, rather than an engine on the floor', () => {
    // Derived: the searched range's floor is not a limit of the engine bay (see computeFitWindow).
    const bare: FitSpec = { ...DEMO_FIT_SPEC };
    delete bare.oilPan;
    delete bare.transmission;
    expect(proposePlacement(bare)).toBeNull();
  }, 60_000);

  it('without a pan, the driveline still sets a realistic height: U-joint angles of 1–3°, nearly equal', () => {
    // Source: published driveline-maker guidance: each joint at least 1/2°, at most 3° for vibration-free running,
    // front and rear within 1°.
    const noPan: FitSpec = { ...DEMO_FIT_SPEC };
    delete noPan.oilPan;
    const proposal = proposePlacement(noPan)!;
    expect(proposal.placement.heightMm).toBeGreaterThan(200);
    const uJoint = U_JOINT_ANGLES_CHECK.run({ spec: { ...noPan, placement: proposal.placement }, settings });
    expect(uJoint.status).not.toBe('fails');
    expect(uJoint.measured!).toBeLessThanOrEqual(3);
  }, 60_000);
});
