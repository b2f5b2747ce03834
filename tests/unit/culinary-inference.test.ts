/**
 * Dish type and line function read from small invented recipes (PRODUCT.md step 5). The foods are
 * hand-made stand-ins carrying the SR28 group, a readable name and the catalogue roles; which line does
 * what in which dish is *common practice*.
 */
import { describe, expect, it } from 'vitest';
import { breadedPieces, contextOf, heldReasonFor, inferDishType, readDish } from '../../shared/culinary/infer-dish';
import { bandFor, inFoodClass, keepScaleOf, ruleHoldsIn, rulesForLine } from '../../shared/culinary/match-rules';
import { parseRuleFile } from '../../shared/culinary/rule-schema';
import type { CulinaryLine } from '../../shared/culinary/types';
import { lineKind, type LineKind } from '../../shared/culinary/line-kind';
import ruleFile from '../../data/substitution-rules.json';

type Spec = [phrase: string, grams: number, name: string, group: string, roles: string[], comment?: string, ndb?: string, fatG?: number];

const line = ([phrase, grams, name, group, roles, comment, ndb, fatG]: Spec): CulinaryLine => ({
  phrase,
  grams,
  comment: comment ?? null,
  food: { name, foodGroup: group, sourceId: ndb ?? '00000', roles, per100g: { fatG: fatG ?? 0 } },
});
const recipe = (...specs: Spec[]) => specs.map(line);

const FLOUR: Spec = ['all-purpose flour', 250, 'Wheat flour, white, all-purpose, enriched, bleached', '20', ['flour'], undefined, '20081'];
const SUGAR = (g: number): Spec => ['sugar', g, 'Sugars, granulated', '19', ['sweetener'], undefined, '19335'];
const EGGS: Spec = ['eggs', 100, 'Egg, whole, raw, fresh', '01', ['egg'], undefined, '01123', 9.5];
const BUTTER = (g: number, comment?: string): Spec => ['butter', g, 'Butter, with salt', '01', ['cooking-fat'], comment, '01001', 81];
const MILK = (g: number): Spec => ['whole milk', g, 'Milk, whole, 3.25% milkfat, with added vitamin D', '01', ['dairy-milk'], undefined, '01077', 3.3];
const SALT: Spec = ['salt', 3, 'Salt, table', '02', ['herb-spice'], undefined, '02047'];
const POWDER: Spec = ['baking powder', 9, 'Leavening agents, baking powder, double-acting', '18', ['baking-leavener']];
const SODA: Spec = ['baking soda', 5, 'Leavening agents, baking soda', '18', ['baking-leavener']];
const VANILLA: Spec = ['vanilla extract', 4, 'Vanilla extract', '02', ['herb-spice']];
const PASTA: Spec = ['elbow macaroni', 454, 'Pasta, dry, enriched', '20', ['pasta'], undefined, '20120', 1.5];
const CHEDDAR = (comment?: string): Spec => ['sharp cheddar cheese', 226, 'Cheese, cheddar', '01', ['melting-cheese'], comment, '01009', 33];
const ONION: Spec = ['onion', 110, 'Onions, raw', '11', ['vegetable']];
const BEEF: Spec = ['ground beef', 454, 'Beef, ground, 80% lean meat / 20% fat, raw', '13', ['ground-meat', 'red-meat'], undefined, '23572', 20];
const PORK_CHOPS: Spec = [
  'boneless pork loin chops, pounded thin',
  680,
  'Pork, fresh, loin, top loin (chops), boneless, lean only, raw',
  '10',
  ['pork'],
  undefined,
  '10200',
  5,
];

