import { PART_CATEGORIES, PART_CATEGORY_LABELS, partCategoryFromText } from './part-categories';

describe('partCategoryFromText', () => {
  it('reads a category by its name, whatever the case and the spaces around it', () => {
    expect(partCategoryFromText('Oil pan')).toBe('oil-pan');
    expect(partCategoryFromText('  oil PAN ')).toBe('oil-pan');
    expect(partCategoryFromText('Fuel  pressure regulator')).toBe('fuel-regulator');
    expect(partCategoryFromText('ENGINE CONTROLLER')).toBe('engine-controller');
  });

  it('keeps reading the short forms', () => {
    expect(partCategoryFromText('oil-pan')).toBe('oil-pan');
    expect(partCategoryFromText(' Bellhousing-Adapter ')).toBe('bellhousing-adapter');
  });

  it('reads every category back from its own name and short form', () => {
    for (const category of PART_CATEGORIES) {
      expect(partCategoryFromText(PART_CATEGORY_LABELS[category])).toBe(category);
      expect(partCategoryFromText(category)).toBe(category);
    }
  });

  it('answers null for anything else', () => {
    expect(partCategoryFromText('')).toBeNull();
    expect(partCategoryFromText('Oil pans')).toBeNull();
    expect(partCategoryFromText('oil_pan')).toBeNull();
  });
});
