import { COS3, runCheck } from '../../fixtures/check-test-helpers';
import {
  DEMO_CENTER_SUMP_PAN,
  DEMO_CENTER_SUMP_PICKUP,
  DEMO_DEEP_REAR_SUMP_PAN,
  DEMO_FIT_SPEC,
  DEMO_REAR_SUMP_PAN,
  DEMO_REAR_SUMP_PICKUP,
} from '../../fixtures/demo-fit-spec';
import type { PartRemedy } from '../../types/finding';
import type { FitSpec, OilPanSpec, OilPickupSpec } from '../../types/fit-spec';
import { sharedCheckContext } from '../check-definition';
import { judgeCandidatePans } from '../envelope/pan-clearance';
import { SUMP_CROSSMEMBER_CHECK } from '../envelope/sump-crossmember';
import { resolveFitSettings } from '../../settings/fit-settings';
import { DIPSTICK_CHECK } from './dipstick';
import { PAN_PICKUP_PUMP_CHECK } from './pan-pickup-pump';

/*
 * The demo three-quarter-ton truck: the demo chassis built 70 mm taller (every obstacle 70 mm higher, the ground
 * still at z = 0), its stock placement setback 700, height 590, tilt 3°. Front crossmember x 90–290, top z 355 + 70
 * = 425. Rule (default settings): at least 12.7 mm (1/2 in) between the pan and the crossmember.
 * Common practice (no published source): half an inch under the pan, the engine rocks on its mounts under torque.
 *
 * Derived, by hand, with x = x_e − u·cos θ + w·sin θ, z = z_e + u·sin θ + w·cos θ (docs/fit-spec.md, Frames);
 * cos 3° = 0.998630, sin 3° = 0.052336, tan 3° = 0.052408:
 *
 * Centre-sump pan, sump floor w −240 from u 430 back to u 230:
 *   front corner (430, −240): x = 700 − 429.411 − 12.561 = 258.029, z = 590 + 22.504 − 239.671 = 372.834
 *   rear corner  (230, −240): x = 700 − 229.685 − 12.561 = 457.754, z = 590 + 12.037 − 239.671 = 362.366
 *   The sump starts 32 mm ahead of the crossmember's rear face (x 290), 425 − 372.834 = 52.166 mm below its top,
 *   and its floor falls rearward at tan 3°: at x 290 it is at 372.834 − 31.971 × 0.052408 = 371.158. The engine
 *   would have to rise 425 − 371.158 = 53.842 mm to free it: the pan runs 53.8 mm into the crossmember (gap −53.842).
 *
 * TR-4410 rear-sump pan, shallow floor w −135 from u 560 back to u 330, the sump only behind u 300:
 *   (560, −135): x = 700 − 559.233 − 7.065 = 133.702, z = 590 + 29.308 − 134.815 = 484.493
 *   (330, −135): x = 700 − 329.548 − 7.065 = 363.387, z = 590 + 17.271 − 134.815 = 472.456
 *   Over the crossmember's rear top corner (290, 425) the floor is at 484.493 − 156.298 × 0.052408 = 476.302, 51.302 mm
 *   above it; the perpendicular distance is 51.302 × cos 3° = 51.232 mm ≥ 12.7: it clears (the sump, from x 363,
 *   is 73 mm behind the crossmember).
 *
 * TR-4480 deep rear-sump pan, floor w −190 from u 560 back to u 330:
 *   (560, −190): x = 130.823, z = 429.568; (330, −190): x = 360.508, z = 417.531
 *   At x 290 the floor is at 429.568 − 159.177 × 0.052408 = 421.226, 3.774 mm below the top: 3.8 mm into it.
 */
const LIFT_MM = 70;
const STAG_PLACEMENT = { setbackMm: 700, heightMm: 590, tiltDeg: 3 };
const CENTER_GAP = -(425 - (372.834 - (290 - 258.029) * 0.052408));
const REAR_GAP = (484.493 - (290 - 133.702) * 0.052408 - 425) * COS3;
const DEEP_GAP = 429.568 - (290 - 130.823) * 0.052408 - 425;

