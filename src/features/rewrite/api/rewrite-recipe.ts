import { useMutation } from '@tanstack/react-query';
import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import { api } from '../../../lib/api-client';
import type { RewriteAnswer } from '../rewrite-types';

/** POST /api/rewrite; `explain` asks for the solved model as CPLEX LP text in `solver.model`. */
export function rewriteRecipe(request: RewriteRequest, options: { explain?: boolean; signal?: AbortSignal } = {}): Promise<RewriteAnswer> {
  return api.post<RewriteAnswer>(options.explain ? '/api/rewrite?explain=1' : '/api/rewrite', request, { signal: options.signal });
}

/** One rewrite at a time: the caller aborts the last one through `signal` before asking again. */
export function useRewriteRecipe() {
  return useMutation({
    mutationFn: ({ request, signal }: { request: RewriteRequest; signal: AbortSignal }) => rewriteRecipe(request, { signal }),
  });
}
