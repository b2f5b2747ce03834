import { describe, expect, it } from 'vitest';
import { parseLine, type ParsedLine } from '../../shared/parse-line';
import { massToGrams, volumeToMl } from '../../shared/units';

function pick(line: ParsedLine) {
  return { quantity: line.quantity, unit: line.unit, name: line.name };
}

describe('parseLine: quantities', () => {
  it('reads mixed numbers: "1 1/2 cups flour"', () => {
    expect(pick(parseLine('1 1/2 cups flour'))).toEqual({ quantity: 1.5, unit: 'cup', name: 'flour' });
  });

  it('reads vulgar fractions alone and after a whole number: "½ cup", "1½ cups", "1 ¾ tsp"', () => {
    expect(pick(parseLine('½ cup sugar'))).toEqual({ quantity: 0.5, unit: 'cup', name: 'sugar' });
    expect(pick(parseLine('1½ cups milk'))).toEqual({ quantity: 1.5, unit: 'cup', name: 'milk' });
    expect(pick(parseLine('1 ¾ tsp baking powder'))).toEqual({ quantity: 1.75, unit: 'tsp', name: 'baking powder' });
  });

  it('keeps thirds unrounded: "⅓ c oil"', () => {
    expect(parseLine('⅓ c oil').quantity).toBe(1 / 3);
    expect(parseLine('2/3 cup oil').quantity).toBe(2 / 3);
  });

  it('reads decimals: "0.25 tsp paprika", "1.5 tbsp fish sauce"', () => {
    expect(pick(parseLine('0.25 tsp paprika'))).toEqual({ quantity: 0.25, unit: 'tsp', name: 'paprika' });
    expect(pick(parseLine('1.5 tbsp fish sauce'))).toEqual({ quantity: 1.5, unit: 'tbsp', name: 'fish sauce' });
  });

  it('takes the midpoint of a range: "2-3 cloves garlic" → 2.5, "2 to 3 cloves" → 2.5', () => {
    const dash = parseLine('2-3 cloves garlic');
    expect(pick(dash)).toEqual({ quantity: 2.5, unit: 'clove', name: 'garlic' });
    expect(dash.range).toEqual({ min: 2, max: 3 });
    expect(dash.flags).toContain('range');
    expect(parseLine('2 to 3 cloves garlic').quantity).toBe(2.5);
    expect(parseLine('2–3 cloves garlic').quantity).toBe(2.5);
    expect(parseLine('½-¾ cup milk').quantity).toBe(0.625);
  });

  it.each([
    ['1 3-4 ounce tomato, coarsely grated', 1, 3.5, 'oz', 'tomato'],
    ['2 6- to 8-ounce salmon fillets', 2, 7, 'oz', 'salmon fillets'],
    // in parentheses too
    ['1 (3- to 4-pound) whole red snapper, scaled and cleaned', 1, 3.5, 'lb', 'whole red snapper'],
    ['2 (2- to 3-pound) chickens', 2, 2.5, 'lb', 'chickens'],
  ] as const)('reads a weight range before the food as the size of each piece: "%s"', (input, quantity, size, unit, name) => {
    const p = parseLine(input);
    expect(p.quantity).toBe(quantity);
    expect(p.size).toEqual({ quantity: size, unit });
    expect(p.name).toBe(name);
  });

  it('weighs a range of pounds exactly and never reads a spoon or length range as a size', () => {
    // NIST Handbook 44 Appendix C: 1 lb = 453.59237 g
    const rabbit = parseLine('1 3- to 4-lb rabbit, cut into 6-8 pieces');
    expect(massToGrams(rabbit.size!.quantity, rabbit.size!.unit)).toBeCloseTo(3.5 * 453.59237, 3);
    expect(parseLine('2-3 tbsp oil').size).toBeNull();
    expect(parseLine('1 (2- to 3-inch) piece ginger').size).toBeNull();
  });

  it('reads a pinch, dash or handful written without a number as one of it: "Pinch coarse salt", "generous pinch of salt"', () => {
    for (const [input, unit, name] of [
      ['Pinch coarse or flaky salt', 'pinch', 'coarse or flaky salt'],
      ['generous pinch of salt', 'pinch', 'salt'],
      ['Tiny pinch sea salt', 'pinch', 'sea salt'],
      ['handful of almonds', 'handful', 'almonds'],
      ['small handful of basil leaves, finely chopped', 'handful', 'basil leaves'],
    ] as const) {
      const p = parseLine(input);
      expect(p.quantity, input).toBe(1);
      expect(p.unit, input).toBe(unit);
      expect(p.name, input).toBe(name);
      expect(p.needsAmount, input).toBe(false);
    }
    // a word that only begins like one is no measure
    expect(parseLine('pinched dumplings').unit).toBeNull();
  });

  it('reads a range whose unit is written last: "2 to 3 cups"', () => {
    expect(pick(parseLine('2 to 3 cups'))).toMatchObject({ quantity: 2.5, unit: 'cup' });
  });

  it('reads a range with the unit at both ends: "½ c to 1 cup pistachios"', () => {
    expect(pick(parseLine('½ c to 1 cup pistachios'))).toEqual({ quantity: 0.75, unit: 'cup', name: 'pistachios' });
  });

  it('reads a hyphenated mixed number as one quantity: "4-1/2 cups flour"', () => {
    const line = parseLine('4-1/2 cups flour');
    expect(line.quantity).toBe(4.5);
    expect(line.range).toBeNull();
  });

  it('reads quantities written in words', () => {
    expect(pick(parseLine('a pinch of salt'))).toEqual({ quantity: 1, unit: 'pinch', name: 'salt' });
    expect(pick(parseLine('Pinch of black pepper'))).toEqual({ quantity: 1, unit: 'pinch', name: 'black pepper' });
    expect(pick(parseLine('half an onion'))).toEqual({ quantity: 0.5, unit: null, name: 'onion' });
    expect(pick(parseLine('one 28-ounce can tomatoes'))).toMatchObject({ quantity: 1, unit: 'can' });
    expect(pick(parseLine('1 dozen eggs'))).toEqual({ quantity: 12, unit: null, name: 'eggs' });
  });
});

