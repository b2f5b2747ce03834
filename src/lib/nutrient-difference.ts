import type { Nutrients } from '../../shared/nutrition';

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

export type DifferenceTone = 'better' | 'worse' | 'neutral';

export interface Difference {
  /** "+9 g", "−106 kcal", or "No change" when it rounds to nothing */
  text: string;
  /** spoken beside the sign: "more", "less" */
  direction: 'more' | 'less' | 'same';
  tone: DifferenceTone;
}

const MINUS = '\u2212';

/** after − before as shown: its sign, and whether it helps a lighter, more filling dish. */
export function difference(before: number, after: number, format: (v: number) => string, goal: 'lower' | 'higher' | 'either'): Difference {
  const diff = after - before;
  const shown = format(Math.abs(diff));
  if (shown === format(0)) return { text: 'No change', direction: 'same', tone: 'neutral' };
  const direction = diff > 0 ? 'more' : 'less';
  const tone: DifferenceTone = goal === 'either' ? 'neutral' : (goal === 'lower') === (direction === 'less') ? 'better' : 'worse';
  return { text: `${direction === 'more' ? '+' : MINUS}${shown}`, direction, tone };
}

/** The difference of one nutrient, judged by its goal. */
export function nutrientChange(key: keyof Nutrients, before: number, after: number, format: (value: number) => string): Difference {
  return difference(before, after, format, NUTRIENT_GOALS[key]);
}
