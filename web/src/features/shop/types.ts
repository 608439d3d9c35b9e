import type { RequestBodyOf, ResponseOf, Schemas } from '@/lib/api-types';

/** What `GET /api/shops/current` answers: staff get the shop with its rates, customers only its summary. */
export type CurrentShop = ResponseOf<'/api/shops/current', 'get'>;
/** The shop with its rates (staff; what an update answers). */
export type Shop = Schemas['ShopResponseDto'];
export type UpdateShopInput = RequestBodyOf<'/api/shops/current', 'patch'>;

/** Whether the answer is the full view with the shop's rates (it is for staff who may read them). */
export function hasShopRates(shop: CurrentShop): shop is Shop {
  return shop.view === 'full';
}

/** The shop's quote terms: labor tax, supplies cap, deposit, default markup, validity and printed terms. */
export type QuoteSettings = Schemas['QuoteSettingsResponseDto'];
export type UpdateQuoteSettingsInput = RequestBodyOf<'/api/quote-settings', 'put'>;
