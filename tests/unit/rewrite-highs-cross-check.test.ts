import { describe, expect, it } from 'vitest';
import { buildRewriteModel } from '../../shared/rewrite/build-model';
import { resolveOptions } from '../../shared/rewrite/rewrite-options';
import { solveElastic, weightedSlack } from '../../shared/rewrite/elastic-solve';
import { toLpFormat } from '../../shared/rewrite/lp-format';
import { findViolations, objectiveValue } from '../../shared/rewrite/lp-model';
import { solveLp } from '../../shared/rewrite/solve-lp';
import { SolveLog } from '../../shared/rewrite/solve-log';
import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import { HIGHS_OPTIONS, loadHighs, objectiveAgrees, randomProblem, relativeGap, solveWithHighs, type RandomProblem } from '../helpers/random-rewrite-problems';

// Outside check: the HiGHS solver (npm `highs`, the WebAssembly build of HiGHS, University of
// Edinburgh) reading the CPLEX LP text that toLpFormat writes from the model objects.
// javascript-lp-solver runs with MIP gap 0 and HiGHS with mip_rel_gap = mip_abs_gap = 1e-9,
// so optima must agree within relative 1e-6.
const problems = Array.from({ length: 60 }, (_, i) => randomProblem(i + 1));
// Each check runs 30–60 solves in each solver: a few seconds, more on a loaded machine.
const SLOW = { timeout: 60_000 };

// Budgets far beyond need, so that a slow machine cannot turn a proof of optimality into a time limit.
const BUDGET_MS = 60_000;

const solved = new Map<RandomProblem, NonNullable<ReturnType<typeof solveElastic>>>();

/** What solveRewrite decides for the problem, solved once per problem. */
function ours(p: RandomProblem) {
  if (!solved.has(p)) {
    const options = resolveOptions(p.options);
    solved.set(p, solveElastic(p.lines, p.targets, p.servings, options, { objective: { kind: options.objective } }, new SolveLog(BUDGET_MS))!);
  }
  return solved.get(p)!;
}

async function highsColumns(lpText: string): Promise<{ status: string; values: Record<string, number> }> {
  const highs = await loadHighs();
  const result = highs.solve(lpText, HIGHS_OPTIONS);
  const values: Record<string, number> = {};
  for (const [name, column] of Object.entries(result.Columns ?? {})) {
    if ('Primal' in column) values[name] = column.Primal;
  }
  return { status: result.Status, values };
}

