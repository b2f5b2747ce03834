/**
 * Weigh a parsed ingredient line in grams (PRODUCT.md "The computation", step 3).
 *
 * - Mass units convert exactly (NIST Handbook 44, in shared/units.ts).
 * - Volume units convert to mL exactly, then to grams through the food's volume portion that fits the
 *   line best ("2 cups shredded mozzarella" → "1 cup, shredded" = 112 g), else the food's density.
 * - Counts and household pieces ("3 large eggs", "2 cloves garlic", "1 stick butter", "2 (8-inch)
 *   tortillas") use the household portions; a package with a stated size ("1 (15 oz) can") weighs
 *   its size.
 * Every line also gets its volume in mL (grams ÷ density when it was not given as a volume).
 * Nothing here throws or returns NaN, a negative or an infinite number.
 */
import type { CatalogueFood, Portion } from '../../shared/food';
import { recordFallback } from '../../shared/fallbacks';
import type { ParsedLine } from '../../shared/parse-line';
import { ML_PER_CUP, ML_PER_FL_OZ, massToGrams, normaliseUnit, unitKind, volumeToMl } from '../../shared/units';
import { inchesOf, parseMeasure, sizeWordOf, stem, type MeasureInfo, type SizeWord } from './measure-text';
import { words } from './normalise-phrase';
import { singular } from './singular';
import { isDrainedSolids } from './drained-share';
import { orChoices } from './or-choices';

export interface WeighedLine {
  grams: number;
  volumeMl: number | null;
  /** the household portion the grams came from, e.g. "1 cup, shredded" */
  portionUsed: string | null;
  warnings: string[];
}

export interface WeighOptions {
  /** size word a bare count of this food means ("large" for eggs); see countDefaultFor */
  countDefault?: string | null;
  /** volume portions of near foods, used when the food has none of its own (airy foods above all) */
  nearPortions?: Portion[];
  /** the line says drained: the share of the can kept, null when unknown */
  drained?: { share: number | null } | null;
}

export const WARNING_SET_AMOUNT = 'No amount given: set an amount to weigh this line.';
export const WARNING_NO_FOOD = 'No catalogue food matched: choose a food to weigh this line.';

interface ReadPortion {
  portion: Portion;
  info: MeasureInfo;
}

/** Qualifiers that describe the usual state of a measured food, not a preparation. */
const NEUTRAL_QUALIFIERS = new Set(['fluid', 'whole', 'ground', 'unsift', 'raw', 'not', 'purchased', 'as', 'yield', 'leaf', 'leaves']);
const NEUTRAL_UNLESS_SPICE = new Set([...NEUTRAL_QUALIFIERS].filter((q) => q !== 'ground'));
/** SR28's "Spices and Herbs" group. */
const SPICE_GROUP = '02';
/** Qualifiers whose cut sizes pack alike in a cup. */
const CUT_SMALL = new Set(['chop', 'dice', 'mince', 'cube']);
/** Grated and shredded are one cut in a cook's cup: the box grater's coarse holes (*common practice*). */
const GRATED = new Set(['grate', 'shred']);
/** Cuts and small parts of a food that a sized count ("1 md kohlrabi") never means, unless it names them. */
const CUT_PIECES = new Set([
  'slice',
  'strip',
  'ring',
  'rings',
  'wedge',
  'cube',
  'cubic',
  'spear',
  'floret',
  'leaf',
  'sprig',
  'pat',
  'dash',
  'inch',
  'section',
  'segment',
]);
/** Pieces of a food, never what a bare count ("2 onions") means: its cuts, and the containers and measures it comes in. */
const SUB_PIECES = new Set([
  ...CUT_PIECES,
  'stalk',
  'packet',
  'package',
  'container',
  'can',
  'bunch',
  'head',
  'pinch',
  'piece',
  'cup',
  'tbsp',
  'tsp',
  'stick',
  'jar',
  'bottle',
  'box',
  'bag',
  'envelope',
  'sheet',
  'enchilada',
  'serving',
  'pint',
  'quart',
  'order',
  'patty',
  'clove',
]);
/**
 * A can of beans or vegetables whose size the line leaves out: the 15 oz can (NIST Handbook 44: 425 g),
 * *common practice*; SR28 weighs the No. 303 can of canned vegetables at 423–482 g.
 */
