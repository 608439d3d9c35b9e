import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { FIT_SETTINGS_READERS, FIT_SETTINGS_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { FitSettingsResponseDto } from './dto/fit-report-response.dto';
import { UpdateFitSettingsDto } from './dto/what-if.dto';
import { mapFitSettings } from './fit-settings.mapper';
import { FitSettingsService } from './fit-settings.service';

@ApiTags('fit-reports')
@ApiBearerAuth()
@Controller('fit-settings')
export class FitSettingsController {
  constructor(private readonly settings: FitSettingsService) {}

  @Get()
  @Roles(...FIT_SETTINGS_READERS)
  @ApiOperation({ summary: "The shop's fit-check thresholds: its overrides and the effective values" })
  @ApiOkResponse({ type: FitSettingsResponseDto })
  async get(@CurrentUser() user: AuthUser): Promise<FitSettingsResponseDto> {
    return mapFitSettings(await this.settings.get(user));
  }

  @Put()
  @Roles(...FIT_SETTINGS_WRITERS)
  @ApiOperation({ summary: "Replace the shop's threshold overrides (later fit reports use them)" })
  @ApiOkResponse({ type: FitSettingsResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async replace(@CurrentUser() user: AuthUser, @Body() body: UpdateFitSettingsDto): Promise<FitSettingsResponseDto> {
    return mapFitSettings(await this.settings.replace(user, body.overrides));
  }
}
