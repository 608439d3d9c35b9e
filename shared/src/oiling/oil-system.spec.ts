import { systemFitSpec } from '../checks/drivetrain/system-spec.fixture';
import { oilPumpRpm, oilSystemMismatches, panFloorAt, pickupScreenPosition } from './oil-system';

describe('oil system', () => {
  it('pump speed from its drive', () => {
    // Common practice (no published source): crank-driven pumps turn at crank speed, cam-driven at half.
    expect(oilPumpRpm(6500, 'crank')).toBe(6500);
    expect(oilPumpRpm(6500, 'cam')).toBe(3250);
  });

  it('pan floor under a station', () => {
    const { oilPan } = systemFitSpec();
    // Derived: the outline slopes from w −120 at u 250 to w −200 at u 200.
    expect(panFloorAt(oilPan!.bottomProfile, 100)).toBe(-200);
    expect(panFloorAt(oilPan!.bottomProfile, 225)).toBeCloseTo(-160, 12);
    expect(panFloorAt(oilPan!.bottomProfile, 400)).toBe(-120);
    expect(panFloorAt(oilPan!.bottomProfile, 700)).toBeNull();
  });

  it('screen position and mismatches', () => {
    const { oilPan, oilPickup, oilPump } = systemFitSpec();
    expect(pickupScreenPosition(oilPan!, oilPickup!, 5)).toEqual({ gapMm: 8, overSump: true, floorUnderScreenW: -200 });
    expect(pickupScreenPosition(oilPan!, { ...oilPickup!, screenU: 400 }, 5).overSump).toBe(false);
    expect(oilSystemMismatches('rail-a', oilPan!, oilPickup!, oilPump!)).toEqual([]);
    const fields = oilSystemMismatches('rail-b', oilPan!, { ...oilPickup!, mount: 'press-in', pumpInlet: 'inlet-b' }, oilPump!).map((m) => m.field);
    expect(fields).toEqual(['railPattern', 'pickupMount', 'pumpInlet']);
  });
});
