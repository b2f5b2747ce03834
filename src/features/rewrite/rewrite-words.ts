/** How the rewrite's numbers read: target names, differences with their sign, volumes, the order of changes. */
import { proteinPer100Kcal, type Nutrients } from '../../../shared/nutrition';
import type { ChangePurpose, TargetName } from '../../../shared/rewrite/types';
import { TARGET_ROWS, type TargetRow } from '../../../shared/rewrite/targets';
import { ML_PER_CUP } from '../../../shared/units';
import { formatKcal, formatMacroG, formatMg, formatNumber } from '../../lib/format';
import type { UnitSystem } from '../../lib/user';
import type { RewriteChange } from './rewrite-types';

export const MINUS = '\u2212';

export { TARGET_ROWS, type TargetRow };

export function targetRowOf(target: TargetName): TargetRow {
  return TARGET_ROWS.find((r) => r.target === target) ?? TARGET_ROWS[0];
}

/** "Protein floor", "Calorie ceiling", … */
export function targetLabel(target: TargetName): string {
  const { label } = targetRowOf(target);
  return label.charAt(0).toUpperCase() + label.slice(1);
}

export function formatNutrient(key: keyof Nutrients, value: number): string {
  if (key === 'kcal') return formatKcal(value);
  if (key === 'sodiumMg') return formatMg(value);
  return formatMacroG(value);
}

/** A target as the cook set it: "at least 39 g", "at most 425 kcal". */
export function targetText(target: TargetName, value: number): string {
  const row = targetRowOf(target);
  return `${row.sense === 'min' ? 'at least' : 'at most'} ${formatNutrient(row.key, value)}`;
}

export function purposeWords(purpose: ChangePurpose): string {
  if (purpose === 'volume') return "the dish's volume";
  if (purpose === 'objective') return 'the goal you chose';
  return `the ${targetRowOf(purpose).label}`;
}

/** Which way a nutrient should move in a lighter, more filling dish; carbohydrate is left to the cook. */
const GOALS: Record<keyof Nutrients, 'lower' | 'higher' | 'either'> = {
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

/** after − before as shown: its sign, and whether it helps a lighter, more filling dish. */
export function difference(before: number, after: number, format: (v: number) => string, goal: 'lower' | 'higher' | 'either'): Difference {
  const diff = after - before;
  const shown = format(Math.abs(diff));
  if (shown === format(0)) return { text: 'No change', direction: 'same', tone: 'neutral' };
  const direction = diff > 0 ? 'more' : 'less';
  const tone: DifferenceTone = goal === 'either' ? 'neutral' : (goal === 'lower') === (direction === 'less') ? 'better' : 'worse';
  return { text: `${direction === 'more' ? '+' : MINUS}${shown}`, direction, tone };
}

export function nutrientDifference(key: keyof Nutrients, before: Nutrients, after: Nutrients): Difference {
  return difference(before[key], after[key], (v) => formatNutrient(key, v), GOALS[key]);
}

export function densityDifference(before: Nutrients, after: Nutrients): Difference {
  return difference(proteinPer100Kcal(before), proteinPer100Kcal(after), (v) => `${formatNumber(v, 1)} g`, 'higher');
}

/** Whether a per-serving value meets a target (with the solver's rounding slack). */
export function meetsTarget(target: TargetName, limit: number, perServing: Nutrients): boolean {
  const row = targetRowOf(target);
  const value = perServing[row.key];
  const tolerance = 1e-6 * Math.max(1, Math.abs(limit));
  return row.sense === 'min' ? value >= limit - tolerance : value <= limit + tolerance;
}

/** The kitchen measure beside millilitres: "about 12 cups" (NIST: 1 cup = 236.5882365 mL) or "about 2.87 L". */
export function everydayVolume(ml: number, unitSystem: UnitSystem): string {
  const value = Number.isFinite(ml) && ml > 0 ? ml : 0;
  if (unitSystem === 'metric') return `about ${formatNumber(value / 1000, 2)} L`;
  const cups = value / ML_PER_CUP;
  const text = formatNumber(cups, cups < 10 ? 1 : 0);
  return `about ${text} ${text === '1' ? 'cup' : 'cups'}`;
}

/** The change in volume as a percentage of the original: "+1.4 %", "−3 %", "No change". */
export function volumeChangeText(beforeMl: number, afterMl: number): string {
  if (!(beforeMl > 0)) return 'No change';
  const pct = ((afterMl - beforeMl) / beforeMl) * 100;
  const shown = formatNumber(Math.abs(pct), Math.abs(pct) < 10 ? 1 : 0);
  if (shown === '0') return 'No change';
  return `${pct > 0 ? '+' : MINUS}${shown} %`;
}

/** Swaps first, then amount changes; within each, in recipe order. */
export function orderedChanges(changes: RewriteChange[]): RewriteChange[] {
  return [...changes].sort((a, b) => Number(b.swapped) - Number(a.swapped) || a.line - b.line);
}
