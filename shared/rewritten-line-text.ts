/**
 * The text a rewritten line is saved with: the cook's own measure and words, with the new food's
 * common name where a swap changed the food ("2 cups shredded sharp cheddar" → "2 cups shredded
 * reduced-fat cheddar") and the amount rescaled where the grams changed. The catalogue food stays
 * on the line as its matched food, shown beside this text. It reads the line's amount and unit itself
 * (not through parse-line, whose parser package would weigh on the Kitchen's first visit).
 */
import { kitchenQuantity, measureWord, nearestKitchenFraction } from './kitchen-amounts';
import { normaliseUnit, unitKind } from './units';

/** Parts of an SR28 name that say how the food is sold or kept, not what it is. */
const STATE_PARTS =
  /^(raw|cooked|boiled|dry|unprepared|prepared|fresh|frozen|canned|regular|plain|fluid|commercial|commercially prepared|ready-to-serve|ready-to-eat|enriched|unenriched|without salt|with salt|solids and liquids|drained solids|nfs|includes .*|with added .*|without added .*|year round average|salad or cooking)$/i;

/** SR28 heads that name a catalogue shelf, not the food: the next part is the food ("Spices, oregano" → oregano). */
const SHELF_HEADS = /^(spices|nuts|seeds|sweeteners|leavening agents)$/i;

/** SR28 heads in the plural where a cook says the singular. */
const SINGULAR_HEADS: Record<string, string> = { sugars: 'sugar' };

/** Rule labels that describe an amount ("a third less cheese", "half the oil") rather than a food. */
const AMOUNT_LABEL = /^(?:a |an |half|up to|two thirds|one third|\d+ )/i;

const HYPHENATED: [RegExp, string][] = [
  [/\breduced fat\b/gi, 'reduced-fat'],
  [/\blow fat\b/gi, 'low-fat'],
  [/\bfat free\b/gi, 'fat-free'],
  [/\bpart skim\b/gi, 'part-skim'],
  [/\b(\d+(?:\.\d+)?)% milkfat\b/gi, '$1%'],
  [/\b(\d+(?:\.\d+)?)% lean meat\b/gi, '$1% lean'],
  [/\b(white|yolk) egg\b/gi, 'egg $1'],
];

/**
 * A food's name in a cook's words: the cook's own food by its name; a rule's target by the rule's
 * own words ("reduced-fat cheddar for cheddar, 1:1 by weight" → "reduced-fat cheddar") when they
 * name one food; else the SR28 name turned around ("Cheese, cheddar, reduced fat" → "reduced-fat
 * cheddar cheese").
 */
export function commonFoodName(food: { name: string; source: 'usda-sr28' | 'custom' }, ruleLabel?: string): string {
  if (food.source === 'custom') return food.name;
  const fromRule = ruleLabel ? /^(.+?) for /.exec(ruleLabel)?.[1]?.trim() : undefined;
  if (fromRule && !/ or |,/.test(fromRule) && !AMOUNT_LABEL.test(fromRule)) return fromRule;
  const parts = food.name
    .replace(/\([^)]*\)/g, '')
    .split(',')
    .map((p) => p.split('/')[0].trim())
    .filter((p) => p && !STATE_PARTS.test(p));
  if (parts.length === 0) return food.name;
  let [head, ...qualifiers] = parts;
  if (SHELF_HEADS.test(head) && qualifiers.length > 0) [head, ...qualifiers] = qualifiers;
  head = SINGULAR_HEADS[head.toLowerCase()] ?? head;
  const percent = qualifiers.find((q) => /%/.test(q));
  // "95% lean" says enough about fat: a second percentage ("5% fat") would only repeat it
  const kept = percent ? [percent, ...qualifiers.filter((q) => !/%/.test(q)).slice(0, 1)] : qualifiers.slice(0, 2).reverse();
  // a part that already ends in the head says it: "buttermilk" is milk, "cornbread" is bread
  const headWord = head.toLowerCase();
  const saysHead = kept.some((q) => q.length > headWord.length && q.toLowerCase().endsWith(headWord));
  let name = [...kept, ...(saysHead ? [] : [head.charAt(0).toLowerCase() + head.slice(1)])].join(' ');
  for (const [pattern, replacement] of HYPHENATED) name = name.replace(pattern, replacement);
  return name.replace(/\s+/g, ' ').trim();
}

/** 1.5 → "1 1/2", 0.33 → "1/3": the nearest quarter or third a cook measures, never less than 1/4. */
export function kitchenNumber(x: number): string {
  const nearest = nearestKitchenFraction(x, [4, 3]);
  return kitchenQuantity(nearest > 0 ? nearest : 0.25);
}

