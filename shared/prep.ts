/**
 * Batch prep: a saved version scaled to a number of portions (one portion = one serving of the version),
 * with scale-ready gram weights per portion and for the whole batch, and a shopping list merged across batches.
 * Grams stay unrounded; `display` is the rounded text for a kitchen scale.
 */
import { roundHalfUp } from './label-rounding';
import type { WrittenMeasure } from './purchase-hint';

export const MIN_PORTIONS = 1;
export const MAX_PORTIONS = 100;

/** A food's id; null for a line no catalogue food matched (merged by name instead). */
export type PrepFoodId = number | string | null;

export interface PrepLine {
  foodId: PrepFoodId;
  name: string;
  grams: number;
  /** the measure the recipe named for these grams ("2 (6 oz) cans"); scales with them */
  measure?: WrittenMeasure | null;
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

/** The line's measure for `grams` of it: the same measure, its amount in proportion. */
export function scaledMeasure(line: PrepLine, grams: number): WrittenMeasure | null {
  if (!line.measure || !(line.grams > 0)) return null;
  return { ...line.measure, amount: (line.measure.amount * grams) / line.grams };
}

function out(line: PrepLine, grams: number): PrepLineOut {
  const measure = scaledMeasure(line, grams);
  return { foodId: line.foodId, name: line.name, grams, display: formatPrepGrams(grams), ...(measure && { measure }) };
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
 * each food first appears, under the name it first appeared with. Their measures add up when every
 * line named the same one; otherwise the item has none (one unit system per item: the list then
 * falls back to household weights for the total).
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
      if (seen) {
        seen.grams += line.grams;
        if (seen.measure !== undefined || line.measure) {
          const same = seen.measure && line.measure && seen.measure.key === line.measure.key;
          seen.measure = same ? { ...seen.measure!, amount: seen.measure!.amount + line.measure!.amount } : null;
        }
      } else {
        merged.set(key, { foodId: line.foodId, name: line.name, grams: line.grams, ...(line.measure && { measure: { ...line.measure } }) });
      }
    }
  }
  return [...merged.values()];
}
