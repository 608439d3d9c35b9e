import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { EntityManager, Repository } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { UpdateShopDto } from './dto/update-shop.dto';
import { Shop } from './shop.entity';
import { ShopErrors } from './shops.errors';

@Injectable()
export class ShopsService {
  constructor(@InjectRepository(Shop) private readonly shops: Repository<Shop>) {}

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

  async updateCurrent(user: Pick<AuthUser, 'shopId'>, changes: UpdateShopDto): Promise<Shop> {
    const shop = await this.getCurrent(user);
    Object.assign(shop, changes, changes.name !== undefined ? { name: changes.name.trim() } : {});
    if (changes.currency) shop.currency = changes.currency.toUpperCase();
    return this.shops.save(shop);
  }

  /** Inside the sign-up transaction. */
  create(manager: EntityManager, name: string): Promise<Shop> {
    return manager.save(
      manager.create(Shop, {
        id: randomUUID(),
        name: name.trim(),
        unitSystem: 'in',
        laborRatePerHour: 0,
        taxRatePercent: 0,
        shopSuppliesPercent: 0,
        currency: 'USD',
      }),
    );
  }
}
