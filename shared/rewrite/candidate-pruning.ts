import type { Nutrients } from '../nutrition';
import type { TargetRow } from './targets';

/** What dominance needs to know about one candidate of a line. */
export interface PrunableCandidate {
  per100g: Nutrients;
  /**
   * everything that decides which grams and volumes the candidate allows and what its amounts cost
   * in 'closest' (kind, density, ratio, band, shares): equal shapes allow exactly the same plans
   */
  shape: string;
  /** cost of choosing it in the 'closest' objective (0 for the original) */
  cost: number;
  original: boolean;
}

/**
 * Whether `other` makes `c` unnecessary: it has the same shape (so at the same grams it has the same
 * volume, the same band and the same amount cost), it is at least as good per gram for every target
 * row (more of a floored nutrient, no more of a capped one), counts no more against the swap limit
 * and costs no more in the 'closest' objective. Then any plan using `c` can use `other` instead at
 * the same grams, keeping every line band, the dish volume and the amount cost, with targets no
 * worse and objective no worse — for every objective this module builds, since each is made of
 * those nutrients, the swap count, the swap costs and the amounts. Exact ties go to the earlier
 * candidate so that of two equal candidates one is kept.
 */
function dominates(other: PrunableCandidate, otherFirst: boolean, c: PrunableCandidate, rows: readonly TargetRow[]): boolean {
  if (c.original) return false;
  if (other.shape !== c.shape || other.cost > c.cost) return false;
  let strictlyBetter = other.cost < c.cost || other.original;
  for (const row of rows) {
    const a = other.per100g[row.key];
    const b = c.per100g[row.key];
    if (row.sense === 'min' ? a < b : a > b) return false;
    if (a !== b) strictlyBetter = true;
  }
  return strictlyBetter || otherFirst;
}

/** Indexes of the candidates worth a variable; the original is always kept. */
export function keptCandidates(candidates: readonly PrunableCandidate[], rows: readonly TargetRow[]): number[] {
  return candidates.flatMap((c, i) => (candidates.some((other, j) => j !== i && dominates(other, j < i, c, rows)) ? [] : [i]));
}