describe('parseLine: units', () => {
  it('reads metric amounts: "250 g flour", "100g sugar", "500 ml stock", "1 kg potatoes"', () => {
    expect(pick(parseLine('250 g flour'))).toEqual({ quantity: 250, unit: 'g', name: 'flour' });
    expect(pick(parseLine('100g sugar'))).toEqual({ quantity: 100, unit: 'g', name: 'sugar' });
    expect(pick(parseLine('500 ml chicken stock'))).toEqual({ quantity: 500, unit: 'ml', name: 'chicken stock' });
    expect(pick(parseLine('1 kg potatoes'))).toEqual({ quantity: 1, unit: 'kg', name: 'potatoes' });
  });

  it('reads "1 Tbsp." and "3 T" as tablespoons and "3 t" as teaspoons', () => {
    const tbsp = parseLine('1 Tbsp. olive oil');
    expect(pick(tbsp)).toEqual({ quantity: 1, unit: 'tbsp', name: 'olive oil' });
    expect(tbsp.unitText).toBe('Tbsp.');
    expect(pick(parseLine('3 T butter'))).toEqual({ quantity: 3, unit: 'tbsp', name: 'butter' });
    expect(pick(parseLine('3 t salt'))).toEqual({ quantity: 3, unit: 'tsp', name: 'salt' });
  });

  it('reads two-word units and pound signs: "2 fl oz cream", "2 lbs beef", "1 # beef"', () => {
    expect(pick(parseLine('2 fl oz heavy cream'))).toEqual({ quantity: 2, unit: 'fl-oz', name: 'heavy cream' });
    expect(pick(parseLine('2 lbs beef chuck'))).toEqual({ quantity: 2, unit: 'lb', name: 'beef chuck' });
    expect(pick(parseLine('1 # ground beef'))).toEqual({ quantity: 1, unit: 'lb', name: 'ground beef' });
  });

  it('returns counted foods as counts so the server can weigh household portions', () => {
    expect(pick(parseLine('3 eggs'))).toEqual({ quantity: 3, unit: null, name: 'eggs' });
    expect(pick(parseLine('2 large eggs'))).toEqual({ quantity: 2, unit: 'large', name: 'eggs' });
    expect(pick(parseLine('1 medium onion, diced'))).toEqual({ quantity: 1, unit: 'medium', name: 'onion' });
    expect(pick(parseLine('2 slices whole wheat bread'))).toEqual({ quantity: 2, unit: 'slice', name: 'whole wheat bread' });
    expect(pick(parseLine('1 stick butter'))).toEqual({ quantity: 1, unit: 'stick', name: 'butter' });
    expect(pick(parseLine('4 garlic cloves, minced'))).toEqual({ quantity: 4, unit: 'clove', name: 'garlic' });
    expect(pick(parseLine('3 celery stalks, chopped'))).toEqual({ quantity: 3, unit: 'stalk', name: 'celery' });
    expect(pick(parseLine('1 package cream cheese'))).toEqual({ quantity: 1, unit: 'package', name: 'cream cheese' });
  });

  it('keeps a size word when a counted unit follows it: "1 lg bunch basil"', () => {
    const line = parseLine('1 lg bunch basil');
    expect(pick(line)).toEqual({ quantity: 1, unit: 'bunch', name: 'basil' });
    expect(line.sizeText).toBe('lg');
  });
});

