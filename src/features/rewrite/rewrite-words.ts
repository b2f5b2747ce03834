/** How the rewrite's numbers read: target names, differences with their sign, volumes, the order of changes. */
import { proteinPer100Kcal, type Nutrients } from '../../../shared/nutrition';
import type { ChangePurpose, TargetName } from '../../../shared/rewrite/types';
import { TARGET_ROWS, type TargetRow } from '../../../shared/rewrite/targets';
import { ML_PER_CUP } from '../../../shared/units';
import { formatKcal, formatMacroG, formatMg, formatNumber } from '../../lib/format';
import type { UnitSystem } from '../../lib/user';
import type { RewriteChange } from './rewrite-types';
import { difference, NUTRIENT_GOALS, type Difference } from '../../lib/nutrient-difference';

export type { Difference };

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

export function nutrientDifference(key: keyof Nutrients, before: Nutrients, after: Nutrients): Difference {
  return difference(before[key], after[key], (v) => formatNutrient(key, v), NUTRIENT_GOALS[key]);
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

/** A held line's reason as the cook reads it: "leavener: kept as written" → "Leavener, kept as written". */
export function heldWords(reason: string): string {
  const text = reason.trim().replace(/:\s*kept as written\.?$/i, ', kept as written');
  return text.charAt(0).toUpperCase() + text.slice(1);
}
