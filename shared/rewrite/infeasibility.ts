import { divideNutrients, nutrientsForGrams, sumNutrients, type Nutrients } from '../nutrition';
import { buildModel, type BuiltRewriteModel, type ModelVariant, type ResolvedOptions, type TargetMode } from './build-model';
import type { LpModel } from './lp-model';
import { solvedChoices, type PlanChoice } from './read-plan';
import { hasSolution, RewriteSolverError, type SolveLog } from './solve-log';
import { activeTargets, type TargetRow } from './targets';
import type { RewriteLine, Suggestion, TargetName, Targets } from './types';

export interface InfeasibilityReport {
  /** the plan that comes closest to the targets */
  closest: PlanChoice[];
  perServing: Nutrients;
  binding: TargetName[];
  suggestions: Suggestion[];
  /** the model that produced `closest` */
  model: LpModel;
  objectiveValue: number;
}

/** Solver values land within ~1e-9 of a true optimum; snap before rounding so 520.0000001 stays 520. */
function snap(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}

function roundOutward(v: number, row: TargetRow): number {
  const step = row.unit === 'g' && Math.abs(v) < 10 ? 0.1 : 1;
  const units = snap(v / step);
  const rounded = (row.sense === 'max' ? Math.ceil(units) : Math.floor(units)) * step;
  return Number(rounded.toFixed(step < 1 ? 1 : 0));
}

function perServingOf(choices: PlanChoice[], servings: number): Nutrients {
  return divideNutrients(sumNutrients(choices.map((c) => nutrientsForGrams(c.food.per100g, c.grams))), servings);
}

function misses(perServing: Nutrients, row: TargetRow, value: number): boolean {
  const tol = 1e-6 * Math.max(1, Math.abs(value));
  return row.sense === 'min' ? perServing[row.key] < value - tol : perServing[row.key] > value + tol;
}

function formatValue(v: number, row: TargetRow): string {
  const digits = row.unit === 'g' && Math.abs(v) < 10 ? 1 : 0;
  return `${v.toFixed(digits)}${row.unit === 'kcal' ? ' kcal' : ` ${row.unit}`}`;
}

/**
 * When the targets cannot all be met: an elastic re-solve (slack on every target, weighted by the
 * target's size, minimised), then the cook's own objective among the plans with that least slack.
 * Each suggestion comes from a re-solve of the hard model with one thing let go: the swap limit
 * (fewest swaps that reach every target), one binding target (the best value of it reachable with
 * the others met), or the dish-volume tolerance (the least volume change that reaches every target).
 */
export function analyseInfeasible(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  log: SolveLog,
): InfeasibilityReport {
  const active = activeTargets(targets);
  const elasticModes: Partial<Record<TargetName, TargetMode>> = {};
  for (const { row } of active) elasticModes[row.target] = 'elastic';
  const build = (variant: ModelVariant): BuiltRewriteModel => buildModel(lines, targets, servings, options, variant);

  const slackStage = build({ objective: { kind: 'slack' }, targetModes: elasticModes });
  const leastSlack = log.solve(slackStage.model);
  if (!hasSolution(leastSlack)) {
    throw new RewriteSolverError('the elastic re-solve found no plan', leastSlack.status);
  }
  // Second stage: keep the slack at its least (up to solver precision), then the cook's objective.
  const cap = leastSlack.objective * (1 + 1e-7) + 1e-9;
  let chosen = build({ objective: { kind: options.objective }, targetModes: elasticModes, slackCap: cap });
  let solution = log.solve(chosen.model);
  if (!hasSolution(solution)) {
    chosen = slackStage;
    solution = leastSlack;
  }
  const closest = solvedChoices(chosen.variables, solution.values);
  const perServing = perServingOf(closest, servings);
  const binding = active.filter(({ row, value }) => misses(perServing, row, value)).map(({ row }) => row.target);

  const suggestions: Suggestion[] = [];
  const maxSwaps = options.maxSwaps;
  if (maxSwaps !== null) {
    const fewest = log.solve(build({ objective: { kind: 'swaps' }, maxSwaps: null }).model);
    if (hasSolution(fewest)) {
      const needed = Math.round(fewest.objective);
      if (needed > maxSwaps) {
        const more = needed - maxSwaps;
        suggestions.push({
          kind: 'more-swaps',
          value: needed,
          message: `allow ${more} more swap${more === 1 ? '' : 's'} (${needed} in all)`,
        });
      }
    }
  }
  for (const target of binding) {
    const { row } = active.find((t) => t.row.target === target)!;
    const variant: ModelVariant = {
      objective: { kind: 'nutrient', key: row.key, sense: row.sense === 'min' ? 'max' : 'min' },
      targetModes: { [target]: 'off' },
    };
    const built = build(variant);
    const best = log.solve(built.model);
    if (!hasSolution(best)) continue;
    const reachable = roundOutward(best.objective + built.variables.objectiveConstant, row);
    const verb = row.sense === 'min' ? 'lower' : 'raise';
    suggestions.push({
      kind: 'target',
      target,
      value: reachable,
      message: `${verb} the ${row.label} to ${formatValue(reachable, row)}`,
    });
  }
  const volumeBuilt = build({ objective: { kind: 'dish-volume' } });
  if (volumeBuilt.variables.originalVolumeMl > 0) {
    const least = log.solve(volumeBuilt.model);
    if (hasSolution(least)) {
      const pct = Math.ceil(snap((100 * least.objective) / volumeBuilt.variables.originalVolumeMl));
      if (pct > options.volumeTolerance * 100 + 1e-9) {
        suggestions.push({ kind: 'volume-tolerance', value: pct, message: `let the dish's volume change by up to ${pct} %` });
      }
    }
  }

  return { closest, perServing, binding, suggestions, model: chosen.model, objectiveValue: solution.objective };
}
