/**
 * A packaged food's Nutrition Facts panel, per serving as printed, turned into the per-100 g values
 * the catalogue keeps, and the physical limits a panel must respect. Pure: the schema in
 * shared/schemas/foods.ts and the server both use it.
 */
import { generalAtwaterKcal, type Nutrients } from './nutrition';
import { normaliseUnit, unitKind, volumeToMl } from './units';
import type { Portion } from './food';
import { quantityValue } from './parse/quantity-text';

/** Values per serving exactly as the panel prints them; optional ones left out are 0. */
export interface LabelPanel {
  servingSizeG?: number;
  servingSizeMl?: number;
  /** grams per mL, when known; with only mL on the label, 1 g/mL is assumed */
  densityGPerMl?: number;
  servingLabel?: string;
  kcal?: number;
  proteinG: number;
  fatG: number;
  satFatG?: number;
  carbsG: number;
  fiberG?: number;
  sugarG?: number;
  sodiumMg?: number;
}

/**
 * Limits per 100 g. Physical: 100 g of food holds at most 100 g of protein, fat and carbohydrate
 * together; pure fat is 900 kcal at the general factor of 9 kcal/g; table salt is about 39,000 mg
 * sodium per 100 g (from memory), so 40,000 mg bounds any food.
 */
export const PER_100G_LIMITS = { kcal: 900, macroG: 100, sodiumMg: 40_000 } as const;
export const MIN_SERVING = 1;

/**
 * FDA 21 CFR 101.9(c) lets a panel round each macro to the nearest 0.5 g (fat under 5 g) or 1 g, and
 * calories to the nearest 5 or 10 kcal, so a small serving's printed values can add up to a little
 * more than its weight. The slack per 100 g is the larger of 2 g and 1.5 g per serving (three macros
 * each up to 0.5 g over) scaled to 100 g; for energy, 5 kcal per serving.
 */
export function roundingSlack(servingG: number) {
  return { macroG: Math.max(2, (1.5 * 100) / servingG), kcal: (5 * 100) / servingG };
}

/** A warning, not a refusal, when printed energy strays from the general factors by more than this. */
export const ATWATER_TOLERANCE = 0.2;

export function servingGrams(panel: Pick<LabelPanel, 'servingSizeG' | 'servingSizeMl' | 'densityGPerMl'>): number {
  if (panel.servingSizeG !== undefined) return panel.servingSizeG;
  if (panel.servingSizeMl !== undefined) return panel.servingSizeMl * (panel.densityGPerMl ?? 1);
  return Number.NaN;
}

export interface PanelIssue {
  field: keyof LabelPanel;
  message: string;
}

function fmt(n: number) {
  return Number(n.toPrecision(4)).toLocaleString('en-US');
}

/** What makes a panel physically impossible, each naming its field; [] when it could be real. */
export function panelIssues(panel: LabelPanel): PanelIssue[] {
  const issues: PanelIssue[] = [];
  const servingG = servingGrams(panel);
  const servingField: keyof LabelPanel = panel.servingSizeG !== undefined ? 'servingSizeG' : 'servingSizeMl';
  if (!Number.isFinite(servingG) || servingG < MIN_SERVING) {
    issues.push({ field: servingField, message: `A serving weighs at least ${MIN_SERVING} g (or ${MIN_SERVING} mL).` });
    return issues;
  }
  const slack = roundingSlack(servingG);
  const per100 = (v: number | undefined) => ((v ?? 0) * 100) / servingG;
  const macros = [
    ['proteinG', 'protein'],
    ['fatG', 'fat'],
    ['carbsG', 'carbohydrate'],
    ['satFatG', 'saturated fat'],
    ['fiberG', 'fiber'],
    ['sugarG', 'sugars'],
  ] as const;
  for (const [field, word] of macros) {
    const v = per100(panel[field]);
    if (v > PER_100G_LIMITS.macroG + slack.macroG) {
      issues.push({ field, message: `${fmt(panel[field] ?? 0)} g of ${word} cannot fit in a ${fmt(servingG)} g serving (that is ${fmt(v)} g per 100 g).` });
    }
  }
  const sum = per100(panel.proteinG + panel.fatG + panel.carbsG);
  if (sum > PER_100G_LIMITS.macroG + slack.macroG && issues.length === 0) {
    issues.push({
      field: 'carbsG',
      message: `Protein, fat and carbohydrate add up to ${fmt(sum)} g per 100 g: more than the food weighs. Check the serving size and the amounts.`,
    });
  }
  if ((panel.satFatG ?? 0) > panel.fatG + 0.5) issues.push({ field: 'satFatG', message: 'Saturated fat is part of the total fat, so it cannot be more.' });
  if ((panel.sugarG ?? 0) > panel.carbsG + 1) issues.push({ field: 'sugarG', message: 'Sugars are part of the carbohydrate, so they cannot be more.' });
  if ((panel.fiberG ?? 0) > panel.carbsG + 1)
    issues.push({ field: 'fiberG', message: 'Fiber is part of the carbohydrate on a US label, so it cannot be more.' });
  if (panel.kcal !== undefined && per100(panel.kcal) > PER_100G_LIMITS.kcal + slack.kcal) {
    issues.push({
      field: 'kcal',
      message: `${fmt(panel.kcal)} kcal in ${fmt(servingG)} g is ${fmt(per100(panel.kcal))} kcal per 100 g; no food has more than ${PER_100G_LIMITS.kcal}.`,
    });
  }
  if (per100(panel.sodiumMg) > PER_100G_LIMITS.sodiumMg) {
    issues.push({
      field: 'sodiumMg',
      message: `${fmt(panel.sodiumMg ?? 0)} mg of sodium in ${fmt(servingG)} g is saltier than salt. Check the serving size and the sodium.`,
    });
  }
  return issues;
}

