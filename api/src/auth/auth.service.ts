import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import * as bcrypt from 'bcryptjs';
import { DataSource } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { MembershipsService } from '../memberships/memberships.service';
import { ShopsService } from '../shops/shops.service';
import { UsersService } from '../users/users.service';
import { BCRYPT_ROUNDS } from './auth.constants';
import { AuthErrors } from './auth.errors';
import { mapCurrentUser } from './current-user.mapper';
import { CurrentUserResponseDto, SessionResponseDto } from './dto/session-response.dto';
import { SignInDto } from './dto/sign-in.dto';
import { SessionsService } from './sessions.service';

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password.
const UNKNOWN_USER_HASH = bcrypt.hashSync('no account has this password', BCRYPT_ROUNDS);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

@Injectable()
export class AuthService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly memberships: MembershipsService,
    private readonly sessions: SessionsService,
  ) {}

  async signIn(input: SignInDto): Promise<SessionResponseDto> {
    const user = await this.users.findByEmail(input.email);
    const matches = await bcrypt.compare(input.password, user?.passwordHash ?? UNKNOWN_USER_HASH);
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
