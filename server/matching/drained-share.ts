/** The share of a can left after draining (data/drained-shares.json, from USDA SR28 WEIGHT.txt pairs). */
import shareFile from '../../data/drained-shares.json';
import type { CatalogueFood } from '../../shared/food';
import { words } from './normalise-phrase';

export interface DrainedShare {
  words: string[];
  share: number;
  source: string;
}

export const DRAINED_SHARES: readonly DrainedShare[] = (shareFile as { shares: DrainedShare[] }).shares;

/** The drained share for a canned food by its name, or null when SR28 gives none for its kind. */
export function drainedShareFor(foodName: string, shares: readonly DrainedShare[] = DRAINED_SHARES): DrainedShare | null {
  const ws = new Set(words(foodName));
  return shares.find((s) => s.words.every((w) => ws.has(w))) ?? null;
}

/** SR28's "drained solids" foods: their "1 can" portions already leave the liquid out. */
export function isDrainedSolids(food: CatalogueFood | null): boolean {
  return Boolean(food && /\bdrained\b|\bdrnd\b/i.test(food.name));
}
