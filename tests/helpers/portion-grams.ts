/**
 * Grams of one household portion, for tests that name the source of an expected weight: a USDA SR28
 * WEIGHT.txt row (tests/reference, read through reference-data.ts) or a sourced row of
 * data/curated-portions.json.
 */
import curated from '../../data/curated-portions.json';
import { readWeights } from './reference-data';

let weights: ReturnType<typeof readWeights> | undefined;

/** Grams of one SR28 WEIGHT.txt row per unit of its amount, by NDB number and its measure text. */
export function sr28Grams(ndb: string, measure: RegExp): number {
  weights ??= readWeights();
  const row = weights.find((w) => w.ndbNo === ndb && measure.test(w.msreDesc));
  if (!row) throw new Error(`no SR28 WEIGHT row ${ndb} ${measure}`);
  return row.gmWgt / row.amount;
}

/** Grams of one curated row per unit of its amount. */
export function curatedGrams(ndb: string, measure: string): number {
  const row = curated.rows.find((r) => r.ndb === ndb && r.measure === measure);
  if (!row) throw new Error(`no curated row ${ndb} ${measure}`);
  return row.grams / row.amount;
}
