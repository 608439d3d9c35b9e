import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkCylinderCount } from './cylinder-count';
import { checkCamSignal, checkCrankSignal } from './sensor-signals';
import { checkThrottle } from './throttle';

const context = (spec: FitSpec) => ({ spec, settings: DEFAULT_FIT_SETTINGS });
const withControllerB = (s: FitSpec) => (s.controller = s.candidates!.controllers![0]);

describe('management.crank-signal and management.cam-signal', () => {
  it('ok when the controller reads both', () => {
    expect(checkCrankSignal(context(systemFitSpec())).status).toBe('ok');
    expect(checkCamSignal(context(systemFitSpec())).status).toBe('ok');
  });

  it('fails for a 60-2 wheel on a controller that reads only 36-1, naming one that suits everything', () => {
    const finding = checkCrankSignal(context(specWith(withControllerB)));
    expect(finding).toMatchObject({ checkId: 'management.crank-signal', status: 'fails', margin: -1 });
    expect(finding.remedies[0]).toMatchObject({ category: 'engine-controller', requires: { crankSignal: '60-2' }, partIds: ['ecu-c'] });
  });

  it('fails on the cam signal', () => {
    expect(checkCamSignal(context(specWith((s) => (s.engine.camSignal = '4x'))))).toMatchObject({ status: 'fails' });
  });

  it('unknown without a controller', () => {
    expect(checkCrankSignal(context(specWith((s) => delete s.controller)))).toMatchObject({ status: 'unknown', missing: ['controller'] });
  });
});

describe('management.throttle', () => {
  it('ok with an electronic throttle, pedal and controller', () => {
    expect(checkThrottle(context(systemFitSpec())).status).toBe('ok');
  });

  it('fails for an electronic throttle with a cable pedal', () => {
    const finding = checkThrottle(context(specWith((s) => (s.chassis.pedal = 'cable'))));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ category: 'throttle-pedal', requires: { type: 'electronic' } });
  });

  it('fails when the controller cannot drive the throttle', () => {
    const finding = checkThrottle(context(specWith(withControllerB)));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ category: 'engine-controller', partIds: ['ecu-c'] });
  });

  it('unknown without a controller when the pedal suits; fails when it does not', () => {
    expect(checkThrottle(context(specWith((s) => delete s.controller)))).toMatchObject({ status: 'unknown', missing: ['controller'] });
    expect(checkThrottle(context(specWith((s) => {
      delete s.controller;
      s.chassis.pedal = 'cable';
    }))).status).toBe('fails');
  });
});

describe('management.cylinders', () => {
  it('ok at the controller maximum', () => {
    expect(checkCylinderCount(context(systemFitSpec()))).toMatchObject({ status: 'ok', measured: 8, required: 8, margin: 0 });
  });

  it('fails for eight cylinders on a six-cylinder controller', () => {
    const finding = checkCylinderCount(context(specWith(withControllerB)));
    expect(finding).toMatchObject({ status: 'fails', margin: -2 });
    expect(finding.remedies[0]).toMatchObject({ partIds: ['ecu-c'] });
  });

  it('unknown without a controller', () => {
    expect(checkCylinderCount(context(specWith((s) => delete s.controller))).status).toBe('unknown');
  });
});
