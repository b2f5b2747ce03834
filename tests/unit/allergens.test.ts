/**
 * Major food allergens of US law: FALCPA (Food Allergen Labeling and Consumer Protection Act of 2004)
 * names milk, egg, fish, crustacean shellfish, tree nuts, peanuts, wheat and soybeans; the FASTER Act
 * of 2021 added sesame. Foods are real SR28 entries (names and groups checked below against
 * tests/reference/usda-sr28/FOOD_DES.txt.gz) plus custom foods, which have no group.
 */
import { describe, expect, it } from 'vitest';
import { ALLERGENS, ALLERGEN_LABELS, allergensOf, allergensOfRecipe, type Allergen } from '../../shared/allergens';
import type { Role } from '../../shared/food';
import { readFoodDes } from '../helpers/reference-data';

interface Case {
  ndb: string;
  name: string;
  group: string;
  roles?: Role[];
  expected: Allergen[];
}

const SR28_CASES: Case[] = [
  // milk — FALCPA
  { ndb: '01001', name: 'Butter, salted', group: '01', roles: ['cooking-fat'], expected: ['milk'] },
  { ndb: '01026', name: 'Cheese, mozzarella, whole milk', group: '01', roles: ['melting-cheese'], expected: ['milk'] },
  { ndb: '01053', name: 'Cream, fluid, heavy whipping', group: '01', roles: ['cream'], expected: ['milk'] },
  { ndb: '01256', name: 'Yogurt, Greek, plain, nonfat', group: '01', roles: ['sour-cream-yogurt'], expected: ['milk'] },
  { ndb: '01164', name: 'Cheese sauce, prepared from recipe', group: '01', expected: ['milk'] },
  // egg — FALCPA; SR28 files eggs under "Dairy and Egg Products", but an egg is not milk
  { ndb: '01123', name: 'Egg, whole, raw, fresh', group: '01', roles: ['egg'], expected: ['egg'] },
  { ndb: '01124', name: 'Egg, white, raw, fresh', group: '01', roles: ['egg'], expected: ['egg'] },
  { ndb: '01057', name: 'Eggnog', group: '01', expected: ['milk', 'egg'] },
  { ndb: '04025', name: 'Salad dressing, mayonnaise, regular', group: '04', roles: ['condiment'], expected: ['egg'] },
  { ndb: '20110', name: 'Noodles, egg, enriched, cooked', group: '20', roles: ['pasta'], expected: ['egg', 'wheat'] },
  // fish — FALCPA (finfish)
  { ndb: '15076', name: 'Fish, salmon, Atlantic, wild, raw', group: '15', roles: ['fish-seafood'], expected: ['fish'] },
  { ndb: '15121', name: 'Fish, tuna, light, canned in water, drained solids', group: '15', roles: ['fish-seafood'], expected: ['fish'] },
  { ndb: '15015', name: 'Fish, cod, Atlantic, raw', group: '15', roles: ['fish-seafood'], expected: ['fish'] },
  { ndb: '15261', name: 'Fish, tilapia, raw', group: '15', roles: ['fish-seafood'], expected: ['fish'] },
  { ndb: '06971', name: 'Sauce, worcestershire', group: '06', roles: ['condiment'], expected: ['fish'] }, // anchovies (*common practice*)
  // crustacean shellfish — FALCPA
  {
    ndb: '15149',
    name: 'Crustaceans, shrimp, mixed species, raw (may have been previously frozen)',
    group: '15',
    roles: ['fish-seafood'],
    expected: ['shellfish'],
  },
  { ndb: '15139', name: 'Crustaceans, crab, blue, raw', group: '15', roles: ['fish-seafood'], expected: ['shellfish'] },
  { ndb: '15147', name: 'Crustaceans, lobster, northern, raw', group: '15', roles: ['fish-seafood'], expected: ['shellfish'] },
  { ndb: '15145', name: 'Crustaceans, crayfish, mixed species, wild, raw', group: '15', roles: ['fish-seafood'], expected: ['shellfish'] },
  // molluscan shellfish are not a major food allergen under FALCPA
  { ndb: '15157', name: 'Mollusks, clam, mixed species, raw', group: '15', roles: ['fish-seafood'], expected: [] },
  { ndb: '15167', name: 'Mollusks, oyster, eastern, wild, raw', group: '15', roles: ['fish-seafood'], expected: [] },
  { ndb: '15172', name: 'Mollusks, scallop, mixed species, raw', group: '15', roles: ['fish-seafood'], expected: [] },
  // tree nuts — FALCPA; FDA 2025 guidance list (from memory)
  { ndb: '12061', name: 'Nuts, almonds', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12155', name: 'Nuts, walnuts, english', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12142', name: 'Nuts, pecans', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12087', name: 'Nuts, cashew nuts, raw', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12151', name: 'Nuts, pistachio nuts, raw', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12120', name: 'Nuts, hazelnuts or filberts', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12131', name: 'Nuts, macadamia nuts, raw', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12078', name: 'Nuts, brazilnuts, dried, unblanched', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '12147', name: 'Nuts, pine nuts, dried', group: '12', roles: ['nut-seed'], expected: ['tree nuts'] },
  { ndb: '14091', name: 'Beverages, almond milk, unsweetened, shelf stable', group: '14', roles: ['dairy-milk'], expected: ['tree nuts'] },
  // coconut: off FDA's tree-nut list since its January 2025 guidance (from memory)
  { ndb: '12104', name: 'Nuts, coconut meat, raw', group: '12', roles: ['nut-seed'], expected: [] },
  { ndb: '12118', name: 'Nuts, coconut milk, canned (liquid expressed from grated meat and water)', group: '12', expected: [] },
  // peanuts — FALCPA
  { ndb: '16087', name: 'Peanuts, all types, raw', group: '16', roles: ['nut-seed'], expected: ['peanuts'] },
  { ndb: '16098', name: 'Peanut butter, smooth style, with salt', group: '16', roles: ['nut-seed'], expected: ['peanuts'] },
  { ndb: '12135', name: 'Nuts, mixed nuts, dry roasted, with peanuts, without salt added', group: '12', expected: ['tree nuts', 'peanuts'] },
  { ndb: '12138', name: 'Nuts, mixed nuts, oil roasted, without peanuts, without salt added', group: '12', expected: ['tree nuts'] },
  // wheat — FALCPA
  { ndb: '20081', name: 'Wheat flour, white, all-purpose, enriched, bleached', group: '20', roles: ['flour'], expected: ['wheat'] },
  { ndb: '20120', name: 'Pasta, dry, enriched', group: '20', roles: ['pasta'], expected: ['wheat'] },
  { ndb: '18069', name: 'Bread, white, commercially prepared (includes soft bread crumbs)', group: '18', roles: ['bread'], expected: ['wheat'] },
  { ndb: '18364', name: 'Tortillas, ready-to-bake or -fry, flour, refrigerated', group: '18', roles: ['flatbread-wrap'], expected: ['wheat'] },
  { ndb: '18079', name: 'Bread crumbs, dry, grated, plain', group: '18', roles: ['breadcrumb-coating'], expected: ['wheat'] },
  { ndb: '20028', name: 'Couscous, dry', group: '20', expected: ['wheat'] },
  { ndb: '20066', name: 'Semolina, enriched', group: '20', roles: ['flour'], expected: ['wheat'] },
  { ndb: '20012', name: 'Bulgur, dry', group: '20', roles: ['rice-grain'], expected: ['wheat'] },
  { ndb: '48052', name: 'Vital wheat gluten', group: '20', roles: ['plant-protein', 'flour'], expected: ['wheat'] },
  { ndb: '18363', name: 'Tortillas, ready-to-bake or -fry, corn', group: '18', roles: ['flatbread-wrap'], expected: [] },
  { ndb: '20134', name: 'Rice noodles, cooked', group: '20', roles: ['pasta'], expected: [] },
  { ndb: '20092', name: 'Pasta, gluten-free, corn, cooked', group: '20', roles: ['pasta'], expected: [] },
  { ndb: '28337', name: 'Bread, gluten-free, white, made with rice flour, corn starch, and/or tapioca', group: '18', roles: ['bread'], expected: [] },
  // soy — FALCPA ("soybeans")
  { ndb: '16126', name: 'Tofu, firm, prepared with calcium sulfate and magnesium chloride (nigari)', group: '16', roles: ['plant-protein'], expected: ['soy'] },
  { ndb: '16114', name: 'Tempeh', group: '16', roles: ['plant-protein'], expected: ['soy'] },
  { ndb: '11211', name: 'Edamame, frozen, unprepared', group: '11', roles: ['vegetable'], expected: ['soy'] },
  { ndb: '16123', name: 'Soy sauce made from soy and wheat (shoyu)', group: '16', roles: ['condiment'], expected: ['wheat', 'soy'] },
  { ndb: '16120', name: 'Soymilk, original and vanilla, unfortified', group: '16', roles: ['dairy-milk'], expected: ['soy'] },
  // highly refined oils are exempt under FALCPA
  { ndb: '04044', name: 'Oil, soybean, salad or cooking', group: '04', roles: ['cooking-fat'], expected: [] },
  // sesame — FASTER Act 2021
  { ndb: '12023', name: 'Seeds, sesame seeds, whole, dried', group: '12', roles: ['nut-seed'], expected: ['sesame'] },
  {
    ndb: '12166',
    name: 'Seeds, sesame butter, tahini, from roasted and toasted kernels (most common type)',
    group: '12',
    roles: ['nut-seed'],
    expected: ['sesame'],
  },
  { ndb: '04058', name: 'Oil, sesame, salad or cooking', group: '04', roles: ['cooking-fat'], expected: ['sesame'] },
  { ndb: '16137', name: 'Hummus, home prepared', group: '16', roles: ['legume'], expected: ['sesame'] }, // tahini (*common practice*)
  // mixed foods
  { ndb: '06626', name: 'Sauce, pesto, ready-to-serve, refrigerated', group: '06', expected: ['milk', 'tree nuts'] }, // cheese, pine nuts (*common practice*)
  // none of the nine
  { ndb: '04053', name: 'Oil, olive, salad or cooking', group: '04', roles: ['cooking-fat'], expected: [] },
  { ndb: '20345', name: 'Rice, white, long-grain, regular, cooked, enriched, with salt', group: '20', roles: ['rice-grain'], expected: [] },
  { ndb: '05064', name: 'Chicken, broilers or fryers, breast, meat only, cooked, roasted', group: '05', roles: ['poultry'], expected: [] },
  { ndb: '11215', name: 'Garlic, raw', group: '11', roles: ['vegetable'], expected: [] },
  { ndb: '11209', name: 'Eggplant, raw', group: '11', roles: ['vegetable'], expected: [] },
];

const CUSTOM_CASES: Omit<Case, 'ndb'>[] = [
  { name: 'Cheese sauce', group: '', roles: ['cream-sauce-base'], expected: ['milk'] },
  { name: 'Egg noodles', group: '', roles: ['pasta'], expected: ['egg', 'wheat'] },
  { name: 'Mayonnaise', group: '', roles: ['condiment'], expected: ['egg'] },
  { name: 'Panko breadcrumbs', group: '', roles: ['breadcrumb-coating'], expected: ['wheat'] },
  { name: 'Seitan strips', group: '', roles: ['plant-protein'], expected: ['wheat'] },
  { name: 'Corn tortilla', group: '', roles: ['flatbread-wrap'], expected: [] },
  { name: 'Flour tortilla, low carb', group: '', roles: ['flatbread-wrap'], expected: ['wheat'] },
  { name: 'Gluten-free sandwich bread', group: '', roles: ['bread'], expected: [] },
  { name: 'Protein pasta, chickpea flour', group: '', roles: ['pasta'], expected: ['wheat'] }, // "pasta" alone is wheat
  { name: 'Chickpea flour', group: '', roles: ['flour'], expected: [] },
  { name: 'Shrimp, peeled', group: '', roles: ['fish-seafood'], expected: ['shellfish'] },
  { name: 'Fat-free milk', group: '', roles: ['dairy-milk'], expected: ['milk'] },
  { name: 'Dairy-free yogurt, coconut', group: '', roles: ['sour-cream-yogurt'], expected: [] },
  { name: 'Vegan cheddar shreds', group: '', roles: ['melting-cheese'], expected: [] },
  { name: 'Peanut butter powder', group: '', roles: ['nut-seed'], expected: ['peanuts'] },
  { name: 'Light cream cheese', group: '', roles: ['soft-cheese'], expected: ['milk'] },
  { name: 'Tahini sauce', group: '', roles: ['condiment'], expected: ['sesame'] },
  { name: 'Water chestnuts, sliced', group: '', roles: ['vegetable'], expected: [] },
  { name: 'Egg whites, liquid', group: '', roles: ['egg'], expected: ['egg'] },
];

describe('allergensOf — SR28 foods', () => {
  it('uses real SR28 names and groups (USDA SR28 FOOD_DES, May 2016)', () => {
    const byNdb = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
    for (const c of SR28_CASES) {
      const row = byNdb.get(c.ndb);
      expect(row, c.ndb).toBeDefined();
      expect(row?.longDesc, c.ndb).toBe(c.name);
      expect(row?.fdGrpCd.slice(0, 2), c.ndb).toBe(c.group);
    }
    expect(SR28_CASES.length).toBeGreaterThanOrEqual(30);
  });

  it.each(SR28_CASES.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    expect(allergensOf({ name: c.name, foodGroup: c.group, roles: c.roles ?? [] })).toEqual(c.expected);
  });
});

