import type { CheckGroup, CheckStatus, Finding, FigureUnit, Remedy } from '../types/finding';
import type { FitSpec } from '../types/fit-spec';
import type { FitSettings } from '../settings/fit-settings';
import type { WindowTermsOf } from './envelope/window-terms';
import type { PanJudgement } from './envelope/pan-clearance';

export interface CheckContext {
  spec: FitSpec;
  settings: FitSettings;
  /**
   * One run's memo of the candidate pans judged at the spec's own placement, by pan id (see `judgeCandidatePans`):
   * the below-pan checks, the ground clearance and the oiling checks all offer pans, and share one judgement of
   * each within a run that passes the same context to every check (`runFitCheck`). Absent: nothing is kept.
   */
  judgedPans?: Map<string, PanJudgement>;
}

/** A context for running several checks on one spec and settings, sharing work between them (see {@link CheckContext}). */
export function sharedCheckContext(spec: FitSpec, settings: FitSettings): CheckContext {
  return { spec, settings, judgedPans: new Map() };
}

export interface CheckDefinition {
  id: string;
  group: CheckGroup;
  title: string;
  /** True when the result depends on the engine's placement (setback, height, tilt). */
  dependsOnPlacement: boolean;
  /** Envelope checks: how the check bounds the fit window, stated beside its rule (see window-terms.ts). */
  windowTerms?: WindowTermsOf;
  run(context: CheckContext): Finding;
}

/** Status of a figure against a limit: fails past it, tight within `tightBand` inside it. */
export function statusFromMargin(margin: number, tightBand: number): CheckStatus {
  if (margin < 0) return 'fails';
  if (margin < tightBand) return 'tight';
  return 'ok';
}

export interface FindingFields {
  checkId: string;
  group: CheckGroup;
  title: string;
  unit: FigureUnit;
  thresholdSource: string;
  limit?: Finding['limit'];
  against?: string;
}

/** Plain words for the inputs a check most often lacks; anything else is spelled out from its field path. */
const MISSING_INPUT_WORDS: Record<string, string> = {
  accessoryDrive: 'the accessory drive',
  controller: 'the engine controller',
  mountAdapter: 'the chosen mount adapter',
  oilPan: 'the oil pan',
  oilPickup: 'the oil pickup',
  oilPump: 'the oil pump',
  transmission: 'the transmission',
  'oilPan.bottomProfile': "the oil pan's bottom outline",
  'chassis.hoodLine': "the hood's underside line",
  'chassis.radiatorCore': "the radiator core's position",
  'chassis.radiatorCore.ratedKw': "the radiator's rated heat rejection",
  'chassis.steeringBox': "the steering box's position",
  'chassis.railStations': 'the frame rail widths',
  'chassis.transmissionCrossmember': 'the transmission crossmember',
  'candidates.stockBeltLengthsMm': 'the stock belt lengths',
  'engine.rearProfile': "the engine's rear outline",
  'engine.topProfile': "the engine's top outline",
  'engine.fanFrontU': "the fan's position on the engine",
  'engine.widthFeatures or engine.accessoryDrives': "the engine's width features or accessory drives",
  'engine.injectorFlowLbh': "the injectors' flow rating",
  'engine.injectorRatedPsi': "the pressure the injectors are rated at",
  'goals.revLimitRpm': 'the rev limit',
  'chassis.fuelSystem.pumpFlowLph': "the chassis fuel pump's rated flow",
  'chassis.fuelSystem.pumpRatedPsi': "the chassis fuel pump's rated pressure",
  'chassis.fuelSystem.regulatorPsi': "the pressure the chassis fuel regulator holds",
  'transmission.topGearRatio': "the transmission's top gear ratio",
  'transmission.sideProfile': "the transmission's side outline",
};

/**
 * An input named in a `missing` list (a field path, sometimes with a note in brackets), in words for a
 * finding's message: known paths use {@link MISSING_INPUT_WORDS}; others are split at dots and capitals.
 */
export function describeMissingInput(path: string): string {
  const known = MISSING_INPUT_WORDS[path];
  if (known) return known;
  const obstacle = /^chassis\.obstacles \(kind (.+)\)$/.exec(path);
  if (obstacle) return `the outline of the ${obstacle[1].replace(/-/g, ' ')}`;
  const mount = /^(engine|chassis)\.(mountBosses|mountPads)\.(\w+)$/.exec(path);
  if (mount) return mount[1] === 'engine' ? `the engine's ${mount[3]} mount boss` : `the chassis's ${mount[3]} mount pad`;
  const bracket = path.indexOf(' (');
  const head = bracket >= 0 ? path.slice(0, bracket) : path;
  const tail = bracket >= 0 ? path.slice(bracket) : '';
  const words = (MISSING_INPUT_WORDS[head] ?? head
    .split(/[.\s]+/)
    .map((part) => part.replace(/(Mm|Deg|Kw|Psi|Lbh|Lph|Rpm)$/, '').replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase())
    .filter((part) => part.length > 0)
    .join(' ')).replace(/^the /, '');
  return `the ${words}${tail.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase()}`;
}

export function unknownFinding(fields: FindingFields, missing: string[], message?: string): Finding {
  return {
    limit: 'min',
    ...fields,
    status: 'unknown',
    measured: null,
    required: null,
    margin: null,
    message: message ?? `Cannot check ${fields.title.toLowerCase()}: missing ${missing.map(describeMissingInput).join(', ')}.`,
    missing,
    remedies: [],
  };
}

export function measuredFinding(
  fields: FindingFields,
  /** measured and margin are null when there is no honest figure (e.g. a pump that cannot reach the pressure at all). */
  figures: { measured: number | null; required: number; margin: number | null; status: CheckStatus },
  message: string,
  remedies: Remedy[] = [],
): Finding {
  return {
    limit: 'min',
    ...fields,
    ...figures,
    message,
    missing: [],
    remedies: figures.status === 'ok' ? [] : remedies,
  };
}
