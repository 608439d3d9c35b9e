import { ShopResponseDto, ShopSummaryResponseDto } from './dto/shop-response.dto';
import { Shop } from './shop.entity';

export function mapShopSummary(shop: Shop): ShopSummaryResponseDto {
  return { id: shop.id, name: shop.name, unitSystem: shop.unitSystem, currency: shop.currency };
}

export function mapShop(shop: Shop): ShopResponseDto {
  return {
    id: shop.id,
    name: shop.name,
    unitSystem: shop.unitSystem,
    laborRatePerHour: shop.laborRatePerHour,
    taxRatePercent: shop.taxRatePercent,
    shopSuppliesPercent: shop.shopSuppliesPercent,
    currency: shop.currency,
  };
}
