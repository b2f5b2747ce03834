/**
 * The nine major food allergens of US law — FALCPA (2004) and the FASTER Act (2021, adding sesame) —
 * read from a catalogue food's SR28 food group, readable name and culinary roles.
 *
 * This is a warning aid, not a label: it errs toward flagging. Choices worth knowing:
 * - Shellfish means crustacean shellfish (shrimp, crab, lobster, crayfish). Molluscan shellfish
 *   (clams, oysters, mussels, scallops, squid, octopus) are not a major food allergen under FALCPA,
 *   so they are not flagged.
 * - Tree nuts follow FDA's January 2025 guidance list (from memory): almond, Brazil nut, cashew,
 *   chestnut, hazelnut, heartnut, macadamia, pecan, pine nut, pistachio, walnut. That guidance took
 *   coconut (and beechnut, butternut, ginkgo, hickory, pili, shea…) off the list, so coconut is not a tree nut here.
 * - FALCPA exempts highly refined oils. Soybean and generic vegetable oil are always sold refined, so
 *   they are not flagged; peanut, sesame and nut oils are, because cold-pressed ones are common and a
 *   recipe does not say which bottle is meant.
 * - Group 01 ("Dairy and Egg Products") counts as milk unless the entry is an egg; nondairy creamers and
 *   toppings there usually carry caseinate, a milk protein.
 */
import type { CatalogueFood, Role } from './food';

export const ALLERGENS = ['milk', 'egg', 'fish', 'shellfish', 'tree nuts', 'peanuts', 'wheat', 'soy', 'sesame'] as const;
export type Allergen = (typeof ALLERGENS)[number];

/** Wording for a caution line: FALCPA names the shellfish allergen "crustacean shellfish". */
export const ALLERGEN_LABELS: Record<Allergen, string> = {
  milk: 'Milk',
  egg: 'Egg',
  fish: 'Fish',
  shellfish: 'Crustacean shellfish',
  'tree nuts': 'Tree nuts',
  peanuts: 'Peanuts',
  wheat: 'Wheat',
  soy: 'Soy',
  sesame: 'Sesame',
};

export type AllergenInput = Pick<CatalogueFood, 'name' | 'foodGroup' | 'roles'>;

/** A word or phrase that signals an allergen, unless the name also holds one of `unless`. */
interface Term {
  phrase: string;
  unless?: readonly string[];
  notInGroups?: readonly string[];
}

interface AllergenWords {
  terms: readonly (string | Term)[];
  /** phrases blanked out before the terms are sought: "coconut milk" is not milk */
  masks?: readonly string[];
  /** "vegan cheese", "plant-based mayonnaise": animal-product words stop counting */
  plantMarkersApply?: boolean;
  /** "gluten-free bread": generic bakery words stop counting, an explicit "wheat" still counts */
  glutenFreeApplies?: boolean;
}

const NON_WHEAT_FLOURS = [
  'rice',
  'corn',
  'almond',
  'coconut',
  'soy',
  'chickpea',
  'potato',
  'tapioca',
  'sesame',
  'peanut',
  'oat',
  'buckwheat',
  'rye',
  'masa',
  'cassava',
  'arrowroot',
  'sorghum',
  'millet',
  'quinoa',
  'teff',
  'banana',
  'bean',
  'carob',
  'cottonseed',
  'acorn',
  'sunflower seed',
  'lupin',
  'chestnut',
  'hazelnut',
  'flaxseed',
].map((w) => `${w} flour`);

