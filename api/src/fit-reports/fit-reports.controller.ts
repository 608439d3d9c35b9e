import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { FitReport } from '@swapwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { Page, PageQueryDto } from '../common/pagination/page-query.dto';
import { ApiPageResponse, mapPage } from '../common/pagination/page-response';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { FIT_REPORT_READERS, FIT_REPORT_RUNNERS, FIT_WHAT_IF_USERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { CompareFitReportsQueryDto } from './dto/compare-fit-reports-query.dto';
import {
  FitReportComparisonResponseDto,
  FitReportResponseDto,
  FitReportResultDto,
  FitReportSummaryResponseDto,
} from './dto/fit-report-response.dto';
import { WhatIfDto } from './dto/what-if.dto';
import { mapFitReport, mapFitReportComparison, mapFitReportSummary } from './fit-report.mapper';
import { FitReportsService } from './fit-reports.service';

@ApiTags('fit-reports')
@ApiBearerAuth()
@Controller('projects/:id/fit-reports')
export class ProjectFitReportsController {
  constructor(private readonly reports: FitReportsService) {}

  @Post()
  @Roles(...FIT_REPORT_RUNNERS)
  @ApiOperation({
    summary: "Run the fit check on the project's catalog parts, selections, placement and goals, and store the report",
    description:
      'Parts not selected are left out and the checks needing them answer `unknown`. Without a placement on the project ' +
      "the fit window's best placement is used, else where the chassis's stock engine sat (see placementSource). " +
      'Moves a project in intake or measuring to checking.',
  })
  @ApiCreatedResponse({ type: FitReportResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiUnprocessableEntityResponse({ type: ErrorResponseDto, description: 'No engine or chassis selected, or goals missing' })
  async run(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<FitReportResponseDto> {
    return mapFitReport(await this.reports.run(user, id));
  }

  @Get()
  @Roles(...FIT_REPORT_READERS)
  @ApiOperation({ summary: "The project's fit reports, newest first (summaries)" })
  @ApiPageResponse(FitReportSummaryResponseDto)
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async list(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Query() query: PageQueryDto,
  ): Promise<Page<FitReportSummaryResponseDto>> {
    return mapPage(await this.reports.list(user, id, query), mapFitReportSummary);
  }
}

@ApiTags('fit-reports')
@ApiBearerAuth()
@Controller('fit-reports')
export class FitReportsController {
  constructor(private readonly reports: FitReportsService) {}

  // Declared before ':id' so "compare" and "what-if" are not read as ids.
  @Get('compare')
  @Roles(...FIT_REPORT_READERS)
  @ApiOperation({ summary: 'What changed, check by check, from report a to report b' })
  @ApiOkResponse({ type: FitReportComparisonResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async compare(@CurrentUser() user: AuthUser, @Query() query: CompareFitReportsQueryDto): Promise<FitReportComparisonResponseDto> {
    return mapFitReportComparison(await this.reports.compare(user, query.a.toLowerCase(), query.b.toLowerCase()));
  }

  @Post('what-if')
  @HttpCode(200)
  @Roles(...FIT_WHAT_IF_USERS)
  @ApiOperation({
    summary: 'Run the fit check on a complete FitSpec without storing anything',
    description:
      'The body is `{ spec, settings? }`: `spec` is the fit engine\'s whole input (FitSpecDto below; every field, unit and frame ' +
      'is described in docs/fit-spec.md), `settings` any thresholds to use for this run on top of the shop\'s. ' +
      'The answer is the engine\'s report exactly as computed.',
  })
  @ApiOkResponse({ type: FitReportResultDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  whatIf(@CurrentUser() user: AuthUser, @Body() body: WhatIfDto): Promise<FitReport> {
    return this.reports.whatIf(user, body);
  }

  @Get(':id')
  @Roles(...FIT_REPORT_READERS)
  @ApiOperation({ summary: 'One stored fit report: the whole input and the engine\'s answer' })
  @ApiOkResponse({ type: FitReportResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<FitReportResponseDto> {
    return mapFitReport(await this.reports.get(user, id));
  }
}
