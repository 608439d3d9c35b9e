import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { LABOR_OPERATION_READERS, LABOR_OPERATION_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { CreateLaborOperationDto, LaborOperationResponseDto, UpdateLaborOperationDto } from './dto/labor-operation.dto';
import { mapLaborOperation } from './labor-operation.mapper';
import { LaborOperationsService } from './labor-operations.service';

@ApiTags('labor-operations')
@ApiBearerAuth()
@Controller('labor-operations')
export class LaborOperationsController {
  constructor(private readonly operations: LaborOperationsService) {}

  @Get()
  @Roles(...LABOR_OPERATION_READERS)
  @ApiOkResponse({ type: [LaborOperationResponseDto] })
  async list(@CurrentUser() user: AuthUser): Promise<LaborOperationResponseDto[]> {
    return (await this.operations.list(user)).map(mapLaborOperation);
  }

  @Post()
  @Roles(...LABOR_OPERATION_WRITERS)
  @ApiCreatedResponse({ type: LaborOperationResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreateLaborOperationDto): Promise<LaborOperationResponseDto> {
    return mapLaborOperation(await this.operations.create(user, body));
  }

  @Patch(':id')
  @Roles(...LABOR_OPERATION_WRITERS)
  @ApiOkResponse({ type: LaborOperationResponseDto })
  async update(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdateLaborOperationDto): Promise<LaborOperationResponseDto> {
    return mapLaborOperation(await this.operations.update(user, id, body));
  }

  @Delete(':id')
  @Roles(...LABOR_OPERATION_WRITERS)
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.operations.remove(user, id);
  }
}
