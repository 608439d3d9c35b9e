import type { ChassisInput, CheckStatus, FitReport, FitSettings, FitSpec } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';
import type { User } from '../users/user.entity';

/** Where the placement of a run came from. */
export type PlacementSource = 'project' | 'proposed' | 'chassis-default';
export const PLACEMENT_SOURCES: PlacementSource[] = ['project', 'proposed', 'chassis-default'];

export interface FitReportInputs {
  spec: FitSpec;
  /** The shop's overrides as they were at the run; `report.settings` holds the resolved thresholds. */
  settingsOverrides: Partial<FitSettings>;
  placementSource: PlacementSource;
  /** Inputs the API filled in or left out, in words (e.g. a target power taken from the engine). */
  notes: string[];
  /** Per measured chassis input, where its value came from (sheet: who and when; catalog) and whether it is flagged. Absent on reports run before measurement sheets. */
  chassisInputs?: ChassisInput[];
}

/** A stored fit report: the whole input and the engine's answer, so a quote can name the run it was built on. */
@Entity('fit_reports')
@Index('ix_fit_reports_project_created', ['shopId', 'projectId', 'createdAt'])
export class FitReportRecord {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'char', length: 36, nullable: true })
  createdById: string | null;

  /** The author, joined in by the service when it reads (see FitReportsService); null once that user is gone. Not a column. */
  createdBy?: Pick<User, 'name'> | null;

  @Column({ type: 'varchar', length: 20 })
  engineVersion: string;

  @Column({ type: 'decimal', precision: 8, scale: 2, transformer: decimalTransformer })
  placementSetbackMm: number;

  @Column({ type: 'decimal', precision: 8, scale: 2, transformer: decimalTransformer })
  placementHeightMm: number;

  @Column({ type: 'decimal', precision: 6, scale: 2, transformer: decimalTransformer })
  placementTiltDeg: number;

  @Column({ type: 'varchar', length: 16 })
  placementSource: PlacementSource;

  @Column({ type: 'json' })
  inputsSnapshot: FitReportInputs;

  @Column({ type: 'json' })
  results: FitReport;

  @Column({ type: 'int' })
  totalCount: number;

  @Column({ type: 'int' })
  okCount: number;

  @Column({ type: 'int' })
  tightCount: number;

  @Column({ type: 'int' })
  failsCount: number;

  @Column({ type: 'int' })
  unknownCount: number;

  @Column({ type: 'varchar', length: 8 })
  worstStatus: CheckStatus;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
