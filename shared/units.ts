/**
 * Units of measure for recipe lines: canonical ids, their spellings, and exact conversions.
 *
 * Mass and volume factors are the exact values of NIST Handbook 44, Appendix C (the US customary
 * system is defined from the international yard and pound of 1959 and the 231 in³ US gallon).
 * Pinch, dash, smidgen and drop have no legal definition; their volumes are common practice.
 * Count and household units ("clove", "slice", "large", "can") have no fixed size: the server
 * weighs them with the food's household portions.
 */

export type UnitKind = 'mass' | 'volume' | 'count';

/** Where a unit's factor comes from. */
export type UnitBasis = 'nist-exact' | 'metric-exact' | 'common-practice' | 'household';

export interface UnitDef {
  id: string;
  kind: UnitKind;
  /** grams per unit (mass units) */
  grams?: number;
  /** millilitres per unit (volume units) */
  ml?: number;
  basis: UnitBasis;
  /** spellings matched without regard to case */
  spellings: readonly string[];
  /** spellings whose case matters: "T" is a tablespoon, "t" a teaspoon */
  caseSensitive?: readonly string[];
}

// NIST Handbook 44 Appendix C, exact.
export const GRAMS_PER_POUND = 453.59237;
export const GRAMS_PER_OUNCE = 28.349523125;
export const OUNCES_PER_POUND = 16;
export const KG_PER_POUND = GRAMS_PER_POUND / 1000;
export const CM_PER_INCH = 2.54;
export const INCHES_PER_FOOT = 12;
export const ML_PER_GALLON = 3785.411784;
export const ML_PER_QUART = 946.352946;
export const ML_PER_PINT = 473.176473;
export const ML_PER_CUP = 236.5882365;
export const ML_PER_FL_OZ = 29.5735295625;
export const ML_PER_TBSP = 14.78676478125;
export const ML_PER_TSP = 4.92892159375;

// Common practice: a dash is 1/8 tsp, a pinch 1/16 tsp, a smidgen 1/32 tsp; a drop about 0.05 mL.
export const ML_PER_DASH = ML_PER_TSP / 8;
export const ML_PER_PINCH = ML_PER_TSP / 16;
export const ML_PER_SMIDGEN = ML_PER_TSP / 32;
export const ML_PER_DROP = 0.05;

const mass = (id: string, grams: number, basis: UnitBasis, spellings: string[]): UnitDef => ({
  id,
  kind: 'mass',
  grams,
  basis,
  spellings,
});
const volume = (id: string, ml: number, basis: UnitBasis, spellings: string[], caseSensitive?: string[]): UnitDef => ({
  id,
  kind: 'volume',
  ml,
  basis,
  spellings,
  caseSensitive,
});
const count = (id: string, spellings: string[]): UnitDef => ({
  id,
  kind: 'count',
  basis: 'household',
  spellings,
});

