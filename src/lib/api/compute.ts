import type { AnalyzeRequest, AnalyzeResponse } from '../../../shared/schemas/analyze';
import type { RewriteRequest, RewriteResponse } from '../../../shared/schemas/rewrite';
import type { EstimateTargetsInput, TargetEstimate } from '../../../shared/schemas/targets';
import { api } from '../api-client';

// The pure computations: nothing is stored, so they work signed out and need no CSRF token.

export function analyzeRecipe(request: AnalyzeRequest, signal?: AbortSignal): Promise<AnalyzeResponse> {
  return api.post<AnalyzeResponse>('/api/analyze', request, { signal });
}

/** POST /api/rewrite; `explain` asks for the solved model as CPLEX LP text in `solver.model`. */
export function rewriteRecipe(request: RewriteRequest, options: { explain?: boolean; signal?: AbortSignal } = {}): Promise<RewriteResponse> {
  return api.post<RewriteResponse>(options.explain ? '/api/rewrite?explain=1' : '/api/rewrite', request, { signal: options.signal });
}

/** Body stats → daily and per-meal estimates (Mifflin–St Jeor); POST only because it takes a body. */
export function estimateTargets(input: EstimateTargetsInput): Promise<TargetEstimate> {
  return api.post<TargetEstimate>('/api/targets/estimate', input);
}