const USUAL_CAN_GRAMS = 425;
const SIZE_UNITS = new Set(['large', 'medium', 'small', 'extra-large', 'jumbo']);

function finite(n: number): number {
  return Number.isFinite(n) && n > 0 ? n : 0;
}

function gramsText(g: number): string {
  return `${Number(g.toPrecision(4))} g`;
}

function read(portions: Portion[]): ReadPortion[] {
  return portions
    .filter((p) => p.grams > 0 && p.amount > 0 && Number.isFinite(p.grams) && Number.isFinite(p.amount))
    .map((portion) => ({ portion, info: parseMeasure(portion.measure) }));
}

/** Millilitres in one portion's measure, or null when it is not a volume. */
function portionMl(r: ReadPortion): number | null {
  if (r.info.kind !== 'volume' || !r.info.unit) return null;
  const ml = volumeToMl(r.portion.amount, r.info.unit);
  return ml !== null && ml > 0 ? ml : null;
}

/** "1 cup sugar, sifted": measured, then sifted (*common practice*); "1 cup sifted sugar" is sifted, then measured. */
const SIFTED_AFTER_MEASURING = /^[^,]*,.*\bsifted\b/i;
const SIFTED_BEFORE_MEASURING = /^[^,]*\bsifted\b/i;

function lineStems(parsed: ParsedLine): { prep: Set<string>; name: Set<string> } {
  const prep = new Set(words(`${parsed.preparation ?? ''} ${parsed.comment ?? ''}`).map(stem));
  if (prep.has('sift') && SIFTED_AFTER_MEASURING.test(parsed.input) && !SIFTED_BEFORE_MEASURING.test(parsed.input)) {
    prep.delete('sift');
    prep.add('unsift');
  }
  const name = new Set(words(parsed.name ?? '').map(stem));
  // "almond flour", "flax meal": the food ground.
  if (name.has('flour') || name.has('meal')) name.add('ground');
  return { prep, name };
}

/**
 * The volume portion that fits the line best: one whose measure names the line's preparation
 * ("cup, shredded" for shredded cheese), else a plain one, in the line's own unit when there is one.
 */
function bestVolumePortion(all: ReadPortion[], parsed: ParsedLine, unit: string | null, food: CatalogueFood | null): { r: ReadPortion; gPerMl: number } | null {
  const { prep, name } = lineStems(parsed);
  // A spice is measured ground ("1 tsp, ground"); nuts ground are a preparation the line must ask for.
  const neutral = !food || food.foodGroup === SPICE_GROUP ? NEUTRAL_QUALIFIERS : NEUTRAL_UNLESS_SPICE;
  const prepCut = [...prep].some((s) => CUT_SMALL.has(s));
  const prepGrated = [...prep, ...name].some((s) => GRATED.has(s));
  let best: { r: ReadPortion; gPerMl: number; score: number } | null = null;
  for (const r of all) {
    const ml = portionMl(r);
    if (ml === null) continue;
    // The best-fitting qualifier counts; one that fits nothing costs a little ("cup, whipped" for cream).
    let fit = 0;
    let misfit = 0;
    for (const q of r.info.qualifiers) {
      if (prep.has(q)) fit = Math.max(fit, 2);
      else if (prepCut && CUT_SMALL.has(q)) fit = Math.max(fit, 1.5);
      else if (prepGrated && GRATED.has(q)) fit = Math.max(fit, 1.5);
      else if (name.has(q)) fit = Math.max(fit, 1);
      else if (neutral.has(q)) continue;
      else misfit += q === 'pack' ? 0.2 : 0.5;
    }
    let score = fit - misfit;
    if (unit && r.info.unit === unit) score += 0.3;
    else if (!unit && r.info.unit === 'cup') score += 0.3;
    if (r.portion.amount === 1) score += 0.05;
    if (!best || score > best.score) best = { r, gPerMl: r.portion.grams / ml, score };
  }
  return best ? { r: best.r, gPerMl: best.gPerMl } : null;
}

