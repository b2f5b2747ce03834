/**
 * The search index over catalogue names, built once per catalogue: an inverted index from each word
 * to the foods whose name holds it, word weights (inverse document frequency), and per-food facts
 * the ranking reads (raw or cooked, canned, baby food, mixed dish, branded).
 */
import type { CatalogueFood } from '../../shared/food';
import { words } from './normalise-phrase';

/** Name words that say nothing about which food it is; a name is not longer for having them. */
const NEUTRAL_NAME_WORDS = new Set([
  'raw',
  'fresh',
  'all',
  'type',
  'variety',
  'commercial',
  'commercially',
  'regular',
  'plain',
  'with',
  'without',
  'and',
  'or',
  'added',
  'include',
  'includes',
  'species',
  'grade',
  'solid',
  'liquid',
  'unenriched',
  'enriched',
  'fortified',
  'vitamin',
  'a',
  'd',
  'ready',
  'serve',
  'to',
  'style',
  'salt',
  'pack',
  'packed',
  'shredded',
  'grated',
  'sliced',
  'diced',
  'chopped',
  'whole',
  'meat',
  'only',
  'broiler',
  'fryer',
  'separable',
  'choice',
  'select',
  'year',
  'average',
  'mature',
  'composite',
  'retail',
  'made',
  'from',
  'usda',
  'commodity',
  'nfs',
  'unspecified',
  'not',
  'further',
  'specified',
  'as',
  'purchased',
  'in',
  'of',
  'the',
  'by',
  'for',
  'approximately',
  'approx',
  'about',
  'on',
  'piece',
  'each',
  'form',
  'trimmed',
  'fat',
  'lean',
  'skin',
  'yellow',
  'white',
  'red',
  'green',
  'product',
  'products',
  'spices',
  'spice',
  'seed',
  'kernel',
  'prepared',
  'ns',
  'salted',
  'unsalted',
  'drained',
  'gram',
  'ounce',
  'per',
]);

/** Words that name a cooked or otherwise processed state. */
export const STATE_WORDS = new Set([
  'cooked',
  'boiled',
  'fried',
  'roasted',
  'baked',
  'broiled',
  'braised',
  'grilled',
  'stewed',
  'microwaved',
  'steamed',
  'heated',
  'prepared',
  'browned',
  'rotisserie',
  'simmered',
  'scrambled',
  'poached',
  'toasted',
  'reconstituted',
  'pan',
  'crumbles',
  'blanched',
  'sauteed',
  'stir',
  'glazed',
  'breaded',
  'battered',
  'batter',
]);

/** Words of a lighter or altered version of a food: a name is much longer for having them. */
export const VARIANT_WORDS = new Set([
  'nonfat',
  'lowfat',
  'light',
  'reduced',
  'low',
  'sodium',
  'imitation',
  'substitute',
  'free',
  'diet',
  'decaffeinated',
  'unsweetened',
  'sweetened',
  'flavored',
  'babyfood',
  'infant',
  'toddler',
  'formula',
  'calorie',
  'sugar',
  'lactose',
  'omega',
  'dha',
  'artificial',
  'sweetener',
]);

export const FLAG_RAW = 1;
export const FLAG_STATE = 2;
export const FLAG_CANNED = 4;
export const FLAG_FROZEN = 8;
export const FLAG_BABY = 16;
export const FLAG_MIXED_DISH = 32;
export const FLAG_REGIONAL = 64;
export const FLAG_BRANDED = 128;
export const FLAG_DRIED = 256;
export const FLAG_SNACK = 512;
/** Salted, smoked or cured: a preserved form ("Mackerel, salted"), not the fresh food a bare name means. */
export const FLAG_CURED = 1024;

export interface IndexedFood {
  food: CatalogueFood;
  /** distinct word ids of the name */
  tokens: Set<number>;
  /** word ids of the name's first comma segment that carry meaning ("beef" of "Beef, ground, …") */
  head: number[];
  /** how much longer than a bare food word the name is (variant words count more) */
  extraTotal: number;
  flags: number;
  wordCount: number;
  /** word ids of FORM_WORDS in the name */
  forms: number[];
}

export interface FoodIndex {
  foods: IndexedFood[];
  wordId: Map<string, number>;
  wordText: string[];
  /** inverse document frequency per word id; words only in the alias table get the highest */
  idf: number[];
  /** extra weight of a name word (0 neutral, 1 ordinary, more for variant words) */
  extraWeight: number[];
  /** food positions per word id */
  postings: Uint32Array[];
  /** word ids every food of which is branded */
  brandedOnly: Uint8Array;
  /** position of each food by catalogue id */
  positionById: Map<number, number>;
  /** position of each USDA food by NDB number */
  positionBySourceId: Map<string, number>;
}