/**
 * Printed energy against the general factors 4/4/9 (USDA Handbook 74). US labels count fiber inside
 * the carbohydrate and fiber yields 0–4 kcal/g, so the check accepts anything between the two
 * readings, widened by the tolerance; 10 kcal of label rounding is never flagged.
 */
export function energyWarning(panel: LabelPanel): string | null {
  if (panel.kcal === undefined) return null;
  const high = generalAtwaterKcal(panel.proteinG, panel.carbsG, panel.fatG);
  const low = generalAtwaterKcal(panel.proteinG, Math.max(0, panel.carbsG - (panel.fiberG ?? 0)), panel.fatG);
  const lo = low * (1 - ATWATER_TOLERANCE) - 10;
  const hi = high * (1 + ATWATER_TOLERANCE) + 10;
  if (panel.kcal >= lo && panel.kcal <= hi) return null;
  return `The label says ${fmt(panel.kcal)} kcal, but its protein, carbohydrate and fat give ${fmt(Math.round(low))}–${fmt(Math.round(high))} kcal at 4/4/9 kcal per gram. Saved as printed: check the calories and the amounts.`;
}

export interface Per100g extends Nutrients {
  waterG: null;
}

/** Per-serving values scaled to 100 g; energy from 4/4/9 when the panel prints none. */
export function panelPer100g(panel: LabelPanel): { servingG: number; per100g: Per100g; energyFromAtwater: boolean } {
  const servingG = servingGrams(panel);
  const f = 100 / servingG;
  const kcal = panel.kcal ?? generalAtwaterKcal(panel.proteinG, panel.carbsG, panel.fatG);
  return {
    servingG,
    per100g: {
      kcal: kcal * f,
      proteinG: panel.proteinG * f,
      fatG: panel.fatG * f,
      satFatG: (panel.satFatG ?? 0) * f,
      carbsG: panel.carbsG * f,
      fiberG: (panel.fiberG ?? 0) * f,
      sugarG: (panel.sugarG ?? 0) * f,
      sodiumMg: (panel.sodiumMg ?? 0) * f,
      waterG: null,
    },
    energyFromAtwater: panel.kcal === undefined,
  };
}

/** "1 tortilla" → 1 × "tortilla"; "17 slices" → 17 × "slices"; "1/4 cup" → 0.25 × "cup"; null without an amount. */
export function readServingLabel(label: string | undefined): { amount: number; measure: string } | null {
  const m = /^\s*((?:\d+\s+)?\d+\s*\/\s*\d+|\d*\.?\d+|[¼½¾⅓⅔⅛])\s*(.*)$/u.exec(label ?? '');
  if (!m) return null;
  const amount = quantityValue(m[1]);
  const measure = m[2].replace(/\s*\(.*\)\s*$/, '').trim();
  if (amount === null || !(amount > 0) || !measure) return null;
  return { amount, measure };
}

/**
 * The household portions a panel gives: its serving label weighing `servingG` ("1 tortilla" = 45 g,
 * "17 slices" = 30 g), then "1 serving". A label in a volume unit ("1/4 cup") also gives a density.
 */
export function panelPortions(panel: LabelPanel, servingG: number): { portions: Portion[]; densityGPerMl: number | null } {
  const portions: Portion[] = [];
  let densityGPerMl: number | null = null;
  const read = readServingLabel(panel.servingLabel);
  if (read) {
    portions.push({ label: `${read.amount} ${read.measure}`, amount: read.amount, measure: read.measure, grams: servingG });
    const unit = normaliseUnit(read.measure);
    if (unit && unitKind(unit) === 'volume') {
      const ml = volumeToMl(read.amount, unit);
      if (ml && ml > 0) densityGPerMl = servingG / ml;
    }
  }
  portions.push({ label: '1 serving', amount: 1, measure: 'serving', grams: servingG });
  if (densityGPerMl === null && panel.servingSizeG !== undefined && panel.servingSizeMl !== undefined) densityGPerMl = panel.servingSizeG / panel.servingSizeMl;
  if (densityGPerMl === null && panel.densityGPerMl !== undefined) densityGPerMl = panel.densityGPerMl;
  return { portions, densityGPerMl };
}
