import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, IsNull, MoreThan, Repository } from 'typeorm';
import { hashPassword } from '../auth/auth.service';
import { SessionResponseDto } from '../auth/dto/session-response.dto';
import { escapeHtml } from '../auth/password-reset.service';
import { SessionsService } from '../auth/sessions.service';
import { hashToken, newOpaqueToken } from '../auth/token-hash';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { Customer } from '../customers/customer.entity';
import { MailService } from '../mail/mail.service';
import { MembershipsService } from '../memberships/memberships.service';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { normalizeEmail, UsersService } from '../users/users.service';
import { AcceptInvitationDto } from './dto/accept-invitation.dto';
import { CreateInvitationDto } from './dto/create-invitation.dto';
import { Invitation } from './invitation.entity';
import { InvitationErrors } from './invitations.errors';

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

@Injectable()
export class InvitationsService {
  private readonly scoped: TenantRepository<Invitation>;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Invitation) invitations: Repository<Invitation>,
    private readonly users: UsersService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
    private readonly mail: MailService,
    private readonly config: ConfigService<EnvironmentVariables, true>,
  ) {
    this.scoped = new TenantRepository(invitations);
  }

  list(user: AuthUser): Promise<Invitation[]> {
    return this.scoped.repository.find({ where: this.scoped.where(user), order: { createdAt: 'DESC' } });
  }

  async create(user: AuthUser, input: CreateInvitationDto): Promise<Invitation> {
    const email = normalizeEmail(input.email);
    if (input.customerId && input.role !== 'customer') throw InvitationErrors.customerOnlyForCustomerRole();
    if (input.customerId) {
      const customer = await this.dataSource.manager.findOne(Customer, { where: { id: input.customerId, shopId: user.shopId } });
      if (!customer) throw InvitationErrors.customerNotFound();
      if (customer.userId) throw InvitationErrors.customerHasLogin();
    }
    if (await this.memberships.isMember(user.shopId, email)) throw InvitationErrors.alreadyMember();
    const { token, hash } = newOpaqueToken();
    const invitation = this.scoped.repository.create({
      id: randomUUID(),
      shopId: user.shopId,
      email,
      role: input.role,
      customerId: input.customerId ?? null,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
      acceptedAt: null,
      invitedByUserId: user.userId,
    });
    await this.scoped.repository.insert(invitation);
    const shop = await this.dataSource.manager.findOneByOrFail(Shop, { id: user.shopId });
    await this.sendInvitation(email, shop.name, user.name, input.role, token);
    return this.scoped.repository.findOneByOrFail({ id: invitation.id });
  }

  /** Creates the login and the membership (and links the customer record) in one transaction. */
  async accept(input: AcceptInvitationDto): Promise<SessionResponseDto> {
    const passwordHash = await hashPassword(input.password);
    return this.dataSource.transaction(async (manager) => {
      const now = new Date();
      const invitation = await manager.findOne(Invitation, { where: { tokenHash: hashToken(input.token) } });
      if (!invitation) throw InvitationErrors.invalid();
      const claimed = await manager.update(
        Invitation,
        { id: invitation.id, acceptedAt: IsNull(), expiresAt: MoreThan(now) },
        { acceptedAt: now },
      );
      if (claimed.affected !== 1) throw InvitationErrors.invalid();
      if (await manager.exists(User, { where: { email: invitation.email } })) throw InvitationErrors.emailTaken();
      const user = await this.users.create(manager, { email: invitation.email, name: input.name, passwordHash });
      const membership = await this.memberships.create(manager, {
        shopId: invitation.shopId,
        userId: user.id,
        role: invitation.role,
      });
      if (invitation.customerId) {
        const linked = await manager.update(
          Customer,
          { id: invitation.customerId, shopId: invitation.shopId, userId: IsNull() },
          { userId: user.id },
        );
        if (linked.affected !== 1) throw InvitationErrors.customerHasLogin();
      }
      return this.sessions.issue(membership.id, manager);
    });
  }

  private async sendInvitation(email: string, shopName: string, inviter: string, role: string, token: string) {
    const appUrl = this.config.get('APP_URL', { infer: true }).replace(/\/$/, '');
    const link = `${appUrl}/accept-invite?token=${encodeURIComponent(token)}`;
    await this.mail.sendOrLog({
      to: email,
      subject: `${shopName} invites you to Swapwright`,
      text:
        `${inviter} invites you to join ${shopName} on Swapwright as ${role}.\n\n` +
        `Open this link within 7 days to choose your name and password:\n\n${link}\n`,
      html:
        `<p>${escapeHtml(inviter)} invites you to join <strong>${escapeHtml(shopName)}</strong> on Swapwright as ${escapeHtml(role)}.</p>` +
        `<p><a href="${link}">Accept the invitation</a> within 7 days to choose your name and password.</p>`,
    });
  }
}
