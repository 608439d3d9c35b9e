/**
 * Every closed list of values the product accepts, declared once. The types derive from these arrays, the
 * API validates against them (`@IsIn(LIST)`), and the web builds its selects from them; a new value is
 * added here and nowhere else (labels for people stay with the web).
 */

// ---------------------------------------------------------------- parts and chassis

export const ENGINE_LAYOUTS = ['inline', 'v'] as const;
export type EngineLayout = (typeof ENGINE_LAYOUTS)[number];

export const SIDES = ['left', 'right'] as const;
export type SideName = (typeof SIDES)[number];

export const THROTTLES = ['cable', 'electronic'] as const;
export type ThrottleKind = (typeof THROTTLES)[number];

export const OIL_PUMP_DRIVES = ['crank', 'cam'] as const;
export type OilPumpDrive = (typeof OIL_PUMP_DRIVES)[number];

export const DIPSTICK_LOCATIONS = ['block-left', 'block-right', 'pan-left', 'pan-right'] as const;
export type DipstickLocation = (typeof DIPSTICK_LOCATIONS)[number];

export const SUMP_POSITIONS = ['front', 'center', 'rear', 'dual'] as const;
export type SumpPosition = (typeof SUMP_POSITIONS)[number];

export const PICKUP_MOUNTS = ['pump-bolted', 'block-bolted', 'press-in'] as const;
export type PickupMount = (typeof PICKUP_MOUNTS)[number];

export const PULLEY_ROLES = ['crank', 'water-pump', 'alternator', 'power-steering', 'ac-compressor', 'idler', 'tensioner'] as const;
export type PulleyRole = (typeof PULLEY_ROLES)[number];

export const PULLEY_SIDES = ['grooved', 'back'] as const;
export type PulleySide = (typeof PULLEY_SIDES)[number];

export const OBSTACLE_KINDS = ['crossmember', 'steering-linkage', 'axle-at-bump', 'differential-at-bump', 'firewall', 'tunnel', 'other'] as const;
export type ObstacleKind = (typeof OBSTACLE_KINDS)[number];

export const FUEL_SYSTEM_KINDS = ['carburetor', 'efi-return', 'efi-returnless'] as const;
export type FuelSystemKind = (typeof FUEL_SYSTEM_KINDS)[number];

export const DRIVESHAFT_MATERIALS = ['steel', 'aluminum'] as const;
export type DriveshaftMaterial = (typeof DRIVESHAFT_MATERIALS)[number];

export const BELT_PROFILES = ['PK'] as const;
export type BeltProfile = (typeof BELT_PROFILES)[number];

/**
 * Crank trigger-wheel patterns: teeth-minus-missing (`60-2`) or pulses per turn (`58x`). The common
 * patterns of the trade; a controller lists the ones it decodes.
 */
export const CRANK_SIGNALS = ['60-2', '58x', '36-1', '36-2-2-2', '24x', '24-1', '12-1', '8x', '7x', '4x', '3x'] as const;
export type CrankSignal = (typeof CRANK_SIGNALS)[number];

/** Cam sensor patterns, pulses per cam turn. */
export const CAM_SIGNALS = ['1x', '2x', '3x', '4x', '6x'] as const;
export type CamSignal = (typeof CAM_SIGNALS)[number];

/** The use the swap is planned for; it sets the margins some checks ask for. */
export const SWAP_USES = ['street', 'tow', 'off-road', 'strip'] as const;
export type SwapUse = (typeof SWAP_USES)[number];

// ---------------------------------------------------------------- catalog, shop, people, projects

/** The catalog's kinds, in the order the catalog shows them. */
export const CATALOG_KIND_NAMES = [
  'engines',
  'chassis',
  'transmissions',
  'oil-pans',
  'oil-pickups',
  'oil-pumps',
  'controllers',
  'mount-adapters',
  'bellhousing-adapters',
  'belts',
] as const;
export type CatalogKind = (typeof CATALOG_KIND_NAMES)[number];

