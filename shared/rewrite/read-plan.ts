import { divideNutrients, nutrientsForGrams, sumNutrients } from '../nutrition';
import type { RewriteModelMeta } from './build-model';
import { slotGrams, type LineSlot } from './line-slots';
import type { Candidate, Plan, PlanLine } from './types';

export interface PlanChoice {
  line: LineSlot;
  food: Candidate;
  grams: number;
  volumeMl: number;
}

function writtenVolume(line: LineSlot): number {
  return line.line.volumeMl > 0 ? line.line.volumeMl : 0;
}

/** The recipe as written. */
export function writtenChoices(meta: RewriteModelMeta): PlanChoice[] {
  return meta.lines.map((line) => ({
    line,
    food: line.original,
    grams: Math.max(0, line.line.grams),
    volumeMl: writtenVolume(line),
  }));
}

/** The foods and grams a solution picks, line by line. */
export function solvedChoices(meta: RewriteModelMeta, values: Record<string, number>): PlanChoice[] {
  return meta.lines.map((line) => {
    if (line.fixed) return { line, food: line.original, grams: Math.max(0, line.line.grams), volumeMl: writtenVolume(line) };
    // The written food stays unless a swap's indicator is on.
    const chosen = line.slots.find((s) => s.y !== undefined && (values[s.y] ?? 0) > 0.5) ?? line.slots[0];
    const grams = Math.max(0, slotGrams(chosen, values));
    return { line, food: chosen.candidate, grams, volumeMl: grams / chosen.densityGPerMl };
  });
}

/** Nutrients recomputed from each food's values per 100 g × grams; the solver's sums are not used. */
export function planOf(choices: PlanChoice[], servings: number): Plan {
  const lines: PlanLine[] = choices.map((c) => ({
    index: c.line.line.index,
    food: { foodId: c.food.foodId, name: c.food.name },
    grams: c.grams,
    volumeMl: c.volumeMl,
    nutrients: nutrientsForGrams(c.food.per100g, c.grams),
  }));
  const totals = sumNutrients(lines.map((l) => l.nutrients));
  return {
    lines,
    totals,
    perServing: divideNutrients(totals, servings),
    volumeMl: lines.reduce((s, l) => s + l.volumeMl, 0),
  };
}
