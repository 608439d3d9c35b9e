import { Body, Controller, Get, Header, HttpCode, Param, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiExtraModels,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
  getSchemaPath,
} from '@nestjs/swagger';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { AuthUser } from '../common/tenant/auth-user';
import { Role } from '../common/roles/role';
import { PARTS_PLAN_READERS } from '../common/roles/role-matrix';
import { CounterService } from './counter.service';
import {
  BuildPlanDto,
  CounterLineResponseDto,
  CustomerPartsPlanResponseDto,
  MarkLineDto,
  PartsPlanResponseDto,
  PlanSummaryResponseDto,
  ReceiveDto,
  ReserveDto,
} from './dto/plan.dto';
import { mapCounterLine, mapPlan, mapPlanFor } from './parts-plan.mapper';
import { PartsPlansService } from './parts-plans.service';

/**
 * Build and lock plans: owner and estimator; read them: all staff (and the project's own customer, in the customer's
 * view, through PARTS_PLAN_READERS); the counter's lists: all staff; work the counter: owner and counter.
 */
export const PLAN_BUILDERS: Role[] = ['owner', 'estimator'];
export const PLAN_READERS: Role[] = ['owner', 'estimator', 'fabricator', 'counter'];
export const COUNTER_CLERKS: Role[] = ['owner', 'counter'];

/** Whom a plan answer is for: the whole plan for the shop's members, the customer's view for a customer. */
const PLAN_FOR_READER = { oneOf: [{ $ref: getSchemaPath(PartsPlanResponseDto) }, { $ref: getSchemaPath(CustomerPartsPlanResponseDto) }] };
const FOR_READER_WORDS =
  "Staff get the whole plan (PartsPlanResponseDto); the project's customer gets CustomerPartsPlanResponseDto: the parts at the plan's prices, operations with hours, totals, unresolved shortfalls and notes, without stock, candidates passed over or solver figures. Another customer's project answers 404.";

@ApiTags('parts-plans')
@ApiBearerAuth()
@ApiExtraModels(PartsPlanResponseDto, CustomerPartsPlanResponseDto)
@Controller()
export class PartsPlansController {
  constructor(
    private readonly plans: PartsPlansService,
    private readonly counter: CounterService,
  ) {}

  @Post('projects/:projectId/parts-plans')
  @Roles(...PLAN_BUILDERS)
  @ApiOperation({ summary: "Build a new plan version from the project's fit report and the catalog", operationId: 'buildPartsPlan' })
  @ApiCreatedResponse({ type: PartsPlanResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async build(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string, @Body() body: BuildPlanDto): Promise<PartsPlanResponseDto> {
    return mapPlan(await this.plans.build(user, projectId, body.objective ?? 'lowest-cost', body.resolve, body.fitReportId));
  }

  @Get('projects/:projectId/parts-plans')
  @Roles(...PARTS_PLAN_READERS)
  @ApiOperation({ summary: "The project's plan versions, newest first", description: FOR_READER_WORDS, operationId: 'listPartsPlans' })
  @ApiOkResponse({ schema: { type: 'array', items: PLAN_FOR_READER } })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async list(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string): Promise<Array<PartsPlanResponseDto | CustomerPartsPlanResponseDto>> {
    return (await this.plans.list(user, projectId)).map((plan) => mapPlanFor(user, plan));
  }

  @Get('parts-plans')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: "Each project's latest plan, newest first (the counter's work list)", operationId: 'listRecentPartsPlans' })
  @ApiOkResponse({ type: [PlanSummaryResponseDto] })
  async recent(@CurrentUser() user: AuthUser): Promise<PlanSummaryResponseDto[]> {
    return (await this.plans.recent(user)).map((p) => ({
      id: p.id,
      projectId: p.projectId,
      projectTitle: p.projectTitle,
      projectStatus: p.projectStatus,
      customerName: p.customerName ?? null,
      version: Number(p.version),
      status: p.status,
      objective: p.objective,
      totalCents: Number(p.totalCents),
      createdAt: new Date(p.createdAt).toISOString(),
    }));
  }

  @Get('parts-plans/:id')
  @Roles(...PARTS_PLAN_READERS)
  @ApiOperation({ summary: 'One plan version', description: FOR_READER_WORDS, operationId: 'getPartsPlan' })
  @ApiOkResponse({ schema: PLAN_FOR_READER })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartsPlanResponseDto | CustomerPartsPlanResponseDto> {
    return mapPlanFor(user, await this.plans.read(user, id));
  }

  @Post('parts-plans/:id/lock')
  @HttpCode(200)
  @Roles(...PLAN_BUILDERS)
  @ApiOperation({ summary: 'Lock a plan version for a quote (it never changes after)', operationId: 'lockPartsPlan' })
  @ApiOkResponse({ type: PartsPlanResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async lock(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartsPlanResponseDto> {
    return mapPlan(await this.plans.lock(user, id));
  }

  @Get('parts-plans/:id/counter-lines')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: "The plan's parts with stock on hand and bins, and each line's state", operationId: 'listCounterLines' })
  @ApiOkResponse({ type: [CounterLineResponseDto] })
  async lines(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto[]> {
    return (await this.counter.lines(user, id)).map(mapCounterLine);
  }

  @Get('parts-plans/:id/pick-list.csv')
  @Roles(...PLAN_READERS)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="pick-list.csv"')
  @ApiOperation({ summary: 'The pick list as CSV', operationId: 'exportPickList' })
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' } })
  async pickList(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<string> {
    return this.counter.pickListCsv(user, id);
  }

  @Post('counter-lines/:id/reserve')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: "Set the line's units aside from stock (409 when another job took them)", operationId: 'reserveCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async reserve(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: ReserveDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.reserve(user, id, body.location));
  }

  @Post('counter-lines/:id/release')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Put reserved units back (409 once they are issued to the job)', operationId: 'releaseCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async release(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.release(user, id));
  }

  @Post('parts-plans/:id/issue')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: "Issue every set-aside line of the plan to the job: the parts leave the shelf (409 when none is set aside)", operationId: 'issuePartsPlan' })
  @ApiOkResponse({ type: [CounterLineResponseDto] })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async issuePlan(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto[]> {
    return (await this.counter.issuePlan(user, id)).map(mapCounterLine);
  }

  @Post('counter-lines/:id/issue')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: "Issue the line's set-aside units to the job: they leave the shelf and can no longer be released", operationId: 'issueCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async issue(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.issue(user, id));
  }

  @Post('counter-lines/:id/return')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'An issued part came back unused: back on hand where it was taken from, the line open again', operationId: 'returnCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async returnToShelf(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.returnToShelf(user, id));
  }

  @Post('counter-lines/:id/mark')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Mark a line to order or ordered', operationId: 'markCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async mark(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: MarkLineDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.mark(user, id, body.status));
  }

  @Post('counter-lines/:id/receive')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Ordered units arrived: on hand at a location, set aside for this job', operationId: 'receiveCounterLine' })
  @ApiOkResponse({ type: CounterLineResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async receive(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: ReceiveDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.receive(user, id, body.location, body.bin));
  }
}
