import { Controller, Get } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';
import { isDevOrTest } from '../config/app-config';
import { CapturedMailResponseDto } from './dto/captured-mail-response.dto';
import { MailErrors } from './mail.errors';

@ApiTags('dev')
@Controller('dev/mail')
export class DevMailController {
  constructor(private readonly config: ConfigService<EnvironmentVariables, true>) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Mails captured by the local SMTP fake (development and test only)' })
  @ApiOkResponse({ type: [CapturedMailResponseDto] })
  async list(): Promise<CapturedMailResponseDto[]> {
    const config = this.config;
    const url = config.get('MAIL_FAKE_URL', { infer: true });
    if (!isDevOrTest(config.get('NODE_ENV', { infer: true })) || !url) throw MailErrors.devMailDisabled();
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
