import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** One rate-limit window of one client and route, shared by every API instance (see mariadb-throttler.storage.ts). */
@Entity('throttle_counters')
export class ThrottleCounter {
  /** sha256 of the throttler's key (client and route) and the throttler's name */
  @PrimaryColumn({ type: 'char', length: 64 })
  id: string;

  @Column({ type: 'int', unsigned: true })
  hits: number;

  @Index('idx_throttle_counters_expires')
  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;
}
