import { describe, expect, it } from 'vitest';
import {
  GRAMS_PER_OUNCE,
  GRAMS_PER_POUND,
  ML_PER_CUP,
  ML_PER_DASH,
  ML_PER_FL_OZ,
  ML_PER_GALLON,
  ML_PER_PINCH,
  ML_PER_PINT,
  ML_PER_QUART,
  ML_PER_TBSP,
  ML_PER_TSP,
  UNITS,
  convertQuantity,
  getUnit,
  isStandardUnit,
  massToGrams,
  normaliseUnit,
  unitKind,
  volumeToMl,
} from '../../shared/units';

describe('unit factors', () => {
  it('mass units are the exact NIST values', () => {
    // NIST Handbook 44 Appendix C: 1 lb (avoirdupois) = 453.59237 g exactly.
    expect(GRAMS_PER_POUND).toBe(453.59237);
    expect(massToGrams(1, 'lb')).toBe(453.59237);
    // NIST Handbook 44 Appendix C: 1 oz (avoirdupois) = 28.349523125 g exactly.
    expect(GRAMS_PER_OUNCE).toBe(28.349523125);
    expect(massToGrams(1, 'oz')).toBe(28.349523125);
    // NIST Handbook 44 Appendix C: 1 lb = 16 oz.
    expect(GRAMS_PER_OUNCE * 16).toBeCloseTo(GRAMS_PER_POUND, 10);
    // SI: 1 kg = 1000 g, 1 mg = 0.001 g.
    expect(massToGrams(2, 'kg')).toBe(2000);
    expect(massToGrams(500, 'mg')).toBeCloseTo(0.5, 12);
    expect(massToGrams(250, 'g')).toBe(250);
  });

  it('US customary volume units are the exact NIST values', () => {
    // NIST Handbook 44 Appendix C: 1 cup = 8 fl oz = 236.5882365 mL exactly.
    expect(ML_PER_CUP).toBe(236.5882365);
    expect(volumeToMl(1, 'cup')).toBe(236.5882365);
    // NIST Handbook 44 Appendix C: 1 tablespoon = 1/2 fl oz = 14.78676478125 mL exactly.
    expect(ML_PER_TBSP).toBe(14.78676478125);
    expect(volumeToMl(1, 'tbsp')).toBe(14.78676478125);
    // NIST Handbook 44 Appendix C: 1 teaspoon = 1/3 tablespoon = 4.92892159375 mL exactly.
    expect(ML_PER_TSP).toBe(4.92892159375);
    expect(volumeToMl(1, 'tsp')).toBe(4.92892159375);
    // NIST Handbook 44 Appendix C: 1 US fluid ounce = 29.5735295625 mL exactly.
    expect(ML_PER_FL_OZ).toBe(29.5735295625);
    expect(volumeToMl(1, 'fl-oz')).toBe(29.5735295625);
    // NIST Handbook 44 Appendix C: 1 gallon = 231 in³ = 3.785411784 L; quart = 1/4 gal; pint = 1/8 gal.
    expect(ML_PER_GALLON).toBe(3785.411784);
    expect(ML_PER_QUART).toBe(946.352946);
    expect(ML_PER_PINT).toBe(473.176473);
  });

  it('the volume units keep their defining ratios', () => {
    // NIST Handbook 44 Appendix C: gallon = 4 quarts = 8 pints = 16 cups = 128 fl oz; cup = 16 tbsp; tbsp = 3 tsp.
    expect(ML_PER_PINT).toBeCloseTo(2 * ML_PER_CUP, 9);
    expect(ML_PER_QUART).toBeCloseTo(4 * ML_PER_CUP, 9);
    expect(ML_PER_GALLON).toBeCloseTo(16 * ML_PER_CUP, 9);
    expect(ML_PER_GALLON).toBeCloseTo(128 * ML_PER_FL_OZ, 9);
    expect(ML_PER_CUP).toBeCloseTo(8 * ML_PER_FL_OZ, 10);
    expect(ML_PER_CUP).toBeCloseTo(16 * ML_PER_TBSP, 10);
    expect(ML_PER_TBSP).toBeCloseTo(3 * ML_PER_TSP, 12);
    expect(ML_PER_FL_OZ).toBeCloseTo(2 * ML_PER_TBSP, 12);
    // 231 in³ × (2.54 cm)³ per in³ = 3785.411784 cm³ (NIST Handbook 44 Appendix C, inch = 2.54 cm exactly).
    expect(231 * 2.54 ** 3).toBeCloseTo(ML_PER_GALLON, 9);
  });

  it('pinch and dash are marked as common practice, not standard', () => {
    // Common practice: a dash is 1/8 teaspoon and a pinch 1/16 teaspoon; no standard defines them.
    expect(ML_PER_DASH).toBeCloseTo(ML_PER_TSP / 8, 12);
    expect(ML_PER_PINCH).toBeCloseTo(ML_PER_TSP / 16, 12);
    expect(getUnit('pinch')?.basis).toBe('common-practice');
    expect(getUnit('dash')?.basis).toBe('common-practice');
    expect(isStandardUnit('pinch')).toBe(false);
    expect(isStandardUnit('cup')).toBe(true);
    expect(isStandardUnit('g')).toBe(true);
  });

  it('metric volume units are exact', () => {
    expect(volumeToMl(1, 'l')).toBe(1000);
    expect(volumeToMl(250, 'ml')).toBe(250);
    expect(volumeToMl(2, 'dl')).toBe(200);
  });

  it('converts between units of one kind and refuses across kinds', () => {
    expect(convertQuantity(1, 'lb', 'oz')).toBe(16);
    expect(convertQuantity(1, 'cup', 'tbsp')).toBe(16);
    expect(convertQuantity(1, 'tbsp', 'tsp')).toBe(3);
    expect(convertQuantity(1, 'gallon', 'cup')).toBe(16);
    expect(convertQuantity(1, 'quart', 'pint')).toBe(2);
    expect(convertQuantity(1, 'cup', 'g')).toBeNull();
    expect(convertQuantity(1, 'clove', 'g')).toBeNull();
    expect(massToGrams(1, 'cup')).toBeNull();
    expect(volumeToMl(1, 'lb')).toBeNull();
    expect(volumeToMl(1, 'clove')).toBeNull();
    expect(massToGrams(Number.NaN, 'g')).toBeNull();
  });
});

