import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiExtraModels, ApiForbiddenResponse, ApiOkResponse, ApiTags, getSchemaPath } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { CurrentShopResponseDto, ShopResponseDto, ShopSummaryResponseDto } from './dto/shop-response.dto';
import { UpdateShopDto } from './dto/update-shop.dto';
import { mapShop, mapShopFor } from './shop.mapper';
import { ShopsService } from './shops.service';

@ApiTags('shops')
@ApiBearerAuth()
@ApiExtraModels(ShopResponseDto, ShopSummaryResponseDto)
@Controller('shops/current')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get()
  @ApiOkResponse({
    description: 'Staff who may read rates get the full view (`view: "full"`, with the rates); everyone else the summary (`view: "summary"`)',
    schema: {
      oneOf: [{ $ref: getSchemaPath(ShopResponseDto) }, { $ref: getSchemaPath(ShopSummaryResponseDto) }],
      discriminator: {
        propertyName: 'view',
        mapping: { full: getSchemaPath(ShopResponseDto), summary: getSchemaPath(ShopSummaryResponseDto) },
      },
    },
  })
  async get(@CurrentUser() user: AuthUser): Promise<CurrentShopResponseDto> {
    return mapShopFor(user.role, await this.shops.getCurrent(user));
  }

  @Patch()
  @Roles(...SHOP_ADMINS)
  @ApiOkResponse({ type: ShopResponseDto })
  @ApiForbiddenResponse({ type: ErrorResponseDto })
  async update(@CurrentUser() user: AuthUser, @Body() body: UpdateShopDto): Promise<ShopResponseDto> {
    return mapShop(await this.shops.updateCurrent(user, body));
  }
}
