import { useQuery } from '@tanstack/react-query';
import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import { isApiError } from '../../../lib/api-client';
import { rewriteRecipe } from '../../../lib/api/compute';
import { queryKeys } from '../../../lib/query-keys';
import { infeasibleDetailsOf } from '../rewrite-types';

/**
 * The exact model the solver ran for a request, in CPLEX LP text. Targets that cannot be met still
 * have a model: the elastic one behind the closest plan, sent with the 422.
 */
export async function fetchRewriteModel(request: RewriteRequest, signal?: AbortSignal): Promise<string> {
  try {
    const answer = await rewriteRecipe(request, { explain: true, signal });
    return answer.solver.model ?? '';
  } catch (error) {
    const model = infeasibleDetailsOf(error)?.solver?.model;
    if (model) return model;
    throw error;
  }
}

/** Asked only while the disclosure is open; the same request is solved once. */
export function useRewriteModel(request: RewriteRequest | null, signature: string, enabled: boolean) {
  return useQuery({
    queryKey: queryKeys.rewrite.model(signature),
    queryFn: ({ signal }) => fetchRewriteModel(request as RewriteRequest, signal),
    enabled: enabled && request !== null,
    staleTime: Infinity,
    retry: (count, error) => count < 1 && !(isApiError(error) && error.status < 500),
  });
}
