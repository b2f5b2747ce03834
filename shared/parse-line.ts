/**
 * Parse one recipe ingredient line into quantity, canonical unit, food phrase and notes.
 *
 * The quantity and first unit come from the `parse-ingredient` package (which reads mixed numbers,
 * vulgar fractions, decimals and ranges through `numeric-quantity`). This module adds what the
 * package leaves in the description: package sizes ("1 (15 oz) can", "2 15-ounce cans"),
 * compound amounts ("1 lb 4 oz", "1 cup plus 2 tbsp"), metric equivalents in parentheses,
 * quantities in words, units written last ("2 to 3 cups"), and the split of the food phrase
 * from its preparation ("shredded", "finely chopped") and notes ("to taste", "optional").
 *
 * parseLine never throws; every quantity it returns is null or a finite number ≥ 0.
 */
import { parseIngredient, type ParseIngredientOptions, type UnitOfMeasureDefinitions } from 'parse-ingredient';
import { UNITS, MAX_UNIT_WORDS, convertQuantity, getUnit, normaliseUnit, unitKind } from './units';
import { recordFallback } from './fallbacks';
import { cleanLine } from './parse/clean-text';
import { QUANTITY_SOURCE, quantityValue, wordsToDigits } from './parse/quantity-text';
import { splitNameAndComment, takeCountUnitFromName, takeParentheticals } from './parse/name-and-comment';

export interface Amount {
  quantity: number;
  /** canonical unit id from units.ts */
  unit: string;
}

export type ParseFlag =
  'range' | 'compound' | 'to-taste' | 'needs-amount' | 'optional' | 'group-header' | 'approximate' | 'implied-quantity' | 'truncated' | 'empty' | 'unparsed';

export interface ParsedLine {
  /** the line exactly as given */
  input: string;
  /** the amount of `unit` (the midpoint of a range); null when the line gives none */
  quantity: number | null;
  /** the two ends of a range "2-3", when the line gives one */
  range: { min: number; max: number } | null;
  /** canonical unit id (units.ts), or null for a bare count ("3 eggs") or no amount */
  unit: string | null;
  /** the unit as written */
  unitText: string | null;
  /** the food phrase, without amount, preparation or notes */
  name: string;
  /** what the cook does to the food: "shredded", "finely chopped", "cut into cubes" */
  preparation: string | null;
  /** every note on the line, preparation first: "finely chopped, plus more for garnish" */
  comment: string | null;
  /** the size of one counted unit when it is a weight or volume: "1 (15 oz) can" → 15 oz */
  size: Amount | null;
  /** the size as written, including descriptive sizes such as "8-inch" */
  sizeText: string | null;
  /** the same amount restated in other units: "10 tbsp (140 g) butter" → [140 g] */
  equivalents: Amount[];
  /** an amount of the same kind added after a comma: "1 c sugar, plus 1 tablespoon" → 1 tbsp (weighed with the line's amount) */
  plus?: Amount | null;
  /** true when the line has no usable quantity ("salt to taste") and the cook must give one */
  needsAmount: boolean;
  flags: ParseFlag[];
}

/** Every spelling of ours that the package should recognise as a unit word after a quantity. */
const PACKAGE_UNITS: UnitOfMeasureDefinitions = Object.fromEntries(
  UNITS.map((u) => {
    const spellings = [...u.spellings, ...(u.caseSensitive ?? [])].filter((s) => /^[\p{L}][\p{L}. -]*$/u.test(s));
    return [`hearthswap-${u.id}`, { short: spellings[0] ?? u.id, plural: spellings[1] ?? spellings[0] ?? u.id, alternates: spellings }];
  }),
);

const PACKAGE_OPTIONS: ParseIngredientOptions = {
  round: false,
  additionalUOMs: PACKAGE_UNITS,
  leadingQuantityPrefixes: [
    'approximately',
    'approx.',
    'approx',
    'about',
    'around',
    'roughly',
    'up to',
    'at least',
    'scant',
    'generous',
    'heaping',
    'heaped',
    '~',
  ],
};

/** Words between a quantity and its unit that change nothing we can weigh: "2 heaping tbsp". */
const UNIT_MODIFIERS = new Set([
  'heaping',
  'heaped',
  'scant',
  'level',
  'rounded',
  'generous',
  'good',
  'full',
  'big',
  'small',
  'medium',
  'large',
  'packed',
  'thin',
  'thick',
]);

/** Units that give a counted food's size rather than a measure: "2 large eggs". */
const SIZE_UNITS = new Set(['large', 'medium', 'small', 'extra-large', 'jumbo']);

const QUANTITY_AT_START = new RegExp(`^(${QUANTITY_SOURCE})`);
/** "15-ounce", "14.5 oz", "8-inch": a quantity glued to a unit, as in a package size. */
const SIZED_AMOUNT = new RegExp(`^(${QUANTITY_SOURCE})\\s*-?\\s*([\\p{L}"#][\\p{L}.]*(?:[ -][\\p{L}.]+)?)`, 'u');