interface CountAsk {
  size: SizeWord | null;
  piece: string | null;
  diameter: number | null;
  /** "3 thin slices of tomato": the thickness a counted slice asks for */
  thickness: 'thin' | 'thick' | null;
  /** the words of the choice the food was matched from, when the line names several ("bird's eye chile or serrano chile") */
  choiceWords: Set<string> | null;
}

/** "3 thin slices", "1 thick slice", "2 thinly cut slices": the thickness written before the slices. */
const SLICE_THICKNESS = /\b(thin|thick)(?:ly)?(?:\s+(?:cut|sliced))?\s+(?:slices?|rounds?)\b/i;

const THICKNESS_WORD = { thin: /\bthin\b/i, thick: /\bthick\b/i } as const;
const THICKNESS_SIZE = { thin: 'small', thick: 'large' } as const;

/**
 * How well a slice portion fits a thin or thick slice: SR28 names the thickness ("slice, thin/small",
 * "slice, thick/large (1/2" thick)"), or gives slices of stated thickness by size ("slice, large (1/4" thick)").
 */
function thicknessFit(r: ReadPortion, thickness: 'thin' | 'thick'): number {
  const measure = r.portion.measure;
  if (THICKNESS_WORD[thickness].test(measure.replace(/\([^)]*\)?/g, ' '))) return 2.5;
  return /"\s*thick\b/i.test(measure) && r.info.size === THICKNESS_SIZE[thickness] ? 2 : 0;
}

/** The words of the line's choice that names the food best: a kind of another choice is not this food's piece. */
function matchedChoiceWords(parsed: ParsedLine, food: CatalogueFood | null): Set<string> | null {
  const choices = food && parsed.name ? orChoices(parsed.name) : [];
  if (!food || choices.length < 2) return null;
  const foodWords = new Set(words(food.name).map(singular));
  let best: { words: string[]; shared: number } | null = null;
  for (const ways of choices) {
    const ws = words(ways[0]).map(singular);
    const shared = ws.filter((w) => foodWords.has(w)).length;
    if (!best || shared > best.shared) best = { words: ws, shared };
  }
  return best ? new Set(best.words) : null;
}

function countAsk(parsed: ParsedLine, food: CatalogueFood | null): CountAsk {
  const unit = parsed.unit;
  const size = (unit && SIZE_UNITS.has(unit) ? sizeWordOf(unit) : null) ?? sizeWordOf(parsed.sizeText);
  const piece = unit && !SIZE_UNITS.has(unit) && unitKind(unit) === 'count' ? unit : null;
  const diameter = inchesOf(parsed.sizeText);
  const thick = piece === 'slice' ? SLICE_THICKNESS.exec(parsed.input) : null;
  const thickness = thick ? (thick[1].toLowerCase() as 'thin' | 'thick') : null;
  return { size, piece, diameter, thickness, choiceWords: matchedChoiceWords(parsed, food) };
}

const SIZE_PREFERENCE: Record<SizeWord, number> = {
  medium: 1.5,
  large: 0.5,
  small: 0.2,
  'extra-large': 0,
  jumbo: 0,
  'extra-small': -0.2,
};

/**
 * Words for a kind of a food with its own piece, weighed by that portion only when the line names it:
 * "baby bok choy", "fingerling potatoes", "baguette slices", "romaine hearts", "habanero", "Thai chiles".
 */
const SMALLER_KINDS = new Set(['baby', 'fingerling', 'baguette', 'heart', 'habanero', 'bonnet', 'fresno', 'thai', 'bird', 'guajillo', 'pasilla', 'cascabel']);

/** Piece words that mean the food itself when a recipe counts it: "1 fruit" is one lemon. */
const WHOLE_PIECES = new Set(['whole', 'fruit', 'each', 'item', 'medium', 'large', 'small']);

/** Pieces a household measure may name for the unit a recipe wrote: "4 strips bacon" → "slice raw". */
const PIECE_EQUIVALENTS: Record<string, string[]> = {
  strip: ['slice'],
  slice: ['strip'],
  fillet: ['piece'],
  link: ['piece', 'sausage'],
  piece: ['each'],
  ball: ['piece'],
  square: ['piece'],
  block: ['package'],
  // "4 stems mint", "3 stalks fresh mint": an herb's stem is a sprig (*common practice*).
  stem: ['sprig'],
  stalk: ['sprig'],
};

