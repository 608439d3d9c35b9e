import { DEMO_PARTS, DEMO_SHOP, DEMO_SUPPLIERS } from '@swapwright/seed-data';
import { DataSource, In } from 'typeorm';
import { Part, PartStock, Supplier } from '../../parts/part.entity';
import type { CatalogPartCategory, FitSpecKind } from '@swapwright/shared';

/** Loads the demo suppliers, parts and stock by fixed ids (a second run adds nothing). Needs the demo catalog first. */
export async function seedParts(dataSource: DataSource): Promise<{ inserted: number }> {
  return dataSource.transaction(async (manager) => {
    let inserted = 0;
    const knownSuppliers = new Set((await manager.find(Supplier, { select: { id: true }, where: { id: In(DEMO_SUPPLIERS.map((s) => s.id)) } })).map((s) => s.id));
    for (const supplier of DEMO_SUPPLIERS.filter((s) => !knownSuppliers.has(s.id))) {
      await manager.insert(Supplier, { ...supplier, shopId: DEMO_SHOP.id });
      inserted += 1;
    }
    const knownParts = new Set((await manager.find(Part, { select: { id: true }, where: { id: In(DEMO_PARTS.map((p) => p.id)) } })).map((p) => p.id));
    for (const { stock, ...part } of DEMO_PARTS.filter((p) => !knownParts.has(p.id))) {
      await manager.insert(Part, { ...part, shopId: DEMO_SHOP.id, category: part.category as CatalogPartCategory, fitKind: part.fitKind as FitSpecKind | null });
      for (const row of stock) await manager.insert(PartStock, { ...row, shopId: DEMO_SHOP.id, partId: part.id, reserved: 0 });
      inserted += 1;
    }
    return { inserted };
  });
}
