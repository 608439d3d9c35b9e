import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { FitSettings } from '@swapwright/shared';
import { Repository } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { FitSettingsOverridesDto } from './dto/fit-settings-overrides.dto';
import { ShopFitSettings } from './shop-fit-settings.entity';
import { jsonCopy } from '../common/json/json-copy';

/** How long a what-if preview may use a shop's thresholds as read before (see overridesForPreview). */
export const PREVIEW_SETTINGS_TTL_MS = 2000;

@Injectable()
export class FitSettingsService {
  private readonly previewCache = new Map<string, { overrides: Partial<FitSettings>; until: number }>();

  constructor(@InjectRepository(ShopFitSettings) private readonly settings: Repository<ShopFitSettings>) {}

  /**
   * The shop's overrides for a what-if preview, read at most every PREVIEW_SETTINGS_TTL_MS per shop and instance.
   * Why that is correct with several API instances: a preview stores nothing and is recomputed on every change of
   * the form, and this instance forgets its copy as soon as it saves new thresholds; another instance uses them at
   * most two seconds later. Everything that stores a result (a fit-report run, a parts plan) reads fresh through
   * overridesFor.
   */
  async overridesForPreview(user: Pick<AuthUser, 'shopId'>): Promise<Partial<FitSettings>> {
    const now = Date.now();
    const cached = this.previewCache.get(user.shopId);
    if (cached && cached.until > now) return cached.overrides;
    const overrides = await this.overridesFor(user);
    if (this.previewCache.size > 10_000) this.previewCache.clear();
    this.previewCache.set(user.shopId, { overrides, until: now + PREVIEW_SETTINGS_TTL_MS });
    return overrides;
  }

  async overridesFor(user: Pick<AuthUser, 'shopId'>): Promise<Partial<FitSettings>> {
    const row = await this.settings.findOne({ where: { shopId: user.shopId } });
    return row?.overrides ?? {};
  }

  /** The shop's stored overrides, or null before the owner first sets any. */
  get(user: Pick<AuthUser, 'shopId'>): Promise<ShopFitSettings | null> {
    return this.settings.findOne({ where: { shopId: user.shopId } });
  }

  async replace(user: AuthUser, overrides: FitSettingsOverridesDto): Promise<ShopFitSettings | null> {
    const plain = jsonCopy(overrides) as Partial<FitSettings>;
    await this.settings.upsert({ shopId: user.shopId, overrides: plain, updatedById: user.userId }, ['shopId']);
    this.previewCache.delete(user.shopId);
    return this.get(user);
  }
}
