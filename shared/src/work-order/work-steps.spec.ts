import type { Finding } from '../types/finding';
import { buildWorkSteps, OTHER_PARTS_STEP, planResolutions, type WorkOperationInput, type WorkPartInput } from './work-steps';
import { workOrderCautions } from './work-cautions';

const panOperation: WorkOperationInput = {
  id: 'op-pan',
  code: 'oil-pan-pickup',
  name: 'Install swap oil pan, pickup and pump',
  buildOrder: 30,
  hours: 2.5,
  matches: ['oil-pan', 'oil-pickup', 'oil-pump'],
  hazards: ['support'],
  torqueSpecs: [{ fastener: 'Oil pump to rear main cap', lbfFt: 18, sequence: null }],
  checks: [
    { key: 'pickup-tabs', label: 'Pickup bolted at both tabs', unit: null, min: null, max: null },
    { key: 'screen-height', label: 'Screen height above the sump floor', unit: 'mm', min: 6, max: 10 },
  ],
};
const camOperation: WorkOperationInput = {
  id: 'op-cam',
  code: 'cam-timing-set',
  name: 'Install camshaft and timing set',
  buildOrder: 20,
  hours: 3,
  matches: ['cam', 'timing set'],
  hazards: [],
  torqueSpecs: [],
  checks: [{ key: 'cam-marks', label: 'Marks aligned', unit: null, min: null, max: null, fitCheckId: 'cam.timing-advance' }],
};
const pan: WorkPartInput = {
  sku: 'TR-4410',
  description: 'Rear-sump swap pan',
  category: 'oil-pan',
  quantity: 1,
  torqueSpecs: [{ fastener: 'Oil pan bolts (M6)', newtonMetres: 12, sequence: 'Crisscross from the centre out, in two stages' }],
  instructions: 'Fit the pickup before the pan.',
  attributes: {},
};
const pickup: WorkPartInput = { ...pan, sku: 'TR-4411', description: 'Rear-sump pickup', category: 'oil-pickup', instructions: null, torqueSpecs: [], attributes: { 'screen-height.min': 7, 'screen-height.max': 9 } };
const flexplate: WorkPartInput = { ...pan, sku: 'FX-KS', description: 'Flexplate', category: 'flexplate-flywheel', instructions: null, torqueSpecs: [{ fastener: 'Flexplate to crank', newtonMetres: 100 }] };

