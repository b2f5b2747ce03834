/**
 * Words of recipe phrases and catalogue names, reduced the same way on both sides so that
 * "Part-Skim Mozzarella" meets "Cheese, mozzarella, part skim milk" and "jalapeños" meets "jalapeno".
 */
import { singular } from './singular';

/** Lowercase, accents folded, apostrophes dropped: "Confectioners’ Jalapeño" → "confectioners jalapeno". */
export function foldText(text: string): string {
  // Most text is plain ASCII: only the rest needs Unicode decomposition.
  const base = /\P{ASCII}/u.test(text) ? text.normalize('NFD').replace(/\p{M}+/gu, '') : text;
  return base.toLowerCase().replace(/['’`´]/g, '');
}

/** Text without any (…) or […] part, unclosed ones included. */
export function withoutParentheticals(text: string): string {
  let out = '';
  let depth = 0;
  for (const ch of text) {
    if (ch === '(' || ch === '[') depth++;
    else if ((ch === ')' || ch === ']') && depth > 0) {
      depth--;
      out += ' ';
    } else if (depth === 0) out += ch;
  }
  return out;
}

/** Spellings rewritten before splitting into words. */
const TEXT_REWRITES: [RegExp, string][] = [
  [/&/g, ' and '],
  [/\bwithout (?:added )?salt\b|\bno[- ]salt[- ]added\b|\bno added salt\b|\bsalt[- ]free\b/g, ' unsalted '],
  [/\bwith (?:added )?salt\b/g, ' salted '],
  [/\bnot sweetened\b|\bno sugar added\b|\bwithout added sugar\b/g, ' unsweetened '],
  // "Lemons, raw, without peel" is not lemon peel.
  [/\bwithout (?:the )?(?:peel|rind)\b/g, ' peeled '],
  [/\bwithout (?:the )?skin\b/g, ' skinless '],
  [/\bwithout (?:the )?bones?\b/g, ' boneless '],
  // "bone-in" is one word: its "in" does not start a packing medium.
  [/\bbone[- ]in\b/g, ' bonein '],
  // "lamb shoulder on the bone" is bone-in lamb, not "Salmon, …, with bone".
  [/\bon the bones?\b/g, ' bonein '],
  // SR28 yogurts carry their label protein in the name: "8 grams protein per 8 ounce".
  [/\b\d+ grams? protein per \d+ ounces?\b/g, ' '],
  [/\bw\/\s*/g, 'with '],
  [/\bhalf[- ]and[- ]half\b/g, 'half and half'],
  [/\b(\d+)\s*\/\s*(\d+)\b/g, '$1 $2'],
];

/** Text in which some rewrite above can apply. */
const REWRITE_TRIGGER = /[&/]|salt|sweeten|sugar|protein|half|without|bone/;

/** Single words rewritten as one or more canonical words, on both sides. */
const WORD_REWRITES: Record<string, string[]> = {
  fatfree: ['nonfat'],
  uncooked: ['raw'],
  unprepared: ['raw'],
  yoghurt: ['yogurt'],
  lite: ['light'],
  chile: ['chili'],
  chilli: ['chili'],
  filet: ['fillet'],
  wholemeal: ['whole', 'wheat'],
  wholewheat: ['whole', 'wheat'],
  breadcrumb: ['bread', 'crumb'],
};

/** Word pairs read as one canonical word, on both sides. */
const PAIR_REWRITES: Record<string, string> = {
  'fat free': 'nonfat',
  'non fat': 'nonfat',
  'low fat': 'lowfat',
  'full fat': 'whole',
};

const PAIR_FIRST = new Set(Object.keys(PAIR_REWRITES).map((k) => k.split(' ')[0]));

/**
 * Words of a text: folded, split on anything but letters, digits and "%", each made singular,
 * with the canonical rewrites above ("fat-free" and "nonfat" are one word; "low-fat" and "lowfat" too).
 */
export function words(text: string): string[] {
  // Food names and phrases come back again and again (every candidate food's name, every line's
  // phrase in several steps): each text is split once, and callers get their own copy.
  const known = wordsOf.get(text);
  if (known) return known.slice();
  const found = splitWords(text);
  if (wordsOf.size >= REMEMBERED_TEXTS) wordsOf.clear();
  wordsOf.set(text, found);
  return found.slice();
}

const REMEMBERED_TEXTS = 50_000;
const wordsOf = new Map<string, string[]>();

function splitWords(text: string): string[] {
  let t = foldText(text);
  if (REWRITE_TRIGGER.test(t)) for (const [re, to] of TEXT_REWRITES) t = t.replace(re, to);
  const raw = t.split(/[^a-z0-9%]+/).filter(Boolean);
  const out: string[] = [];
  for (const w of raw) {
    const s = singular(w);
    const rewritten = WORD_REWRITES[s] ?? WORD_REWRITES[w];
    if (rewritten) out.push(...rewritten);
    else out.push(s);
  }
  // Pairs after the word pass, so "low-fat", "low fat" and "lowfat" all end as "lowfat".
  if (!out.some((w) => PAIR_FIRST.has(w))) return out;
  const joined: string[] = [];
  for (let i = 0; i < out.length; i++) {
    const pair = i + 1 < out.length && PAIR_FIRST.has(out[i]) ? PAIR_REWRITES[`${out[i]} ${out[i + 1]}`] : undefined;
    if (pair) {
      joined.push(pair);
      i++;
    } else joined.push(out[i]);
  }
  return joined;
}

/**
 * Words that say what the cook does to a food or how big a piece is, never which food it is.
 * "ground", "dried", "smoked", "cooked", "canned" and "frozen" are not here: they name other foods.
 */
export const PREPARATION_WORDS = new Set([
  'chopped',
  'diced',
  'minced',
  'shredded',
  'grated',
  'sliced',
  'cubed',
  'crumbled',
  'crushed',
  'fresh',
  'freshly',
  'large',
  'small',
  'medium',
  'extra',
  'jumbo',
  'big',
  'softened',
  'melted',
  'divided',
  'packed',
  'optional',
  'finely',
  'coarsely',
  'roughly',
  'thinly',
  'thickly',
  'lightly',
  'firmly',
  'loosely',
  'well',
  'very',
  'peeled',
  'seeded',
  'deseeded',
  'deveined',
  'trimmed',
  'rinsed',
  'drained',
  'halved',
  'quartered',
  'beaten',
  'whisked',
  'sifted',
  'cut',
  'into',
  'piece',
  'bite',
  'sized',
  'size',
  'inch',
  'cm',
  'cold',
  'warm',
  'room',
  'temperature',
  'good',
  'quality',
  'organic',
  'homemade',
  'store',
  'bought',
  'leftover',
  'ripe',
  'unripe',
  'day',
  'old',
  'about',
  'plus',
  'more',
  'taste',
  'needed',
  'garnish',
  'serving',
  'lukewarm',
  'chilled',
  'thawed',
  'julienned',
  'spiralized',
  'mashed',
  'pureed',
  'zested',
  'juiced',
  'squeezed',
  'torn',
  'snipped',
  'stemmed',
  'cored',
  'pitted',
  'hulled',
  'scrubbed',
  'patted',
  'washed',
  'separated',
  'shaved',
  'slivered',
  'heaping',
  'scant',
  'level',
  'generous',
  'handful',
  'pinch',
  'dash',
  'splash',
  'favorite',
  'preferred',
  'your',
  'choice',
  'brand',
  'best',
  'high',
  'quality',
  'premium',
  'natural',
  'pure',
  'real',
  'plain',
  'regular',
  'cooking',
  'boiling',
  'spooned',
  'leveled',
  'levelled',
  'scooped',
]);

/**
 * Words for a piece of a food: "basil *leaves*", "thyme *sprigs*", "walnut *halves*". When one ends a
 * phrase, the food word before it is the head.
 */
export const PIECE_WORDS = new Set([
  'leaf',
  'sprig',
  'stalk',
  'stem',
  'floret',
  'wedge',
  'slice',
  'piece',
  'chunk',
  'strip',
  'half',
  'segment',
  'clove',
  'kernel',
  'link',
  'cap',
  'ball',
  'round',
  'cube',
  'spear',
  'rib',
  'head',
  'bulb',
  'stick',
  'crumb',
  'granule',
  'fillet',
  'sheet',
  'pod',
  'bunch',
  'sprig',
  'crumble',
  'crown',
  // "cobs of corn", "corn on the cob": an ear of fresh corn, not SR28's frozen "kernels on cob".
  'cob',
  // "racks of baby back ribs", "rack of lamb": how the meat is sold, not which meat.
  'rack',
]);

/** Filler words with no meaning for matching. */
export const STOP_WORDS = new Set([
  'a',
  'an',
  'the',
  'of',
  'and',
  'or',
  'for',
  'to',
  'in',
  'on',
  'at',
  'with',
  'from',
  'as',
  'such',
  'any',
  'some',
  'each',
  'per',
  'if',
  'desired',
  'use',
  'using',
  'like',
  'other',
  'type',
  'kind',
  'style',
  // "grated, not shredded, parmesan": a negation names no food (SR28's "not canned" is no match for it).
  'not',
]);

/** Recipe abbreviations and shorthands, expanded in a phrase before matching. */
export const PHRASE_ABBREVIATIONS: Record<string, string> = {
  evoo: 'extra virgin olive oil',
  xtra: 'extra',
  xvoo: 'extra virgin olive oil',
  parm: 'parmesan',
  mozz: 'mozzarella',
  choc: 'chocolate',
  bbq: 'barbecue',
  veg: 'vegetable',
  veggie: 'vegetable',
  pkg: '',
  lg: 'large',
  lge: 'large',
  med: 'medium',
  sm: 'small',
  tsp: '',
  tbsp: '',
  oz: '',
  lb: '',
  ap: 'all purpose',
  pb: 'peanut butter',
  ww: 'whole wheat',
  bsc: 'boneless skinless chicken',
  bnls: 'boneless',
  sknls: 'skinless',
  frzn: 'frozen',
  hvy: 'heavy',
  wht: 'white',
  grnd: 'ground',
};

/**
 * Other words a recipe word may be found under in the catalogue ("spaghetti" is sold as pasta,
 * a bell pepper is a sweet pepper). A match through a synonym counts a little less than the word itself.
 */
export const SYNONYMS: Record<string, string[]> = {
  spaghetti: ['pasta'],
  penne: ['pasta'],
  linguine: ['pasta'],
  linguini: ['pasta'],
  fettuccine: ['pasta'],
  fettucine: ['pasta'],
  rigatoni: ['pasta'],
  ziti: ['pasta'],
  rotini: ['pasta'],
  fusilli: ['pasta'],
  farfalle: ['pasta'],
  orzo: ['pasta'],
  lasagna: ['pasta'],
  lasagne: ['pasta'],
  capellini: ['pasta'],
  bucatini: ['pasta'],
  orecchiette: ['pasta'],
  macaroni: ['pasta'],
  tagliatelle: ['pasta'],
  pappardelle: ['pasta'],
  gemelli: ['pasta'],
  cavatappi: ['pasta'],
  campanelle: ['pasta'],
  paccheri: ['pasta'],
  conchiglie: ['pasta'],
  noodle: ['pasta'],
  stilton: ['blue'],
  scallion: ['onion', 'spring'],
  cilantro: ['coriander'],
  coriander: ['cilantro'],
  garbanzo: ['chickpea'],
  chickpea: ['garbanzo'],
  courgette: ['zucchini'],
  aubergine: ['eggplant'],
  capsicum: ['pepper', 'sweet'],
  bell: ['sweet'],
  ketchup: ['catsup'],
  mayo: ['mayonnaise'],
  oatmeal: ['oat'],
  powder: ['dry', 'powdered'],
  powdered: ['powder', 'dry'],
  bok: ['pak'],
  choy: ['choi'],
  burger: ['hamburger'],
  peppercorn: ['pepper', 'black'],
  // SR28 names fresh chiles "Peppers, serrano", "Peppers, jalapeno": a chile is a pepper.
  chili: ['pepper'],
  toasted: ['roasted'],
  roasted: ['toasted'],
  prawn: ['shrimp'],
  frank: ['frankfurter'],
  hotdog: ['frankfurter'],
  jello: ['gelatin'],
  confectioner: ['powdered'],
  icing: ['powdered'],
  caster: ['granulated'],
  superfine: ['granulated'],
  stock: ['broth'],
  broth: ['stock'],
  parmigiano: ['parmesan'],
  pecorino: ['romano'],
  jack: ['monterey'],
  skim: ['nonfat'],
  vegetable: ['vegetables'],
  hamburger: ['ground', 'beef'],
  mince: ['ground'],
  yam: ['sweet', 'potato'],
  cornflour: ['cornstarch'],
  bicarbonate: ['baking', 'soda'],
  pepita: ['pumpkin', 'seed'],
  edamame: ['soybean', 'green'],
  flaxseed: ['flax', 'seed'],
  zest: ['peel'],
  rind: ['peel'],
  light: ['reduced'],
  // Part-skim is the cheese trade's reduced-fat.
  reduced: ['light', 'part'],
  lowfat: ['light', 'reduced', 'part'],
  dried: ['dry', 'dehydrated', 'mature'],
  dry: ['dried', 'mature'],
  // "chocolate-covered raisins" are SR28's "milk chocolate coated raisins".
  covered: ['coated'],
  dipped: ['coated'],
};

/**
 * Name words that contradict a recipe word: a food named "salted" is not what "unsalted butter" asks for.
 */
export const CONTRADICTIONS: Record<string, string[]> = {
  unsalted: ['salted'],
  salted: ['unsalted'],
  unsweetened: ['sweetened'],
  sweetened: ['unsweetened'],
  nonfat: ['whole', 'lowfat', 'reduced', 'light'],
  skim: ['whole', 'lowfat', 'reduced'],
  whole: ['nonfat', 'lowfat', 'reduced', 'skim', 'light', 'crushed', 'puree', 'paste', 'sauce', 'chopped', 'diced', 'sliced'],
  lowfat: ['whole', 'nonfat'],
  reduced: ['whole', 'regular'],
  dried: ['canned', 'cooked', 'boiled', 'frozen'],
  dry: ['canned', 'cooked', 'boiled', 'frozen'],
  light: ['regular', 'whole'],
  regular: ['light', 'reduced', 'lowfat', 'nonfat'],
  cooked: ['raw'],
  raw: ['cooked', 'boiled', 'fried', 'roasted', 'baked', 'broiled', 'braised', 'grilled', 'stewed', 'microwaved'],
  fresh: ['canned', 'frozen', 'dried'],
  boneless: ['bone'],
  sweet: ['sour', 'hot'],
  // a chile is a hot pepper: "dried red chile peppers" are not SR28's freeze-dried sweet red peppers
  chili: ['sweet'],
  hot: ['sweet', 'mild'],
  mild: ['hot'],
};
