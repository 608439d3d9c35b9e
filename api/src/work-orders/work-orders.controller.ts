import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { WORK_ORDER_READERS, WORK_ORDER_RECORDERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { ListWorkOrdersQueryDto } from './dto/list-work-orders-query.dto';
import { RecordCheckDto } from './dto/record-check.dto';
import { WorkOrderResponseDto, WorkOrderSummaryResponseDto } from './dto/work-order-response.dto';
import { mapWorkOrder, mapWorkOrderSummary } from './work-order.mapper';
import { WorkOrdersService, WorkOrderView } from './work-orders.service';

const mapView = (view: WorkOrderView): WorkOrderResponseDto => mapWorkOrder(view.order, view.project, view.records);

@ApiTags('work-orders')
@ApiBearerAuth()
@Controller('work-orders')
export class WorkOrdersController {
  constructor(private readonly workOrders: WorkOrdersService) {}

  @Get()
  @Roles(...WORK_ORDER_READERS)
  @ApiOkResponse({ type: [WorkOrderSummaryResponseDto] })
  async list(@CurrentUser() user: AuthUser, @Query() query: ListWorkOrdersQueryDto): Promise<WorkOrderSummaryResponseDto[]> {
    return (await this.workOrders.list(user, query.state)).map((view) => mapWorkOrderSummary(view.order, view.project, view.records));
  }

  @Get(':id')
  @Roles(...WORK_ORDER_READERS)
  @ApiOkResponse({ type: WorkOrderResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.get(user, id));
  }

  @Post(':id/start')
  @HttpCode(200)
  @Roles(...WORK_ORDER_RECORDERS)
  @ApiOkResponse({ type: WorkOrderResponseDto, description: 'The job is in the bay; the project moves to its in-the-bay stage' })
  async start(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.start(user, id));
  }

  @Post(':id/checks')
  @HttpCode(200)
  @Roles(...WORK_ORDER_RECORDERS)
  @ApiOkResponse({ type: WorkOrderResponseDto, description: 'The check is recorded with who and when; a measured value is judged against its range' })
  async recordCheck(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: RecordCheckDto): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.recordCheck(user, id, body));
  }

  @Post(':id/finish')
  @HttpCode(200)
  @Roles(...WORK_ORDER_RECORDERS)
  @ApiOkResponse({ type: WorkOrderResponseDto, description: 'Every check passed; the project moves to done' })
  async finish(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.finish(user, id));
  }
}

@ApiTags('work-orders')
@ApiBearerAuth()
@Controller('projects/:projectId/work-order')
export class ProjectWorkOrderController {
  constructor(private readonly workOrders: WorkOrdersService) {}

  @Get()
  @Roles(...WORK_ORDER_READERS)
  @ApiOkResponse({ type: WorkOrderResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.forProject(user, projectId));
  }
}
