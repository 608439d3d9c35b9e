import { Body, Controller, Delete, Get, HttpCode, Param, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { MembershipResponseDto } from './dto/membership-response.dto';
import { UpdateMembershipDto } from './dto/update-membership.dto';
import { mapMembership } from './membership.mapper';
import { MembershipsService } from './memberships.service';

@ApiTags('memberships')
@ApiBearerAuth()
@Roles(...SHOP_ADMINS)
@Controller('memberships')
export class MembershipsController {
  constructor(private readonly memberships: MembershipsService) {}

  @Get()
  @ApiOkResponse({ type: [MembershipResponseDto] })
  async list(@CurrentUser() user: AuthUser): Promise<MembershipResponseDto[]> {
    return (await this.memberships.list(user)).map(mapMembership);
  }

  @Patch(':id')
  @ApiOkResponse({ type: MembershipResponseDto })
  async update(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateMembershipDto,
  ): Promise<MembershipResponseDto> {
    return mapMembership(await this.memberships.updateRole(user, id, body.role));
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.memberships.remove(user, id);
  }
}