/** Pieces a line may name that SR28 names otherwise: "4 hamburger buns" → "1 roll". */
const NAME_PIECE_SYNONYMS: Record<string, string> = { bun: 'roll', roll: 'bun' };

/** A counted unit SR28 may not name, weighed as the whole food when no portion names it: "4 stalks scallions". */
const WHOLE_FOOD_UNITS = new Set(['stalk', 'ear', 'whole']);

/** SR28's other spellings of a piece: "1 floweret" of cauliflower is a floret. */
const PIECE_SPELLINGS: Record<string, string> = { floweret: 'floret' };

/** A piece word as units.ts spells it: "packet" → "package", "ribs" → "stalk". */
function pieceId(word: string): string {
  if (PIECE_SPELLINGS[word]) return PIECE_SPELLINGS[word];
  const unit = normaliseUnit(word);
  return unit && unitKind(unit) === 'count' ? unit : word;
}

/** The count portion that fits the line; `guessed` when the line left its size open. */
function bestCountPortion(all: ReadPortion[], ask: CountAsk, countDefault: string | null, nameWords: Set<string>): { r: ReadPortion; guessed: boolean } | null {
  const found = scoreCountPortions(all, ask, countDefault, nameWords);
  if (found || !ask.piece || !WHOLE_FOOD_UNITS.has(ask.piece)) return found;
  const whole = scoreCountPortions(all, { ...ask, piece: null }, countDefault, nameWords);
  return whole ? { r: whole.r, guessed: true } : null;
}

function scoreCountPortions(
  all: ReadPortion[],
  ask: CountAsk,
  countDefault: string | null,
  nameWords: Set<string>,
): { r: ReadPortion; guessed: boolean } | null {
  let best: { r: ReadPortion; score: number } | null = null;
  for (const r of all) {
    if (r.info.kind !== 'count') continue;
    if (r.info.serving) {
      // A label serving ("1 serving", "1 NLEA serving") stands for one piece only when nothing else does.
      if (ask.piece && ask.piece !== 'serving' && ask.piece !== 'piece') continue;
      if (!best) best = { r, score: -10 };
      continue;
    }
    const pieces = r.info.pieces.map(pieceId);
    let score = 0;
    // A smaller kind of the food ("1 head, baby" of bok choy) fits only a line that names it, and then best.
    const kind = pieces.find((p) => SMALLER_KINDS.has(p));
    if (kind !== undefined && !(ask.choiceWords ?? nameWords).has(kind)) continue;
    if (kind !== undefined) score += 5;
    if (ask.piece) {
      if (pieces.includes(ask.piece)) score += 4;
      else if ((PIECE_EQUIVALENTS[ask.piece] ?? []).some((p) => pieces.includes(p))) score += 3;
      else if (ask.piece === 'piece' || ask.piece === 'serving') score += 0;
      else continue;
    } else if (kind === undefined && pieces.some((p) => SUB_PIECES.has(p))) {
      if (pieces.includes('piece') && pieces.every((p) => p === 'piece' || WHOLE_PIECES.has(p))) score -= 0.5;
      // "1 md kohlrabi": a size word is the whole food's, never one slice of it.
      else if (ask.size && pieces.some((p) => CUT_PIECES.has(p)) && !pieces.some((p) => named(p, nameWords))) continue;
      // "2 romaine lettuce": a head is the whole food, its leaves the least likely piece.
      else score -= pieces.includes('leaf') ? 3.5 : 3;
    }
    if (ask.size) {
      if (r.info.size === ask.size) score += 3;
      else if (r.info.size) score -= 2;
      else score -= 0.5;
    } else if (countDefault && r.info.size === countDefault) score += 3;
    else if (r.info.size) score += SIZE_PREFERENCE[r.info.size];
    // USDA's unsized piece named like the food ("1 tortilla") is its usual one.
    else score += pieces.length > 0 && pieces.every((p) => named(p, nameWords)) ? 1.6 : 1;
    if (ask.thickness) score += thicknessFit(r, ask.thickness);
    if (ask.diameter !== null) {
      const d = r.info.diameter;
      if (d) {
        const off = ask.diameter < d.lo ? d.lo - ask.diameter : ask.diameter > d.hi ? ask.diameter - d.hi : 0;
        score += 3 - Math.min(4, off);
      } else score -= 1;
    }
    if (!best || score > best.score) best = { r, score };
  }
  if (!best) return null;
  const chosen = best.r;
  let guessed: boolean;
  if (ask.size !== null) guessed = chosen.info.size !== ask.size;
  else if (ask.diameter !== null) {
    const d = chosen.info.diameter;
    guessed = !d || ask.diameter < d.lo - 0.5 || ask.diameter > d.hi + 0.5;
  } else if (ask.piece !== null) guessed = chosen.info.size !== null && !(ask.thickness && thicknessFit(chosen, ask.thickness) > 0);
  else {
    // "2 chicken breasts" weighed as "1 piece": a portion the line did not name.
    const isNamed = chosen.info.pieces.map(pieceId).every((p) => WHOLE_PIECES.has(p) || named(p, nameWords));
    guessed = chosen.info.size !== null || !isNamed || chosen.info.serving;
  }
  // A kind the line named ("2 habanero chiles") is the size it asked for.
  if (ask.size === null && chosen.info.pieces.some((p) => SMALLER_KINDS.has(p))) guessed = false;
  if (chosen.info.serving) guessed = true;
  return { r: chosen, guessed };
}

