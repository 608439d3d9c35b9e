import { placeEnginePoint } from '../geometry/placement';
import type { Finding, Remedy } from '../types/finding';
import type { ChassisPoint, FitSpec } from '../types/fit-spec';
import type { CheckContext, CheckDefinition } from './check-definition';
import { measuredFinding, statusFromMargin, unknownFinding } from './check-definition';
import { COMMON_PRACTICE } from './envelope/envelope-common';
import { mmWithInches } from '../units/figure-format';
import { marginWords } from '../units/margin-words';

export const TRANSMISSION_MOUNT_POSITION_ID = 'drivetrain.transmission-mount-position';
export const TRANSMISSION_MOUNT_HEIGHT_ID = 'drivetrain.transmission-mount-height';

/** The transmission mount pad after placement and its offset from the crossmember (mount − crossmember). */
export function transmissionMountOffset(spec: FitSpec): { mount: ChassisPoint; dx: number; dz: number } | null {
  if (!spec.transmission) return null;
  const mount = placeEnginePoint(spec.transmission.mountPoint, spec.placement);
  const xm = spec.chassis.transmissionCrossmember;
  return { mount, dx: mount.x - xm.x, dz: mount.z - xm.z };
}

/**
 * Fore-aft: the mount must land within the crossmember's adjustable range (± adjustableXMm about its x).
 */
export function runTransmissionMountPosition({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: TRANSMISSION_MOUNT_POSITION_ID,
    group: 'drivetrain' as const,
    title: 'Transmission mount over the crossmember (fore-aft)',
    unit: 'mm' as const,
    limit: 'max' as const,
    thresholdSource: "The crossmember's own fore-aft adjustment, as measured on the chassis.",
    against: 'transmission-crossmember',
  };
  if (!spec.transmission) return unknownFinding(fields, ['transmission']);
  if (!spec.chassis.transmissionCrossmember) return unknownFinding(fields, ['chassis.transmissionCrossmember']);
  const o = transmissionMountOffset(spec)!;
  const range = spec.chassis.transmissionCrossmember.adjustableXMm;
  const measured = Math.abs(o.dx);
  const margin = range - measured;
  const status = statusFromMargin(margin, Math.min(settings.tightBandMm, range / 2));
  const dir = o.dx >= 0 ? 'behind' : 'ahead of';
  const message =
    margin >= 0
      ? `The transmission mount lands ${mmWithInches(measured)} ${dir} the crossmember, inside its ±${mmWithInches(range)} adjustment: ${marginWords(margin, mmWithInches, 'max')}.`
      : `The transmission mount lands ${mmWithInches(measured)} ${dir} the crossmember, ${mmWithInches(-margin)} past its ±${mmWithInches(range)} adjustment.`;
  const remedies: Remedy[] = [];
  if (status !== 'ok') {
    remedies.push({
      kind: 'fabrication',
      operation: `Relocate the transmission crossmember ${mmWithInches(measured)} ${o.dx >= 0 ? 'rearward' : 'forward'}`,
      laborHours: settings.transmissionCrossmemberFabricationHours,
      operationCode: 'transmission-crossmember',
      note: 'Support the transmission with a jack and the vehicle on stands before unbolting the crossmember.',
    });
    remedies.push({ kind: 'part', category: 'transmission-mount', requires: { offsetXMm: Math.round(o.dx * 10) / 10 }, partIds: [], note: 'An offset transmission mount can take up the difference when one is made for this crossmember.' });
  }
  return measuredFinding(fields, { measured, required: range, margin, status }, message, remedies);
}

/**
 * Height: the mount pad sits `dz` above the crossmember (negative: below it). The rule is a band either side of
 * level: within ±mountDirectFitToleranceMm it bolts down, so the figure is the size of the offset, |dz|, against
 * that tolerance as a maximum, and the sentence says which way it is off. Above the band a spacer up to
 * transmissionMountSpacerMaxMm closes the gap; below the crossmember, or past the spacer limit, the crossmember
 * is reworked.
 */
