import { ShopResponseDto } from './dto/shop-response.dto';
import { Shop } from './shop.entity';

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
