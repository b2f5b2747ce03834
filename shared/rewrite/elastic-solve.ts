import { buildModel, FIRST_PENALTY_FACTOR, slackOf, type BuiltRewriteModel, type ModelVariant } from './build-model';
import type { ResolvedOptions } from './rewrite-options';
import type { LpSolution } from './solve-lp';
import { hasSolution, type SolveLog } from './solve-log';
import type { RewriteLine, Targets } from './types';

/** Weighted (relative) slack below which a target counts as met: 1e-7 of the target. */
export const MET = 1e-7;

/**
 * Slack prices tried in turn, × the objective's scale per unit of relative slack. Any price makes a
 * plan that meets every target the best among such plans. The objective's scale bounds its range,
 * so at 1e8 a plan missing a target by more than 1e-8 of it costs more than any objective could
 * gain: if that plan still misses, no plan meets the targets, and it has the least slack to within
 * that margin, best for the objective among such plans.
 */
const PENALTY_FACTORS = [FIRST_PENALTY_FACTOR, 1e8];

export interface ElasticOutcome {
  built: BuiltRewriteModel;
  solution: LpSolution;
  meetsTargets: boolean;
}

export function weightedSlack(built: BuiltRewriteModel, values: Record<string, number>): number {
  return Object.values(built.variables.slack).reduce((sum, s) => sum + s!.weight * Math.max(0, slackOf(s!, values)), 0);
}

/**
 * Solves a variant with every target elastic: the written recipe is then a plan, so
 * javascript-lp-solver starts feasible and needs no phase 1 at the root (see buildModel). A plan
 * that misses a target at the first price is solved again at the top price (see above).
 * (A model minimising the slack alone would do the same in one step, but every other column then
 * costs nothing and javascript-lp-solver's simplex cycles on such degenerate models.)
 */
export function solveElastic(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  variant: Omit<ModelVariant, 'penaltyFactor'>,
  log: SolveLog,
  capMs = Infinity,
  floorMs?: number,
): ElasticOutcome | null {
  let last: ElasticOutcome | null = null;
  for (const penaltyFactor of PENALTY_FACTORS) {
    const built = buildModel(lines, targets, servings, options, { ...variant, penaltyFactor });
    const solution = log.solve(built.model, capMs, floorMs);
    if (!hasSolution(solution)) return last;
    const count = Math.max(1, Object.keys(built.variables.slack).length);
    const meetsTargets = weightedSlack(built, solution.values) <= MET * count;
    last = { built, solution, meetsTargets };
    if (meetsTargets) break;
  }
  return last;
}
