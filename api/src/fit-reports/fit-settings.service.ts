import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { resolveFitSettings, type FitSettings } from '@swapwright/shared';
import { Repository } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { FitSettingsResponseDto } from './dto/fit-report-response.dto';
import { FitSettingsOverridesDto } from './dto/fit-settings-overrides.dto';
import { ShopFitSettings } from './shop-fit-settings.entity';
import { jsonCopy } from '../common/json/json-copy';

@Injectable()
export class FitSettingsService {
  constructor(@InjectRepository(ShopFitSettings) private readonly settings: Repository<ShopFitSettings>) {}

  async overridesFor(user: Pick<AuthUser, 'shopId'>): Promise<Partial<FitSettings>> {
    const row = await this.settings.findOne({ where: { shopId: user.shopId } });
    return row?.overrides ?? {};
  }

  async get(user: Pick<AuthUser, 'shopId'>): Promise<FitSettingsResponseDto> {
    const row = await this.settings.findOne({ where: { shopId: user.shopId } });
    const overrides = row?.overrides ?? {};
    return { overrides, effective: resolveFitSettings(overrides), updatedAt: row?.updatedAt.toISOString() ?? null };
  }

  async replace(user: AuthUser, overrides: FitSettingsOverridesDto): Promise<FitSettingsResponseDto> {
    const plain = jsonCopy(overrides) as Partial<FitSettings>;
    await this.settings.upsert({ shopId: user.shopId, overrides: plain, updatedById: user.userId }, ['shopId']);
    return this.get(user);
  }
}