function named(piece: string, nameWords: Set<string>): boolean {
  return nameWords.has(piece) || (NAME_PIECE_SYNONYMS[piece] !== undefined && nameWords.has(NAME_PIECE_SYNONYMS[piece]));
}

/** Pieces whose written inches are a length along a root or bark: "1 2-inch piece ginger", "1 (3-inch) cinnamon stick". */
const LENGTH_PIECES = new Set(['piece', 'knob', 'stick']);

/** A piece of stated length, weighed by the food's "1 inch" portion; null when either is missing. */
function lengthPiece(
  all: ReadPortion[],
  ask: CountAsk,
  nameWords: Set<string>,
): { r: ReadPortion; inches: number; gramsPerInch: number; guessed: boolean } | null {
  const byInch = ask.piece === 'inch';
  if (!byInch && !(ask.piece ? LENGTH_PIECES.has(ask.piece) : [...LENGTH_PIECES].some((p) => nameWords.has(p)))) return null;
  const inch = all.find((r) => r.info.kind === 'count' && r.info.pieces.length === 1 && r.info.pieces[0] === 'inch');
  if (!inch) return null;
  const gramsPerInch = inch.portion.grams / inch.portion.amount;
  // "2 inches ginger", "2-inch piece of ginger" (read as two inches): the count is the length.
  if (byInch) return { r: inch, inches: 1, gramsPerInch, guessed: false };
  if (ask.diameter !== null && ask.diameter > 0) return { r: inch, inches: ask.diameter, gramsPerInch, guessed: false };
  // "1 piece fresh ginger": a piece of no stated length is taken as an inch, and the cook told; a piece of
  // a food sold by the stick ("1 piece cassia") is a stick.
  const bySticks = all.some((r) => r.info.kind === 'count' && r.info.pieces.includes('stick'));
  return ask.piece === 'piece' && !bySticks ? { r: inch, inches: 1, gramsPerInch, guessed: true } : null;
}

/** Grams per mL for a food's volume, preparation considered; null when nothing gives one. */
function densityFor(all: ReadPortion[], parsed: ParsedLine, food: CatalogueFood | null, near: Portion[]): number | null {
  const v = bestVolumePortion(all, parsed, null, food) ?? bestVolumePortion(read(near), parsed, null, food);
  if (v && v.gPerMl > 0 && Number.isFinite(v.gPerMl)) return v.gPerMl;
  if (food && food.densityGPerMl > 0 && Number.isFinite(food.densityGPerMl)) return food.densityGPerMl;
  return null;
}

/** Packages whose stated size is each one's ("2 cans (15 oz)"), whatever SR28 weighs one at. */
const PACKAGE_PIECES = new Set(['can', 'jar', 'package', 'box', 'bag', 'bottle', 'container', 'envelope', 'block']);

