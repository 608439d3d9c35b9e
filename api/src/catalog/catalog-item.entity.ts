import type {
  BellhousingAdapterSpec,
  ChassisSpec,
  EngineControllerSpec,
  EngineSpec,
  MountAdapterSpec,
  OilPanSpec,
  OilPickupSpec,
  OilPumpSpec,
  SerpentineBeltSpec,
  TransmissionSpec,
} from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

/**
 * One shop's catalog: a table per part kind, each row holding the shared part spec as JSON (its `id` is the
 * row id) plus a few indexed copies of spec fields for filtering. The spec stays the source of truth:
 * the copies are rewritten from it on every save.
 */
export abstract class CatalogItem<TSpec extends { id: string; name: string } = { id: string; name: string }> {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'json' })
  spec: TSpec;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

@Entity('catalog_engines')
@Index('ix_catalog_engines_shop_name', ['shopId', 'name'])
export class CatalogEngine extends CatalogItem<EngineSpec> {
  @Index('ix_catalog_engines_bell')
  @Column({ type: 'varchar', length: 40 })
  bellPattern: string;

  @Index('ix_catalog_engines_rail')
  @Column({ type: 'varchar', length: 40 })
  railPattern: string;
}

@Entity('catalog_oil_pans')
@Index('ix_catalog_oil_pans_shop_name', ['shopId', 'name'])
export class CatalogOilPan extends CatalogItem<OilPanSpec> {
  @Index('ix_catalog_oil_pans_rail')
  @Column({ type: 'varchar', length: 40 })
  railPattern: string;

  @Index('ix_catalog_oil_pans_sump')
  @Column({ type: 'varchar', length: 8 })
  sumpPosition: OilPanSpec['sumpPosition'];

  @Column({ type: 'varchar', length: 16 })
  pickupMount: OilPanSpec['pickupMount'];
}

@Entity('catalog_oil_pickups')
@Index('ix_catalog_oil_pickups_shop_name', ['shopId', 'name'])
export class CatalogOilPickup extends CatalogItem<OilPickupSpec> {
  @Index('ix_catalog_oil_pickups_sump')
  @Column({ type: 'varchar', length: 8 })
  sumpPosition: OilPickupSpec['sumpPosition'];

  @Column({ type: 'varchar', length: 16 })
  pickupMount: OilPickupSpec['mount'];

  @Index('ix_catalog_oil_pickups_inlet')
  @Column({ type: 'varchar', length: 40 })
  pumpInlet: string;
}

@Entity('catalog_oil_pumps')
@Index('ix_catalog_oil_pumps_shop_name', ['shopId', 'name'])
export class CatalogOilPump extends CatalogItem<OilPumpSpec> {
  @Index('ix_catalog_oil_pumps_inlet')
  @Column({ type: 'varchar', length: 40 })
  pumpInlet: string;
}

@Entity('catalog_transmissions')
@Index('ix_catalog_transmissions_shop_name', ['shopId', 'name'])
export class CatalogTransmission extends CatalogItem<TransmissionSpec> {
  @Index('ix_catalog_transmissions_bell')
  @Column({ type: 'varchar', length: 40 })
  bellPattern: string;
}

@Entity('catalog_chassis')
@Index('ix_catalog_chassis_shop_name', ['shopId', 'name'])
export class CatalogChassis extends CatalogItem<ChassisSpec> {
  /** Where the stock engine sat: the starting placement when a project has none of its own. */
  @Column({ type: 'decimal', precision: 8, scale: 2, nullable: true, transformer: decimalTransformer })
  defaultSetbackMm: number | null;

  @Column({ type: 'decimal', precision: 8, scale: 2, nullable: true, transformer: decimalTransformer })
  defaultHeightMm: number | null;

  @Column({ type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimalTransformer })
  defaultTiltDeg: number | null;
}

@Entity('catalog_controllers')
@Index('ix_catalog_controllers_shop_name', ['shopId', 'name'])
export class CatalogEngineController extends CatalogItem<EngineControllerSpec> {}

@Entity('catalog_mount_adapters')
@Index('ix_catalog_mount_adapters_shop_name', ['shopId', 'name'])
export class CatalogMountAdapter extends CatalogItem<MountAdapterSpec> {}

@Entity('catalog_bellhousing_adapters')
@Index('ix_catalog_bellhousing_adapters_shop_name', ['shopId', 'name'])
export class CatalogBellhousingAdapter extends CatalogItem<BellhousingAdapterSpec> {
  @Index('ix_catalog_bellhousing_adapters_engine')
  @Column({ type: 'varchar', length: 40 })
  enginePattern: string;

  @Index('ix_catalog_bellhousing_adapters_transmission')
  @Column({ type: 'varchar', length: 40 })
  transmissionPattern: string;
}

@Entity('catalog_belts')
@Index('ix_catalog_belts_shop_name', ['shopId', 'name'])
export class CatalogSerpentineBelt extends CatalogItem<SerpentineBeltSpec> {
  @Index('ix_catalog_belts_ribs')
  @Column({ type: 'tinyint', unsigned: true })
  ribs: number;
}

export const CATALOG_ENTITIES = [
  CatalogEngine,
  CatalogOilPan,
  CatalogOilPickup,
  CatalogOilPump,
  CatalogTransmission,
  CatalogChassis,
  CatalogEngineController,
  CatalogMountAdapter,
  CatalogBellhousingAdapter,
  CatalogSerpentineBelt,
];
