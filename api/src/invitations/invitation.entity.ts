import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { Role } from '../common/roles/role';

@Entity('invitations')
export class Invitation {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  /** For role customer: the customer record the new login will see the projects of. */
  @Column({ type: 'char', length: 36, nullable: true })
  customerId: string | null;

  /** sha256 of the token mailed out; the token itself is never stored. */
  @Column({ type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  acceptedAt: Date | null;

  @Column({ type: 'char', length: 36 })
  invitedByUserId: string;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
