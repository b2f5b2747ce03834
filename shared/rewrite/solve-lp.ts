import solver, { type SolveResult } from 'javascript-lp-solver';
import { findViolations, fixVariables, isIntegerVariable, objectiveValue, reverseColumns, scaleRows, type LpModel } from './lp-model';
import { guarded, SolverStalled } from './pivot-guard';

export type LpStatus = 'optimal' | 'infeasible' | 'unbounded' | 'time-limit' | 'failed';

export interface LpSolveOptions {
  /** wall-clock budget for branch and bound, ms (default 2000) */
  timeoutMs?: number;
  /**
   * javascript-lp-solver's `tolerance` (default 0: prove optimality). It stops once the incumbent
   * is within this share of the root relaxation's bound, not of the live bound, so on the rewrite
   * models (root bounds far below the optimum) a small gap saves nothing and a large one is blind.
   */
  relativeGap?: number;
  /** javascript-lp-solver's presolve (default off, see below) */
  presolve?: boolean;
}

export interface LpSolution {
  /** 'time-limit' means a checked integer solution that is not proven optimal, or none if values is empty */
  status: LpStatus;
  /** objective recomputed from the values (NaN without a solution) */
  objective: number;
  /** every model variable, 0 when the solver left it out */
  values: Record<string, number>;
  ms: number;
  /** how a solution came to pass the feasibility check */
  route: 'direct' | 'polished' | 'retried' | 'none';
  /** what was still wrong when status is 'failed' */
  violations: string[];
}

const DEFAULT_TIMEOUT_MS = 2000;

function now(): number {
  return globalThis.performance?.now() ?? Date.now();
}

function hasIntegers(model: LpModel): boolean {
  return Object.keys(model.variables).some((v) => isIntegerVariable(model, v));
}

interface RawRun {
  raw: SolveResult | null;
  values: Record<string, number>;
  error?: string;
  stalled?: SolverStalled['reason'];
}

function runSolver(model: LpModel, options: Required<LpSolveOptions>): RawRun {
  const withOptions: LpModel = {
    ...model,
    options: {
      ...model.options,
      timeout: options.timeoutMs,
      tolerance: options.relativeGap,
      presolve: options.presolve,
      // Its own detector declares a model infeasible on a cycle; the pivot guard handles cycles.
      exitOnCycles: false,
    },
  };
  let raw: SolveResult;
  try {
    // The guard's deadline leaves branch and bound room to stop at its own timeout with a plan.
    raw = guarded(options.timeoutMs * 1.25 + 50, () => solver.Solve(withOptions) as SolveResult);
  } catch (e) {
    return { raw: null, values: {}, error: e instanceof Error ? e.message : String(e), stalled: e instanceof SolverStalled ? e.reason : undefined };
  }
  const values: Record<string, number> = {};
  for (const v of Object.keys(model.variables)) {
    const value = raw[v];
    values[v] = typeof value === 'number' ? value : 0;
  }
  return { raw, values };
}

/** Continuous re-solve with every integer variable fixed where the MILP put it (rounded). */
function polish(model: LpModel, values: Record<string, number>, options: Required<LpSolveOptions>): Record<string, number> | null {
  const fixed: Record<string, number> = {};
  for (const v of Object.keys(model.variables)) if (isIntegerVariable(model, v)) fixed[v] = Math.round(values[v] ?? 0);
  const reduced = fixVariables(model, fixed);
  if (reduced.violations.length) return null;
  if (Object.keys(reduced.model.variables).length === 0) return fixed;
  const run = runSolver(reduced.model, options);
  if (!run.raw?.feasible) return null;
  return { ...run.values, ...fixed };
}

/**
 * The one wrapper every caller solves through (the rewrite and the Stigler check alike).
 * javascript-lp-solver's answers are never taken on trust: the values are checked against every
 * row, bound and integrality within 1e-6 (scaled), and the objective is recomputed from them.
 * When the check fails, the integer choice is kept and the continuous part re-solved as an LP
 * ("polished"); failing that, or when the simplex cycles (see pivot-guard), the model is solved
 * again with its rows scaled, then with its columns reversed, then with presolve switched the
 * other way ("retried").
 *
 * Presolve is off by default: javascript-lp-solver's presolve zeroes the cost of variables it fixes
 * and assumes integer variables without an explicit bound lie in [0, 1], so its reported objective
 * can disagree with the model; the rewrite models are small enough not to need it.
 */
export function solveLp(model: LpModel, options: LpSolveOptions = {}): LpSolution {
  const opts: Required<LpSolveOptions> = {
    timeoutMs: options.timeoutMs ?? DEFAULT_TIMEOUT_MS,
    relativeGap: options.relativeGap ?? 0,
    presolve: options.presolve ?? false,
  };
  const started = now();
  const integer = hasIntegers(model);
  const finish = (status: LpStatus, values: Record<string, number>, route: LpSolution['route'], violations: string[] = []): LpSolution => {
    const ms = now() - started;
    const solved = route !== 'none';
    // Branch and bound that ran into its budget has not proved its incumbent optimal.
    const timedOut = integer && ms >= opts.timeoutMs;
    return {
      status: solved && status === 'optimal' && timedOut ? 'time-limit' : status,
      objective: solved ? objectiveValue(model, values) : Number.NaN,
      values: solved ? values : {},
      ms,
      route,
      violations,
    };
  };

  // Attempts in turn, each with what is left of the budget: the model itself, then the same model
  // with its rows scaled or its columns reversed (other pivoting paths), then with presolve
  // switched the other way.
  const attempts: { model: LpModel; presolve: boolean }[] = [
    { model, presolve: opts.presolve },
    { model: scaleRows(model), presolve: opts.presolve },
    { model: reverseColumns(model), presolve: opts.presolve },
    { model, presolve: !opts.presolve },
  ];
  let violations: string[] = [];
  for (const [i, attempt] of attempts.entries()) {
    const remaining = opts.timeoutMs - (now() - started);
    if (i > 0 && remaining <= 0) break;
    const run = runSolver(attempt.model, { ...opts, presolve: attempt.presolve, timeoutMs: Math.max(remaining, 1) });
    if (!run.raw) {
      violations = [run.error ?? 'solver error'];
      if (run.stalled === 'deadline') return finish('time-limit', {}, 'none', violations);
      continue;
    }
    if (run.raw.bounded === false) return finish('unbounded', {}, 'none');
    if (!run.raw.feasible) {
      const timedOut = integer && now() - started >= opts.timeoutMs;
      return finish(timedOut ? 'time-limit' : 'infeasible', {}, 'none');
    }
    violations = findViolations(model, run.values);
    if (violations.length === 0) return finish('optimal', run.values, i === 0 ? 'direct' : 'retried');
    if (integer) {
      const polished = polish(model, run.values, { ...opts, timeoutMs: Math.max(opts.timeoutMs - (now() - started), 1) });
      if (polished && findViolations(model, polished).length === 0) return finish('optimal', polished, 'polished');
    }
  }
  // Branch and bound stopped by its budget before an integer plan turned up: no plan, not a failure.
  if (integer && now() - started >= opts.timeoutMs) return finish('time-limit', {}, 'none', violations);
  return finish('failed', {}, 'none', violations);
}
