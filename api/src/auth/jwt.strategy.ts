import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { AuthUser } from '../common/tenant/auth-user';
import { AccessTokenPayload } from './auth.constants';
import { AuthErrors } from './auth.errors';
import { MemberResolverService } from './member-resolver.service';
import { RequestMemberService } from './request-member.service';
import { SessionsService } from './sessions.service';

/**
 * Verifies the access token, checks its session was not ended (sign-out, password reset), then reloads the
 * membership so a removed member or changed role counts at once.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    config: ConfigService<EnvironmentVariables, true>,
    private readonly members: MemberResolverService,
    private readonly sessions: SessionsService,
    private readonly requestMembers: RequestMemberService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      secretOrKey: config.get('JWT_SECRET', { infer: true }),
      algorithms: ['HS256'],
    });
  }

  async validate(payload: AccessTokenPayload): Promise<AuthUser> {
    // The usual case in one query; a refusal takes the path below, which tells why.
    const current = await this.requestMembers.currentMember(payload);
    if (current) return current;
    if (!(await this.sessions.isCurrent(payload))) throw AuthErrors.sessionEnded();
    const user = typeof payload.mid === 'string' ? await this.members.resolve(payload.mid) : null;
    if (!user || user.userId !== payload.sub) throw AuthErrors.memberGone();
    return user;
  }
}
