/**
 * The measurement point catalogue: every kind of point a fabricator can measure on a chassis, which field of
 * the chassis spec it overrides, how it is read at the truck, and which fit checks it feeds.
 *
 * How values are taken at the truck (so a tape measure and an angle finder are all that is needed):
 * - heights are read from the shop floor up, with the truck on its wheels at ride height on a level floor;
 * - fore-aft distances are read along the floor from a plumb line dropped from the front axle centreline (the
 *   hub centre): behind it for most points, ahead of it for the radiator core;
 * - widths are read square across the frame, inside face to inside face;
 * - angles are read with an angle finder against level: positive when the front of the part is higher.
 * Lengths are stored in millimetres, angles in degrees.
 */

export const MEASUREMENT_POINT_KINDS = [
  'ride-height',
  'obstacle-top',
  'obstacle-bottom',
  'obstacle-front-face',
  'obstacle-rear-face',
  'rail-inside-width',
  'rail-bottom',
  'mount-pad-height',
  'mount-pad-setback',
  'mount-pad-spacing',
  'radiator-core-face',
  'radiator-core-top',
  'radiator-core-bottom',
  'hood-line',
  'transmission-crossmember-setback',
  'transmission-crossmember-height',
  'pinion-height',
  'pinion-angle',
] as const;
export type MeasurementPointKind = (typeof MEASUREMENT_POINT_KINDS)[number];

export const RIDE_HEIGHT_CORNERS = ['front-left', 'front-right', 'rear-left', 'rear-right'] as const;
export type RideHeightCorner = (typeof RIDE_HEIGHT_CORNERS)[number];

export const MEASUREMENT_SIDES = ['left', 'right'] as const;
export type MeasurementSide = (typeof MEASUREMENT_SIDES)[number];

export const MEASUREMENT_VIEWS = ['side', 'front'] as const;
export type MeasurementView = (typeof MEASUREMENT_VIEWS)[number];

export const MEASUREMENT_QUANTITIES = ['length', 'angle'] as const;
export type MeasurementQuantity = (typeof MEASUREMENT_QUANTITIES)[number];

/** How a reading is taken: the zero of the tape. */
export type MeasurementReference = 'floor' | 'front-axle-behind' | 'front-axle-ahead' | 'across' | 'level';

export interface MeasurementKindInfo {
  kind: MeasurementPointKind;
  quantity: MeasurementQuantity;
  view: MeasurementView;
  reference: MeasurementReference;
  /** The chassis-spec field the reading overrides (for people; the apply function does the work). */
  overrides: string;
  /** Fit checks whose input this reading is. */
  feedsChecks: readonly string[];
  /** What the `target` of a point names, when the kind needs one. */
  target?: 'obstacle' | 'side' | 'corner';
  /** Whether a point of this kind sits at a fore-aft station (`atX`). */
  station?: boolean;
}

const OBSTACLE_CHECKS = [
  'envelope.sump-crossmember',
  'envelope.sump-steering-linkage',
  'envelope.sump-axle',
  'envelope.heads-firewall',
  'envelope.transmission-tunnel',
] as const;
const DRIVELINE_CHECKS = ['drivetrain.driveshaft-length', 'drivetrain.u-joint-angles'] as const;

/** An obstacle's edge: heights move the outline up or down, faces fore or aft. */
function obstacleKind(kind: MeasurementPointKind, reference: 'floor' | 'front-axle-behind'): MeasurementKindInfo {
  return {
    kind,
    quantity: 'length',
    view: 'side',
    reference,
    overrides: `obstacles[].outline (moved ${reference === 'floor' ? 'up or down' : 'fore or aft'})`,
    feedsChecks: OBSTACLE_CHECKS,
    target: 'obstacle',
    ...(reference === 'floor' && { station: true }),
  };
}