describe('normaliseUnit', () => {
  const cases: Record<string, string[]> = {
    tbsp: ['tbsp', 'Tbsp', 'Tbsp.', 'TBSP', 'T', 'Tb', 'tbs', 'tbl', 'tablespoon', 'tablespoons', 'Tablespoons'],
    tsp: ['tsp', 'tsp.', 't', 'teaspoon', 'teaspoons', 'Teaspoon', 'tsps'],
    cup: ['c', 'C', 'c.', 'cup', 'cups', 'Cups'],
    'fl-oz': ['fl oz', 'fl. oz', 'fl-oz', 'floz', 'fluid ounce', 'fluid ounces', 'fl ounce'],
    oz: ['oz', 'oz.', 'ounce', 'ounces', 'Ounces'],
    lb: ['lb', 'lbs', 'lb.', 'lbs.', '#', 'pound', 'pounds', 'Pound'],
    g: ['g', 'g.', 'gram', 'grams', 'gr', 'gm'],
    kg: ['kg', 'kilogram', 'kilograms', 'kilo'],
    mg: ['mg', 'milligram', 'milligrams'],
    ml: ['ml', 'mL', 'ML', 'millilitre', 'milliliters'],
    l: ['l', 'L', 'liter', 'litre', 'liters', 'litres'],
    pint: ['pt', 'pint', 'pints'],
    quart: ['qt', 'quart', 'quarts'],
    gallon: ['gal', 'gallon', 'gallons'],
    pinch: ['pinch', 'pinches'],
    dash: ['dash', 'dashes'],
    stick: ['stick', 'sticks'],
    can: ['can', 'cans', 'tin'],
    clove: ['clove', 'cloves'],
    slice: ['slice', 'slices'],
    package: ['package', 'packages', 'pkg', 'packet'],
    large: ['large', 'lg', 'lg.'],
    medium: ['medium', 'md', 'med'],
    small: ['small', 'sm'],
  };
  for (const [id, spellings] of Object.entries(cases)) {
    it(`reads ${spellings.join(', ')} as ${id}`, () => {
      for (const s of spellings) expect(normaliseUnit(s), s).toBe(id);
    });
  }

  it('tells T (tablespoon) from t (teaspoon)', () => {
    expect(normaliseUnit('T')).toBe('tbsp');
    expect(normaliseUnit('t')).toBe('tsp');
  });

  it('returns null for words that are not units', () => {
    for (const s of ['', '   ', 'eggs', 'flour', 'x', 'cupcake', 'tablespoonz', null, undefined]) {
      expect(normaliseUnit(s as string)).toBeNull();
    }
  });

  it('every unit has a kind, and mass and volume units have a factor', () => {
    const ids = new Set<string>();
    for (const u of UNITS) {
      expect(ids.has(u.id), u.id).toBe(false);
      ids.add(u.id);
      expect(unitKind(u.id)).toBe(u.kind);
      if (u.kind === 'mass') expect(u.grams).toBeGreaterThan(0);
      if (u.kind === 'volume') expect(u.ml).toBeGreaterThan(0);
      for (const s of u.spellings) expect(normaliseUnit(s), s).toBe(u.id);
    }
    expect(unitKind('clove')).toBe('count');
    expect(unitKind('large')).toBe('count');
    expect(unitKind('g')).toBe('mass');
    expect(unitKind('cup')).toBe('volume');
    expect(unitKind('nonsense')).toBeNull();
  });
});
