/**
 * Counted fallbacks. Parsing, matching and weighing catch anything thrown inside them so one odd line
 * cannot break a whole recipe; each such catch reports here, so a bug never hides as a quiet default:
 * tests assert that none happened, and the server logs each one (server/boot.ts).
 */
export type FallbackSite = 'parse-line' | 'food-match' | 'food-search' | 'weigh-line';

type FallbackListener = (site: FallbackSite, error: unknown) => void;

const counts = new Map<FallbackSite, number>();
const listeners = new Set<FallbackListener>();

export function recordFallback(site: FallbackSite, error: unknown): void {
  counts.set(site, (counts.get(site) ?? 0) + 1);
  for (const listener of listeners) listener(site, error);
}

/** Fallbacks taken since start (or the last reset), at one site or at all of them. */
export function fallbackCount(site?: FallbackSite): number {
  if (site) return counts.get(site) ?? 0;
  let total = 0;
  for (const n of counts.values()) total += n;
  return total;
}

export function resetFallbacks(): void {
  counts.clear();
}

/** Call `listener` on every fallback; returns the function that stops it. */
export function onFallback(listener: FallbackListener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
