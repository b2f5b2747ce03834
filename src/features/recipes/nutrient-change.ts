import type { Nutrients } from '../../../shared/nutrition';

/** Which way a nutrient should move in a lighter, more filling dish; carbohydrate is left to the cook. */
export const NUTRIENT_GOALS: Record<keyof Nutrients, 'lower' | 'higher' | 'either'> = {
  kcal: 'lower',
  proteinG: 'higher',
  carbsG: 'either',
  fiberG: 'higher',
  sugarG: 'lower',
  fatG: 'lower',
  satFatG: 'lower',
  sodiumMg: 'lower',
};

export type ChangeTone = 'better' | 'worse' | 'neutral';

export interface NutrientChange {
  /** "+12 g", "−180 kcal", or "No change" when the rounded difference is zero */
  text: string;
  /** "more" | "less" | "same", the words beside the sign for screen readers */
  direction: 'more' | 'less' | 'same';
  tone: ChangeTone;
}

const MINUS = '\u2212';

/** The difference after − before as the page shows it, with its sign and whether it helps the dish. */
export function nutrientChange(
  key: keyof Nutrients,
  before: number,
  after: number,
  format: (value: number) => string,
): NutrientChange {
  const diff = after - before;
  const shown = format(Math.abs(diff));
  if (shown === format(0)) return { text: 'No change', direction: 'same', tone: 'neutral' };
  const direction = diff > 0 ? 'more' : 'less';
  const goal = NUTRIENT_GOALS[key];
  const tone: ChangeTone =
    goal === 'either' ? 'neutral' : (goal === 'lower') === (direction === 'less') ? 'better' : 'worse';
  return { text: `${direction === 'more' ? '+' : MINUS}${shown}`, direction, tone };
}
