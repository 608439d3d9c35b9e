import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Res, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiNoContentResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import {
  MEASUREMENT_PHOTO_ADDERS,
  MEASUREMENT_PHOTO_READERS,
  MEASUREMENT_READERS,
  MEASUREMENT_SETTINGS_WRITERS,
  MEASUREMENT_WRITERS,
} from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import {
  MeasurementPhotoResponseDto,
  MeasurementSettingsResponseDto,
  MeasurementSheetResponseDto,
  MeasurementTemplateResponseDto,
} from './dto/measurement-response.dto';
import { MeasurementSettingsDto, PutMeasurementTemplateDto, SetMeasurementValueDto, UploadPhotosDto } from './dto/measurement.dto';
import { mapMeasurementPhoto, mapMeasurementPoint, mapMeasurementSheet } from './measurement.mapper';
import { MeasurementsService, UploadedPhotoFile } from './measurements.service';
import { sendPhoto } from './photo-intake.service';
import { PhotoUploadInterceptor } from './photo-upload.interceptor';


@ApiTags('measurements')
@ApiBearerAuth()
@Controller()
export class MeasurementsController {
  constructor(private readonly measurements: MeasurementsService) {}

  @Get('projects/:id/measurement-sheet')
  @Roles(...MEASUREMENT_PHOTO_READERS)
  @ApiOkResponse({ type: MeasurementSheetResponseDto })
  async sheet(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<MeasurementSheetResponseDto> {
    return mapMeasurementSheet(await this.measurements.view(user, id));
  }

  @Put('projects/:id/measurement-sheet/values/:pointId')
  @Roles(...MEASUREMENT_WRITERS)
  @ApiOkResponse({ type: MeasurementSheetResponseDto })
  async setValue(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Param('pointId') pointId: string,
    @Body() body: SetMeasurementValueDto,
  ): Promise<MeasurementSheetResponseDto> {
    await this.measurements.setValue(user, id, pointId, body);
    return mapMeasurementSheet(await this.measurements.view(user, id));
  }

  @Post('projects/:id/measurement-sheet/sign-off')
  @Roles(...MEASUREMENT_WRITERS)
  @HttpCode(200)
  @ApiOkResponse({ type: MeasurementSheetResponseDto })
  async signOff(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<MeasurementSheetResponseDto> {
    await this.measurements.signOff(user, id);
    return mapMeasurementSheet(await this.measurements.view(user, id));
  }

  @Post('projects/:id/measurement-sheet/photos')
  @Roles(...MEASUREMENT_PHOTO_ADDERS)
  @UseInterceptors(PhotoUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['photos'],
      properties: {
        photos: { type: 'array', items: { type: 'string', format: 'binary' } },
        pointId: { type: 'string' },
        replacesPhotoId: { type: 'string' },
      },
    },
  })
  @ApiOkResponse({ type: [MeasurementPhotoResponseDto] })
  @HttpCode(201)
  async addPhotos(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @UploadedFiles() files: UploadedPhotoFile[],
    @Body() body: UploadPhotosDto,
  ): Promise<MeasurementPhotoResponseDto[]> {
    return (await this.measurements.addPhotos(user, id, files, body)).map(mapMeasurementPhoto);
  }

  @Get('measurement-photos/:id/file')
  @Roles(...MEASUREMENT_PHOTO_READERS)
  @ApiProduces('image/jpeg', 'image/png', 'image/webp')
  @ApiOkResponse({ schema: { type: 'string', format: 'binary' } })
  async photoFile(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Res() res: Response): Promise<void> {
    const { photo, data } = await this.measurements.photoFile(user, id);
    sendPhoto(res, photo, data);
  }

  @Delete('measurement-photos/:id')
  @Roles(...MEASUREMENT_PHOTO_ADDERS)
  @HttpCode(204)
  @ApiNoContentResponse()
  async deletePhoto(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.measurements.deletePhoto(user, id);
  }

  @Post('measurement-photos/:id/accept')
  @Roles(...MEASUREMENT_WRITERS)
  @HttpCode(200)
  @ApiOkResponse({ type: MeasurementPhotoResponseDto })
  async acceptPhoto(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<MeasurementPhotoResponseDto> {
    return mapMeasurementPhoto(await this.measurements.acceptPhoto(user, id));
  }

  @Get('chassis/:chassisId/measurement-template')
  @Roles(...MEASUREMENT_READERS)
  @ApiOkResponse({ type: MeasurementTemplateResponseDto })
  async template(@CurrentUser() user: AuthUser, @Param('chassisId', ParseIdPipe) chassisId: string): Promise<MeasurementTemplateResponseDto> {
    return { chassisId, points: (await this.measurements.chassisTemplate(user, chassisId)).map(mapMeasurementPoint) };
  }

  @Put('chassis/:chassisId/measurement-template')
  @Roles(...MEASUREMENT_WRITERS)
  @ApiOkResponse({ type: MeasurementTemplateResponseDto })
  async putTemplate(
    @CurrentUser() user: AuthUser,
    @Param('chassisId', ParseIdPipe) chassisId: string,
    @Body() body: PutMeasurementTemplateDto,
  ): Promise<MeasurementTemplateResponseDto> {
    return { chassisId, points: (await this.measurements.putTemplate(user, chassisId, body.points)).map(mapMeasurementPoint) };
  }

  @Get('measurement-settings')
  @Roles(...MEASUREMENT_READERS)
  @ApiOkResponse({ type: MeasurementSettingsResponseDto })
  async settings(@CurrentUser() user: AuthUser): Promise<MeasurementSettingsResponseDto> {
    const limits = await this.measurements.limits(user);
    return { deviationLimitMm: limits.lengthMm, deviationLimitDeg: limits.angleDeg };
  }

  @Put('measurement-settings')
  @Roles(...MEASUREMENT_SETTINGS_WRITERS)
  @ApiOkResponse({ type: MeasurementSettingsResponseDto })
  async putSettings(@CurrentUser() user: AuthUser, @Body() body: MeasurementSettingsDto): Promise<MeasurementSettingsResponseDto> {
    const limits = await this.measurements.putLimits(user, body.deviationLimitMm, body.deviationLimitDeg);
    return { deviationLimitMm: limits.lengthMm, deviationLimitDeg: limits.angleDeg };
  }
}
