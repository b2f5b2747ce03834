/** The batches a cook has picked to shop for, kept in localStorage between visits. */

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

function wholeIn(value: unknown, min: number, max: number): value is number {
  return typeof value === 'number' && Number.isInteger(value) && value >= min && value <= max;
}

export function isValidPortions(portions: number): boolean {
  return wholeIn(portions, MIN_PORTIONS, MAX_PORTIONS);
}

function isPick(value: unknown): value is ShoppingPick {
  if (!value || typeof value !== 'object') return false;
  const p = value as Record<string, unknown>;
  return (
    wholeIn(p.recipeId, 1, Number.MAX_SAFE_INTEGER) && wholeIn(p.versionNumber, 1, Number.MAX_SAFE_INTEGER) && wholeIn(p.portions, MIN_PORTIONS, MAX_PORTIONS)
  );
}

export function loadPicks(): ShoppingPick[] {
  try {
    const parsed: unknown = JSON.parse(window.localStorage.getItem(PICKS_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter(isPick).slice(0, MAX_PICKS) : [];
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
  const pick = { recipeId: Number(match[1]), versionNumber: Number(match[2]), portions: Number(match[3]) };
  return isPick(pick) ? pick : null;
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
