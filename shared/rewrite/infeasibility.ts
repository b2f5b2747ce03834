import type { Nutrients } from '../nutrition';
import type { ResolvedOptions } from './rewrite-options';
import { solveElastic, type ElasticOutcome } from './elastic-solve';
import { planOf, solvedChoices, writtenChoices, type LineChoice } from './read-plan';
import type { SolveLog } from './solve-log';
import { activeTargets, targetRow, type TargetRow } from './targets';
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
    const moved = movedTargets(lines, targets, servings, options, elastic, binding, perServing, log);
    const parts = binding.filter((t) => moved[t] !== undefined).map((t) => relaxation(targetRow(t), moved[t]!));
    if (parts.length > 0) {
      suggestions.push({
        kind: 'targets',
        value: parts.length,
        targets: moved,
        message: `${parts.slice(0, -1).join(', ')}${parts.length > 1 ? ' and ' : ''}${parts[parts.length - 1]}`,
      });
    }
  }
  const volume = resolve({ objective: { kind: 'dish-volume' } });
  const written = elastic.built.variables.originalVolumeMl;
  if (volume && written > 0) {
    const changed = planOf(solvedChoices(volume.built.variables, volume.solution.values), servings).volumeMl;
    // beyond the permitted cuts below and the permitted additions above
    const { permittedCutMl, permittedAddMl } = volume.built.variables;
    const outside = Math.max(0, changed - written - permittedAddMl, written - permittedCutMl - changed);
    const pct = Math.ceil(snap((100 * outside) / written));
    if (pct > options.volumeTolerance * 100 + 1e-9) {
      suggestions.push({ kind: 'volume-tolerance', value: pct, message: `let the dish's volume change by up to ${pct} %` });
    }
  }
  return { closest, perServing, binding, suggestions };
}

/**
 * Several targets moved at once, to values one plan reaches (rounded outward, so that plan meets
 * them). A floor never drops below what the dish as written already gives: the closest plan may
 * trade protein for calories, but "lower the protein floor" under the dish's own protein helps
 * no cook. So the floors go to max(closest, as written) and the ceilings to the least a plan
 * meeting those floors reaches (a re-solve); if that re-solve fails, the closest plan's values.
 */
function movedTargets(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  elastic: ElasticOutcome,
  binding: TargetName[],
  closest: Nutrients,
  log: SolveLog,
): Partial<Targets> {
  const written = planOf(writtenChoices(elastic.built.variables), servings).perServing;
  const floors: Partial<Targets> = {};
  for (const target of binding) {
    const row = targetRow(target);
    if (row.sense !== 'min') continue;
    floors[target] = roundOutward(Math.max(closest[row.key], Math.min(targets[target]!, written[row.key])), row);
  }
  let reached = closest;
  const raised = (Object.keys(floors) as TargetName[]).some((t) => floors[t]! > roundOutward(closest[targetRow(t).key], targetRow(t)));
  const ceilings = binding.filter((t) => targetRow(t).sense === 'max');
  // Every ceiling is relaxed in the re-solve: one the closest plan met may be one the dish as written breaks.
  const allCeilings = (Object.keys(targets) as TargetName[]).filter((t) => targets[t] !== undefined && targetRow(t).sense === 'max');
  if (raised && ceilings.length > 0) {
    // Floors the dish as written already meets can always be met together; the closest plan's floors
    // may not be, when it traded one floor for another.
    const writtenFloors: Partial<Targets> = {};
    for (const target of Object.keys(floors) as TargetName[])
      writtenFloors[target] = roundOutward(Math.min(targets[target]!, written[targetRow(target).key]), targetRow(target));
    const first = targetRow(ceilings[0]);
    for (const tried of [floors, writtenFloors]) {
      const outcome = solveElastic(
        lines,
        { ...targets, ...tried },
        servings,
        options,
        { objective: { kind: 'nutrient', key: first.key, sense: 'min' }, dropTargets: allCeilings },
        log,
        log.budgetMs / 4,
      );
      if (outcome?.meetsTargets) {
        reached = planOf(solvedChoices(outcome.built.variables, outcome.solution.values), servings).perServing;
        break;
      }
    }
  }
  const moved: Partial<Targets> = {};
  for (const target of new Set([...binding, ...allCeilings])) {
    const row = targetRow(target);
    const value = row.sense === 'min' ? Math.min(targets[target]!, reached[row.key]) : reached[row.key];
    const out = roundOutward(value, row);
    // A target the plan meets as asked stays as asked.
    if (row.sense === 'min' ? out < targets[target]! : out > targets[target]!) moved[target] = out;
  }
  return moved;
}