export const ROLES = ['owner', 'estimator', 'fabricator', 'counter', 'customer'] as const;
export type Role = (typeof ROLES)[number];

/** A shop's and a person's unit system: inches (with lb, psi, hp) or millimetres (with kg, kPa, kW). */
export const UNIT_SYSTEMS = ['in', 'mm'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/**
 * The job's stages in order. Each is reached by an event, never set by hand: the measurement sheet signed off
 * (measured), a fit report run (fit-checked), a parts plan saved (parts-planned), a quote sent (quote-sent), the
 * customer's approval (approved), the deposit settled (deposit-paid), the work order started (in-the-bay) and
 * finished (done). A project only moves forward.
 */
export const PROJECT_STATUSES = ['intake', 'measured', 'fit-checked', 'parts-planned', 'quote-sent', 'approved', 'deposit-paid', 'in-the-bay', 'done'] as const;
export type ProjectStatus = (typeof PROJECT_STATUSES)[number];

/**
 * A counter line's state: open (nothing done yet), reserved (units set aside from stock), to-order / ordered (none on
 * the shelf), received (arrived and set aside), issued (taken off the shelf to the job: no longer on hand).
 */
export const COUNTER_STATUSES = ['open', 'reserved', 'to-order', 'ordered', 'received', 'issued'] as const;
export type CounterStatus = (typeof COUNTER_STATUSES)[number];

/** Hazards a labor operation carries; each prints its usual caution on the quote and the work order. */
export const WORK_HAZARDS = ['lifting', 'support', 'fuel', 'welding', 'steering', 'brakes'] as const;
export type WorkHazard = (typeof WORK_HAZARDS)[number];

/** A work order is opened when the deposit is paid, started when the bay takes the job, finished when it is built. */
export const WORK_ORDER_STATES = ['ready', 'in-the-bay', 'finished'] as const;
export type WorkOrderState = (typeof WORK_ORDER_STATES)[number];

/** A recorded check: a confirmation (done / not done) or a measured value judged against its allowed range. */
export const CHECK_RESULTS = ['pass', 'fail'] as const;
export type CheckResult = (typeof CHECK_RESULTS)[number];

// ---------------------------------------------------------------- findings

export const CHECK_STATUSES = ['ok', 'tight', 'fails', 'unknown'] as const;
export type CheckStatus = (typeof CHECK_STATUSES)[number];

/**
 * The unit a finding's figures (found, needed, margin) are stored in. The web shows `mm`, `psi`, `lb/h`, `L/h` and
 * `kW` in the person's system (`formatFindingFigure`); the rest read alike in both.
 */
export const FIGURE_UNITS = ['mm', 'deg', 'rpm', 'lb/h', 'cc/min', 'L/h', 'psi', 'kW', 'count', 'none'] as const;
export type FigureUnit = (typeof FIGURE_UNITS)[number];

export const CHECK_GROUPS = ['envelope', 'mounts', 'drivetrain', 'oiling', 'management', 'fuel', 'cooling', 'belt', 'cam'] as const;
export type CheckGroup = (typeof CHECK_GROUPS)[number];

export const PLACEMENT_AXES = ['setback', 'height', 'tilt'] as const;
export type PlacementAxis = (typeof PLACEMENT_AXES)[number];

/** True when `value` is one of `list`: narrows an unknown string to the list's type. */
export function isOneOf<T extends string>(list: readonly T[], value: unknown): value is T {
  return typeof value === 'string' && (list as readonly string[]).includes(value);
}

/** What an audit event is about: money (quotes, payments, labor rates), stock, sheet sign-off, membership, background work tried again. */
export const AUDIT_KINDS = ['money', 'stock', 'sign-off', 'membership', 'background-work'] as const;
export type AuditKind = (typeof AUDIT_KINDS)[number];
