/** Nutrients of an amount of food. Every value is unrounded; rounding is for display only. */
export interface Nutrients {
  kcal: number;
  proteinG: number;
  fatG: number;
  satFatG: number;
  carbsG: number;
  fiberG: number;
  sugarG: number;
  sodiumMg: number;
}

export const NUTRIENT_KEYS = ['kcal', 'proteinG', 'fatG', 'satFatG', 'carbsG', 'fiberG', 'sugarG', 'sodiumMg'] as const satisfies readonly (keyof Nutrients)[];

export type NutrientKey = (typeof NUTRIENT_KEYS)[number];

export function zeroNutrients(): Nutrients {
  return { kcal: 0, proteinG: 0, fatG: 0, satFatG: 0, carbsG: 0, fiberG: 0, sugarG: 0, sodiumMg: 0 };
}

/** Nutrients of `grams` of a food given its values per 100 g. */
export function nutrientsForGrams(per100g: Nutrients, grams: number): Nutrients {
  const out = zeroNutrients();
  for (const k of NUTRIENT_KEYS) out[k] = (per100g[k] * grams) / 100;
  return out;
}

export function addNutrients(a: Nutrients, b: Nutrients): Nutrients {
  const out = zeroNutrients();
  for (const k of NUTRIENT_KEYS) out[k] = a[k] + b[k];
  return out;
}

export function sumNutrients(list: Nutrients[]): Nutrients {
  return list.reduce(addNutrients, zeroNutrients());
}

export function divideNutrients(n: Nutrients, by: number): Nutrients {
  const out = zeroNutrients();
  for (const k of NUTRIENT_KEYS) out[k] = n[k] / by;
  return out;
}

/** Grams of protein per 100 kcal: the quick judge of a lean swap. */
export function proteinPer100Kcal(n: Nutrients): number {
  return n.kcal > 0 ? (n.proteinG / n.kcal) * 100 : 0;
}

/** kcal per gram of food (energy density). */
export function kcalPerGram(n: Nutrients, grams: number): number {
  return grams > 0 ? n.kcal / grams : 0;
}

/** General Atwater factors (USDA Handbook 74; FAO 2003): 4 kcal/g protein and carbohydrate, 9 kcal/g fat. */
export function generalAtwaterKcal(proteinG: number, carbsG: number, fatG: number): number {
  return 4 * proteinG + 4 * carbsG + 9 * fatG;
}