function wholeGrams(g: number): string {
  return g >= 10 ? String(Math.round(g)) : String(Math.round(g * 10) / 10);
}

const LEADING_AMOUNT =
  /^\s*(?:\d+\s+\d+\/\d+|\d+\/\d+|\d+(?:\.\d+)?(?:\s*[½¼¾⅓⅔⅛])?|[½¼¾⅓⅔⅛])(?:\s*(?:-|–|to)\s*(?:\d+\s+\d+\/\d+|\d+\/\d+|\d+(?:\.\d+)?|[½¼¾⅓⅔⅛]))?/;

const VULGAR: Record<string, number> = { '½': 0.5, '¼': 0.25, '¾': 0.75, '⅓': 1 / 3, '⅔': 2 / 3, '⅛': 0.125 };
const PREPARED = /^(?:(?:shredded|grated|chopped|diced|sliced|minced|melted|softened|cubed|crumbled|cooked)\s+)+/i;

/** "1 1/2" → 1.5, "½" → 0.5, "2-3" → 2 (a range by its low end, as the cook's first number). */
function amountOf(text: string): number {
  const first = text.trim().split(/\s*(?:-|–|to)\s*/)[0];
  return first.split(/\s+/).reduce((sum, part) => {
    if (VULGAR[part.slice(-1)] !== undefined) return sum + (Number(part.slice(0, -1)) || 0) + VULGAR[part.slice(-1)];
    const [n, d] = part.split('/');
    return sum + (d ? Number(n) / Number(d) : Number(n));
  }, 0);
}

/** The amount, unit and food phrase of a line, enough to restate it. */
function readLine(text: string) {
  const amount = LEADING_AMOUNT.exec(text);
  if (!amount) return { quantity: null, unit: null, unitText: null, name: text.split(',')[0].replace(PREPARED, '').trim() };
  let rest = text.slice(amount[0].length).trim();
  const word = rest.split(/\s+/)[0] ?? '';
  const unit = normaliseUnit(word.replace(/\.$/, ''));
  if (unit) rest = rest.slice(word.length).trim();
  return { quantity: amountOf(amount[0]), unit, unitText: unit ? word : null, name: rest.split(',')[0].replace(PREPARED, '').trim() };
}

/** The food a line names, in the cook's words: "2 cups shredded sharp cheddar, divided" → "sharp cheddar"; null when it names none. */
export function writtenFoodName(text: string): string | null {
  return readLine(text.trim()).name || null;
}

function withUnitNumber(unitText: string, amount: number): string {
  if (unitText.length < 3 || /^(oz|lb|g|kg|ml|l|tsp|tbsp)s?$/i.test(unitText)) return unitText;
  return measureWord(unitText, amount);
}

/**
 * The cook's line for a new amount (`grams` of the food `writtenGrams` weighed) and, for a swap, a
 * new food name. A volume or weight keeps its unit; a count is rescaled only for the same food; a
 * swapped count gives the grams and the line it stands in for.
 */
export function rewrittenLineText(original: string, writtenGrams: number, grams: number, newName: string | null): string {
  const parsed = readLine(original.trim());
  const ratio = writtenGrams > 0 ? grams / writtenGrams : 1;
  const sameAmount = Math.abs(ratio - 1) < 0.02;
  if (newName === null && sameAmount) return original;
  const kind = parsed.unit ? unitKind(parsed.unit) : null;
  const measured = parsed.quantity !== null && (kind === 'volume' || kind === 'mass');
  const counted = parsed.quantity !== null && !measured;
  if (newName !== null && (parsed.quantity === null || counted)) return `${wholeGrams(grams)} g ${newName} (in place of ${original.trim()})`;
  let text = original.trim();
  if (!sameAmount && parsed.quantity !== null) {
    const amount = parsed.quantity * ratio;
    const shown = counted ? kitchenNumber(Math.max(0.5, Math.round(amount * 2) / 2)) : kitchenNumber(amount);
    text = text.replace(LEADING_AMOUNT, `${shown}`);
    if (parsed.unitText)
      text = text.replace(new RegExp(`(?<=^${shown.replace(/\//g, '\\/')}\\s+)${parsed.unitText}\\b`), withUnitNumber(parsed.unitText, amount));
  }
  if (newName !== null) {
    const at = parsed.name ? text.toLowerCase().indexOf(parsed.name.toLowerCase()) : -1;
    text = at >= 0 ? `${text.slice(0, at)}${newName}${text.slice(at + parsed.name.length)}` : `${text} — ${newName}`;
  }
  return text;
}
