import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, IsNull, MoreThan, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { PasswordHasher } from '../auth/password-hasher';
import { IssuedSession, SessionsService } from '../auth/sessions.service';
import { hashToken, newOpaqueToken } from '../auth/token-hash';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { CustomersService } from '../customers/customers.service';
import { MailTemplates } from '../mail/mail-templates';
import { MailQueue } from '../mail/mail-queue.service';
import { MembershipsService } from '../memberships/memberships.service';
import { ShopsService } from '../shops/shops.service';
import { normalizeEmail, UsersService } from '../users/users.service';
import { AcceptInvitationDto } from './dto/accept-invitation.dto';
import { CreateInvitationDto } from './dto/create-invitation.dto';
import { Invitation } from './invitation.entity';
import { InvitationErrors } from './invitations.errors';

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

/** What the audit log keeps of an invitation (never its token). */
const invitationState = (invitation: Invitation) => ({ email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt.toISOString() });

@Injectable()
export class InvitationsService {
  private readonly scoped: TenantRepository<Invitation>;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Invitation) invitations: Repository<Invitation>,
    private readonly users: UsersService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
    private readonly mail: MailQueue,
    private readonly config: ConfigService<EnvironmentVariables, true>,
    private readonly passwords: PasswordHasher,
    private readonly customers: CustomersService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
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
      const customer = await this.customers.findInShop(user.shopId, input.customerId);
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
    // The invitation, its mail and its audit entry are stored together; the background worker sends the mail.
    await this.dataSource.transaction(async (manager) => {
      await manager.insert(Invitation, invitation);
      await this.mailInvitation(manager, user, invitation, token, `invitation:${invitation.id}`);
      await this.recordInvitation(manager, user, invitation.id, 'invitation.sent', `${email} was invited as ${input.role}.`, null, invitationState(invitation));
    });
    return this.scoped.repository.findOneByOrFail({ id: invitation.id });
  }

  /** A new link (the old one stops working), valid 7 days from now, e-mailed again. */
  async resend(user: AuthUser, id: string): Promise<Invitation> {
    await this.dataSource.transaction(async (manager) => {
      const invitation = await this.lockPending(manager, user, id);
      const before = invitationState(invitation);
      const { token, hash } = newOpaqueToken();
      invitation.tokenHash = hash;
      invitation.expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
      await manager.save(invitation);
      await this.mailInvitation(manager, user, invitation, token, `invitation:${invitation.id}:${hash.slice(0, 16)}`);
      await this.recordInvitation(manager, user, invitation.id, 'invitation.resent', `The invitation of ${invitation.email} was sent again with a new link.`, before, invitationState(invitation));
    });
    return this.scoped.repository.findOneByOrFail({ id });
  }

  /** Withdraws an invitation not accepted yet: its link stops working. */
  async withdraw(user: AuthUser, id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const invitation = await this.lockPending(manager, user, id);
      await this.recordInvitation(manager, user, invitation.id, 'invitation.withdrawn', `The invitation of ${invitation.email} (${invitation.role}) was withdrawn.`, invitationState(invitation), null);
      await manager.delete(Invitation, { id: invitation.id, shopId: user.shopId });
    });
  }

  private async lockPending(manager: EntityManager, user: AuthUser, id: string): Promise<Invitation> {
    const invitation = await manager.findOne(Invitation, { where: { id, shopId: user.shopId }, lock: { mode: 'pessimistic_write' } });
    if (!invitation) throw InvitationErrors.notFound();
    if (invitation.acceptedAt) throw InvitationErrors.alreadyAccepted();
    return invitation;
  }

  private async mailInvitation(manager: EntityManager, user: AuthUser, invitation: Invitation, token: string, idempotencyKey: string): Promise<void> {
    const shop = await this.shops.getCurrent(user);
    await this.mail.enqueue(manager, idempotencyKey, user.shopId, {
      to: invitation.email,
      ...MailTemplates.invitation({ inviter: user.name, shopName: shop.name, role: invitation.role, link: this.acceptLink(token) }),
    });
  }

  private recordInvitation(
    manager: EntityManager,
    user: AuthUser,
    invitationId: string,
    action: string,
    summary: string,
    before: Record<string, unknown> | null,
    after: Record<string, unknown> | null,
  ): Promise<void> {
    return this.audit.record(manager, { shopId: user.shopId, actor: user, kind: 'membership', action, subjectId: invitationId, summary, before, after });
  }

  /** Creates the login and the membership (and links the customer record) in one transaction. */
  async accept(input: AcceptInvitationDto): Promise<IssuedSession> {
    const passwordHash = await this.passwords.hash(input.password);
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
      if (await this.users.emailTaken(invitation.email, manager)) throw InvitationErrors.emailTaken();
      const user = await this.users.create(manager, { email: invitation.email, name: input.name, passwordHash });
      const membership = await this.memberships.create(manager, {
        shopId: invitation.shopId,
        userId: user.id,
        role: invitation.role,
      });
      if (invitation.customerId) {
        const linked = await this.customers.linkLogin(manager, invitation.shopId, invitation.customerId, user.id);
        if (!linked) throw InvitationErrors.customerHasLogin();
      }
      return this.sessions.issue(membership.id, manager);
    });
  }

  private acceptLink(token: string): string {
    const appUrl = this.config.get('APP_URL', { infer: true }).replace(/\/$/, '');
    return `${appUrl}/accept-invite?token=${encodeURIComponent(token)}`;
  }
}