function stagSpec(oilPan: OilPanSpec, oilPickup: OilPickupSpec, extraPans: OilPanSpec[] = []): FitSpec {
  return {
    ...DEMO_FIT_SPEC,
    chassis: {
      ...DEMO_FIT_SPEC.chassis,
      obstacles: DEMO_FIT_SPEC.chassis.obstacles.map((o) => ({ ...o, outline: o.outline.map((p) => ({ x: p.x, z: p.z + LIFT_MM })) })),
    },
    placement: STAG_PLACEMENT,
    oilPan,
    oilPickup,
    candidates: {
      ...DEMO_FIT_SPEC.candidates,
      oilPans: [DEMO_CENTER_SUMP_PAN, DEMO_DEEP_REAR_SUMP_PAN, DEMO_REAR_SUMP_PAN, ...extraPans],
      oilPickups: [DEMO_CENTER_SUMP_PICKUP, DEMO_REAR_SUMP_PICKUP],
    },
  };
}

const panRemedy = (remedies: readonly { kind: string }[]) => remedies.find((r): r is PartRemedy => r.kind === 'part' && (r as PartRemedy).category === 'oil-pan')!;

describe('pans offered by the oiling checks keep the clearances below the engine', () => {
  it('the hand-worked gaps are what the crossmember check itself measures', () => {
    expect(CENTER_GAP).toBeCloseTo(-53.842, 2);
    expect(REAR_GAP).toBeCloseTo(51.232, 2);
    expect(DEEP_GAP).toBeCloseTo(-3.774, 2);
    const measured = (pan: OilPanSpec) => runCheck(SUMP_CROSSMEMBER_CHECK, stagSpec(pan, DEMO_REAR_SUMP_PICKUP)).measured!;
    expect(measured(DEMO_CENTER_SUMP_PAN)).toBeCloseTo(CENTER_GAP, 2);
    expect(measured(DEMO_REAR_SUMP_PAN)).toBeCloseTo(REAR_GAP, 2);
    expect(measured(DEMO_DEEP_REAR_SUMP_PAN)).toBeCloseTo(DEEP_GAP, 2);
  });

  it('a centre-sump pickup does not bring in the centre-sump pan that runs 53.8 mm into the crossmember; the note says why', () => {
    const finding = runCheck(PAN_PICKUP_PUMP_CHECK, stagSpec(DEMO_REAR_SUMP_PAN, DEMO_CENTER_SUMP_PICKUP));
    expect(finding.status).toBe('fails');
    const pan = panRemedy(finding.remedies);
    expect(pan.requires).toMatchObject({ sumpPosition: 'center', pickupMount: 'pump-bolted' });
    expect(pan.partIds).toEqual([]);
    expect(pan.note).toContain('No candidate pan for a center sump with a pump-bolted pickup keeps every clearance below the engine at this placement.');
    expect(pan.note).toContain('Left out at this placement: Kestrel centre-sump tow pan runs 53.8 mm (2.12 in) into the front crossmember.');
    // The pickup that suits the fitted rear-sump pan is still offered.
    expect(finding.remedies.find((r): r is PartRemedy => r.kind === 'part' && r.category === 'oil-pickup')!.partIds).toEqual([DEMO_REAR_SUMP_PICKUP.id]);
  });

  it('a rear-sump pickup brings in the rear-sump pan that clears by 51.2 mm, not the deep one 3.8 mm into the crossmember', () => {
    const finding = runCheck(PAN_PICKUP_PUMP_CHECK, stagSpec(DEMO_CENTER_SUMP_PAN, DEMO_REAR_SUMP_PICKUP));
    expect(finding.status).toBe('fails');
    const pan = panRemedy(finding.remedies);
    expect(pan.partIds).toEqual([DEMO_REAR_SUMP_PAN.id]);
    expect(pan.note).toContain(
      'A pan whose sump and pickup mounting suit the Trailhand TR-4411 rear-sump pickup and that keeps every clearance below the engine at this placement: ' +
        'Trailhand TR-4410 rear-sump swap pan, which clears the front crossmember by 51.2 mm (2.02 in).',
    );
    expect(pan.note).toContain('Left out at this placement: Trailhand TR-4480 deep rear-sump pan runs 3.8 mm (0.15 in) into the front crossmember.');
    // The pan it offers passes the very check it must not fail.
    const withIt = runCheck(SUMP_CROSSMEMBER_CHECK, stagSpec(DEMO_REAR_SUMP_PAN, DEMO_REAR_SUMP_PICKUP));
    expect(withIt.status).toBe('ok');
  });

  it('the dipstick check offers only a pan with the same sump that also clears', () => {
    // The engine's dipstick in the pan's left side; the fitted deep pan has only a block hole. Two rear-sump pans
    // provide for it: the TR-4410 (clears, see above) and a deep pan of the same outline as the TR-4480 (3.8 mm in).
    const deepWithHole: OilPanSpec = { ...DEMO_DEEP_REAR_SUMP_PAN, id: 'pan-deep-left-hole', name: 'deep rear-sump pan with a left dipstick hole', dipstickProvision: ['pan-left'] };
    const spec = stagSpec(DEMO_DEEP_REAR_SUMP_PAN, DEMO_REAR_SUMP_PICKUP, [deepWithHole]);
    const finding = runCheck(DIPSTICK_CHECK, { ...spec, engine: { ...spec.engine, dipstickLocation: 'pan-left' } });
    expect(finding.status).toBe('fails');
    const pan = panRemedy(finding.remedies);
    expect(pan.partIds).toEqual([DEMO_REAR_SUMP_PAN.id]);
    expect(pan.note).toContain('Left out at this placement: deep rear-sump pan with a left dipstick hole runs 3.8 mm (0.15 in) into the front crossmember.');
  });

  it("the crossmember check's own pan remedy names the pans it left out and why", () => {
    const finding = runCheck(SUMP_CROSSMEMBER_CHECK, stagSpec(DEMO_CENTER_SUMP_PAN, DEMO_CENTER_SUMP_PICKUP));
    expect(finding.status).toBe('fails');
    const pan = panRemedy(finding.remedies);
    expect(pan.partIds).toEqual([DEMO_REAR_SUMP_PAN.id]);
    expect(pan.note).toContain('Trailhand TR-4410 rear-sump swap pan by 51.2 mm (2.02 in)');
    expect(pan.note).toContain('Left out at this placement: Trailhand TR-4480 deep rear-sump pan runs 3.8 mm (0.15 in) into the front crossmember.');
  });
});

