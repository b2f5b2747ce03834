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

/** Runs solves for one rewrite and adds up their time. */
export class SolveLog {
  ms = 0;
  solves = 0;
  allProven = true;

  constructor(private readonly timeoutMs: number) {}

  solve(model: LpModel): LpSolution {
    const solution = solveLp(model, { timeoutMs: this.timeoutMs });
    this.ms += solution.ms;
    this.solves += 1;
    if (solution.status === 'time-limit' && solution.route !== 'none') this.allProven = false;
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
