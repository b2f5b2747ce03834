import { describe, expect, it } from 'vitest';
import { toLpFormat } from '../../shared/rewrite/lp-format';
import { buildRewriteModel } from '../../shared/rewrite/build-model';
import { applySuggestion, solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { Nutrients } from '../../shared/nutrition';
import type { Candidate, OptimalRewrite, RewriteLine, RewriteObjective } from '../../shared/rewrite/types';
import { perServingAsWritten, relativeGap, solveWithHighs } from '../helpers/random-rewrite-problems';

// An invented baked-pasta recipe for six with lighter candidates for its lines. Values per 100 g
// and densities are approximate, from memory, close to USDA SR28 entries; the pulse pastas are
// label-style values, also from memory. Not catalogue data.
type Food = [name: string, densityGPerMl: number, kcal: number, proteinG: number, fatG: number, satFatG: number, carbsG: number, fiberG: number, sugarG: number, sodiumMg: number];

const n = ([, , kcal, proteinG, fatG, satFatG, carbsG, fiberG, sugarG, sodiumMg]: Food): Nutrients => ({
  kcal, proteinG, fatG, satFatG, carbsG, fiberG, sugarG, sodiumMg,
});

let nextId = 1;
function line(index: number, grams: number, foods: Food[], approved: Record<string, Candidate['approved']> = {}): RewriteLine {
  const candidates: Candidate[] = foods.map((f, i) => ({
    foodId: nextId++,
    name: f[0],
    densityGPerMl: f[1],
    per100g: n(f),
    ...(i === 0 ? { original: true } : {}),
    ...(approved[f[0]] ? { approved: approved[f[0]] } : {}),
  }));
  return { index, foodId: candidates[0].foodId, grams, volumeMl: grams / foods[0][1], locked: false, candidates };
}

const BAKED_PASTA_SERVINGS = 6;

function bakedPasta(): RewriteLine[] {
  nextId = 1;
  return [
    line(0, 340, [
      ['penne, dry', 0.42, 371, 13.0, 1.5, 0.3, 74.7, 3.2, 2.7, 6],
      ['whole-wheat penne, dry', 0.42, 352, 14.6, 2.9, 0.5, 71.0, 9.2, 2.8, 8],
      ['chickpea penne, dry', 0.42, 360, 20.0, 6.0, 0.7, 57.0, 8.0, 4.0, 60],
      ['red lentil penne, dry', 0.42, 350, 25.0, 2.0, 0.3, 55.0, 8.0, 1.0, 10],
    ]),
    line(1, 454, [
      ['ground beef 80/20, raw', 0.96, 254, 17.2, 20.0, 7.6, 0, 0, 0, 66],
      ['lean ground turkey 93/7, raw', 0.96, 150, 18.7, 8.3, 2.3, 0, 0, 0, 69],
      ['ground beef 95/5, raw', 0.96, 137, 21.4, 5.0, 2.3, 0, 0, 0, 66],
      ['ground chicken breast, raw', 0.98, 112, 23.3, 1.9, 0.5, 0, 0, 0, 60],
    ]),
    line(2, 226, [
      ['mozzarella, whole milk, shredded', 0.47, 299, 22.2, 22.4, 13.2, 2.2, 0, 1.0, 627],
      ['mozzarella, part-skim, shredded', 0.47, 254, 24.3, 15.9, 10.1, 2.8, 0, 1.1, 619],
      ['mozzarella, fat-free, shredded', 0.47, 141, 31.7, 0, 0, 3.5, 1.8, 0, 743],
    ]),
    line(3, 680, [
      ['marinara sauce', 1.06, 51, 1.4, 1.5, 0.2, 8.1, 1.8, 5.4, 437],
      ['crushed tomatoes, no salt added', 1.02, 32, 1.6, 0.3, 0, 7.3, 1.9, 4.4, 20],
    ]),
    line(
      4,
      425,
      [
        ['ricotta, whole milk', 1.04, 174, 11.3, 13.0, 8.3, 3.0, 0, 0.3, 84],
        ['ricotta, part-skim', 1.05, 138, 11.4, 7.9, 4.9, 5.1, 0, 0.3, 99],
        ['cottage cheese, fat-free', 0.955, 72, 10.3, 0.3, 0.2, 6.7, 0, 1.9, 372],
        ['greek yogurt, nonfat, plain', 1.04, 59, 10.2, 0.4, 0.1, 3.6, 0, 3.2, 36],
      ],
      { 'cottage cheese, fat-free': { by: 'Coach Maren Holt', note: 'blend it smooth first so it layers like ricotta' } },
    ),
    line(5, 27, [['olive oil', 0.913, 884, 0, 100, 13.8, 0, 0, 0, 2]]),
    line(6, 50, [['parmesan, grated', 0.42, 431, 38.5, 28.6, 17.3, 4.1, 0, 0.9, 1529]]),
    line(7, 160, [['onion, chopped', 0.676, 40, 1.1, 0.1, 0, 9.3, 1.7, 4.2, 4]]),
  ];
}

// Worked example: an invented baked pasta for six (values approximate, from memory, close to
// USDA SR28), rewritten for at least +40 % protein and at least −25 % kcal per serving with at
// most 3 swaps and the dish's volume within 10 %.
const lines = bakedPasta();
const written = perServingAsWritten(lines, BAKED_PASTA_SERVINGS);
const targets = { proteinMinG: written.proteinG * 1.4, kcalMax: written.kcal * 0.75 };
// A budget far beyond need, so that a slow machine cannot stop a solve short of its optimum.
const options = { maxSwaps: 3, volumeTolerancePct: 10, timeoutMs: 60_000 };

function rewrite(objective: RewriteObjective): OptimalRewrite {
  const result = solveRewrite(lines, targets, BAKED_PASTA_SERVINGS, { ...options, objective, explain: true });
  if (result.status !== 'optimal') throw new Error(`expected a plan, got ${result.message}`);
  return result;
}

describe('baked pasta rewrite', () => {
  it('starts from the recipe as written: about 782 kcal and 42 g protein per serving', () => {
    const result = rewrite('closest');
    expect(result.before.perServing.kcal).toBeCloseTo(written.kcal, 9);
    expect(result.before.perServing.proteinG).toBeCloseTo(written.proteinG, 9);
    expect(written.kcal).toBeGreaterThan(770);
    expect(written.kcal).toBeLessThan(800);
  });

  for (const objective of ['closest', 'max-protein', 'min-kcal'] as const) {
    it(`${objective}: +40 % protein, −25 % kcal, at most 3 swaps, volume within 10 %`, () => {
      const { before, after, changes } = rewrite(objective);
      expect(after.perServing.proteinG).toBeGreaterThanOrEqual(before.perServing.proteinG * 1.4 * (1 - 1e-9));
      expect(after.perServing.kcal).toBeLessThanOrEqual(before.perServing.kcal * 0.75 * (1 + 1e-9));
      expect(changes.filter((c) => c.swapped).length).toBeLessThanOrEqual(3);
      expect(Math.abs(after.volumeMl - before.volumeMl)).toBeLessThanOrEqual(0.1 * before.volumeMl * (1 + 1e-9));
      // Locked and single-food lines keep their foods; every change says what it serves.
      for (const change of changes) {
        expect(change.serves.length).toBeGreaterThan(0);
        expect(change.reason).toContain(change.from.name);
      }
    });
  }

  it('closest takes the coach-approved cottage cheese and carries the note', () => {
    const { changes } = rewrite('closest');
    const ricotta = changes.find((c) => c.from.name === 'ricotta, whole milk');
    expect(ricotta?.to.name).toBe('cottage cheese, fat-free');
    expect(ricotta?.approvedBy).toBe('Coach Maren Holt');
    expect(ricotta?.note).toMatch(/blend it smooth/);
    const beef = changes.find((c) => c.from.name === 'ground beef 80/20, raw');
    expect(beef?.swapped).toBe(true);
    expect(beef?.serves).toEqual(expect.arrayContaining(['proteinMinG', 'kcalMax']));
    expect(beef?.reason).toMatch(/for the protein floor and the calorie ceiling/);
  });

  it('most protein gives more protein than closest, fewest calories fewer kcal', () => {
    const closest = rewrite('closest').after.perServing;
    expect(rewrite('max-protein').after.perServing.proteinG).toBeGreaterThan(closest.proteinG);
    expect(rewrite('min-kcal').after.perServing.kcal).toBeLessThan(closest.kcal);
  });

  it('explains with the exact model solved; HiGHS finds no plan closer than ours', async () => {
    // HiGHS (npm `highs`) on the LP text of the product model (hard targets).
    const result = rewrite('closest');
    const elastic = buildRewriteModel(lines, targets, BAKED_PASTA_SERVINGS, options);
    expect(result.solver.model).toBe(toLpFormat(elastic.model));
    const hard = buildRewriteModel(lines, targets, BAKED_PASTA_SERVINGS, options, { hardTargets: true });
    const highs = await solveWithHighs(toLpFormat(hard.model));
    expect(highs.feasible).toBe(true);
    // The 'closest' objective of our plan, priced from the plan itself: swap costs plus the
    // per-mL price of every line's distance from its band centre.
    const { weights } = hard.variables;
    let cost = 0;
    result.after.lines.forEach((planned, i) => {
      const food = lines[i].candidates.find((c) => c.foodId === planned.food.foodId)!;
      if (!food.original) cost += food.approved ? weights.approvedSwap : weights.swap;
      const centre = lines[i].volumeMl * (food.original ? 1 : (food.approved?.volumeRatio ?? 1));
      cost += weights.perMl * Math.abs(planned.volumeMl - centre);
    });
    expect(relativeGap(cost, highs.objective)).toBeLessThan(1e-6);
    expect(relativeGap(result.solver.objectiveValue, cost)).toBeLessThan(1e-6);
  });

  it('with one swap the targets are out of reach, and the suggestions say what would do', () => {
    const result = solveRewrite(lines, targets, BAKED_PASTA_SERVINGS, { ...options, maxSwaps: 1 });
    expect(result.status).toBe('infeasible');
    if (result.status !== 'infeasible') return;
    expect(result.message).toMatch(/best reachable: \d+ g protein at \d+ kcal per serving/);
    const more = result.suggestions.find((s) => s.kind === 'more-swaps');
    expect(more?.message).toMatch(/^allow \d more swaps? \(\d in all\)$/);
    for (const s of result.suggestions) {
      const request = applySuggestion(targets, { ...options, maxSwaps: 1 }, s);
      expect(solveRewrite(lines, request.targets, BAKED_PASTA_SERVINGS, request.options).status, s.message).toBe('optimal');
    }
  });
});