describe('one judgement of each candidate pan per run', () => {
  it('checks that share a context judge each pan once and offer the same pans as when run alone', () => {
    // Same taller-framed truck as above: the centre-sump pan fails the crossmember, its pickup disagrees with the rear-sump pan.
    const spec = stagSpec(DEMO_CENTER_SUMP_PAN, DEMO_REAR_SUMP_PICKUP);
    const context = sharedCheckContext(spec, resolveFitSettings());
    const crossmember = SUMP_CROSSMEMBER_CHECK.run(context);
    const judged = [...context.judgedPans!.values()];
    expect(judged.map((j) => j.pan.id).sort()).toEqual([DEMO_DEEP_REAR_SUMP_PAN.id, DEMO_REAR_SUMP_PAN.id].sort());
    const pickup = PAN_PICKUP_PUMP_CHECK.run(context);
    // The second check reused the first one's judgements: the very same objects, nothing judged again.
    expect(judgeCandidatePans(context).every((j) => judged.includes(j))).toBe(true);
    expect(context.judgedPans!.size).toBe(2);
    expect(crossmember).toEqual(runCheck(SUMP_CROSSMEMBER_CHECK, spec));
    expect(pickup).toEqual(runCheck(PAN_PICKUP_PUMP_CHECK, spec));
  });
});
