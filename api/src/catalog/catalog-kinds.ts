import { Type } from '@nestjs/common';
import { formatBeltDesignation, type CatalogKind } from '@swapwright/shared';
import type { ObjectLiteral } from 'typeorm';
import {
  CatalogBellhousingAdapter,
  CatalogChassis,
  CatalogEngine,
  CatalogEngineController,
  CatalogItem,
  CatalogMountAdapter,
  CatalogOilPan,
  CatalogOilPickup,
  CatalogOilPump,
  CatalogSerpentineBelt,
  CatalogTransmission,
} from './catalog-item.entity';
import {
  BellhousingAdapterResponseDto,
  CatalogItemResponseDto,
  ChassisResponseDto,
  EngineControllerResponseDto,
  EngineResponseDto,
  MountAdapterResponseDto,
  OilPanResponseDto,
  OilPickupResponseDto,
  OilPumpResponseDto,
  SerpentineBeltResponseDto,
  TransmissionResponseDto,
} from './dto/catalog-item-response.dto';
import {
  CreateBellhousingAdapterDto,
  CreateChassisDto,
  CreateEngineControllerDto,
  CreateEngineDto,
  CreateMountAdapterDto,
  CreateOilPanDto,
  CreateOilPickupDto,
  CreateOilPumpDto,
  CreateSerpentineBeltDto,
  CreateTransmissionDto,
} from './dto/create-catalog-item.dto';
import { CatalogFilter } from './dto/list-catalog-query.dto';
import {
  UpdateBellhousingAdapterDto,
  UpdateChassisDto,
  UpdateEngineControllerDto,
  UpdateEngineDto,
  UpdateMountAdapterDto,
  UpdateOilPanDto,
  UpdateOilPickupDto,
  UpdateOilPumpDto,
  UpdateSerpentineBeltDto,
  UpdateTransmissionDto,
} from './dto/update-catalog-item.dto';

export type { CatalogKind };

/** Body fields that are stored beside the spec rather than in it. */
export type CatalogExtras = Record<string, unknown>;

export interface CatalogKindDefinition<E extends CatalogItem = CatalogItem> {
  kind: CatalogKind;
  /** Singular words for messages and OpenAPI: "oil pan". */
  singular: string;
  entity: Type<E>;
  createDto: Type<object>;
  updateDto: Type<object>;
  responseDto: Type<CatalogItemResponseDto>;
  /** Query filter → indexed column. */
  filters: Partial<Record<CatalogFilter, string>>;
  /** Body fields that are not part of the spec. */
  extraFields: string[];
  /** The indexed copies of spec fields, plus the extras' columns. */
  columns(spec: ObjectLiteral, extras: CatalogExtras): ObjectLiteral;
  /** Spec fields the server computes from the others on every save; the body may not set them. */
  derive?(spec: ObjectLiteral): ObjectLiteral;
  /** Extra response fields read from the row. */
  present?(row: E): ObjectLiteral;
}

function placementColumns(extras: CatalogExtras): ObjectLiteral {
  if (!('defaultPlacement' in extras)) return {};
  const placement = extras.defaultPlacement as { setbackMm: number; heightMm: number; tiltDeg: number } | null | undefined;
  return {
    defaultSetbackMm: placement?.setbackMm ?? null,
    defaultHeightMm: placement?.heightMm ?? null,
    defaultTiltDeg: placement?.tiltDeg ?? null,
  };
}

export function chassisDefaultPlacement(row: CatalogChassis): { setbackMm: number; heightMm: number; tiltDeg: number } | null {
  if (row.defaultSetbackMm === null || row.defaultHeightMm === null || row.defaultTiltDeg === null) return null;
  return { setbackMm: row.defaultSetbackMm, heightMm: row.defaultHeightMm, tiltDeg: row.defaultTiltDeg };
}

/** Profile and designation of a stock belt, from its ribs and effective length (ISO 9982 style, e.g. 6PK1225). */
export function deriveBeltFields(spec: ObjectLiteral): { profile: 'PK'; designation: string } {
  return { profile: 'PK', designation: formatBeltDesignation(Number(spec.ribs), Number(spec.effectiveLengthMm)) };
}

