import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { PART_CATEGORIES, PART_CATEGORY_LABELS, partCategoryFromText } from '@swapwright/shared';
import Papa from 'papaparse';
import { randomUUID } from 'node:crypto';
import { DataSource } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { escapeFormula } from './csv-cells';
import { MAX_PRICE_CENTS, SKU_PATTERN } from './dto/part.dto';
import { Part, PartStock, Supplier } from './part.entity';

export const IMPORT_FIELDS = ['sku', 'description', 'category', 'price', 'cost', 'supplier', 'supplierSku', 'laborHours', 'location', 'bin', 'onHand'] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];
export const REQUIRED_IMPORT_FIELDS: ImportField[] = ['sku', 'description', 'category', 'price'];
export const MAX_IMPORT_ROWS = 50_000;

/** Header spellings a supplier's file commonly uses, compared without case, spaces or punctuation. */
const ALIASES: Record<ImportField, string[]> = {
  sku: ['sku', 'partnumber', 'partno', 'itemnumber', 'itemno', 'item'],
  description: ['description', 'desc', 'name', 'title', 'partname'],
  category: ['category', 'cat', 'parttype', 'type'],
  price: ['price', 'retail', 'sellprice', 'listprice', 'priceusd'],
  cost: ['cost', 'dealercost', 'net', 'netprice'],
  supplier: ['supplier', 'vendor', 'brand'],
  supplierSku: ['suppliersku', 'vendorsku', 'vendorpart', 'vendorpartnumber', 'mfrpart'],
  laborHours: ['laborhours', 'labor', 'hours', 'installhours'],
  location: ['location', 'store', 'warehouse'],
  bin: ['bin', 'binlocation', 'shelf'],
  onHand: ['onhand', 'qty', 'quantity', 'stock', 'qtyonhand'],
};

export type ImportMapping = Partial<Record<ImportField, string>>;

export interface ImportRowError {
  row: number;
  field: string;
  message: string;
}

export interface ParsedRow {
  row: number;
  sku: string;
  description: string;
  category: string;
  priceCents: number;
  costCents: number | null;
  supplier: string | null;
  supplierSku: string | null;
  laborHours: number | null;
  location: string | null;
  bin: string | null;
  onHand: number | null;
}

export interface ImportPreview {
  headers: string[];
  mapping: ImportMapping;
  /** Required fields no header maps to: the person picks the columns. */
  unmapped: ImportField[];
  rowCount: number;
  validCount: number;
  errors: ImportRowError[];
  /** Rows with at least one error, as read, for the rejected-rows file. */
  rejected: Array<{ row: number; cells: Record<string, string>; errors: string[] }>;
  /** Cells that look like spreadsheet formulas: stored as text, exported escaped. */
  warnings: ImportRowError[];
  inserted?: number;
  updated?: number;
}

/** The category names a file may use (the short forms such as oil-pan are read as well). */
const CATEGORY_NAMES = PART_CATEGORIES.map((category) => PART_CATEGORY_LABELS[category]).join(', ');

const norm = (header: string) => header.toLowerCase().replace(/[^a-z0-9]/g, '');

export function autoMapping(headers: string[]): ImportMapping {
  const mapping: ImportMapping = {};
  for (const field of IMPORT_FIELDS) {
    const hit = headers.find((h) => ALIASES[field].includes(norm(h)));
    if (hit) mapping[field] = hit;
  }
  return mapping;
}

/** Money text to cents without floating point: 329, 329.5, 329.50, 1,329.00 (no negatives). */
export function parseCents(text: string): number | null {
  const clean = text.replace(/[$,\s]/g, '');
  const match = /^(\d{1,9})(?:\.(\d{1,2}))?$/.exec(clean);
  if (!match) return null;
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
}

