import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AuthRateLimited } from '../common/guards/auth-rate-limit.guard';
import { Public } from '../common/decorators/public.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { AuthUser } from '../common/tenant/auth-user';
import { AuthService } from './auth.service';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto';
import { RefreshTokenDto } from './dto/refresh-token.dto';
import { mapCurrentUser, mapSession } from './current-user.mapper';
import { CurrentUserResponseDto, SessionResponseDto } from './dto/session-response.dto';
import { SignInDto } from './dto/sign-in.dto';
import { SignUpAcceptedResponseDto, SignUpConfirmDto, SignUpDto } from './dto/sign-up.dto';
import { PasswordResetService } from './password-reset.service';
import { SignUpService } from './sign-up.service';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly passwordReset: PasswordResetService,
    private readonly signUps: SignUpService,
  ) {}

  @Public()
  @AuthRateLimited()
  @Post('sign-up')
  @HttpCode(202)
  @ApiAcceptedResponse({
    type: SignUpAcceptedResponseDto,
    description: 'Always the same answer: a link to finish is mailed to a new address; a registered one gets a notice instead',
  })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async signUp(@Body() body: SignUpDto): Promise<SignUpAcceptedResponseDto> {
    await this.signUps.request(body);
    return { message: `Check your e-mail: we sent ${body.email.trim()} a link to finish creating your shop.` };
  }

  @Public()
  @AuthRateLimited()
  @Post('sign-up/confirm')
  @ApiCreatedResponse({ type: SessionResponseDto, description: 'The shop is created and its owner signed in' })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async confirmSignUp(@Body() body: SignUpConfirmDto): Promise<SessionResponseDto> {
    return mapSession(await this.signUps.confirm(body.token));
  }

  @Public()
  @AuthRateLimited()
  @Post('sign-in')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponseDto })
  @ApiUnauthorizedResponse({ type: ErrorResponseDto })
  async signIn(@Body() body: SignInDto): Promise<SessionResponseDto> {
    return mapSession(await this.auth.signIn(body));
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponseDto })
  @ApiUnauthorizedResponse({ type: ErrorResponseDto })
  async refresh(@Body() body: RefreshTokenDto): Promise<SessionResponseDto> {
    return mapSession(await this.auth.refresh(body.refreshToken));
  }

  // Public so a client whose access token has lapsed can still end its session.
  @Public()
  @Post('sign-out')
  @HttpCode(204)
  @ApiNoContentResponse()
  async signOut(@Body() body: RefreshTokenDto): Promise<void> {
    await this.auth.signOut(body.refreshToken);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: CurrentUserResponseDto })
  async me(@CurrentUser() user: AuthUser): Promise<CurrentUserResponseDto> {
    const { member, shop } = await this.auth.me(user);
    return mapCurrentUser(member, shop);
  }

  @Public()
  @AuthRateLimited()
  @Post('password-reset/request')
  @HttpCode(202)
  @ApiAcceptedResponse({ description: 'Always; a link valid 30 minutes is mailed when the account exists' })
  async requestPasswordReset(@Body() body: PasswordResetRequestDto): Promise<void> {
    await this.passwordReset.request(body.email);
  }

  @Public()
  @AuthRateLimited()
  @Post('password-reset/confirm')
  @HttpCode(204)
  @ApiNoContentResponse()
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async confirmPasswordReset(@Body() body: PasswordResetConfirmDto): Promise<void> {
    await this.passwordReset.confirm(body.token, body.password);
  }
}
