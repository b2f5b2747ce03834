/** Household portions of a food in words, and the ingredient line a chosen amount becomes. */
import type { FoodDetail } from '../../../shared/schemas/analyze';
import { nounFor } from '../../lib/words';

export type FoodPortion = FoodDetail['portions'][number];

// Measures written as abbreviations or sizes read the same for one or many.
const UNCHANGING = /^(?:tbsp|tsp|oz|fl oz|lb|g|kg|ml|l|large|medium|small|extra large|jumbo|cubic inch)$/i;

/** "cup" → "cups" for more than one; "leaf" → "leaves", "patty" → "patties" (pluralize); "tbsp" and "large" stay as they are; half a cup is a "cup". */
export function pluralMeasure(head: string, quantity: number): string {
  if (quantity <= 1 || UNCHANGING.test(head) || /\d/.test(head)) return head;
  const words = head.split(' ');
  const last = words.pop() ?? '';
  return [...words, nounFor(quantity, last)].join(' ');
}

/** A measure split into its unit and its note: "cup, shredded" → cup + shredded; "slice (1 oz)" → slice. */
export function measureParts(measure: string): { head: string; note: string | null } {
  const withoutParens = measure.replace(/\s*\([^)]*\)/g, '').trim();
  const comma = withoutParens.indexOf(',');
  if (comma === -1) return { head: withoutParens, note: null };
  const note = withoutParens.slice(comma + 1).trim();
  return { head: withoutParens.slice(0, comma).trim(), note: note || null };
}

/** grams in one of the portion's measure: "1/2 cup = 56 g" means 112 g per cup. */
export function gramsPerMeasure(portion: FoodPortion): number {
  return portion.amount > 0 ? portion.grams / portion.amount : portion.grams;
}

/** A number as a recipe line writes it: no thousands separator, trailing zeros dropped. */
function plainNumber(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}

/** The ingredient line for an amount of a catalogue food: "226 g Cheddar cheese", "2 cups Cheddar cheese, shredded". */
export function ingredientLineFor(foodName: string, amount: { grams: number } | { quantity: number; portion: FoodPortion }): string {
  if ('grams' in amount) return `${plainNumber(amount.grams, 1)} g ${foodName}`;
  const { head, note } = measureParts(amount.portion.measure);
  const text = `${plainNumber(amount.quantity, 2)} ${pluralMeasure(head, amount.quantity)} ${foodName}`;
  return note ? `${text}, ${note}` : text;
}
