import { PartResponseDto, StockResponseDto, SupplierResponseDto } from './dto/part.dto';
import { Part, PartStock, Supplier } from './part.entity';

export function mapStock(row: PartStock): StockResponseDto {
  return { id: row.id, location: row.location, bin: row.bin, onHand: row.onHand, reserved: row.reserved, available: row.onHand - row.reserved };
}

export function mapPart(part: Part, stock: PartStock[], supplierName: string | null): PartResponseDto {
  const mapped = stock.map(mapStock);
  return {
    id: part.id,
    sku: part.sku,
    description: part.description,
    category: part.category,
    priceCents: part.priceCents,
    costCents: part.costCents,
    supplierId: part.supplierId,
    supplierName,
    supplierSku: part.supplierSku,
    laborHours: part.laborHours,
    torqueSpecs: part.torqueSpecs,
    instructions: part.instructions,
    attributes: part.attributes,
    requiresSkus: part.requiresSkus,
    excludesSkus: part.excludesSkus,
    replacesSkus: part.replacesSkus,
    fitKind: part.fitKind,
    fitSpecId: part.fitSpecId,
    stock: mapped,
    onHand: mapped.reduce((sum, s) => sum + s.onHand, 0),
    available: mapped.reduce((sum, s) => sum + s.available, 0),
    updatedAt: part.updatedAt.toISOString(),
  };
}

export function mapSupplier(row: Supplier): SupplierResponseDto {
  return { id: row.id, name: row.name, contact: row.contact, email: row.email, phone: row.phone };
}
