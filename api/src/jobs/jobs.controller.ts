import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { JobPageResponseDto, ListJobsQueryDto } from './dto/job.dto';
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
}
