import { Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { JobPageResponseDto, JobResponseDto, ListJobsQueryDto } from './dto/job.dto';
import { mapJob } from './job.mapper';
import { JobsService } from './jobs.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs')
export class JobsController {
  constructor(private readonly jobs: JobsService) {}

  @Get()
  @Roles(...SHOP_ADMINS)
  @ApiOkResponse({ type: JobPageResponseDto, description: "The shop's background work (e-mails, payment events), newest first, with counts by state" })
  async list(@CurrentUser() user: AuthUser, @Query() query: ListJobsQueryDto): Promise<JobPageResponseDto> {
    const page = await this.jobs.list(user, query);
    return { ...page, items: page.items.map(mapJob) };
  }

  @Post(':id/retry')
  @HttpCode(200)
  @Roles(...SHOP_ADMINS)
  @ApiOkResponse({
    type: JobResponseDto,
    description:
      'Tries a job that stopped after its last attempt again: queued, due now, attempts from zero, same idempotency key (the work still applies at most once). 409 when the job is not stopped.',
  })
  async retry(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<JobResponseDto> {
    return mapJob(await this.jobs.retry(user, id));
  }
}