export function runTransmissionMountHeight({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: TRANSMISSION_MOUNT_HEIGHT_ID,
    group: 'drivetrain' as const,
    title: 'Transmission mount to crossmember height',
    unit: 'mm' as const,
    limit: 'max' as const,
    thresholdSource: `${COMMON_PRACTICE}: within about ±${mmWithInches(settings.mountDirectFitToleranceMm)} of level bolts down directly (the shop's direct-fit tolerance); spacers up to ${mmWithInches(settings.transmissionMountSpacerMaxMm)} (the shop's largest mount spacer).`,
    against: 'transmission-crossmember',
  };
  if (!spec.transmission) return unknownFinding(fields, ['transmission']);
  if (!spec.chassis.transmissionCrossmember) return unknownFinding(fields, ['chassis.transmissionCrossmember']);
  const { dz } = transmissionMountOffset(spec)!;
  const tol = settings.mountDirectFitToleranceMm;
  const spacerMax = settings.transmissionMountSpacerMaxMm;
  const measured = Math.abs(dz);
  const required = tol;
  const margin = tol - measured;
  const remedies: Remedy[] = [];
  let message: string;
  const status = margin >= 0 ? 'ok' : 'fails';
  if (status === 'ok') {
    message = `The transmission mount sits ${mmWithInches(measured)} ${dz >= 0 ? 'above' : 'below'} the crossmember pad and bolts down directly: within ±${mmWithInches(tol)} of level is taken up without a spacer (${marginWords(margin, mmWithInches, 'max')}).`;
  } else if (dz > 0 && dz <= spacerMax) {
    message = `The transmission mount sits ${mmWithInches(dz)} above the crossmember pad, past the ±${mmWithInches(tol)} it bolts down within: a ${mmWithInches(dz)} spacer closes it.`;
    remedies.push({ kind: 'part', category: 'transmission-mount', requires: { spacerMm: Math.round(dz * 10) / 10 }, partIds: [], note: `A ${mmWithInches(dz)} spacer under the mount (at most ${mmWithInches(spacerMax)}).` });
    remedies.push({ kind: 'fabrication', operation: "Raise the transmission crossmember's mount pad", laborHours: settings.transmissionCrossmemberFabricationHours, operationCode: 'transmission-crossmember', note: 'Support the transmission with a jack and the vehicle on stands.' });
  } else {
    message =
      dz > 0
        ? `The transmission mount sits ${mmWithInches(dz)} above the crossmember pad, past the ±${mmWithInches(tol)} it bolts down within and more than the ${mmWithInches(spacerMax)} a spacer should take: the crossmember must be raised.`
        : `The transmission mount sits ${mmWithInches(-dz)} below the crossmember pad, past the ±${mmWithInches(tol)} it bolts down within: the crossmember must be dropped or replaced.`;
    remedies.push({
      kind: 'fabrication',
      operation: dz > 0 ? `Raise the transmission crossmember's pad ${mmWithInches(dz)}` : `Drop the transmission crossmember ${mmWithInches(-dz)}, or fit a drop crossmember`,
      laborHours: settings.transmissionCrossmemberFabricationHours,
      operationCode: 'transmission-crossmember',
      note: 'Support the transmission with a jack and the vehicle on stands before unbolting the crossmember.',
    });
  }
  return measuredFinding(fields, { measured, required, margin, status }, message, remedies);
}

export const TRANSMISSION_MOUNT_POSITION_CHECK: CheckDefinition = {
  id: TRANSMISSION_MOUNT_POSITION_ID,
  group: 'drivetrain',
  title: 'Transmission mount over the crossmember (fore-aft)',
  dependsOnPlacement: true,
  run: runTransmissionMountPosition,
};

export const TRANSMISSION_MOUNT_HEIGHT_CHECK: CheckDefinition = {
  id: TRANSMISSION_MOUNT_HEIGHT_ID,
  group: 'drivetrain',
  title: 'Transmission mount to crossmember height',
  dependsOnPlacement: true,
  run: runTransmissionMountHeight,
};

export const TRANSMISSION_MOUNT_CHECKS: CheckDefinition[] = [TRANSMISSION_MOUNT_POSITION_CHECK, TRANSMISSION_MOUNT_HEIGHT_CHECK];
