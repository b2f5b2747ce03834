import type { LpModel } from './lp-model';
import { solveLp, type LpSolution, type LpStatus } from './solve-lp';

/** The solver gave no answer that could be trusted (time limit without a solution, numerical failure). */
export class RewriteSolverError extends Error {
  constructor(
    message: string,
    readonly status: LpStatus,
  ) {
    super(message);
    this.name = 'RewriteSolverError';
  }
}

/** Least time a solve gets once the budget is spent: enough for the root LP of a small model. */
const FLOOR_MS = 50;

/**
 * Runs the solves of one rewrite within one budget: each solve gets what is left of it (or less,
 * when asked), and at least FLOOR_MS; the time of every solve is added up.
 */
export class SolveLog {
  ms = 0;
  solves = 0;

  constructor(readonly budgetMs: number) {}

  /** `floorMs` raises the least time for a solve that must run even when the budget is spent. */
  solve(model: LpModel, capMs = Infinity, floorMs = FLOOR_MS): LpSolution {
    const remaining = Math.max(floorMs, this.budgetMs - this.ms);
    const solution = solveLp(model, { timeoutMs: Math.min(capMs, remaining) });
    this.ms += solution.ms;
    this.solves += 1;
    if (solution.status === 'failed') {
      throw new RewriteSolverError(`the solver's answer failed the feasibility check: ${solution.violations.slice(0, 3).join('; ')}`, 'failed');
    }
    return solution;
  }
}

/** A solution that can be read: optimal, or the best found when time ran out. */
export function hasSolution(solution: LpSolution): boolean {
  return solution.route !== 'none' && (solution.status === 'optimal' || solution.status === 'time-limit');
}