const WORDS: Record<Allergen, AllergenWords> = {
  milk: {
    terms: [
      'milk',
      'milks',
      'buttermilk',
      'cheese',
      'cheeses',
      'cheddar',
      'mozzarella',
      'parmesan',
      'ricotta',
      'feta',
      'brie',
      'paneer',
      'queso',
      'butter',
      'ghee',
      'cream',
      'yogurt',
      'yoghurt',
      'kefir',
      'whey',
      'casein',
      'caseinate',
      'lactose',
      'custard',
      'pudding',
      'puddings',
      'alfredo',
      'bechamel',
      'white sauce',
      'half and half',
      'gelato',
      'dulce de leche',
      'pesto',
      // SR28's soy-based creamers are in group 16; dairy and caseinate creamers are in group 01
      { phrase: 'creamer', notInGroups: ['16'] },
    ],
    masks: [
      ...['coconut', 'soy', 'almond', 'rice', 'oat', 'cashew', 'hemp', 'pea', 'flax', 'macadamia', 'hazelnut'].map((w) => `${w} milk`),
      ...['peanut', 'almond', 'cashew', 'nut', 'seed', 'sesame', 'cocoa', 'nutmeg', 'shea', 'apple', 'pumpkin', 'soy'].map((w) => `${w} butter`),
      ...['soy', 'coconut', 'almond', 'oat', 'cashew', 'tofu'].map((w) => `${w} yogurt`),
      'soy cheese',
      'butter beans',
      'coconut cream',
      'cream of tartar',
      'cream of wheat',
      'cream of rice',
      'cream style',
    ],
    plantMarkersApply: true,
  },
  egg: {
    terms: ['egg', 'eggs', 'yolk', 'yolks', 'eggnog', 'mayonnaise', 'mayo', 'meringue', 'aioli', 'hollandaise', 'custard', 'caesar'],
    // the egg allergen is birds' eggs; fish roe is fish
    masks: ['fish eggs', 'fish egg', 'herring eggs', 'salmon eggs', 'whitefish eggs', 'custard apple'],
    plantMarkersApply: true,
  },
  fish: {
    terms: [
      'fish',
      'salmon',
      'tuna',
      'cod',
      'haddock',
      'halibut',
      'tilapia',
      'trout',
      'catfish',
      'anchovy',
      'anchovies',
      'sardine',
      'sardines',
      'mackerel',
      'herring',
      'pollock',
      'pollack',
      'bass',
      'snapper',
      'grouper',
      'swordfish',
      'mahimahi',
      'mahi mahi',
      'flounder',
      'perch',
      'pike',
      'carp',
      'whiting',
      'roughy',
      'monkfish',
      'barramundi',
      'shad',
      'smelt',
      'eel',
      'sturgeon',
      'caviar',
      'roe',
      'surimi',
      'worcestershire',
      'caesar',
    ],
    // "jellyfish" and "shellfish" are their own words and never match "fish"
    masks: ['fish shaped'],
    plantMarkersApply: true,
  },
  shellfish: {
    terms: [
      'shrimp',
      'shrimps',
      'prawn',
      'prawns',
      'crab',
      'crabs',
      'lobster',
      'lobsters',
      'crayfish',
      'crawfish',
      'crawdads',
      'langoustine',
      'langoustines',
      'scampi',
      'krill',
    ],
    plantMarkersApply: true,
  },
  'tree nuts': {
    terms: [
      'almond',
      'almonds',
      'walnut',
      'walnuts',
      'pecan',
      'pecans',
      'cashew',
      'cashews',
      'pistachio',
      'pistachios',
      'hazelnut',
      'hazelnuts',
      'filbert',
      'filberts',
      'macadamia',
      'brazilnut',
      'brazilnuts',
      'brazil nut',
      'brazil nuts',
      'pine nut',
      'pine nuts',
      'pinyon',
      'pignoli',
      'pignolia',
      'chestnut',
      'chestnuts',
      'heartnut',
      'heartnuts',
      'mixed nuts',
      'praline',
      'pralines',
      'marzipan',
      'pesto',
    ],
    masks: ['water chestnut', 'water chestnuts'],
  },
  peanuts: { terms: ['peanut', 'peanuts', 'groundnut', 'groundnuts'] },
  wheat: {
    terms: [
      'wheat',
      'flour',
      'flours',
      'bread',
      'breads',
      'breadcrumbs',
      'bread crumbs',
      'panko',
      'croutons',
      'pasta',
      'spaghetti',
      'macaroni',
      'lasagna',
      'linguine',
      'fettuccine',
      'penne',
      'rigatoni',
      'fusilli',
      'orzo',
      'ravioli',
      'tortellini',
      'gnocchi',
      'couscous',
      'semolina',
      'durum',
      'bulgur',
      'farina',
      'farro',
      'spelt',
      'kamut',
      'einkorn',
      'emmer',
      'seitan',
      'matzo',
      'graham',
      'bagel',
      'bagels',
      'croissant',
      'croissants',
      'pretzel',
      'pretzels',
      'muffin',
      'muffins',
      'biscuit',
      'biscuits',
      'pancake',
      'pancakes',
      'waffle',
      'waffles',
      'pie crust',
      'pastry',
      'phyllo',
      'filo',
      'wonton',
      'pita',
      'naan',
      'flatbread',
      'cookie',
      'cookies',
      { phrase: 'pizza', unless: ['sauce'] },
      { phrase: 'cake', unless: ['rice'] },
      { phrase: 'cakes', unless: ['rice'] },
      { phrase: 'noodles', unless: ['rice', 'cellophane', 'mung', 'shirataki', 'kelp', 'zucchini', 'glass'] },
      { phrase: 'noodle', unless: ['rice', 'cellophane', 'mung', 'shirataki', 'kelp', 'zucchini', 'glass'] },
      { phrase: 'crackers', unless: ['rice'] },
      // most soba is part wheat flour (*common practice*)
      { phrase: 'soba' },
    ],
    masks: [...NON_WHEAT_FLOURS, 'bread and butter pickles', 'breadfruit', 'breadnut'],
    glutenFreeApplies: true,
  },
  soy: {
    terms: [
      'soy sauce',
      'soy protein',
      'soy lecithin',
      'soymilk',
      'tofu',
      'tempeh',
      'edamame',
      'miso',
      'natto',
      'tamari',
      'shoyu',
      'okara',
      'yuba',
      'textured vegetable protein',
      'teriyaki',
      'hoisin',
      // in Fats and Oils, "soy" and "soybean" name refined oil, exempt under FALCPA (see the note at the top)
      { phrase: 'soy', notInGroups: ['04'] },
      { phrase: 'soya', notInGroups: ['04'] },
      { phrase: 'soybean', notInGroups: ['04'] },
      { phrase: 'soybeans', notInGroups: ['04'] },
    ],
    masks: ['soybean oil', 'soy oil', 'oil soybean', 'oil soy', 'soya oil'],
  },
  sesame: {
    // hummus is made with tahini (*common practice*)
    terms: ['sesame', 'tahini', 'tahina', 'benne', 'halvah', 'halva', 'gomasio', 'hummus'],
  },
};

