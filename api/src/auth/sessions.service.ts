import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, IsNull, Not } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { Shop } from '../shops/shop.entity';
import { ShopsService } from '../shops/shops.service';
import { UsersService } from '../users/users.service';
import { ACCESS_TOKEN_TTL_SECONDS, AccessTokenPayload, REFRESH_TOKEN_TTL_MS } from './auth.constants';
import { AuthErrors } from './auth.errors';
import { MemberResolverService } from './member-resolver.service';
import { RefreshToken } from './refresh-token.entity';
import { hashToken, newOpaqueToken } from './token-hash';

/** A signed-in session: its tokens, the member it acts as and that member's shop. */
export interface IssuedSession {
  accessToken: string;
  refreshToken: string;
  expiresIn: number;
  member: AuthUser;
  shop: Shop;
}

@Injectable()
export class SessionsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly members: MemberResolverService,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
  ) {}

  /**
   * A new access token and refresh token for the membership; pass the manager of an open transaction.
   * `sessionId` continues a sign-in (refresh); without it a new session starts.
   */
  async issue(
    membershipId: string,
    manager: EntityManager = this.dataSource.manager,
    sessionId: string = randomUUID(),
  ): Promise<IssuedSession> {
    const user = await this.members.resolve(membershipId, manager);
    if (!user) throw AuthErrors.memberGone();
    const sessionVersion = await this.users.sessionVersionOf(user.userId, manager);
    if (sessionVersion === null) throw AuthErrors.memberGone();
    const shop = await this.shops.getById(user.shopId, manager);
    const refresh = newOpaqueToken();
    await manager.insert(RefreshToken, {
      id: randomUUID(),
      userId: user.userId,
      membershipId: user.membershipId,
      sessionId,
      tokenHash: refresh.hash,
      expiresAt: new Date(Date.now() + REFRESH_TOKEN_TTL_MS),
      revokedAt: null,
      replacedById: null,
    });
    const payload: AccessTokenPayload = { sub: user.userId, mid: user.membershipId, sid: sessionId, sv: sessionVersion };
    const accessToken = await this.jwt.signAsync(payload, { expiresIn: ACCESS_TOKEN_TTL_SECONDS });
    return { accessToken, refreshToken: refresh.token, expiresIn: ACCESS_TOKEN_TTL_SECONDS, member: user, shop };
  }

  /** Exchanges a refresh token for a new session; the presented token stops working. */
  async rotate(refreshToken: string): Promise<IssuedSession> {
    const stored = await this.dataSource.manager.findOne(RefreshToken, { where: { tokenHash: hashToken(refreshToken) } });
    if (!stored) throw AuthErrors.refreshTokenInvalid();
    if (stored.revokedAt) {
      // A rotated token coming back means it was copied: end every session of that user.
      if (stored.replacedById) await this.revokeAllForUser(stored.userId);
      throw AuthErrors.refreshTokenInvalid();
    }
    if (stored.expiresAt.getTime() <= Date.now()) throw AuthErrors.refreshTokenInvalid();
    return this.dataSource.transaction(async (manager) => {
      const session = await this.issue(stored.membershipId, manager, stored.sessionId);
      const replacement = await manager.findOneOrFail(RefreshToken, { where: { tokenHash: hashToken(session.refreshToken) } });
      const result = await manager.update(
        RefreshToken,
        { id: stored.id, revokedAt: IsNull() },
        { revokedAt: new Date(), replacedById: replacement.id },
      );
      // Two refreshes racing with one token: only the first wins.
      if (result.affected !== 1) throw AuthErrors.refreshTokenInvalid();
      return session;
    });
  }

  /**
   * Whether an access token's session still stands: the user's session version is unchanged (no password reset
   * since) and its sign-in was not ended (sign-out, or every session ended after a stolen refresh token).
   * Two indexed lookups per request.
   */
  async isCurrent(payload: Pick<AccessTokenPayload, 'sub' | 'sid' | 'sv'>): Promise<boolean> {
    if (typeof payload.sid !== 'string' || typeof payload.sv !== 'number') return false;
    if ((await this.users.sessionVersionOf(payload.sub)) !== payload.sv) return false;
    // Rotation revokes a token with a replacement; sign-out and "end every session" revoke without one.
    const ended = await this.dataSource.manager.exists(RefreshToken, {
      where: { sessionId: payload.sid, revokedAt: Not(IsNull()), replacedById: IsNull() },
    });
    return !ended;
  }

  /** Ends the sign-in this refresh token belongs to: the refresh token and that session's access tokens. */
  async revoke(refreshToken: string): Promise<void> {
    await this.dataSource.manager.update(
      RefreshToken,
      { tokenHash: hashToken(refreshToken), revokedAt: IsNull() },
      { revokedAt: new Date() },
    );
  }

  async revokeAllForUser(userId: string, manager: EntityManager = this.dataSource.manager): Promise<void> {
    await manager.update(RefreshToken, { userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }
}
