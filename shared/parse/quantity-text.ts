/** Quantities written in words, and a quantity pattern for text the parser package leaves alone. */
import { numericQuantity } from 'numeric-quantity';

const VULGAR = '¼½¾⅐⅑⅒⅓⅔⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞';

/** One quantity as written: "1 1/2", "1½", "½", "14.5", "3/4", "2,5" is not accepted. */
export const QUANTITY_SOURCE = `(?:\\d+(?:\\.\\d+)?\\s*[${VULGAR}]|\\d+\\s+\\d+\\s*/\\s*\\d+|\\d+\\s*/\\s*\\d+|\\d*\\.\\d+|\\d+|[${VULGAR}])`;

/** A finite, non-negative number from quantity text, or null. */
export function quantityValue(text: string): number | null {
  const value = numericQuantity(text.replace(/\s*\/\s*/g, '/'), { round: false });
  return typeof value === 'number' && Number.isFinite(value) && value >= 0 ? value : null;
}

const WORD_NUMBERS: Record<string, string> = {
  a: '1',
  an: '1',
  one: '1',
  two: '2',
  three: '3',
  four: '4',
  five: '5',
  six: '6',
  seven: '7',
  eight: '8',
  nine: '9',
  ten: '10',
  eleven: '11',
  twelve: '12',
  fifteen: '15',
  twenty: '20',
  half: '1/2',
  quarter: '1/4',
  'a half': '1/2',
  'one half': '1/2',
  'a quarter': '1/4',
  'one quarter': '1/4',
  'a dozen': '12',
  'one dozen': '12',
  dozen: '12',
  'half a dozen': '6',
  'half dozen': '6',
  'a couple of': '2',
  'a couple': '2',
  couple: '2',
  'one and a half': '1 1/2',
  'one and one half': '1 1/2',
  'two and a half': '2 1/2',
};

const WORD_NUMBER_RE = new RegExp(
  `^(${Object.keys(WORD_NUMBERS)
    .sort((a, b) => b.length - a.length)
    .map((w) => w.replace(/ /g, '\\s+'))
    .join('|')})(?:\\s+(?:a|an|of)\\b)?(?=\\s|$)`,
  'i',
);

/**
 * Rewrite a leading quantity written in words as digits: "a pinch of salt" → "1 pinch of salt",
 * "half an onion" → "1/2 onion", "two 15-ounce cans" → "2 15-ounce cans".
 * "a few" and "some" carry no number and are left alone.
 */
export function wordsToDigits(text: string): { text: string; changed: boolean } {
  if (/^(?:a\s+)?(?:few|little|bit|some|several|handful of)\b/i.test(text)) {
    // "a handful of" keeps its unit: "1 handful of".
    const handful = text.match(/^a\s+(handful|pinch|dash|splash|sprinkle|knob|drizzle)\b/i);
    if (handful) return { text: `1 ${text.slice(2)}`, changed: true };
    return { text, changed: false };
  }
  // "Pinch of salt", "Handful of parsley": a vague measure written alone means one of it.
  if (/^(?:pinch|dash|handful|splash|knob|sprinkle|drizzle|squeeze|sprig|bunch)(?:es)?\s+of\b/i.test(text)) {
    return { text: `1 ${text}`, changed: true };
  }
  const m = text.match(WORD_NUMBER_RE);
  if (!m) return { text, changed: false };
  const word = m[1].toLowerCase().replace(/\s+/g, ' ');
  const digits = WORD_NUMBERS[word];
  const rest = text.slice(m[0].length).trimStart();
  // "a" and "an" are articles before any word; only treat them as 1 before a word, not alone.
  if (rest === '') return { text, changed: false };
  return { text: `${digits} ${rest}`, changed: true };
}
