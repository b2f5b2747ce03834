/**
 * A shopping hint for an amount of food, from its household portions (USDA household weights):
 * whole items for counted foods ("3 large eggs", "2 sticks"), cups or spoons for loose foods
 * ("about 2 cups"), otherwise weight ("1 lb 2 oz", "about 450 g").
 *
 * Counts and ounces round up, so the list never comes up short (an ounce is 28 g, too coarse to round
 * down); metric weights and volumes round to the nearest step and say "about".
 */
import type { Portion } from './food';
import { roundHalfUp } from './label-rounding';
import { kitchenQuantity, measureWord } from './kitchen-amounts';
import { GRAMS_PER_OUNCE, ML_PER_CUP, OUNCES_PER_POUND, ML_PER_TBSP, ML_PER_TSP, massToGrams, normaliseUnit, unitKind, volumeToMl } from './units';

export type UnitSystem = 'us' | 'metric';

/** More items than this reads better as a volume or a weight (two dozen; *common practice*). */
const MAX_COUNT = 24;
/**
 * Household weights are averages: 152 g of egg is three large eggs, not four. A count only rounds up
 * past this share of an item.
 */
const COUNT_SLACK = 0.1;
/** Loose foods up to this many cups are bought by the cup; more by weight. */
const MAX_CUPS = 4;

const SIZE_WORDS = ['extra large', 'extra small', 'large', 'medium', 'small', 'jumbo'];
/** Measures that mean "one of the food" without naming it. */
const WHOLE_WORDS = ['whole', 'each', 'item', 'fruit'];
/** Measures that name the counted piece, bought or used whole. Slices, pieces and strips are cut, not bought. */
const COUNT_NOUNS = [
  'clove',
  'tortilla',
  'egg',
  'ear',
  'head',
  'bulb',
  'link',
  'patty',
  'fillet',
  'breast',
  'thigh',
  'drumstick',
  'wing',
  'leg',
  'bun',
  'roll',
  'bagel',
  'muffin',
  'pita',
  'stick',
  'stalk',
  'potato',
  'onion',
  'pepper',
  'carrot',
  'banana',
  'apple',
  'lemon',
  'lime',
  'avocado',
  'sausage',
  'chop',
];

/** The measure without its parenthetical or its preparation: "medium (2-1/2" dia)" → "medium", "cup, shredded" → "cup". */
function measureHead(measure: string): string {
  return measure
    .toLowerCase()
    .replace(/\([^)]*\)?/g, ' ')
    .split(',')[0]
    .replace(/\s+/g, ' ')
    .trim();
}

function singular(word: string): string {
  if (/(ss|us)$/.test(word)) return word;
  if (/ies$/.test(word)) return word.replace(/ies$/, 'y');
  if (/(oes|ches|shes|xes)$/.test(word)) return word.replace(/es$/, '');
  return word.replace(/s$/, '');
}

function plural(word: string): string {
  if (/(ss|us)$/.test(word)) return word;
  if (/s$/.test(word)) return word;
  if (/[^aeiou]y$/.test(word)) return word.replace(/y$/, 'ies');
  if (/(ch|sh|x)$/.test(word) || /(potato|tomato)$/.test(word)) return `${word}es`;
  return `${word}s`;
}

/** Singular or plural of a noun phrase for a count ("egg" → "eggs"; "patties" for 2, "patty" for 1). */
function forCount(noun: string, n: number): string {
  const words = noun.split(' ');
  const last = words.pop() ?? '';
  words.push(n === 1 ? singular(last) : plural(singular(last)));
  return words.join(' ');
}

/** The noun a food is counted by, from the head of its name: "Egg, whole, raw, fresh" → "egg". */
function nounOf(foodName: string | undefined): string | null {
  if (!foodName) return null;
  const head = foodName.split(',')[0].trim().toLowerCase();
  return head === '' ? null : head;
}

interface CountPortion {
  /** "large", "" for whole words, or the counted piece's noun */
  size: string;
  noun: string | null;
  gramsEach: number;
}

function asCountPortion(p: Portion): CountPortion | null {
  if (!(p.grams > 0) || !(p.amount > 0)) return null;
  const head = measureHead(p.measure);
  const gramsEach = p.grams / p.amount;
  const size = SIZE_WORDS.find((s) => head === s || head.startsWith(`${s} `));
  if (size) return { size, noun: null, gramsEach };
  const first = head.split(' ')[0] ?? '';
  if (WHOLE_WORDS.includes(first)) return { size: '', noun: null, gramsEach };
  const piece = singular(first);
  if (COUNT_NOUNS.includes(piece)) return { size: '', noun: piece, gramsEach };
  return null;
}