describe('parseLine: sizes and compound amounts', () => {
  it('"1 (15 oz) can black beans" → 1 can of 15 oz', () => {
    const line = parseLine('1 (15 oz) can black beans, drained and rinsed');
    expect(pick(line)).toEqual({ quantity: 1, unit: 'can', name: 'black beans' });
    expect(line.size).toEqual({ quantity: 15, unit: 'oz' });
    expect(line.preparation).toBe('drained and rinsed');
    // NIST Handbook 44 Appendix C: 15 oz × 28.349523125 g.
    expect(massToGrams(line.quantity! * line.size!.quantity, line.size!.unit)).toBeCloseTo(425.242846875, 9);
  });

  it('"1 can (15 oz) beans" and "2 15-ounce cans chickpeas" give the same package size', () => {
    const after = parseLine('1 can (15 oz) beans');
    expect(pick(after)).toEqual({ quantity: 1, unit: 'can', name: 'beans' });
    expect(after.size).toEqual({ quantity: 15, unit: 'oz' });
    const glued = parseLine('2 15-ounce cans chickpeas');
    expect(pick(glued)).toEqual({ quantity: 2, unit: 'can', name: 'chickpeas' });
    expect(glued.size).toEqual({ quantity: 15, unit: 'oz' });
    expect(glued.sizeText).toBe('15-ounce');
  });

  it('"2 (8-inch) tortillas" → 2 tortillas with a descriptive size', () => {
    const line = parseLine('2 (8-inch) flour tortillas');
    expect(pick(line)).toEqual({ quantity: 2, unit: null, name: 'flour tortillas' });
    expect(line.size).toBeNull();
    expect(line.sizeText).toBe('8-inch');
  });

  it('"1 (12-15) pound turkey" → one turkey of about 13.5 lb', () => {
    const line = parseLine('1 (12-15) pound turkey');
    expect(pick(line)).toEqual({ quantity: 1, unit: null, name: 'turkey' });
    expect(line.size).toEqual({ quantity: 13.5, unit: 'lb' });
  });

  it('"1 lb 4 oz ground beef" → one amount of 20 oz', () => {
    const line = parseLine('1 lb 4 oz ground beef');
    expect(pick(line)).toEqual({ quantity: 20, unit: 'oz', name: 'ground beef' });
    expect(line.flags).toContain('compound');
    // NIST Handbook 44 Appendix C: 1 lb + 4 oz = 453.59237 g + 113.3980925 g.
    expect(massToGrams(line.quantity!, line.unit!)).toBeCloseTo(566.9904625, 9);
  });

  it('"1 cup plus 2 tbsp flour" → 18 tbsp', () => {
    const line = parseLine('1 cup plus 2 tbsp flour');
    expect(pick(line)).toEqual({ quantity: 18, unit: 'tbsp', name: 'flour' });
    // NIST Handbook 44 Appendix C: 236.5882365 mL + 2 × 14.78676478125 mL.
    expect(volumeToMl(line.quantity!, line.unit!)).toBeCloseTo(266.161766063, 8);
  });

  it('"1 tbsp 1 tablespoon whiskey": the same amount written twice is one amount, not a sum', () => {
    const line = parseLine('1 tbsp 1 tablespoon whiskey');
    expect(pick(line)).toEqual({ quantity: 1, unit: 'tbsp', name: 'whiskey' });
    expect(line.flags).not.toContain('compound');
    expect(pick(parseLine('2 tbsp 2 tablespoons oil'))).toEqual({ quantity: 2, unit: 'tbsp', name: 'oil' });
    // a second amount with "plus" is still added: 1 cup + 1 cup
    expect(pick(parseLine('1 cup plus 1 cup flour'))).toEqual({ quantity: 2, unit: 'cup', name: 'flour' });
  });

  it('", plus 1 tablespoon" after a comma is kept as the amount added, the written quantity unchanged', () => {
    const line = parseLine('1 c sugar, plus 1 tablespoon');
    expect(pick(line)).toEqual({ quantity: 1, unit: 'cup', name: 'sugar' });
    expect(line.plus).toEqual({ quantity: 1, unit: 'tbsp' });
    expect(parseLine('1 ½ tbsp unsalted butter, plus 1 tablespoon at room temperature').plus).toEqual({ quantity: 1, unit: 'tbsp' });
    // another food, "more", or another kind of amount is no addition
    expect(parseLine('2 tbsp olive oil, plus 2 tbsp butter').plus).toBeUndefined();
    expect(parseLine('1 c flour, plus more for dusting').plus).toBeUndefined();
    expect(parseLine('1.5 c vanilla ice cream, plus 2 scoops for garnish').plus).toBeUndefined();
  });

  it('"8 1/2-inch slices baguette" is eight half-inch slices; "1 1/2-inch piece of ginger" stays 1½ inches', () => {
    const slices = parseLine('8 1/2-inch slices baguette, lightly brushed with olive oil');
    expect(pick(slices)).toEqual({ quantity: 8, unit: 'slice', name: 'baguette' });
    expect(slices.sizeText).toBe('1/2-inch');
    expect(pick(parseLine('1 1/2-inch piece of ginger'))).toEqual({ quantity: 1.5, unit: 'inch', name: 'ginger' });
  });

  it('a range of weights with a hyphenated mixed number: "1 head of cabbage, 2 to 2-1/2 pounds" is 2¼ lb', () => {
    expect(parseLine('1 md head of cabbage, 2 to 2-1/2 pounds').equivalents).toEqual([{ quantity: 2.25, unit: 'lb' }]);
    expect(parseLine('1 head cabbage (2 to 2-1/2 pounds)').equivalents).toEqual([{ quantity: 2.25, unit: 'lb' }]);
  });

  it('"Juice of 1 lime (about 1 tablespoon)": a counted line keeps the volume its note gives', () => {
    const line = parseLine('Juice of 1 lime (about 1 tablespoon)');
    expect(line.quantity).toBe(1);
    expect(line.equivalents).toEqual([{ quantity: 1, unit: 'tbsp' }]);
    // a volume line's note is no restatement of a count
    expect(parseLine('2 c chopped onion (about 2 onions)').equivalents).toEqual([]);
  });

  it('keeps metric restatements as equivalents: "10 tbsp (140 grams) unsalted butter"', () => {
    const line = parseLine('10 tbsp (140 grams) unsalted butter');
    expect(pick(line)).toEqual({ quantity: 10, unit: 'tbsp', name: 'unsalted butter' });
    expect(line.equivalents).toEqual([{ quantity: 140, unit: 'g' }]);
    const both = parseLine('1 ½ sticks unsalted butter (6 oz / 170g)');
    expect(pick(both)).toEqual({ quantity: 1.5, unit: 'stick', name: 'unsalted butter' });
    const slashFraction = parseLine('300 ml (10 1/2 fl oz) milk');
    expect(slashFraction.equivalents).toEqual([{ quantity: 10.5, unit: 'fl-oz' }]);
    const compound = parseLine('600 g (1 lb 5 oz) potatoes');
    expect(compound.equivalents).toEqual([{ quantity: 21, unit: 'oz' }]);
  });

  it("takes a weight in a note as the line's own, but not the package size of an alternative count", () => {
    expect(parseLine('9 lasagna noodles (about 8 oz)').equivalents).toEqual([{ quantity: 8, unit: 'oz' }]);
    const alternative = parseLine('4 ½ c cooked cannellini beans, or 3 (15-ounce) cans, rinsed and drained');
    expect(pick(alternative)).toEqual({ quantity: 4.5, unit: 'cup', name: 'cooked cannellini beans' });
    expect(alternative.equivalents).toEqual([]);
  });

  it('takes a weight written after a comma, each or in all, but no other number', () => {
    expect(parseLine('4 pieces rutabaga, 150 grams each').equivalents).toEqual([{ quantity: 600, unit: 'g' }]);
    expect(parseLine('2 heads Treviso radicchio, about 7 ounces').equivalents).toEqual([{ quantity: 7, unit: 'oz' }]);
    expect(parseLine('¼ head of Napa cabbage, about 1/4-1/2 pound, cut into squares').equivalents).toEqual([{ quantity: 0.375, unit: 'lb' }]);
    expect(parseLine('1 lb ground beef, 80/20').equivalents).toEqual([]);
    expect(parseLine('3 eggs, 2 oz of them for glazing').equivalents).toEqual([]);
  });

  it('reads a size range written with an en dash: "1 4–5 lb chicken" is one chicken of 4½ lb', () => {
    const chicken = parseLine('1 4–5 lb chicken');
    expect(chicken.quantity).toBe(1);
    expect(chicken.size).toEqual({ quantity: 4.5, unit: 'lb' });
  });

  it('reads the count of the fruit a zest or juice comes from, in digits or words', () => {
    expect(pick(parseLine('Zest of 2 lemons, finely chopped'))).toEqual({ quantity: 2, unit: null, name: 'Zest of lemons' });
    expect(parseLine('grated zest of ½ orange').quantity).toBe(0.5);
    expect(parseLine('Zest of two lemons').quantity).toBe(2);
    expect(parseLine('zest from half a lemon').quantity).toBe(0.5);
    expect(parseLine('juice of ½ lemon').needsAmount).toBe(false);
    const large = parseLine('Finely grated zest of 1 large lemon');
    expect(large.quantity).toBe(1);
    expect(large.sizeText).toBe('large');
  });

  it('reads the sprigs or ears that leaves or kernels come from', () => {
    expect(pick(parseLine('leaves from 2 sprigs spearmint'))).toEqual({ quantity: 2, unit: 'sprig', name: 'spearmint' });
    expect(pick(parseLine('Kernels cut from 2 ears of corn'))).toEqual({ quantity: 2, unit: 'ear', name: 'corn' });
    expect(parseLine('Leaves from one sprig of thyme').quantity).toBe(1);
  });

  it('reads a size word before a pinch: "1 lg pinch paprika"', () => {
    expect(pick(parseLine('1 lg pinch Spanish paprika'))).toEqual({ quantity: 1, unit: 'pinch', name: 'Spanish paprika' });
  });
});

