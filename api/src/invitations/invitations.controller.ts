import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
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

  @Post(':id/resend')
  @HttpCode(200)
  @Roles(...SHOP_ADMINS)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Send a pending invitation again with a new link, valid 7 days; the old link stops working' })
  @ApiOkResponse({ type: InvitationResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Already accepted' })
  async resend(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<InvitationResponseDto> {
    return mapInvitation(await this.invitations.resend(user, id));
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles(...SHOP_ADMINS)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Withdraw a pending invitation: its link stops working' })
  @ApiNoContentResponse()
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Already accepted' })
  async withdraw(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.invitations.withdraw(user, id);
  }

  @Public()
  @Post('accept')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionResponseDto })
  async accept(@Body() body: AcceptInvitationDto): Promise<SessionResponseDto> {
    return mapSession(await this.invitations.accept(body));
  }
}
