import { useMutation } from '@tanstack/react-query';
import type { AnalyzeRequest, AnalyzeResponse } from '../../../../shared/schemas/analyze';
import { api } from '../../../lib/api-client';

export function analyzeRecipe(request: AnalyzeRequest, signal?: AbortSignal): Promise<AnalyzeResponse> {
  return api.post<AnalyzeResponse>('/api/analyze', request, { signal });
}

/** One analysis at a time: the caller aborts the last one through `signal` before asking again. */
export function useAnalyzeRecipe() {
  return useMutation({
    mutationFn: ({ request, signal }: { request: AnalyzeRequest; signal: AbortSignal }) => analyzeRecipe(request, signal),
  });
}