describe('parseLine: lines without an amount', () => {
  it('"salt to taste" keeps the food, flags it and asks for an amount', () => {
    const line = parseLine('salt to taste');
    expect(line.quantity).toBeNull();
    expect(line.unit).toBeNull();
    expect(line.name).toBe('salt');
    expect(line.needsAmount).toBe(true);
    expect(line.flags).toEqual(expect.arrayContaining(['to-taste', 'needs-amount']));
    expect(line.comment).toBe('to taste');
  });

  it('"Salt and pepper to taste" and "olive oil, for frying" are kept with no quantity', () => {
    const both = parseLine('Salt and pepper to taste');
    expect(both).toMatchObject({ quantity: null, name: 'Salt and pepper', needsAmount: true });
    const oil = parseLine('olive oil, for frying');
    expect(oil).toMatchObject({ quantity: null, name: 'olive oil', comment: 'for frying', needsAmount: true });
  });

  it('takes the amount from a note when the line has no other: "Neutral oil, for frying (about ½ cup)"', () => {
    const line = parseLine('Neutral oil, for frying (about ½ cup)');
    expect(pick(line)).toEqual({ quantity: 0.5, unit: 'cup', name: 'Neutral oil' });
    expect(line.flags).toContain('approximate');
    expect(line.needsAmount).toBe(false);
  });

  it('marks group headers and does not ask for their amount', () => {
    const line = parseLine('For the sauce:');
    expect(line.flags).toContain('group-header');
    expect(line.needsAmount).toBe(false);
    expect(line.quantity).toBeNull();
  });

  it('returns an empty result for blank input', () => {
    for (const blank of ['', '   ', '\n\t']) {
      const line = parseLine(blank);
      expect(line).toMatchObject({ quantity: null, unit: null, name: '', needsAmount: false });
      expect(line.flags).toContain('empty');
    }
  });
});

