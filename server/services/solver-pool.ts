import { Piscina } from 'piscina';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { RewriteTask } from '../workers/rewrite-worker';
import type { RewriteResult } from '../../shared/rewrite/types';
import { HttpError } from '../lib/http-error';

export const DEFAULT_SOLVE_BUDGET_MS = 2_000;

let pool: Piscina | null = null;

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
  }
  return pool;
}

/** Solves off the request thread; past the budget the worker is ended and the request gets a 503. */
export async function runRewrite(task: RewriteTask, budgetMs = DEFAULT_SOLVE_BUDGET_MS): Promise<RewriteResult> {
  const signal = AbortSignal.timeout(budgetMs);
  try {
    return (await getPool().run(task, { signal })) as RewriteResult;
  } catch (error) {
    if (signal.aborted) {
      throw new HttpError(503, 'solver_timeout', `The rewrite took longer than ${(budgetMs / 1000).toFixed(1)} s and was stopped. Try fewer candidates per line, fewer lines, or lock the lines you do not want changed.`);
    }
    throw error;
  }
}

export async function closeSolverPool() {
  const p = pool;
  pool = null;
  await p?.destroy();
}