export const UNITS: readonly UnitDef[] = [
  mass('g', 1, 'metric-exact', ['g', 'gs', 'gm', 'gms', 'gr', 'gram', 'grams', 'gramme', 'grammes']),
  mass('kg', 1000, 'metric-exact', ['kg', 'kgs', 'kilo', 'kilos', 'kilogram', 'kilograms', 'kilogramme']),
  mass('mg', 0.001, 'metric-exact', ['mg', 'mgs', 'milligram', 'milligrams']),
  mass('oz', GRAMS_PER_OUNCE, 'nist-exact', ['oz', 'ozs', 'ounce', 'ounces', 'onz']),
  mass('lb', GRAMS_PER_POUND, 'nist-exact', ['lb', 'lbs', 'pound', 'pounds', '#', 'ib', 'ibs']),

  volume('ml', 1, 'metric-exact', ['ml', 'mls', 'millilitre', 'millilitres', 'milliliter', 'milliliters', 'cc']),
  volume('cl', 10, 'metric-exact', ['cl', 'centilitre', 'centilitres', 'centiliter', 'centiliters']),
  volume('dl', 100, 'metric-exact', ['dl', 'decilitre', 'decilitres', 'deciliter', 'deciliters']),
  volume('l', 1000, 'metric-exact', ['l', 'ltr', 'ltrs', 'litre', 'litres', 'liter', 'liters']),
  volume('tsp', ML_PER_TSP, 'nist-exact', ['tsp', 'tsps', 'tspn', 'tspns', 'teaspoon', 'teaspoons', 'teaspoonful', 'teaspoonfuls', 'teasp'], ['t', 'ts']),
  volume(
    'tbsp',
    ML_PER_TBSP,
    'nist-exact',
    ['tbsp', 'tbsps', 'tbs', 'tbl', 'tbls', 'tblsp', 'tblsps', 'tblspn', 'tbsn', 'tablespoon', 'tablespoons', 'tablespoonful', 'tablespoonfuls', 'tablesp'],
    ['T', 'Tb', 'TB'],
  ),
  volume('cup', ML_PER_CUP, 'nist-exact', ['c', 'cup', 'cups', 'cupful', 'cupfuls']),
  volume('fl-oz', ML_PER_FL_OZ, 'nist-exact', [
    'fl oz',
    'fl. oz',
    'fl.oz',
    'floz',
    'fl-oz',
    'fl ounce',
    'fl ounces',
    'fluid oz',
    'fluid ounce',
    'fluid ounces',
    'fluid-ounce',
    'fluid-ounces',
    'fluidounce',
    'fluidounces',
  ]),
  volume('pint', ML_PER_PINT, 'nist-exact', ['pt', 'pts', 'pint', 'pints']),
  volume('quart', ML_PER_QUART, 'nist-exact', ['qt', 'qts', 'quart', 'quarts']),
  volume('gallon', ML_PER_GALLON, 'nist-exact', ['gal', 'gals', 'gallon', 'gallons']),
  volume('dash', ML_PER_DASH, 'common-practice', ['dash', 'dashes']),
  volume('pinch', ML_PER_PINCH, 'common-practice', ['pinch', 'pinches', 'pn']),
  volume('smidgen', ML_PER_SMIDGEN, 'common-practice', ['smidgen', 'smidgens', 'smidge']),
  volume('drop', ML_PER_DROP, 'common-practice', ['drop', 'drops']),

  // Sizes of a counted food ("2 large eggs"): weighed by the food's household portions.
  count('large', ['large', 'lg', 'lge', 'lrg', 'big']),
  count('medium', ['medium', 'md', 'med', 'mdm']),
  count('small', ['small', 'sm', 'sml']),
  count('extra-large', ['extra-large', 'extra large', 'xl', 'x-large']),
  count('jumbo', ['jumbo']),
  // Household pieces.
  count('clove', ['clove', 'cloves']),
  count('slice', ['slice', 'slices', 'slc']),
  count('can', ['can', 'cans', 'tin', 'tins']),
  count('stick', ['stick', 'sticks']),
  count('package', ['package', 'packages', 'pkg', 'pkgs', 'pk', 'pack', 'packs', 'packet', 'packets']),
  count('bunch', ['bunch', 'bunches', 'bnch', 'bundle', 'bundles']),
  count('sprig', ['sprig', 'sprigs']),
  count('head', ['head', 'heads']),
  count('stalk', ['stalk', 'stalks', 'rib', 'ribs']),
  count('ear', ['ear', 'ears']),
  count('piece', ['piece', 'pieces', 'pc', 'pcs', 'chunk', 'chunks']),
  count('sheet', ['sheet', 'sheets']),
  count('handful', ['handful', 'handfuls']),
  count('splash', ['splash', 'splashes']),
  count('drizzle', ['drizzle', 'drizzles']),
  count('block', ['block', 'blocks']),
  count('bulb', ['bulb', 'bulbs']),
  count('loaf', ['loaf', 'loaves']),
  count('scoop', ['scoop', 'scoops']),
  count('stem', ['stem', 'stems']),
  count('leaf', ['leaf', 'leaves']),
  count('knob', ['knob', 'knobs']),
  count('wedge', ['wedge', 'wedges']),
  count('box', ['box', 'boxes']),
  count('bag', ['bag', 'bags']),
  count('jar', ['jar', 'jars']),
  count('bottle', ['bottle', 'bottles']),
  count('container', ['container', 'containers', 'tub', 'tubs', 'carton', 'cartons']),
  count('envelope', ['envelope', 'envelopes', 'sachet', 'sachets']),
  count('cube', ['cube', 'cubes']),
  count('ball', ['ball', 'balls']),
  count('strip', ['strip', 'strips', 'rasher', 'rashers']),
  count('fillet', ['fillet', 'fillets', 'filet', 'filets']),
  count('sleeve', ['sleeve', 'sleeves']),
  count('spear', ['spear', 'spears']),
  count('pod', ['pod', 'pods']),
  count('link', ['link', 'links']),
  count('square', ['square', 'squares']),
  count('bar', ['bar', 'bars']),
  count('pat', ['pat', 'pats']),
  count('serving', ['serving', 'servings', 'portion', 'portions']),
  count('part', ['part', 'parts']),
  count('shot', ['shot', 'shots', 'jigger', 'jiggers']),
  count('round', ['round', 'rounds']),
  count('batch', ['batch', 'batches']),
  count('recipe', ['recipe', 'recipes']),
  count('dozen', ['dozen', 'dozens', 'doz', 'dz']),
  // Lengths ("a 1-inch piece of ginger", "2 cm ginger") describe a household piece, not a volume.
  count('inch', ['inch', 'inches', 'in', '"']),
  count('cm', ['cm', 'cms', 'centimetre', 'centimetres', 'centimeter', 'centimeters']),
];

