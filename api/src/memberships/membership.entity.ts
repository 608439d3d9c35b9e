import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, Unique } from 'typeorm';
import { Role } from '../common/roles/role';
import { User } from '../users/user.entity';

@Entity('memberships')
@Unique('uq_memberships_shop_user', ['shopId', 'userId'])
export class Membership {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId' })
  user?: User;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
