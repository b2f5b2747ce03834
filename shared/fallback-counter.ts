/**
 * The last-resort guards of parsing, matching and weighing ("never throws, never returns NaN") are
 * counted and reported, so a bug caught by a guard is seen rather than turned into a quiet answer.
 * Tests assert `fallbackCount()` stays 0; the server passes a logger to `onFallback`.
 */
export type FallbackSite = 'parse-line' | 'match-food' | 'search-foods' | 'weigh-line';

const counts = new Map<FallbackSite, number>();
type Reporter = (site: FallbackSite, error: unknown) => void;
const reporters = new Set<Reporter>();

const consoleReporter: Reporter = (site, error) => {
  console.warn(`[fallback] ${site}: ${error instanceof Error ? error.message : String(error)}`);
};

/** Count a fallback taken at `site` and report it (to the console unless a reporter is registered). */
export function recordFallback(site: FallbackSite, error: unknown): void {
  counts.set(site, (counts.get(site) ?? 0) + 1);
  if (reporters.size === 0) consoleReporter(site, error);
  for (const report of reporters) report(site, error);
}

/** Fallbacks taken since the last reset, at one site or at all. */
export function fallbackCount(site?: FallbackSite): number {
  if (site) return counts.get(site) ?? 0;
  let n = 0;
  for (const c of counts.values()) n += c;
  return n;
}

export function resetFallbackCounts(): void {
  counts.clear();
}

/** Report fallbacks to `report` instead of the console; returns the function that stops it. */
export function onFallback(report: Reporter): () => void {
  reporters.add(report);
  return () => reporters.delete(report);
}
