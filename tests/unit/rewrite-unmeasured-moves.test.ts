/**
 * A line that keeps its food moves only by what a cook measures: a plan never shows "Less butter (28 g → 28 g)"
 * (shared/rewrite/solve-rewrite.ts, `unmeasuredMoves` in read-plan.ts). Values per 100 g are approximate, from
 * memory, close to USDA SR28 (butter, roasted chicken breast); not catalogue data.
 */
import { describe, expect, it } from 'vitest';
import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import { UNMEASURED_MOVE_G } from '../../shared/rewrite/read-plan';
import type { Candidate, OptimalRewrite, RewriteLine } from '../../shared/rewrite/types';
import type { Nutrients } from '../../shared/nutrition';

const nutrients = (kcal: number, proteinG: number, fatG: number): Nutrients => ({
  kcal,
  proteinG,
  fatG,
  satFatG: fatG / 2,
  carbsG: 0,
  fiberG: 0,
  sugarG: 0,
  sodiumMg: 50,
});
const rule = (id: string, label: string) => ({ id, label, why: 'invented for the test' });
const BUTTER: Candidate = {
  foodId: 1,
  name: 'butter',
  densityGPerMl: 0.96,
  per100g: nutrients(717, 0.85, 81),
  original: true,
  rule: rule('pan-fat', 'less fat'),
};
const CHICKEN: Candidate = {
  foodId: 2,
  name: 'chicken breast',
  densityGPerMl: 0.6,
  per100g: nutrients(165, 31, 3.6),
  original: true,
  rule: rule('more', 'more'),
};
// butter may drop to a third; the lean chicken may take up to half again
const dish: RewriteLine[] = [
  { index: 0, foodId: 1, grams: 28.4, volumeMl: 28.4 / 0.96, locked: false, candidates: [BUTTER], keepScale: [1 / 3, 1] },
  { index: 1, foodId: 2, grams: 400, volumeMl: 400 / 0.6, locked: false, candidates: [CHICKEN], keepScale: [1, 1.5] },
];
// ×1.5 of the chicken with all the butter is 990 + 203.6 kcal: a ceiling 2 kcal below it makes the solver
// shave 0.28 g of butter (less protein lost than shaving chicken), a move no cook measures
const ceiling = 990 + 0.284 * 717 - 2;

describe('unmeasured moves', () => {
  it('puts a line that moved by less than half a gram back at its written grams when the targets still hold', () => {
    const r = solveRewrite(dish, { proteinMinG: 100, kcalMax: ceiling }, 1, { objective: 'max-protein' }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    expect(r.after.lines[0].grams).toBe(28.4);
    expect(r.changes.map((c) => c.line)).toEqual([1]);
    expect(r.after.perServing.kcal).toBeLessThanOrEqual(ceiling + 1e-6);
    // the chicken gave up the 2 kcal instead
    expect(r.after.lines[1].grams).toBeGreaterThan(598);
    expect(r.after.lines[1].grams).toBeLessThan(600);
  });

  it('keeps a small move the targets need', () => {
    // with the butter as written the chicken reaches 598.8 g: 185.9 g protein, short of 186
    const r = solveRewrite(dish, { proteinMinG: 186.1, kcalMax: ceiling }, 1, { objective: 'max-protein' }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    const moved = 28.4 - r.after.lines[0].grams;
    expect(moved).toBeGreaterThan(0);
    expect(moved).toBeLessThan(UNMEASURED_MOVE_G);
  });
});
