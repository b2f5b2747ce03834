import type { ClientTargets } from '../../../shared/schemas/coaching';
import type { TargetEstimate } from '../../../shared/schemas/targets';
import { mealTargets, meetsShown } from '../../../shared/shown-figures';
import { numberText, readNumber } from '../../lib/read-number';

/** The targets form as typed. */
export interface TargetsValues {
  perMealKcal: string;
  perMealProteinG: string;
  kcalPerDay: string;
  proteinGPerDay: string;
  mealsPerDay: string;
  fiberMinG: string;
  sodiumMaxMg: string;
  note: string;
}

export type TargetsField = keyof TargetsValues;
export type TargetsErrors = Partial<Record<TargetsField, string>>;

export function targetsValues(targets: ClientTargets | null): TargetsValues {
  return {
    perMealKcal: numberText(targets?.perMeal.kcal, 0),
    perMealProteinG: numberText(targets?.perMeal.proteinG),
    kcalPerDay: numberText(targets?.kcalPerDay, 0),
    proteinGPerDay: numberText(targets?.proteinGPerDay),
    mealsPerDay: numberText(targets?.mealsPerDay, 0),
    fiberMinG: numberText(targets?.fiberMinG),
    sodiumMaxMg: numberText(targets?.sodiumMaxMg, 0),
    note: targets?.note ?? '',
  };
}

/**
 * An estimate as targets to save: whole kcal and whole grams, since a coach sets round numbers
 * and the estimate is no more exact than that. Fiber, sodium and the note are left as they were.
 */
export function applyEstimate(current: TargetsValues, estimate: TargetEstimate, mealsPerDay: number): TargetsValues {
  const rounded = mealTargets(estimate.kcalPerDay, estimate.proteinGPerDay, mealsPerDay);
  return {
    ...current,
    perMealKcal: String(rounded.perMeal.kcal),
    perMealProteinG: String(rounded.perMeal.proteinG),
    kcalPerDay: String(rounded.kcalPerDay),
    proteinGPerDay: String(rounded.proteinGPerDay),
    mealsPerDay: String(mealsPerDay),
  };
}

interface NumberRule {
  field: Exclude<TargetsField, 'note'>;
  min: number;
  /** the lowest value itself is refused (a calorie ceiling of 0 makes no sense) */
  minExclusive?: boolean;
  max: number;
  integer?: boolean;
  required?: boolean;
  what: string;
}

// The server's limits (clientTargetsSchema in shared/schemas/coaching.ts).
const RULES: NumberRule[] = [
  { field: 'perMealKcal', min: 0, minExclusive: true, max: 5_000, required: true, what: 'the calories per meal' },
  { field: 'perMealProteinG', min: 0, max: 300, required: true, what: 'the protein per meal' },
  { field: 'kcalPerDay', min: 0, minExclusive: true, max: 10_000, what: 'the calories a day' },
  { field: 'proteinGPerDay', min: 0, max: 600, what: 'the protein a day' },
  { field: 'mealsPerDay', min: 1, max: 8, integer: true, what: 'the meals a day' },
  { field: 'fiberMinG', min: 0, max: 200, what: 'the fiber' },
  { field: 'sodiumMaxMg', min: 0, max: 20_000, what: 'the sodium' },
];

export const MAX_TARGET_NOTE_CHARS = 2_000;

export type TargetsResult = { ok: true; targets: ClientTargets } | { ok: false; errors: TargetsErrors };

export function targetsFromValues(values: TargetsValues): TargetsResult {
  const errors: TargetsErrors = {};
  const read: Partial<Record<NumberRule['field'], number>> = {};
  for (const rule of RULES) {
    const value = readNumber(values[rule.field]);
    if (value === undefined) {
      if (rule.required) errors[rule.field] = `Enter ${rule.what}.`;
      continue;
    }
    const tooLow = rule.minExclusive ? value <= rule.min : value < rule.min;
    if (Number.isNaN(value)) errors[rule.field] = 'Enter a number.';
    else if (rule.integer && !Number.isInteger(value)) errors[rule.field] = 'Enter a whole number.';
    else if (tooLow || value > rule.max) {
      errors[rule.field] =
        `Enter ${rule.what} from ${rule.minExclusive ? 'above ' : ''}${rule.min.toLocaleString('en-US')} to ${rule.max.toLocaleString('en-US')}.`;
    } else read[rule.field] = value;
  }
  const note = values.note.trim();
  if (note.length > MAX_TARGET_NOTE_CHARS) errors.note = `Keep the note to ${MAX_TARGET_NOTE_CHARS.toLocaleString('en-US')} characters.`;

  if (Object.keys(errors).length > 0 || read.perMealKcal === undefined || read.perMealProteinG === undefined) return { ok: false, errors };
  const targets: ClientTargets = { perMeal: { kcal: read.perMealKcal, proteinG: read.perMealProteinG } };
  if (read.kcalPerDay !== undefined) targets.kcalPerDay = read.kcalPerDay;
  if (read.proteinGPerDay !== undefined) targets.proteinGPerDay = read.proteinGPerDay;
  if (read.mealsPerDay !== undefined) targets.mealsPerDay = read.mealsPerDay;
  if (read.fiberMinG !== undefined) targets.fiberMinG = read.fiberMinG;
  if (read.sodiumMaxMg !== undefined) targets.sodiumMaxMg = read.sodiumMaxMg;
  if (note) targets.note = note;
  return { ok: true, targets };
}

const SERVER_FIELDS: Record<string, TargetsField> = {
  'perMeal.kcal': 'perMealKcal',
  'perMeal.proteinG': 'perMealProteinG',
  perMeal: 'perMealKcal',
  kcalPerDay: 'kcalPerDay',
  proteinGPerDay: 'proteinGPerDay',
  mealsPerDay: 'mealsPerDay',
  fiberMinG: 'fiberMinG',
  sodiumMaxMg: 'sodiumMaxMg',
  note: 'note',
};

export function targetsErrorsFrom(fieldErrors: Record<string, string>): TargetsErrors {
  const errors: TargetsErrors = {};
  for (const [key, message] of Object.entries(fieldErrors)) {
    const field = SERVER_FIELDS[key];
    if (field) errors[field] ??= message;
  }
  return errors;
}

/** Whether a saved version's figures per serving meet the per-meal targets. */
export function meetsPerMeal(perServing: { kcal: number; proteinG: number }, targets: ClientTargets | null): { kcal: boolean; protein: boolean } | null {
  if (!targets) return null;
  return meetsShown(perServing, targets.perMeal);
}