function isFiniteNonNegative(n: unknown): n is number {
  return typeof n === 'number' && Number.isFinite(n) && n >= 0;
}

/** A unit at the start of `text` (skipping "heaping" and the like), with the text after it. */
export function takeLeadingUnit(text: string): { unit: string; unitText: string; rest: string } | null {
  const words = text.trim().split(' ');
  let start = 0;
  while (start < words.length - 1 && UNIT_MODIFIERS.has(words[start].toLowerCase())) {
    // "2 large eggs": "large" is itself the unit unless another unit follows it.
    if (!normaliseUnit(words[start + 1]?.replace(/[,;:]$/, '')) && !normaliseUnit(words.slice(start + 1, start + 3).join(' '))) break;
    start++;
  }
  for (let n = Math.min(MAX_UNIT_WORDS, words.length - start); n >= 1; n--) {
    const raw = words.slice(start, start + n).join(' ');
    const candidate = raw.replace(/[,;:]$/, '');
    const unit = normaliseUnit(candidate);
    if (unit) {
      const rest = words
        .slice(start + n)
        .join(' ')
        .replace(/^of\s+/i, '');
      return { unit, unitText: candidate, rest: raw === candidate ? rest : `, ${rest}` };
    }
  }
  return null;
}

/** "15 oz", "140 grams", "1 stick/113g" → the first weighable amount, or null. */
function readAmount(text: string): { amount: Amount | null; kind: 'mass' | 'volume' | 'count' | null; text: string } | null {
  const m = text.trim().match(SIZED_AMOUNT);
  if (!m) return null;
  const quantity = quantityValue(m[1]);
  if (quantity === null) return null;
  // Try the two-word unit first ("fl oz"), then one word.
  const unitWords = m[2].split(/[ -]/);
  for (let n = unitWords.length; n >= 1; n--) {
    const unitText = unitWords.slice(0, n).join(' ');
    const unit = normaliseUnit(unitText);
    if (unit) {
      const kind = unitKind(unit);
      const consumed = m[0].length - (m[2].length - unitWords.slice(0, n).join(' ').length);
      return {
        amount: { quantity, unit },
        kind,
        text: text.trim().slice(0, consumed),
      };
    }
  }
  return null;
}

/** All weighable amounts in a parenthetical such as "6 oz / 170g" or "10 1/2 fl oz, 300 ml". */
function readAmounts(text: string): Amount[] {
  const out: Amount[] = [];
  // "6 oz / 170g", "1 stick/113g": a slash between amounts, never the slash of a fraction like "10 1/2".
  for (const part of text.split(/\s*(?:(?<!\d)\/|\/(?!\d)|,|;|\bor\b|=)\s*/i)) {
    const piece = part.replace(/^(?:about|approximately|approx\.?|around|roughly|generous|scant)\s+/i, '').trim();
    const a = readAmount(piece);
    if (!a?.amount || (a.kind !== 'mass' && a.kind !== 'volume')) continue;
    // "1 lb 5 oz": a compound amount is one amount.
    const b = readAmount(piece.slice(a.text.length).replace(/^\s*(?:plus|\+|and)?\s*/i, ''));
    out.push(b?.amount && b.kind === a.kind ? (addAmounts(a.amount, b.amount) ?? a.amount) : a.amount);
  }
  return out;
}

/** The sum of two amounts of one kind, in the smaller unit (1 lb + 4 oz → 20 oz), or null. */
function addAmounts(a: Amount, b: Amount): Amount | null {
  const smaller = unitFactor(a.unit) < unitFactor(b.unit) ? a.unit : b.unit;
  const x = convertQuantity(a.quantity, a.unit, smaller);
  const y = convertQuantity(b.quantity, b.unit, smaller);
  return x === null || y === null ? null : { quantity: Number((x + y).toPrecision(12)), unit: smaller };
}

function emptyResult(input: string, flags: ParseFlag[]): ParsedLine {
  return {
    input,
    quantity: null,
    range: null,
    unit: null,
    unitText: null,
    name: '',
    preparation: null,
    comment: null,
    size: null,
    sizeText: null,
    equivalents: [],
    needsAmount: false,
    flags,
  };
}

function toInputString(input: unknown): string {
  if (typeof input === 'string') return input;
  try {
    return input === null || input === undefined ? '' : String(input);
  } catch {
    return '';
  }
}

export function parseLine(input: unknown): ParsedLine {
  const text = toInputString(input);
  try {
    return sanitise(parseCleanLine(text));
  } catch (error) {
    recordFallback('parse-line', error);
    const fallback = emptyResult(text, ['unparsed', 'needs-amount']);
    fallback.name = cleanLine(text).text;
    fallback.needsAmount = true;
    return fallback;
  }
}

