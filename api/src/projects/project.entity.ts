import type { ProjectStatus, SwapUse as ProjectUse } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';
import { Customer } from '../customers/customer.entity';

export { PROJECT_STATUSES, SWAP_USES as PROJECT_USES, type ProjectStatus, type SwapUse as ProjectUse } from '@swapwright/shared';

@Entity('projects')
@Index('ix_projects_shop_updated', ['shopId', 'updatedAt'])
export class Project {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  customerId: string;

  @ManyToOne(() => Customer, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'customerId' })
  customer?: Customer;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'varchar', length: 20, default: 'intake' })
  status: ProjectStatus;

  @Column({ type: 'varchar', length: 500, default: '' })
  vehicleDescription: string;

  // Catalog references; plain ids until the catalog tables exist.
  @Column({ type: 'varchar', length: 36, nullable: true })
  chassisModelId: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  engineProfileId: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  transmissionId: string | null;

  @Column({ type: 'varchar', length: 16, default: 'street' })
  goalUse: ProjectUse;

  @Column({ type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: decimalTransformer })
  goalTargetPowerKw: number | null;

  @Column({ type: 'int', nullable: true })
  goalRevLimitRpm: number | null;

  @Column({ type: 'bigint', nullable: true, transformer: decimalTransformer })
  goalBudgetCents: number | null;

  @Column({ type: 'decimal', precision: 8, scale: 2, nullable: true, transformer: decimalTransformer })
  placementSetbackMm: number | null;

  @Column({ type: 'decimal', precision: 8, scale: 2, nullable: true, transformer: decimalTransformer })
  placementHeightMm: number | null;

  @Column({ type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimalTransformer })
  placementTiltDeg: number | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
