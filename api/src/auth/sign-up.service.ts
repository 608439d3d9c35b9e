import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { canonicalTimeZone } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, IsNull, MoreThan } from 'typeorm';
import { EnvironmentVariables } from '../config/env.validation';
import { MailTemplates } from '../mail/mail-templates';
import { MailQueue } from '../mail/mail-queue.service';
import { MembershipsService } from '../memberships/memberships.service';
import { ShopsService } from '../shops/shops.service';
import { normalizeEmail, UsersService } from '../users/users.service';
import { SIGN_UP_LINK_TTL_MS } from './auth.constants';
import { AuthErrors } from './auth.errors';
import { SignUpDto } from './dto/sign-up.dto';
import { PasswordHasher } from './password-hasher';
import { PendingSignUp } from './pending-sign-up.entity';
import { IssuedSession, SessionsService } from './sessions.service';
import { hashToken, newOpaqueToken } from './token-hash';

/**
 * Sign-up answers the same whether or not the address has an account (like password reset), so nobody can
 * probe who is registered: a new address gets a link that creates the shop; a registered one gets a notice.
 */
@Injectable()
export class SignUpService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
    private readonly mail: MailQueue,
    private readonly config: ConfigService<EnvironmentVariables, true>,
    private readonly passwords: PasswordHasher,
  ) {}

  async request(input: SignUpDto): Promise<void> {
    const email = normalizeEmail(input.email);
    // Hashed on both paths, so the answer takes as long either way.
    const passwordHash = await this.passwords.hash(input.password);
    const existing = await this.users.findByEmail(email);
    if (existing) {
      await this.mail.enqueue(this.dataSource.manager, `sign-up-notice:${randomUUID()}`, null, {
        to: existing.email,
        ...MailTemplates.signUpAlreadyRegistered({
          name: existing.name,
          signInLink: this.link('/sign-in'),
          resetLink: this.link('/reset-password'),
        }),
      });
      return;
    }
    const { token, hash } = newOpaqueToken();
    const id = randomUUID();
    const link = this.link(`/sign-up?token=${encodeURIComponent(token)}`);
    // The pending sign-up and its mail are stored together; the background worker sends the link.
    await this.dataSource.transaction(async (manager) => {
      await manager.insert(PendingSignUp, {
        id,
        email,
        name: input.name.trim(),
        shopName: input.shopName.trim(),
        timeZone: input.timeZone ? canonicalTimeZone(input.timeZone) : 'UTC',
        passwordHash,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + SIGN_UP_LINK_TTL_MS),
        usedAt: null,
      });
      await this.mail.enqueue(manager, `sign-up:${id}`, null, { to: email, ...MailTemplates.signUpLink({ name: input.name.trim(), shopName: input.shopName.trim(), link }) });
    });
  }

  /** Opens the e-mailed link: the person, their one-person shop and the owner membership, in one transaction. */
  async confirm(token: string): Promise<IssuedSession> {
    return this.dataSource.transaction(async (manager) => {
      const pending = await manager.findOne(PendingSignUp, { where: { tokenHash: hashToken(token) } });
      if (!pending) throw AuthErrors.signUpLinkInvalid();
      const now = new Date();
      const used = await manager.update(PendingSignUp, { id: pending.id, usedAt: IsNull(), expiresAt: MoreThan(now) }, { usedAt: now });
      if (used.affected !== 1) throw AuthErrors.signUpLinkInvalid();
      // Another link for the same address may have been opened first: users.create refuses it (409 email_taken).
      const user = await this.users.create(manager, { email: pending.email, name: pending.name, passwordHash: pending.passwordHash });
      const shop = await this.shops.create(manager, pending.shopName, pending.timeZone);
      const membership = await this.memberships.create(manager, { shopId: shop.id, userId: user.id, role: 'owner' });
      return this.sessions.issue(membership.id, manager);
    });
  }

  private link(path: string): string {
    return `${this.config.get('APP_URL', { infer: true }).replace(/\/$/, '')}${path}`;
  }
}