/**
 * "2 sticks (16 tablespoons) butter", "2 sticks (8 oz)": a size after a counted piece that is the
 * whole amount, because it is nearer the pieces' SR28 weight all together than one piece's.
 */
function sizeIsTotal(parsed: ParsedLine, food: CatalogueFood | null, all: ReadPortion[], opts: WeighOptions, sizeGrams: number): boolean {
  const quantity = parsed.quantity ?? 0;
  if (!food || quantity <= 1 || !(sizeGrams > 0)) return false;
  const ask = countAsk(parsed, food);
  if (!ask.piece || PACKAGE_PIECES.has(ask.piece)) return false;
  const chosen = bestCountPortion(all, ask, opts.countDefault ?? null, new Set(words(parsed.name ?? '').map(singular)));
  if (!chosen || chosen.guessed) return false;
  const each = chosen.r.portion.grams / chosen.r.portion.amount;
  return Math.abs(sizeGrams - quantity * each) < Math.abs(sizeGrams - each);
}

/** A can's contents after draining, when the line says drained. */
function drainedGrams(grams: number, opts: WeighOptions, warnings: string[]): number {
  if (!opts.drained) return grams;
  if (opts.drained.share === null) {
    warnings.push('No drained weight is known for this food: weighed the whole can. Give the drained weight in grams for exact figures.');
    return grams;
  }
  return grams * opts.drained.share;
}

const JUICE = /\bjuice\b/i;

/** Leafy foods and herbs pack under this many grams per mL: a handful of them is a loose cup. */
const LEAFY_G_PER_ML = 0.3;

/**
 * Household measures a recipe counts that have no legal size and no SR28 portion for the food, as
 * volumes (*common practice*, from memory): a handful is a loose cup of leaves or herbs and ¼ cup of
 * anything denser (a handful of nuts is about 1 oz); a splash is ¼ fl oz (½ tbsp), a drizzle 1 tbsp; a scoop is ½ cup (the #8 disher); a shot of
 * espresso 1 fl oz, of anything else a 1½ fl oz jigger.
 */
function householdVolume(piece: string, food: CatalogueFood, density: () => number | null): { ml: number; as: string; why: string } | null {
  if (piece === 'handful') {
    const d = density();
    if (d === null) return null;
    return d < LEAFY_G_PER_ML
      ? { ml: ML_PER_CUP, as: '1 loose cup', why: 'a handful of leaves, common practice' }
      : { ml: ML_PER_CUP / 4, as: '¼ cup', why: 'a handful, common practice' };
  }
  if (piece === 'drizzle') return { ml: ML_PER_FL_OZ / 2, as: '1 tbsp', why: 'a drizzle, common practice' };
  if (piece === 'splash') return { ml: ML_PER_FL_OZ / 4, as: '½ tbsp', why: 'a splash, common practice' };
  if (piece === 'scoop') return { ml: ML_PER_CUP / 2, as: '½ cup', why: 'a #8 scoop, common practice' };
  if (piece === 'shot') {
    return /\b(?:espresso|coffee)\b/i.test(food.name)
      ? { ml: ML_PER_FL_OZ, as: '1 fl oz', why: 'a shot of espresso, common practice' }
      : { ml: 1.5 * ML_PER_FL_OZ, as: '1½ fl oz', why: 'a jigger, common practice' };
  }
  return null;
}

function result(grams: number, volumeMl: number | null, portionUsed: string | null, warnings: string[]): WeighedLine {
  const g = finite(grams);
  const v = volumeMl === null || !Number.isFinite(volumeMl) || volumeMl < 0 ? null : volumeMl;
  return { grams: g, volumeMl: v, portionUsed, warnings };
}

export function weighLine(parsed: ParsedLine, food: CatalogueFood | null, portions: Portion[], opts: WeighOptions = {}): WeighedLine {
  try {
    return weigh(parsed, food, portions ?? [], opts);
  } catch (error) {
    recordFallback('weigh-line', error);
    return result(0, null, null, ['This line could not be weighed: set its amount in grams.']);
  }
}

