import { resolveOptions } from './rewrite-options';
import { solveElastic } from './elastic-solve';
import { explainChanges } from './explain-changes';
import { analyseInfeasible, formatTargetValue } from './infeasibility';
import { modelText } from './build-model';
import { planOf, solvedChoices, unmeasuredMoves, writtenChoices } from './read-plan';
import { RewriteSolverError, SolveLog } from './solve-log';
import { activeTargets } from './targets';
import type { Nutrients } from '../nutrition';
import type { RewriteLine, RewriteObjective, RewriteOptions, RewriteResult, SolverInfo, Suggestion, Targets } from './types';

/** The request with a suggestion taken. */
export function applySuggestion(targets: Targets, options: RewriteOptions, suggestion: Suggestion): { targets: Targets; options: RewriteOptions } {
  switch (suggestion.kind) {
    case 'more-swaps':
      return { targets, options: { ...options, maxSwaps: suggestion.value } };
    case 'target':
      return { targets: { ...targets, [suggestion.target!]: suggestion.value }, options };
    case 'targets':
      return { targets: { ...targets, ...suggestion.targets }, options };
    case 'volume-tolerance':
      return { targets, options: { ...options, volumeTolerancePct: suggestion.value } };
  }
}

function checkTargets(targets: Targets): void {
  if (!Number.isFinite(targets.proteinMinG) || !Number.isFinite(targets.kcalMax)) {
    throw new RangeError('targets need a finite proteinMinG and kcalMax');
  }
}

/** "best reachable: 31 g protein at 450 kcal per serving (…)" */
function describeReachable(perServing: Nutrients, targets: Targets): string {
  const [protein, kcal, ...others] = activeTargets(targets).map(({ row }) => {
    const text = formatTargetValue(perServing[row.key], row);
    return row.unit === 'kcal' ? text : `${text} ${row.nutrient}`;
  });
  return `best reachable: ${protein} at ${kcal}${others.length ? ` (${others.join(', ')})` : ''} per serving`;
}

/**
 * Rewrites a recipe against per-serving targets (PRODUCT.md "The computation", steps 6–7):
 * the optimal plan with every change explained, or, when the targets cannot all be met, the
 * closest plan, the targets that bind and suggestions that each come from a re-solve.
 * Pure and synchronous; throws RewriteSolverError when the solver gives no trustworthy answer.
 */
export function solveRewrite(lines: RewriteLine[], targets: Targets, servings: number, options: RewriteOptions = {}): RewriteResult {
  checkTargets(targets);
  const opts = resolveOptions(options);
  const log = new SolveLog(opts.timeoutMs);
  const solveFor = (kind: RewriteObjective, floorMs?: number) => solveElastic(lines, targets, servings, opts, { objective: { kind } }, log, Infinity, floorMs);
  let objective = opts.objective;
  let outcome = solveFor(objective);
  if (!outcome || (!outcome.meetsTargets && outcome.solution.status !== 'optimal')) {
    // Time ran out before a plan (meeting the targets) turned up, which proves nothing. The
    // nutrient objectives' relaxations are tight, so their branch and bound finds plans fast:
    // one of those, not proven best for the cook's objective, beats a wrong "out of reach".
    // A nutrient solve that finishes and still misses is the proof the targets are out of reach.
    for (const kind of (['min-kcal', 'max-protein'] as const).filter((k) => k !== objective)) {
      const quick = solveFor(kind, log.budgetMs / 4);
      if (quick && (quick.meetsTargets || quick.solution.status === 'optimal')) {
        outcome = quick;
        objective = kind;
        break;
      }
    }
    if (!outcome) throw new RewriteSolverError('the solver stopped without a plan', 'time-limit');
    if (!outcome.meetsTargets && outcome.solution.status !== 'optimal') {
      throw new RewriteSolverError('the solver ran out of time before settling whether the targets can be met', 'time-limit');
    }
  }
  // A line that moved by less than a cook measures ("28 g → 28 g") is no change a cook can make: solve again
  // with those lines at their written grams and keep that plan when it still meets the targets.
  for (let round = 0; round < 2 && outcome.meetsTargets; round++) {
    const tiny = new Set(unmeasuredMoves(solvedChoices(outcome.built.variables, outcome.solution.values)));
    if (tiny.size === 0) break;
    const fixedLines = lines.map((l) => (tiny.has(l.index) ? { ...l, keepScale: undefined } : l));
    const again = solveElastic(fixedLines, targets, servings, opts, { objective: { kind: objective } }, log);
    if (!again?.meetsTargets) break;
    outcome = again;
    lines = fixedLines;
  }
  const found = outcome;
  const written = writtenChoices(found.built.variables);
  const before = planOf(written, servings);
  const chosen = solvedChoices(found.built.variables, found.solution.values);
  const info = (): SolverInfo => {
    const out: SolverInfo = {
      objective,
      objectiveValue: found.solution.objective + found.built.variables.objectiveConstant,
      ms: log.ms,
      solves: log.solves,
      provenOptimal: found.solution.status === 'optimal' && objective === opts.objective,
    };
    if (opts.explain) out.model = modelText(found.built);
    return out;
  };

  const held = lines.filter((l) => l.heldReason).map((l) => ({ line: l.index, reason: l.heldReason! }));
  if (found.meetsTargets) {
    return {
      status: 'optimal',
      before,
      after: planOf(chosen, servings),
      changes: explainChanges(written, chosen, targets, servings, objective, found.built.variables.volumeRangeMl),
      ...(held.length ? { held } : {}),
      solver: info(),
    };
  }
  const report = analyseInfeasible(lines, targets, servings, opts, found, log);
  return {
    status: 'infeasible',
    message: `The targets cannot all be met; ${describeReachable(report.perServing, targets)}.`,
    before,
    closest: planOf(report.closest, servings),
    bestReachable: report.perServing,
    binding: report.binding,
    suggestions: report.suggestions,
    ...(held.length ? { held } : {}),
    solver: info(),
  };
}
