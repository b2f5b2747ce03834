import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatPrepGrams, mergeShopping, roundPrepGrams, scaleVersion, type PrepVersion } from '../../shared/prep';

// an invented four-serving bake
const bake: PrepVersion = {
  servings: 4,
  lines: [
    { foodId: 101, name: 'Chicken breast, raw', grams: 680 },
    { foodId: 202, name: 'Cheese, mozzarella, part skim milk', grams: 113 },
    { foodId: 303, name: 'Tomato sauce', grams: 425 },
    { foodId: 404, name: 'Garlic, raw', grams: 9 },
    { foodId: 505, name: 'Salt', grams: 1.5 },
  ],
};

describe('roundPrepGrams', () => {
  it.each([
    [0, 0, '0 g'],
    [0.04, 0, '0 g'],
    [0.05, 0.1, '0.1 g'],
    [4.44, 4.4, '4.4 g'],
    [4.45, 4.5, '4.5 g'], // half up
    [0.35 * 3, 1.1, '1.1 g'], // 0.35 × 3 is 1.0499999999999998, meant 1.05
    [9.94, 9.9, '9.9 g'],
    [9.95, 10, '10 g'], // 9.95 / 0.1 is 99.49999999999999: rounds as the decimal 9.95
    [9.99, 10, '10 g'],
    [10, 10, '10 g'],
    [12.49, 12, '12 g'],
    [12.5, 13, '13 g'],
    [1234.5, 1235, '1235 g'],
  ])('%f g → %f (%s)', (grams, rounded, text) => {
    expect(roundPrepGrams(grams)).toBe(rounded);
    expect(formatPrepGrams(grams)).toBe(text);
  });

  it('refuses negative and non-finite grams', () => {
    expect(() => roundPrepGrams(-1)).toThrow(RangeError);
    expect(() => roundPrepGrams(Number.NaN)).toThrow(RangeError);
    expect(() => roundPrepGrams(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe('scaleVersion', () => {
  it('gives one serving per portion and portions ÷ servings of the recipe for the batch, line for line', () => {
    const plan = scaleVersion(bake, 10);
    expect(plan.portions).toBe(10);
    expect(plan.perPortion.map((l) => l.foodId)).toEqual([101, 202, 303, 404, 505]);
    expect(plan.batch.map((l) => l.name)).toEqual(bake.lines.map((l) => l.name));
    expect(plan.perPortion[0]).toEqual({ foodId: 101, name: 'Chicken breast, raw', grams: 170, display: '170 g' });
    expect(plan.perPortion[3]).toMatchObject({ grams: 2.25, display: '2.3 g' });
    expect(plan.perPortion[4]).toMatchObject({ grams: 0.375, display: '0.4 g' });
    expect(plan.batch[0]).toMatchObject({ grams: 1700, display: '1700 g' });
    expect(plan.batch[1]).toMatchObject({ grams: 282.5, display: '283 g' });
    expect(plan.batch[4]).toMatchObject({ grams: 3.75, display: '3.8 g' });
  });

  it('returns the recipe itself when portions equal servings', () => {
    const plan = scaleVersion(bake, 4);
    expect(plan.batch.map((l) => l.grams)).toEqual(bake.lines.map((l) => l.grams));
  });

  it('keeps batch = per portion × portions, unrounded, for any version and portion count', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 12 }),
        fc.array(fc.double({ min: 0, max: 5000, noNaN: true }), { minLength: 1, maxLength: 12 }),
        fc.integer({ min: 1, max: 100 }),
        (servings, grams, portions) => {
          const version = { servings, lines: grams.map((g, i) => ({ foodId: i, name: `food ${i}`, grams: g })) };
          const plan = scaleVersion(version, portions);
          expect(plan.batch).toHaveLength(grams.length);
          plan.batch.forEach((line, i) => {
            expect(line.foodId).toBe(i);
            const perPortion = plan.perPortion[i].grams;
            expect(line.grams).toBeCloseTo(perPortion * portions, 6);
            expect(perPortion).toBeCloseTo(grams[i] / servings, 9);
            // the display is the rounded grams, within half a display step
            const shown = Number(line.display.replace(' g', ''));
            expect(Math.abs(shown - line.grams)).toBeLessThanOrEqual(line.grams < 10 ? 0.05 + 1e-9 : 0.5 + 1e-9);
          });
        },
      ),
      { numRuns: 200 },
    );
  });

  it.each([0, -1, 101, 2.5, Number.NaN, Number.POSITIVE_INFINITY])('refuses %f portions with a RangeError', (portions) => {
    expect(() => scaleVersion(bake, portions)).toThrow(RangeError);
    expect(() => scaleVersion(bake, portions)).toThrow(/portions must be a whole number from 1 to 100/);
  });

  it('accepts the bounds 1 and 100', () => {
    expect(scaleVersion(bake, 1).batch[0].grams).toBe(170);
    expect(scaleVersion(bake, 100).batch[0].grams).toBe(17000);
  });

  it('refuses a version without servings or with bad grams', () => {
    expect(() => scaleVersion({ ...bake, servings: 0 }, 4)).toThrow(/servings must be a number above 0/);
    expect(() => scaleVersion({ servings: 2, lines: [{ foodId: 1, name: 'Rice', grams: -5 }] }, 4)).toThrow(/line 1 \(Rice\)/);
  });
});

describe('mergeShopping', () => {
  it('sums the same food across batches, in first-seen order, under its first name', () => {
    const a = scaleVersion(bake, 8).batch;
    const b = scaleVersion(
      {
        servings: 2,
        lines: [
          { foodId: 303, name: 'Tomato sauce, canned', grams: 200 },
          { foodId: 606, name: 'Spinach, raw', grams: 90 },
          { foodId: 101, name: 'Chicken breast', grams: 300 },
        ],
      },
      4,
    ).batch;
    const list = mergeShopping([a, b]);
    expect(list.map((l) => l.foodId)).toEqual([101, 202, 303, 404, 505, 606]);
    expect(list[0]).toEqual({ foodId: 101, name: 'Chicken breast, raw', grams: 1360 + 600 });
    expect(list[2]).toEqual({ foodId: 303, name: 'Tomato sauce', grams: 850 + 400 });
    expect(list[5]).toEqual({ foodId: 606, name: 'Spinach, raw', grams: 180 });
  });

  it('keeps the total weight of its input', () => {
    const batches = [scaleVersion(bake, 3).batch, scaleVersion(bake, 7).batch, scaleVersion(bake, 1).perPortion];
    const before = batches.flat().reduce((s, l) => s + l.grams, 0);
    const after = mergeShopping(batches).reduce((s, l) => s + l.grams, 0);
    expect(after).toBeCloseTo(before, 9);
    expect(mergeShopping(batches)).toHaveLength(bake.lines.length);
  });

  it('merges unmatched lines (no food id) by name, ignoring case and spaces', () => {
    const list = mergeShopping([
      [{ foodId: null, name: 'Mystery spice', grams: 2 }],
      [
        { foodId: null, name: ' mystery SPICE ', grams: 3 },
        { foodId: null, name: 'Other', grams: 1 },
      ],
    ]);
    expect(list).toEqual([
      { foodId: null, name: 'Mystery spice', grams: 5 },
      { foodId: null, name: 'Other', grams: 1 },
    ]);
  });

  it('does not change the batches it reads', () => {
    const batch = [{ foodId: 1, name: 'Oats', grams: 40 }];
    mergeShopping([batch, batch]);
    expect(batch).toEqual([{ foodId: 1, name: 'Oats', grams: 40 }]);
    expect(mergeShopping([])).toEqual([]);
  });

  it('refuses bad grams', () => {
    expect(() => mergeShopping([[{ foodId: 1, name: 'Oats', grams: Number.NaN }]])).toThrow(RangeError);
  });
});
