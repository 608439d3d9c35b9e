import { describe, expect, it } from 'vitest';
import type { Part } from '../../api/get-parts';
import {
  attributeBoxUnit,
  attributeHint,
  attributeKeyOf,
  attributeUnit,
  attributeWords,
  formValuesToBody,
  KNOWN_ATTRIBUTES,
  partToFormValues,
  readAttributeValue,
  readLengthAttribute,
  showLengthAttribute,
} from '../part-form-values';

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
    }, 'in');
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
    expect(partToFormValues(null, 'in')).toMatchObject({ sku: '', torqueSpecs: [], attributes: [] });
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
      ...partToFormValues(null, 'in'),
      sku: 'X-1',
      description: 'Bracket',
      category: 'other',
      price: 1,
      attributes: [{ name: 'Sump position', value: 'rear' }, { name: 'bracketFinish', value: 'zinc' }],
    }, 'in');
    expect(body.attributes).toEqual({ sumpPosition: 'rear', bracketFinish: 'zinc' });
  });

  it("says what a row means in the person's units, and names the unit its box takes", () => {
    expect(attributeHint('sump position', 'rear', 'in')).toBe('sump at the rear');
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 60 mm = 2.362 in.
    expect(attributeHint('fore-and-aft reach', '60 mm', 'in')).toBe('bridges up to 2.36 in fore and aft');
    // A bare figure in a length's box is in the person's units: 2.362 in in inch mode.
    expect(attributeHint('fore-and-aft reach', '2.362', 'in')).toBe('bridges up to 2.36 in fore and aft');
    expect(attributeHint('fore-and-aft reach', 'wide', 'in')).toBeNull();
    expect(attributeHint('fore-and-aft reach', '60', 'mm')).toBe('bridges up to 60.0 mm fore and aft');
    // Source: NIST Handbook 44, 1 US gallon = 3.785411784 L: 190 L/h = 50.2 gal/h.
    expect(attributeHint('flow', '190', 'in')).toBe('flows 50 gal/h');
    expect(attributeHint('flow', '', 'in')).toBeNull();
    expect(attributeUnit('maxDxMm')).toBe('mm');
    expect(attributeUnit('flowLph')).toBe('L/h');
    expect(attributeUnit('sumpPosition')).toBeUndefined();
    expect(attributeBoxUnit('maxDxMm', 'in')).toBe('in');
    expect(attributeBoxUnit('maxDxMm', 'mm')).toBe('mm');
    expect(attributeBoxUnit('flowLph', 'in')).toBe('L/h');
    expect(attributeBoxUnit('sumpPosition', 'in')).toBeUndefined();
  });
});

