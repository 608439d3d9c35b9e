import { Injectable } from '@nestjs/common';
import { AuthUser } from '../common/tenant/auth-user';
import { MembershipsService } from '../memberships/memberships.service';
import { ShopsService } from '../shops/shops.service';
import { UsersService } from '../users/users.service';
import { AuthErrors } from './auth.errors';
import { mapCurrentUser } from './current-user.mapper';
import { CurrentUserResponseDto, SessionResponseDto } from './dto/session-response.dto';
import { SignInDto } from './dto/sign-in.dto';
import { PasswordHasher } from './password-hasher';
import { SessionsService } from './sessions.service';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
    private readonly passwords: PasswordHasher,
  ) {}

  async signIn(input: SignInDto): Promise<SessionResponseDto> {
    const user = await this.users.findByEmail(input.email);
    const matches = await this.passwords.matches(input.password, user?.passwordHash);
    if (!user || !matches) throw AuthErrors.invalidCredentials();
    const membership = await this.memberships.firstForUser(user.id);
    if (!membership) throw AuthErrors.noMembership();
    return this.sessions.issue(membership.id);
  }

  refresh(refreshToken: string): Promise<SessionResponseDto> {
    return this.sessions.rotate(refreshToken);
  }

  signOut(refreshToken: string): Promise<void> {
    return this.sessions.revoke(refreshToken);
  }

  async me(user: AuthUser): Promise<CurrentUserResponseDto> {
    return mapCurrentUser(user, await this.shops.getCurrent(user));
  }
}
