import { FindOptionsWhere, ObjectLiteral, Repository, SelectQueryBuilder } from 'typeorm';
import { AuthUser } from './auth-user';

interface ShopOwned extends ObjectLiteral {
  id: string;
  shopId: string;
}

/**
 * A repository that cannot forget the shop: every read, count and query builder is filtered by the
 * caller's shopId, so a record of another shop is simply not found (the service then answers 404).
 * Writes go through the plain repository after a scoped read, or set shopId from the caller.
 */
export class TenantRepository<T extends ShopOwned> {
  constructor(readonly repository: Repository<T>) {}

  where(user: Pick<AuthUser, 'shopId'>, where: FindOptionsWhere<T> = {}): FindOptionsWhere<T> {
    return { ...where, shopId: user.shopId } as FindOptionsWhere<T>;
  }

  findById(user: Pick<AuthUser, 'shopId'>, id: string): Promise<T | null> {
    return this.repository.findOne({ where: this.where(user, { id } as FindOptionsWhere<T>) });
  }

  count(user: Pick<AuthUser, 'shopId'>, where: FindOptionsWhere<T> = {}): Promise<number> {
    return this.repository.count({ where: this.where(user, where) });
  }

  query(user: Pick<AuthUser, 'shopId'>, alias: string): SelectQueryBuilder<T> {
    return this.repository.createQueryBuilder(alias).where(`${alias}.shopId = :tenantShopId`, { tenantShopId: user.shopId });
  }
}

/** Escapes %, _ and \ so a search term matches literally inside LIKE '%…%'. */
export function likeContains(term: string): string {
  return `%${term.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;
}