/** Large first (US recipes are written for large eggs; *common practice*), then medium, then the first listed. */
function pickCountPortion(portions: readonly Portion[]): CountPortion | null {
  const counts = portions.map(asCountPortion).filter((c): c is CountPortion => c !== null);
  return counts.find((c) => c.size === 'large') ?? counts.find((c) => c.size === 'medium') ?? counts[0] ?? null;
}

function countHint(grams: number, portions: readonly Portion[], foodName: string | undefined): string | null {
  const portion = pickCountPortion(portions);
  if (!portion) return null;
  const exact = grams / portion.gramsEach;
  if (exact > MAX_COUNT) return null;
  const n = Math.max(1, Math.ceil(exact - COUNT_SLACK));
  if (portion.noun) return `${n} ${forCount(portion.noun, n)}`;
  const noun = nounOf(foodName);
  const words = [String(n), portion.size, noun ? forCount(noun, n) : portion.size ? '' : 'whole'];
  return words.filter(Boolean).join(' ');
}

/** Grams per mL from the food's volume portions, cups first: the larger measure weighs more precisely. */
function gramsPerMl(portions: readonly Portion[]): number | null {
  let best: { gPerMl: number; isCup: boolean } | null = null;
  for (const p of portions) {
    if (!(p.grams > 0) || !(p.amount > 0)) continue;
    const head = measureHead(p.measure);
    const unit = normaliseUnit(head.split(' ').slice(0, 2).join(' ')) ?? normaliseUnit(head.split(' ')[0]);
    const ml = unit ? volumeToMl(p.amount, unit) : null;
    if (!ml) continue;
    const isCup = unit === 'cup';
    if (!best || (isCup && !best.isCup)) best = { gPerMl: p.grams / ml, isCup };
  }
  return best?.gPerMl ?? null;
}

/** 1.75 → "1 3/4"; 0.5 → "1/2"; 2 → "2". Only the quarters, halves and wholes the hints round to. */
/** 1.75 → "1 3/4": the nearest quarter (callers round to halves or quarters first). */
function fraction(x: number): string {
  return kitchenQuantity(roundHalfUp(x, 0.25));
}

function volumeHint(grams: number, portions: readonly Portion[], unitSystem: UnitSystem): string | null {
  const density = gramsPerMl(portions);
  if (!density) return null;
  const ml = grams / density;
  const tbsp = ml / ML_PER_TBSP;
  if (tbsp < 4) {
    const halves = roundHalfUp(tbsp, 0.5);
    if (halves >= 1) return `about ${fraction(halves)} tbsp`;
    const quarters = roundHalfUp(ml / ML_PER_TSP, 0.25);
    return quarters >= 0.25 ? `about ${fraction(quarters)} tsp` : 'a pinch';
  }
  // metric shoppers buy loose foods by weight
  if (unitSystem === 'metric') return null;
  const cups = roundHalfUp(ml / ML_PER_CUP, 0.25);
  if (cups > MAX_CUPS) return null;
  return `about ${fraction(cups)} ${measureWord('cup', cups)}`;
}

function ceilToStep(x: number, step: number): number {
  const units = Number((x / step).toPrecision(12));
  return Number((Math.ceil(units) * step).toPrecision(12));
}

/**
 * A weight to buy: whole ounces and pounds (NIST Handbook 44), rounded up; or "about" grams (to 5 g under
 * 100 g, to 10 g under 1 kg) and kilograms (to 0.1 kg), rounded to the nearest.
 */
export function purchaseWeight(grams: number, unitSystem: UnitSystem): string {
  if (unitSystem === 'us') {
    const ounces = grams / GRAMS_PER_OUNCE;
    if (ounces < 1) return 'under 1 oz';
    const whole = ceilToStep(ounces, 1);
    const lb = Math.floor(whole / OUNCES_PER_POUND);
    const oz = whole - lb * OUNCES_PER_POUND;
    if (lb === 0) return `${oz} oz`;
    return oz === 0 ? `${lb} lb` : `${lb} lb ${oz} oz`;
  }
  if (grams < 2.5) return 'under 5 g';
  const rounded = roundHalfUp(grams, grams < 100 ? 5 : 10);
  if (rounded < 1000) return `about ${rounded} g`;
  return `about ${roundHalfUp(grams / 1000, 0.1)} kg`;
}