/** The last guard of the contract: no NaN, infinite or negative number ever leaves the parser. */
function sanitise(line: ParsedLine): ParsedLine {
  if (!isFiniteNonNegative(line.quantity)) line.quantity = null;
  if (line.range && !(isFiniteNonNegative(line.range.min) && isFiniteNonNegative(line.range.max))) line.range = null;
  if (line.size && !isFiniteNonNegative(line.size.quantity)) line.size = null;
  line.equivalents = line.equivalents.filter((e) => isFiniteNonNegative(e.quantity));
  if (line.plus && !isFiniteNonNegative(line.plus.quantity)) delete line.plus;
  const isHeader = line.flags.includes('group-header');
  line.needsAmount = line.quantity === null && !isHeader && line.name !== '';
  if (line.needsAmount && !line.flags.includes('needs-amount')) line.flags.push('needs-amount');
  if (!line.needsAmount) line.flags = line.flags.filter((f) => f !== 'needs-amount');
  return line;
}

/** What the passes read and write: the package's reading of a line, refined pass by pass. */
interface LineState {
  input: string;
  /** the cleaned text the package read */
  text: string;
  flags: ParseFlag[];
  quantity: number | null;
  /** the upper end of a range, until finish() turns the two into a midpoint */
  quantity2: number | null;
  unit: string | null;
  unitText: string | null;
  /** what is left after the amount: the food phrase with its notes */
  description: string;
  size: Amount | null;
  sizeText: string | null;
  equivalents: Amount[];
  plus?: Amount;
}

/** "Pinch coarse salt", "generous pinch of salt", "small handful of basil": a measure without a number is one of it. */
const LEADING_MEASURE =
  /^(?:an?\s+)?(?:(small|sm|tiny|little|scant|large|lg|big|generous|good|healthy|hefty|heaping|heaped)\s+)?(pinch|dash|handful|splash|drizzle)(?:\s+of)?\s+(?=\S)/i;
const SMALL_WORDS = new Set(['small', 'sm', 'tiny', 'little', 'scant']);

function leadingHouseholdMeasure(text: string): string {
  const m = LEADING_MEASURE.exec(text);
  if (!m) return text;
  const size = m[1] ? (SMALL_WORDS.has(m[1].toLowerCase()) ? 'sm ' : 'lg ') : '';
  return `1 ${size}${m[2].toLowerCase()} ${text.slice(m[0].length)}`;
}

/**
 * One line read in named passes over one state: the package's reading first (below), then each pass
 * takes from the description what the package left there (sizes, ranges, equivalents, notes).
 */
