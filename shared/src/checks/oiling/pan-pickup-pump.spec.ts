import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkPanPickupPump } from './pan-pickup-pump';

const run = (spec: FitSpec) => checkPanPickupPump({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('oiling.pan-pickup-pump', () => {
  it('ok when pan, pickup and pump agree', () => {
    expect(run(systemFitSpec())).toMatchObject({ status: 'ok', margin: 0, remedies: [] });
  });

  it('fails for a front-sump pickup in a rear-sump pan, naming the matching pickup', () => {
    const finding = run(specWith((s) => (s.oilPickup = s.candidates!.oilPickups![0])));
    expect(finding.status).toBe('fails');
    expect(finding.message).toContain('front sump');
    expect(finding.remedies[0]).toMatchObject({
      category: 'oil-pickup',
      requires: { sumpPosition: 'rear', mount: 'pump-bolted', pumpInlet: 'inlet-a' },
      partIds: ['pickup-rear-c'],
    });
    expect(finding.remedies.some((r) => r.kind === 'part' && r.category === 'oil-pan' && r.partIds.includes('pan-front-b'))).toBe(true);
  });

  it('fails for a pump with another inlet and names pumps that fit the pickup', () => {
    const finding = run(specWith((s) => (s.oilPump = s.candidates!.oilPumps![1])));
    expect(finding.status).toBe('fails');
    const pump = finding.remedies.find((r) => r.kind === 'part' && r.category === 'oil-pump');
    expect(pump).toMatchObject({ requires: { inlet: 'inlet-a' }, partIds: ['pump-hv-a'] });
  });

  it('fails for a pan that does not fit the block rail', () => {
    const finding = run(specWith((s) => (s.oilPan!.railPattern = 'rail-z')));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ category: 'oil-pan', requires: { railPattern: 'rail-a' } });
  });

  it('unknown lists every missing part', () => {
    expect(run(specWith((s) => {
      delete s.oilPickup;
      delete s.oilPump;
    }))).toMatchObject({ status: 'unknown', missing: ['oilPickup', 'oilPump'] });
  });
});
