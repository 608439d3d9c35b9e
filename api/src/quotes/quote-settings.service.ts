import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { UpdateQuoteSettingsDto } from './dto/quote-input.dto';
import { QuoteSettings } from './quote-settings.entity';

export const DEFAULT_QUOTE_TERMS =
  'Prices hold until the date shown. Work starts when the quote is approved and the deposit is paid; the balance is due when the vehicle is collected. ' +
  'Hidden damage found once the vehicle is apart (rust, broken fasteners, worn parts) is quoted separately before any extra work. ' +
  'The vehicle must meet local registration, emissions and inspection rules after the swap; the owner is responsible for those approvals.';

@Injectable()
export class QuoteSettingsService {
  constructor(@InjectRepository(QuoteSettings) private readonly settings: Repository<QuoteSettings>) {}

  async forShop(user: Pick<AuthUser, 'shopId'>): Promise<QuoteSettings> {
    const stored = await this.settings.findOne({ where: { shopId: user.shopId } });
    return (
      stored ??
      this.settings.create({
        shopId: user.shopId,
        laborTaxPercent: 0,
        suppliesCapCents: null,
        depositPercent: 30,
        validityDays: 30,
        defaultMarkupPercent: 30,
        terms: DEFAULT_QUOTE_TERMS,
        updatedAt: new Date(0),
      })
    );
  }

  async update(user: Pick<AuthUser, 'shopId'>, changes: UpdateQuoteSettingsDto): Promise<QuoteSettings> {
    const current = await this.forShop(user);
    const merged = this.settings.merge(current, {
      ...(changes.laborTaxPercent !== undefined && { laborTaxPercent: changes.laborTaxPercent }),
      ...(changes.suppliesCapCents !== undefined && { suppliesCapCents: changes.suppliesCapCents }),
      ...(changes.depositPercent !== undefined && { depositPercent: changes.depositPercent }),
      ...(changes.validityDays !== undefined && { validityDays: changes.validityDays }),
      ...(changes.defaultMarkupPercent !== undefined && { defaultMarkupPercent: changes.defaultMarkupPercent }),
      ...(changes.terms !== undefined && { terms: changes.terms }),
    });
    await this.settings.save(merged);
    return this.forShop(user);
  }
}
