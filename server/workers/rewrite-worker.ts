import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { RewriteLine, RewriteOptions, RewriteResult, Targets } from '../../shared/rewrite/types';

export interface RewriteTask {
  lines: RewriteLine[];
  targets: Targets;
  servings: number;
  options: RewriteOptions;
}

/** Runs in a worker thread so a long solve never blocks the request thread. */
export default function solve(task: RewriteTask): RewriteResult {
  return solveRewrite(task.lines, task.targets, task.servings, task.options);
}
