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
import { GRAMS_PER_OUNCE, ML_PER_CUP, ML_PER_TBSP, ML_PER_TSP, normaliseUnit, volumeToMl } from './units';

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
const OUNCES_PER_POUND = 16;

const SIZE_WORDS = ['extra large', 'extra small', 'large', 'medium', 'small', 'jumbo'];
/** Measures that mean "one of the food" without naming it. */
const WHOLE_WORDS = ['whole', 'each', 'item', 'fruit'];
/** Measures that name the counted piece, bought or used whole. Slices, pieces and strips are cut, not bought. */
const COUNT_NOUNS = [
  'clove', 'tortilla', 'egg', 'ear', 'head', 'bulb', 'link', 'patty', 'fillet', 'breast', 'thigh',
  'drumstick', 'wing', 'leg', 'bun', 'roll', 'bagel', 'muffin', 'pita', 'stick', 'stalk', 'potato',
  'onion', 'pepper', 'carrot', 'banana', 'apple', 'lemon', 'lime', 'avocado', 'sausage', 'chop',
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
function fraction(x: number): string {
  const whole = Math.floor(x + 1e-9);
  const part = roundHalfUp(x - whole, 0.25);
  const frac = { 0: '', 0.25: '1/4', 0.5: '1/2', 0.75: '3/4' }[part as 0 | 0.25 | 0.5 | 0.75] ?? '';
  if (whole === 0) return frac || '0';
  return frac ? `${whole} ${frac}` : String(whole);
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
  return `about ${fraction(cups)} ${cups > 1 ? 'cups' : 'cup'}`;
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
export function purchaseHint(
  grams: number,
  portions: readonly Portion[],
  unitSystem: UnitSystem,
  foodName?: string,
): string {
  if (!Number.isFinite(grams) || grams < 0) throw new RangeError(`grams must be a finite number ≥ 0, got ${grams}`);
  if (grams === 0) return '';
  return countHint(grams, portions, foodName) ?? volumeHint(grams, portions, unitSystem) ?? purchaseWeight(grams, unitSystem);
}
