import { describe, expect, it } from 'vitest';
import { attributeHint, attributeKeyOf, attributeUnit, attributeWords, formValuesToBody, KNOWN_ATTRIBUTES, partToFormValues, readAttributeValue } from '../part-form-values';

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

describe('attribute names and hints in plain words', () => {
  it('shows a known key as the shared plan words and gives the same key back, whatever the case', () => {
    expect(attributeWords('sumpPosition')).toBe('sump position');
    expect(attributeWords('maxDxMm')).toBe('fore-and-aft reach');
    expect(attributeKeyOf('Sump  Position ')).toBe('sumpPosition');
    expect(attributeKeyOf('sumpPosition')).toBe('sumpPosition');
    for (const key of KNOWN_ATTRIBUTES) expect(attributeKeyOf(attributeWords(key))).toBe(key);
  });

  it("keeps a name of the shop's own as typed, so it round-trips unchanged", () => {
    expect(attributeWords('bracketFinish')).toBe('bracketFinish');
    expect(attributeKeyOf('bracketFinish')).toBe('bracketFinish');
    const body = formValuesToBody({
      ...partToFormValues(null),
      sku: 'X-1',
      description: 'Bracket',
      category: 'other',
      price: 1,
      attributes: [{ name: 'Sump position', value: 'rear' }, { name: 'bracketFinish', value: 'zinc' }],
    });
    expect(body.attributes).toEqual({ sumpPosition: 'rear', bracketFinish: 'zinc' });
  });

  it("says what a row means in the person's units, and names the unit its box takes", () => {
    expect(attributeHint('sump position', 'rear', 'in')).toBe('sump at the rear');
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 60 mm = 2.362 in.
    expect(attributeHint('fore-and-aft reach', '60', 'in')).toBe('bridges up to 2.36 in fore and aft');
    expect(attributeHint('fore-and-aft reach', '60', 'mm')).toBe('bridges up to 60.0 mm fore and aft');
    // Source: NIST Handbook 44, 1 US gallon = 3.785411784 L: 190 L/h = 50.2 gal/h.
    expect(attributeHint('flow', '190', 'in')).toBe('flows 50 gal/h');
    expect(attributeHint('flow', '', 'in')).toBeNull();
    expect(attributeUnit('maxDxMm')).toBe('mm');
    expect(attributeUnit('flowLph')).toBe('L/h');
    expect(attributeUnit('sumpPosition')).toBeUndefined();
  });
});