const UNIT_BY_ID = new Map(UNITS.map((u) => [u.id, u]));
const EXACT_SPELLINGS = new Map<string, string>();
const FOLDED_SPELLINGS = new Map<string, string>();
for (const u of UNITS) {
  for (const s of u.caseSensitive ?? []) EXACT_SPELLINGS.set(s, u.id);
  for (const s of u.spellings) FOLDED_SPELLINGS.set(s.toLowerCase(), u.id);
  FOLDED_SPELLINGS.set(u.id.toLowerCase(), u.id);
}

/** The longest unit spelling, in words; a unit phrase is never longer than this. */
export const MAX_UNIT_WORDS = Math.max(...UNITS.flatMap((u) => [...u.spellings, ...(u.caseSensitive ?? [])].map((s) => s.split(' ').length)));

/**
 * The canonical unit id of a spelling ("Tbsp." → "tbsp", "T" → "tbsp", "t" → "tsp",
 * "fluid ounces" → "fl-oz"), or null when the text is not a unit.
 */
export function normaliseUnit(text: string | null | undefined): string | null {
  if (typeof text !== 'string') return null;
  const trimmed = text.trim().replace(/\s+/g, ' ');
  if (trimmed === '' || trimmed.length > 24) return null;
  const candidates = [trimmed, trimmed.replace(/\.$/, ''), trimmed.replace(/\./g, '')];
  for (const c of candidates) {
    const exact = EXACT_SPELLINGS.get(c);
    if (exact) return exact;
  }
  for (const c of candidates) {
    // A lone "t" or "T" is only a unit through the case-sensitive table above.
    if (c.toLowerCase() === 't') continue;
    const folded = FOLDED_SPELLINGS.get(c.toLowerCase());
    if (folded) return folded;
  }
  return null;
}

export function getUnit(unit: string | null | undefined): UnitDef | null {
  if (!unit) return null;
  return UNIT_BY_ID.get(unit) ?? null;
}

export function unitKind(unit: string | null | undefined): UnitKind | null {
  return getUnit(unit)?.kind ?? null;
}

/** Grams in `quantity` of a mass unit, or null when the unit is not a mass unit. */
export function massToGrams(quantity: number, unit: string): number | null {
  const u = getUnit(unit);
  if (!u || u.kind !== 'mass' || u.grams === undefined || !Number.isFinite(quantity)) return null;
  return quantity * u.grams;
}

/** Millilitres in `quantity` of a volume unit, or null when the unit is not a volume unit. */
export function volumeToMl(quantity: number, unit: string): number | null {
  const u = getUnit(unit);
  if (!u || u.kind !== 'volume' || u.ml === undefined || !Number.isFinite(quantity)) return null;
  return quantity * u.ml;
}

/**
 * `quantity` of `from` expressed in `to` (same kind, both mass or both volume), or null.
 * Rounded to 12 significant digits so exact ratios (16 oz to the pound) stay exact.
 */
export function convertQuantity(quantity: number, from: string, to: string): number | null {
  const a = getUnit(from);
  const b = getUnit(to);
  if (!a || !b || a.kind !== b.kind || !Number.isFinite(quantity)) return null;
  const fa = a.kind === 'mass' ? a.grams : a.ml;
  const fb = b.kind === 'mass' ? b.grams : b.ml;
  if (fa === undefined || fb === undefined) return null;
  return Number(((quantity * fa) / fb).toPrecision(12));
}

/** True for units whose size is fixed by a standard (NIST or metric), not by common practice. */
export function isStandardUnit(unit: string | null | undefined): boolean {
  const u = getUnit(unit);
  return u !== null && (u.basis === 'nist-exact' || u.basis === 'metric-exact');
}