describe("a length attribute's box in the person's units", () => {
  const part = (attributes: Part['attributes']) => ({ ...PART, attributes }) as Part;
  const PART = {
    id: 'p1', sku: 'MA-1', description: 'Mount adapter plates', category: 'mount-adapter', priceCents: 100, costCents: 50, supplierId: null, supplierName: null,
    supplierSku: null, laborHours: 1, torqueSpecs: [], instructions: null, requiresSkus: [], excludesSkus: [], replacesSkus: [],
  } as unknown as Part;
  const valuesOf = (form: ReturnType<typeof partToFormValues>) => Object.fromEntries(form.attributes.map((row) => [attributeKeyOf(row.name!), row.value]));
  const retype = (form: ReturnType<typeof partToFormValues>, key: string, value: string) => ({
    ...form,
    attributes: form.attributes.map((row) => (attributeKeyOf(row.name!) === key ? { ...row, value } : row)),
  });

  it('shows a stored length in inches in inch mode and in mm in mm mode; other attributes as stored', () => {
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 25.4 mm = 1.000 in, 60 mm = 2.362 in, 1225 mm = 48.228 in.
    const stored = part({ maxDxMm: 25.4, maxDzMm: 60, effectiveLengthMm: 1225, flowLph: 190, sumpPosition: 'rear', ribs: 6 });
    expect(valuesOf(partToFormValues(stored, 'in'))).toEqual({ maxDxMm: '1.000', maxDzMm: '2.362', effectiveLengthMm: '48.228', flowLph: '190', sumpPosition: 'rear', ribs: '6' });
    expect(valuesOf(partToFormValues(stored, 'mm'))).toEqual({ maxDxMm: '25.4', maxDzMm: '60', effectiveLengthMm: '1225', flowLph: '190', sumpPosition: 'rear', ribs: '6' });
  });

  it('reads what is typed in the person\'s units and sends mm; non-length attributes unchanged', () => {
    const typed = { ...partToFormValues(null, 'in'), sku: 'MA-1', description: 'Plates', category: 'mount-adapter' as const, price: 1 };
    const rows = (maxDx: string) => [{ name: 'fore-and-aft reach', value: maxDx }, { name: 'flow', value: '190' }, { name: 'ribs', value: '6' }];
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 1 in = 25.4 mm, 2 3/8 in = 60.325 mm, 0.1 in = 2.54 mm.
    expect(formValuesToBody({ ...typed, attributes: rows('1.000') }, 'in').attributes).toEqual({ maxDxMm: 25.4, flowLph: 190, ribs: 6 });
    expect(formValuesToBody({ ...typed, attributes: rows('2 3/8') }, 'in').attributes).toMatchObject({ maxDxMm: 60.325 });
    expect(formValuesToBody({ ...typed, attributes: rows('0.1') }, 'in').attributes).toMatchObject({ maxDxMm: 2.54 });
    // A figure typed with its own unit reads in that unit whatever the mode.
    expect(formValuesToBody({ ...typed, attributes: rows('60 mm') }, 'in').attributes).toMatchObject({ maxDxMm: 60 });
    expect(formValuesToBody({ ...typed, attributes: rows('1 in') }, 'mm').attributes).toMatchObject({ maxDxMm: 25.4 });
    expect(formValuesToBody({ ...typed, attributes: rows('25.4') }, 'mm').attributes).toEqual({ maxDxMm: 25.4, flowLph: 190, ribs: 6 });
    expect(readLengthAttribute('wide', 'in')).toMatchObject({ ok: false });
  });

  it.each(['in', 'mm'] as const)('opening and saving a part in %s mode sends every stored figure back unchanged', (system) => {
    const stored = { maxDxMm: 60, maxDzMm: 25.4, maxDyMm: 12.7, effectiveLengthMm: 1225, screenU: 101.6, flowLph: 190, pressurePsi: 58, sumpPosition: 'rear' };
    const form = { ...partToFormValues(part(stored), system), category: 'mount-adapter' as const };
    expect(formValuesToBody(form, system, stored).attributes).toEqual(stored);
  });

  it('a changed length is read again; the others keep their stored figures', () => {
    const stored = { maxDxMm: 60, maxDzMm: 25.4 };
    const form = retype({ ...partToFormValues(part(stored), 'in'), category: 'mount-adapter' as const }, 'maxDxMm', '2.500');
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 2.5 in = 63.5 mm.
    expect(formValuesToBody(form, 'in', stored).attributes).toEqual({ maxDxMm: 63.5, maxDzMm: 25.4 });
  });

  it('a figure typed in inches (to 0.001 in) reads back as typed after saving, in either mode', () => {
    for (let thousandths = 0; thousandths <= 60_000; thousandths += 7) {
      const typed = (thousandths / 1000).toFixed(3);
      const mm = readLengthAttribute(typed, 'in');
      if (!mm.ok) throw new Error(mm.message);
      expect(showLengthAttribute(mm.value, 'in')).toBe(typed);
      // …and opening it in mm mode, then saving unchanged, keeps the same stored figure.
      const stored = { maxDxMm: mm.value };
      expect(formValuesToBody({ ...partToFormValues(part(stored), 'mm'), category: 'mount-adapter' as const }, 'mm', stored).attributes).toEqual(stored);
    }
  });

  it('a figure typed in mm (to 0.1 mm) shows distinctly in inches and reads back as typed', () => {
    for (let tenths = 0; tenths <= 20_000; tenths += 3) {
      const typed = String(tenths / 10);
      const mm = readLengthAttribute(typed, 'mm');
      if (!mm.ok) throw new Error(mm.message);
      expect(showLengthAttribute(mm.value, 'mm')).toBe(typed);
      // 0.001 in (0.0254 mm) is finer than 0.1 mm: neighbouring tenths never show alike in inches.
      expect(showLengthAttribute(mm.value, 'in')).not.toBe(showLengthAttribute(mm.value + 0.1, 'in'));
    }
  });
});
