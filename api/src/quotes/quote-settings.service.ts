import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { changedFigures } from '../audit/changed-figures';
import { AuthUser } from '../common/tenant/auth-user';
import { Shop } from '../shops/shop.entity';
import { UpdateQuoteSettingsDto } from './dto/quote-input.dto';
import { QuoteSettings } from './quote-settings.entity';

export const DEFAULT_QUOTE_TERMS =
  'Prices hold until the date shown. Work starts when the quote is approved and the deposit is paid; the balance is due when the vehicle is collected. ' +
  'Hidden damage found once the vehicle is apart (rust, broken fasteners, worn parts) is quoted separately before any extra work. ' +
  'The vehicle must meet local registration, emissions and inspection rules after the swap; the owner is responsible for those approvals.';

/** The quote terms that price work (tax on labor, supplies cap, deposit, markup): their changes are audited as money. */
const MONEY_TERMS = ['laborTaxPercent', 'suppliesCapCents', 'depositPercent', 'defaultMarkupPercent'] as const;
/** The terms every revision carries into its totals: a change reprices the quotes still being written. */
const PRICING_TERMS = ['laborTaxPercent', 'suppliesCapCents'] as const;

export type QuotePricingChanged = (manager: EntityManager, shopId: string, actor: AuthUser) => Promise<void>;

@Injectable()
export class QuoteSettingsService {
  private readonly pricingChangedHandlers: QuotePricingChanged[] = [];

  constructor(
    @InjectRepository(QuoteSettings) private readonly settings: Repository<QuoteSettings>,
    private readonly audit: AuditService,
  ) {}

  /** Registers work to do, inside the change's transaction, after the tax on labor or the supplies cap changes. */
  onPricingChanged(handler: QuotePricingChanged): void {
    this.pricingChangedHandlers.push(handler);
  }

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

  /** Money terms (tax on labor, supplies cap, deposit, markup) go to the audit log in the same transaction as the change. */
  async update(user: AuthUser, changes: UpdateQuoteSettingsDto): Promise<QuoteSettings> {
    await this.settings.manager.transaction(async (manager) => {
      const stored = await manager.findOne(QuoteSettings, { where: { shopId: user.shopId }, lock: { mode: 'pessimistic_write' } });
      const current = stored ?? (await this.forShop(user));
      const shop = await manager.findOne(Shop, { select: { id: true, currency: true }, where: { id: user.shopId } });
      const moved = changedFigures(current, changes, MONEY_TERMS, shop?.currency);
      const repriced = changedFigures(current, changes, PRICING_TERMS) !== null;
      if (moved) {
        await this.audit.record(manager, {
          shopId: user.shopId,
          actor: user,
          kind: 'money',
          action: 'quote-terms.changed',
          subjectId: user.shopId,
          summary: `Quote terms changed: ${moved.description}.`,
          before: moved.before,
          after: moved.after,
        });
      }
      const merged = manager.merge(QuoteSettings, current, {
        ...(changes.laborTaxPercent !== undefined && { laborTaxPercent: changes.laborTaxPercent }),
        ...(changes.suppliesCapCents !== undefined && { suppliesCapCents: changes.suppliesCapCents }),
        ...(changes.depositPercent !== undefined && { depositPercent: changes.depositPercent }),
        ...(changes.validityDays !== undefined && { validityDays: changes.validityDays }),
        ...(changes.defaultMarkupPercent !== undefined && { defaultMarkupPercent: changes.defaultMarkupPercent }),
        ...(changes.terms !== undefined && { terms: changes.terms }),
      });
      await manager.save(QuoteSettings, merged);
      if (repriced) for (const handler of this.pricingChangedHandlers) await handler(manager, user.shopId, user);
    });
    return this.forShop(user);
  }
}
