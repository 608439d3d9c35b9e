import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity('refresh_tokens')
export class RefreshToken {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  userId: string;

  @Column({ type: 'char', length: 36 })
  membershipId: string;

  /** The sign-in this token belongs to, kept across refreshes; access tokens carry it as `sid`. */
  @Column({ type: 'char', length: 36 })
  sessionId: string;

  /** sha256 of the opaque token handed to the client. */
  @Column({ type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  revokedAt: Date | null;

  @Column({ type: 'char', length: 36, nullable: true })
  replacedById: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