describe('dish type from the whole recipe', () => {
  it('reads pancakes as a batter: as much milk as flour, little sugar, a leavener', () => {
    expect(inferDishType(recipe(FLOUR, MILK(480), EGGS, SUGAR(25), POWDER, SALT, BUTTER(40)))).toBe('batter');
  });

  it('reads banana bread as a leavened bake and cookies (rich, dry) as a dough', () => {
    const banana: Spec = ['ripe bananas, mashed', 350, 'Bananas, raw', '09', ['fruit']];
    expect(inferDishType(recipe(FLOUR, SODA, SALT, BUTTER(113), SUGAR(150), EGGS, banana, VANILLA))).toBe('leavened-bake');
    expect(inferDishType(recipe(FLOUR, SODA, SALT, BUTTER(227), SUGAR(300), EGGS, VANILLA))).toBe('dough');
  });

  it('reads anything with yeast and flour as a dough', () => {
    const yeast: Spec = ['active dry yeast', 7, "Leavening agents, yeast, baker's, active dry", '18', ['baking-leavener']];
    const water: Spec = ['warm water', 240, 'Water, tap, municipal', '14', ['other']];
    expect(inferDishType(recipe(FLOUR, yeast, water, SALT))).toBe('dough');
  });

  it('reads pasta in a cream sauce as a stovetop sauce dish, and with a crumb topping as an assembled bake', () => {
    const cream: Spec = ['heavy cream', 357, 'Cream, fluid, heavy whipping', '01', ['cream', 'cream-sauce-base'], undefined, '01053', 36];
    expect(inferDishType(recipe(PASTA, BUTTER(57), cream, SALT))).toBe('stovetop-sauce');
    const crumbs: Spec = ['dry bread crumbs', 54, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating']];
    expect(inferDishType(recipe(PASTA, BUTTER(57), ['all-purpose flour', 31, FLOUR[2], '20', ['flour']], MILK(732), CHEDDAR(), crumbs))).toBe('assembled-bake');
  });

  it("reads potatoes over a meat filling as a shepherd's pie (a bake) but potatoes in a pot of broth as a stew", () => {
    const potatoes = (g: number): Spec => ['russet potatoes', g, 'Potatoes, russet, flesh and skin, raw', '11', ['potato']];
    const lamb: Spec = ['ground lamb', 680, 'Lamb, ground, raw', '17', ['ground-meat', 'red-meat'], undefined, '17224', 23];
    const broth = (g: number): Spec => ['beef broth', g, 'Soup, beef broth or bouillon canned, ready-to-serve', '06', ['broth-stock']];
    expect(inferDishType(recipe(potatoes(907), BUTTER(57), MILK(122), lamb, ONION, broth(240), SALT))).toBe('assembled-bake');
    expect(inferDishType(recipe(lamb, potatoes(680), ONION, broth(960), SALT))).toBe('simmered-dish');
  });

  it('reads chili as a simmered dish, a quesadilla as a griddle dish, a tuna salad as a cold dish', () => {
    const tomatoes: Spec = ['crushed tomatoes', 794, 'Tomatoes, crushed, canned', '11', ['tomato-sauce']];
    const beans: Spec = ['kidney beans, drained', 440, 'Beans, kidney, red, mature seeds, canned', '16', ['legume']];
    expect(inferDishType(recipe(BEEF, ONION, tomatoes, beans, SALT))).toBe('simmered-dish');
    const tortillas: Spec = ['flour tortillas', 192, 'Tortillas, ready-to-bake or -fry, flour, refrigerated', '18', ['flatbread-wrap']];
    expect(
      inferDishType(recipe(tortillas, CHEDDAR(), ['cooked chicken', 280, 'Chicken, broilers or fryers, meat only, cooked, roasted', '05', ['poultry']])),
    ).toBe('griddle-saute');
    const tuna: Spec = ['canned tuna, drained', 280, 'Fish, tuna, light, canned in water, drained solids', '15', ['fish-seafood']];
    const mayo: Spec = ['mayonnaise', 110, 'Salad dressing, mayonnaise, regular', '04', ['condiment'], undefined, '04025'];
    expect(inferDishType(recipe(tuna, mayo, ['celery', 50, 'Celery, raw', '11', ['vegetable']]))).toBe('cold-dish');
  });
});

describe('line function', () => {
  it('reads fresh parsley, cilantro and chives as herbs that season the dish, though SR28 files them with the vegetables', () => {
    const parsley: Spec = ['chopped fresh parsley', 15, 'Parsley, fresh', '11', ['vegetable'], undefined, '11297'];
    const cilantro: Spec = ['cilantro', 8, 'Coriander (cilantro) leaves, raw', '11', ['vegetable'], undefined, '11165'];
    const dish = readDish(recipe(PASTA, BUTTER(57), CHEDDAR(), parsley, cilantro, ONION));
    expect(dish.lines.slice(3, 5).map((l) => l.role)).toEqual(['seasoning', 'seasoning']);
    expect(dish.lines[5].role).not.toBe('seasoning');
  });

  it('holds salt, leaveners, extracts and aromatics, and says why', () => {
    const read = readDish(recipe(FLOUR, MILK(480), EGGS, SUGAR(25), POWDER, SALT, BUTTER(40), VANILLA, ONION));
    const roles = read.lines.map((l) => l.role);
    expect(roles).toEqual(['structure', 'dairy-liquid', 'structure', 'sweetener', 'leavener', 'salt', 'baking-fat', 'extract', 'aromatic']);
    expect(heldReasonFor('leavener')).toBe('leavener: kept as written');
    expect(heldReasonFor('salt')).toBe('salt: kept as written');
    expect(heldReasonFor('structure')).toBeUndefined();
    expect(read.lines[0].context).toBe('baked-batter-dough');
  });

  it('finds the roux: butter is its fat, flour its thickener, milk and cheese cook in the white sauce', () => {
    const read = readDish(
      recipe(PASTA, BUTTER(57), ['all-purpose flour', 31, FLOUR[2], '20', ['flour']], MILK(732), CHEDDAR(), [
        'dry mustard',
        2,
        'Spices, mustard seed, ground',
        '02',
        ['herb-spice'],
      ]),
    );
    expect(read.hasRoux).toBe(true);
    expect(read.lines.map((l) => l.role)).toEqual(['starch', 'fat-for-roux', 'thickener', 'dairy-liquid', 'melting-cheese', 'seasoning']);
    expect(read.lines[3].context).toBe('roux-white-sauce');
    expect(read.lines[4].context).toBe('roux-white-sauce');
  });

  it('sugar is structure where it outweighs the flour (brownies), a sweetener where it does not', () => {
    const cocoa: Spec = ['cocoa powder', 40, 'Cocoa, dry powder, unsweetened', '19', ['chocolate']];
    const brownies = readDish(recipe(['flour', 65, FLOUR[2], '20', ['flour']], SUGAR(250), BUTTER(113), EGGS, cocoa, SALT));
    expect(brownies.lines[1].role).toBe('structure');
    const pancakes = readDish(recipe(FLOUR, MILK(480), EGGS, SUGAR(25), POWDER));
    expect(pancakes.lines[3].role).toBe('sweetener');
  });

  it('eggs bind a meatloaf, make the sauce of a carbonara, and are structure in a bake', () => {
    const crumbs: Spec = ['dry bread crumbs', 108, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating']];
    expect(readDish(recipe(BEEF, crumbs, EGGS, MILK(120), ONION, SALT)).lines[2].role).toBe('binder');
    const pecorino: Spec = ['grated Pecorino Romano', 99, 'Cheese, romano', '01', ['hard-cheese']];
    expect(readDish(recipe(PASTA, EGGS, pecorino, SALT)).lines[1].role).toBe('sauce');
    expect(readDish(recipe(FLOUR, MILK(480), EGGS, POWDER)).lines[2].role).toBe('structure');
  });

  it('crumbs, egg and flour around a whole cut are its breading (a schnitzel), around mince its binder; an egg "for brushing" is a wash, not structure', () => {
    const chops = PORK_CHOPS;
    const crumbs: Spec = ['dry bread crumbs', 162, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating'], undefined, '18079', 5.3];
    const oil: Spec = ['vegetable oil', 109, 'Oil, soybean, salad or cooking', '04', ['cooking-fat'], 'for frying', '04044', 100];
    const schnitzel = readDish(recipe(chops, ['all-purpose flour', 62, FLOUR[2], '20', ['flour'], undefined, '20081'], EGGS, crumbs, oil, SALT));
    expect(schnitzel.lines.slice(1, 4).map((l) => [l.role, l.context])).toEqual([
      ['coating', 'topping'],
      ['coating', 'topping'],
      ['coating', 'topping'],
    ]);
    // the breaded chop is still the portion, not one part of a mixed dish
    expect(schnitzel.mixedDish).toBe(false);
    // ground meat with the same crumbs and egg is a meatloaf: they bind it
    const loaf = readDish(recipe(BEEF, crumbs, EGGS, SALT));
    expect(loaf.lines.slice(1, 3).map((l) => l.role)).toEqual(['binder', 'binder']);
    const yeast: Spec = ['instant yeast', 9, "Leavening agents, yeast, baker's, active dry", '18', ['baking-leavener']];
    const water: Spec = ['warm water', 237, 'Water, tap, municipal', '14', ['other']];
    const wash: Spec = ['large egg, beaten', 50, 'Egg, whole, raw, fresh', '01', ['egg'], 'for brushing', '01123', 9.5];
    const dough = readDish(recipe(['all-purpose flour', 375, FLOUR[2], '20', ['flour'], undefined, '20081'], yeast, water, SALT, wash));
    expect(dough.dishType).toBe('dough');
    expect(dough.lines[4]).toMatchObject({ role: 'coating', context: 'topping' });
    const enriched = readDish(
      recipe(['all-purpose flour', 375, FLOUR[2], '20', ['flour'], undefined, '20081'], yeast, water, SALT, [
        'large egg',
        50,
        'Egg, whole, raw, fresh',
        '01',
        ['egg'],
        undefined,
        '01123',
        9.5,
      ]),
    );
    expect(enriched.lines[4]).toMatchObject({ role: 'structure', context: 'baked-batter-dough' });
  });

  it('a cheese "for the top" is a topping; oil "for the pan" is fat for the pan', () => {
    const read = readDish(recipe(PASTA, CHEDDAR('for the top'), ['olive oil', 14, 'Oil, olive, salad or cooking', '04', ['cooking-fat'], 'for the pan']));
    expect(read.lines[1]).toMatchObject({ role: 'topping', context: 'topping' });
    expect(read.lines[2]).toMatchObject({ role: 'cooking-fat', context: 'griddle-saute' });
  });

  it("the cook's override wins and its context follows", () => {
    const read = readDish(recipe(BEEF, ONION, SALT), { 1: 'vegetable' });
    expect(read.lines[1].role).toBe('vegetable');
    expect(heldReasonFor(read.lines[1].role)).toBeUndefined();
    expect(contextOf('topping', 'simmered-dish', false)).toBe('topping');
  });
});

describe('rule matching by food class and dish context', () => {
  const rules = parseRuleFile(ruleFile);
  const rule = (id: string) => rules.find((r) => r.id === id)!;

  it('matches full-fat ground beef, not lean beef or cooked crumbles', () => {
    const cls = rule('ground-beef-to-lean-turkey').from;
    const food = (name: string, fatG: number) => ({ name, foodGroup: '13', sourceId: '23572', roles: ['ground-meat'], per100g: { fatG } });
    expect(inFoodClass(cls, food('Beef, ground, 80% lean meat / 20% fat, raw', 20), 'ground beef')).toBe(true);
    expect(inFoodClass(cls, food('Beef, ground, 95% lean meat / 5% fat, raw', 5), 'lean ground beef')).toBe(false);
    expect(inFoodClass(cls, food('Beef, ground, 80% lean meat / 20% fat, crumbles, cooked, pan-browned', 18), 'cooked beef')).toBe(false);
  });

  it('reads "pancetta" from what the cook wrote even when the catalogue weighs it as bacon', () => {
    const bacon = { name: 'Pork, cured, bacon, unprepared', foodGroup: '10', sourceId: '10123', roles: ['cured-meat-topping'], per100g: { fatG: 42 } };
    const applicable = rulesForLine(rules, { food: bacon, phrase: 'pancetta', role: 'main-protein', dishType: 'stovetop-sauce', context: 'boiled-sauce' }).map(
      (r) => r.id,
    );
    expect(applicable).toContain('pancetta-to-lean-ham');
    expect(applicable).not.toContain('bacon-to-turkey-or-canadian-bacon');
    expect(
      keepScaleOf(rulesForLine(rules, { food: bacon, phrase: 'pancetta', role: 'main-protein', dishType: 'stovetop-sauce', context: 'boiled-sauce' }))?.range,
    ).toEqual([0.5, 1]);
  });

  it('sour cream → Greek yogurt on top, never in a boiled sauce; a bake needs a rule that names bakes', () => {
    const sour = rule('sour-cream-to-greek-yogurt');
    expect(ruleHoldsIn(sour, 'topping', 'griddle-saute', 'topping')).toBe(true);
    expect(ruleHoldsIn(sour, 'cream', 'stovetop-sauce', 'boiled-sauce')).toBe(false);
    expect(ruleHoldsIn(rule('ground-beef-to-lean-turkey'), 'structure', 'leavened-bake', 'baked-batter-dough')).toBe(false);
    expect(ruleHoldsIn(rule('all-purpose-flour-to-whole-wheat'), 'structure', 'batter', 'baked-batter-dough')).toBe(true);
    expect(ruleHoldsIn(rule('all-purpose-flour-to-whole-wheat'), 'thickener', 'assembled-bake', 'roux-white-sauce')).toBe(false);
  });

  it('butter: up to half as applesauce in a quick bread, not in cookies; down to three fifths in a roux; half for sautéing', () => {
    const apple = rule('quick-bread-fat-to-applesauce');
    expect(ruleHoldsIn(apple, 'baking-fat', 'leavened-bake', 'baked-batter-dough')).toBe(true);
    expect(ruleHoldsIn(apple, 'baking-fat', 'dough', 'baked-batter-dough')).toBe(false);
    expect(ruleHoldsIn(apple, 'fat-for-roux', 'assembled-bake', 'roux-white-sauce')).toBe(false);
    const butter = { name: 'Butter, with salt', foodGroup: '01', sourceId: '01001', roles: ['cooking-fat'], per100g: { fatG: 81 } };
    expect(
      keepScaleOf(rulesForLine(rules, { food: butter, phrase: 'butter', role: 'fat-for-roux', dishType: 'assembled-bake', context: 'roux-white-sauce' }))
        ?.range,
    ).toEqual([0.6, 1]);
    expect(
      keepScaleOf(rulesForLine(rules, { food: butter, phrase: 'butter', role: 'cooking-fat', dishType: 'stovetop-sauce', context: 'griddle-saute' }))?.range,
    ).toEqual([0.5, 1]);
  });

  // *common practice*: yogurt and cottage-cheese pancakes; less sugar in a griddle batter; a brushed griddle; an accent of cured meat or hard cheese
  it('a pancake batter: up to half its milk or buttermilk as Greek yogurt or 1 % cottage cheese, 1:1 (±10 %), and half its sugar; never in brownies or a sauce', () => {
    const batterMilk = rule('batter-milk-to-greek-yogurt-or-cottage-cheese');
    expect(batterMilk.quantity).toEqual({ massRatio: 1 });
    expect(batterMilk.maxShare).toBe(0.5);
    expect(bandFor(batterMilk, { role: 'dairy-liquid', mixedDish: false })).toEqual([0.9, 1.1]);
    expect(ruleHoldsIn(batterMilk, 'dairy-liquid', 'batter', 'baked-batter-dough')).toBe(true);
    expect(ruleHoldsIn(batterMilk, 'dairy-liquid', 'leavened-bake', 'baked-batter-dough')).toBe(false);
    expect(ruleHoldsIn(batterMilk, 'dairy-liquid', 'assembled-bake', 'roux-white-sauce')).toBe(false);
    const buttermilk = { name: 'Milk, buttermilk, fluid, cultured, lowfat', foodGroup: '01', sourceId: '01088', roles: ['dairy-milk'], per100g: { fatG: 0.9 } };
    expect(inFoodClass(batterMilk.from, buttermilk, 'buttermilk')).toBe(true);
    const sugar = { name: 'Sugars, granulated', foodGroup: '19', sourceId: '19335', roles: ['sweetener'], per100g: { fatG: 0 } };
    const sugarIn = (dishType: 'batter' | 'leavened-bake') =>
      keepScaleOf(rulesForLine(rules, { food: sugar, phrase: 'sugar', role: 'sweetener', dishType, context: 'baked-batter-dough' }))?.range;
    expect(sugarIn('batter')).toEqual([0.25, 1]);
    expect(sugarIn('leavened-bake')).toEqual([0.75, 1]);
    expect(ruleHoldsIn(rule('batter-sugar-quarter'), 'structure', 'leavened-bake', 'baked-batter-dough')).toBe(false);
  });

  it('a third of the fat brushes a griddle; half a cured meat or two thirds of a hard cheese still seasons; whole-wheat flour stays within ±10 % of 1:1', () => {
    const oil = { name: 'Oil, soybean, salad or cooking', foodGroup: '04', sourceId: '04044', roles: ['cooking-fat'], per100g: { fatG: 100 } };
    const fatIn = (dishType: 'griddle-saute' | 'simmered-dish', context: 'griddle-saute') =>
      keepScaleOf(rulesForLine(rules, { food: oil, phrase: 'vegetable oil', role: 'cooking-fat', dishType, context }))?.range;
    expect(fatIn('griddle-saute', 'griddle-saute')).toEqual([0.33, 1]);
    expect(fatIn('simmered-dish', 'griddle-saute')).toEqual([0.5, 1]);
    // where the pan also browns raw mince (taco meat) the fat is for browning: half, not a third
    const browning = rulesForLine(rules, {
      food: oil,
      phrase: 'vegetable oil',
      role: 'cooking-fat',
      dishType: 'griddle-saute',
      context: 'griddle-saute',
      browsMeat: true,
    });
    expect(keepScaleOf(browning)?.range).toEqual([0.5, 1]);
    expect(keepScaleOf(browning)?.rule.id).toBe('saute-fat-halve');
    const romano = { name: 'Cheese, romano', foodGroup: '01', sourceId: '01038', roles: ['hard-cheese'], per100g: { fatG: 27 } };
    expect(
      keepScaleOf(
        rulesForLine(rules, { food: romano, phrase: 'pecorino romano cheese', role: 'hard-cheese', dishType: 'stovetop-sauce', context: 'boiled-sauce' }),
      )?.range,
    ).toEqual([0.67, 1]);
    expect(rule('cured-meat-use-less').keepScale).toEqual([0.5, 1]);
    expect(bandFor(rule('all-purpose-flour-to-whole-wheat'), { role: 'structure', mixedDish: false })).toEqual([0.9, 1.1]);
  });
});

describe('cold fat cut into flour, and rice cooked in the pot', () => {
  it('biscuits with cold butter cut in are a dough, where the quick-bread swaps (yogurt for the butter or the buttermilk) do not hold', () => {
    const cold = (comment?: string): Spec => ['cold butter', 85, 'Butter, with salt', '01', ['cooking-fat'], comment, '01001', 81];
    const buttermilk: Spec = ['buttermilk', 184, 'Milk, buttermilk, fluid, cultured, lowfat', '01', ['dairy-milk'], undefined, '01088', 0.9];
    expect(inferDishType(recipe(FLOUR, POWDER, SALT, cold(), buttermilk))).toBe('dough');
    const melted: Spec = ['butter', 85, 'Butter, with salt', '01', ['cooking-fat'], 'melted', '01001', 81];
    expect(inferDishType(recipe(FLOUR, POWDER, SALT, melted, buttermilk, SUGAR(100), EGGS))).toBe('leavened-bake');
  });

  it('raw white rice becomes brown rice only where the rice is not cooked in the dish’s own broth or water (common practice)', () => {
    const brown = parseRuleFile(ruleFile).find((r) => r.id === 'white-rice-to-brown')!;
    expect(ruleHoldsIn(brown, 'starch', 'griddle-saute', 'filling', true, new Set<LineKind>(['starch', 'meat']))).toBe(true);
    expect(ruleHoldsIn(brown, 'starch', 'simmered-dish', 'filling', true, new Set<LineKind>(['starch', 'meat', 'liquid']))).toBe(false);
  });
});

describe('mixed dishes and baked custards', () => {
  const rules = parseRuleFile(ruleFile);
  const CHICKEN: Spec = [
    'shredded cooked chicken',
    420,
    'Chicken, broilers or fryers, breast, meat only, cooked, roasted',
    '05',
    ['poultry'],
    undefined,
    '05064',
    3.6,
  ];
  const CRUMBS: Spec = ['dry bread crumbs', 108, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating'], undefined, '18079', 5.3];
  const BUNS: Spec = ['hamburger buns', 200, 'Rolls, hamburger or hot dog, plain', '18', ['bread'], undefined, '18350', 4.3];
  const BROTH: Spec = ['chicken broth', 436, 'Soup, chicken broth, ready-to-serve', '06', ['broth-stock'], undefined, '06194'];
  const TOMATOES: Spec = ['crushed tomatoes', 794, 'Tomatoes, crushed, canned', '11', ['tomato-sauce'], undefined, '11693'];
  const BREAD: Spec = ['white bread, cubed', 180, 'Bread, white, commercially prepared', '18', ['bread'], undefined, '18069', 3.3];

  it('the protein of a casserole, a chili or a pasta sauce is one part of a mixed dish; a meatloaf, a burger or a cutlet is the portion', () => {
    expect(readDish(recipe(BUTTER(76), FLOUR, BROTH, MILK(163), CHICKEN, ONION)).mixedDish).toBe(true);
    expect(readDish(recipe(BEEF, ONION, TOMATOES, SALT)).mixedDish).toBe(true);
    expect(readDish(recipe(BEEF, CRUMBS, EGGS, MILK(122), ONION, SALT)).mixedDish).toBe(false);
    expect(readDish(recipe(BEEF, BUNS, CHEDDAR(), SALT)).mixedDish).toBe(false);
    // a bake is never a mixed dish
    expect(readDish(recipe(FLOUR, MILK(480), EGGS, SUGAR(25), POWDER, SALT, BUTTER(40))).mixedDish).toBe(false);
  });

  it('whole breasts, chops or fillets served as they are are the portion; cut up for the dish, one part of it (common practice)', () => {
    const breasts: Spec = [
      'boneless skinless chicken breasts',
      680,
      'Chicken, broiler or fryers, breast, skinless, boneless, meat only, raw',
      '05',
      ['poultry'],
      undefined,
      '05746',
      2.6,
    ];
    const cream: Spec = ['heavy cream', 238, 'Cream, fluid, heavy whipping', '01', ['cream'], undefined, '01053', 37];
    const oil: Spec = ['olive oil', 27, 'Oil, olive, salad or cooking', '04', ['cooking-fat'], undefined, '04053', 100];
    expect(readDish(recipe(breasts, oil, BROTH, cream, ONION, SALT)).mixedDish).toBe(false);
    const cubed: Spec = [...breasts];
    cubed[5] = 'cut into 1-inch pieces';
    expect(readDish(recipe(cubed, oil, BROTH, cream, ONION, SALT)).mixedDish).toBe(true);
  });

  it('eggs set with milk around bread (a strata, a breakfast casserole) are a custard in an assembled bake', () => {
    const eggs: Spec = ['large eggs', 400, 'Egg, whole, raw, fresh', '01', ['egg'], undefined, '01123', 9.5];
    const strata = readDish(recipe(BREAD, eggs, MILK(488), CHEDDAR(), SALT));
    expect(strata.dishType).toBe('assembled-bake');
    expect(strata.lines[1].role).toBe('custard');
    // a meatloaf's egg still binds, pancakes' eggs are still structure
    expect(readDish(recipe(BEEF, CRUMBS, EGGS, MILK(122))).lines[2].role).toBe('binder');
    expect(readDish(recipe(FLOUR, MILK(480), EGGS, SUGAR(25), POWDER, SALT, BUTTER(40))).lines[2].role).toBe('structure');
  });

  it("a lean swap of a mixed dish's main protein reaches ×1.5; elsewhere it keeps the rule's tight band", () => {
    const rule = rules.find((r) => r.id === 'cooked-chicken-to-breast')!;
    expect(bandFor(rule, { role: 'main-protein', mixedDish: true })).toEqual([0.9, 1.5]);
    expect(bandFor(rule, { role: 'main-protein', mixedDish: false })).toEqual([0.9, 1.1]);
    expect(bandFor(rule, { role: 'binder', mixedDish: true })).toEqual([0.9, 1.1]);
    const more = rules.find((r) => r.id === 'lean-main-protein-more')!;
    expect(ruleHoldsIn(more, 'main-protein', 'assembled-bake', 'filling', true)).toBe(true);
    expect(ruleHoldsIn(more, 'main-protein', 'assembled-bake', 'filling', false)).toBe(false);
    expect(ruleHoldsIn(more, 'binder', 'assembled-bake', 'filling', true)).toBe(false);
    const oil = rules.find((r) => r.id === 'frying-oil-oven-fry')!;
    expect(ruleHoldsIn(oil, 'cooking-fat', 'other', 'griddle-saute', false, new Set(['crumbs', 'egg', 'meat']))).toBe(true);
    expect(ruleHoldsIn(oil, 'cooking-fat', 'other', 'griddle-saute', false, new Set(['egg', 'meat']))).toBe(false);
  });
});

describe('issue 10 round 3: browning, batter fat, a phyllo lid, corn tortillas on the griddle', () => {
  const rules = parseRuleFile(ruleFile);
  const TORTILLAS: Spec = ['flour tortillas', 192, 'Tortillas, ready-to-bake or -fry, flour, refrigerated', '18', ['flatbread-wrap'], undefined, '18364', 7.9];
  const JACK: Spec = ['shredded Monterey Jack cheese', 226, 'Cheese, monterey', '01', ['melting-cheese'], undefined, '01025', 30];
  const OIL: Spec = ['vegetable oil', 14, 'Oil, soybean, salad or cooking', '04', ['cooking-fat'], undefined, '04044', 100];
  const COOKED_CHICKEN: Spec = ['shredded cooked chicken', 278, 'Chicken, broilers or fryers, meat only, roasted', '05', ['poultry'], undefined, '05013', 7.4];
  const SHELLS: Spec = ['taco shells', 103, 'Taco shells, baked', '18', ['flatbread-wrap'], undefined, '18360', 22];

  it('a dish browns meat when raw meat cooks in its pan: taco mince yes, a quesadilla of cooked chicken no, never a bake', () => {
    expect(readDish(recipe(BEEF, OIL, SHELLS, CHEDDAR(), ONION)).browsMeat).toBe(true);
    const quesadilla = readDish(recipe(TORTILLAS, COOKED_CHICKEN, JACK, OIL));
    expect(quesadilla.dishType).toBe('griddle-saute');
    expect(quesadilla.browsMeat).toBe(false);
    expect(readDish(recipe(FLOUR, SUGAR(25), MILK(490), EGGS, BUTTER(43), POWDER, SALT)).browsMeat).toBe(false);
  });

  it('the griddle brushing (a third) holds for a quesadilla, not for taco meat; half the oil for sautéing holds for both', () => {
    const oilRules = (browsMeat: boolean) =>
      rulesForLine(rules, {
        food: line(OIL).food!,
        phrase: 'vegetable oil',
        role: 'cooking-fat',
        dishType: 'griddle-saute',
        context: 'griddle-saute',
        browsMeat,
      }).map((r) => r.id);
    expect(oilRules(false)).toEqual(expect.arrayContaining(['griddle-fat-brush', 'saute-fat-halve']));
    expect(oilRules(true)).toContain('saute-fat-halve');
    expect(oilRules(true)).not.toContain('griddle-fat-brush');
  });

  it('a pancake batter may halve its melted butter; a quick bread or cookie dough may not', () => {
    const rule = rules.find((r) => r.id === 'batter-fat-halve')!;
    expect(rule.keepScale).toEqual([0.5, 1]);
    expect(ruleHoldsIn(rule, 'baking-fat', 'batter', 'baked-batter-dough')).toBe(true);
    expect(ruleHoldsIn(rule, 'baking-fat', 'leavened-bake', 'baked-batter-dough')).toBe(false);
    expect(ruleHoldsIn(rule, 'baking-fat', 'dough', 'baked-batter-dough')).toBe(false);
    const batter = readDish(recipe(FLOUR, SUGAR(25), MILK(490), EGGS, BUTTER(43), POWDER, SALT));
    expect(batter.dishType).toBe('batter');
    const butter = batter.lines[4];
    const applicable = rulesForLine(rules, { food: line(BUTTER(43)).food!, phrase: 'butter', role: butter.role, dishType: 'batter', context: butter.context });
    expect(keepScaleOf(applicable)?.range).toEqual([0.5, 1]);
  });

  it('flour tortillas: corn on the griddle 1:1 by weight within ±10 %; in a sauced bake tortilla for tortilla, exactly', () => {
    const griddle = rules.find((r) => r.id === 'flour-tortillas-to-corn-on-griddle')!;
    expect(griddle.quantity).toEqual({ massRatio: 1 });
    expect(griddle.band).toEqual([0.9, 1.1]);
    expect(ruleHoldsIn(griddle, 'starch', 'griddle-saute', 'griddle-saute')).toBe(true);
    expect(ruleHoldsIn(griddle, 'starch', 'assembled-bake', 'filling')).toBe(false);
    for (const id of ['flour-tortillas-to-corn-in-bakes', 'buns-to-whole-wheat', 'white-bread-to-whole-wheat', 'english-muffin-to-whole-wheat'])
      expect(rules.find((r) => r.id === id)!.band, id).toEqual([1, 1]);
  });

  it('a pastry lid may be phyllo at half its weight, only over an assembled bake', () => {
    const phyllo = rules.find((r) => r.id === 'pie-crust-lid-to-phyllo')!;
    expect(phyllo.quantity).toEqual({ massRatio: 0.5 });
    expect(ruleHoldsIn(phyllo, 'starch', 'assembled-bake', 'filling')).toBe(true);
    expect(ruleHoldsIn(phyllo, 'structure', 'leavened-bake', 'baked-batter-dough')).toBe(false);
    const crust = { name: 'Pie crust, refrigerated, regular, unbaked', foodGroup: '18', sourceId: '18948', roles: ['bread'], per100g: { fatG: 27 } };
    expect(inFoodClass(phyllo.from, crust, 'pie crust')).toBe(true);
  });

  it('cooked chicken named "meat only, roasted" takes the breast swap; Italian sausage read without commas takes turkey sausage', () => {
    const chicken = rules.find((r) => r.id === 'cooked-chicken-to-breast')!;
    expect(inFoodClass(chicken.from, line(COOKED_CHICKEN).food!, 'shredded cooked chicken')).toBe(true);
    const breast = {
      name: 'Chicken, broilers or fryers, breast, meat only, cooked, roasted',
      foodGroup: '05',
      sourceId: '05064',
      roles: ['poultry'],
      per100g: { fatG: 3.6 },
    };
    expect(inFoodClass(chicken.from, breast, 'cooked chicken breast')).toBe(false);
    const sausage = rules.find((r) => r.id === 'italian-sausage-to-turkey-sausage')!;
    const sweet = { name: 'Sausage Italian sweet links', foodGroup: '07', sourceId: '07914', roles: ['sausage'], per100g: { fatG: 13 } };
    expect(inFoodClass(sausage.from, sweet, 'sweet Italian sausage')).toBe(true);
  });
});

describe('issue 10 round 6: slurries, sloppy joes, quick-bread batters, mashes and grits, sugar that only sweetens', () => {
  const OIL: Spec = ['vegetable oil', 41, 'Oil, soybean, salad or cooking', '04', ['cooking-fat'], undefined, '04044', 100];
  const BROTH: Spec = ['beef broth', 120, 'Soup, beef broth or bouillon canned, ready-to-serve', '06', ['broth-stock'], undefined, '06008'];
  const POTATOES: Spec = ['russet potatoes, peeled', 907, 'Potatoes, russet, flesh and skin, raw', '11', ['potato'], undefined, '11353'];
  const BUNS: Spec = ['hamburger buns', 264, 'Rolls, hamburger or hotdog, plain', '18', ['bread'], undefined, '18350'];
  const TOMATO_SAUCE: Spec = ['tomato sauce', 227, 'Tomato products, canned, sauce', '11', ['tomato-sauce']];

  it('cornstarch thickens a stir-fry as a slurry: no roux, so its oil is fat for the pan', () => {
    const flank: Spec = ['flank steak', 454, 'Beef, flank, steak, lean only, trimmed to 0" fat, choice, raw', '13', ['red-meat'], undefined, '13066', 7];
    const cornstarch: Spec = ['cornstarch', 16, 'Cornstarch', '20', ['flour'], undefined, '20027'];
    const broccoli: Spec = ['broccoli florets', 364, 'Broccoli, raw', '11', ['vegetable']];
    const dish = readDish(recipe(flank, cornstarch, OIL, broccoli, BROTH));
    expect(dish.hasRoux).toBe(false);
    expect(dish.lines[2].role).toBe('cooking-fat');
    // wheat flour with the same fat and broth is a roux where no raw meat browns in the fat first (round 8: over
    // browned meat the fat browns it, and the flour thickens the braise); with milk it is a white sauce's roux
    const wheat: Spec = ['all-purpose flour', 16, FLOUR[2], '20', ['flour']];
    const cooked: Spec = ['shredded cooked chicken', 418, 'Chicken, broilers or fryers, meat only, roasted', '05', ['poultry'], undefined, '05013', 7];
    expect(readDish(recipe(cooked, wheat, OIL, broccoli, BROTH)).hasRoux).toBe(true);
    expect(readDish(recipe(flank, wheat, OIL, broccoli, BROTH)).hasRoux).toBe(false);
    expect(readDish(recipe(flank, wheat, OIL, broccoli, MILK(244))).hasRoux).toBe(true);
  });

  it('mince simmered in a sauce and spooned onto buns (sloppy joes) is a mixed dish; a burger in a bun is the portion', () => {
    const joes = readDish(recipe(BEEF, ONION, TOMATO_SAUCE, ['ketchup', 180, 'Catsup', '11', ['condiment']], BUNS));
    expect(joes.dishType).toBe('simmered-dish');
    expect(joes.mixedDish).toBe(true);
    const burgers = readDish(recipe(BEEF, BUNS, CHEDDAR(), SALT));
    expect(burgers.mixedDish).toBe(false);
  });

  it('a pancake batter pours with about twice the flour in liquid; a cornbread batter (less liquid) is a quick bread', () => {
    expect(inferDishType(recipe(FLOUR, MILK(490), EGGS, SUGAR(25), POWDER, SALT))).toBe('batter');
    const cornmeal: Spec = ['yellow cornmeal', 157, 'Cornmeal, degermed, enriched, yellow', '20', ['flour'], undefined, '20022'];
    expect(inferDishType(recipe(cornmeal, ['all-purpose flour', 125, FLOUR[2], '20', ['flour']], SUGAR(50), POWDER, MILK(245), BUTTER(76), EGGS))).toBe(
      'leavened-bake',
    );
  });

  it("a mash's butter and milk are stirred in (not a roux), and so are the butter and cream of grits; a stew's fat still browns", () => {
    const pie = readDish(recipe(BEEF, ONION, ['all-purpose flour', 16, FLOUR[2], '20', ['flour']], BROTH, POTATOES, BUTTER(57), MILK(122), SALT));
    expect(pie.dishType).toBe('assembled-bake');
    expect(pie.hasRoux).toBe(false);
    expect(pie.lines.map((l) => l.role).slice(4, 7)).toEqual(['starch', 'enrichment', 'enrichment']);
    expect(pie.lines[4].context).toBe('topping');
    expect(pie.lines[5].context).toBe('filling');
    const water: Spec = ['water', 947, 'Beverages, water, tap, drinking', '14', ['other']];
    const grits: Spec = ['quick-cooking grits', 156, 'Cereals, corn grits, white, regular and quick, enriched, dry', '08', ['rice-grain']];
    const cheeseGrits = readDish(recipe(water, MILK(244), grits, SALT, BUTTER(57), CHEDDAR()));
    expect(cheeseGrits.lines[4].role).toBe('enrichment');
    // butter that browns an onion is for the pan, even beside a starch
    expect(readDish(recipe(water, grits, ONION, BUTTER(28))).lines[3].role).toBe('cooking-fat');
  });

  it('bread dipped in eggs and milk and fried in a buttered pan (French toast) is a griddle dish; baked in a greased dish it is a custard', () => {
    const bread: Spec = ['slices white bread', 232, 'Bread, white, commercially prepared', '18', ['bread'], undefined, '18069'];
    const frenchToast = readDish(
      recipe(bread, ['large eggs', 200, EGGS[2], '01', ['egg'], undefined, '01123'], MILK(244), SUGAR(25), BUTTER(28, 'for the pan')),
    );
    expect(frenchToast.dishType).toBe('griddle-saute');
    expect(frenchToast.lines[1].role).toBe('main-protein');
    const strata = readDish(recipe(bread, ['large eggs', 200, EGGS[2], '01', ['egg'], undefined, '01123'], MILK(244), CHEDDAR(), BUTTER(14, 'for the dish')));
    expect(strata.dishType).toBe('assembled-bake');
    expect(strata.lines[1].role).toBe('custard');
  });

  it('raw sausage sold "unprepared" is browned in the pan', () => {
    const sausage: Spec = ['pork breakfast sausage', 454, 'Pork sausage, link/patty, unprepared', '07', ['sausage'], undefined, '07063', 25];
    expect(
      readDish(recipe(sausage, EGGS, ['large flour tortillas', 288, 'Tortillas, ready-to-bake or -fry, flour', '18', ['flatbread-wrap']], CHEDDAR())).browsMeat,
    ).toBe(true);
  });

  it("a cookie's sugar, about the flour's weight, only sweetens; it is structure where it is one and a half times the flour or more", () => {
    const cookies = readDish(recipe(['all-purpose flour', 281, FLOUR[2], '20', ['flour']], BUTTER(227), SUGAR(315), EGGS, SODA, SALT));
    expect(cookies.dishType).toBe('dough');
    expect(cookies.lines[2].role).toBe('sweetener');
    const sugarHeavyCake = readDish(recipe(['all-purpose flour', 200, FLOUR[2], '20', ['flour']], BUTTER(227), SUGAR(300), EGGS, SALT));
    expect(sugarHeavyCake.lines[2].role).toBe('structure');
  });
});

describe('issue 10 round 7: sandwiches, cheesecake, packages and slices', () => {
  const rules = parseRuleFile(ruleFile);
  const rule = (id: string) => rules.find((r) => r.id === id)!;
  const MUFFINS: Spec = ['English muffins, split and toasted', 228, 'English muffin, plain, enriched', '18', ['bread'], undefined, '18258'];
  const BACON: Spec = ['slices bacon', 224, 'Pork, cured, bacon, unprepared', '10', ['cured-meat-topping'], undefined, '10123', 42];
  const AMERICAN: Spec = [
    'slices American cheese',
    112,
    'Cheese, pasteurized process, American, fortified with vitamin D',
    '01',
    ['melting-cheese'],
    undefined,
    '01042',
    31,
  ];
  const CREAM_CHEESE: Spec = ['cream cheese, softened', 680, 'Cheese, cream', '01', ['soft-cheese'], undefined, '01017', 34];
  const GRAHAM: Spec = ['graham cracker crumbs', 126, 'Cookies, graham crackers, plain or honey', '18', ['breadcrumb-coating'], undefined, '18173'];

  it('a breakfast sandwich (bread, eggs, bacon, cheese) is a griddle dish whose eggs are its protein, not a pasta tossed with eggs', () => {
    const sandwich = readDish(recipe(MUFFINS, BACON, EGGS, BUTTER(14), AMERICAN, SALT));
    expect(sandwich.dishType).toBe('griddle-saute');
    expect(sandwich.lines[2].role).toBe('main-protein');
    expect(sandwich.lines[4].context).toBe('griddle-saute');
    // pasta with eggs and cheese is still a carbonara's sauce
    expect(readDish(recipe(PASTA, BACON, EGGS, ['grated Parmesan', 50, 'Cheese, parmesan, grated', '01', ['hard-cheese']])).lines[2].role).toBe('sauce');
  });

  it('cream cheese beaten with sugar and eggs (a cheesecake) is a bake: its eggs are structure and fat-free cream cheese stays out', () => {
    const sour: Spec = ['sour cream', 230, 'Cream, sour, cultured', '01', ['sour-cream-yogurt'], undefined, '01056', 19];
    const cheesecake = readDish(recipe(GRAHAM, BUTTER(76, 'melted'), SUGAR(50), CREAM_CHEESE, SUGAR(200), sour, EGGS, VANILLA));
    expect(cheesecake.dishType).toBe('leavened-bake');
    expect(cheesecake.lines[6].role).toBe('structure');
    expect(cheesecake.lines[3].context).toBe('baked-batter-dough');
    expect(ruleHoldsIn(rule('cream-cheese-to-fat-free-in-fillings'), 'fresh-cheese', 'leavened-bake', 'baked-batter-dough')).toBe(false);
    expect(ruleHoldsIn(rule('cream-cheese-to-neufchatel'), 'fresh-cheese', 'leavened-bake', 'baked-batter-dough')).toBe(true);
    // cream cheese in a savoury dip or filling is not a bake
    expect(inferDishType(recipe(CREAM_CHEESE, ONION, SALT))).not.toBe('leavened-bake');
  });

  it("the butter of a crumb crust takes no quick bread's yogurt or applesauce", () => {
    const holds = (id: string, kinds: LineKind[]) => ruleHoldsIn(rule(id), 'baking-fat', 'leavened-bake', 'baked-batter-dough', false, new Set(kinds));
    expect(holds('quick-bread-fat-to-greek-yogurt', ['flour', 'sugar', 'egg', 'butter-oil'])).toBe(true);
    expect(holds('quick-bread-fat-to-greek-yogurt', ['crumbs', 'fresh-cheese', 'sugar', 'egg', 'butter-oil'])).toBe(false);
    expect(holds('quick-bread-fat-to-applesauce', ['crumbs', 'fresh-cheese', 'sugar', 'egg', 'butter-oil'])).toBe(false);
  });

  it('light cream cheese goes package for package and low-fat American cheese slice for slice (within a tenth of 1:1)', () => {
    expect(rule('cream-cheese-to-neufchatel').quantity).toEqual({ massRatio: 1 });
    expect(bandFor(rule('cream-cheese-to-neufchatel'), { role: 'fresh-cheese', mixedDish: false })).toEqual([0.9, 1.1]);
    expect(rule('american-to-low-fat').quantity).toEqual({ massRatio: 1 });
    expect(bandFor(rule('american-to-low-fat'), { role: 'melting-cheese', mixedDish: true })).toEqual([0.9, 1.1]);
  });

  it('raw potatoes sliced into a flour-thickened milk sauce bake as a gratin (scalloped potatoes); in a quarter of broth they are a soup', () => {
    const sliced: Spec = ['russet potatoes, thinly sliced', 1361, 'Potatoes, russet, flesh and skin, raw', '11', ['potato'], undefined, '11353'];
    const flour: Spec = ['all-purpose flour', 31, FLOUR[2], '20', ['flour']];
    const scalloped = readDish(recipe(sliced, ONION, BUTTER(57), flour, MILK(610), CHEDDAR(), SALT));
    expect(scalloped.dishType).toBe('assembled-bake');
    expect(scalloped.hasRoux).toBe(true);
    expect(scalloped.lines[4].context).toBe('roux-white-sauce');
    const broth: Spec = ['chicken broth', 960, 'Soup, chicken broth, ready-to-serve', '06', ['broth-stock']];
    expect(inferDishType(recipe(sliced, ONION, BUTTER(57), flour, MILK(610), broth, CHEDDAR(), SALT))).toBe('simmered-dish');
  });

  it('flour tortillas may be whole-wheat tortillas of the same size, tortilla for tortilla (1:1 by weight, within a tenth), in any dish', () => {
    const ww = rule('flour-tortillas-to-whole-wheat');
    expect(ww.quantity).toEqual({ massRatio: 1 });
    expect(bandFor(ww, { role: 'starch', mixedDish: true })).toEqual([0.9, 1.1]);
    expect(ww.targets?.map((t) => ('ndb' in t ? t.ndb : t.ownFoodRole))).toEqual(['28295']);
    const flourTortilla = line([
      'large flour tortillas',
      288,
      'Tortillas, ready-to-bake or -fry, flour, refrigerated',
      '18',
      ['flatbread-wrap'],
      undefined,
      '18364',
      8,
    ]).food!;
    expect(inFoodClass(ww.from, flourTortilla, 'large flour tortillas')).toBe(true);
    const corn = { ...flourTortilla, name: 'Tortillas, ready-to-bake or -fry, corn', sourceId: '18363' };
    expect(inFoodClass(ww.from, corn, 'corn tortillas')).toBe(false);
    expect(ruleHoldsIn(ww, 'starch', 'griddle-saute', 'griddle-saute')).toBe(true);
    expect(ruleHoldsIn(ww, 'starch', 'assembled-bake', 'filling')).toBe(true);
  });

  it('the butter stirred into cheese grits may go down to a quarter; a plain mash or a meat pie keeps half', () => {
    const butter = { name: 'Butter, with salt', foodGroup: '01', sourceId: '01001', roles: ['cooking-fat'], per100g: { fatG: 81 } };
    const range = (kinds: LineKind[]) =>
      keepScaleOf(
        rulesForLine(rules, {
          food: butter,
          phrase: 'butter',
          role: 'enrichment',
          dishType: 'simmered-dish',
          context: 'filling',
          recipeKinds: new Set(kinds),
        }),
      )?.range;
    expect(range(['liquid', 'milk', 'starch', 'salt', 'butter-oil', 'melting-cheese'])).toEqual([0.25, 1]);
    expect(range(['starch', 'butter-oil', 'milk', 'salt'])).toEqual([0.5, 1]);
    expect(range(['meat', 'starch', 'butter-oil', 'milk', 'melting-cheese'])).toEqual([0.5, 1]);
  });
});

describe('issue 10 round 8: breaded and braised mains, bars and crisps, pizza toppings, a spoonful of sugar', () => {
  const CRUMBS: Spec = ['dry bread crumbs', 162, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating'], undefined, '18079', 5.3];
  const FRYING_OIL: Spec = ['vegetable oil', 109, 'Oil, soybean, salad or cooking', '04', ['cooking-fat'], 'for frying', '04044', 100];
  const OIL: Spec = ['vegetable oil', 27, 'Oil, soybean, salad or cooking', '04', ['cooking-fat'], undefined, '04044', 100];
  const BROTH: Spec = ['chicken broth', 374, 'Soup, chicken broth, ready-to-serve', '06', ['broth-stock']];
  const flour = (g: number, comment?: string): Spec => ['all-purpose flour', g, FLOUR[2], '20', ['flour'], comment, '20081'];
  const OATS: Spec = ['old-fashioned rolled oats', 162, 'Cereals, oats, regular and quick, not fortified, dry', '08', ['rice-grain'], undefined, '08120', 6.5];
  const BROWN_SUGAR = (g: number): Spec => ['packed brown sugar', g, 'Sugars, brown', '19', ['sweetener'], undefined, '19334'];

  it('a breaded cutlet (crumbs, egg and flour around a chop, fried in oil) is pan-fried, not an assembled bake, and it is the portion', () => {
    const schnitzel = readDish(recipe(PORK_CHOPS, flour(62), EGGS, CRUMBS, FRYING_OIL, SALT));
    expect(schnitzel.dishType).toBe('griddle-saute');
    expect(schnitzel.mixedDish).toBe(false);
    expect(schnitzel.lines.slice(1, 4).map((l) => l.role)).toEqual(['coating', 'coating', 'coating']);
    // mince with the same crumbs and egg is still a meatloaf, baked
    expect(inferDishType(recipe(BEEF, CRUMBS, EGGS, SALT))).toBe('assembled-bake');
  });

  it('a steak dredged in flour, dipped in egg and milk and fried, with a milk gravy: the breading, the dip and the gravy each read as what they are', () => {
    const steak: Spec = ['beef cube steaks', 680, 'Beef, round, top round, steak, lean only, raw', '13', ['red-meat'], undefined, '13461', 4];
    const dish = readDish(
      recipe(steak, flour(125), EGGS, MILK(122), SALT, FRYING_OIL, flour(16), ['whole milk', 488, MILK(0)[2], '01', ['dairy-milk'], 'for the gravy']),
    );
    expect(dish.dishType).toBe('griddle-saute');
    expect(dish.mixedDish).toBe(false);
    expect(dish.lines.map((l) => l.role)).toEqual(['main-protein', 'coating', 'coating', 'coating', 'salt', 'cooking-fat', 'thickener', 'dairy-liquid']);
    expect(dish.lines[7].context).toBe('roux-white-sauce');
    // a stew's flour and egg-free dredge is no breading
    expect(breadedPieces(recipe(steak, flour(30), OIL, BROTH), recipe(steak, flour(30), OIL, BROTH).map(lineKind))).toBe(false);
  });

  it('chicken pieces tossed in egg and cornstarch and fried (sesame chicken) are coated, and still one part of a rice dish', () => {
    const thighs: Spec = [
      'boneless skinless chicken thighs, cut into pieces',
      680,
      'Chicken, broilers or fryers, dark meat, thigh, meat only, raw',
      '05',
      ['poultry'],
      undefined,
      '05096',
      4,
    ];
    const cornstarch: Spec = ['cornstarch', 64, 'Cornstarch', '20', ['flour'], undefined, '20027'];
    const rice: Spec = ['cooked white rice', 632, 'Rice, white, long-grain, regular, enriched, cooked', '20', ['rice-grain'], undefined, '20045'];
    const soy: Spec = ['soy sauce', 64, 'Soy sauce made from soy and wheat (shoyu)', '16', ['condiment']];
    const dish = readDish(recipe(thighs, ['large egg', 50, EGGS[2], '01', ['egg'], undefined, '01123', 9.5], cornstarch, OIL, soy, rice));
    expect(dish.dishType).toBe('griddle-saute');
    expect(dish.mixedDish).toBe(true);
    expect(dish.lines.slice(1, 3).map((l) => l.role)).toEqual(['coating', 'coating']);
  });

  it('pork cubes browned in oil and braised in broth (a paprikash) are a simmered dish whose oil browns: no roux', () => {
    const shoulder: Spec = ['pork shoulder, cut into cubes', 907, 'Pork, fresh, shoulder, whole, lean and fat, raw', '10', ['pork'], undefined, '10070', 17];
    const noodles: Spec = ['egg noodles', 340, 'Noodles, egg, dry, enriched', '20', ['pasta'], undefined, '20109', 4.4];
    const sour: Spec = ['sour cream', 230, 'Cream, sour, cultured', '01', ['sour-cream-yogurt'], undefined, '01056', 19];
    const dish = readDish(recipe(shoulder, OIL, ONION, flour(16), BROTH, sour, SALT, noodles));
    expect(dish.dishType).toBe('simmered-dish');
    expect(dish.hasRoux).toBe(false);
    expect(dish.lines[1]).toMatchObject({ role: 'cooking-fat', context: 'griddle-saute' });
    // butter and flour thickening milk are still a roux
    expect(readDish(recipe(PASTA, BUTTER(57), flour(23), MILK(488), CHEDDAR())).lines[1].role).toBe('fat-for-roux');
  });

  it('oats in bars are a baking grain: flour, sugar, butter and oats are a dough, not a pasta sauce', () => {
    const bars = readDish(recipe(BUTTER(170), BROWN_SUGAR(220), SUGAR(50), EGGS, VANILLA, flour(188), SODA, SALT, OATS));
    expect(bars.dishType).toBe('dough');
    expect(bars.lines[3].role).toBe('structure');
    expect(bars.lines[0].role).toBe('baking-fat');
  });

  it('fruit under a crumble of oats, flour, sugar and butter (an apple crisp) is an assembled bake whose crumble is its topping', () => {
    const apples: Spec = ['apples, peeled and sliced', 1092, 'Apples, raw, with skin', '09', ['fruit'], undefined, '09003'];
    const crisp = readDish(
      recipe(
        apples,
        SUGAR(50),
        ['old-fashioned rolled oats', 61, OATS[2], '08', ['rice-grain'], undefined, '08120', 6.5],
        flour(62),
        BROWN_SUGAR(110),
        BUTTER(114, 'cold, cubed'),
        SALT,
      ),
    );
    expect(crisp.dishType).toBe('assembled-bake');
    expect([crisp.lines[2].role, crisp.lines[3].role, crisp.lines[5].role]).toEqual(['topping', 'topping', 'topping']);
    expect(crisp.hasRoux).toBe(false);
  });

  it("a yeast dough's mushrooms and ricotta go on it or in it (topping); a quick bread's zucchini is its moisture", () => {
    const yeast: Spec = ['instant yeast', 9, "Leavening agents, yeast, baker's, active dry", '18', ['baking-leavener']];
    const water: Spec = ['warm water', 237, 'Water, tap, municipal', '14', ['other']];
    const mushrooms: Spec = ['sliced mushrooms', 70, 'Mushrooms, white, raw', '11', ['vegetable'], undefined, '11260'];
    const ricotta: Spec = ['whole milk ricotta cheese', 246, 'Cheese, ricotta, whole milk', '01', ['soft-cheese'], undefined, '01036', 13];
    const pizza = readDish(recipe(flour(312), yeast, SUGAR(4), SALT, water, mushrooms, ricotta));
    expect(pizza.lines[5]).toMatchObject({ role: 'vegetable', context: 'topping' });
    expect(pizza.lines[6].context).toBe('topping');
    const zucchini: Spec = ['grated zucchini', 248, 'Squash, summer, zucchini, includes skin, raw', '11', ['vegetable'], undefined, '11477'];
    expect(readDish(recipe(flour(375), SODA, SALT, EGGS, ['vegetable oil', 218, OIL[2], '04', ['cooking-fat']], SUGAR(300), zucchini)).lines[6].role).toBe(
      'other',
    );
  });

  it('a teaspoon or a tablespoon of sugar seasons (a stir-fry sauce, a yeast dough) and is held; more only sweetens and may drop', () => {
    const yeast: Spec = ['instant yeast', 9, "Leavening agents, yeast, baker's, active dry", '18', ['baking-leavener']];
    const dough = readDish(recipe(flour(375), yeast, SUGAR(4.2), SALT));
    expect(dough.lines[2].role).toBe('seasoning');
    expect(heldReasonFor(dough.lines[2].role)).toBe('seasoning: kept as written');
    expect(readDish(recipe(BEEF, ONION, SUGAR(12.6))).lines[2].role).toBe('seasoning');
    expect(readDish(recipe(BEEF, ONION, BROWN_SUGAR(27.5))).lines[2].role).toBe('sweetener');
    // a spoonful sprinkled on top is no seasoning of the dish: it may be cut like any sugar
    expect(
      readDish(recipe(FLOUR, SUGAR(100), ['sugar', 12, 'Sugars, granulated', '19', ['sweetener'], 'for sprinkling on top'], MILK(400))).lines[2].role,
    ).toBe('sweetener');
  });

  it('melted butter beside a crumb topping on a casserole is tossed with the crumbs: a topping that may halve, not a pan fat', () => {
    const rules = parseRuleFile(ruleFile);
    const chicken: Spec = ['shredded cooked chicken', 418, 'Chicken, broilers or fryers, meat only, roasted', '05', ['poultry'], undefined, '05013', 7];
    const soup: Spec = ['condensed cream of chicken soup', 298, 'Soup, cream of chicken, canned, condensed', '06', ['condensed-soup']];
    const crumbs: Spec = ['dry bread crumbs', 54, 'Bread crumbs, dry, grated, plain', '18', ['breadcrumb-coating'], 'for the top', '18079', 5.3];
    const divan = readDish(recipe(chicken, soup, CHEDDAR(), crumbs, BUTTER(28, 'melted')));
    expect(divan.dishType).toBe('assembled-bake');
    expect(divan.lines[4]).toMatchObject({ role: 'topping', context: 'topping' });
    const butter = line(BUTTER(28, 'melted')).food!;
    const applicable = rulesForLine(rules, {
      food: butter,
      phrase: 'butter',
      role: 'topping',
      dishType: 'assembled-bake',
      context: 'topping',
      recipeKinds: new Set<LineKind>(['meat', 'condensed-soup', 'melting-cheese', 'crumbs', 'butter-oil']),
    });
    expect(keepScaleOf(applicable)).toMatchObject({ range: [0.5, 1], rule: { id: 'crumb-topping-butter-half' } });
    // butter that sautés the onions of the same casserole stays a pan fat
    expect(readDish(recipe(chicken, soup, CHEDDAR(), crumbs, BUTTER(28), ONION)).lines[4].role).toBe('cooking-fat');
  });
});
