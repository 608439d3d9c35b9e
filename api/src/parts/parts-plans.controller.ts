import { Body, Controller, Get, Header, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { AuthUser } from '../common/tenant/auth-user';
import { Role } from '../common/roles/role';
import { CounterService } from './counter.service';
import { BuildPlanDto, CounterLineResponseDto, MarkLineDto, PartsPlanResponseDto, PlanSummaryResponseDto, ReceiveDto, ReserveDto } from './dto/plan.dto';
import { mapCounterLine, mapPlan } from './parts-plan.mapper';
import { PartsPlansService } from './parts-plans.service';

/** Build and lock plans: owner and estimator; read them: all staff; work the counter: owner and counter. */
export const PLAN_BUILDERS: Role[] = ['owner', 'estimator'];
export const PLAN_READERS: Role[] = ['owner', 'estimator', 'fabricator', 'counter'];
export const COUNTER_CLERKS: Role[] = ['owner', 'counter'];

@ApiTags('parts-plans')
@ApiBearerAuth()
@Controller()
export class PartsPlansController {
  constructor(
    private readonly plans: PartsPlansService,
    private readonly counter: CounterService,
  ) {}

  @Post('projects/:projectId/parts-plans')
  @Roles(...PLAN_BUILDERS)
  @ApiOperation({ summary: "Build a new plan version from the project's fit report and the catalog", operationId: 'buildPartsPlan' })
  async build(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string, @Body() body: BuildPlanDto): Promise<PartsPlanResponseDto> {
    return mapPlan(await this.plans.build(user, projectId, body.objective ?? 'lowest-cost', body.resolve));
  }

  @Get('projects/:projectId/parts-plans')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: "The project's plan versions, newest first", operationId: 'listPartsPlans' })
  async list(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string): Promise<PartsPlanResponseDto[]> {
    return (await this.plans.list(user, projectId)).map(mapPlan);
  }

  @Get('parts-plans')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: "Each project's latest plan, newest first (the counter's work list)", operationId: 'listRecentPartsPlans' })
  async recent(@CurrentUser() user: AuthUser): Promise<PlanSummaryResponseDto[]> {
    return (await this.plans.recent(user)).map((p) => ({
      id: p.id,
      projectId: p.projectId,
      projectTitle: p.projectTitle,
      version: Number(p.version),
      status: p.status,
      objective: p.objective,
      totalCents: Number(p.totalCents),
      createdAt: new Date(p.createdAt).toISOString(),
    }));
  }

  @Get('parts-plans/:id')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: 'One plan version', operationId: 'getPartsPlan' })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartsPlanResponseDto> {
    return mapPlan(await this.plans.get(user, id));
  }

  @Post('parts-plans/:id/lock')
  @HttpCode(200)
  @Roles(...PLAN_BUILDERS)
  @ApiOperation({ summary: 'Lock a plan version for a quote (it never changes after)', operationId: 'lockPartsPlan' })
  async lock(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartsPlanResponseDto> {
    return mapPlan(await this.plans.lock(user, id));
  }

  @Get('parts-plans/:id/counter-lines')
  @Roles(...PLAN_READERS)
  @ApiOperation({ summary: "The plan's parts with stock on hand and bins, and each line's state", operationId: 'listCounterLines' })
  async lines(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto[]> {
    return (await this.counter.lines(user, id)).map(mapCounterLine);
  }

  @Get('parts-plans/:id/pick-list.csv')
  @Roles(...PLAN_READERS)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="pick-list.csv"')
  @ApiOperation({ summary: 'The pick list as CSV', operationId: 'exportPickList' })
  async pickList(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<string> {
    return this.counter.pickListCsv(user, id);
  }

  @Post('counter-lines/:id/reserve')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: "Set the line's units aside from stock (409 when another job took them)", operationId: 'reserveCounterLine' })
  async reserve(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: ReserveDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.reserve(user, id, body.location));
  }

  @Post('counter-lines/:id/release')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Put reserved units back', operationId: 'releaseCounterLine' })
  async release(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.release(user, id));
  }

  @Post('counter-lines/:id/mark')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Mark a line to order or ordered', operationId: 'markCounterLine' })
  async mark(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: MarkLineDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.mark(user, id, body.status));
  }

  @Post('counter-lines/:id/receive')
  @HttpCode(200)
  @Roles(...COUNTER_CLERKS)
  @ApiOperation({ summary: 'Ordered units arrived: on hand at a location, set aside for this job', operationId: 'receiveCounterLine' })
  async receive(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: ReceiveDto): Promise<CounterLineResponseDto> {
    return mapCounterLine(await this.counter.receive(user, id, body.location, body.bin));
  }
}
