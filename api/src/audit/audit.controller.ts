import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { Page } from '../common/pagination/page-query.dto';
import { ApiPageResponse, mapPage } from '../common/pagination/page-response';
import { AUDIT_READERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { mapAuditEvent } from './audit-event.mapper';
import { AuditService } from './audit.service';
import { AuditEventResponseDto, ListAuditEventsQueryDto } from './dto/audit-event.dto';

@ApiTags('audit')
@ApiBearerAuth()
@Controller('audit-events')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Roles(...AUDIT_READERS)
  @ApiPageResponse(AuditEventResponseDto, 'Changes to money, stock, sign-offs and memberships, newest first')
  async list(@CurrentUser() user: AuthUser, @Query() query: ListAuditEventsQueryDto): Promise<Page<AuditEventResponseDto>> {
    return mapPage(await this.audit.list(user, query), mapAuditEvent);
  }
}
