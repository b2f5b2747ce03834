/**
 * The foods a line offers as choices, in the cook's order: "oat or almond milk" → "oat milk",
 * "almond milk"; "red or white wine vinegar" → "red wine vinegar", "white wine vinegar";
 * "vegetable or chicken bouillon paste" → "vegetable bouillon paste", "chicken bouillon paste";
 * "shortening or lard" → "shortening", "lard". The cook's first choice is the food of the line when
 * the catalogue has it; a later choice stands in only when an earlier one has no confident food.
 */
import { DESCRIBING_WORDS, leadingState } from './food-matcher';
import { words } from './normalise-phrase';

/** Single words that describe or source the food named after them: never a food alone in a choice. */
const SHARES_THE_FOOD = new Set([
  ...DESCRIBING_WORDS,
  'creamy',
  'chunky',
  'smooth',
  'crunchy',
  'coarse',
  'fine',
  'flaky',
  'kosher',
  'sea',
  'oat',
  'soy',
  'almond',
  'rice',
  'cashew',
  'coconut',
  'chicken',
  'beef',
  'vegetable',
  'veggie',
  'fish',
  'turkey',
  'pork',
  'canola',
  'olive',
  'sunflower',
  'peanut',
  'sesame',
  'corn',
  'grapeseed',
  'avocado',
  'lemon',
  'lime',
  'cake',
  'bread',
  'french',
  'italian',
  'greek',
  'mexican',
  'spanish',
  'english',
]);

/** Heads that name a product made of the words before them: "wine *vinegar*", "sesame *oil*". */
const PRODUCT_HEADS = new Set([
  'vinegar',
  'oil',
  'sauce',
  'flour',
  'sugar',
  'milk',
  'broth',
  'stock',
  'juice',
  'paste',
  'powder',
  'syrup',
  'extract',
  'jam',
  'jelly',
  'preserves',
  'butter',
  'fat',
  'grease',
]);
/** Foods cooks offer whole against another's product: "butter or olive oil", "honey or maple syrup". */
const STANDS_ALONE = new Set(['butter', 'ghee', 'lard', 'shortening', 'margarine', 'sugar', 'honey', 'water', 'salt', 'mayonnaise', 'yogurt', 'tamari']);

/** What such a product is made of, as a choice's last word: "red *wine*", "apple *cider*". */
const PRODUCT_SOURCES = new Set([
  'wine',
  'cider',
  'sherry',
  'champagne',
  'malt',
  'balsamic',
  'tomato',
  'garlic',
  'onion',
  'maple',
  'vanilla',
  'apple',
  'oyster',
  'hoisin',
  'chili',
  'chile',
]);

/**
 * The choices of a food phrase joined by "or" (commas listing more choices: "canola, sunflower, or
 * vegetable oil"), first choice first; each choice may be written two ways (its words plus the last
 * choice's food words, then plus its head word only), tried in that order. Empty without "or".
 */
export function orChoices(phrase: string): string[][] {
  if (!/\bor\b|[a-z]\/[a-z]/i.test(phrase)) return [];
  const state = leadingState(
    phrase
      .replace(/\band\/or\b/gi, 'or')
      .split(/\s*,?\s+or\s+|\s*,\s*|(?<=[a-z])\/(?=[a-z])/i)
      .map((p) => p.trim())
      .filter((p) => p.length > 0 && !/^(?:other|your|any|similar|another)\b/i.test(p)),
  );
  const parts = state.parts;
  if (parts.length < 2) return [];
  // "dry white wine, or chicken broth": two foods apart, no word shared.
  const apart = parts.length === 2 && /,\s*or\s/i.test(phrase);
  const last = words(parts[parts.length - 1]);
  const head = last[last.length - 1];
  const out: string[][] = [];
  for (const [i, part] of parts.entries()) {
    const ws = words(part);
    if (i === parts.length - 1 || apart || last.length < 2 || ws.includes(head)) {
      out.push([part]);
      continue;
    }
    // "red wine or apple cider vinegar": a product the head names is the choice, before "red wine".
    if (ws.length > 1) {
      const madeOf = PRODUCT_HEADS.has(head) && (SHARES_THE_FOOD.has(ws[ws.length - 1]) || PRODUCT_SOURCES.has(ws[ws.length - 1]));
      out.push(madeOf ? [`${part} ${head}`, part] : [part]);
      continue;
    }
    const tail = last.slice(1).join(' ');
    const ways = [`${ws[0]} ${tail}`, `${ws[0]} ${head}`];
    // "walnut or hazelnut oil": the product of each; but "butter or olive oil": a food word alone is
    // a choice of its own, tried before "butter oil".
    const shares = SHARES_THE_FOOD.has(ws[0]) || (PRODUCT_HEADS.has(head) && !STANDS_ALONE.has(ws[0]));
    out.push(shares ? [...new Set(ways)] : [part, ...new Set(ways)]);
  }
  return out.map((ways) => ways.map(state.withState));
}
