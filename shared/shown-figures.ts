/**
 * The figures a screen shows, computed and rounded once so two screens never disagree: grams to
 * 0.1 g under 10 g and whole above, kcal whole, volume per serving in whole mL. Comparisons with a
 * target ("meets the protein target") use the rounded figures, so 63.6 g shown as "64 g" meets 64 g.
 * Stored values are never rounded; these are for display and for what the display claims.
 */

/** Decimals a gram figure is shown with: one under 10 g (0.4 g is not 0 g), none from 10 g. */
export function gramDigits(grams: number): number {
  return Math.abs(grams) < 10 ? 1 : 0;
}

function roundTo(value: number, digits: number): number {
  const f = 10 ** digits;
  // Round half away from zero, as Intl.NumberFormat does; the 1e-9 nudge keeps 63.5 from becoming 63.4999….
  return (Math.sign(value) * Math.round(Math.abs(value) * f + 1e-9)) / f;
}

export function shownGrams(grams: number): number {
  return Number.isFinite(grams) ? roundTo(grams, gramDigits(grams)) : 0;
}

export function shownKcal(kcal: number): number {
  return Number.isFinite(kcal) ? roundTo(kcal, 0) : 0;
}

/** Volume of one serving, in whole mL: the dish's volume ÷ servings. */
export function servingVolumeMl(totalMl: number, servings: number): number {
  return servings > 0 && Number.isFinite(totalMl) ? roundTo(totalMl / servings, 0) : 0;
}

/** Whether per-serving figures meet per-meal targets, judged on the figures as shown. */
export function meetsShown(perServing: { kcal: number; proteinG: number }, target: { kcal: number; proteinG: number }): { kcal: boolean; protein: boolean } {
  return { kcal: shownKcal(perServing.kcal) <= shownKcal(target.kcal), protein: shownGrams(perServing.proteinG) >= shownGrams(target.proteinG) };
}

/**
 * Daily targets set as whole numbers per meal: per meal = the day ÷ meals, rounded; the day is then
 * per meal × meals, so the day a coach reads equals the meals added up.
 */
export function mealTargets(kcalPerDay: number, proteinGPerDay: number, mealsPerDay: number) {
  const perMeal = { kcal: Math.round(kcalPerDay / mealsPerDay), proteinG: Math.round(proteinGPerDay / mealsPerDay) };
  return { perMeal, kcalPerDay: perMeal.kcal * mealsPerDay, proteinGPerDay: perMeal.proteinG * mealsPerDay };
}