/**
 * Words for a made form of a food: "Cashew *butter*" is not cashews, "Celery *flakes*" not celery.
 * A name with one the phrase does not ask for is much longer than it looks.
 */
export const FORM_WORDS = new Set([
  'butter',
  'oil',
  'flour',
  'juice',
  'sauce',
  'paste',
  'powder',
  'soup',
  'dip',
  'spread',
  'bar',
  'chip',
  'cracker',
  'cereal',
  'dressing',
  'drink',
  'beverage',
  'mix',
  'candy',
  'candies',
  'dessert',
  'pie',
  'cake',
  'cookie',
  'salad',
  'sandwich',
  'pizza',
  'dinner',
  'entree',
  'flake',
  'seasoning',
  'gravy',
  'syrup',
  'jam',
  'jelly',
  'concentrate',
  'nectar',
  'extract',
  'puree',
  'shake',
  'snack',
  'pudding',
  'topping',
  'filling',
]);

function wordWeight(w: string): number {
  if (NEUTRAL_NAME_WORDS.has(w) || /^\d+$/.test(w)) return 0;
  if (FORM_WORDS.has(w)) return 2;
  if (VARIANT_WORDS.has(w)) return 1.6;
  if (/%$/.test(w)) return 0.5;
  return 1;
}

function flagsOf(food: CatalogueFood, tokens: string[]): number {
  let flags = 0;
  const has = (w: string) => tokens.includes(w);
  if (has('raw')) flags |= FLAG_RAW;
  if (tokens.some((w) => STATE_WORDS.has(w))) flags |= FLAG_STATE;
  if (has('canned')) flags |= FLAG_CANNED;
  if (has('frozen')) flags |= FLAG_FROZEN;
  if (has('dried') || has('dehydrated')) flags |= FLAG_DRIED;
  if (has('salted') || has('smoked') || has('cured')) flags |= FLAG_CURED;
  const group = food.foodGroup.slice(0, 2);
  if (group === '03' || has('babyfood') || has('infant') || has('toddler')) flags |= FLAG_BABY;
  if (group === '22') flags |= FLAG_MIXED_DISH;
  if (group === '35') flags |= FLAG_REGIONAL;
  if (group === '25') flags |= FLAG_SNACK;
  if (food.branded) flags |= FLAG_BRANDED;
  return flags;
}

/** Build the index over `foods`; `extraVocabulary` holds words (from the alias table) no name has. */
export function buildFoodIndex(foods: CatalogueFood[], extraVocabulary: Iterable<string> = []): FoodIndex {
  const wordId = new Map<string, number>();
  const wordText: string[] = [];
  const postingLists: number[][] = [];
  const idOf = (w: string): number => {
    let id = wordId.get(w);
    if (id === undefined) {
      id = wordText.length;
      wordId.set(w, id);
      wordText.push(w);
      postingLists.push([]);
    }
    return id;
  };

  const indexed: IndexedFood[] = foods.map((food, position) => {
    const text = food.name || food.sourceName || '';
    const segments = text.split(',').map(words);
    const all = segments.flat();
    const firstSegment = segments[0] ?? [];
    const tokens = new Set<number>();
    let extraTotal = 0;
    for (const segment of segments) {
      // "canned in water", "packed in tomato juice": the packing medium does not make the name longer.
      let medium = false;
      for (const w of segment) {
        const id = idOf(w);
        if (tokens.has(id)) continue;
        tokens.add(id);
        postingLists[id].push(position);
        if (!medium) extraTotal += wordWeight(w);
        if (w === 'in') medium = true;
      }
    }
    const head = [...new Set(firstSegment.filter((w) => wordWeight(w) > 0).map(idOf))];
    const forms = [...tokens].filter((id) => FORM_WORDS.has(wordText[id]));
    return { food, tokens, head, extraTotal, flags: flagsOf(food, all), wordCount: all.length, forms };
  });
  for (const w of extraVocabulary) idOf(w);

  const n = Math.max(1, foods.length);
  const idf = postingLists.map((list) => Math.log(1 + n / Math.max(1, list.length)));
  const extraWeight = wordText.map(wordWeight);
  const brandedOnly = new Uint8Array(wordText.length);
  postingLists.forEach((list, id) => {
    if (list.length > 0 && list.every((p) => indexed[p].food.branded)) brandedOnly[id] = 1;
  });
  const positionById = new Map<number, number>();
  const positionBySourceId = new Map<string, number>();
  indexed.forEach((f, i) => {
    positionById.set(f.food.id, i);
    if (f.food.source === 'usda-sr28' && !positionBySourceId.has(f.food.sourceId)) positionBySourceId.set(f.food.sourceId, i);
  });

  return {
    foods: indexed,
    wordId,
    wordText,
    idf,
    extraWeight,
    postings: postingLists.map((l) => Uint32Array.from(l)),
    brandedOnly,
    positionById,
    positionBySourceId,
  };
}
