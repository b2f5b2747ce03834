import { useMutation } from '@tanstack/react-query';
import type { AnalyzeRequest } from '../../../../shared/schemas/analyze';
import { analyzeRecipe } from '../../../lib/api/compute';

/** One analysis at a time: the caller aborts the last one through `signal` before asking again. */
export function useAnalyzeRecipe() {
  return useMutation({
    mutationFn: ({ request, signal }: { request: AnalyzeRequest; signal: AbortSignal }) => analyzeRecipe(request, signal),
  });
}
