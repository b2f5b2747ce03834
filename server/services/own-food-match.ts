/**
 * The thin layer ahead of the catalogue matcher: a viewer's own foods (and their coach's) win a line
 * when its food phrase names them. A phrase fits a food when every word of the phrase is in the food's
 * name ("low-carb tortillas" → "Cloudmeadow low-carb tortilla"; a lone word only for a name of at most
 * two words), or every word of the food's name is in the phrase ("warm Cloudmeadow low-carb tortillas").
 */
import type { CatalogueFood } from '../../shared/food';
import { STOP_WORDS, words } from '../matching/normalise-phrase';

function tokens(text: string): Set<string> {
  return new Set(words(text).filter((w) => !STOP_WORDS.has(w) && !/^\d+%?$/.test(w)));
}

const nameTokens = new WeakMap<CatalogueFood, Set<string>>();
function foodTokens(food: CatalogueFood) {
  let t = nameTokens.get(food);
  if (!t) {
    t = tokens(food.name);
    nameTokens.set(food, t);
  }
  return t;
}

/** How well a phrase names a food: 0 when it does not, else higher for a closer fit. */
export function ownFoodFit(phrase: string, food: CatalogueFood): number {
  const p = tokens(phrase);
  const f = foodTokens(food);
  if (p.size === 0 || f.size === 0) return 0;
  let shared = 0;
  for (const w of p) if (f.has(w)) shared++;
  if (shared === p.size && (p.size >= 2 || f.size <= 2)) return 1 + shared / f.size;
  if (shared === f.size) return 0.5 + shared / p.size / 2;
  return 0;
}

/** The best-fitting own food for a phrase; on a tie the earlier one (the viewer's own before the coach's). */
export function matchOwnFood<F extends CatalogueFood>(phrase: string, foods: readonly F[]): F | null {
  let best: { food: F; fit: number } | null = null;
  for (const food of foods) {
    const fit = ownFoodFit(phrase, food);
    if (fit > 0 && (!best || fit > best.fit)) best = { food, fit };
  }
  return best?.food ?? null;
}