const PLANT_MARKERS = ['vegan', 'plant based', 'dairy free', 'non dairy', 'nondairy'];
const GLUTEN_FREE_MARKERS = ['gluten free'];
/** the one word that names wheat itself and survives a gluten-free marker */
const EXPLICIT_WHEAT = 'wheat';
/** a word after "without", "except" or "no" names what the food lacks: "mixed nuts, without peanuts" */
const NEGATORS = new Set(['without', 'except', 'no', 'wo']);

/** Lowercase words of a name, punctuation dropped: "Nuts, mixed nuts, without peanuts" → [nuts, mixed, nuts, without, peanuts]. */
function words(name: string): string[] {
  return name
    .toLowerCase()
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .split(/[^a-z0-9]+/)
    .filter(Boolean);
}

/** Blank out what the food lacks: the word after a negator ("without added X" → X), and X in "X-free". */
function dropNegated(tokens: string[]): string[] {
  const out = tokens.slice();
  for (let i = 0; i < out.length; i++) {
    if (NEGATORS.has(out[i])) {
      let j = i + 1;
      if (out[j] === 'added') j++;
      if (j < out.length) out[j] = '';
    } else if (out[i] === 'free' && i > 0 && out[i - 1] !== 'fat' && out[i - 1] !== 'sugar') {
      // "fat-free milk" and "sugar-free pudding" still hold milk; "dairy-free", "egg-free" do not
      out[i - 1] = '';
    }
  }
  return out;
}

function findPhrase(tokens: readonly string[], phrase: string): number[] {
  const parts = phrase.split(' ');
  const hits: number[] = [];
  for (let i = 0; i + parts.length <= tokens.length; i++) {
    if (parts.every((p, k) => tokens[i + k] === p)) hits.push(i);
  }
  return hits;
}

function hasPhrase(tokens: readonly string[], phrase: string): boolean {
  return findPhrase(tokens, phrase).length > 0;
}

