import { divideNutrients, nutrientsForGrams, sumNutrients } from '../nutrition';
import type { RewriteModelMeta } from './build-model';
import type { CandidateSlot, LineSlot } from './line-slots';
import type { Candidate, Plan, PlanLine } from './types';

/** One food of a line in a plan, with its grams and volume. */
export interface PlanPart {
  food: Candidate;
  grams: number;
  volumeMl: number;
}

/** What a plan does with one line: its foods (two for a shared line, original first) and the swap made, if any. */
export interface LineChoice {
  line: LineSlot;
  parts: PlanPart[];
  /** the substitute's slot, or null when the written food is kept */
  swap: CandidateSlot | null;
}

function writtenVolume(line: LineSlot): number {
  return line.line.volumeMl > 0 ? line.line.volumeMl : 0;
}

function written(line: LineSlot): LineChoice {
  return { line, parts: [{ food: line.original, grams: Math.max(0, line.line.grams), volumeMl: writtenVolume(line) }], swap: null };
}

/** The recipe as written. */
export function writtenChoices(meta: RewriteModelMeta): LineChoice[] {
  return meta.lines.map(written);
}

function part(food: Candidate, grams: number, density: number): PlanPart {
  const g = Math.max(0, grams);
  return { food, grams: g, volumeMl: g / density };
}

/** The foods and grams a solution picks, line by line. */
export function solvedChoices(meta: RewriteModelMeta, values: Record<string, number>): LineChoice[] {
  const value = (name: string | undefined) => (name ? (values[name] ?? 0) : 0);
  return meta.lines.map((line) => {
    if (line.fixed) return written(line);
    const [orig] = line.slots;
    const G = line.line.grams;
    // The written food stays unless a swap's indicator is on.
    const swap = line.slots.find((s) => s.y !== undefined && value(s.y) > 0.5);
    if (!swap) {
      return { line, parts: [part(orig.candidate, G - value(orig.below) + value(orig.above), orig.densityGPerMl)], swap: null };
    }
    const substitute = part(swap.candidate, swap.lowGrams + value(swap.above), swap.densityGPerMl);
    const parts = swap.share < 1 ? [part(orig.candidate, (1 - swap.share) * G, orig.densityGPerMl), substitute] : [substitute];
    return { line, parts, swap };
  });
}

/** Nutrients recomputed from each food's values per 100 g × grams; the solver's sums are not used. */
export function planOf(choices: LineChoice[], servings: number): Plan {
  const lines: PlanLine[] = choices.flatMap((c) =>
    c.parts.map((p) => ({
      index: c.line.line.index,
      food: { foodId: p.food.foodId, name: p.food.name },
      grams: p.grams,
      volumeMl: p.volumeMl,
      nutrients: nutrientsForGrams(p.food.per100g, p.grams),
    })),
  );
  const totals = sumNutrients(lines.map((l) => l.nutrients));
  return {
    lines,
    totals,
    perServing: divideNutrients(totals, servings),
    volumeMl: lines.reduce((s, l) => s + l.volumeMl, 0),
  };
}

/** Under this many grams a scaled line's move is nothing a cook measures (it shows as "28 g → 28 g"). */
export const UNMEASURED_MOVE_G = 0.5;

/** The lines (by index) that keep their written food but moved by less than a cook measures. */
export function unmeasuredMoves(choices: LineChoice[]): number[] {
  return choices.flatMap((c) => {
    if (c.swap || c.parts.length !== 1 || c.line.fixed) return [];
    const move = Math.abs(c.parts[0].grams - Math.max(0, c.line.line.grams));
    return move > 1e-9 && move < UNMEASURED_MOVE_G ? [c.line.line.index] : [];
  });
}
