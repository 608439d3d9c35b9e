import { resolveFitSettings } from '@swapwright/shared';
import { FitSettingsResponseDto } from './dto/fit-report-response.dto';
import { ShopFitSettings } from './shop-fit-settings.entity';

/** The shop's overrides and the thresholds in effect with them; no row yet means no overrides. */
export function mapFitSettings(row: ShopFitSettings | null): FitSettingsResponseDto {
  const overrides = row?.overrides ?? {};
  return { overrides, effective: resolveFitSettings(overrides), updatedAt: row?.updatedAt.toISOString() ?? null };
}
