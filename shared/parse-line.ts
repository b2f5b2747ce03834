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
import { cleanLine } from './parse/clean-text';
import { recordFallback } from './fallback-counter';
import { QUANTITY_SOURCE, quantityValue, wordsToDigits } from './parse/quantity-text';
import { splitNameAndComment, takeCountUnitFromName, takeParentheticals } from './parse/name-and-comment';

export interface Amount {
  quantity: number;
  /** canonical unit id from units.ts */
  unit: string;
}

export type ParseFlag =
  | 'range'
  | 'compound'
  | 'to-taste'
  | 'needs-amount'
  | 'optional'
  | 'group-header'
  | 'approximate'
  | 'implied-quantity'
  | 'truncated'
  | 'empty'
  | 'unparsed';

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
  /** true when the line has no usable quantity ("salt to taste") and the cook must give one */
  needsAmount: boolean;
  flags: ParseFlag[];
}

/** Every spelling of ours that the package should recognise as a unit word after a quantity. */
const PACKAGE_UNITS: UnitOfMeasureDefinitions = Object.fromEntries(
  UNITS.map((u) => {
    const spellings = [...u.spellings, ...(u.caseSensitive ?? [])].filter((s) => /^[\p{L}][\p{L}. -]*$/u.test(s));
    return [
      `hearthswap-${u.id}`,
      { short: spellings[0] ?? u.id, plural: spellings[1] ?? spellings[0] ?? u.id, alternates: spellings },
    ];
  }),
);

const PACKAGE_OPTIONS: ParseIngredientOptions = {
  round: false,
  additionalUOMs: PACKAGE_UNITS,
  leadingQuantityPrefixes: ['approximately', 'approx.', 'approx', 'about', 'around', 'roughly', 'up to', 'at least', 'scant', 'generous', 'heaping', 'heaped', '~'],
};

/** Words between a quantity and its unit that change nothing we can weigh: "2 heaping tbsp". */
const UNIT_MODIFIERS = new Set(['heaping', 'heaped', 'scant', 'level', 'rounded', 'generous', 'good', 'full', 'big', 'small', 'medium', 'large', 'packed', 'thin', 'thick']);

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
    out.push(b?.amount && b.kind === a.kind ? addAmounts(a.amount, b.amount) ?? a.amount : a.amount);
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
  const isHeader = line.flags.includes('group-header');
  line.needsAmount = line.quantity === null && !isHeader && line.name !== '';
  if (line.needsAmount && !line.flags.includes('needs-amount')) line.flags.push('needs-amount');
  if (!line.needsAmount) line.flags = line.flags.filter((f) => f !== 'needs-amount');
  return line;
}