export const CATALOG_KINDS: Record<CatalogKind, CatalogKindDefinition> = {
  engines: {
    kind: 'engines',
    singular: 'engine',
    entity: CatalogEngine,
    createDto: CreateEngineDto,
    updateDto: UpdateEngineDto,
    responseDto: EngineResponseDto,
    filters: { bellPattern: 'bellPattern', railPattern: 'railPattern' },
    extraFields: [],
    columns: (spec) => ({ bellPattern: spec.bellPattern, railPattern: spec.panRail.pattern }),
  },
  'oil-pans': {
    kind: 'oil-pans',
    singular: 'oil pan',
    entity: CatalogOilPan,
    createDto: CreateOilPanDto,
    updateDto: UpdateOilPanDto,
    responseDto: OilPanResponseDto,
    filters: { railPattern: 'railPattern', sumpPosition: 'sumpPosition', pickupMount: 'pickupMount' },
    extraFields: [],
    columns: (spec) => ({ railPattern: spec.railPattern, sumpPosition: spec.sumpPosition, pickupMount: spec.pickupMount }),
  },
  'oil-pickups': {
    kind: 'oil-pickups',
    singular: 'oil pickup',
    entity: CatalogOilPickup,
    createDto: CreateOilPickupDto,
    updateDto: UpdateOilPickupDto,
    responseDto: OilPickupResponseDto,
    filters: { sumpPosition: 'sumpPosition', pickupMount: 'pickupMount', pumpInlet: 'pumpInlet' },
    extraFields: [],
    columns: (spec) => ({ sumpPosition: spec.sumpPosition, pickupMount: spec.mount, pumpInlet: spec.pumpInlet }),
  },
  'oil-pumps': {
    kind: 'oil-pumps',
    singular: 'oil pump',
    entity: CatalogOilPump,
    createDto: CreateOilPumpDto,
    updateDto: UpdateOilPumpDto,
    responseDto: OilPumpResponseDto,
    filters: { pumpInlet: 'pumpInlet' },
    extraFields: [],
    columns: (spec) => ({ pumpInlet: spec.inlet }),
  },
  transmissions: {
    kind: 'transmissions',
    singular: 'transmission',
    entity: CatalogTransmission,
    createDto: CreateTransmissionDto,
    updateDto: UpdateTransmissionDto,
    responseDto: TransmissionResponseDto,
    filters: { bellPattern: 'bellPattern' },
    extraFields: [],
    columns: (spec) => ({ bellPattern: spec.bellPattern }),
  },
  chassis: {
    kind: 'chassis',
    singular: 'chassis',
    entity: CatalogChassis,
    createDto: CreateChassisDto,
    updateDto: UpdateChassisDto,
    responseDto: ChassisResponseDto,
    filters: {},
    extraFields: ['defaultPlacement'],
    columns: (_spec, extras) => placementColumns(extras),
    present: (row) => ({ defaultPlacement: chassisDefaultPlacement(row as CatalogChassis) }),
  },
  controllers: {
    kind: 'controllers',
    singular: 'engine controller',
    entity: CatalogEngineController,
    createDto: CreateEngineControllerDto,
    updateDto: UpdateEngineControllerDto,
    responseDto: EngineControllerResponseDto,
    filters: {},
    extraFields: [],
    columns: () => ({}),
  },
  'mount-adapters': {
    kind: 'mount-adapters',
    singular: 'mount adapter',
    entity: CatalogMountAdapter,
    createDto: CreateMountAdapterDto,
    updateDto: UpdateMountAdapterDto,
    responseDto: MountAdapterResponseDto,
    filters: {},
    extraFields: [],
    columns: () => ({}),
  },
  'bellhousing-adapters': {
    kind: 'bellhousing-adapters',
    singular: 'bellhousing adapter',
    entity: CatalogBellhousingAdapter,
    createDto: CreateBellhousingAdapterDto,
    updateDto: UpdateBellhousingAdapterDto,
    responseDto: BellhousingAdapterResponseDto,
    filters: { enginePattern: 'enginePattern', transmissionPattern: 'transmissionPattern' },
    extraFields: [],
    columns: (spec) => ({ enginePattern: spec.enginePattern, transmissionPattern: spec.transmissionPattern }),
  },
  belts: {
    kind: 'belts',
    singular: 'serpentine belt',
    entity: CatalogSerpentineBelt,
    createDto: CreateSerpentineBeltDto,
    updateDto: UpdateSerpentineBeltDto,
    responseDto: SerpentineBeltResponseDto,
    filters: { ribs: 'ribs' },
    extraFields: [],
    columns: (spec) => ({ ribs: spec.ribs }),
    derive: deriveBeltFields,
  },
};