describe('allergensOf — custom foods (no food group)', () => {
  it.each(CUSTOM_CASES.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    expect(allergensOf({ name: c.name, foodGroup: c.group, roles: c.roles ?? [] })).toEqual(c.expected);
  });

  it('reads the egg and cheese roles even when the name says nothing', () => {
    expect(allergensOf({ name: 'House blend, shredded', foodGroup: '', roles: ['melting-cheese'] })).toEqual(['milk']);
    expect(allergensOf({ name: 'Scramble mix', foodGroup: '', roles: ['egg'] })).toEqual(['egg']);
    // a dairy-milk role alone is not milk: soy, almond and oat drinks share it
    expect(allergensOf({ name: 'Oat drink, unsweetened', foodGroup: '', roles: ['dairy-milk'] })).toEqual([]);
  });
});

describe('allergensOf over the whole SR28 file (USDA SR28 FOOD_DES)', () => {
  const foods = readFoodDes().map((d) => ({ name: d.longDesc, foodGroup: d.fdGrpCd.slice(0, 2), roles: [] as Role[] }));
  const head = (name: string) => name.split(',')[0];

  it('flags every finfish entry as fish and every crustacean as shellfish, no mollusk as shellfish', () => {
    const group15 = foods.filter((f) => f.foodGroup === '15');
    const fish = group15.filter((f) => head(f.name) === 'Fish');
    const crustaceans = group15.filter((f) => head(f.name) === 'Crustaceans');
    const mollusks = group15.filter((f) => head(f.name) === 'Mollusks');
    expect(fish.length).toBeGreaterThan(100);
    expect(crustaceans.length).toBeGreaterThan(10);
    expect(mollusks.length).toBeGreaterThan(10);
    for (const f of fish) expect(allergensOf(f), f.name).toContain('fish');
    for (const f of crustaceans) expect(allergensOf(f), f.name).toContain('shellfish');
    for (const f of mollusks) expect(allergensOf(f), f.name).not.toContain('shellfish');
  });

  it('flags group 01 eggs as egg and not milk, the rest of group 01 as milk', () => {
    const dairyAndEgg = foods.filter((f) => f.foodGroup === '01');
    const eggs = dairyAndEgg.filter((f) => /^Eggs?,/.test(f.name));
    expect(eggs.length).toBeGreaterThan(20);
    for (const f of eggs) {
      expect(allergensOf(f), f.name).toContain('egg');
      expect(allergensOf(f), f.name).not.toContain('milk');
    }
    for (const f of dairyAndEgg.filter((x) => !/^(Eggs?|Egg substitute|Egg Mix)\b/.test(x.name))) {
      expect(allergensOf(f), f.name).toContain('milk');
    }
  });

  it('flags every peanut entry of group 16 and no coconut entry of group 12', () => {
    const peanuts = foods.filter((f) => f.foodGroup === '16' && /^Peanut/.test(f.name));
    expect(peanuts.length).toBeGreaterThan(20);
    for (const f of peanuts) expect(allergensOf(f), f.name).toContain('peanuts');
    const coconut = foods.filter((f) => f.foodGroup === '12' && /^Nuts, coconut/.test(f.name));
    expect(coconut.length).toBeGreaterThan(5);
    for (const f of coconut) expect(allergensOf(f), f.name).toEqual([]);
  });

  it('finds no wheat in plain rice, corn, rice noodles or gluten-free foods', () => {
    const plain = foods.filter((f) => /^(Rice, (white|brown)|Rice noodles|Corn grain|Cornstarch|Rice flour)/.test(f.name));
    expect(plain.length).toBeGreaterThan(20);
    for (const f of plain) expect(allergensOf(f), f.name).not.toContain('wheat');
    const glutenFree = foods.filter((f) => /gluten[- ]free/i.test(f.name));
    expect(glutenFree.length).toBeGreaterThan(20);
    for (const f of glutenFree) expect(allergensOf(f), f.name).not.toContain('wheat');
  });

  it('finds wheat in every baked product but corn tortillas, taco and tostada shells and gluten-free ones', () => {
    const baked = foods.filter((f) => f.foodGroup === '18' && !/gluten[- ]free|corn|taco shells|tostada shells/i.test(f.name));
    expect(baked.length).toBeGreaterThan(400);
    for (const f of baked) expect(allergensOf(f), f.name).toContain('wheat');
  });
});

