/**
 * Label-style rounding checked against FDA 21 CFR 101.9(c) and the rounding table of the FDA Food
 * Labeling Guide, Appendix H (read in a summary of the 2009 table; its footnote on halves, "amounts
 * exactly halfway … round up", is from memory). Paragraph numbers of 101.9(c) are from memory.
 */
import { describe, expect, it } from 'vitest';
import { roundCalories, roundFatGrams, roundGramNutrient, roundHalfUp, roundLabel, roundServingGrams, roundSodiumMg } from '../../shared/label-rounding';
import type { Nutrients } from '../../shared/nutrition';

describe('calories — 21 CFR 101.9(c)(1): < 5 → 0; ≤ 50 → nearest 5; > 50 → nearest 10', () => {
  it.each([
    [0, 0],
    [4.99, 0], // < 5 kcal is an insignificant amount: 0
    [5, 5], // 5 is not < 5: nearest 5
    [7.49, 5],
    [7.5, 10], // half up
    [47, 45], // FDA Food Labeling Guide Q&A: 47 calories is declared as 45, not 50 (from memory)
    [47.5, 50],
    [50, 50], // "50 cal or less" rounds to 5s
    [50.1, 50], // above 50 rounds to 10s
    [54.9, 50],
    [55, 60],
    [123, 120],
    [125, 130],
    [999.9, 1000],
  ])('%f kcal → %i', (kcal, expected) => {
    const v = roundCalories(kcal);
    expect(v.amount).toBe(expected);
    expect(v.text).toBe(String(expected));
    expect(v.lessThan).toBe(false);
  });
});

describe('total and saturated fat — 21 CFR 101.9(c)(2): < 0.5 g → 0; < 5 g → nearest 0.5 g; ≥ 5 g → nearest 1 g', () => {
  it.each([
    [0, 0, '0g'],
    [0.49, 0, '0g'], // < 0.5 g is an insignificant amount
    [0.5, 0.5, '0.5g'],
    [0.74, 0.5, '0.5g'],
    [0.75, 1, '1g'],
    [2.2, 2, '2g'],
    [2.25, 2.5, '2.5g'],
    [4.74, 4.5, '4.5g'],
    [4.75, 5, '5g'], // still below 5 g, so 0.5 g steps, landing on 5
    [4.99, 5, '5g'],
    [5, 5, '5g'], // ≥ 5 g: whole grams
    [5.4, 5, '5g'],
    [5.5, 6, '6g'],
    [12.49, 12, '12g'],
  ])('%f g → %f', (grams, expected, text) => {
    expect(roundFatGrams(grams)).toEqual({ amount: expected, lessThan: false, text });
  });
});

describe('sodium — 21 CFR 101.9(c)(4): < 5 mg → 0; 5–140 mg → nearest 5 mg; > 140 mg → nearest 10 mg', () => {
  it.each([
    [0, 0],
    [4.9, 0],
    [5, 5],
    [7.4, 5],
    [7.5, 10],
    [137.5, 140],
    [140, 140], // 140 is in the 5 mg band
    [141, 140], // above 140: 10 mg steps
    [144.9, 140],
    [145, 150],
    [2304, 2300],
  ])('%f mg → %i', (mg, expected) => {
    expect(roundSodiumMg(mg)).toEqual({ amount: expected, lessThan: false, text: `${expected}mg` });
  });
});

describe('protein, carbohydrate, fiber, sugars — 21 CFR 101.9(c)(6), (c)(7): < 0.5 g → 0; < 1 g → "less than 1 g"; else nearest 1 g', () => {
  it.each([
    [0, 0],
    [0.49, 0], // < 0.5 g may be declared as zero
    [1, 1],
    [1.49, 1],
    [1.5, 2], // Appendix H: halfway rounds up (from memory)
    [2.5, 3],
    [12.4, 12],
    [12.5, 13],
  ])('%f g → %i g', (grams, expected) => {
    expect(roundGramNutrient(grams)).toEqual({ amount: expected, lessThan: false, text: `${expected}g` });
  });

  it.each([0.5, 0.75, 0.99])('%f g → "Less than 1g"', (grams) => {
    // 21 CFR 101.9(c)(7): "Contains less than 1 gram" or "less than 1 gram" for under 1 g
    expect(roundGramNutrient(grams)).toEqual({ amount: 1, lessThan: true, text: 'Less than 1g' });
  });
});