function masked(tokens: readonly string[], masks: readonly string[]): string[] {
  const out = tokens.slice();
  for (const m of masks) {
    const len = m.split(' ').length;
    for (const at of findPhrase(tokens, m)) for (let k = 0; k < len; k++) out[at + k] = '';
  }
  return out;
}

/** The first comma-separated part of a name, as words: "Egg, whole, raw, fresh" → [egg]. */
function headWords(name: string): string[] {
  return words(name.split(',')[0] ?? '');
}

const EGG_HEADS = ['egg', 'eggs', 'egg substitute', 'egg mix', 'egg white', 'egg whites', 'egg yolk'];
const CHEESE_ROLES: readonly Role[] = ['melting-cheese', 'hard-cheese', 'soft-cheese'];

/** What the SR28 food group alone tells: group 01, 15 and 18 entries. */
function fromGroup(food: AllergenInput, head: string[], tokens: string[], glutenFree: boolean, found: Set<Allergen>): void {
  const headText = head.join(' ');
  switch (food.foodGroup) {
    case '01':
      // SR28 files eggs under "Dairy and Egg Products"; an egg is not milk.
      if (EGG_HEADS.includes(headText)) found.add('egg');
      else found.add('milk');
      break;
    case '15':
      if (head[0] === 'fish') found.add('fish');
      else if (head[0] === 'crustaceans') found.add('shellfish');
      // "Mollusks, …": not a major food allergen under FALCPA
      break;
    case '18': {
      // Baked products are made with wheat flour unless the name says corn (tortillas, taco shells) or gluten-free.
      const cornOnly = hasPhrase(tokens, 'corn') && !hasPhrase(tokens, 'flour') && !hasPhrase(tokens, 'wheat');
      const cornShell = hasPhrase(tokens, 'taco shells') || hasPhrase(tokens, 'tostada shells');
      if (!cornOnly && !cornShell && !glutenFree) found.add('wheat');
      break;
    }
  }
}

function termMatches(term: string | Term, tokens: readonly string[], allTokens: readonly string[], group: string): boolean {
  if (typeof term === 'string') return hasPhrase(tokens, term);
  if (term.notInGroups?.includes(group)) return false;
  if (term.unless?.some((u) => hasPhrase(allTokens, u))) return false;
  return hasPhrase(tokens, term.phrase);
}

/** The major food allergens of one food, in the fixed order of ALLERGENS. */
export function allergensOf(food: AllergenInput): Allergen[] {
  const raw = words(food.name);
  // markers are read before negations are blanked: "dairy-free" must still say "dairy free"
  const plantBased = PLANT_MARKERS.some((m) => hasPhrase(raw, m));
  const glutenFree = GLUTEN_FREE_MARKERS.some((m) => hasPhrase(raw, m));
  const tokens = dropNegated(raw);
  const found = new Set<Allergen>();

  fromGroup(food, headWords(food.name), tokens, glutenFree, found);

  for (const allergen of ALLERGENS) {
    const rule = WORDS[allergen];
    if (rule.plantMarkersApply && plantBased) continue;
    const seen = masked(tokens, rule.masks ?? []);
    const terms = rule.glutenFreeApplies && glutenFree ? [EXPLICIT_WHEAT] : rule.terms;
    if (terms.some((t) => termMatches(t, seen, tokens, food.foodGroup))) found.add(allergen);
  }

  // Roles, where a role means one allergen whatever the food's name: SR28's egg entries, and cheeses.
  // Milk and cream roles are not used: they also hold soy, almond and oat drinks and nondairy toppings.
  if (!plantBased && food.roles.includes('egg')) found.add('egg');
  if (!plantBased && food.roles.some((r) => CHEESE_ROLES.includes(r))) found.add('milk');

  return ALLERGENS.filter((a) => found.has(a));
}

/** Every major food allergen in a recipe's foods: each once, in the fixed order of ALLERGENS. */
export function allergensOfRecipe(foods: readonly AllergenInput[]): Allergen[] {
  const found = new Set<Allergen>();
  for (const f of foods) for (const a of allergensOf(f)) found.add(a);
  return ALLERGENS.filter((a) => found.has(a));
}
