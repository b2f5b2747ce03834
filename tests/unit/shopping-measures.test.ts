/**
 * Shopping lines in the measure the recipe named. Volume and weight conversions are the exact
 * NIST Handbook 44 Appendix C factors (1 cup = 236.5882365 mL = 16 tbsp = 48 tsp; 1 oz = 28.349523125 g,
 * 1 lb = 16 oz) from shared/units.ts.
 */
import { describe, expect, it } from 'vitest';
import { parseLine } from '../../shared/parse-line';
import { mergeShopping, scaleVersion, type PrepLine } from '../../shared/prep';
import { measureHint, writtenMeasure } from '../../shared/purchase-hint';
import { GRAMS_PER_OUNCE, ML_PER_CUP, ML_PER_TBSP, ML_PER_TSP } from '../../shared/units';

/** A line weighed at `grams` for its text, scaled by `factor` (portions ÷ servings). */
function hint(text: string, grams: number, factor = 1): string {
  const m = writtenMeasure(parseLine(text), grams);
  expect(m, text).not.toBeNull();
  return measureHint({ ...m!, amount: m!.amount * factor });
}

describe('the NIST factors the measures use (NIST Handbook 44)', () => {
  it('relates the kitchen volumes exactly', () => {
    expect(ML_PER_CUP / ML_PER_TBSP).toBeCloseTo(16, 12);
    expect(ML_PER_TBSP / ML_PER_TSP).toBeCloseTo(3, 12);
    expect(16 * GRAMS_PER_OUNCE).toBeCloseTo(453.59237, 9);
  });
});

describe('a shopping line names what the cook buys, in the recipe’s own measure', () => {
  it('1 cup heavy cream stays 1 cup (not "about 2 cups" from a whipped portion)', () => {
    expect(hint('1 cup heavy cream', 238)).toBe('1 cup');
    expect(hint('1 cup heavy cream', 238, 1.5)).toBe('1 1/2 cups');
  });

  it('1 tsp oregano stays 1 tsp, and half of it is 1/2 tsp', () => {
    expect(hint('1 tsp dried oregano', 1)).toBe('1 tsp');
    expect(hint('1 tsp dried oregano', 1, 0.5)).toBe('1/2 tsp');
    // 3 tsp = 1 tbsp (NIST Handbook 44)
    expect(hint('1 tsp dried oregano', 1, 3)).toBe('1 tbsp');
  });

  it('a can is bought as a can of its size, however the size is written', () => {
    expect(hint('1 (14.5 oz) can diced tomatoes', 411)).toBe('1 can (14.5 oz)');
    expect(hint('14.5 oz can of tomatoes', 411)).toBe('1 can (14.5 oz)');
    expect(hint('14.5 oz can of tomatoes', 411, 1.5)).toBe('2 cans (14.5 oz); uses 1 1/2');
  });

  it('2 (6 oz) cans of paste are 2 cans, not a volume', () => {
    expect(hint('2 (6 oz) cans tomato paste', 340)).toBe('2 cans (6 oz)');
    expect(hint('2 (6 oz) cans tomato paste', 340, 2.5)).toBe('5 cans (6 oz)');
  });

  it('milk stays in cups for 6 portions and for 10 (one unit system per item)', () => {
    // 3 cups milk for 4 servings
    expect(hint('3 cups milk', 732, 6 / 4)).toBe('4 1/2 cups');
    expect(hint('3 cups milk', 732, 10 / 4)).toBe('7 1/2 cups');
  });

  it('weights stay in the system they were written in, rounded up', () => {
    expect(hint('1 lb ground beef', 453.59, 1.5)).toBe('1 lb 8 oz');
    expect(hint('500 g ground beef', 500, 1.5)).toBe('about 750 g');
  });

  it('counts and pieces are whole', () => {
    expect(hint('3 large eggs', 150, 1.5)).toBe('5 large eggs');
    expect(hint('2 cloves garlic', 6, 1.5)).toBe('3 cloves');
    expect(hint('2 onions', 220, 0.5)).toBe('1 onion');
  });

  it('gives no measure for a line without an amount', () => {
    expect(writtenMeasure(parseLine('salt to taste'), 0)).toBeNull();
  });
});

describe('batches and merging keep the measure honest', () => {
  const cream = (grams: number): PrepLine => ({
    foodId: 1,
    name: 'Cream',
    grams,
    measure: writtenMeasure(parseLine('1 cup heavy cream'), 238) && { ...writtenMeasure(parseLine('1 cup heavy cream'), 238)!, amount: grams / 238 },
  });

  it('scales the measure with the grams', () => {
    const plan = scaleVersion({ servings: 4, lines: [cream(238)] }, 6);
    expect(plan.batch[0].measure!.amount).toBeCloseTo(1.5, 12);
  });

  it('adds measures of the same kind, and drops them when the kinds differ', () => {
    const same = mergeShopping([[cream(238)], [cream(119)]]);
    expect(measureHint(same[0].measure!)).toBe('1 1/2 cups');
    const ounces = writtenMeasure(parseLine('8 oz heavy cream'), 227)!;
    const mixed = mergeShopping([[cream(238)], [{ foodId: 1, name: 'Cream', grams: 227, measure: ounces }]]);
    expect(mixed[0].measure).toBeNull();
    expect(mixed[0].grams).toBe(465);
  });
});