/**
 * What to buy for `grams` of a food: a count of whole items for counted foods, cups or spoons for
 * loose foods (cups in US units only), else a weight. `foodName` names counted items ("3 large eggs").
 * Returns '' for 0 g: nothing to buy.
 */
export function purchaseHint(grams: number, portions: readonly Portion[], unitSystem: UnitSystem, foodName?: string): string {
  if (!Number.isFinite(grams) || grams < 0) throw new RangeError(`grams must be a finite number ≥ 0, got ${grams}`);
  if (grams === 0) return '';
  return countHint(grams, portions, foodName) ?? volumeHint(grams, portions, unitSystem) ?? purchaseWeight(grams, unitSystem);
}

/**
 * The measure a recipe line named, so a shopping line can say what the cook buys in the same
 * terms: "3 cans (6 oz)", "1 1/2 cups", "1 lb 8 oz", "4 cloves". `amount` is how many of `unit`
 * the line's grams are; scaling the grams scales it. Lines with the same `key` add up.
 */
export interface WrittenMeasure {
  key: string;
  kind: 'volume' | 'mass' | 'package' | 'piece';
  /** canonical unit id (units.ts); '' for a bare count ("2 onions") */
  unit: string;
  /** the package size as written, "6 oz" */
  sizeText: string | null;
  /** the counted noun when the unit does not name it: "egg" for "3 large eggs", "onion" for "2 onions" */
  noun: string | null;
  amount: number;
}

/** Bought sealed: a cook buys whole ones and uses part. */
const PACKAGE_UNITS = new Set(['can', 'package', 'box', 'bag', 'jar', 'bottle', 'container', 'envelope', 'sleeve', 'loaf', 'bar']);
const SIZE_UNITS = new Set(['large', 'medium', 'small', 'extra-large', 'jumbo']);
const PACKAGE_HEAD = /^(can|tin|jar|package|pkg|bag|box|bottle|carton|container)s?\s+(?:of\s+)?/i;

const UNIT_WORDS: Record<string, [string, string]> = {
  can: ['can', 'cans'],
  package: ['package', 'packages'],
  box: ['box', 'boxes'],
  bag: ['bag', 'bags'],
  jar: ['jar', 'jars'],
  bottle: ['bottle', 'bottles'],
  container: ['container', 'containers'],
  envelope: ['envelope', 'envelopes'],
  sleeve: ['sleeve', 'sleeves'],
  loaf: ['loaf', 'loaves'],
  bar: ['bar', 'bars'],
  'extra-large': ['extra-large', 'extra-large'],
};

function unitWord(unit: string, n: number): string {
  const pair = UNIT_WORDS[unit];
  if (pair) return n === 1 ? pair[0] : pair[1];
  if (SIZE_UNITS.has(unit)) return unit;
  return n === 1 ? unit : plural(unit);
}

/** What a parsed line says about its amount, enough to restate it (a subset of ParsedLine). */
export interface MeasuredLine {
  quantity: number | null;
  unit: string | null;
  name: string;
  size: { quantity: number; unit: string } | null;
  sizeText: string | null;
}

/**
 * The measure a line named, for `grams` (the grams that text weighs). Null when the line gives no
 * amount or nothing could be weighed: the shopping line then falls back to household weights.
 */
export function writtenMeasure(line: MeasuredLine, grams: number): WrittenMeasure | null {
  const q = line.quantity;
  if (q === null || !(q > 0) || !(grams > 0)) return null;
  const unit = line.unit ?? '';
  const kind = unit ? unitKind(unit) : 'count';
  const make = (k: WrittenMeasure['kind'], u: string, sizeText: string | null, noun: string | null): WrittenMeasure => ({
    key: JSON.stringify([k, u, sizeText, noun]),
    kind: k,
    unit: u,
    sizeText,
    noun,
    amount: q,
  });
  // "14.5 oz can of tomatoes" names a can of that size.
  const packageHead = PACKAGE_HEAD.exec(line.name);
  if (kind === 'mass' && packageHead) {
    const pkg = normaliseUnit(packageHead[1]) ?? 'can';
    return { ...make('package', pkg, `${trimNumber(q)} ${unit}`, null), key: JSON.stringify(['package', pkg, `${trimNumber(q)} ${unit}`, null]), amount: 1 };
  }
  if (kind === 'mass') return make('mass', unit, null, null);
  if (kind === 'volume') return make('volume', unit, null, null);
  if (PACKAGE_UNITS.has(unit)) return make('package', unit, line.sizeText, null);
  const noun = unit === '' || SIZE_UNITS.has(unit) ? nounOfPhrase(line.name) : null;
  if (unit === '' && !noun) return null;
  return make('piece', unit, null, noun);
}

