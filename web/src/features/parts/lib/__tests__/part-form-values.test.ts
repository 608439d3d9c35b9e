import { describe, expect, it } from 'vitest';
import { formValuesToBody, partToFormValues, readAttributeValue } from '../part-form-values';

describe('part form values', () => {
  it('reads an attribute as true/false, a number, a comma list or text', () => {
    expect(readAttributeValue('true')).toBe(true);
    expect(readAttributeValue(' 190 ')).toBe(190);
    expect(readAttributeValue('12.5')).toBe(12.5);
    expect(readAttributeValue('block-left, pan-left')).toEqual(['block-left', 'pan-left']);
    expect(readAttributeValue('rear')).toBe('rear');
  });

  it('sends money in integer cents, hours to a tenth, empty text as null and skips blank rows', () => {
    const body = formValuesToBody({
      sku: ' TR-9 ',
      description: 'Swap pan ',
      category: 'oil-pan',
      price: 329.99,
      cost: 0.1 + 0.2,
      supplierId: undefined,
      supplierSku: '  ',
      laborHours: 2.25,
      torqueSpecs: [{ fastener: 'Pan bolts', newtonMetres: 12, sequence: '' }, { fastener: ' ' }],
      instructions: '',
      attributes: [{ name: 'sumpPosition', value: 'rear' }, { name: 'dipstickProvision', value: 'block-left,pan-left' }, { name: '', value: 'x' }],
      requiresSkus: ['TR-4411'],
      excludesSkus: [],
      replacesSkus: [],
    });
    expect(body).toMatchObject({
      sku: 'TR-9',
      description: 'Swap pan',
      priceCents: 32_999,
      costCents: 30,
      supplierId: null,
      supplierSku: null,
      laborHours: 2.3,
      torqueSpecs: [{ fastener: 'Pan bolts', newtonMetres: 12 }],
      instructions: null,
      attributes: { sumpPosition: 'rear', dipstickProvision: ['block-left', 'pan-left'] },
      requiresSkus: ['TR-4411'],
    });
  });

  it('an empty form for a new part', () => {
    expect(partToFormValues(null)).toMatchObject({ sku: '', torqueSpecs: [], attributes: [] });
  });
});
