import { keptCandidates } from './candidate-pruning';
import type { ResolvedOptions } from './rewrite-options';
import type { TargetRow } from './targets';
import type { Candidate, RewriteLine } from './types';

/**
 * One candidate of a free line as it appears in the model (see buildModel for the algebra).
 * The original's grams are written grams − below + above; a swap's are (1 − a)·centre + extra,
 * and only when its y is 1.
 */
export interface CandidateSlot {
  candidate: Candidate;
  /** index in line.candidates */
  position: number;
  original: boolean;
  /** binary "this swap is made"; the original has none (it is kept when no swap is made) */
  y?: string;
  /** original only: grams less than written */
  below?: string;
  /** original: grams more than written; a swap: grams above the low end of its band */
  above: string;
  /** ρ used in the model; the original food's comes from the line itself (grams ÷ volumeMl) */
  densityGPerMl: number;
  /** V_i, or V_i·r for an approved swap with volume ratio r */
  centreMl: number;
  centreGrams: number;
  /** a·centreGrams: how far grams may go either way */
  spanGrams: number;
  /** rank for pruning: 0 original, 1 approved swap, 2 unapproved swap */
  rank: number;
}

/** Grams of the slot's food in a solution (meaningful for the chosen slot). */
export function slotGrams(slot: CandidateSlot, values: Record<string, number>): number {
  const above = values[slot.above] ?? 0;
  if (slot.original) return slot.centreGrams - (values[slot.below!] ?? 0) + above;
  return slot.centreGrams - slot.spanGrams + above;
}

export interface LineSlot {
  line: RewriteLine;
  /** position in the lines array */
  position: number;
  original: Candidate;
  /** fixed lines (locked, no grams or no volume) are constants, with no slots */
  fixed: boolean;
  /** the original's slot first */
  slots: CandidateSlot[];
  /** candidates left out because another one is never worse */
  pruned: Candidate[];
}

export interface ClosestWeights {
  /** cost of an unapproved swap */
  swap: number;
  /** cost of a coach-approved swap */
  approvedSwap: number;
  /** cost per mL of volume away from the band centre */
  perMl: number;
}

const SWAP_COST = 1000;

function originalOf(line: RewriteLine): Candidate {
  const originals = line.candidates.filter((c) => c.original);
  if (originals.length !== 1) throw new RangeError(`line ${line.index}: needs exactly one original candidate`);
  return originals[0];
}

function isFixed(line: RewriteLine): boolean {
  return line.locked || !(line.grams > 0) || !(line.volumeMl > 0);
}

function usable(c: Candidate): boolean {
  return c.original === true || (Number.isFinite(c.densityGPerMl) && c.densityGPerMl > 0);
}

/**
 * Weights of the 'closest' objective, chosen so that its order is lexicographic:
 * fewest swaps first, then approved swaps before unapproved ones, then the smallest volume changes.
 * With at most k swaps possible, an approved swap costs S − δ and an unapproved one S, δ = S/(k+1),
 * and all volume change together costs at most δ/2 (λ = δ / (2·Dmax), Dmax the largest total
 * deviation the line bands allow). Then n swaps always cost less than n + 1 (n·S + δ/2 < (n+1)(S − δ)
 * for n < k), at equal swap counts one more approved swap saves δ, more than any volume term.
 * (Fixed costs like 1000 and 600 would not do this: four approved swaps, 2400, would beat three
 * unapproved ones, 3000.)
 */
export function closestWeights(lines: LineSlot[], maxSwaps: number | null, lineTolerance: number): ClosestWeights {
  const swappable = lines.filter((l) => l.slots.some((s) => !s.original)).length;
  const k = Math.max(1, Math.min(swappable, maxSwaps ?? swappable));
  const delta = SWAP_COST / (k + 1);
  const maxDeviation = lines.reduce(
    (sum, l) => sum + Math.max(0, ...l.slots.map((s) => lineTolerance * s.centreMl)),
    0,
  );
  return { swap: SWAP_COST, approvedSwap: SWAP_COST - delta, perMl: maxDeviation > 0 ? delta / (2 * maxDeviation) : 0 };
}

export function lineSlots(lines: RewriteLine[], options: ResolvedOptions, rows: readonly TargetRow[]): LineSlot[] {
  const a = options.lineTolerance;
  return lines.map((line, position) => {
    const original = originalOf(line);
    if (isFixed(line)) return { line, position, original, fixed: true, slots: [], pruned: [] };
    const all = line.candidates.flatMap((candidate, j): CandidateSlot[] => {
      if (!usable(candidate)) return [];
      const isOriginal = candidate.original === true;
      const densityGPerMl = isOriginal ? line.grams / line.volumeMl : candidate.densityGPerMl;
      const ratio = !isOriginal && candidate.approved?.volumeRatio ? candidate.approved.volumeRatio : 1;
      const centreMl = line.volumeMl * ratio;
      const centreGrams = isOriginal ? line.grams : centreMl * densityGPerMl;
      return [
        {
          candidate,
          position: j,
          original: isOriginal,
          y: isOriginal ? undefined : `y_${position}_${j}`,
          below: isOriginal ? `b_${position}` : undefined,
          above: isOriginal ? `h_${position}` : `z_${position}_${j}`,
          densityGPerMl,
          centreMl,
          centreGrams,
          spanGrams: a * centreGrams,
          rank: isOriginal ? 0 : candidate.approved ? 1 : 2,
        },
      ];
    });
    all.sort((p, q) => p.rank - q.rank);
    const keep = options.pruneDominated
      ? new Set(
          keptCandidates(
            all.map((s) => ({ ...s, per100g: s.candidate.per100g, cost: s.rank })),
            rows,
          ),
        )
      : new Set(all.map((_, i) => i));
    return {
      line,
      position,
      original,
      fixed: false,
      slots: all.filter((_, i) => keep.has(i)),
      pruned: all.filter((_, i) => !keep.has(i)).map((s) => s.candidate),
    };
  });
}