/** Supplier catalogs and price files from CSV: preview with every row's errors, then one all-or-nothing upsert by SKU. */
@Injectable()
export class PartsImportService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  parse(csv: string, given?: ImportMapping): { preview: ImportPreview; rows: ParsedRow[] } {
    const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', dynamicTyping: false });
    const headers = (parsed.meta.fields ?? []).filter((h) => h !== '');
    if (headers.length === 0) throw new AppError(400, 'csv_empty', 'The file has no header row: the first line must name the columns.');
    if (parsed.data.length > MAX_IMPORT_ROWS) throw new AppError(400, 'csv_too_large', `The file has ${parsed.data.length} rows; import at most ${MAX_IMPORT_ROWS} at a time.`);
    const mapping = { ...autoMapping(headers), ...(given ?? {}) };
    for (const [field, header] of Object.entries(mapping)) {
      if (header && !headers.includes(header)) throw new AppError(400, 'csv_mapping', `The mapping sends ${field} to "${header}", which is not a column of the file.`);
    }
    const unmapped = REQUIRED_IMPORT_FIELDS.filter((field) => !mapping[field]);
    const errors: ImportRowError[] = [];
    const warnings: ImportRowError[] = [];
    const rejected: ImportPreview['rejected'] = [];
    const rows: ParsedRow[] = [];
    const seen = new Map<string, number>();
    if (unmapped.length === 0) {
      parsed.data.forEach((record, index) => {
        const row = index + 2; // the header is line 1
        const rowErrors: ImportRowError[] = [];
        const cell = (field: ImportField) => (mapping[field] ? String(record[mapping[field]!] ?? '').trim() : '');
        const fail = (field: string, message: string) => rowErrors.push({ row, field, message });
        const sku = cell('sku');
        if (!sku) fail('sku', 'SKU is missing');
        else if (!SKU_PATTERN.test(sku) || sku.length > 64) fail('sku', `SKU "${sku.slice(0, 70)}" may hold letters, digits and - _ . / only (64 at most)`);
        else if (seen.has(sku.toUpperCase())) fail('sku', `SKU ${sku} appears again (first on line ${seen.get(sku.toUpperCase())})`);
        else seen.set(sku.toUpperCase(), row);
        const description = cell('description');
        if (!description) fail('description', 'description is missing');
        else if (description.length > 240) fail('description', 'description is longer than 240 characters');
        const categoryText = cell('category');
        const category = partCategoryFromText(categoryText);
        if (!category) {
          fail(
            'category',
            categoryText
              ? `line ${row}: category "${categoryText.slice(0, 70)}" is not one we know; write one of: ${CATEGORY_NAMES}`
              : `line ${row}: category is missing; write one of: ${CATEGORY_NAMES}`,
          );
        }
        const priceCents = parseCents(cell('price'));
        if (priceCents === null || priceCents > MAX_PRICE_CENTS) fail('price', `price "${cell('price')}" is not an amount like 329.00`);
        const costText = cell('cost');
        const costCents = costText ? parseCents(costText) : null;
        if (costText && (costCents === null || costCents > MAX_PRICE_CENTS)) fail('cost', `cost "${costText}" is not an amount like 210.00`);
        const hoursText = cell('laborHours');
        const laborHours = hoursText ? Number(hoursText) : null;
        if (hoursText && (!/^\d{1,3}(\.\d)?$/.test(hoursText) || laborHours! > 500)) fail('laborHours', `labor hours "${hoursText}" must be hours to a tenth, like 2.5`);
        const onHandText = cell('onHand');
        const onHand = onHandText ? Number(onHandText) : null;
        if (onHandText && !/^\d{1,7}$/.test(onHandText)) fail('onHand', `on hand "${onHandText}" must be a whole number`);
        const location = cell('location') || null;
        if (onHandText && !location) fail('location', 'a stock count needs a location');
        if ((location ?? '').length > 60) fail('location', 'location is longer than 60 characters');
        if (cell('bin').length > 40) fail('bin', 'bin is longer than 40 characters');
        if (cell('supplier').length > 120) fail('supplier', 'supplier is longer than 120 characters');
        if (cell('supplierSku').length > 64) fail('supplierSku', 'supplier SKU is longer than 64 characters');
        for (const field of ['description', 'supplier', 'supplierSku', 'bin', 'location'] as const) {
          if (escapeFormula(cell(field)) !== cell(field)) warnings.push({ row, field, message: `${field} starts like a spreadsheet formula; it is stored as plain text` });
        }
        if (rowErrors.length > 0) {
          errors.push(...rowErrors);
          rejected.push({ row, cells: record, errors: rowErrors.map((e) => e.message) });
          return;
        }
        rows.push({
          row,
          sku,
          description,
          category: category!,
          priceCents: priceCents!,
          costCents,
          supplier: cell('supplier') || null,
          supplierSku: cell('supplierSku') || null,
          laborHours,
          location,
          bin: cell('bin') || null,
          onHand,
        });
      });
    }
    return {
      preview: { headers, mapping, unmapped, rowCount: parsed.data.length, validCount: rows.length, errors, rejected, warnings },
      rows,
    };
  }

  /** All or nothing: any row error refuses the whole file; otherwise one transaction upserts every row by SKU. */
  async import(user: AuthUser, csv: string, mapping?: ImportMapping): Promise<ImportPreview> {
    const { preview, rows } = this.parse(csv, mapping);
    if (preview.unmapped.length > 0) {
      throw new AppError(400, 'csv_mapping', `Choose the file's columns for: ${preview.unmapped.join(', ')}.`, preview.unmapped.map((f) => `${f} has no column`));
    }
    if (preview.errors.length > 0) {
      throw new AppError(
        400,
        'csv_rows_invalid',
        `${preview.rejected.length} of ${preview.rowCount} rows have errors; nothing was imported. Fix them (or download the rejected rows) and import again.`,
        preview.errors.slice(0, 200).map((e) => `line ${e.row}: ${e.message}`),
      );
    }
    let inserted = 0;
    await this.dataSource.transaction(async (manager) => {
      const suppliers = new Map((await manager.find(Supplier, { where: { shopId: user.shopId } })).map((s) => [s.name.toLowerCase(), s.id]));
      for (const name of new Set(rows.map((r) => r.supplier).filter((n): n is string => !!n))) {
        if (suppliers.has(name.toLowerCase())) continue;
        const id = randomUUID();
        await manager.insert(Supplier, { id, shopId: user.shopId, name, contact: null, email: null, phone: null });
        suppliers.set(name.toLowerCase(), id);
      }
      const existing = new Map(
        (await manager.query('SELECT id, sku FROM parts WHERE shopId = ? FOR UPDATE', [user.shopId]) as Array<{ id: string; sku: string }>).map((p) => [p.sku.toUpperCase(), p.id]),
      );
      const ids = rows.map((r) => existing.get(r.sku.toUpperCase()) ?? randomUUID());
      inserted = rows.filter((r) => !existing.has(r.sku.toUpperCase())).length;
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'stock',
        action: 'stock.imported',
        subjectId: null,
        summary: `Parts file imported: ${rows.length} rows, ${inserted} new parts, ${rows.length - inserted} updated.`,
        before: { parts: existing.size },
        after: { parts: existing.size + inserted, rows: rows.length, added: inserted, updated: rows.length - inserted },
      });
      for (let start = 0; start < rows.length; start += 500) {
        const chunk = rows.slice(start, start + 500);
        const values: unknown[] = [];
        chunk.forEach((r, k) => {
          values.push(ids[start + k], user.shopId, r.sku, r.description, r.category, r.priceCents, r.costCents ?? 0, r.supplier ? suppliers.get(r.supplier.toLowerCase()) : null, r.supplierSku, r.laborHours ?? 0);
        });
        await manager.query(
          `INSERT INTO parts (id, shopId, sku, description, category, priceCents, costCents, supplierId, supplierSku, laborHours, torqueSpecs, attributes, requiresSkus, excludesSkus, replacesSkus)
           VALUES ${chunk.map(() => "(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, '[]', '{}', '[]', '[]', '[]')").join(', ')}
           ON DUPLICATE KEY UPDATE description = VALUES(description), category = VALUES(category), priceCents = VALUES(priceCents),
             costCents = VALUES(costCents), supplierId = COALESCE(VALUES(supplierId), supplierId), supplierSku = COALESCE(VALUES(supplierSku), supplierSku),
             laborHours = VALUES(laborHours)`,
          values,
        );
        const stocked = chunk.map((r, k) => ({ r, id: ids[start + k] })).filter(({ r }) => r.location && r.onHand !== null);
        if (stocked.length > 0) {
          const stockValues: unknown[] = [];
          for (const { r, id } of stocked) stockValues.push(randomUUID(), user.shopId, id, r.location, r.bin ?? '', r.onHand);
          await manager.query(
            `INSERT INTO part_stock (id, shopId, partId, location, bin, onHand, reserved) VALUES ${stocked.map(() => '(?, ?, ?, ?, ?, ?, 0)').join(', ')}
             ON DUPLICATE KEY UPDATE onHand = GREATEST(VALUES(onHand), reserved), bin = IF(VALUES(bin) = '', bin, VALUES(bin))`,
            stockValues,
          );
        }
      }
    });
    return { ...preview, inserted, updated: rows.length - inserted };
  }

  /** The catalog as CSV in the import's own columns; formula-looking cells escaped. */
  async exportCsv(user: Pick<AuthUser, 'shopId'>): Promise<string> {
    const parts = await this.dataSource.getRepository(Part).find({ where: { shopId: user.shopId }, order: { sku: 'ASC' } });
    const suppliers = new Map((await this.dataSource.getRepository(Supplier).find({ where: { shopId: user.shopId } })).map((s) => [s.id, s.name]));
    const stock = await this.dataSource.getRepository(PartStock).find({ where: { shopId: user.shopId }, order: { location: 'ASC' } });
    const first = new Map<string, PartStock>();
    const totals = new Map<string, number>();
    for (const s of stock) {
      if (!first.has(s.partId)) first.set(s.partId, s);
      totals.set(s.partId, (totals.get(s.partId) ?? 0) + s.onHand);
    }
    const money = (cents: number) => `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
    const data = parts.map((p) =>
      [
        p.sku,
        p.description,
        p.category,
        money(p.priceCents),
        money(p.costCents),
        p.supplierId ? suppliers.get(p.supplierId) ?? '' : '',
        p.supplierSku ?? '',
        p.laborHours,
        first.get(p.id)?.location ?? '',
        first.get(p.id)?.bin ?? '',
        first.has(p.id) ? totals.get(p.id) : '',
      ].map(escapeFormula),
    );
    return Papa.unparse({ fields: [...IMPORT_FIELDS], data });
  }
}
