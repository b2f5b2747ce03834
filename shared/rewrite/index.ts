export { buildRewriteModel, modelText, type BuiltRewriteModel, type RewriteModelMeta } from './build-model';
export { toLpFormat } from './lp-format';
export { solveLp, type LpSolution, type LpSolveOptions } from './solve-lp';
export { applySuggestion, solveRewrite } from './solve-rewrite';
export { RewriteSolverError } from './solve-log';
export type * from './types';
