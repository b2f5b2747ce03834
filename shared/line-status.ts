/**
 * Whether a line counts in the totals: a line without a food or weighed at 0 g does not, and every
 * view of a recipe (the Kitchen, the recipe page, the print view) says so with a banner.
 */

/** The warning a saved line at 0 g keeps. */
export const ZERO_GRAMS_WARNING = 'Weighed 0 g: this line is not counted in the totals. Give its amount in grams.';
export const NO_FOOD_WARNING = 'No food: this line is not counted in the totals. Choose its food.';

export interface LineWeight {
  grams: number;
  /** the line's food, or null/undefined when none matched */
  food?: unknown;
  foodId?: number | null;
}

export function isIncompleteLine(line: LineWeight): boolean {
  const hasFood = line.food !== undefined ? line.food !== null : line.foodId !== undefined && line.foodId !== null;
  return !hasFood || !(line.grams > 0);
}

/** Numbers (1-based) of the lines left out of the totals. */
export function incompleteLineNumbers(lines: readonly LineWeight[]): number[] {
  return lines.flatMap((l, i) => (isIncompleteLine(l) ? [i + 1] : []));
}

/** "Lines 2 and 5 are not counted…", for the banner. */
export function incompleteTotalsMessage(numbers: readonly number[]): string | null {
  if (numbers.length === 0) return null;
  const list = numbers.length === 1 ? `Line ${numbers[0]} is` : `Lines ${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1]} are`;
  return `${list} not counted: the totals are incomplete until ${numbers.length === 1 ? 'it has' : 'they have'} a food and a weight.`;
}
