import type { NutrientKey } from '../nutrition';
import type { TargetName, Targets } from './types';

export interface TargetRow {
  target: TargetName;
  key: NutrientKey;
  /** 'min': a floor (≥), 'max': a ceiling (≤) */
  sense: 'min' | 'max';
  /** the constraint's name in the model */
  row: string;
  label: string;
  unit: 'g' | 'kcal' | 'mg';
  nutrient: string;
}

export const TARGET_ROWS: readonly TargetRow[] = [
  { target: 'proteinMinG', key: 'proteinG', sense: 'min', row: 'protein', label: 'protein floor', unit: 'g', nutrient: 'protein' },
  { target: 'kcalMax', key: 'kcal', sense: 'max', row: 'kcal', label: 'calorie ceiling', unit: 'kcal', nutrient: 'calories' },
  { target: 'fiberMinG', key: 'fiberG', sense: 'min', row: 'fiber', label: 'fiber floor', unit: 'g', nutrient: 'fiber' },
  { target: 'fatMaxG', key: 'fatG', sense: 'max', row: 'fat', label: 'fat ceiling', unit: 'g', nutrient: 'fat' },
  { target: 'satFatMaxG', key: 'satFatG', sense: 'max', row: 'satfat', label: 'saturated-fat ceiling', unit: 'g', nutrient: 'saturated fat' },
  { target: 'sodiumMaxMg', key: 'sodiumMg', sense: 'max', row: 'sodium', label: 'sodium ceiling', unit: 'mg', nutrient: 'sodium' },
  { target: 'sugarMaxG', key: 'sugarG', sense: 'max', row: 'sugar', label: 'sugar ceiling', unit: 'g', nutrient: 'sugar' },
];

/** The targets the cook set, in a fixed order, with their values. */
export function activeTargets(targets: Targets): { row: TargetRow; value: number }[] {
  return TARGET_ROWS.flatMap((row) => {
    const value = targets[row.target];
    return value === undefined || !Number.isFinite(value) ? [] : [{ row, value }];
  });
}

export function targetRow(target: TargetName): TargetRow {
  const row = TARGET_ROWS.find((r) => r.target === target);
  if (!row) throw new Error(`unknown target ${target}`);
  return row;
}
