import { Controller, Get } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiBearerAuth, ApiForbiddenResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { EnvironmentVariables } from '../config/env.validation';
import { CapturedMailResponseDto } from './dto/captured-mail-response.dto';
import { MailErrors } from './mail.errors';

/**
 * Relays the local mail fake. Captured mail holds password-reset and invitation links, so the route answers
 * only when DEV_MAIL_ENABLED is true (never in production) and only to a signed-in owner.
 */
@ApiTags('dev')
@Controller('dev/mail')
export class DevMailController {
  constructor(private readonly config: ConfigService<EnvironmentVariables, true>) {}

  @Get()
  @Roles(...SHOP_ADMINS)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Mails captured by the local SMTP fake (owners only, when DEV_MAIL_ENABLED=true)' })
  @ApiOkResponse({ type: [CapturedMailResponseDto] })
  @ApiForbiddenResponse({ type: ErrorResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'Captured mail is not enabled on this server' })
  async list(): Promise<CapturedMailResponseDto[]> {
    const url = this.config.get('MAIL_FAKE_URL', { infer: true });
    if (!this.config.get('DEV_MAIL_ENABLED', { infer: true }) || !url) throw MailErrors.devMailDisabled();
    let response: Response;
    try {
      response = await fetch(url, { signal: AbortSignal.timeout(3000) });
    } catch {
      throw MailErrors.fakeUnreachable();
    }
    if (!response.ok) throw MailErrors.fakeUnreachable();
    const mails = (await response.json()) as CapturedMailResponseDto[];
    return mails.map(({ id, to, from, subject, text, html, receivedAt }) => ({ id, to, from, subject, text, html, receivedAt }));
  }
}
