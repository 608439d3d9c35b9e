import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

@Entity('users')
export class User {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  /** Stored lower-cased; unique across Swapwright. */
  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 100 })
  passwordHash: string;

  /** Carried in every access token; bumped when the password is reset, which ends every session at once. */
  @Column({ type: 'int', unsigned: true, default: 0 })
  sessionVersion: number;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