/** "1 c sugar, plus 1 tablespoon": the added amount in the line's own unit, so one portion weighs both. */
function withPlus(parsed: ParsedLine): ParsedLine {
  const plus = parsed.plus;
  if (!plus || parsed.quantity === null || !parsed.unit) return parsed;
  const kind = unitKind(parsed.unit);
  const perUnit = kind === 'volume' ? volumeToMl(1, parsed.unit) : kind === 'mass' ? massToGrams(1, parsed.unit) : null;
  const added = kind === 'volume' ? volumeToMl(plus.quantity, plus.unit) : kind === 'mass' ? massToGrams(plus.quantity, plus.unit) : null;
  if (!perUnit || added === null || unitKind(plus.unit) !== kind) return parsed;
  return { ...parsed, quantity: parsed.quantity + added / perUnit };
}

function weigh(written: ParsedLine, food: CatalogueFood | null, portions: Portion[], opts: WeighOptions): WeighedLine {
  const warnings: string[] = [];
  const parsed = withPlus(written);
  const quantity = parsed.quantity;
  // "½ cup sugar, or more to taste" weighs its half cup; only a line without an amount waits for one.
  if (quantity === null || !Number.isFinite(quantity) || quantity <= 0) {
    return result(0, 0, null, [WARNING_SET_AMOUNT]);
  }
  const all = read(portions);
  const unit = parsed.unit;
  const kind = unitKind(unit);
  const density = () => densityFor(all, parsed, food, opts.nearPortions ?? []);
  const roleDensityNote = () => {
    if (food && food.densitySource === 'role-default') {
      warnings.push(`No household volume weight for this food: used the usual density of its kind (${Number(food.densityGPerMl.toPrecision(3))} g/mL).`);
    }
  };
  // The recipe's own weight ("10 tbsp (140 g) butter") beats any density.
  const statedMass = parsed.equivalents?.find((e) => unitKind(e.unit) === 'mass');

  if (kind === 'mass' && unit) {
    const grams = massToGrams(quantity, unit) ?? 0;
    if (!food) return result(grams, null, null, [WARNING_NO_FOOD]);
    const d = density();
    return result(grams, d ? grams / d : null, null, warnings);
  }

  if (kind === 'volume' && unit) {
    const ml = volumeToMl(quantity, unit) ?? 0;
    if (statedMass) return result(massToGrams(statedMass.quantity, statedMass.unit) ?? 0, ml, null, warnings);
    if (!food) return result(0, ml, null, [WARNING_NO_FOOD]);
    const v = bestVolumePortion(all, parsed, unit, food);
    if (v) return result(ml * v.gPerMl, ml, v.r.portion.label, warnings);
    const near = bestVolumePortion(read(opts.nearPortions ?? []), parsed, unit, food);
    if (near) {
      warnings.push(`No household volume weight for this food: weighed as ${near.r.portion.label}, a near food.`);
      return result(ml * near.gPerMl, ml, near.r.portion.label, warnings);
    }
    if (food.densityGPerMl > 0 && Number.isFinite(food.densityGPerMl)) {
      roleDensityNote();
      return result(ml * food.densityGPerMl, ml, null, warnings);
    }
    return result(0, ml, null, ['No density for this food: give the amount in grams.']);
  }

  // A package or piece of stated size: "1 (15 oz) can", "2 (8 fl oz) cartons".
  const size = parsed.size;
  if (size && Number.isFinite(size.quantity) && size.quantity > 0) {
    const sizeKind = unitKind(size.unit);
    if (sizeKind === 'mass') {
      const sizeGrams = massToGrams(size.quantity, size.unit) ?? 0;
      const count = sizeIsTotal(parsed, food, all, opts, sizeGrams) ? 1 : quantity;
      const grams = drainedGrams(count * sizeGrams, opts, warnings);
      if (!food) return result(grams, null, null, [WARNING_NO_FOOD]);
      const d = density();
      return result(grams, d ? grams / d : null, null, warnings);
    }
    if (sizeKind === 'volume') {
      const sizeMl = volumeToMl(size.quantity, size.unit) ?? 0;
      if (!food) return result(0, quantity * sizeMl, null, [WARNING_NO_FOOD]);
      const v = bestVolumePortion(all, parsed, size.unit, food);
      const gPerMl = v ? v.gPerMl : food.densityGPerMl;
      const ml = (sizeIsTotal(parsed, food, all, opts, sizeMl * gPerMl) ? 1 : quantity) * sizeMl;
      if (v) return result(ml * v.gPerMl, ml, v.r.portion.label, warnings);
      roleDensityNote();
      return result(ml * food.densityGPerMl, ml, null, warnings);
    }
  }
  if (statedMass) {
    const grams = massToGrams(statedMass.quantity, statedMass.unit) ?? 0;
    const d = food ? density() : null;
    return result(grams, d ? grams / d : null, null, food ? warnings : [WARNING_NO_FOOD]);
  }
  if (!food) return result(0, null, null, [WARNING_NO_FOOD]);
  // "Juice of 1 lime (about 1 tablespoon)": the juice the cook measured, not the fruit's usual yield.
  const statedVolume = parsed.equivalents?.find((e) => unitKind(e.unit) === 'volume');
  if (statedVolume && JUICE.test(food.name)) {
    const ml = volumeToMl(statedVolume.quantity, statedVolume.unit) ?? 0;
    const v = bestVolumePortion(all, parsed, statedVolume.unit, food);
    if (v) return result(ml * v.gPerMl, ml, v.r.portion.label, warnings);
  }

  const ask = countAsk(parsed, food);
  const nameWords = new Set(words(parsed.name ?? '').map(singular));
  const byLength = lengthPiece(all, ask, nameWords);
  if (byLength) {
    const grams = quantity * byLength.inches * byLength.gramsPerInch;
    if (byLength.guessed) warnings.push(`No length given: weighed as a 1-inch piece (${gramsText(byLength.gramsPerInch)} each).`);
    const d = density();
    return result(grams, d ? grams / d : null, byLength.r.portion.label, warnings);
  }
  const chosen = bestCountPortion(all, ask, opts.countDefault ?? null, nameWords);
  // A canned food, or one standing for a can's drained contents ("1 can lentils" → cooked lentils).
  if (!chosen && ask.piece === 'can' && (/\bcanned\b/i.test(food.name) || opts.drained)) {
    const grams = drainedGrams(quantity * USUAL_CAN_GRAMS, opts, warnings);
    warnings.push(`No can size given: weighed as the usual 15 oz (${USUAL_CAN_GRAMS} g) can.`);
    const d = density();
    return result(grams, d ? grams / d : null, null, warnings);
  }
  // A handful is taken before the food is cut: "a handful of basil, chopped" is a loose cup of whole leaves.
  const uncut = () => densityFor(all, { ...parsed, preparation: null, comment: null }, food, opts.nearPortions ?? []);
  const household = !chosen && ask.piece ? householdVolume(ask.piece, food, uncut) : null;
  if (household) {
    const ml = quantity * household.ml;
    const d = uncut();
    if (d) {
      warnings.push(`No household weight for "${parsed.unitText ?? ask.piece}" of this food: weighed as ${household.as} (${household.why}).`);
      return result(ml * d, ml, null, warnings);
    }
  }
  if (!chosen) {
    const what = ask.piece ? `"${parsed.unitText ?? ask.piece}"` : 'one piece';
    return result(0, null, null, [`No household weight for ${what} of this food: give the amount in grams, ounces or cups.`]);
  }
  const each = chosen.r.portion.grams / chosen.r.portion.amount;
  const wholeCan = chosen.r.info.pieces.includes('can') && !/drain/i.test(chosen.r.portion.measure) && !isDrainedSolids(food);
  const grams = wholeCan ? drainedGrams(quantity * each, opts, warnings) : quantity * each;
  if (chosen.guessed) {
    const asked = ask.size ? `No "${ask.size}" weight` : ask.diameter !== null ? `No ${ask.diameter}-inch weight` : 'No size given';
    warnings.push(`${asked}: weighed as ${chosen.r.portion.label} (${gramsText(each)} each).`);
  } else if (ask.piece && PACKAGE_PIECES.has(ask.piece)) {
    // "1 can diced tomatoes": cans and jars come in many sizes; the one weighed is said.
    warnings.push(`No ${ask.piece} size given: weighed as ${chosen.r.portion.label} (${gramsText(each)} each). Give the size on the label for exact figures.`);
  }
  const d = density();
  return result(grams, d ? grams / d : null, chosen.r.portion.label, warnings);
}
