import solver, { type SolveResult } from 'javascript-lp-solver';
import { findViolations, fixVariables, isIntegerVariable, objectiveValue, type LpModel } from './lp-model';

export type LpStatus = 'optimal' | 'infeasible' | 'unbounded' | 'time-limit' | 'failed';

export interface LpSolveOptions {
  /** wall-clock budget for branch and bound, ms (default 2000) */
  timeoutMs?: number;
  /** relative MIP gap at which branch and bound may stop (default 0: prove optimality) */
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
}

function runSolver(model: LpModel, options: Required<LpSolveOptions>): RawRun {
  const withOptions: LpModel = {
    ...model,
    options: {
      ...model.options,
      timeout: options.timeoutMs,
      tolerance: options.relativeGap,
      presolve: options.presolve,
    },
  };
  let raw: SolveResult;
  try {
    raw = solver.Solve(withOptions) as SolveResult;
  } catch (e) {
    return { raw: null, values: {}, error: e instanceof Error ? e.message : String(e) };
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
 * ("polished"); failing that, the whole model is solved again with presolve switched the other way.
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

  const first = runSolver(model, opts);
  if (!first.raw) return finish('failed', {}, 'none', [first.error ?? 'solver error']);
  if (first.raw.bounded === false) return finish('unbounded', {}, 'none');
  if (!first.raw.feasible) {
    const timedOut = integer && now() - started >= opts.timeoutMs;
    return finish(timedOut ? 'time-limit' : 'infeasible', {}, 'none');
  }
  const violations = findViolations(model, first.values);
  if (violations.length === 0) return finish('optimal', first.values, 'direct');

  if (integer) {
    const polished = polish(model, first.values, opts);
    if (polished && findViolations(model, polished).length === 0) return finish('optimal', polished, 'polished');
  }
  const second = runSolver(model, { ...opts, presolve: !opts.presolve });
  if (second.raw?.feasible && second.raw.bounded !== false) {
    const again = findViolations(model, second.values);
    if (again.length === 0) return finish('optimal', second.values, 'retried');
  }
  return finish('failed', {}, 'none', violations);
}
