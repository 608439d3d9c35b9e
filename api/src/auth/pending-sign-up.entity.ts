import { Column, Entity, PrimaryColumn } from 'typeorm';
import { OneTimeLinkColumns } from './one-time-link.columns';

/** A sign-up waiting for its e-mail link to be opened (see SignUpService). */
@Entity('pending_sign_ups')
export class PendingSignUp extends OneTimeLinkColumns {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120 })
  shopName: string;

  /** The zone the person's browser reported at sign-up, for the new shop (see Shop.timeZone). */
  @Column({ type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  @Column({ type: 'varchar', length: 100 })
  passwordHash: string;
}
