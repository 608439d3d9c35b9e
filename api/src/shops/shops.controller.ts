import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { SHOP_ADMINS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { ShopResponseDto } from './dto/shop-response.dto';
import { UpdateShopDto } from './dto/update-shop.dto';
import { mapShop } from './shop.mapper';
import { ShopsService } from './shops.service';

@ApiTags('shops')
@ApiBearerAuth()
@Controller('shops/current')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get()
  @ApiOkResponse({ type: ShopResponseDto })
  async get(@CurrentUser() user: AuthUser): Promise<ShopResponseDto> {
    return mapShop(await this.shops.getCurrent(user));
  }

  @Patch()
  @Roles(...SHOP_ADMINS)
  @ApiOkResponse({ type: ShopResponseDto })
  @ApiForbiddenResponse({ type: ErrorResponseDto })
  async update(@CurrentUser() user: AuthUser, @Body() body: UpdateShopDto): Promise<ShopResponseDto> {
    return mapShop(await this.shops.updateCurrent(user, body));
  }
}
