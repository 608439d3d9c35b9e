import { Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { SampleCatalogResponseDto } from './dto/sample-catalog-response.dto';
import { SampleCatalogService } from './sample-catalog.service';

@ApiTags('catalog')
@ApiBearerAuth()
@Controller('catalog/sample')
export class SampleCatalogController {
  constructor(private readonly sample: SampleCatalogService) {}

  @Post()
  @HttpCode(200)
  @Roles(...SHOP_ADMINS)
  @ApiOperation({
    summary: "Start the shop's catalog from Swapwright's sample catalog (invented engines, chassis and parts)",
    description: 'Copies every sample record into your catalog in one transaction; records copied before stay as they are, so a second call adds nothing.',
    operationId: 'copySampleCatalog',
  })
  @ApiOkResponse({ type: SampleCatalogResponseDto })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Only the shop owner starts the catalog from the sample' })
  copy(@CurrentUser() user: AuthUser): Promise<SampleCatalogResponseDto> {
    return this.sample.copyInto(user);
  }
}
