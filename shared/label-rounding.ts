/**
 * Label-style rounding of per-serving nutrients by the FDA rules of 21 CFR 101.9(c), as tabulated in
 * the FDA Food Labeling Guide, Appendix H. Stored values are never rounded; this is for panels only.
 *
 * The thresholds compare the unrounded value; the increment then rounds half up (2.5 g → 3 g),
 * which is how Appendix H reads "nearest increment". Paragraph numbers below are from memory.
 */
import type { Nutrients } from './nutrition';

/** One declared line of a label panel. */
export interface LabelValue {
  /** the declared number; when `lessThan` is true, the bound it is less than (1 g) */
  amount: number;
  /** true for the "Less than 1g" declaration of protein, carbohydrate, fiber and sugars */
  lessThan: boolean;
  /** as printed on a panel: "120", "4.5g", "140mg", "Less than 1g" */
  text: string;
}

export interface LabelPanel {
  servingSizeG: LabelValue;
  calories: LabelValue;
  totalFatG: LabelValue;
  satFatG: LabelValue;
  sodiumMg: LabelValue;
  carbsG: LabelValue;
  fiberG: LabelValue;
  sugarG: LabelValue;
  proteinG: LabelValue;
}

/**
 * Drops binary floating-point noise beyond 12 significant digits, so a value meant as a decimal
 * half (0.29 × 50 = 14.499999999999998, meant 14.5) compares and rounds as the decimal it stands for.
 */
function decimalClean(x: number): number {
  return Number(x.toPrecision(12));
}

/**
 * `value` rounded to the nearest multiple of `step`, halves up, decimal-safe:
 * roundHalfUp(2.675, 0.01) = 2.68 and roundHalfUp(1.005, 0.01) = 1.01, although the binary doubles
 * just below those halves would round down.
 */
export function roundHalfUp(value: number, step: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`cannot round ${value}`);
  if (!(step > 0) || !Number.isFinite(step)) throw new RangeError(`rounding step must be a positive number, got ${step}`);
  const units = decimalClean(decimalClean(value) / step);
  return decimalClean(Math.round(units) * step);
}

/** A nutrient amount ready for comparison: finite, noise-free, never below zero. */
function declaredBase(value: number, what: string): number {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a finite number, got ${value}`);
  return Math.max(0, decimalClean(value));
}

function formatNumber(n: number): string {
  // at most one decimal is ever declared (fat in 0.5 g steps); String() drops a trailing ".0"
  return String(decimalClean(n));
}

function declared(amount: number, unit: '' | 'g' | 'mg'): LabelValue {
  return { amount, lessThan: false, text: `${formatNumber(amount)}${unit}` };
}

/** Calories: < 5 → 0; ≤ 50 → nearest 5; > 50 → nearest 10. 21 CFR 101.9(c)(1). */
export function roundCalories(kcal: number): LabelValue {
  const x = declaredBase(kcal, 'calories');
  if (x < 5) return declared(0, '');
  return declared(roundHalfUp(x, x <= 50 ? 5 : 10), '');
}

/** Total fat and saturated fat: < 0.5 g → 0; < 5 g → nearest 0.5 g; ≥ 5 g → nearest 1 g. 21 CFR 101.9(c)(2). */
export function roundFatGrams(grams: number): LabelValue {
  const x = declaredBase(grams, 'fat');
  if (x < 0.5) return declared(0, 'g');
  return declared(roundHalfUp(x, x < 5 ? 0.5 : 1), 'g');
}

/** Sodium: < 5 mg → 0; 5–140 mg → nearest 5 mg; > 140 mg → nearest 10 mg. 21 CFR 101.9(c)(4). */
export function roundSodiumMg(mg: number): LabelValue {
  const x = declaredBase(mg, 'sodium');
  if (x < 5) return declared(0, 'mg');
  return declared(roundHalfUp(x, x <= 140 ? 5 : 10), 'mg');
}

/**
 * Protein, total carbohydrate, dietary fiber and sugars: < 0.5 g → 0; 0.5 g to < 1 g → "Less than 1g";
 * ≥ 1 g → nearest 1 g. 21 CFR 101.9(c)(6) and (c)(7).
 */
export function roundGramNutrient(grams: number): LabelValue {
  const x = declaredBase(grams, 'nutrient');
  if (x < 0.5) return declared(0, 'g');
  if (x < 1) return { amount: 1, lessThan: true, text: 'Less than 1g' };
  return declared(roundHalfUp(x, 1), 'g');
}

/**
 * The serving size in grams as a panel shows it: whole grams, or tenths below 10 g so a small serving
 * never reads as 0g. A display choice (*common practice*), not one of the 101.9(c) nutrient rules.
 */
export function roundServingGrams(grams: number): LabelValue {
  const x = declaredBase(grams, 'serving size');
  return declared(roundHalfUp(x, x < 10 ? 0.1 : 1), 'g');
}

/** A label-style panel of one serving, every line rounded by 21 CFR 101.9(c). */
export function roundLabel(perServing: Nutrients, servingSizeG: number): LabelPanel {
  return {
    servingSizeG: roundServingGrams(servingSizeG),
    calories: roundCalories(perServing.kcal),
    totalFatG: roundFatGrams(perServing.fatG),
    satFatG: roundFatGrams(perServing.satFatG),
    sodiumMg: roundSodiumMg(perServing.sodiumMg),
    carbsG: roundGramNutrient(perServing.carbsG),
    fiberG: roundGramNutrient(perServing.fiberG),
    sugarG: roundGramNutrient(perServing.sugarG),
    proteinG: roundGramNutrient(perServing.proteinG),
  };
}
