import { describe, expect, it } from 'vitest';
import { commonFoodName, kitchenNumber, rewrittenLineText } from '../../shared/rewritten-line-text';

const sr28 = (name: string) => ({ name, source: 'usda-sr28' as const });

describe('the words of a rewritten line', () => {
  it("names a rule's target in the rule's own words, a cook's food by its name, and turns an SR28 name around", () => {
    expect(commonFoodName(sr28('Cheese, cheddar, reduced fat'), 'reduced-fat cheddar for cheddar, 1:1 by weight')).toBe('reduced-fat cheddar');
    expect(commonFoodName(sr28('Ground turkey, 93% lean, 7% fat, raw'), '93% lean ground turkey for full-fat ground beef, 1:1 by weight')).toBe(
      '93% lean ground turkey',
    );
    // labels naming two foods, or an amount, are not a name
    expect(commonFoodName(sr28('Milk, lowfat, fluid, 1% milkfat, with added vitamin A and vitamin D'), '2 %, 1 % or skim milk for whole milk, 1:1')).toBe(
      '1% lowfat milk',
    );
    expect(commonFoodName(sr28('Cheese, cheddar, reduced fat'))).toBe('reduced-fat cheddar cheese');
    expect(commonFoodName(sr28('Beef, ground, 95% lean meat / 5% fat, raw'))).toBe('95% lean ground beef');
    expect(commonFoodName(sr28('Beef, ground, 95% lean meat / 5% fat, raw'), '93–95% lean ground beef for full-fat ground beef, 1:1 by weight')).toBe(
      '93–95% lean ground beef',
    );
    expect(commonFoodName(sr28('Egg, white, raw, fresh'), '2 large egg whites for each large egg')).toBe('egg white');
    expect(commonFoodName({ name: 'Cloudmeadow carb-smart tortilla', source: 'custom' }, 'x for y')).toBe('Cloudmeadow carb-smart tortilla');
  });

  it('says the food, not the catalogue shelf it sits on, nor its head twice', () => {
    expect(commonFoodName(sr28('Sugars, granulated'))).toBe('granulated sugar');
    expect(commonFoodName(sr28('Spices, oregano, dried'))).toBe('dried oregano');
    expect(commonFoodName(sr28('Milk, buttermilk, fluid, cultured, lowfat'))).toBe('cultured buttermilk');
    expect(commonFoodName(sr28('Oil, olive, salad or cooking'))).toBe('olive oil');
    expect(commonFoodName(sr28('Cheese, cottage, lowfat, 1% milkfat'))).toBe('1% cottage cheese');
  });

  it('measures as a cook does (common practice: quarters and thirds of a cup)', () => {
    expect([kitchenNumber(1.5), kitchenNumber(0.33), kitchenNumber(2), kitchenNumber(0.76), kitchenNumber(1.97)]).toEqual(['1 1/2', '1/3', '2', '3/4', '2']);
  });

  it("keeps the cook's measure and words with the new food's name", () => {
    expect(rewrittenLineText('2 cups shredded sharp cheddar', 226, 226, 'reduced-fat cheddar')).toBe('2 cups shredded reduced-fat cheddar');
    expect(rewrittenLineText('1 lb ground beef', 453.6, 453.6, '93% lean ground turkey')).toBe('1 lb 93% lean ground turkey');
    // the same food with less of it: the amount in the cook's unit
    expect(rewrittenLineText('2 cups whole milk', 488, 366, null)).toBe('1 1/2 cups whole milk');
    expect(rewrittenLineText('1 1/2 cups shredded mozzarella cheese, divided', 168, 112, null)).toBe('1 cup shredded mozzarella cheese, divided');
    // unchanged stays exactly as written
    expect(rewrittenLineText('8 oz elbow macaroni', 226.8, 226.8, null)).toBe('8 oz elbow macaroni');
    // a partial swap is two readable lines
    expect([
      rewrittenLineText('2 cups shredded sharp cheddar', 226, 113, null),
      rewrittenLineText('2 cups shredded sharp cheddar', 226, 113, 'reduced-fat cheddar'),
    ]).toEqual(['1 cup shredded sharp cheddar', '1 cup shredded reduced-fat cheddar']);
    // a counted line swapped for another food: its grams, and the line it stands in for
    expect(rewrittenLineText('6 large flour tortillas', 294, 270, 'Cloudmeadow carb-smart tortilla')).toBe(
      '270 g Cloudmeadow carb-smart tortilla (in place of 6 large flour tortillas)',
    );
  });
});
