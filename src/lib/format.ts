/**
 * Numbers for display. Values are rounded here and only here; whatever is stored or sent
 * to the server stays unrounded.
 */
import { gramDigits } from '../../shared/shown-figures';
import type { UnitSystem } from './user';

import { GRAMS_PER_OUNCE, OUNCES_PER_POUND } from '../../shared/units';

const formatters = new Map<string, Intl.NumberFormat>();

function numberFormat(maxFractionDigits: number): Intl.NumberFormat {
  const key = String(maxFractionDigits);
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { maximumFractionDigits: maxFractionDigits, minimumFractionDigits: 0 });
    formatters.set(key, f);
  }
  return f;
}

function finite(value: number): number {
  return Number.isFinite(value) ? value : 0;
}

/** A plain number with at most `digits` decimals and thousands separators; "-0" shows as "0". */
export function formatNumber(value: number, digits = 0): string {
  const text = numberFormat(digits).format(finite(value));
  return text === '-0' ? '0' : text;
}

/** Small amounts keep one decimal so 0.4 g does not read as 0 g; from 10 up whole numbers suffice. */
function smallAmountDigits(value: number): number {
  return gramDigits(value);
}

/** Weight of food in grams: "0.5 g", "7.5 g", "128 g", "1,250 g". */
export function formatGrams(grams: number): string {
  return `${formatNumber(grams, smallAmountDigits(grams))} g`;
}

/** Energy: whole kilocalories, "452 kcal". */
export function formatKcal(kcal: number): string {
  return `${formatNumber(kcal, 0)} kcal`;
}

/** A macronutrient (protein, carbs, fat, fiber, sugar) in grams: "0.4 g", "12 g". */
export function formatMacroG(grams: number): string {
  return `${formatNumber(grams, smallAmountDigits(grams))} g`;
}

/** Sodium and other minerals in milligrams, whole: "540 mg". */
export function formatMg(mg: number): string {
  return `${formatNumber(mg, 0)} mg`;
}

/** Protein density, the quick judge of a lean swap: "9.8 g protein / 100 kcal". */
export function formatProteinDensity(gPer100Kcal: number): string {
  return `${formatNumber(gPer100Kcal, 1)} g protein / 100 kcal`;
}

/** Energy density: "1.45 kcal/g". */
export function formatEnergyDensity(kcalPerGram: number): string {
  return `${formatNumber(kcalPerGram, 2)} kcal/g`;
}

/**
 * The everyday measure shown beside grams: ounces (and pounds from 1 lb) for US measures,
 * kilograms from 1 kg for metric. Returns null where grams alone say it (metric under 1 kg, zero).
 */
export function everydayWeight(grams: number, unitSystem: UnitSystem): string | null {
  const g = finite(grams);
  if (g <= 0) return null;
  if (unitSystem === 'metric') return g >= 1000 ? `${formatNumber(g / 1000, 2)} kg` : null;

  const totalOunces = g / GRAMS_PER_OUNCE;
  if (totalOunces < OUNCES_PER_POUND) {
    return `${formatNumber(totalOunces, totalOunces < 1 ? 2 : 1)} oz`;
  }
  // Round the ounces first so 15.96 oz past a pound shows as the next pound, not "1 lb 16 oz".
  const tenthsOfOunce = Math.round(totalOunces * 10);
  const pounds = Math.floor(tenthsOfOunce / (OUNCES_PER_POUND * 10));
  const ounces = (tenthsOfOunce - pounds * OUNCES_PER_POUND * 10) / 10;
  return ounces === 0 ? `${pounds} lb` : `${pounds} lb ${formatNumber(ounces, 1)} oz`;
}

/** Grams first, the everyday measure beside them: "454 g (1 lb)", "85 g (3 oz)", "1,250 g (1.25 kg)". */
export function formatWeight(grams: number, unitSystem: UnitSystem): string {
  const everyday = everydayWeight(grams, unitSystem);
  return everyday ? `${formatGrams(grams)} (${everyday})` : formatGrams(grams);
}
