import { keptCandidates } from './candidate-pruning';
import type { ResolvedOptions } from './rewrite-options';
import type { TargetRow } from './targets';
import type { Candidate, RewriteLine } from './types';

/**
 * How a candidate takes part in its line (see buildModel for the algebra):
 *  - 'original': the written food, at exactly its written grams G, or within keepScale·G;
 *  - 'swap': a share s of the line (1 for the whole line) replaced by lo·r·s·G … hi·r·s·G grams of
 *    the substitute (r its mass ratio, [lo, hi] its rule's band or 1 ± a), the written food keeping (1 − s)·G.
 */
export type SlotKind = 'original' | 'swap';

/**
 * The shares of a line a partial swap may replace: a cook splits a line in half ("half beef, half
 * turkey", "half the butter as yogurt") or swaps it whole, not 91 % of it. A partial candidate
 * gets one slot per share up to its maxShare (its maxShare itself when that is below a half); the
 * ±a band around each share's amount gives the substitute its room. (Quarters and thirds as well
 * tripled the binaries and the 20-line p95.)
 */
export const SHARES = [1 / 2, 1] as const;

export interface CandidateSlot {
  candidate: Candidate;
  /** index in line.candidates */
  position: number;
  /** unique among the line's slots: the position, and the share's number for a partial candidate */
  key: string;
  kind: SlotKind;
  /** binary "this swap is made"; the original has none (it is kept when no swap is made) */
  y?: string;
  /** original with keepScale: grams less than written */
  below?: string;
  /** original with keepScale: grams more than written; swap: grams above the low end of its band (absent when the band has no width) */
  above?: string;
  /** s, the share of the written grams the swap replaces (1: the whole line; 1 for the original too) */
  share: number;
  /** ρ used in the model; the original food's comes from the line itself (grams ÷ volumeMl) */
  densityGPerMl: number;
  /** r: grams of this food per gram of the written food (1 for the original) */
  ratio: number;
  /** original: G; swap: r·s·G */
  centreGrams: number;
  /** swap: the low end of its band, lo·r·s·G ((1 − a)·r·s·G without a band of its own); original: G */
  lowGrams: number;
  /** swap: how far above lowGrams its grams may go, (hi − lo)·r·s·G (2a·r·s·G); original: 0 */
  widthGrams: number;
  /** original: grams it may go below and above G when not swapped (keepScale) */
  keepBelow: number;
  keepAbove: number;
  /** rank for pruning and the 'closest' price: 0 original, 1 approved swap, 2 unapproved swap */
  rank: number;
}

export interface LineSlot {
  line: RewriteLine;
  /** position in the lines array */
  position: number;
  original: Candidate;
  /** fixed lines (locked, held, no grams or no volume) are constants, with no slots */
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
  /** cost per mL of a line away from its rule's amount, and per mL of the written food a swap replaces */
  perMl: number;
}

const SWAP_COST = 1000;

function originalOf(line: RewriteLine): Candidate {
  const originals = line.candidates.filter((c) => c.original);
  if (originals.length !== 1) throw new RangeError(`line ${line.index}: needs exactly one original candidate`);
  return originals[0];
}

export function isFixed(line: RewriteLine): boolean {
  return line.locked || Boolean(line.heldReason) || !(line.grams > 0) || !(line.volumeMl > 0);
}

const positive = (v: number | undefined): v is number => v !== undefined && Number.isFinite(v) && v > 0;

/**
 * r for a substitute: the coach's own ratio first (by mass, or by volume turned into grams with
 * both densities), then the rule's mass ratio, else 1 — equal weight, never equal volume between
 * foods of different density.
 */
export function massRatioOf(c: Candidate, originalDensity: number): number {
  if (positive(c.approved?.massRatio)) return c.approved.massRatio;
  if (positive(c.approved?.volumeRatio)) return (c.approved.volumeRatio * c.densityGPerMl) / originalDensity;
  if (positive(c.massRatio)) return c.massRatio;
  return 1;
}

function usable(c: Candidate): boolean {
  if (c.original) return true;
  if (!positive(c.densityGPerMl)) return false;
  if (c.massRatio !== undefined && !positive(c.massRatio)) return false;
  return c.maxShare === undefined || (positive(c.maxShare) && c.maxShare <= 1);
}

/** [lo, hi], the factors of r·s·G a substitute's grams may take: its rule's band, else 1 ± a. */
export function bandOf(c: Candidate, lineTolerance: number): [number, number] {
  const band = c.approved ? undefined : c.band;
  if (!band) return [1 - lineTolerance, 1 + lineTolerance];
  const [lo, hi] = band;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo > 0 && lo <= 1 && hi >= 1))
    throw new RangeError(`${c.name}: band must be [lo, hi] with 0 < lo ≤ 1 ≤ hi`);
  return [lo, hi];
}

function keepScaleOf(line: RewriteLine): [number, number] {
  if (!line.keepScale) return [1, 1];
  const [lo, hi] = line.keepScale;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo >= 0 && lo <= 1 && hi >= 1)) {
    throw new RangeError(`line ${line.index}: keepScale must be [lo, hi] with 0 ≤ lo ≤ 1 ≤ hi`);
  }
  return [lo, hi];
}

