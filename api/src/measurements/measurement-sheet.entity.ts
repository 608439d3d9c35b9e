import type { MeasurementPoint } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

/** The measurement points of a chassis model, per shop: generated from the catalog chassis, editable. */
@Entity('measurement_templates')
@Index('uq_measurement_templates_chassis', ['shopId', 'chassisId'], { unique: true })
export class MeasurementTemplate {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'char', length: 36 }) chassisId: string;
  @Column({ type: 'json' }) points: MeasurementPoint[];
  @Column({ type: 'char', length: 36, nullable: true }) updatedById: string | null;
  @UpdateDateColumn({ type: 'datetime', precision: 3 }) updatedAt: Date;
}

/** One project's sheet: the values live in measurement_values; sign-off here. */
@Entity('measurement_sheets')
@Index('uq_measurement_sheets_project', ['shopId', 'projectId'], { unique: true })
export class MeasurementSheet {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'char', length: 36 }) projectId: string;
  @Column({ type: 'datetime', precision: 3, nullable: true }) signedOffAt: Date | null;
  @Column({ type: 'char', length: 36, nullable: true }) signedOffById: string | null;
  @CreateDateColumn({ type: 'datetime', precision: 3 }) createdAt: Date;
}

@Entity('measurement_values')
@Index('uq_measurement_values_point', ['sheetId', 'pointId'], { unique: true })
export class MeasurementValue {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'char', length: 36 }) sheetId: string;
  @Column({ type: 'varchar', length: 80 }) pointId: string;
  /** Millimetres, or degrees for an angle. */
  @Column({ type: 'decimal', precision: 10, scale: 2, transformer: decimalTransformer }) value: number;
  @Column({ type: 'decimal', precision: 8, scale: 2, nullable: true, transformer: decimalTransformer }) tolerance: number | null;
  @Column({ type: 'varchar', length: 500, nullable: true }) note: string | null;
  @Column({ type: 'char', length: 36 }) measuredById: string;
  @Column({ type: 'varchar', length: 120 }) measuredByName: string;
  @Column({ type: 'datetime', precision: 3 }) measuredAt: Date;
  /** 1 for the point's first reading, one more on every change: a save names the version it replaces. */
  @Column({ type: 'int', default: 1 }) version: number;
}

export type SheetEventKind = 'value' | 'sign-off';

/** Every change of a value (who, when, old, new, and the reason after sign-off) and every sign-off. */
@Entity('measurement_sheet_events')
@Index('ix_measurement_sheet_events_sheet', ['sheetId', 'at'])
export class MeasurementSheetEvent {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'char', length: 36 }) sheetId: string;
  @Column({ type: 'varchar', length: 16 }) kind: SheetEventKind;
  @Column({ type: 'varchar', length: 80, nullable: true }) pointId: string | null;
  @Column({ type: 'decimal', precision: 10, scale: 2, nullable: true, transformer: decimalTransformer }) oldValue: number | null;
  @Column({ type: 'decimal', precision: 10, scale: 2, nullable: true, transformer: decimalTransformer }) newValue: number | null;
  @Column({ type: 'varchar', length: 500, nullable: true }) reason: string | null;
  @Column({ type: 'char', length: 36 }) byId: string;
  @Column({ type: 'varchar', length: 120 }) byName: string;
  @Column({ type: 'datetime', precision: 3 }) at: Date;
}

export type PhotoStatus = 'accepted' | 'pending';

/** A stored photo: the file lives in the storage service under `storageKey` (a generated name). */
@Entity('measurement_photos')
@Index('ix_measurement_photos_sheet', ['sheetId', 'createdAt'])
export class MeasurementPhoto {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'char', length: 36 }) sheetId: string;
  @Column({ type: 'char', length: 36 }) projectId: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) pointId: string | null;
  @Column({ type: 'varchar', length: 80 }) storageKey: string;
  @Column({ type: 'varchar', length: 20 }) contentType: string;
  @Column({ type: 'int' }) bytes: number;
  @Column({ type: 'int' }) widthPx: number;
  @Column({ type: 'int' }) heightPx: number;
  @Column({ type: 'varchar', length: 16 }) status: PhotoStatus;
  @Column({ type: 'char', length: 36 }) uploadedById: string;
  @Column({ type: 'varchar', length: 120 }) uploadedByName: string;
  @CreateDateColumn({ type: 'datetime', precision: 3 }) createdAt: Date;
}

/** The shop's limit for flagging a measured value far from the catalog. */
@Entity('measurement_settings')
export class MeasurementSettings {
  @PrimaryColumn({ type: 'char', length: 36 }) shopId: string;
  @Column({ type: 'decimal', precision: 8, scale: 2, transformer: decimalTransformer }) deviationLimitMm: number;
  @Column({ type: 'decimal', precision: 6, scale: 2, transformer: decimalTransformer }) deviationLimitDeg: number;
}

export const MEASUREMENT_ENTITIES = [MeasurementTemplate, MeasurementSheet, MeasurementValue, MeasurementSheetEvent, MeasurementPhoto, MeasurementSettings];
