import { useMutation } from '@tanstack/react-query';
import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import { rewriteRecipe } from '../../../lib/api/compute';

/** One rewrite at a time: the caller aborts the last one through `signal` before asking again. */
export function useRewriteRecipe() {
  return useMutation({
    mutationFn: ({ request, signal }: { request: RewriteRequest; signal: AbortSignal }) => rewriteRecipe(request, { signal }),
  });
}