export const MEASUREMENT_KIND_INFO: Record<MeasurementPointKind, MeasurementKindInfo> = {
  'ride-height': {
    kind: 'ride-height',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'ground line (chassis height and pitch)',
    feedsChecks: ['envelope.ground-clearance', ...DRIVELINE_CHECKS],
    target: 'corner',
  },
  'obstacle-top': obstacleKind('obstacle-top', 'floor'),
  'obstacle-bottom': obstacleKind('obstacle-bottom', 'floor'),
  'obstacle-front-face': obstacleKind('obstacle-front-face', 'front-axle-behind'),
  'obstacle-rear-face': obstacleKind('obstacle-rear-face', 'front-axle-behind'),
  'rail-inside-width': {
    kind: 'rail-inside-width',
    quantity: 'length',
    view: 'front',
    reference: 'across',
    overrides: 'railStations[].insideWidthMm',
    feedsChecks: ['envelope.rail-width'],
    station: true,
  },
  'rail-bottom': {
    kind: 'rail-bottom',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'railStations[].zBottom and zTop (rail depth kept)',
    feedsChecks: ['envelope.rail-width'],
    station: true,
  },
  'mount-pad-height': {
    kind: 'mount-pad-height',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'mountPads.<side>.z',
    feedsChecks: ['mounts.engine-mount-left', 'mounts.engine-mount-right'],
    target: 'side',
  },
  'mount-pad-setback': {
    kind: 'mount-pad-setback',
    quantity: 'length',
    view: 'side',
    reference: 'front-axle-behind',
    overrides: 'mountPads.<side>.x',
    feedsChecks: ['mounts.engine-mount-left', 'mounts.engine-mount-right'],
    target: 'side',
  },
  'mount-pad-spacing': {
    kind: 'mount-pad-spacing',
    quantity: 'length',
    view: 'front',
    reference: 'across',
    overrides: 'mountPads.left.y and right.y (half each side of the centreline)',
    feedsChecks: ['mounts.engine-mount-left', 'mounts.engine-mount-right'],
  },
  'radiator-core-face': {
    kind: 'radiator-core-face',
    quantity: 'length',
    view: 'side',
    reference: 'front-axle-ahead',
    overrides: 'radiatorCore.x',
    feedsChecks: ['envelope.fan-radiator'],
  },
  'radiator-core-top': {
    kind: 'radiator-core-top',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'radiatorCore.zTo',
    feedsChecks: ['envelope.fan-radiator'],
  },
  'radiator-core-bottom': {
    kind: 'radiator-core-bottom',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'radiatorCore.zFrom',
    feedsChecks: ['envelope.fan-radiator'],
  },
  'hood-line': {
    kind: 'hood-line',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'hoodLine[] point at this station',
    feedsChecks: ['envelope.hood'],
    station: true,
  },
  'transmission-crossmember-setback': {
    kind: 'transmission-crossmember-setback',
    quantity: 'length',
    view: 'side',
    reference: 'front-axle-behind',
    overrides: 'transmissionCrossmember.x',
    feedsChecks: ['drivetrain.transmission-mount-position', ...DRIVELINE_CHECKS],
  },
  'transmission-crossmember-height': {
    kind: 'transmission-crossmember-height',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'transmissionCrossmember.z',
    feedsChecks: ['drivetrain.transmission-mount-height'],
  },
  'pinion-height': {
    kind: 'pinion-height',
    quantity: 'length',
    view: 'side',
    reference: 'floor',
    overrides: 'pinion.z',
    feedsChecks: DRIVELINE_CHECKS,
  },
  'pinion-angle': {
    kind: 'pinion-angle',
    quantity: 'angle',
    view: 'side',
    reference: 'level',
    overrides: 'pinion.angleDeg (read against level, turned into the frame by the measured pitch)',
    feedsChecks: ['drivetrain.u-joint-angles'],
  },
};

/** One point of a template (per chassis model) or of a sheet. */
export interface MeasurementPoint {
  /** Unique within a template, stable: values on sheets refer to it. */
  id: string;
  kind: MeasurementPointKind;
  label: string;
  /** Where and how to hold the tape. */
  howTo: string;
  /** Obstacle id, side (`left`/`right`) or corner (`front-left`…), when the kind needs one. */
  target?: string;
  /** Fore-aft station in the chassis frame (mm behind the front axle line) where the reading is taken. */
  atX?: number;
  /**
   * The reading the catalog chassis gives on a truck at catalog ride height: what the tape should show. For a
   * ride height it is also the datum: the frame-fixed height of the point the tape touches.
   */
  catalogValue: number | null;
  /** A sheet is complete when every required point has a value. */
  required: boolean;
}

/** The kinds whose readings are heights above the floor (turned into the chassis frame through the ground line). */
export function isFloorHeight(kind: MeasurementPointKind): boolean {
  return MEASUREMENT_KIND_INFO[kind].reference === 'floor' && kind !== 'ride-height';
}

/** The unit a value of this point is stored in. */
export function measurementUnit(kind: MeasurementPointKind): 'mm' | 'deg' {
  return MEASUREMENT_KIND_INFO[kind].quantity === 'angle' ? 'deg' : 'mm';
}
