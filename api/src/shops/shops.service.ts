import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { canonicalTimeZone } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { EntityManager, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { changedFigures } from '../audit/changed-figures';
import { AuthUser } from '../common/tenant/auth-user';
import { UpdateShopDto } from './dto/update-shop.dto';
import { Shop } from './shop.entity';
import { ShopErrors } from './shops.errors';

/** The shop fields that price work: their changes are audited. */
const MONEY_FIELDS = ['laborRatePerHour', 'taxRatePercent', 'shopSuppliesPercent'] as const;

/** Work another module does, in the same transaction, when the shop's rates change (the quotes module reprices its drafts). */
export type ShopRatesChanged = (manager: EntityManager, shopId: string, actor: AuthUser) => Promise<void>;

@Injectable()
export class ShopsService {
  private readonly ratesChangedHandlers: ShopRatesChanged[] = [];

  constructor(
    @InjectRepository(Shop) private readonly shops: Repository<Shop>,
    private readonly audit: AuditService,
  ) {}

  /** Registers work to do, inside the change's transaction, after the shop's rates change. */
  onRatesChanged(handler: ShopRatesChanged): void {
    this.ratesChangedHandlers.push(handler);
  }

  async getCurrent(user: Pick<AuthUser, 'shopId'>): Promise<Shop> {
    const shop = await this.shops.findOne({ where: { id: user.shopId } });
    if (!shop) throw ShopErrors.notFound();
    return shop;
  }

  /** The shop by id; pass the manager of an open transaction (sign-up creates the shop in the same one). */
  async getById(shopId: string, manager: EntityManager = this.shops.manager): Promise<Shop> {
    const shop = await manager.findOne(Shop, { where: { id: shopId } });
    if (!shop) throw ShopErrors.notFound();
    return shop;
  }

  /** Rate changes (labor, tax, shop supplies) go to the audit log in the same transaction as the change. */
  async updateCurrent(user: AuthUser, changes: UpdateShopDto): Promise<Shop> {
    return this.shops.manager.transaction(async (manager) => {
      const shop = await manager.findOne(Shop, { where: { id: user.shopId }, lock: { mode: 'pessimistic_write' } });
      if (!shop) throw ShopErrors.notFound();
      const moved = changedFigures(shop, changes, MONEY_FIELDS, shop.currency);
      if (moved) {
        await this.audit.record(manager, {
          shopId: user.shopId,
          actor: user,
          kind: 'money',
          action: 'shop.rates-changed',
          subjectId: shop.id,
          summary: `Shop rates changed: ${moved.description}.`,
          before: moved.before,
          after: moved.after,
        });
      }
      // Only the fields sent: the DTO instance also carries the others as undefined, which would blank them in the answer.
      const sent = Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined));
      Object.assign(shop, sent, changes.name !== undefined ? { name: changes.name.trim() } : {});
      if (changes.currency) shop.currency = changes.currency.toUpperCase();
      if (changes.timeZone) shop.timeZone = canonicalTimeZone(changes.timeZone);
      const saved = await manager.save(shop);
      if (moved) for (const handler of this.ratesChangedHandlers) await handler(manager, saved.id, user);
      return saved;
    });
  }

  /** Inside the sign-up transaction; `timeZone` is the zone the owner's browser reported (else UTC). */
  create(manager: EntityManager, name: string, timeZone = 'UTC'): Promise<Shop> {
    return manager.save(
      manager.create(Shop, {
        id: randomUUID(),
        name: name.trim(),
        unitSystem: 'in',
        laborRatePerHour: 0,
        taxRatePercent: 0,
        shopSuppliesPercent: 0,
        currency: 'USD',
        timeZone: canonicalTimeZone(timeZone),
      }),
    );
  }
}