function trimNumber(x: number): string {
  return String(Number(x.toFixed(2)));
}

/** "large eggs" → "egg"; "yellow onions" → "yellow onion". */
function nounOfPhrase(name: string): string | null {
  const words = name.trim().toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0 || words.length > 3) return null;
  words.push(singular(words.pop()!));
  return words.join(' ');
}

/** US volumes as a cook measures them: teaspoons under a tablespoon, tablespoons under ¼ cup, then cups; rounded up to the quarter. */
function usVolume(ml: number): string {
  if (ml < ML_PER_TBSP - 1e-9) {
    const tsp = ceilToStep(ml / ML_PER_TSP, 0.25);
    return `${fraction(tsp)} tsp`;
  }
  if (ml < ML_PER_CUP / 4 - 1e-9) {
    const tbsp = ceilToStep(ml / ML_PER_TBSP, 0.5);
    return `${fraction(tbsp)} tbsp`;
  }
  const cups = ceilToStep(ml / ML_PER_CUP, 0.25);
  return `${fraction(cups)} ${measureWord('cup', cups)}`;
}

/** Metric volumes: to 5 mL under 100 mL, 10 mL under 1 L, then 0.1 L; rounded up. */
function metricVolume(ml: number): string {
  if (ml < 100) return `${Math.max(5, ceilToStep(ml, 5))} mL`;
  if (ml < 1000) return `${ceilToStep(ml, 10)} mL`;
  return `${ceilToStep(ml / 1000, 0.1)} L`;
}

const METRIC_VOLUMES = new Set(['ml', 'cl', 'dl', 'l']);
const METRIC_MASSES = new Set(['g', 'kg', 'mg']);
const TINY_VOLUMES = new Set(['pinch', 'dash', 'smidgen', 'drop']);

/** Whole items to buy for `amount` of them: up past a tenth of one (household weights are averages). */
function wholeCount(amount: number): number {
  return Math.max(1, Math.ceil(ceilToStep(amount, 0.001) - COUNT_SLACK));
}

/**
 * What to buy for a measure, in the measure's own terms and unit system: packages whole (with the
 * share used when it is not all of them), volumes and weights rounded up so the list never comes up
 * short, pieces counted. Volume conversions are exact (NIST Handbook 44: 1 tbsp = 3 tsp, 1 cup = 16 tbsp).
 */
export function measureHint(measure: WrittenMeasure): string {
  const { amount, unit } = measure;
  if (!(amount > 0)) return '';
  switch (measure.kind) {
    case 'volume': {
      if (TINY_VOLUMES.has(unit)) {
        const n = wholeCount(amount);
        return n === 1 ? `a ${unit}` : `${n} ${unit === 'dash' ? 'dashes' : plural(unit)}`;
      }
      const ml = volumeToMl(amount, unit) ?? 0;
      return METRIC_VOLUMES.has(unit) ? metricVolume(ml) : usVolume(ml);
    }
    case 'mass': {
      const grams = massToGrams(amount, unit) ?? 0;
      return purchaseWeight(grams, METRIC_MASSES.has(unit) ? 'metric' : 'us');
    }
    case 'package': {
      const n = wholeCount(amount);
      const size = measure.sizeText ? ` (${measure.sizeText})` : '';
      const used = Math.abs(n - amount) > 0.05 ? `; uses ${fraction(roundHalfUp(amount, 0.25))}` : '';
      return `${n} ${unitWord(unit, n)}${size}${used}`;
    }
    case 'piece': {
      const n = wholeCount(amount);
      const noun = measure.noun ? forCount(measure.noun, n) : '';
      return [String(n), unit ? unitWord(unit, n) : '', noun].filter(Boolean).join(' ');
    }
  }
}
