/** The batches a cook has picked to shop for, kept in localStorage between visits. */
import { z } from 'zod';

export interface ShoppingPick {
  recipeId: number;
  versionNumber: number;
  portions: number;
}

export const MIN_PORTIONS = 1;
export const MAX_PORTIONS = 100;
/** the server's limit for one list */
export const MAX_PICKS = 20;

const PICKS_KEY = 'hearthswap:shopping-picks';

const portionsSchema = z.number().int().min(MIN_PORTIONS).max(MAX_PORTIONS);
const pickSchema = z.object({ recipeId: z.number().int().min(1), versionNumber: z.number().int().min(1), portions: portionsSchema });

export function isValidPortions(portions: number): boolean {
  return portionsSchema.safeParse(portions).success;
}

/** The picks that are still well formed; a damaged one is dropped, not the whole list. */
function validPicks(values: unknown): ShoppingPick[] {
  if (!Array.isArray(values)) return [];
  return values.flatMap((value) => {
    const pick = pickSchema.safeParse(value);
    return pick.success ? [pick.data] : [];
  });
}

export function loadPicks(): ShoppingPick[] {
  try {
    return validPicks(JSON.parse(window.localStorage.getItem(PICKS_KEY) ?? '[]')).slice(0, MAX_PICKS);
  } catch {
    return [];
  }
}

export function savePicks(picks: ShoppingPick[]): void {
  try {
    if (picks.length === 0) window.localStorage.removeItem(PICKS_KEY);
    else window.localStorage.setItem(PICKS_KEY, JSON.stringify(picks));
  } catch {
    // storage refused: the picks last for this visit
  }
}

/** "12.3.6" (recipe 12, version 3, 6 portions), as the prep page's link carries it. */
export function parsePickParam(value: string | null): ShoppingPick | null {
  const match = value?.match(/^(\d+)\.(\d+)\.(\d+)$/);
  if (!match) return null;
  const pick = pickSchema.safeParse({ recipeId: Number(match[1]), versionNumber: Number(match[2]), portions: Number(match[3]) });
  return pick.success ? pick.data : null;
}

export function samePick(a: Pick<ShoppingPick, 'recipeId' | 'versionNumber'>, b: Pick<ShoppingPick, 'recipeId' | 'versionNumber'>): boolean {
  return a.recipeId === b.recipeId && a.versionNumber === b.versionNumber;
}

/** A version already on the list takes the new portions rather than appearing twice. */
export function withPick(picks: ShoppingPick[], pick: ShoppingPick): ShoppingPick[] {
  if (picks.some((p) => samePick(p, pick))) return picks.map((p) => (samePick(p, pick) ? pick : p));
  return [...picks, pick].slice(0, MAX_PICKS);
}

/** Identifies a set of batches: the same picks in any order give the same list and keep the same ticks. */
export function picksSignature(picks: readonly ShoppingPick[]): string {
  return picks
    .map((p) => `${p.recipeId}.${p.versionNumber}.${p.portions}`)
    .sort()
    .join('+');
}

export function shoppingChecksKey(picks: readonly ShoppingPick[]): string {
  return `hearthswap:shopping-checks:${picksSignature(picks)}`;
}
