import { runFitCheck } from '../fit-report/fit-report';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { renderText, textParts } from '../units/unit-format';
import { ATTRIBUTE_WORDS, attributeNoun, describeAttribute, describeAttributeList } from './attribute-words';
import { fitSpecAttributes } from './part-attributes';
import { describeRemedyNeed } from './plan-model';

describe('attribute words', () => {
  it('says an attribute the way a shop says it', () => {
    expect(describeAttribute('sumpPosition', 'rear')).toBe('sump at the rear');
    expect(describeAttribute('sumpPosition', 'center')).toBe('sump in the center');
    expect(describeAttribute('pickupMount', 'pump-bolted')).toBe('pickup bolted to the pump');
    expect(describeAttribute('minRatedKw', 120)).toBe('rated at least 120 kW');
    expect(describeAttribute('location', 'block-left')).toBe('dipstick on the left side of the block');
    expect(describeAttribute('dipstickProvision', ['pan-left', 'pan-right'])).toBe('room for a dipstick on the left side of the pan or right side of the pan');
    expect(describeAttribute('crankSignal', '60-2')).toBe('reads a 60-2 crank signal');
    expect(describeAttribute('type', 'electronic')).toBe('for an electronic throttle');
    expect(describeAttribute('electricFan', true)).toBe('with an electric fan');
    expect(attributeNoun('pickupMount')).toBe('pickup mounting');
  });

  it('writes figures with the engine formatters, millimetres with inches after them', () => {
    // Source: NIST SP 811 (2008) B.8, 1 in = 25.4 mm exactly: 1214 mm = 47.795… in
    expect(describeAttribute('minLengthMm', 1214)).toBe('length at least 1214.0 mm (47.80 in)');
    expect(describeAttribute('minFlowLph', 140)).toBe('flow at least 140 L/h');
    expect(describeAttribute('minFlowLbh', 31.25)).toBe('flow at least 31.3 lb/h');
    expect(describeAttribute('minPressurePsi', 58)).toBe('rated for at least 58 psi');
    expect(describeAttribute('advanceDeg', 4)).toBe('4.00° advance');
  });

  it('reads in either unit system through the one rendering path', () => {
    const need = describeAttributeList([
      ['minFlowLph', 140],
      ['minPressurePsi', 58],
      ['minRatedKw', 120],
      ['minLengthMm', 1214],
    ]);
    // Source: NIST Handbook 44 Appendix C: 1 US gal = 3.785411784 L; 1 psi = 6.894757 kPa; 1 hp = 0.74569987 kW
    expect(renderText(textParts(need), 'in')).toBe('flow at least 37 gal/h, rated for at least 58 psi, rated at least 161 hp, length at least 47.80 in');
    expect(renderText(textParts(need), 'mm')).toBe('flow at least 140 L/h, rated for at least 400 kPa, rated at least 120 kW, length at least 1214.0 mm');
  });

  it('words a key it does not know yet as words, not as the key', () => {
    expect(describeAttribute('someNewKey', 'x')).toBe('some new key x');
    expect(attributeNoun('someNewKey')).toBe('some new key');
  });

  it('knows every requirement the fit checks ask of a part and every attribute a fit spec gives a part', () => {
    const reports = [runFitCheck(DEMO_FIT_SPEC), runFitCheck({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN })];
    const requirementKeys = reports.flatMap((r) => r.findings.flatMap((f) => f.remedies.flatMap((remedy) => (remedy.kind === 'part' ? Object.keys(remedy.requires) : []))));
    expect(requirementKeys.length).toBeGreaterThan(5);
    const candidates = DEMO_FIT_SPEC.candidates!;
    const specs: Array<[Parameters<typeof fitSpecAttributes>[0], unknown]> = [
      ['oil-pans', DEMO_FIT_SPEC.oilPan],
      ['oil-pickups', DEMO_FIT_SPEC.oilPickup],
      ['oil-pumps', DEMO_FIT_SPEC.oilPump],
      ['controllers', DEMO_FIT_SPEC.controller],
      ['mount-adapters', candidates.mountAdapters![0]],
    ];
    const attributeKeys = specs.flatMap(([kind, spec]) => Object.keys(fitSpecAttributes(kind, spec)));
    expect([...new Set([...requirementKeys, ...attributeKeys])].filter((key) => !ATTRIBUTE_WORDS[key])).toEqual([]);
  });

  it("a remedy's need reads as the part kind and its attributes", () => {
    expect(describeRemedyNeed({ kind: 'part', category: 'radiator', requires: { inletSide: 'left', outletSide: 'right', minRatedKw: 120 }, partIds: [], note: '' })).toBe(
      'Radiator: inlet on the left, outlet on the right, rated at least 120 kW',
    );
    expect(describeRemedyNeed({ kind: 'part', category: 'throttle-pedal', requires: {}, partIds: [], note: '' })).toBe('Throttle pedal');
  });
});
