import { describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/food';
import { foodGroupWords, proteinPer100KcalOfHit, roleWords, referenceNumber, sourceWords } from '../../../src/features/foods/food-words';
import { gramsPerMeasure, ingredientLineFor, measureParts, pluralMeasure } from '../../../src/features/foods/portion-words';

describe('food words', () => {
  it('names every role in words', () => {
    for (const role of ROLES) expect(roleWords(role)).not.toMatch(/-/);
    expect(roleWords('melting-cheese')).toBe('Melting cheese');
    expect(roleWords('some-new-role')).toBe('Some new role');
  });
  // USDA SR28 FD_GROUP.txt: 0100 Dairy and Egg Products, 2000 Cereal Grains and Pasta.
  it('names SR28 food groups', () => {
    expect(foodGroupWords('01')).toBe('Dairy and egg products');
    expect(foodGroupWords('2000')).toBe('Cereal grains and pasta');
    expect(foodGroupWords('99')).toBeNull();
  });
  it('names the source of a food in words, with the USDA reference number kept for where it is asked for', () => {
    expect(sourceWords({ source: 'usda-sr28', sourceId: '01009' })).toBe('USDA food values');
    expect(referenceNumber({ source: 'usda-sr28', sourceId: '01009' })).toBe('USDA Standard Reference 28, NDB 01009');
    expect(sourceWords({ source: 'custom', sourceId: 'x' })).toBe('Entered from a label');
    expect(referenceNumber({ source: 'custom', sourceId: 'x' })).toBeNull();
  });
  it('works out protein per 100 kcal from values per 100 g', () => {
    expect(proteinPer100KcalOfHit({ kcalPer100g: 400, proteinPer100g: 24 })).toBeCloseTo(6, 10);
    expect(proteinPer100KcalOfHit({ kcalPer100g: 0, proteinPer100g: 0 })).toBe(0);
  });
});

describe('portion words', () => {
  it('splits a measure into its unit and note', () => {
    expect(measureParts('cup, shredded')).toEqual({ head: 'cup', note: 'shredded' });
    expect(measureParts('slice (1 oz)')).toEqual({ head: 'slice', note: null });
    expect(measureParts('large')).toEqual({ head: 'large', note: null });
  });
  it('makes measures plural where English does', () => {
    expect(pluralMeasure('cup', 2)).toBe('cups');
    expect(pluralMeasure('cup', 1)).toBe('cup');
    expect(pluralMeasure('tbsp', 3)).toBe('tbsp');
    expect(pluralMeasure('large', 2)).toBe('large');
    expect(pluralMeasure('leaf', 3)).toBe('leaves');
    expect(pluralMeasure('package', 2)).toBe('packages');
    expect(pluralMeasure('box', 2)).toBe('boxes');
    expect(pluralMeasure('patty', 2)).toBe('patties');
    expect(pluralMeasure('small loaf', 2)).toBe('small loaves');
  });
  it('weighs one measure from a portion of several', () => {
    expect(gramsPerMeasure({ label: '1/2 cup', amount: 0.5, measure: 'cup', grams: 56 })).toBe(112);
    expect(gramsPerMeasure({ label: '1 large', amount: 1, measure: 'large', grams: 50 })).toBe(50);
  });
  it('writes the line a catalogue amount becomes', () => {
    expect(ingredientLineFor('Cheddar cheese', { grams: 226.04 })).toBe('226 g Cheddar cheese');
    expect(ingredientLineFor('Cheddar cheese', { grams: 1250 })).toBe('1250 g Cheddar cheese');
    const cup = { label: '1 cup, shredded', amount: 1, measure: 'cup, shredded', grams: 113 };
    expect(ingredientLineFor('Cheddar cheese', { quantity: 2, portion: cup })).toBe('2 cups Cheddar cheese, shredded');
    expect(ingredientLineFor('Cheddar cheese', { quantity: 0.5, portion: cup })).toBe('0.5 cup Cheddar cheese, shredded');
  });
});
