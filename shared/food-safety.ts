/**
 * Storage and reheating guidance for prepped dishes, from USDA FSIS consumer guidance
 * ("Leftovers and Food Safety"; "Freezing and Food Safety"). Where FSIS gives a range, Hearthswap picks
 * a point in it by the dish's foods; those picks are *common practice*, not FSIS rules.
 */
import type { Role } from './food';

/** The FSIS figures the guidance is built from. */
export const FSIS = {
  /** refrigerate cooked food within 2 hours of cooking … */
  refrigerateWithinHours: 2,
  /** … or within 1 hour when the air is above 90 °F */
  refrigerateWithinHoursHot: 1,
  hotAirF: 90,
  hotAirC: 32,
  /** fridge at 40 °F (4 °C) or below */
  fridgeMaxF: 40,
  fridgeMaxC: 4,
  /** cooked leftovers keep 3 to 4 days in the fridge */
  fridgeDays: { min: 3, max: 4 },
  /** food kept frozen at 0 °F (−18 °C) stays safe indefinitely; quality is what fades */
  freezerF: 0,
  freezerC: -18,
  /** leftovers keep their best quality 2 to 3 months frozen */
  freezerQualityMonths: { min: 2, max: 3 },
  /** reheat leftovers to 165 °F (74 °C), measured with a food thermometer */
  reheatF: 165,
  reheatC: 74,
} as const;

export interface StorageGuidance {
  fridgeDays: 3 | 4;
  freezerMonths: 2 | 3;
  reheatF: 165;
  reheatC: 74;
  fridgeMaxF: 40;
  fridgeMaxC: 4;
  freezerF: 0;
  freezerC: -18;
  /** sentences for a prep view, in display order */
  notes: string[];
}

export interface StorageInput {
  /** the recipe's foods, by their culinary roles */
  foods: readonly { roles: readonly Role[] }[];
  /** the recipe's method or notes, read for foil */
  method?: string | null;
}

/** Dishes kept to the short end of 3–4 days (*common practice*): seafood and soft-cheese or cream sauces spoil first. */
const SHORT_FRIDGE_ROLES: readonly Role[] = ['fish-seafood', 'soft-cheese', 'cream-sauce-base'];
/** Dishes kept to the short end of 2–3 months (*common practice*): cream and dairy sauces split and go grainy. */
const SHORT_FREEZER_ROLES: readonly Role[] = ['cream-sauce-base', 'cream', 'sour-cream-yogurt'];

/** "foil", "tin foil", "tinfoil", "aluminum foil", "aluminium foil", "foil-lined". */
const FOIL = /\b(?:tin)?foil(?:s|ed)?\b/i;

export function mentionsFoil(text: string | null | undefined): boolean {
  return typeof text === 'string' && FOIL.test(text);
}

/** Fridge and freezer life, reheating and the cautions a prep view shows for one recipe. */
export function storageFor(recipe: StorageInput): StorageGuidance {
  const roles = new Set(recipe.foods.flatMap((f) => f.roles));
  const shortFridge = SHORT_FRIDGE_ROLES.some((r) => roles.has(r));
  const shortFreezer = SHORT_FREEZER_ROLES.some((r) => roles.has(r));
  const fridgeDays = shortFridge ? 3 : 4;
  const freezerMonths = shortFreezer ? 2 : 3;

  const notes = [
    `Refrigerate within ${FSIS.refrigerateWithinHours} hours of cooking (within ${FSIS.refrigerateWithinHoursHot} hour above ${FSIS.hotAirF} °F / ${FSIS.hotAirC} °C); portion into shallow containers so it cools quickly.`,
    `Keep the fridge at ${FSIS.fridgeMaxF} °F (${FSIS.fridgeMaxC} °C) or below and eat within ${fridgeDays} days.` +
      (shortFridge ? ' Seafood and soft-cheese or cream sauces: the short end of USDA’s 3–4 days.' : ''),
    `Frozen at ${FSIS.freezerF} °F (${FSIS.freezerC} °C) it stays safe indefinitely; eat within ${freezerMonths} months for best quality.` +
      (shortFreezer ? ' Cream and dairy sauces may separate after longer.' : ''),
    'Thaw in the refrigerator, not on the counter.',
    `Reheat to ${FSIS.reheatF} °F (${FSIS.reheatC} °C), checked with a food thermometer.`,
  ];
  if (mentionsFoil(recipe.method)) {
    notes.push('Never put metal foil in a microwave: unwrap and reheat on a microwave-safe plate.');
  }
  notes.push('Not medical advice. Local food codes govern food sold to others.');

  return {
    fridgeDays,
    freezerMonths,
    reheatF: FSIS.reheatF,
    reheatC: FSIS.reheatC,
    fridgeMaxF: FSIS.fridgeMaxF,
    fridgeMaxC: FSIS.fridgeMaxC,
    freezerF: FSIS.freezerF,
    freezerC: FSIS.freezerC,
    notes,
  };
}
