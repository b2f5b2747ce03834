/**
 * Shopping hints from household portions. Portions are the USDA SR28 household weights
 * (tests/reference/usda-sr28/WEIGHT.txt.gz); weights convert by NIST Handbook 44 Appendix C.
 */
import { describe, expect, it } from 'vitest';
import type { Portion } from '../../shared/food';
import { purchaseHint, purchaseWeight } from '../../shared/purchase-hint';
import { GRAMS_PER_OUNCE, GRAMS_PER_POUND } from '../../shared/units';
import { readWeights } from '../helpers/reference-data';

const weights = readWeights();

/** A food's household portions as the catalogue keeps them, from SR28 WEIGHT.txt. */
function sr28Portions(ndb: string): Portion[] {
  const rows = weights.filter((w) => w.ndbNo === ndb);
  expect(rows.length, ndb).toBeGreaterThan(0);
  return rows.map((w) => ({ label: `${w.amount} ${w.msreDesc}`, amount: w.amount, measure: w.msreDesc, grams: w.gmWgt }));
}

const egg = sr28Portions('01123'); // Egg, whole, raw, fresh
const mozzarella = sr28Portions('01026'); // Cheese, mozzarella, whole milk
const groundBeef = sr28Portions('23572'); // Beef, ground, 80% lean meat / 20% fat, raw
const onion = sr28Portions('11282'); // Onions, raw
const garlic = sr28Portions('11215'); // Garlic, raw
const flourTortilla = sr28Portions('18364'); // Tortillas, ready-to-bake or -fry, flour, refrigerated
const butter = sr28Portions('01001'); // Butter, salted
const cumin = sr28Portions('02014'); // Spices, cumin seed
const flour = sr28Portions('20081'); // Wheat flour, white, all-purpose, enriched, bleached
const tomato = sr28Portions('11529'); // Tomatoes, red, ripe, raw, year round average
const banana = sr28Portions('09040'); // Bananas, raw

describe('the SR28 portions the hints read', () => {
  it('are the USDA household weights (USDA SR28 WEIGHT.txt)', () => {
    expect(egg.find((p) => p.measure === 'large')?.grams).toBe(50);
    expect(mozzarella.find((p) => p.measure === 'cup, shredded')?.grams).toBe(112);
    expect(groundBeef).toEqual([{ label: '4 oz', amount: 4, measure: 'oz', grams: 113 }]);
    expect(garlic.find((p) => p.measure === 'clove')?.grams).toBe(3);
    expect(butter.find((p) => p.measure === 'stick')?.grams).toBe(113);
  });
});

describe('counted foods: whole items, rounded up', () => {
  it.each([
    [150, 'us', '3 large eggs'], // SR28: 1 large egg = 50 g
    [152, 'us', '3 large eggs'], // household weights are averages: 3.04 eggs is 3
    [160, 'us', '4 large eggs'],
    [40, 'us', '1 large egg'],
    [150, 'metric', '3 large eggs'],
    [600, 'us', '12 large eggs'],
  ] as const)('%f g of egg (%s) → %s', (grams, system, hint) => {
    expect(purchaseHint(grams, egg, system, 'Egg, whole, raw, fresh')).toBe(hint);
  });

  it('prefers large, then medium, and names the food from its name', () => {
    expect(purchaseHint(300, onion, 'us', 'Onions, raw')).toBe('2 large onions'); // SR28: large 150 g
    expect(purchaseHint(100, onion, 'us', 'Onions, raw')).toBe('1 large onion');
    expect(purchaseHint(250, tomato, 'us', 'Tomatoes, red, ripe, raw, year round average')).toBe('2 large tomatoes'); // 182 g each
    expect(purchaseHint(250, banana, 'us', 'Bananas, raw')).toBe('2 large bananas'); // 136 g each, not "extra large"
    expect(
      purchaseHint(
        150,
        [
          { label: '1 medium', amount: 1, measure: 'medium', grams: 44 },
          { label: '1 small', amount: 1, measure: 'small', grams: 38 },
        ],
        'us',
        'Egg',
      ),
    ).toBe('4 medium eggs');
  });

  it('counts pieces that name themselves: cloves, tortillas, sticks', () => {
    expect(purchaseHint(9, garlic, 'us', 'Garlic, raw')).toBe('3 cloves'); // SR28: 1 clove = 3 g
    expect(purchaseHint(12, garlic, 'metric', 'Garlic, raw')).toBe('4 cloves');
    expect(purchaseHint(147, flourTortilla, 'us')).toBe('3 tortillas'); // SR28: 1 tortilla = 48 g
    expect(purchaseHint(227, butter, 'us')).toBe('2 sticks'); // SR28: 1 stick = 113 g
    expect(purchaseHint(14, butter, 'us')).toBe('1 stick');
  });

  it('says "3 large" without a food name', () => {
    expect(purchaseHint(150, egg, 'us')).toBe('3 large');
  });

  it('falls back to volume past two dozen items (*common practice*)', () => {
    // 200 g of garlic is 67 cloves; SR28: 1 cup = 136 g
    expect(purchaseHint(200, garlic, 'us', 'Garlic, raw')).toBe('about 1 1/2 cups');
  });
});

