import { pathToFileURL } from 'node:url';
import { buildRewriteModel, modelText } from '../../shared/rewrite/build-model';
import { solveLp } from '../../shared/rewrite/solve-lp';
import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { RewriteObjective, RewriteOptions, Targets } from '../../shared/rewrite/types';
import { HIGHS_OPTIONS, loadHighs, perServingAsWritten, plantedTargets, randomRecipe, seededRandom } from '../helpers/random-rewrite-problems';

const SIZES = [5, 10, 20, 40];
const RECIPES_PER_SIZE = 20;
const OBJECTIVES: RewriteObjective[] = ['closest', 'max-protein', 'min-kcal'];
const SERVINGS = 4;
/** p95 budgets for javascript-lp-solver (ms), for recipes shaped like the rules' candidates */
const BUDGET: Record<number, number> = { 20: 100, 40: 500 };

/** What the substitution rules bring: ratios other than 1, partial swaps, keep-scales, rule bands on substitutes (held lines: per shape). */
const RULES = { massRatioShare: 0.3, partialShare: 0.3, keepScaleShare: 0.2, bandShare: 0.2 } as const;

interface Shape {
  name: string;
  /** substitutes per line besides the original */
  candidates: number | [number, number];
  heldShare: number;
  budgeted: boolean;
}

const SHAPES: Shape[] = [
  // What the rules offer on the comfort-food panel: 0–3 substitutes on a free line, about a third
  // of the lines held (seasonings, salt, leaveners, liquids); 0–4 here, to be safe.
  { name: 'rule-shaped: 0–4 substitutes a line, 30 % of lines held', candidates: [0, 4], heldShare: 0.3, budgeted: true },
  // The old role-ranked catalogue's load: eight substitutes on every line. No budget: rules never offer this many.
  { name: 'stress: 8 substitutes on every line, 10 % held', candidates: 8, heldShare: 0.1, budgeted: false },
];

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];
}

function now(): number {
  return performance.now();
}

interface Case {
  lines: ReturnType<typeof randomRecipe>;
  targets: Targets;
  options: RewriteOptions;
}

/**
 * Recipes of `size` lines of the given shape, 10 % of lines locked, 15 % of candidates
 * coach-approved, the rules' share of ratios, partial swaps and amount bands (RULES); targets a
 * plan with up to three swaps meets (so every case has an answer, as most real requests do), at
 * most 3 swaps, default tolerances.
 */
function cases(size: number, shape: Shape): Case[] {
  const out: Case[] = [];
  for (let r = 0; r < RECIPES_PER_SIZE; r++) {
    const rng = seededRandom(size * 1000 + r);
    const lines = randomRecipe(rng, { lines: size, candidates: shape.candidates, lockedShare: 0.1, approvedShare: 0.15, heldShare: shape.heldShare, ...RULES });
    const targets = plantedTargets(rng, lines, SERVINGS, 3);
    for (const objective of OBJECTIVES) out.push({ lines, targets, options: { objective, maxSwaps: 3 } });
  }
  return out;
}

/** Cases whose protein floor no plan reaches: the elastic re-solve and its suggestions run too. */
function outOfReach(size: number, shape: Shape): Case[] {
  return Array.from({ length: 10 }, (_, r) => {
    const rng = seededRandom(size * 7777 + r);
    const lines = randomRecipe(rng, { lines: size, candidates: shape.candidates, lockedShare: 0.1, approvedShare: 0.15, heldShare: shape.heldShare, ...RULES });
    const written = perServingAsWritten(lines, SERVINGS);
    return { lines, targets: { proteinMinG: written.proteinG * 3, kcalMax: written.kcal * 0.7 }, options: { objective: 'closest', maxSwaps: 3 } };
  });
}

/** solveRewrite end to end on each size's cases: p50, p95 and solves per rewrite. */
function timeEndToEnd(label: string, casesOf: (size: number) => Case[], expected?: 'infeasible'): void {
  console.log(`solveRewrite end to end (ms), ${label}`);
  for (const size of SIZES) {
    const ms: number[] = [];
    let solves = 0;
    for (const c of casesOf(size)) {
      const t = now();
      const r = solveRewrite(c.lines, c.targets, SERVINGS, c.options);
      ms.push(now() - t);
      solves += r.solver.solves;
      if (expected && r.status !== expected) throw new Error('expected targets out of reach');
    }
    ms.sort((a, b) => a - b);
    console.log(
      `${String(size).padStart(5)} lines: p50 ${percentile(ms, 0.5).toFixed(1)}  p95 ${percentile(ms, 0.95).toFixed(1)}  (${(solves / ms.length).toFixed(1)} solves each)`,
    );
  }
}

export async function runRewriteBench(): Promise<void> {
  const highs = await loadHighs();
  let withinBudget = true;
  for (const shape of SHAPES) {
    console.log(
      `\nrewrite solver bench, ${shape.name}: ${RECIPES_PER_SIZE} recipes × ${OBJECTIVES.length} objectives per size, rules ${JSON.stringify(RULES)}`,
    );
    console.log('lines  kept/line  jsLPSolver p50   p95    max  |  HiGHS p50   p95  |  p95 ratio  budget');
    for (const size of SIZES) {
      const js: number[] = [];
      const hi: number[] = [];
      let kept = 0;
      let freeLines = 0;
      for (const c of cases(size, shape)) {
        const built = buildRewriteModel(c.lines, c.targets, SERVINGS, c.options);
        for (const l of built.variables.lines) {
          if (l.fixed) continue;
          kept += l.slots.length;
          freeLines += 1;
        }
        const solved = solveLp(built.model);
        if (solved.status !== 'optimal' && solved.status !== 'time-limit') throw new Error(`bench case not solved: ${solved.status}`);
        js.push(solved.ms);
        const t = now();
        const result = highs.solve(modelText(built), HIGHS_OPTIONS);
        hi.push(now() - t);
        if (result.Status !== 'Optimal') throw new Error(`HiGHS: ${result.Status}`);
      }
      js.sort((a, b) => a - b);
      hi.sort((a, b) => a - b);
      const p95 = percentile(js, 0.95);
      const budget = shape.budgeted ? BUDGET[size] : undefined;
      if (budget !== undefined && p95 > budget) withinBudget = false;
      console.log(
        [
          String(size).padStart(5),
          (kept / Math.max(1, freeLines)).toFixed(1).padStart(10),
          percentile(js, 0.5).toFixed(1).padStart(16),
          p95.toFixed(1).padStart(6),
          js[js.length - 1].toFixed(0).padStart(6),
          percentile(hi, 0.5).toFixed(1).padStart(13),
          percentile(hi, 0.95).toFixed(1).padStart(6),
          (p95 / Math.max(0.1, percentile(hi, 0.95))).toFixed(2).padStart(12),
          budget === undefined ? '      -' : `  ≤ ${budget}${p95 <= budget ? ' ok' : ' MISSED'}`,
        ].join(''),
      );
    }
    // a plan end to end: the elastic solve, and the re-solve that puts a line moved by under half a gram back
    timeEndToEnd('targets planted within reach: plans, with any re-solve for unmeasured moves', (size) => cases(size, shape));
    timeEndToEnd('targets out of reach: elastic re-solve plus suggestions', (size) => outOfReach(size, shape), 'infeasible');
  }
  console.log(withinBudget ? '\nall p95 budgets met' : '\nSOME p95 BUDGETS MISSED');
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  await runRewriteBench();
}
