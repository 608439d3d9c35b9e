import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { EntityManager, Repository } from 'typeorm';
import { User } from './user.entity';
import { UserErrors } from './users.errors';

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: normalizeEmail(email) } });
  }

  findById(id: string): Promise<User | null> {
    return this.users.findOne({ where: { id } });
  }

  emailTaken(email: string, manager: EntityManager = this.users.manager): Promise<boolean> {
    return manager.exists(User, { where: { email: normalizeEmail(email) } });
  }

  /** Inside the caller's transaction: sign-up and invitation acceptance create more rows with it. */
  async create(manager: EntityManager, input: { email: string; name: string; passwordHash: string }): Promise<User> {
    const email = normalizeEmail(input.email);
    if (await this.emailTaken(email, manager)) throw UserErrors.emailTaken();
    const user = manager.create(User, { id: randomUUID(), email, name: input.name.trim(), passwordHash: input.passwordHash });
    return manager.save(user);
  }

  /** A new password also bumps the session version: every access token issued before stops working. */
  async setPasswordHash(manager: EntityManager, userId: string, passwordHash: string): Promise<void> {
    await manager.update(User, { id: userId }, { passwordHash, sessionVersion: () => '`sessionVersion` + 1' });
  }

  /** The version access tokens must carry; null when the user is gone. */
  async sessionVersionOf(userId: string, manager: EntityManager = this.users.manager): Promise<number | null> {
    const user = await manager.findOne(User, { where: { id: userId }, select: { id: true, sessionVersion: true } });
    return user ? user.sessionVersion : null;
  }
}