describe('rewrite models against HiGHS', () => {
  it('agree with the product model (hard targets) on feasibility and optimum, 60 generated problems', SLOW, async () => {
    const mismatches: string[] = [];
    let feasible = 0;
    for (const p of problems) {
      const hard = buildRewriteModel(p.lines, p.targets, p.servings, p.options, { hardTargets: true });
      const highs = await solveWithHighs(toLpFormat(hard.model));
      const outcome = ours(p);
      if (outcome.meetsTargets !== highs.feasible) {
        mismatches.push(`seed ${p.seed}: ours ${outcome.meetsTargets ? 'meets' : 'misses'} the targets, HiGHS ${highs.status}`);
        continue;
      }
      if (!highs.feasible) continue;
      feasible += 1;
      // Our plan, priced and checked by the hard model itself.
      const violations = findViolations(hard.model, outcome.solution.values);
      const value = objectiveValue(hard.model, outcome.solution.values);
      if (violations.length) mismatches.push(`seed ${p.seed}: our plan breaks ${violations[0]}`);
      if (relativeGap(value, highs.objective) > 1e-6) mismatches.push(`seed ${p.seed}: ours ${value}, HiGHS ${highs.objective}`);
    }
    expect(mismatches).toEqual([]);
    // Both kinds of answer are exercised.
    expect(feasible).toBeGreaterThanOrEqual(20);
    expect(problems.length - feasible).toBeGreaterThanOrEqual(10);
  });

  it('reach the same plan value on the elastic model javascript-lp-solver actually solves', SLOW, async () => {
    const mismatches: string[] = [];
    for (const p of problems) {
      const elastic = buildRewriteModel(p.lines, p.targets, p.servings, p.options);
      const hard = buildRewriteModel(p.lines, p.targets, p.servings, p.options, { hardTargets: true });
      const js = solveLp(elastic.model, { timeoutMs: BUDGET_MS });
      const highs = await highsColumns(toLpFormat(elastic.model));
      // Always solvable: the recipe as written is a plan.
      if (js.status !== 'optimal' || highs.status !== 'Optimal') {
        mismatches.push(`seed ${p.seed}: ${js.status} vs ${highs.status}`);
        continue;
      }
      const jsMeets = weightedSlack(elastic, js.values) <= 1e-7;
      const highsMeets = weightedSlack(elastic, highs.values) <= 1e-7;
      if (jsMeets !== highsMeets) mismatches.push(`seed ${p.seed}: slack ${jsMeets} vs ${highsMeets}`);
      else if (jsMeets && relativeGap(objectiveValue(hard.model, js.values), objectiveValue(hard.model, highs.values)) > 1e-6) {
        mismatches.push(`seed ${p.seed}: ${objectiveValue(hard.model, js.values)} vs ${objectiveValue(hard.model, highs.values)}`);
      }
    }
    expect(mismatches).toEqual([]);
  });

  it('agree on how close the plan gets when the targets are out of reach (elastic model at its top price)', SLOW, async () => {
    const mismatches: string[] = [];
    let checked = 0;
    for (const p of problems) {
      const outcome = ours(p);
      if (outcome.meetsTargets) continue;
      checked += 1;
      // solveElastic's last model: the one whose plan is reported as the closest.
      const highs = await highsColumns(toLpFormat(outcome.built.model));
      const slackOurs = weightedSlack(outcome.built, outcome.solution.values);
      const slackHighs = weightedSlack(outcome.built, highs.values);
      if (highs.status !== 'Optimal' || relativeGap(slackOurs, slackHighs) > 1e-6) {
        mismatches.push(`seed ${p.seed}: slack ${slackOurs} vs ${highs.status} ${slackHighs}`);
      }
    }
    expect(mismatches).toEqual([]);
    expect(checked).toBeGreaterThanOrEqual(10);
  });

  it('HiGHS on the exported LP text (?explain=1) reaches exactly solver.objectiveValue, objective constant included', SLOW, async () => {
    const mismatches: string[] = [];
    let checked = 0;
    for (const p of problems.slice(0, 30)) {
      const result = solveRewrite(p.lines, p.targets, p.servings, { ...p.options, explain: true, timeoutMs: BUDGET_MS });
      if (!result.solver.provenOptimal) continue;
      checked += 1;
      const highs = await solveWithHighs(result.solver.model!);
      if (!highs.feasible || !objectiveAgrees(highs.objective, result.solver.objectiveValue, result.solver.model!)) {
        mismatches.push(`seed ${p.seed}: objectiveValue ${result.solver.objectiveValue}, HiGHS ${highs.status} ${highs.objective}`);
      }
    }
    expect(mismatches).toEqual([]);
    expect(checked).toBeGreaterThanOrEqual(25);
  });

  it('keep the optimum when dominated candidates are pruned (HiGHS on the unpruned model)', SLOW, async () => {
    const mismatches: string[] = [];
    let pruned = 0;
    for (const p of problems.slice(0, 30)) {
      const outcome = ours(p);
      pruned += outcome.built.variables.lines.reduce((n, l) => n + l.pruned.length, 0);
      const full = buildRewriteModel(p.lines, p.targets, p.servings, { ...p.options, pruneDominated: false }, { hardTargets: true });
      const highs = await solveWithHighs(toLpFormat(full.model));
      if (outcome.meetsTargets !== highs.feasible) mismatches.push(`seed ${p.seed}: ${outcome.meetsTargets} vs ${highs.status}`);
      else if (highs.feasible && relativeGap(objectiveValue(full.model, outcome.solution.values), highs.objective) > 1e-6) {
        mismatches.push(`seed ${p.seed}: ${objectiveValue(full.model, outcome.solution.values)} vs ${highs.objective}`);
      }
    }
    expect(mismatches).toEqual([]);
    expect(pruned).toBeGreaterThan(0);
  });
});
