import { Injectable } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
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
      // A KeyObject, not the string: given a string, jsonwebtoken first tries it as a PEM public key on every verify
      // (createPublicKey throws, then createSecretKey), about 1 ms of CPU per request; a secret KeyObject goes straight
      // to the HMAC check and still refuses every other algorithm. passport-jwt hands it to jsonwebtoken as it is; its
      // types name only string and Buffer.
      secretOrKey: createSecretKey(config.get<string>('JWT_SECRET'), 'utf8') as unknown as Buffer,
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