describe('parseLine: food phrase, preparation and notes', () => {
  it('"1 cup shredded mozzarella cheese" → name "mozzarella cheese", preparation "shredded"', () => {
    const line = parseLine('1 cup shredded mozzarella cheese');
    expect(line.name).toBe('mozzarella cheese');
    expect(line.preparation).toBe('shredded');
    expect(line.comment).toBe('shredded');
  });

  it('"boneless skinless chicken breasts, cut into cubes" keeps the cut in the preparation', () => {
    const line = parseLine('1 lb boneless skinless chicken breasts, cut into cubes');
    expect(line.name).toBe('boneless skinless chicken breasts');
    expect(line.preparation).toBe('cut into cubes');
  });

  it('splits preparation from notes: "1 c cilantro, finely chopped, plus more for garnish"', () => {
    const line = parseLine('1 c cilantro, finely chopped, plus more for garnish');
    expect(line.name).toBe('cilantro');
    expect(line.preparation).toBe('finely chopped');
    expect(line.comment).toBe('finely chopped, plus more for garnish');
  });

  it('keeps words that name a different food: ground beef, dried sage, cooked rice, toasted sesame oil', () => {
    expect(parseLine('1 lb ground beef').name).toBe('ground beef');
    expect(parseLine('1 tsp dried sage').name).toBe('dried sage');
    expect(parseLine('2 cups cooked rice').name).toBe('cooked rice');
    expect(parseLine('1 tbsp toasted sesame oil').name).toBe('toasted sesame oil');
    const pepper = parseLine('½ tsp freshly ground black pepper');
    expect(pepper.name).toBe('black pepper');
    expect(pepper.preparation).toBe('freshly ground');
  });

  it('joins comma-separated adjectives and food lists, and moves notes out', () => {
    expect(parseLine('2 lb boneless, skinless chicken thighs').name).toBe('boneless skinless chicken thighs');
    expect(parseLine('8 skin-on, bone-in chicken thighs').name).toBe('skin-on bone-in chicken thighs');
    expect(parseLine('3 oz Gruyère, Comté, or Swiss cheese, grated').name).toBe('Gruyère, Comté, or Swiss cheese');
    expect(parseLine('2 c blackberries, fresh or frozen').name).toBe('blackberries');
    const optional = parseLine('2 tbsp Greek yogurt or sour cream (optional)');
    expect(optional.name).toBe('Greek yogurt or sour cream');
    expect(optional.flags).toContain('optional');
    expect(optional.comment).toBe('optional');
  });

  it('keeps the input exactly as given', () => {
    const input = '  1 cup\tsugar  ';
    expect(parseLine(input).input).toBe(input);
  });
});