describe('loose foods: cups and spoons', () => {
  it.each([
    [224, 'about 2 cups'], // SR28: 1 cup, shredded = 112 g
    [190, 'about 1 3/4 cups'],
    [112, 'about 1 cup'],
    [56, 'about 1/2 cup'],
    [84, 'about 3/4 cup'],
    [448, 'about 4 cups'],
  ])('%f g of shredded mozzarella → %s', (grams, hint) => {
    expect(purchaseHint(grams, mozzarella, 'us')).toBe(hint);
  });

  it('uses spoons under a quarter cup, in either unit system', () => {
    // 20 g of mozzarella: 42 mL = 2.9 tbsp (NIST: 1 tbsp = 14.78676478125 mL)
    expect(purchaseHint(20, mozzarella, 'us')).toBe('about 3 tbsp');
    expect(purchaseHint(20, mozzarella, 'metric')).toBe('about 3 tbsp');
    // SR28: cumin seed 1 tsp = 2.1 g
    expect(purchaseHint(4, cumin, 'us')).toBe('about 2 tsp');
    expect(purchaseHint(6, cumin, 'us')).toBe('about 1 tbsp');
    expect(purchaseHint(0.1, cumin, 'us')).toBe('a pinch');
  });

  it('switches to weight above 4 cups, and for metric shoppers', () => {
    // 600 g of mozzarella is 5.4 cups; 600 g = 21.2 oz → 22 oz (NIST: 1 oz = 28.349523125 g)
    expect(purchaseHint(600, mozzarella, 'us')).toBe('1 lb 6 oz');
    expect(purchaseHint(224, mozzarella, 'metric')).toBe('about 220 g');
    // SR28: 1 cup flour = 125 g; 300 g is 2.4 cups
    expect(purchaseHint(300, flour, 'us')).toBe('about 2 1/2 cups');
    expect(purchaseHint(1000, flour, 'us')).toBe('2 lb 4 oz');
  });
});

describe('weights', () => {
  it('buys ground beef, which has no household portion, by the pound and ounce (NIST Handbook 44)', () => {
    // 510 g = 17.99 oz → 18 oz = 1 lb 2 oz
    expect(purchaseHint(510, groundBeef, 'us')).toBe('1 lb 2 oz');
    expect(purchaseHint(510, groundBeef, 'metric')).toBe('about 510 g');
  });

  it('converts with the exact NIST factors: 1 lb = 453.59237 g = 16 oz, 1 oz = 28.349523125 g', () => {
    // NIST Handbook 44 Appendix C
    expect(purchaseWeight(GRAMS_PER_POUND, 'us')).toBe('1 lb');
    expect(purchaseWeight(16 * GRAMS_PER_OUNCE, 'us')).toBe('1 lb');
    expect(purchaseWeight(GRAMS_PER_POUND + 0.5, 'us')).toBe('1 lb 1 oz');
    expect(purchaseWeight(2 * GRAMS_PER_POUND, 'us')).toBe('2 lb');
    expect(purchaseWeight(6 * GRAMS_PER_OUNCE, 'us')).toBe('6 oz');
    expect(purchaseWeight(6 * GRAMS_PER_OUNCE + 1, 'us')).toBe('7 oz');
    expect(purchaseWeight(20, 'us')).toBe('under 1 oz');
  });

  it.each([
    [448, 'about 450 g'],
    [453.59237, 'about 450 g'],
    [42, 'about 40 g'],
    [43, 'about 45 g'],
    [995, 'about 1 kg'],
    [1150, 'about 1.2 kg'],
    [2349, 'about 2.3 kg'],
    [3, 'about 5 g'],
    [2, 'under 5 g'],
  ])('metric: %f g → %s', (grams, hint) => {
    expect(purchaseWeight(grams, 'metric')).toBe(hint);
  });
});

describe('edge cases', () => {
  it('has nothing to buy for 0 g and refuses bad grams', () => {
    expect(purchaseHint(0, egg, 'us', 'Egg')).toBe('');
    expect(() => purchaseHint(-1, egg, 'us')).toThrow(RangeError);
    expect(() => purchaseHint(Number.NaN, egg, 'us')).toThrow(RangeError);
  });

  it('ignores portions without weight', () => {
    const broken: Portion[] = [{ label: '1 large', amount: 1, measure: 'large', grams: 0 }];
    expect(purchaseHint(510, broken, 'us', 'Egg')).toBe('1 lb 2 oz');
  });
});
