import { Column, CreateDateColumn } from 'typeorm';

/** The columns of a link mailed to someone that works once, for a limited time (password reset, sign-up). */
export abstract class OneTimeLinkColumns {
  /** sha256 of the token in the link. */
  @Column({ type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
