/** Amounts of a recipe line and of a dish in words: "2 1/2 cups", "1,850 mL (7.8 cups)". */
import { kitchenQuantity, measureWord, nearestKitchenFraction } from '../../../shared/kitchen-amounts';
import { ML_PER_CUP, ML_PER_TBSP, ML_PER_TSP } from '../../../shared/units';
import { formatNumber } from '../../lib/format';
import type { UnitSystem } from '../../lib/user';

const FRACTION_TOLERANCE = 0.01;

/** A quantity as a recipe writes it, in eighths and thirds: 2.5 → "2 1/2", 0.333 → "1/3"; else a decimal, 1.2 → "1.2". */
export function formatQuantity(quantity: number): string {
  if (!Number.isFinite(quantity)) return '';
  const nearest = nearestKitchenFraction(quantity, [8, 3]);
  if (Math.abs(quantity - nearest) >= FRACTION_TOLERANCE) return formatNumber(quantity, 2);
  return Number.isInteger(nearest) ? formatNumber(nearest, 0) : kitchenQuantity(nearest);
}

// Unit ids (shared/units.ts) whose written form is not the id itself.
const UNIT_TEXT: Record<string, string> = { 'fl-oz': 'fl oz', 'extra-large': 'extra-large', l: 'L', ml: 'mL', cl: 'cL', dl: 'dL' };
// Abbreviations and sizes read the same for one or many.
const INVARIANT = new Set([
  'g',
  'kg',
  'mg',
  'oz',
  'lb',
  'ml',
  'cl',
  'dl',
  'l',
  'tsp',
  'tbsp',
  'fl-oz',
  'large',
  'medium',
  'small',
  'extra-large',
  'jumbo',
  'cm',
  'dozen',
]);
/** A unit id in words for a quantity: ("cup", 2) → "cups", ("tbsp", 3) → "tbsp", ("fl-oz", 1) → "fl oz". */
export function unitWords(unit: string, quantity: number | null): string {
  const text = UNIT_TEXT[unit] ?? unit;
  if (quantity === null || INVARIANT.has(unit)) return text;
  return measureWord(text, quantity);
}

/** The amount a line was read as: "2 1/2 cups", "3 tbsp", "2" (a bare count), or null when it gives none. */
export function formatParsedAmount(parsed: { quantity: number | null; unit: string | null }): string | null {
  const { quantity, unit } = parsed;
  if (quantity === null && !unit) return null;
  if (quantity === null) return unitWords(unit as string, null);
  const q = formatQuantity(quantity);
  return unit ? `${q} ${unitWords(unit, quantity)}` : q;
}

/**
 * The kitchen measure beside millilitres: cups (tablespoons, teaspoons for small amounts) for US measures,
 * litres from 1 L for metric; null where millilitres alone say it. Volumes are NIST Handbook 44 exact.
 */
export function everydayVolume(ml: number, unitSystem: UnitSystem): string | null {
  if (!Number.isFinite(ml) || ml <= 0) return null;
  if (unitSystem === 'metric') return ml >= 1000 ? `${formatNumber(ml / 1000, 2)} L` : null;
  const cups = ml / ML_PER_CUP;
  if (cups >= 0.25) {
    const text = formatNumber(cups, cups < 10 ? 1 : 0);
    return `${text} ${text === '1' ? 'cup' : 'cups'}`;
  }
  if (ml >= ML_PER_TBSP) return `${formatNumber(ml / ML_PER_TBSP, 1)} tbsp`;
  return `${formatNumber(ml / ML_PER_TSP, 1)} tsp`;
}

/** Millilitres first, the kitchen measure beside them: "1,850 mL (7.8 cups)", "1,850 mL (1.85 L)", "250 mL". */
export function formatVolume(ml: number, unitSystem: UnitSystem): string {
  const value = Number.isFinite(ml) ? ml : 0;
  const everyday = everydayVolume(value, unitSystem);
  const text = `${formatNumber(value, 0)} mL`;
  return everyday ? `${text} (${everyday})` : text;
}

/** The most a line may weigh (the analysis contract's limit). */
export const MAX_LINE_GRAMS = 100_000;

/**
 * The typed text as grams, or a message for the cook. "1,250" is 1250 g
 * (a thousands separator); "7,5" is 7.5 g (a decimal comma).
 */
export function readGrams(text: string): { grams: number } | { error: string } {
  let t = text.trim().replace(/\s*g$/i, '');
  if (t === '') return { error: 'Enter the grams.' };
  if (/^\d{1,3}(?:,\d{3})+(?:\.\d+)?$/.test(t)) t = t.replace(/,/g, '');
  else t = t.replace(',', '.');
  if (t.startsWith('-')) return { error: 'Grams cannot be negative.' };
  if (!/^(?:\d+(?:\.\d*)?|\.\d+)$/.test(t)) return { error: 'Grams are a number, e.g. 120.' };
  const grams = Number(t);
  if (grams > MAX_LINE_GRAMS) return { error: 'At most 100,000 g.' };
  return { grams };
}
