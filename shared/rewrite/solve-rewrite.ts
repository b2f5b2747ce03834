import { buildModel, resolveOptions } from './build-model';
import { explainChanges } from './explain-changes';
import { analyseInfeasible } from './infeasibility';
import { toLpFormat } from './lp-format';
import { planOf, solvedChoices, writtenChoices } from './read-plan';
import { hasSolution, RewriteSolverError, SolveLog } from './solve-log';
import { activeTargets } from './targets';
import type { RewriteLine, RewriteOptions, RewriteResult, SolverInfo, Targets } from './types';

function checkTargets(targets: Targets): void {
  if (!Number.isFinite(targets.proteinMinG) || !Number.isFinite(targets.kcalMax)) {
    throw new RangeError('targets need a finite proteinMinG and kcalMax');
  }
}

function describeReachable(report: ReturnType<typeof analyseInfeasible>, targets: Targets): string {
  const parts = activeTargets(targets).map(({ row }) => {
    const v = report.perServing[row.key];
    const digits = row.unit === 'g' && Math.abs(v) < 10 ? 1 : 0;
    return row.unit === 'kcal' ? `${v.toFixed(0)} kcal` : `${v.toFixed(digits)} ${row.unit} ${row.nutrient}`;
  });
  const [protein, kcal, ...others] = parts;
  return `best reachable: ${protein} at ${kcal}${others.length ? ` (${others.join(', ')})` : ''} per serving`;
}

/**
 * Rewrites a recipe against per-serving targets (PRODUCT.md "The computation", steps 6–7):
 * the optimal plan with every change explained, or, when the targets cannot all be met, the
 * closest plan, the targets that bind and suggestions that each come from a re-solve.
 * Pure and synchronous; throws RewriteSolverError when the solver gives no trustworthy answer.
 */
export function solveRewrite(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: RewriteOptions = {},
): RewriteResult {
  checkTargets(targets);
  const opts = resolveOptions(options);
  const log = new SolveLog(opts.timeoutMs);
  const built = buildModel(lines, targets, servings, opts);
  const solution = log.solve(built.model);
  const written = writtenChoices(built.variables);
  const before = planOf(written, servings);
  const info = (objectiveValue: number, model: Parameters<typeof toLpFormat>[0]): SolverInfo => {
    const out: SolverInfo = {
      objective: opts.objective,
      objectiveValue,
      ms: log.ms,
      solves: log.solves,
      provenOptimal: log.allProven,
    };
    if (opts.explain) out.model = toLpFormat(model);
    return out;
  };

  if (hasSolution(solution)) {
    const chosen = solvedChoices(built.variables, solution.values);
    return {
      status: 'optimal',
      before,
      after: planOf(chosen, servings),
      changes: explainChanges(written, chosen, targets, servings, opts.objective),
      solver: info(solution.objective + built.variables.objectiveConstant, built.model),
    };
  }
  if (solution.status !== 'infeasible') {
    throw new RewriteSolverError(`the solver stopped without a plan (${solution.status})`, solution.status);
  }

  const report = analyseInfeasible(lines, targets, servings, opts, log);
  return {
    status: 'infeasible',
    message: `The targets cannot all be met; ${describeReachable(report, targets)}.`,
    before,
    closest: planOf(report.closest, servings),
    bestReachable: report.perServing,
    binding: report.binding,
    suggestions: report.suggestions,
    solver: info(report.objectiveValue, report.model),
  };
}
