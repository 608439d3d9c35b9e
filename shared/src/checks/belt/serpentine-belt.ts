import { serpentineLength, type BeltPulley, type SerpentineResult } from '../../belt/serpentine';
import { beltLengthWindow, formatBeltDesignation, nearestStockBelt } from '../../belt/stock-belt';
import type { Finding, Remedy } from '../../types/finding';
import type { AccessoryDriveSpec, FitSpec } from '../../types/fit-spec';
import { mmRangeWithInches, mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';

const FIELDS: FindingFields = {
  checkId: 'belt.serpentine-length',
  group: 'belt',
  title: 'Serpentine belt length and stock belt',
  unit: 'mm',
  limit: 'min',
  thresholdSource:
    "Belt length from the pulley layout (tangent runs and wrap arcs); a stock belt the tensioner's take-up accepts (ISO 155 allowance, ISO 9982 designation); PK pulleys at least 45 mm (1.77 in) (ISO 9981).",
};

/** The drive the spec names, or the engine's first. */
export function selectedAccessoryDrive(spec: FitSpec): AccessoryDriveSpec | null {
  const drives = spec.engine.accessoryDrives;
  if (spec.accessoryDriveId !== undefined) return drives.find((drive) => drive.id === spec.accessoryDriveId) ?? null;
  return drives[0] ?? null;
}

/**
 * Pulley centres seen from the front of the engine: the engine's right (+v) appears on the viewer's left, so
 * x = −v, y = w; the order is counter-clockwise seen that way. The reverse order is accepted too, since the
 * belt's length does not depend on which way it is listed.
 */
export function accessoryDriveBeltLayout(drive: AccessoryDriveSpec): SerpentineResult {
  const pulleys: BeltPulley[] = drive.pulleys.map((p) => ({ id: p.id, x: -p.v, y: p.w, diameter: p.diameterMm, side: p.side }));
  return serpentineLength(pulleys, { orientation: 'either' });
}

export function checkSerpentineBelt({ spec, settings }: CheckContext): Finding {
  const drive = selectedAccessoryDrive(spec);
  if (!drive) return unknownFinding(FIELDS, ['accessoryDrive']);
  const fields = { ...FIELDS, against: drive.id };
  const layout = accessoryDriveBeltLayout(drive);
  if (!layout.ok) {
    return measuredFinding(
      { ...fields, limit: 'match' },
      { measured: 0, required: 0, margin: -1, status: 'fails' },
      `The belt length of the ${drive.name} cannot be computed: ${layout.message}`,
      [driveRemedy(drive)],
    );
  }
  const computed = layout.length;
  const designation = formatBeltDesignation(drive.ribs, computed);
  const stock = spec.candidates?.stockBeltLengthsMm;
  if (!stock || stock.length === 0) {
    return unknownFinding(
      fields,
      ['candidates.stockBeltLengthsMm'],
      `The ${drive.name} needs a belt of ${mmWithInches(computed)} effective length (${designation}); add the stock belt lengths to pick one.`,
    );
  }
  const choice = nearestStockBelt(computed, drive.tensionerTakeUpMm, stock);
  const window = beltLengthWindow(computed, drive.tensionerTakeUpMm);
  if (!choice) return unknownFinding(fields, ['candidates.stockBeltLengthsMm']);
  let status = statusFromMargin(choice.marginMm, settings.beltTightBandMm);
  const small = smallPulleys(drive, settings.minPulleyDiameterMm);
  if (status === 'ok' && small.length > 0) status = 'tight';
  const smallText = small.length > 0 ? ` Pulley ${small.join(', ')} is under the ${mmWithInches(settings.minPulleyDiameterMm, { decimals: 0 })} minimum for PK belts and will shorten belt life.` : '';
  const chosen = formatBeltDesignation(drive.ribs, choice.lengthMm);
  // Whole millimetres inside the window, the same in the message and the remedy.
  const minLengthMm = Math.ceil(window.minMm);
  const maxLengthMm = Math.floor(window.maxMm);
  const range = mmRangeWithInches(minLengthMm, maxLengthMm, { decimals: 0 });
  const message = choice.withinTakeUp
    ? `The ${drive.name} needs ${mmWithInches(computed)} (${designation}); stock belt ${chosen} is ${mmWithInches(choice.differenceMm, { signed: true })} from it, inside the tensioner's range of ${range}: ${marginWords(choice.marginMm, mmWithInches)}.${smallText}`
    : `The ${drive.name} needs ${mmWithInches(computed)} (${designation}); the tensioner accepts ${range} and the nearest stock belt, ${chosen}, is outside that range.${smallText}`;
  const remedies: Remedy[] = [
    {
      kind: 'part',
      category: 'belt',
      requires: { ribs: drive.ribs, minLengthMm, maxLengthMm, designation },
      partIds: [],
      note: `A ${drive.ribs}-rib PK belt of ${range} effective length.`,
    },
    driveRemedy(drive),
  ];
  return measuredFinding(fields, { measured: choice.lengthMm, required: computed, margin: choice.marginMm, status }, message, remedies);
}

function smallPulleys(drive: AccessoryDriveSpec, minDiameterMm: number): string[] {
  return drive.pulleys.filter((p) => p.side === 'grooved' && p.diameterMm < minDiameterMm).map((p) => p.id);
}

function driveRemedy(drive: AccessoryDriveSpec): Remedy {
  return {
    kind: 'part',
    category: 'accessory-drive',
    requires: { ribs: drive.ribs },
    partIds: [],
    note: 'An accessory drive kit with a known belt, or an idler moved to bring the length to a stock belt.',
  };
}



export const SERPENTINE_BELT_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkSerpentineBelt,
};