describe('allergensOfRecipe', () => {
  const food = (name: string, foodGroup = '', roles: Role[] = []) => ({ name, foodGroup, roles });

  it('lists each allergen once, in the fixed order milk, egg, fish, shellfish, tree nuts, peanuts, wheat, soy, sesame', () => {
    const dish = [
      food('Soy sauce made from soy and wheat (shoyu)', '16'),
      food('Crustaceans, shrimp, mixed species, raw (may have been previously frozen)', '15'),
      food('Noodles, egg, enriched, cooked', '20'),
      food('Butter, salted', '01'),
      food('Seeds, sesame seeds, whole, dried', '12'),
      food('Butter, without salt', '01'),
    ];
    expect(allergensOfRecipe(dish)).toEqual(['milk', 'egg', 'shellfish', 'wheat', 'soy', 'sesame']);
    // order of the foods does not change the order of the answer
    expect(allergensOfRecipe([...dish].reverse())).toEqual(['milk', 'egg', 'shellfish', 'wheat', 'soy', 'sesame']);
  });

  it('is empty for a dish of none of the nine, and for no foods', () => {
    expect(
      allergensOfRecipe([food('Oil, olive, salad or cooking', '04'), food('Garlic, raw', '11'), food('Mollusks, clam, mixed species, raw', '15')]),
    ).toEqual([]);
    expect(allergensOfRecipe([])).toEqual([]);
  });

  it('has the nine allergens of FALCPA + FASTER Act, each with a caution label', () => {
    expect(ALLERGENS).toEqual(['milk', 'egg', 'fish', 'shellfish', 'tree nuts', 'peanuts', 'wheat', 'soy', 'sesame']);
    // FALCPA names the shellfish allergen "crustacean shellfish"
    expect(ALLERGEN_LABELS.shellfish).toBe('Crustacean shellfish');
    expect(Object.keys(ALLERGEN_LABELS).sort()).toEqual([...ALLERGENS].sort());
  });
});
