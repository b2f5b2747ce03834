import { Piscina } from 'piscina';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { RewriteTask } from '../workers/rewrite-worker';
import type { RewriteResult } from '../../shared/rewrite/types';
import { HttpError } from '../lib/http-error';

export const DEFAULT_SOLVE_BUDGET_MS = 2_000;
/**
 * The solver stops itself at its own budget (2 s by default, shared/rewrite/rewrite-options.ts);
 * the worker is ended only past that plus this margin, which covers a cold worker loading its
 * code and a busy machine. Without it, a slow start turned a solvable rewrite into a 503.
 */
export const WORKER_MARGIN_MS = 3_000;

let pool: Piscina | null = null;
/** The first task of a new pool: its worker loads TypeScript once, which is no part of any solve's budget. */
let warmedUp: Promise<unknown> = Promise.resolve();

const WARM_UP: RewriteTask = {
  lines: [
    {
      index: 0,
      foodId: 1,
      grams: 1,
      volumeMl: 1,
      locked: true,
      candidates: [
        {
          foodId: 1,
          name: 'warm-up',
          densityGPerMl: 1,
          original: true,
          per100g: { kcal: 0, proteinG: 0, fatG: 0, satFatG: 0, carbsG: 0, fiberG: 0, sugarG: 0, sodiumMg: 0 },
        },
      ],
    },
  ],
  targets: { proteinMinG: 0, kcalMax: 1 },
  servings: 1,
  options: {},
};

function getPool() {
  if (!pool) {
    // From source (tsx, Vitest) the worker is TypeScript loaded through tsx; compiled (dist/server,
    // everything bundled into index.js) it is the plain JavaScript file beside the bundle.
    const compiled = !import.meta.url.endsWith('.ts');
    const workerFile = fileURLToPath(new URL(compiled ? './workers/rewrite-worker.js' : '../workers/rewrite-worker.ts', import.meta.url));
    pool = new Piscina({
      filename: workerFile,
      execArgv: compiled ? [] : ['--import', 'tsx'],
      minThreads: 1,
      // One core stays free for the request thread, so sign-in and analysis stay fast during a burst.
      maxThreads: Math.max(1, availableParallelism() - 1),
      idleTimeout: 60_000,
    });
    warmedUp = pool.run(WARM_UP).catch(() => undefined);
  }
  return pool;
}

/** The solver's own time budget inside a request: a share of the hard stop, so a slow solve returns its best plan instead of a 503. */
export const SOLVER_TIMEOUT_MS = Math.round(DEFAULT_SOLVE_BUDGET_MS * 0.75);

/** Solves off the request thread; past the budget the worker is ended and the request gets a 503. */
export async function runRewrite(task: RewriteTask, budgetMs = DEFAULT_SOLVE_BUDGET_MS): Promise<RewriteResult> {
  const workers = getPool();
  await warmedUp;
  const signal = AbortSignal.timeout(budgetMs + WORKER_MARGIN_MS);
  try {
    return (await workers.run(task, { signal })) as RewriteResult;
  } catch (error) {
    if (signal.aborted) {
      throw new HttpError(
        503,
        'solver_timeout',
        `The rewrite took longer than ${((budgetMs + WORKER_MARGIN_MS) / 1000).toFixed(1)} s and was stopped. Try fewer candidates per line, fewer lines, or lock the lines you do not want changed.`,
      );
    }
    throw error;
  }
}

export async function closeSolverPool() {
  const p = pool;
  pool = null;
  await p?.destroy();
}
