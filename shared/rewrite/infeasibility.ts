import type { Nutrients } from '../nutrition';
import type { ResolvedOptions } from './rewrite-options';
import { solveElastic, type ElasticOutcome } from './elastic-solve';
import { planOf, solvedChoices, type LineChoice } from './read-plan';
import type { SolveLog } from './solve-log';
import { activeTargets, type TargetRow } from './targets';
import type { RewriteLine, Suggestion, TargetName, Targets } from './types';

export interface InfeasibilityReport {
  /** the plan that comes closest to the targets */
  closest: LineChoice[];
  perServing: Nutrients;
  binding: TargetName[];
  suggestions: Suggestion[];
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

function misses(perServing: Nutrients, row: TargetRow, value: number): boolean {
  const tol = 1e-6 * Math.max(1, Math.abs(value));
  return row.sense === 'min' ? perServing[row.key] < value - tol : perServing[row.key] > value + tol;
}

function relaxation(row: TargetRow, value: number): string {
  return `${row.sense === 'min' ? 'lower' : 'raise'} the ${row.label} to ${formatTargetValue(value, row)}`;
}

export function formatTargetValue(v: number, row: TargetRow): string {
  const digits = row.unit === 'g' && Math.abs(v) < 10 ? 1 : 0;
  return `${v.toFixed(digits)}${row.unit === 'kcal' ? ' kcal' : ` ${row.unit}`}`;
}

/**
 * When the targets cannot all be met. `elastic` is the plan with the least weighted slack (best
 * for the cook's objective among those). Each suggestion comes from a re-solve with one thing let
 * go, the other targets still met: the swap limit (the fewest swaps that reach every target), one
 * binding target (the best value of it reachable), or the dish-volume tolerance (the least volume
 * change that reaches every target). A re-solve that cannot meet the other targets gives none.
 * With several targets binding, one more suggestion moves them all to what the closest plan reaches.
 */
export function analyseInfeasible(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  elastic: ElasticOutcome,
  log: SolveLog,
): InfeasibilityReport {
  const active = activeTargets(targets);
  const closest = solvedChoices(elastic.built.variables, elastic.solution.values);
  const { perServing } = planOf(closest, servings);
  const binding = active.filter(({ row, value }) => misses(perServing, row, value)).map(({ row }) => row.target);
  // Each suggestion gets at most a quarter of the budget; a plan found when time runs out still
  // shows the change works (for the swap count it may then not be the fewest).
  const resolve = (variant: Parameters<typeof solveElastic>[4]) => {
    const outcome = solveElastic(lines, targets, servings, options, variant, log, log.budgetMs / 4);
    return outcome?.meetsTargets ? outcome : null;
  };

  const suggestions: Suggestion[] = [];
  if (options.maxSwaps !== null) {
    const fewest = resolve({ objective: { kind: 'swaps' }, maxSwaps: null });
    if (fewest) {
      const needed = solvedChoices(fewest.built.variables, fewest.solution.values).filter((c) => c.swap !== null).length;
      if (needed > options.maxSwaps) {
        const more = needed - options.maxSwaps;
        suggestions.push({ kind: 'more-swaps', value: needed, message: `allow ${more} more swap${more === 1 ? '' : 's'} (${needed} in all)` });
      }
    }
  }
  for (const target of binding) {
    const { row } = active.find((t) => t.row.target === target)!;
    const best = resolve({
      objective: { kind: 'nutrient', key: row.key, sense: row.sense === 'min' ? 'max' : 'min' },
      dropTargets: [target],
    });
    if (!best) continue;
    const reached = planOf(solvedChoices(best.built.variables, best.solution.values), servings).perServing[row.key];
    const value = roundOutward(reached, row);
    suggestions.push({ kind: 'target', target, value, message: relaxation(row, value) });
  }
  if (binding.length > 1) {
    // The closest plan itself meets every target moved to what it reaches (rounded outward).
    const moved: Partial<Targets> = {};
    const parts: string[] = [];
    for (const target of binding) {
      const { row } = active.find((t) => t.row.target === target)!;
      moved[target] = roundOutward(perServing[row.key], row);
      parts.push(relaxation(row, moved[target]!));
    }
    suggestions.push({ kind: 'targets', value: binding.length, targets: moved, message: `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}` });
  }
  const volume = resolve({ objective: { kind: 'dish-volume' } });
  const written = elastic.built.variables.originalVolumeMl;
  if (volume && written > 0) {
    const changed = planOf(solvedChoices(volume.built.variables, volume.solution.values), servings).volumeMl;
    const pct = Math.ceil(snap((100 * Math.abs(changed - written)) / written));
    if (pct > options.volumeTolerance * 100 + 1e-9) {
      suggestions.push({ kind: 'volume-tolerance', value: pct, message: `let the dish's volume change by up to ${pct} %` });
    }
  }
  return { closest, perServing, binding, suggestions };
}
