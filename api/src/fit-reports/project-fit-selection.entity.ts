import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

export type DriveshaftMaterial = 'steel' | 'aluminum';

/**
 * The parts and figures a project's fit check uses beyond the project's own engine, chassis and
 * transmission: one row per project. Part ids point into the shop's catalog.
 */
@Entity('project_fit_selections')
export class ProjectFitSelection {
  @PrimaryColumn({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36, nullable: true })
  oilPanId: string | null;

  @Column({ type: 'char', length: 36, nullable: true })
  oilPickupId: string | null;

  @Column({ type: 'char', length: 36, nullable: true })
  oilPumpId: string | null;

  @Column({ type: 'char', length: 36, nullable: true })
  controllerId: string | null;

  /** One of the engine spec's accessoryDrives[].id. */
  @Column({ type: 'varchar', length: 40, nullable: true })
  accessoryDriveId: string | null;

  /** The catalog mount adapter used on both engine mounts. */
  @Column({ type: 'char', length: 36, nullable: true })
  mountAdapterId: string | null;

  @Column({ type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimalTransformer })
  driveshaftOuterDiameterMm: number | null;

  @Column({ type: 'decimal', precision: 6, scale: 3, nullable: true, transformer: decimalTransformer })
  driveshaftWallMm: number | null;

  @Column({ type: 'varchar', length: 16, nullable: true })
  driveshaftMaterial: DriveshaftMaterial | null;

  @Column({ type: 'decimal', precision: 7, scale: 1, nullable: true, transformer: decimalTransformer })
  driveshaftLengthMm: number | null;

  @Column({ type: 'decimal', precision: 5, scale: 1, nullable: true, transformer: decimalTransformer })
  driveshaftSuspensionGrowthMm: number | null;

  @Column({ type: 'decimal', precision: 5, scale: 2, nullable: true, transformer: decimalTransformer })
  timingSetAdvanceDeg: number | null;

  /** Driveline figures of the vehicle that the project's goals do not hold. */
  @Column({ type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: decimalTransformer })
  topSpeedKph: number | null;

  @Column({ type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: decimalTransformer })
  tireDiameterMm: number | null;

  @Column({ type: 'decimal', precision: 5, scale: 3, nullable: true, transformer: decimalTransformer })
  axleRatio: number | null;

  @Column({ type: 'decimal', precision: 7, scale: 1, nullable: true, transformer: decimalTransformer })
  continuousPowerKw: number | null;

  @Column({ type: 'char', length: 36, nullable: true })
  updatedById: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
