/**
 * The word handling under matching and weighing: singular forms, canonical words, household measure
 * text as USDA SR28 WEIGHT.txt writes it (tests/reference/usda-sr28/WEIGHT.txt.gz), and "or" choices.
 */
import { describe, expect, it } from 'vitest';
import { choicesIn } from '../../server/matching/food-matcher';
import { inchesOf, parseMeasure, sizeWordOf } from '../../server/matching/measure-text';
import { words } from '../../server/matching/normalise-phrase';
import { singular } from '../../server/matching/singular';

describe('singular', () => {
  it.each([
    ['tomatoes', 'tomato'],
    ['potatoes', 'potato'],
    ['berries', 'berry'],
    ['leaves', 'leaf'],
    ['peaches', 'peach'],
    ['radishes', 'radish'],
    ['eggs', 'egg'],
    ['olives', 'olive'],
    ['cheeses', 'cheese'],
    ['chilies', 'chili'],
    ['cookies', 'cookie'],
    ['anchovies', 'anchovy'],
    ['tortillas', 'tortilla'],
    ['hummus', 'hummus'],
    ['asparagus', 'asparagus'],
    ['molasses', 'molasses'],
    ['couscous', 'couscous'],
    ['swiss', 'swiss'],
    ['oz', 'oz'],
  ])('%s → %s', (plural, one) => {
    expect(singular(plural)).toBe(one);
  });
});

describe('words', () => {
  it('folds case, accents, apostrophes and hyphens', () => {
    expect(words('Part-Skim Mozzarella')).toEqual(['part', 'skim', 'mozzarella']);
    expect(words('Jalapeños')).toEqual(['jalapeno']);
    expect(words('Confectioners’ Sugar')).toEqual(['confectioner', 'sugar']);
  });

  it('writes one word for each spelling of a fat level', () => {
    expect(words('fat-free milk')).toEqual(['nonfat', 'milk']);
    expect(words('non fat milk')).toEqual(['nonfat', 'milk']);
    for (const t of ['low-fat', 'low fat', 'lowfat']) expect(words(t)).toEqual(['lowfat']);
  });

  it('reads SR28 salt wording as salted or unsalted', () => {
    expect(words('Butter, without salt')).toEqual(['butter', 'unsalted']);
    expect(words('Butter, with salt')).toEqual(['butter', 'salted']);
    expect(words('Tomato sauce, canned, no salt added')).toEqual(['tomato', 'sauce', 'canned', 'unsalted']);
    expect(words('Coconut, dried, not sweetened')).toEqual(['coconut', 'dried', 'unsweetened']);
  });
});

describe('household measures as SR28 WEIGHT.txt writes them', () => {
  it('reads a volume and its preparation', () => {
    expect(parseMeasure('cup, shredded')).toMatchObject({ kind: 'volume', unit: 'cup', qualifiers: ['shred'] });
    expect(parseMeasure('cup, chopped or diced')).toMatchObject({ kind: 'volume', unit: 'cup', qualifiers: ['chop', 'dice'] });
    expect(parseMeasure('tablespoon')).toMatchObject({ kind: 'volume', unit: 'tbsp' });
    expect(parseMeasure('fl oz')).toMatchObject({ kind: 'volume', unit: 'fl-oz' });
    expect(parseMeasure('cup (4.86 large eggs)')).toMatchObject({ kind: 'volume', unit: 'cup', qualifiers: [] });
  });

  it('reads a mass', () => {
    expect(parseMeasure('oz')).toMatchObject({ kind: 'mass', unit: 'oz' });
  });

  it('reads sizes, pieces and diameters', () => {
    expect(parseMeasure('medium (2-1/2" dia)')).toMatchObject({ kind: 'count', size: 'medium', pieces: [], diameter: { lo: 2.5, hi: 2.5 } });
    expect(parseMeasure('tortilla (approx 7-8" dia)')).toMatchObject({ pieces: ['tortilla'], diameter: { lo: 7, hi: 8 } });
    expect(parseMeasure('stalk, large (11"-12" long)')).toMatchObject({ size: 'large', pieces: ['stalk'], diameter: null });
    expect(parseMeasure('extra large')).toMatchObject({ size: 'extra-large' });
    expect(parseMeasure('Potato large (3" to 4-1/4" dia)')).toMatchObject({ size: 'large', pieces: ['potato'], diameter: { lo: 3, hi: 4.25 } });
    expect(parseMeasure('3 cloves')).toMatchObject({ kind: 'count', pieces: ['clove'] });
    expect(parseMeasure('NLEA serving').serving).toBe(true);
  });

  it('reads sizes written on a recipe line', () => {
    expect(sizeWordOf('lg')).toBe('large');
    expect(sizeWordOf('extra large')).toBe('extra-large');
    expect(sizeWordOf('8-inch')).toBeNull();
    expect(inchesOf('8-inch')).toBe(8);
    expect(inchesOf('10"')).toBe(10);
    // 1 inch = 2.54 cm exactly (NIST Handbook 44 Appendix C).
    expect(inchesOf('20 cm')).toBeCloseTo(20 / 2.54, 12);
    expect(inchesOf('large')).toBeNull();
  });
});

describe('choices in a phrase', () => {
  it('shares a head word written once across "or"', () => {
    expect(choicesIn('chicken or vegetable stock')).toEqual(expect.arrayContaining(['chicken stock', 'vegetable stock']));
    expect(choicesIn('soy sauce or tamari', false)).toEqual(['soy sauce', 'tamari']);
  });

  it('splits "and" only when asked', () => {
    expect(choicesIn('macaroni and cheese', false)).toEqual([]);
    expect(choicesIn('thyme leaves and tender stems')).toEqual(['thyme leaves', 'tender stems']);
  });
});
