/**
 * A spoonful of sesame oil (up to a tablespoon) is a seasoning stirred in for its toasted flavour, held as written;
 * more than that is the dish's cooking oil (*common practice*). Invented stir-fries; the foods are stand-ins carrying
 * the USDA SR28 group, readable name and catalogue roles.
 */
import { describe, expect, it } from 'vitest';
import { heldReasonFor, readDish } from '../../shared/culinary/infer-dish';
import type { CulinaryLine } from '../../shared/culinary/types';

const food = (name: string, group: string, roles: string[], sourceId: string, fatG: number) => ({ name, foodGroup: group, sourceId, roles, per100g: { fatG } });
const SESAME_OIL = food('Oil, sesame, salad or cooking', '04', ['cooking-fat'], '04058', 100);
const stirFry = (sesameGrams: number): CulinaryLine[] => [
  { phrase: 'flank steak, thinly sliced', grams: 454, comment: null, food: food('Beef, flank, steak, lean only, raw', '13', ['red-meat'], '13971', 6) },
  { phrase: 'vegetable oil', grams: 41, comment: null, food: food('Oil, soybean, salad or cooking', '04', ['cooking-fat'], '04044', 100) },
  { phrase: 'broccoli florets', grams: 364, comment: null, food: food('Broccoli, raw', '11', ['vegetable'], '11090', 0.4) },
  { phrase: 'soy sauce', grams: 85, comment: null, food: food('Soy sauce made from soy and wheat (shoyu)', '16', ['condiment'], '16124', 0.1) },
  { phrase: 'sesame oil', grams: sesameGrams, comment: null, food: SESAME_OIL },
];

describe('sesame oil by the spoonful', () => {
  it('a teaspoon or a tablespoon seasons the dish and is kept as written', () => {
    for (const grams of [4.5, 13.6]) {
      const role = readDish(stirFry(grams)).lines[4].role;
      expect(role).toBe('seasoning');
      expect(heldReasonFor(role)).toBe('seasoning: kept as written');
    }
  });

  it('three tablespoons are the cooking oil, which the sautéing rules may trim', () => {
    const role = readDish(stirFry(41)).lines[4].role;
    expect(role).not.toBe('seasoning');
    expect(heldReasonFor(role)).toBeUndefined();
  });
});
