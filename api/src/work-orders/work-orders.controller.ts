import { Body, Controller, Delete, Get, HttpCode, Param, Post, Query, Res, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiNoContentResponse, ApiOkResponse, ApiParam, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { WORK_ORDER_PHOTO_READERS, WORK_ORDER_READERS, WORK_ORDER_RECORDERS } from '../common/roles/role-matrix';
import { sendPhoto, type UploadedPhotoFile } from '../measurements/photo-intake.service';
import { PhotoUploadInterceptor } from '../measurements/photo-upload.interceptor';
import { AuthUser } from '../common/tenant/auth-user';
import { ListWorkOrdersQueryDto } from './dto/list-work-orders-query.dto';
import { RecordCheckDto } from './dto/record-check.dto';
import { WorkOrderResponseDto, WorkOrderSummaryResponseDto } from './dto/work-order-response.dto';
import { mapWorkOrder, mapWorkOrderSummary } from './work-order.mapper';
import { WorkOrdersService, WorkOrderView } from './work-orders.service';

const mapView = (view: WorkOrderView): WorkOrderResponseDto => mapWorkOrder(view.order, view.project, view.records, view.photos, view.counterLines);

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

  @Post(':id/checks/:checkKey/photos')
  @HttpCode(201)
  @Roles(...WORK_ORDER_RECORDERS)
  @UseInterceptors(PhotoUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiParam({ name: 'checkKey', example: 'oil-pan-pickup.pickup-tabs' })
  @ApiBody({ schema: { type: 'object', required: ['photos'], properties: { photos: { type: 'array', items: { type: 'string', format: 'binary' } } } } })
  @ApiOkResponse({ type: WorkOrderResponseDto, description: 'JPEG, PNG or WebP, read by content; location metadata is stripped before storing' })
  async addCheckPhotos(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Param('checkKey') checkKey: string,
    @UploadedFiles() files: UploadedPhotoFile[],
  ): Promise<WorkOrderResponseDto> {
    return mapView(await this.workOrders.addCheckPhotos(user, id, checkKey, files));
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

@ApiTags('work-orders')
@ApiBearerAuth()
@Controller('work-order-photos')
export class WorkOrderPhotosController {
  constructor(private readonly workOrders: WorkOrdersService) {}

  @Get(':id/file')
  @Roles(...WORK_ORDER_PHOTO_READERS)
  @ApiProduces('image/jpeg', 'image/png', 'image/webp')
  @ApiOkResponse({ schema: { type: 'string', format: 'binary' } })
  async file(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Res() res: Response): Promise<void> {
    const { photo, data } = await this.workOrders.checkPhotoFile(user, id);
    sendPhoto(res, photo, data);
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles(...WORK_ORDER_RECORDERS)
  @ApiNoContentResponse({ description: 'The photo and its file are removed; a finished work order keeps its photos (409)' })
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.workOrders.removeCheckPhoto(user, id);
  }
}