describe('work order steps', () => {
  const camFinding = { checkId: 'cam.timing-advance', title: 'Cam timing', status: 'ok', message: 'Advance 4° of 4° recommended.' } as Finding;
  const steps = buildWorkSteps([panOperation, camOperation], [pan, pickup, flexplate], [camFinding]);

  it('orders the operations by build order and puts parts no operation installs last', () => {
    expect(steps.map((step) => step.key)).toEqual(['cam-timing-set', 'oil-pan-pickup', OTHER_PARTS_STEP.code]);
    expect(steps[1].parts.map((part) => part.sku)).toEqual(['TR-4410', 'TR-4411']);
    expect(steps[2].parts.map((part) => part.sku)).toEqual(['FX-KS']);
  });

  it('gives every torque in both units with its sequence and the part it comes from', () => {
    // Source: NIST SP 811 (2008), Appendix B.9 (1 lbf·ft = 1.355 817 948 331 4004 N·m): 18 lbf·ft ≈ 24.4 N·m; 12 N·m ≈ 8.9 lbf·ft.
    expect(steps[1].torque).toEqual([
      { joint: null, fastener: 'Oil pump to rear main cap', lbfFt: 18, newtonMetres: 24.4, sequence: null, partSku: null },
      { joint: null, fastener: 'Oil pan bolts (M6)', lbfFt: 8.9, newtonMetres: 12, sequence: 'Crisscross from the centre out, in two stages', partSku: 'TR-4410' },
    ]);
    expect(steps[1].instructions).toEqual(['TR-4410: Fit the pickup before the pan.']);
  });

  it('takes a measured check range from the part installed, and a confirmation has none', () => {
    const [tabs, screen] = steps[1].checks;
    expect(tabs).toMatchObject({ key: 'oil-pan-pickup.pickup-tabs', measured: false, range: null });
    expect(screen).toMatchObject({ key: 'oil-pan-pickup.screen-height', measured: true, min: 7, max: 9, range: '7–9 mm', rangeFrom: 'TR-4411' });
  });

  it('shows the fit check result beside the check that confirms it', () => {
    expect(steps[0].checks[0].fitFinding).toEqual({ checkId: 'cam.timing-advance', title: 'Cam timing', status: 'ok', message: 'Advance 4° of 4° recommended.', resolvedBy: null });
  });

  it('says what in the locked plan resolves a shortfall the check quotes, instead of the bare verdict of the truck as it came', () => {
    // Common practice (no published source): a clearance the plan fixes by a part or a cut is measured again once fitted.
    const gapOperation: WorkOperationInput = {
      ...camOperation,
      id: 'op-fit',
      code: 'engine-remove-install',
      checks: [{ key: 'mount-gap', label: 'Oil pan to crossmember gap', unit: 'mm', min: 12.7, max: null, fitCheckId: 'envelope.sump-crossmember' }],
    };
    const shortfall = { checkId: 'envelope.sump-crossmember', title: 'Oil pan to crossmember', status: 'fails', message: 'The oil pan runs 74.4 mm into the front crossmember.' } as Finding;
    const plan = {
      picks: [{ sku: 'TR-4410', description: 'Rear-sump swap pan', resolves: [{ checkId: 'envelope.sump-crossmember' }] }],
      operations: [
        { operation: 'Notch the crossmember', resolves: [{ checkId: 'envelope.sump-crossmember' }] },
        { operation: 'Shorten the driveshaft', resolves: [{ checkId: 'driveline.length' }] },
      ],
    };
    const resolutions = planResolutions(plan);
    expect(resolutions.get('envelope.sump-crossmember')).toBe('the part TR-4410 Rear-sump swap pan and the operation Notch the crossmember');
    const [built] = buildWorkSteps([gapOperation], [], [shortfall], resolutions);
    expect(built.checks[0].fitFinding).toMatchObject({ status: 'fails', resolvedBy: 'the part TR-4410 Rear-sump swap pan and the operation Notch the crossmember' });
    // Without a plan, or when the plan leaves it unresolved, the finding stands as found.
    expect(buildWorkSteps([gapOperation], [], [shortfall])[0].checks[0].fitFinding?.resolvedBy).toBeNull();
    expect(buildWorkSteps([gapOperation], [], [shortfall], planResolutions(null))[0].checks[0].fitFinding?.resolvedBy).toBeNull();
    // A check that fits needs no resolution, whatever the plan lists.
    const fits = { ...shortfall, status: 'ok' } as Finding;
    expect(buildWorkSteps([gapOperation], [], [fits], resolutions)[0].checks[0].fitFinding?.resolvedBy).toBeNull();
  });

  it('always carries the lifting, support, fuel and welding cautions, each deferring to practice', () => {
    const cautions = workOrderCautions(['support', 'brakes']);
    expect(cautions.map((c) => c.hazard)).toEqual(['lifting', 'support', 'fuel', 'welding', 'brakes']);
  });

  it('gives each joint one figure: a part figure replaces the operation figure, in whichever step the operation lists it', () => {
    const withJoints: WorkOperationInput = {
      ...panOperation,
      torqueSpecs: [
        { joint: 'oil-pump-to-main-cap', fastener: 'Oil pump to rear main cap', lbfFt: 18, sequence: null },
        { joint: 'oil-pan-to-block', fastener: 'Oil pan bolts', lbfFt: 9, sequence: 'Crisscross' },
      ],
    };
    const mounts: WorkOperationInput = { ...camOperation, id: 'op-mount', code: 'mount-adapters', name: 'Fit mount adapters', buildOrder: 40, matches: ['mount-adapter'], checks: [], torqueSpecs: [{ joint: 'mount-adapter-to-block', fastener: 'Mount adapter to block bolts', lbfFt: 40, sequence: null }] };
    const engine: WorkOperationInput = { ...camOperation, id: 'op-engine', code: 'engine-remove-install', name: 'Install the engine', buildOrder: 50, matches: [], checks: [], torqueSpecs: [{ joint: 'engine-mount-through-bolt', fastener: 'Engine mount through-bolts', lbfFt: 55, sequence: null }] };
    const panWithJoint: WorkPartInput = { ...pan, torqueSpecs: [{ joint: 'oil-pan-to-block', fastener: 'Oil pan bolts (M6)', newtonMetres: 12 }] };
    const kit: WorkPartInput = {
      ...pan,
      sku: 'SW-90',
      category: 'mount-adapter',
      instructions: null,
      torqueSpecs: [
        { joint: 'mount-adapter-to-block', fastener: 'Mount kit to block (M10)', newtonMetres: 50.2 },
        { joint: 'engine-mount-through-bolt', fastener: 'Through-bolt (M12)', newtonMetres: 89.5 },
      ],
    };
    const built = buildWorkSteps([withJoints, mounts, engine], [panWithJoint, kit]);
    const all = built.flatMap((step) => step.torque);
    const joints = all.map((spec) => spec.joint);
    expect(new Set(joints).size).toBe(joints.length);
    // Source: NIST SP 811 (2008), Appendix B.9: 12 N·m ≈ 8.9 lbf·ft, 50.2 N·m ≈ 37.0 lbf·ft, 89.5 N·m ≈ 66.0 lbf·ft.
    expect(all.find((spec) => spec.joint === 'oil-pan-to-block')).toMatchObject({ lbfFt: 8.9, partSku: 'TR-4410' });
    expect(all.find((spec) => spec.joint === 'mount-adapter-to-block')).toMatchObject({ lbfFt: 37, partSku: 'SW-90' });
    expect(all.find((spec) => spec.joint === 'engine-mount-through-bolt')).toMatchObject({ lbfFt: 66, partSku: 'SW-90' });
    // A joint no part gives keeps the operation's figure.
    expect(all.find((spec) => spec.joint === 'oil-pump-to-main-cap')).toMatchObject({ lbfFt: 18, partSku: null });
    expect(built.find((step) => step.key === 'engine-remove-install')!.torque).toEqual([]);
  });
});