function parseCleanLine(input: string): ParsedLine {
  const cleaned = cleanLine(input);
  const flags: ParseFlag[] = [];
  if (cleaned.truncated) flags.push('truncated');
  if (cleaned.text === '') return emptyResult(input, [...flags, 'empty']);

  let text = leadingHouseholdMeasure(cleaned.text.replace(/(\d)\s*#(?=\s|$)/g, '$1 lb'));
  text = wordsToDigits(text).text;
  if (/^(?:about|approximately|approx\.?|around|roughly|~)\s/i.test(text)) flags.push('approximate');

  const parsed = parseIngredient(text, PACKAGE_OPTIONS)[0];
  if (!parsed) return emptyResult(input, [...flags, 'empty']);
  if (parsed.isGroupHeader) {
    const header = emptyResult(input, [...flags, 'group-header']);
    header.name = parsed.description.replace(/:\s*$/, '').trim();
    return header;
  }

  let quantity = isFiniteNonNegative(parsed.quantity) ? parsed.quantity : null;
  let quantity2 = quantity !== null && isFiniteNonNegative(parsed.quantity2) ? parsed.quantity2 : null;
  let unitText: string | null = parsed.unitOfMeasure;
  let unit = normaliseUnit(parsed.unitOfMeasure) ?? normaliseUnit(parsed.unitOfMeasureID);
  let description = parsed.description.trim();
  if (unitText && (!unit || quantity === null)) {
    // A unit we do not weigh (feet, yards), or a unit word with no quantity before it
    // ("leaves from 2 sprigs mint"): it stays in the food phrase.
    description = `${unitText} ${description}`.trim();
    unitText = null;
    unit = null;
  }
  // The package drops a leading approximation word into the description when nothing follows it.
  if (/^(?:about|approximately|around|roughly)$/i.test(description)) description = '';

  // "4-1/2 cups" is a hyphenated mixed number, not a range from 4 down to a half.
  if (quantity !== null && quantity2 !== null && quantity2 < 1 && quantity2 < quantity && Number.isInteger(quantity)) {
    quantity += quantity2;
    quantity2 = null;
  }

  const state: LineState = { input, text, flags, quantity, quantity2, unit, unitText, description, size: null, sizeText: null, equivalents: [] };
  for (const pass of PASSES) pass(state);
  return finish(state);
}

/** The passes, in order: each reads what the package left in the description. */
const PASSES: readonly ((s: LineState) => void)[] = [
  countBeforeFractionOfAnInch,
  sizeRangeAfterCount,
  sizeGluedToQuantity,
  sizeWordBeforeCountedUnit,
  rangeWithUnitAtBothEnds,
  parenthesisAfterAmount,
  secondAmount,
  unitThePackageMissed,
  sizeAfterCountedUnit,
  equivalentAfterUnit,
  partOfCountedFruit,
  amountInNote,
  weightInNote,
  plusAfterComma,
  dozens,
];

/**
 * "Zest of 2 lemons", "grated zest of ½ orange", "juice of two limes": the count is the fruit's;
 * "leaves from 2 sprigs mint", "kernels from 1 large ear of corn": the sprigs' or ears'.
 */
const PART_OF_FRUIT = new RegExp(
  `^((?:[a-z]+\\s+){0,3}?)(zest|juice|peel|rind|zest\\s+and\\s+juice|juice\\s+and\\s+zest|leaves|kernels)\\s+(?:(?:cut|picked|stripped)\\s+)?(?:of|from)\\s+(${QUANTITY_SOURCE}|an?|one|two|three|four|half(?:\\s+an?)?)\\s+(?:(large|medium|small|lg|md|sm)\\s+)?(\\S.*)$`,
  'i',
);
const FRUIT_COUNT_WORDS: Record<string, number> = { a: 1, an: 1, one: 1, two: 2, three: 3, four: 4, half: 0.5, 'half a': 0.5, 'half an': 0.5 };

function partOfCountedFruit(s: LineState): void {
  if (s.quantity !== null) return;
  const m = PART_OF_FRUIT.exec(s.description);
  if (!m) return;
  const written = m[3].toLowerCase().replace(/\s+/g, ' ');
  const quantity = FRUIT_COUNT_WORDS[written] ?? quantityValue(written);
  if (quantity === null || !(quantity > 0)) return;
  s.quantity = quantity;
  if (m[4]) s.sizeText = m[4];
  const part = m[2].toLowerCase();
  if (part === 'leaves' || part === 'kernels') {
    // "leaves from 2 sprigs mint", "kernels cut from 2 ears of corn": that many sprigs or ears of the food.
    const lead = takeLeadingUnit(m[5]);
    if (!lead || unitKind(lead.unit) !== 'count') return;
    s.unit = lead.unit;
    s.unitText = lead.unitText;
    s.description = `${m[1]}${lead.rest.replace(/^of\s+/i, '')}`;
  } else s.description = `${m[1]}${m[2]} of ${m[5]}`;
  s.flags = s.flags.filter((f) => f !== 'needs-amount');
}

/** "3-4 ounce", "6- to 8-ounce", "2-to 3-pound": a range of weights written before the food. */
const SIZE_RANGE = new RegExp(`^(${QUANTITY_SOURCE})\\s*-?\\s*(?:-|–|—|to)\\s*(${QUANTITY_SOURCE})[-\\s]*([a-z]+)\\.?(?=[\\s-])[-\\s]*`, 'i');

const COUNT_THEN_FRACTION_INCH = /^(\d+)\s+(\d+\/\d+)-(?:inch(?:es)?|in\.?)[-\s]+(?:thick\s+)?([a-z]+s)\b\s*(.*)$/i;

/**
 * "8 1/2-inch slices baguette", "10 1/2-inch cubes cheese": a count of pieces a fraction of an inch in
 * size, not 8½ inches (one "1 1/2-inch piece of ginger", a singular piece, stays a length).
 */
function countBeforeFractionOfAnInch(s: LineState): void {
  const m = COUNT_THEN_FRACTION_INCH.exec(s.text);
  const count = m ? Number(m[1]) : 0;
  const unit = m ? normaliseUnit(m[3]) : null;
  if (!m || count < 2 || !unit || unitKind(unit) !== 'count' || unit === 'inch') return;
  s.quantity = count;
  s.quantity2 = null;
  s.unit = unit;
  s.unitText = m[3];
  s.sizeText = `${m[2]}-inch`;
  s.description = m[4];
}

/** "1 3-4 ounce tomato", "2 6- to 8-ounce salmon fillets": each piece weighs the middle of the range. */
function sizeRangeAfterCount(s: LineState): void {
  if (s.quantity === null || s.unit !== null) return;
  const range = massRange(s.description);
  if (!range) return;
  s.size = range.size;
  s.sizeText = range.text;
  s.description = s.description.slice(range.length).trim();
  s.quantity2 = null;
}

/** A range of weights at the start of `text` ("3- to 4-pound"), as its middle. */
function massRange(text: string): { size: Amount; text: string; length: number } | null {
  const m = text.match(SIZE_RANGE);
  if (!m) return null;
  const unit = normaliseUnit(m[3]);
  const lo = quantityValue(m[1]);
  const hi = quantityValue(m[2]);
  if (!unit || unitKind(unit) !== 'mass' || lo === null || hi === null || !(hi >= lo)) return null;
  return { size: { quantity: (lo + hi) / 2, unit }, text: m[0].trim().replace(/-$/, ''), length: m[0].length };
}

/** "1½-inch piece ginger", "15-ounce can tomatoes": the package read a size as the quantity. */
function sizeGluedToQuantity(s: LineState): void {
  const glued = s.description.match(/^-\s*\S/);
  if (glued && s.quantity !== null && s.unit === null) {
    const sizeRead = readAmount(`${s.quantity} ${s.description.slice(1).trim()}`);
    if (sizeRead?.amount) {
      const numberText = s.text.endsWith(s.description) ? s.text.slice(0, s.text.length - s.description.length).trim() : String(s.quantity);
      const unitWritten = sizeRead.text.slice(String(s.quantity).length).trim();
      s.sizeText = `${numberText}-${unitWritten}`;
      s.description = s.description.slice(1).trim().slice(unitWritten.length).trim();
      if (sizeRead.kind === 'mass' || sizeRead.kind === 'volume') {
        // A package of that size: one of it, unless a count follows ("15-ounce can").
        s.size = sizeRead.amount;
        s.quantity = 1;
        s.flags.push('implied-quantity');
        const lead = takeLeadingUnit(s.description);
        if (lead && unitKind(lead.unit) === 'count') {
          s.unit = lead.unit;
          s.unitText = lead.unitText;
          s.description = lead.rest;
        }
      } else {
        // "3-inch cinnamon stick", "1½-inch piece ginger": the length is the amount.
        s.unit = sizeRead.amount.unit;
        s.unitText = unitWritten;
        s.description = s.description.replace(/^(?:piece|pieces|chunk|knob)\s+(?:of\s+)?/i, '');
      }
      s.quantity2 = null;
    }
  }
}

/** Volume units a size word may come before. */
const SIZED_SPOONFULS = new Set(['pinch', 'dash']);

/** "1 lg bunch basil", "2 sm sprigs rosemary": a size word before the counted unit. */
function sizeWordBeforeCountedUnit(s: LineState): void {
  if (s.unit && SIZE_UNITS.has(s.unit)) {
    const lead = takeLeadingUnit(s.description);
    // "1 lg pinch paprika": a pinch, dash or handful sized by the word before it.
    if (lead && (unitKind(lead.unit) === 'count' || SIZED_SPOONFULS.has(lead.unit)) && !SIZE_UNITS.has(lead.unit)) {
      s.sizeText = s.unitText;
      s.unit = lead.unit;
      s.unitText = lead.unitText;
      s.description = lead.rest;
    }
  }
}

/** "5 ½ oz to 7 ounces", "½ c to 1 cup": a range with the unit written at both ends. */
function rangeWithUnitAtBothEnds(s: LineState): void {
  const upper = s.description.match(/^(?:to|-|–|—|or)\s*/i);
  if (upper && s.quantity !== null && s.quantity2 === null && s.unit && (unitKind(s.unit) === 'mass' || unitKind(s.unit) === 'volume')) {
    const hi = readAmount(s.description.slice(upper[0].length));
    if (hi?.amount && hi.kind === unitKind(s.unit)) {
      const converted = convertQuantity(hi.amount.quantity, hi.amount.unit, s.unit);
      if (converted !== null) {
        s.quantity2 = converted;
        s.description = s.description.slice(upper[0].length + hi.text.length).trim();
      }
    }
  }
}

/** "1 (15 oz) can black beans", "2 (8-inch) tortillas", "10 tbsp (140 grams) butter". */
function parenthesisAfterAmount(s: LineState): void {
  if (s.description.startsWith('(')) {
    const close = s.description.indexOf(')');
    const inner = (close > 0 ? s.description.slice(1, close) : s.description.slice(1)).trim();
    const after = close > 0 ? s.description.slice(close + 1).trim() : '';
    const amounts = readAmounts(inner);
    const kind = unitKind(s.unit);
    let sized: ReturnType<typeof sizeBeforeUnit> = null;
    let range: ReturnType<typeof massRange> = null;
    if (kind === 'mass' || kind === 'volume') {
      if (amounts.length) {
        s.equivalents.push(...amounts);
        s.description = after;
      }
    } else if (amounts.length === 0 && s.unit === null && (sized = sizeBeforeUnit(inner, after))) {
      // "1 (12-15) pound turkey": the number in parentheses is the size, its unit follows.
      s.size = sized.size;
      s.sizeText = `${inner} ${sized.unitText}`;
      s.description = sized.rest;
    } else if (amounts.length === 0 && (range = massRange(`${inner} `)) && range.length >= inner.length) {
      // "1 (3- to 4-pound) whole red snapper": each weighs the middle of the range.
      s.size = range.size;
      s.sizeText = inner;
      s.description = after;
    } else if (amounts.length || isDescriptiveSize(inner)) {
      if (amounts.length) s.size = amounts[0];
      s.sizeText = inner;
      s.description = after;
      if (s.unit === null) {
        const lead = takeLeadingUnit(after);
        if (lead && unitKind(lead.unit) === 'count') {
          s.unit = lead.unit;
          s.unitText = lead.unitText;
          s.description = lead.rest;
        }
      }
    }
  }
}

/** Tablespoons in a stick of butter (*common practice*: the quarter-pound stick is marked in 8 tbsp). */
const TBSP_PER_STICK = 8;

/** "2 15-ounce cans chickpeas", "1 lb 4 oz ground beef", "1 cup plus 2 tbsp flour", "2 8-inch tortillas". */
function secondAmount(s: LineState): void {
  const next = readAmount(s.description.replace(/^(?:plus|\+|and)\s+/i, ''));
  if (next?.amount && s.quantity !== null && s.size === null && s.sizeText === null) {
    const kind = unitKind(s.unit);
    const nextKind = next.kind;
    const consumedLength = s.description.length - s.description.replace(/^(?:plus|\+|and)\s+/i, '').length + next.text.length;
    // "1 stick plus 2 tablespoons butter": a stick of butter is 8 tbsp (½ cup, *common practice*).
    const connected = /^(?:plus|\+|and)\s+/i.test(s.description);
    const stickPlus = s.unit === 'stick' && connected && nextKind === 'volume';
    if ((((kind === 'mass' || kind === 'volume') && nextKind === kind && s.unit) || stickPlus) && s.quantity2 === null) {
      const first = stickPlus ? { quantity: s.quantity * TBSP_PER_STICK, unit: 'tbsp' } : { quantity: s.quantity, unit: s.unit! };
      // "1 tbsp 1 tablespoon whiskey": the same amount written twice, once abbreviated, is one amount.
      const restated = !connected && next.amount.unit === first.unit && Math.abs(next.amount.quantity - first.quantity) < 1e-9;
      const sum = restated ? first : addAmounts(first, next.amount);
      if (sum) {
        s.quantity = sum.quantity;
        s.unit = sum.unit;
        s.unitText = `${s.unitText} ${s.description.slice(0, consumedLength).trim()}`;
        s.description = s.description.slice(consumedLength).trim();
        if (!restated) s.flags.push('compound');
      }
    } else if (s.unit === null || kind === 'count') {
      if (nextKind === 'mass' || nextKind === 'volume') {
        s.size = next.amount;
        s.sizeText = next.text;
        s.description = s.description.slice(consumedLength).trim();
      } else if (nextKind === 'count' && (next.amount.unit === 'inch' || next.amount.unit === 'cm')) {
        s.sizeText = next.text;
        s.description = s.description.slice(consumedLength).trim();
      }
      if (s.sizeText && s.unit === null) {
        const lead = takeLeadingUnit(s.description);
        if (lead && unitKind(lead.unit) === 'count') {
          s.unit = lead.unit;
          s.unitText = lead.unitText;
          s.description = lead.rest;
        }
      }
    }
  }
}

/** "2 to 3 cups", "2 heaping tbsp sugar", "1 of the cans": a unit the package did not take. */
function unitThePackageMissed(s: LineState): void {
  if (s.unit === null && s.quantity !== null) {
    const lead = takeLeadingUnit(s.description);
    if (lead && (lead.rest === '' || !/^[a-z]$/i.test(lead.unitText))) {
      s.unit = lead.unit;
      s.unitText = lead.unitText;
      s.description = lead.rest;
    }
  }
}

/** "1 can (15 oz) beans": a size after a counted unit. */
function sizeAfterCountedUnit(s: LineState): void {
  if (unitKind(s.unit) === 'count' && s.size === null && s.description.startsWith('(')) {
    const { notes } = takeParentheticals(s.description.slice(0, s.description.indexOf(')') + 1 || undefined));
    const amounts = readAmounts(notes[0] ?? '');
    if (amounts.length) {
      s.size = amounts[0];
      s.sizeText = notes[0];
      s.description = s.description.slice(s.description.indexOf(')') + 1).trim();
    }
  }
}

/** "10 tbsp (140 grams)" after a weighable unit: the same amount in other units. */
function equivalentAfterUnit(s: LineState): void {
  if ((unitKind(s.unit) === 'mass' || unitKind(s.unit) === 'volume') && s.description.startsWith('(') && s.equivalents.length === 0) {
    const closeAt = s.description.indexOf(')');
    const amounts = readAmounts(closeAt > 0 ? s.description.slice(1, closeAt) : s.description.slice(1));
    if (amounts.length) {
      s.equivalents.push(...amounts);
      s.description = closeAt > 0 ? s.description.slice(closeAt + 1).trim() : '';
    }
  }
}

/** "Neutral oil for frying (about ½ cup)": the only amount is in a note. */
function amountInNote(s: LineState): void {
  if (s.quantity === null) {
    for (const note of takeParentheticals(s.description).notes) {
      const amounts = readAmounts(note);
      if (amounts.length) {
        s.quantity = amounts[0].quantity;
        s.unit = amounts[0].unit;
        s.unitText = null;
        if (!s.flags.includes('approximate')) s.flags.push('approximate');
        break;
      }
    }
  }
}

/** ", about 8 ounces each", ", 150 grams each", ", about 1/4-1/2 pound": a weight right after a comma. */
const WEIGHT_AFTER_COMMA = /^(?:about|around|roughly|approximately|approx\.?|~)?\s*(.+)$/i;

/** The line's weight written after a comma, outside parentheses, or null. */
function weightAfterComma(description: string, count: number): Amount | null {
  for (const segment of takeParentheticals(description).rest.split(',').slice(1)) {
    const text = WEIGHT_AFTER_COMMA.exec(segment.trim())?.[1] ?? '';
    let amount = massRangeMidpoint(text);
    let after = '';
    if (!amount) {
      const read = readAmount(text);
      amount = read?.amount ?? null;
      after = read ? text.slice(read.text.length).trim() : '';
    }
    if (!amount || unitKind(amount.unit) !== 'mass') continue;
    // The weight alone, or with "each" / "total" after it: not "1 lb ground beef, 80/20", ", 2 oz of it for garnish".
    if (after !== '' && !/^(?:each|apiece|total|in all|in total)\b/i.test(after)) continue;
    return /^(?:each|apiece)\b/i.test(after) ? { quantity: amount.quantity * count, unit: amount.unit } : amount;
  }
  return null;
}

const APPROXIMATE_NOTE = /^(?:about|approx\.?|approximately|around|roughly|~)\s/i;

/** "9 lasagna noodles (about 8 oz)", "6 tbsp lard (about 2 ounces)": the line's weight in a note. */
function weightInNote(s: LineState): void {
  if (s.quantity !== null && s.equivalents.length === 0 && s.size === null) {
    for (const note of takeParentheticals(s.description).notes) {
      if (/\b(?:from|per|makes|yields?)\b/i.test(note)) continue;
      // "4 ½ c cooked beans, or 3 (15-ounce) cans": the size of another count's package, not this line's weight.
      const before = s.description.slice(0, Math.max(0, s.description.indexOf(note))).replace(/[([]\s*$/, '');
      if (/[\d½¼¾⅓⅔⅛]\s*$/.test(before) && !/^(?:about|approx|approximately|around|roughly|~)/i.test(note)) continue;
      const mass = massRangeMidpoint(note) ?? readAmounts(note).find((a) => unitKind(a.unit) === 'mass');
      if (!mass) {
        // "Juice of 1 lime (about 1 tablespoon)": the volume a counted line yields, kept beside the count.
        const volume =
          (s.unit === null || unitKind(s.unit) === 'count') && APPROXIMATE_NOTE.test(note)
            ? readAmounts(note).find((a) => unitKind(a.unit) === 'volume')
            : undefined;
        if (volume && !s.equivalents.length) s.equivalents.push(volume);
        continue;
      }
      s.equivalents.push(/\beach\b|\bapiece\b/i.test(note) ? { quantity: mass.quantity * s.quantity, unit: mass.unit } : mass);
      return;
    }
    const afterComma = weightAfterComma(s.description, s.quantity);
    if (afterComma) s.equivalents.push(afterComma);
  }
}

/** What may follow the added amount of ", plus 1 tablespoon …": nothing, or what it is for, never another food. */
const PLUS_REST = /^(?:$|[,;(]|(?:for|to|at|if|in|as|of it|more|reserved|divided|melted|softened|sliced|chopped|extra)\b)/i;

/**
 * "1 c sugar, plus 1 tablespoon", "¾ c butter, plus 3 tablespoons for the pan": an amount of the same
 * kind added after a comma is weighed with the line's amount (the labelled sets sum "A plus B"); the
 * line's own quantity stays the one written first.
 */
function plusAfterComma(s: LineState): void {
  const kind = unitKind(s.unit);
  if (s.quantity === null || s.quantity2 !== null || !s.unit || (kind !== 'mass' && kind !== 'volume') || s.equivalents.length > 0) return;
  for (const segment of takeParentheticals(s.description).rest.split(',').slice(1)) {
    const plus = /^\s*(?:plus|\+)\s+(.*)$/i.exec(segment);
    if (!plus) continue;
    const next = readAmount(plus[1]);
    if (!next?.amount || next.kind !== kind || !PLUS_REST.test(plus[1].trim().slice(next.text.length).trim())) return;
    s.plus = next.amount;
    return;
  }
}

/** "3½ to 4½ pounds", "2-3 lb": the middle of a range of weights, or null. */
function massRangeMidpoint(written: string): Amount | null {
  // "2 to 2-1/2 pounds": a hyphenated mixed number is one number, not a second range.
  const note = written.replace(/(?<![\d/.])(\d+)-(\d+\/\d+)\b/g, '$1 $2');
  const m = /^(?:about\s+|around\s+|roughly\s+)?([\d½¼¾⅓⅔⅛./ ]+?)\s*(?:to|-|–)\s*([\d½¼¾⅓⅔⅛./ ]+[^\d\s].*)$/i.exec(note.trim());
  if (!m) return null;
  const hi = readAmounts(m[2]).find((a) => unitKind(a.unit) === 'mass');
  if (!hi) return null;
  const unitText = m[2].replace(/^[\d½¼¾⅓⅔⅛./ ]+/, '');
  const lo = readAmounts(`${m[1].trim()} ${unitText}`).find((a) => unitKind(a.unit) === 'mass' && a.unit === hi.unit);
  return lo && lo.quantity < hi.quantity ? { quantity: (lo.quantity + hi.quantity) / 2, unit: hi.unit } : null;
}

/** "2 dozen eggs": twenty-four of them. */
function dozens(s: LineState): void {
  if (s.unit === 'dozen' && s.quantity !== null) {
    s.quantity *= 12;
    if (s.quantity2 !== null) s.quantity2 *= 12;
    s.unit = null;
  }
}

/** The range to its midpoint, the name split from its notes, a counted unit taken from the name. */
function finish(s: LineState): ParsedLine {
  let range: ParsedLine['range'] = null;
  if (s.quantity !== null && s.quantity2 !== null && s.quantity2 !== s.quantity) {
    const min = Math.min(s.quantity, s.quantity2);
    const max = Math.max(s.quantity, s.quantity2);
    range = { min, max };
    s.quantity = (min + max) / 2;
    s.flags.push('range');
  }

  const parts = splitNameAndComment(s.description.replace(/^of\s+/i, ''));
  // "4 garlic cloves", "1 lg garlic clove", "1 minced clove garlic": the counted unit inside the name.
  if (s.quantity !== null && (s.unit === null || SIZE_UNITS.has(s.unit))) {
    const counted = takeCountUnitFromName(parts.name);
    if (counted) {
      if (s.unit) s.sizeText = s.unitText;
      s.unit = counted.unit;
      s.unitText = counted.unitText;
      parts.name = counted.name;
    }
  }
  if (parts.toTaste) s.flags.push('to-taste');
  if (parts.optional) s.flags.push('optional');

  return {
    input: s.input,
    quantity: s.quantity,
    range,
    unit: s.unit,
    unitText: s.unit ? s.unitText : null,
    name: parts.name,
    preparation: parts.preparation,
    comment: parts.comment,
    size: s.size,
    sizeText: s.sizeText,
    equivalents: s.equivalents,
    ...(s.plus && s.quantity !== null && !range ? { plus: s.plus } : {}),
    needsAmount: s.quantity === null,
    flags: s.flags,
  };
}

/** "(12-15)" followed by "pound turkey": a size, possibly a range, whose unit follows the parenthesis. */
function sizeBeforeUnit(inner: string, after: string): { size: Amount; unitText: string; rest: string } | null {
  const m = inner.match(new RegExp(`^(${QUANTITY_SOURCE})(?:\\s*(?:-|–|—|to)\\s*(${QUANTITY_SOURCE}))?$`));
  if (!m) return null;
  const lo = quantityValue(m[1]);
  const hi = m[2] ? quantityValue(m[2]) : lo;
  const lead = takeLeadingUnit(after);
  if (lo === null || hi === null || !lead) return null;
  const kind = unitKind(lead.unit);
  if (kind !== 'mass' && kind !== 'volume') return null;
  return { size: { quantity: (lo + hi) / 2, unit: lead.unit }, unitText: lead.unitText, rest: lead.rest };
}

function unitFactor(unit: string): number {
  const u = getUnit(unit);
  return u?.grams ?? u?.ml ?? 1;
}

/** "8-inch", "12-inch", "large", "about 2 lb": a size that describes rather than weighs. */
function isDescriptiveSize(text: string): boolean {
  if (QUANTITY_AT_START.test(text) && /\b(?:inch|inches|in|cm|"|-inch)\b|-inch|"/i.test(text)) return true;
  return /^(?:extra[- ])?(?:large|medium|small|big|jumbo)$/i.test(text);
}
