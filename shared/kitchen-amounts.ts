/**
 * Amounts the way a cook reads them: a number rounded to the fractions a measuring set holds
 * (halves, thirds, quarters, eighths — each caller says which), written as a recipe writes it
 * ("1 3/4", "1/3") by format-quantity; and a measure's word in the right number ("1/2 cup", "2 cups").
 */
import { formatQuantity } from 'format-quantity';
import pluralize from 'pluralize';

/** The nearest amount with one of these denominators: (1.7, [4]) → 1.75, (0.3, [3, 4]) → 1/3; ties go to the first denominator. */
export function nearestKitchenFraction(x: number, denominators: readonly number[]): number {
  let best = Math.round(x);
  for (const d of denominators) {
    const candidate = Math.round(x * d) / d;
    if (Math.abs(candidate - x) < Math.abs(best - x) - 1e-12) best = candidate;
  }
  return best;
}

/**
 * An amount already rounded to a kitchen fraction, written as a recipe writes it: 1.75 → "1 3/4",
 * 1/3 → "1/3", 2 → "2", 0 → "0". ASCII fractions, as everywhere in the app ("1 1/2 cups").
 */
export function kitchenQuantity(x: number): string {
  if (x === 0) return '0';
  return formatQuantity(x) ?? String(x);
}

/** A measure's word for an amount: singular up to one ("1/2 cup", "1 cup"), plural above ("1 1/2 cups", "2 leaves"). */
export function measureWord(word: string, amount: number): string {
  return pluralize(word, amount > 1 ? 2 : 1);
}