function parseCleanLine(input: string): ParsedLine {
  const cleaned = cleanLine(input);
  const flags: ParseFlag[] = [];
  if (cleaned.truncated) flags.push('truncated');
  if (cleaned.text === '') return emptyResult(input, [...flags, 'empty']);

  let text = cleaned.text.replace(/(\d)\s*#(?=\s|$)/g, '$1 lb');
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

  let size: Amount | null = null;
  let sizeText: string | null = null;
  const equivalents: Amount[] = [];

  // "1½-inch piece ginger", "15-ounce can tomatoes": the package read a size as the quantity.
  const glued = description.match(/^-\s*\S/);
  if (glued && quantity !== null && unit === null) {
    const sizeRead = readAmount(`${quantity} ${description.slice(1).trim()}`);
    if (sizeRead?.amount) {
      const numberText = text.endsWith(description) ? text.slice(0, text.length - description.length).trim() : String(quantity);
      const unitWritten = sizeRead.text.slice(String(quantity).length).trim();
      sizeText = `${numberText}-${unitWritten}`;
      description = description.slice(1).trim().slice(unitWritten.length).trim();
      if (sizeRead.kind === 'mass' || sizeRead.kind === 'volume') {
        // A package of that size: one of it, unless a count follows ("15-ounce can").
        size = sizeRead.amount;
        quantity = 1;
        flags.push('implied-quantity');
        const lead = takeLeadingUnit(description);
        if (lead && unitKind(lead.unit) === 'count') {
          unit = lead.unit;
          unitText = lead.unitText;
          description = lead.rest;
        }
      } else {
        // "3-inch cinnamon stick", "1½-inch piece ginger": the length is the amount.
        unit = sizeRead.amount.unit;
        unitText = unitWritten;
        description = description.replace(/^(?:piece|pieces|chunk|knob)\s+(?:of\s+)?/i, '');
      }
      quantity2 = null;
    }
  }

  // "1 lg bunch basil", "2 sm sprigs rosemary": a size word before the counted unit.
  if (unit && SIZE_UNITS.has(unit)) {
    const lead = takeLeadingUnit(description);
    if (lead && unitKind(lead.unit) === 'count' && !SIZE_UNITS.has(lead.unit)) {
      sizeText = unitText;
      unit = lead.unit;
      unitText = lead.unitText;
      description = lead.rest;
    }
  }

  // "5 ½ oz to 7 ounces", "½ c to 1 cup": a range with the unit written at both ends.
  const upper = description.match(/^(?:to|-|–|—|or)\s*/i);
  if (upper && quantity !== null && quantity2 === null && unit && (unitKind(unit) === 'mass' || unitKind(unit) === 'volume')) {
    const hi = readAmount(description.slice(upper[0].length));
    if (hi?.amount && hi.kind === unitKind(unit)) {
      const converted = convertQuantity(hi.amount.quantity, hi.amount.unit, unit);
      if (converted !== null) {
        quantity2 = converted;
        description = description.slice(upper[0].length + hi.text.length).trim();
      }
    }
  }

  // "1 (15 oz) can black beans", "2 (8-inch) tortillas", "10 tbsp (140 grams) butter".
  if (description.startsWith('(')) {
    const close = description.indexOf(')');
    const inner = (close > 0 ? description.slice(1, close) : description.slice(1)).trim();
    const after = close > 0 ? description.slice(close + 1).trim() : '';
    const amounts = readAmounts(inner);
    const kind = unitKind(unit);
    let sized: ReturnType<typeof sizeBeforeUnit> = null;
    if (kind === 'mass' || kind === 'volume') {
      if (amounts.length) {
        equivalents.push(...amounts);
        description = after;
      }
    } else if (amounts.length === 0 && unit === null && (sized = sizeBeforeUnit(inner, after))) {
      // "1 (12-15) pound turkey": the number in parentheses is the size, its unit follows.
      size = sized.size;
      sizeText = `${inner} ${sized.unitText}`;
      description = sized.rest;
    } else if (amounts.length || isDescriptiveSize(inner)) {
      if (amounts.length) size = amounts[0];
      sizeText = inner;
      description = after;
      if (unit === null) {
        const lead = takeLeadingUnit(after);
        if (lead && unitKind(lead.unit) === 'count') {
          unit = lead.unit;
          unitText = lead.unitText;
          description = lead.rest;
        }
      }
    }
  }

  // "2 15-ounce cans chickpeas", "1 lb 4 oz ground beef", "1 cup plus 2 tbsp flour", "2 8-inch tortillas".
  const next = readAmount(description.replace(/^(?:plus|\+|and)\s+/i, ''));
  if (next?.amount && quantity !== null && size === null && sizeText === null) {
    const kind = unitKind(unit);
    const nextKind = next.kind;
    const consumedLength = description.length - description.replace(/^(?:plus|\+|and)\s+/i, '').length + next.text.length;
    if ((kind === 'mass' || kind === 'volume') && nextKind === kind && unit && quantity2 === null) {
      const sum = addAmounts({ quantity, unit }, next.amount);
      if (sum) {
        quantity = sum.quantity;
        unit = sum.unit;
        unitText = `${unitText} ${description.slice(0, consumedLength).trim()}`;
        description = description.slice(consumedLength).trim();
        flags.push('compound');
      }
    } else if (unit === null || kind === 'count') {
      if (nextKind === 'mass' || nextKind === 'volume') {
        size = next.amount;
        sizeText = next.text;
        description = description.slice(consumedLength).trim();
      } else if (nextKind === 'count' && (next.amount.unit === 'inch' || next.amount.unit === 'cm')) {
        sizeText = next.text;
        description = description.slice(consumedLength).trim();
      }
      if (sizeText && unit === null) {
        const lead = takeLeadingUnit(description);
        if (lead && unitKind(lead.unit) === 'count') {
          unit = lead.unit;
          unitText = lead.unitText;
          description = lead.rest;
        }
      }
    }
  }

  // "2 to 3 cups", "2 heaping tbsp sugar", "1 of the cans": a unit the package did not take.
  if (unit === null && quantity !== null) {
    const lead = takeLeadingUnit(description);
    if (lead && (lead.rest === '' || !/^[a-z]$/i.test(lead.unitText))) {
      unit = lead.unit;
      unitText = lead.unitText;
      description = lead.rest;
    }
  }
  // "1 can (15 oz) beans": a size after a counted unit.
  if (unitKind(unit) === 'count' && size === null && description.startsWith('(')) {
    const { notes } = takeParentheticals(description.slice(0, description.indexOf(')') + 1 || undefined));
    const amounts = readAmounts(notes[0] ?? '');
    if (amounts.length) {
      size = amounts[0];
      sizeText = notes[0];
      description = description.slice(description.indexOf(')') + 1).trim();
    }
  }
  // "10 tbsp (140 grams)" after a weighable unit: the same amount in other units.
  if ((unitKind(unit) === 'mass' || unitKind(unit) === 'volume') && description.startsWith('(') && equivalents.length === 0) {
    const closeAt = description.indexOf(')');
    const amounts = readAmounts(closeAt > 0 ? description.slice(1, closeAt) : description.slice(1));
    if (amounts.length) {
      equivalents.push(...amounts);
      description = closeAt > 0 ? description.slice(closeAt + 1).trim() : '';
    }
  }

  // "Neutral oil for frying (about ½ cup)": the only amount is in a note.
  if (quantity === null) {
    for (const note of takeParentheticals(description).notes) {
      const amounts = readAmounts(note);
      if (amounts.length) {
        quantity = amounts[0].quantity;
        unit = amounts[0].unit;
        unitText = null;
        if (!flags.includes('approximate')) flags.push('approximate');
        break;
      }
    }
  }

  // "9 lasagna noodles (about 8 oz)", "6 tbsp lard (about 2 ounces)": the line's weight in a note.
  if (quantity !== null && equivalents.length === 0 && size === null) {
    for (const note of takeParentheticals(description).notes) {
      if (/\b(?:from|per|makes|yields?)\b/i.test(note)) continue;
      const mass = readAmounts(note).find((a) => unitKind(a.unit) === 'mass');
      if (!mass) continue;
      equivalents.push(/\beach\b|\bapiece\b/i.test(note) ? { quantity: mass.quantity * quantity, unit: mass.unit } : mass);
      break;
    }
  }

  if (unit === 'dozen' && quantity !== null) {
    quantity *= 12;
    if (quantity2 !== null) quantity2 *= 12;
    unit = null;
  }

  let range: ParsedLine['range'] = null;
  if (quantity !== null && quantity2 !== null && quantity2 !== quantity) {
    const min = Math.min(quantity, quantity2);
    const max = Math.max(quantity, quantity2);
    range = { min, max };
    quantity = (min + max) / 2;
    flags.push('range');
  }

  const parts = splitNameAndComment(description.replace(/^of\s+/i, ''));
  // "4 garlic cloves", "1 lg garlic clove", "1 minced clove garlic": the counted unit inside the name.
  if (quantity !== null && (unit === null || SIZE_UNITS.has(unit))) {
    const counted = takeCountUnitFromName(parts.name);
    if (counted) {
      if (unit) sizeText = unitText;
      unit = counted.unit;
      unitText = counted.unitText;
      parts.name = counted.name;
    }
  }
  if (parts.toTaste) flags.push('to-taste');
  if (parts.optional) flags.push('optional');

  return {
    input,
    quantity,
    range,
    unit,
    unitText: unit ? unitText : null,
    name: parts.name,
    preparation: parts.preparation,
    comment: parts.comment,
    size,
    sizeText,
    equivalents,
    needsAmount: quantity === null,
    flags,
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
