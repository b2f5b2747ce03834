import type { Nutrients } from '../nutrition';
import type { TargetRow } from './targets';

/** What dominance needs to know about one candidate of a line. */
export interface PrunableCandidate {
  per100g: Nutrients;
  densityGPerMl: number;
  /** centre of the line's volume band for this candidate, mL */
  centreMl: number;
  /** cost of choosing it in the 'closest' objective (0 for the original) */
  cost: number;
  original: boolean;
}

function perMl(c: PrunableCandidate, key: keyof Nutrients): number {
  return (c.per100g[key] / 100) * c.densityGPerMl;
}

/**
 * Whether `other` makes `c` unnecessary: used at the same volume it is at least as good for every
 * target row (more per mL of a floored nutrient, no more of a capped one), it allows exactly the
 * same volumes (same band centre), counts no more against the swap limit and costs no more in the
 * 'closest' objective. Then any plan using `c` can use `other` instead at the same volume, keeping
 * every line band, the dish volume and the deviation from the centre, with targets no worse and
 * objective no worse — for every objective this module builds, since each is made of those
 * nutrients, the swap count, the swap costs and the deviation. Exact ties go to the earlier
 * candidate so that of two equal candidates one is kept.
 */
function dominates(other: PrunableCandidate, otherFirst: boolean, c: PrunableCandidate, rows: readonly TargetRow[]): boolean {
  if (c.original) return false;
  if (other.centreMl !== c.centreMl || other.cost > c.cost) return false;
  let strictlyBetter = other.cost < c.cost || other.original;
  for (const row of rows) {
    const a = perMl(other, row.key);
    const b = perMl(c, row.key);
    if (row.sense === 'min' ? a < b : a > b) return false;
    if (a !== b) strictlyBetter = true;
  }
  return strictlyBetter || otherFirst;
}

/** Indexes of the candidates worth a variable; the original is always kept. */
export function keptCandidates(candidates: readonly PrunableCandidate[], rows: readonly TargetRow[]): number[] {
  return candidates.flatMap((c, i) =>
    candidates.some((other, j) => j !== i && dominates(other, j < i, c, rows)) ? [] : [i],
  );
}
