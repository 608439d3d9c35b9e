import { Body, Controller, Get, Param, Patch, Put } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBearerAuth, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { FIT_SELECTION_READERS, FIT_SELECTION_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { FitSelectionsResponseDto, PatchFitSelectionsDto, UpdateFitSelectionsDto } from './dto/fit-selections.dto';
import { mapFitSelections } from './fit-selection.mapper';
import { FitSelectionsService } from './fit-selections.service';

@ApiTags('fit-reports')
@ApiBearerAuth()
@Controller('projects/:id/fit-selections')
export class FitSelectionsController {
  constructor(private readonly selections: FitSelectionsService) {}

  @Get()
  @Roles(...FIT_SELECTION_READERS)
  @ApiOperation({ summary: "The parts and figures the project's fit check uses besides its engine, chassis and transmission" })
  @ApiOkResponse({ type: FitSelectionsResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<FitSelectionsResponseDto> {
    return mapFitSelections(await this.selections.get(user, id));
  }

  @Put()
  @Roles(...FIT_SELECTION_WRITERS)
  @ApiOperation({ summary: 'Replace the fit selections (fields left out are cleared)' })
  @ApiOkResponse({ type: FitSelectionsResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async replace(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateFitSelectionsDto,
  ): Promise<FitSelectionsResponseDto> {
    return mapFitSelections(await this.selections.replace(user, id, body));
  }

  @Patch()
  @Roles(...FIT_SELECTION_WRITERS)
  @ApiOperation({ summary: 'Change the fit selections given (fields left out stay as stored; null clears one)' })
  @ApiOkResponse({ type: FitSelectionsResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async patch(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: PatchFitSelectionsDto,
  ): Promise<FitSelectionsResponseDto> {
    return mapFitSelections(await this.selections.patch(user, id, body));
  }
}
