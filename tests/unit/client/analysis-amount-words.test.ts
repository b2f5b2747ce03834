import { describe, expect, it } from 'vitest';
import { everydayVolume, formatParsedAmount, formatQuantity, formatVolume, readGrams, unitWords } from '../../../src/features/analysis/amount-words';
import { ML_PER_CUP, ML_PER_TBSP, ML_PER_TSP } from '../../../shared/units';

describe('formatQuantity', () => {
  it('writes the fractions a recipe uses', () => {
    expect(formatQuantity(2.5)).toBe('2 1/2');
    expect(formatQuantity(0.25)).toBe('1/4');
    expect(formatQuantity(1 / 3)).toBe('1/3');
    expect(formatQuantity(1 + 2 / 3)).toBe('1 2/3');
    expect(formatQuantity(0.125)).toBe('1/8');
    expect(formatQuantity(12)).toBe('12');
  });
  it('falls back to decimals for amounts no fraction fits', () => {
    expect(formatQuantity(1.2)).toBe('1.2');
    expect(formatQuantity(0.07)).toBe('0.07');
  });
  it('rounds a near-whole number to it', () => {
    expect(formatQuantity(2.999)).toBe('3');
  });
});

describe('unitWords and formatParsedAmount', () => {
  it('makes nouns plural and leaves abbreviations and sizes alone', () => {
    expect(unitWords('cup', 2)).toBe('cups');
    expect(unitWords('cup', 0.5)).toBe('cup');
    expect(unitWords('tbsp', 3)).toBe('tbsp');
    expect(unitWords('oz', 12)).toBe('oz');
    expect(unitWords('large', 2)).toBe('large');
    expect(unitWords('leaf', 4)).toBe('leaves');
    expect(unitWords('pinch', 2)).toBe('pinches');
    expect(unitWords('fl-oz', 8)).toBe('fl oz');
    expect(unitWords('ml', 250)).toBe('mL');
  });
  it('says what the line was read as', () => {
    expect(formatParsedAmount({ quantity: 2.5, unit: 'cup' })).toBe('2 1/2 cups');
    expect(formatParsedAmount({ quantity: 0.5, unit: 'tsp' })).toBe('1/2 tsp');
    expect(formatParsedAmount({ quantity: 2, unit: null })).toBe('2');
    expect(formatParsedAmount({ quantity: null, unit: 'pinch' })).toBe('pinch');
    expect(formatParsedAmount({ quantity: null, unit: null })).toBeNull();
  });
});

describe('volumes', () => {
  // NIST Handbook 44 Appendix C: 1 US cup = 236.5882365 mL; 1 tbsp = 14.78676478125 mL; 1 tsp = 4.92892159375 mL.
  it('uses the exact US cup, tablespoon and teaspoon', () => {
    expect(ML_PER_CUP).toBe(236.5882365);
    expect(everydayVolume(ML_PER_CUP, 'us')).toBe('1 cup');
    expect(everydayVolume(10 * ML_PER_CUP, 'us')).toBe('10 cups');
    expect(everydayVolume(2.5 * ML_PER_CUP, 'us')).toBe('2.5 cups');
    expect(everydayVolume(2 * ML_PER_TBSP, 'us')).toBe('2 tbsp');
    expect(everydayVolume(ML_PER_TSP / 2, 'us')).toBe('0.5 tsp');
  });
  it('gives litres from 1 L in metric and nothing below', () => {
    expect(everydayVolume(1850, 'metric')).toBe('1.85 L');
    expect(everydayVolume(600, 'metric')).toBeNull();
    expect(everydayVolume(0, 'us')).toBeNull();
  });
  it('puts millilitres first', () => {
    expect(formatVolume(1850, 'metric')).toBe('1,850 mL (1.85 L)');
    expect(formatVolume(1850, 'us')).toBe('1,850 mL (7.8 cups)');
    expect(formatVolume(250, 'metric')).toBe('250 mL');
    expect(formatVolume(Number.NaN, 'us')).toBe('0 mL');
  });
});

describe('readGrams', () => {
  it('reads what a cook types', () => {
    expect(readGrams('120')).toEqual({ grams: 120 });
    expect(readGrams(' 42.5 ')).toEqual({ grams: 42.5 });
    expect(readGrams('7,5')).toEqual({ grams: 7.5 });
    expect(readGrams('1,250')).toEqual({ grams: 1250 });
    expect(readGrams('200 g')).toEqual({ grams: 200 });
    expect(readGrams('.5')).toEqual({ grams: 0.5 });
  });
  it('refuses what is not a weight in grams', () => {
    expect(readGrams('')).toHaveProperty('error');
    expect(readGrams('-3')).toEqual({ error: 'Grams cannot be negative.' });
    expect(readGrams('two')).toHaveProperty('error');
    expect(readGrams('1e3')).toHaveProperty('error');
    expect(readGrams('100001')).toEqual({ error: 'At most 100,000 g.' });
  });
});
