import type { Role } from '../common/roles/role';
import { SHOP_RATE_READERS } from '../common/roles/role-matrix';
import { CurrentShopResponseDto, ShopResponseDto, ShopSummaryResponseDto } from './dto/shop-response.dto';
import { Shop } from './shop.entity';

export function mapShopSummary(shop: Shop): ShopSummaryResponseDto {
  return { view: 'summary', id: shop.id, name: shop.name, unitSystem: shop.unitSystem, currency: shop.currency, timeZone: shop.timeZone };
}

export function mapShop(shop: Shop): ShopResponseDto {
  return {
    view: 'full',
    id: shop.id,
    name: shop.name,
    unitSystem: shop.unitSystem,
    laborRatePerHour: shop.laborRatePerHour,
    taxRatePercent: shop.taxRatePercent,
    shopSuppliesPercent: shop.shopSuppliesPercent,
    currency: shop.currency,
    timeZone: shop.timeZone,
  };
}

/** The view of the shop a role may see: with the rates for those who may read them, the summary for the rest. */
export function mapShopFor(role: Role, shop: Shop): CurrentShopResponseDto {
  return SHOP_RATE_READERS.includes(role) ? mapShop(shop) : mapShopSummary(shop);
}
