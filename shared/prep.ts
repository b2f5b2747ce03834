/**
 * Batch prep: a saved version scaled to a number of portions (one portion = one serving of the version),
 * with scale-ready gram weights per portion and for the whole batch, and a shopping list merged across batches.
 * Grams stay unrounded; `display` is the rounded text for a kitchen scale.
 */
import { roundHalfUp } from './label-rounding';

export const MIN_PORTIONS = 1;
export const MAX_PORTIONS = 100;

/** A food's id; null for a line no catalogue food matched (merged by name instead). */
export type PrepFoodId = number | string | null;

export interface PrepLine {
  foodId: PrepFoodId;
  name: string;
  grams: number;
}

export interface PrepLineOut extends PrepLine {
  /** grams for a kitchen scale: "12 g", "4.5 g" */
  display: string;
}

export interface PrepVersion {
  servings: number;
  lines: readonly PrepLine[];
}

export interface PrepPlan {
  portions: number;
  perPortion: PrepLineOut[];
  batch: PrepLineOut[];
}

/** Grams as a kitchen scale reads them: to 0.1 g under 10 g, to 1 g from 10 g up. */
export function roundPrepGrams(grams: number): number {
  if (!Number.isFinite(grams) || grams < 0) throw new RangeError(`grams must be a finite number ≥ 0, got ${grams}`);
  const tenths = roundHalfUp(grams, 0.1);
  // 9.96 g rounds to 10.0 in tenths, and from 10 g up the scale shows whole grams
  return tenths < 10 ? tenths : roundHalfUp(grams, 1);
}

/** "12 g", "4.5 g", "0 g". */
export function formatPrepGrams(grams: number): string {
  return `${roundPrepGrams(grams)} g`;
}

function checkPortions(portions: number): void {
  if (!Number.isInteger(portions) || portions < MIN_PORTIONS || portions > MAX_PORTIONS) {
    throw new RangeError(`portions must be a whole number from ${MIN_PORTIONS} to ${MAX_PORTIONS}, got ${portions}`);
  }
}

function checkVersion(version: PrepVersion): void {
  if (!Number.isFinite(version.servings) || version.servings <= 0) {
    throw new RangeError(`servings must be a number above 0, got ${version.servings}`);
  }
  version.lines.forEach((line, i) => {
    if (!Number.isFinite(line.grams) || line.grams < 0) {
      throw new RangeError(`line ${i + 1} (${line.name}): grams must be a finite number ≥ 0, got ${line.grams}`);
    }
  });
}

function out(line: PrepLine, grams: number): PrepLineOut {
  return { foodId: line.foodId, name: line.name, grams, display: formatPrepGrams(grams) };
}

/** A version scaled to `portions` portions: each line per portion and for the batch, in the version's order. */
export function scaleVersion(version: PrepVersion, portions: number): PrepPlan {
  checkPortions(portions);
  checkVersion(version);
  const { servings } = version;
  return {
    portions,
    perPortion: version.lines.map((l) => out(l, l.grams / servings)),
    // multiply before dividing: 3 servings scaled to 3 portions gives the recipe's grams exactly
    batch: version.lines.map((l) => out(l, (l.grams * portions) / servings)),
  };
}

function mergeKey(line: PrepLine): string {
  return line.foodId === null ? `name:${line.name.trim().toLowerCase()}` : `id:${String(line.foodId)}`;
}

/**
 * One shopping list from several batches (or versions): lines of the same food summed, in the order
 * each food first appears, under the name it first appeared with.
 */
export function mergeShopping(batches: readonly (readonly PrepLine[])[]): PrepLine[] {
  const merged = new Map<string, PrepLine>();
  for (const batch of batches) {
    for (const line of batch) {
      if (!Number.isFinite(line.grams) || line.grams < 0) {
        throw new RangeError(`${line.name}: grams must be a finite number ≥ 0, got ${line.grams}`);
      }
      const key = mergeKey(line);
      const seen = merged.get(key);
      if (seen) seen.grams += line.grams;
      else merged.set(key, { foodId: line.foodId, name: line.name, grams: line.grams });
    }
  }
  return [...merged.values()];
}
