import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { mapSession } from '../auth/current-user.mapper';
import { SessionResponseDto } from '../auth/dto/session-response.dto';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { AcceptInvitationDto } from './dto/accept-invitation.dto';
import { CreateInvitationDto } from './dto/create-invitation.dto';
import { InvitationResponseDto } from './dto/invitation-response.dto';
import { mapInvitation } from './invitation.mapper';
import { InvitationsService } from './invitations.service';

@ApiTags('invitations')
@Controller('invitations')
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get()
  @Roles(...SHOP_ADMINS)
  @ApiBearerAuth()
  @ApiOkResponse({ type: [InvitationResponseDto] })
  async list(@CurrentUser() user: AuthUser): Promise<InvitationResponseDto[]> {
    return (await this.invitations.list(user)).map(mapInvitation);
  }

  @Post()
  @Roles(...SHOP_ADMINS)
  @ApiBearerAuth()
  @ApiCreatedResponse({ type: InvitationResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreateInvitationDto): Promise<InvitationResponseDto> {
    return mapInvitation(await this.invitations.create(user, body));
  }

  @Public()
  @Post('accept')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponseDto })
  async accept(@Body() body: AcceptInvitationDto): Promise<SessionResponseDto> {
    return mapSession(await this.invitations.accept(body));
  }
}
