import { DEMO_REAR_SUMP_PAN, DEMO_REAR_SUMP_PICKUP, DEMO_STOCK_PAN, DEMO_STOCK_PICKUP } from '../fixtures/demo-fit-spec';
import { pickupForNewPan, pickupSuitsPan } from './pickup-for-pan';

// Common practice (no published source): the pickup's tube must reach into the pan's sump and bolt where the
// pan's design puts it (pump-bolted, block-bolted or pressed in), and its flange must fit the pump's inlet.
describe('pickup for a new pan', () => {
  const offered = [DEMO_STOCK_PICKUP, DEMO_REAR_SUMP_PICKUP];

  it('keeps the current pickup when it suits the new pan', () => {
    expect(pickupForNewPan(DEMO_STOCK_PAN, DEMO_STOCK_PICKUP, offered)).toEqual({ action: 'keep', pickup: DEMO_STOCK_PICKUP });
  });

  it("changes to the pickup for the new pan's sump", () => {
    expect(DEMO_REAR_SUMP_PAN.sumpPosition).not.toBe(DEMO_STOCK_PICKUP.sumpPosition);
    expect(pickupForNewPan(DEMO_REAR_SUMP_PAN, DEMO_STOCK_PICKUP, offered)).toEqual({ action: 'change', pickup: DEMO_REAR_SUMP_PICKUP });
    expect(pickupForNewPan(DEMO_REAR_SUMP_PAN, undefined, offered).pickup).toBe(DEMO_REAR_SUMP_PICKUP);
  });

  it('says when nothing offered suits', () => {
    expect(pickupForNewPan(DEMO_REAR_SUMP_PAN, DEMO_STOCK_PICKUP, [DEMO_STOCK_PICKUP])).toEqual({ action: 'none-suits', pickup: null });
  });

  it('a different mounting does not suit, and a pump inlet given must match too', () => {
    const pressIn = { ...DEMO_REAR_SUMP_PICKUP, id: 'press-in', mount: 'press-in' as const };
    expect(pickupSuitsPan(pressIn, DEMO_REAR_SUMP_PAN)).toBe(DEMO_REAR_SUMP_PAN.pickupMount === 'press-in');
    const otherInlet = { ...DEMO_REAR_SUMP_PICKUP, id: 'other-inlet', pumpInlet: 'other' };
    expect(pickupForNewPan(DEMO_REAR_SUMP_PAN, null, [otherInlet, DEMO_REAR_SUMP_PICKUP], DEMO_REAR_SUMP_PICKUP.pumpInlet).pickup).toBe(DEMO_REAR_SUMP_PICKUP);
    expect(pickupForNewPan(DEMO_REAR_SUMP_PAN, null, [otherInlet], DEMO_REAR_SUMP_PICKUP.pumpInlet).pickup).toBe(otherInlet);
  });
});