describe('decimal-safe halves', () => {
  it('rounds values meant as halves up although their doubles sit just below', () => {
    // binary floating point: 0.29 × 50 is 14.499999999999998, 0.7 × 45 is 31.499999999999996
    expect(0.29 * 50).toBeLessThan(14.5);
    expect(roundGramNutrient(0.29 * 50).amount).toBe(15);
    expect(0.7 * 45).toBeLessThan(31.5);
    expect(roundGramNutrient(0.7 * 45).amount).toBe(32);
    // 1.4 − 0.9 is 0.49999999999999994: meant 0.5, so fat is 0.5 g and protein "less than 1 g", not 0
    expect(1.4 - 0.9).toBeLessThan(0.5);
    expect(roundFatGrams(1.4 - 0.9).amount).toBe(0.5);
    expect(roundGramNutrient(1.4 - 0.9).lessThan).toBe(true);
    // 2.55 × 50 is 127.49999999999999: meant 127.5 mg, which rounds to 130 mg, not 125 mg
    expect(2.55 * 50).toBeLessThan(127.5);
    expect(roundSodiumMg(2.55 * 50).amount).toBe(130);
    // 2.3 × 25 is 57.49999999999999: meant 57.5 g of fat, declared 58 g
    expect(roundFatGrams(2.3 * 25).amount).toBe(58);
  });

  it('roundHalfUp treats 2.675 and 1.005 as the decimals they were written as', () => {
    // 2.675 and 1.005 are stored as 2.67499999… and 1.00499999…; toFixed(2) would give 2.67 and 1.00
    expect((2.675).toFixed(2)).toBe('2.67');
    expect(roundHalfUp(2.675, 0.01)).toBe(2.68);
    expect(roundHalfUp(1.005, 0.01)).toBe(1.01);
    expect(roundHalfUp(4.45, 0.1)).toBe(4.5);
    expect(roundHalfUp(4.449, 0.1)).toBe(4.4);
    expect(roundHalfUp(52.5, 5)).toBe(55);
  });

  it('refuses what it cannot round', () => {
    expect(() => roundHalfUp(Number.NaN, 1)).toThrow(RangeError);
    expect(() => roundHalfUp(1, 0)).toThrow(RangeError);
    expect(() => roundCalories(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => roundFatGrams(Number.NaN)).toThrow(RangeError);
  });

  it('reads a tiny negative left by subtraction as zero', () => {
    expect(roundFatGrams(-1e-12)).toEqual({ amount: 0, lessThan: false, text: '0g' });
    expect(roundCalories(-0.2).amount).toBe(0);
  });
});

describe('roundLabel', () => {
  const perServing: Nutrients = {
    kcal: 347.6,
    proteinG: 31.5,
    fatG: 4.75,
    satFatG: 0.49,
    carbsG: 0.8,
    fiberG: 6.49,
    sugarG: 0.3,
    sodiumMg: 612.4,
  };

  it('rounds every line of the panel by its own rule', () => {
    const panel = roundLabel(perServing, 285.6);
    expect(panel.calories.text).toBe('350');
    expect(panel.proteinG.text).toBe('32g');
    expect(panel.totalFatG.text).toBe('5g');
    expect(panel.satFatG.text).toBe('0g');
    expect(panel.carbsG.text).toBe('Less than 1g');
    expect(panel.fiberG.text).toBe('6g');
    expect(panel.sugarG.text).toBe('0g');
    expect(panel.sodiumMg.text).toBe('610mg');
    expect(panel.servingSizeG).toEqual({ amount: 286, lessThan: false, text: '286g' });
  });

  it('matches the single-nutrient rounders line for line and leaves its input unrounded', () => {
    const copy = { ...perServing };
    const panel = roundLabel(perServing, 120);
    expect(perServing).toEqual(copy);
    expect(panel.calories).toEqual(roundCalories(perServing.kcal));
    expect(panel.totalFatG).toEqual(roundFatGrams(perServing.fatG));
    expect(panel.satFatG).toEqual(roundFatGrams(perServing.satFatG));
    expect(panel.sodiumMg).toEqual(roundSodiumMg(perServing.sodiumMg));
    for (const k of ['carbsG', 'fiberG', 'sugarG', 'proteinG'] as const) {
      expect(panel[k]).toEqual(roundGramNutrient(perServing[k]));
    }
  });

  it('shows a small serving to a tenth of a gram (display choice, *common practice*)', () => {
    expect(roundServingGrams(7.46).text).toBe('7.5g');
    expect(roundServingGrams(9.96).text).toBe('10g');
    expect(roundServingGrams(240.5).text).toBe('241g');
  });
});
