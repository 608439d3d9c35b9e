import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, IsNull, MoreThan } from 'typeorm';
import { MailTemplates } from '../mail/mail-templates';
import { MailQueue } from '../mail/mail-queue.service';
import { UsersService } from '../users/users.service';
import { PASSWORD_RESET_TTL_MS } from './auth.constants';
import { AuthErrors } from './auth.errors';
import { PasswordHasher } from './password-hasher';
import { PasswordResetToken } from './password-reset-token.entity';
import { SessionsService } from './sessions.service';
import { hashToken, newOpaqueToken } from './token-hash';

@Injectable()
export class PasswordResetService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
    private readonly mail: MailQueue,
    private readonly sessions: SessionsService,
    private readonly config: ConfigService<EnvironmentVariables, true>,
    private readonly passwords: PasswordHasher,
  ) {}

  /** Always succeeds from the caller's point of view, so nobody can probe which e-mails have accounts. */
  async request(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user) return;
    const { token, hash } = newOpaqueToken();
    const appUrl = this.config.get('APP_URL', { infer: true }).replace(/\/$/, '');
    const link = `${appUrl}/reset-password?token=${encodeURIComponent(token)}`;
    const id = randomUUID();
    await this.dataSource.transaction(async (manager) => {
      // Only the newest link works.
      await manager.update(PasswordResetToken, { userId: user.id, usedAt: IsNull() }, { usedAt: new Date() });
      await manager.insert(PasswordResetToken, {
        id,
        userId: user.id,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + PASSWORD_RESET_TTL_MS),
        usedAt: null,
      });
      // The link is mailed by the background worker; it is stored with the token, so it goes out exactly when the token exists.
      await this.mail.enqueue(manager, `password-reset:${id}`, null, { to: user.email, ...MailTemplates.passwordReset({ name: user.name, link }) });
    });
  }

  async confirm(token: string, password: string): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (manager) => {
      const stored = await manager.findOne(PasswordResetToken, { where: { tokenHash: hashToken(token) } });
      if (!stored) throw AuthErrors.resetTokenInvalid();
      const now = new Date();
      const used = await manager.update(
        PasswordResetToken,
        { id: stored.id, usedAt: IsNull(), expiresAt: MoreThan(now) },
        { usedAt: now },
      );
      if (used.affected !== 1) throw AuthErrors.resetTokenInvalid();
      await this.users.setPasswordHash(manager, stored.userId, passwordHash);
      // A new password ends every open session.
      await this.sessions.revokeAllForUser(stored.userId, manager);
    });
  }
}
