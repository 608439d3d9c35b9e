import { PART_CATEGORIES } from '@swapwright/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import Papa from 'papaparse';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { PartsImport, sampleImportCsv } from '../parts-import';

describe('sampleImportCsv', () => {
  it('is a file the import reads without matching columns: its headers are the import fields, its categories valid', () => {
    // Source: RFC 4180 (text/csv) — a header row, then one record a line; parsed here with papaparse
    const parsed = Papa.parse<Record<string, string>>(sampleImportCsv(), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(['sku', 'description', 'category', 'price', 'cost', 'supplier', 'supplierSku', 'laborHours', 'location', 'bin', 'onHand']);
    expect(parsed.data).toHaveLength(2);
    for (const row of parsed.data) expect(PART_CATEGORIES).toContain(row.category);
  });
});

describe('PartsImport', () => {
  it('says what a file needs before one is chosen, and names the columns to match in the counter’s words', async () => {
    vi.spyOn(apiClient, 'post').mockResolvedValue({
      data: { headers: ['Item Code', 'Title', 'Kind', 'Retail'], mapping: { description: 'Title', price: 'Retail' }, unmapped: ['sku', 'category'], rowCount: 2, validCount: 0, errors: [], rejected: [], warnings: [] },
    });
    renderWithApp(<PartsImport />);
    expect(screen.getByText(/Each line needs a SKU \(part number\), a description, a category and a price/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Download a sample file' })).toBeInTheDocument();

    const input = document.querySelector('input[type=file]') as HTMLInputElement;
    await userEvent.upload(input, new File(['Item Code,Title,Kind,Retail\nA-1,Hose,hoses,10\n'], 'prices.csv', { type: 'text/csv' }));
    const alert = await screen.findByText("Choose the file's columns for: SKU (part number), Category.");
    expect(alert).toBeInTheDocument();
    expect(screen.getByLabelText('Column for SKU (part number)')).toBeInTheDocument();
    expect(screen.getByLabelText("Column for Supplier's part number")).toBeInTheDocument();
    expect(within(document.body).queryByText('supplierSku')).toBeNull();
  });
});
