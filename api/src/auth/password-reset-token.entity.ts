import { Column, Entity, PrimaryColumn } from 'typeorm';
import { OneTimeLinkColumns } from './one-time-link.columns';

@Entity('password_reset_tokens')
export class PasswordResetToken extends OneTimeLinkColumns {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  userId: string;
}
