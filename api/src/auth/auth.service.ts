import { Injectable } from '@nestjs/common';
import { AuthUser } from '../common/tenant/auth-user';
import { MembershipsService } from '../memberships/memberships.service';
import { Shop } from '../shops/shop.entity';
import { ShopsService } from '../shops/shops.service';
import { UsersService } from '../users/users.service';
import { AuthErrors } from './auth.errors';
import { SignInDto } from './dto/sign-in.dto';
import { PasswordHasher } from './password-hasher';
import { IssuedSession, SessionsService } from './sessions.service';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
    private readonly passwords: PasswordHasher,
  ) {}

  async signIn(input: SignInDto): Promise<IssuedSession> {
    const user = await this.users.findByEmail(input.email);
    const matches = await this.passwords.matches(input.password, user?.passwordHash);
    if (!user || !matches) throw AuthErrors.invalidCredentials();
    const membership = await this.memberships.firstForUser(user.id);
    if (!membership) throw AuthErrors.noMembership();
    return this.sessions.issue(membership.id);
  }

  refresh(refreshToken: string): Promise<IssuedSession> {
    return this.sessions.rotate(refreshToken);
  }

  signOut(refreshToken: string): Promise<void> {
    return this.sessions.revoke(refreshToken);
  }

  /** The caller and their shop. */
  async me(user: AuthUser): Promise<{ member: AuthUser; shop: Shop }> {
    return { member: user, shop: await this.shops.getCurrent(user) };
  }
}
