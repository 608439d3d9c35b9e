import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { AppConfigService } from '../config/app-config';
import { CustomersModule } from '../customers/customers.module';
import { MembershipsModule } from '../memberships/memberships.module';
import { ShopsModule } from '../shops/shops.module';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtStrategy } from './jwt.strategy';
import { MemberResolverService } from './member-resolver.service';
import { PasswordHasher } from './password-hasher';
import { PasswordResetService } from './password-reset.service';
import { RequestMemberService } from './request-member.service';
import { SessionsService } from './sessions.service';
import { SignUpService } from './sign-up.service';

@Module({
  imports: [
    PassportModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: AppConfigService) => ({
        secret: config.get('JWT_SECRET', { infer: true }),
        signOptions: { algorithm: 'HS256' },
        verifyOptions: { algorithms: ['HS256'] },
      }),
    }),
    UsersModule,
    ShopsModule,
    MembershipsModule,
    CustomersModule,
  ],
  controllers: [AuthController],
  providers: [AuthService, SignUpService, SessionsService, PasswordResetService, MemberResolverService, RequestMemberService, PasswordHasher, JwtStrategy],
  exports: [SessionsService, AuthService, PasswordHasher],
})
export class AuthModule {}
