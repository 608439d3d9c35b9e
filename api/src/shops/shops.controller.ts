import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiExtraModels, ApiForbiddenResponse, ApiOkResponse, ApiTags, getSchemaPath } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { SHOP_ADMINS, SHOP_RATE_READERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { ShopResponseDto, ShopSummaryResponseDto } from './dto/shop-response.dto';
import { UpdateShopDto } from './dto/update-shop.dto';
import { mapShop, mapShopSummary } from './shop.mapper';
import { ShopsService } from './shops.service';

@ApiTags('shops')
@ApiBearerAuth()
@ApiExtraModels(ShopResponseDto, ShopSummaryResponseDto)
@Controller('shops/current')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get()
  @ApiOkResponse({
    description: 'Staff get the shop with its rates; customers only its name, units and currency',
    schema: { oneOf: [{ $ref: getSchemaPath(ShopResponseDto) }, { $ref: getSchemaPath(ShopSummaryResponseDto) }] },
  })
  async get(@CurrentUser() user: AuthUser): Promise<ShopResponseDto | ShopSummaryResponseDto> {
    const shop = await this.shops.getCurrent(user);
    return SHOP_RATE_READERS.includes(user.role) ? mapShop(shop) : mapShopSummary(shop);
  }

  @Patch()
  @Roles(...SHOP_ADMINS)
  @ApiOkResponse({ type: ShopResponseDto })
  @ApiForbiddenResponse({ type: ErrorResponseDto })
  async update(@CurrentUser() user: AuthUser, @Body() body: UpdateShopDto): Promise<ShopResponseDto> {
    return mapShop(await this.shops.updateCurrent(user, body));
  }
}