/**
 * The most the slot's amounts may cost in 'closest', in mL: the substitute's distance from its
 * centre plus the written food it replaces.
 */
export function maxDeviationMl(slot: CandidateSlot, originalDensity: number): number {
  switch (slot.kind) {
    case 'original':
      return Math.max(slot.keepBelow, slot.keepAbove) / slot.densityGPerMl;
    case 'swap': {
      const fromCentre = Math.max(slot.centreGrams - slot.lowGrams, slot.lowGrams + slot.widthGrams - slot.centreGrams);
      return fromCentre / slot.densityGPerMl + slot.centreGrams / slot.ratio / originalDensity;
    }
  }
}

/**
 * Weights of the 'closest' objective, chosen so that its order is lexicographic:
 * fewest swaps first, then approved swaps before unapproved ones, then the smallest changes (the
 * written food replaced, and every amount away from its centre).
 * With at most k swaps possible, an approved swap costs S − δ and an unapproved one S, δ = S/(k+1),
 * and all amount changes together cost at most δ/2 (λ = δ / (2·Dmax), Dmax the largest total
 * change, in mL, the lines allow). Then n swaps always cost less than n + 1 (n·S + δ/2 < (n+1)(S − δ)
 * for n < k), at equal swap counts one more approved swap saves δ, more than any amount term.
 * (Fixed costs like 1000 and 600 would not do this: four approved swaps, 2400, would beat three
 * unapproved ones, 3000.)
 */
export function closestWeights(lines: LineSlot[], maxSwaps: number | null): ClosestWeights {
  const swappable = lines.filter((l) => l.slots.some((s) => s.kind !== 'original')).length;
  const k = Math.max(1, Math.min(swappable, maxSwaps ?? swappable));
  const delta = SWAP_COST / (k + 1);
  const maxDeviation = lines.reduce((sum, l) => {
    const rho = l.slots[0]?.densityGPerMl ?? 1;
    return sum + Math.max(0, ...l.slots.map((s) => maxDeviationMl(s, rho)));
  }, 0);
  return { swap: SWAP_COST, approvedSwap: SWAP_COST - delta, perMl: maxDeviation > 0 ? delta / (2 * maxDeviation) : 0 };
}

/** Slots that allow exactly the same grams, volumes and amount costs; only these can stand in for each other. */
function shapeOf(s: CandidateSlot): string {
  return [s.kind, s.densityGPerMl, s.ratio, s.share, s.centreGrams, s.lowGrams, s.widthGrams, s.keepBelow, s.keepAbove].join('|');
}

export function lineSlots(lines: RewriteLine[], options: ResolvedOptions, rows: readonly TargetRow[]): LineSlot[] {
  const a = options.lineTolerance;
  return lines.map((line, position) => {
    const original = originalOf(line);
    if (isFixed(line)) return { line, position, original, fixed: true, slots: [], pruned: [] };
    const G = line.grams;
    const rho = G / line.volumeMl;
    // A substitute with the very density the catalogue gives the written food (both a role's default,
    // say, like two cuts of beef) is measured as the line measures its food: it takes the line's own
    // density (a near food's cup of cubed beef), so a 1:1 swap between them keeps the line's volume.
    const sameDensity = (c: Candidate) => c.densityGPerMl === original.densityGPerMl;
    const [lo, hi] = keepScaleOf(line);
    const all = line.candidates.flatMap((candidate, j): CandidateSlot[] => {
      if (!usable(candidate)) return [];
      const base = { candidate, position: j, key: String(j), share: 1, lowGrams: G, widthGrams: 0, keepBelow: 0, keepAbove: 0 };
      if (candidate.original) {
        return [
          {
            ...base,
            kind: 'original',
            below: lo < 1 ? `b_${position}` : undefined,
            above: hi > 1 ? `h_${position}` : undefined,
            densityGPerMl: rho,
            ratio: 1,
            centreGrams: G,
            keepBelow: (1 - lo) * G,
            keepAbove: (hi - 1) * G,
            rank: 0,
          },
        ];
      }
      const ratio = massRatioOf(candidate, rho);
      const [bandLo, bandHi] = bandOf(candidate, a);
      const maxShare = candidate.maxShare ?? 1;
      const partial = candidate.partial === true || maxShare < 1;
      const allowed = SHARES.filter((share) => share <= maxShare + 1e-9);
      const shares = !partial ? [1] : allowed.length ? allowed : [maxShare];
      return shares.map((share, k): CandidateSlot => {
        const key = partial ? `${j}_${k}` : String(j);
        return {
          ...base,
          kind: 'swap',
          key,
          share,
          y: `y_${position}_${key}`,
          above: bandHi > bandLo ? `z_${position}_${key}` : undefined,
          densityGPerMl: sameDensity(candidate) ? rho : candidate.densityGPerMl,
          ratio,
          centreGrams: ratio * share * G,
          lowGrams: bandLo * ratio * share * G,
          widthGrams: (bandHi - bandLo) * ratio * share * G,
          rank: candidate.approved ? 1 : 2,
        };
      });
    });
    all.sort((p, q) => p.rank - q.rank);
    const keep = options.pruneDominated
      ? new Set(
          keptCandidates(
            all.map((s) => ({ per100g: s.candidate.per100g, shape: shapeOf(s), cost: s.rank, original: s.kind === 'original' })),
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
