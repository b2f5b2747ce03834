import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Swap, SwapRequest } from '../../../../shared/schemas/swaps';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { Swap, SwapRequest, SwapStatus, SwapTargetFood } from '../../../../shared/schemas/swaps';

export function listSwaps(signal?: AbortSignal): Promise<{ swaps: Swap[] }> {
  return api.get<{ swaps: Swap[] }>('/api/swaps', { signal });
}

export function useSwaps() {
  return useQuery({ queryKey: queryKeys.swaps.list(), queryFn: ({ signal }) => listSwaps(signal), select: (data) => data.swaps });
}

function useSwapCache() {
  const queryClient = useQueryClient();
  return {
    /** put the server's copy of one swap in the list: in its place when known, first when new */
    store(swap: Swap) {
      queryClient.setQueryData<{ swaps: Swap[] }>(queryKeys.swaps.list(), (previous) => {
        if (!previous) return previous;
        const known = previous.swaps.some((s) => s.id === swap.id);
        return { swaps: known ? previous.swaps.map((s) => (s.id === swap.id ? swap : s)) : [swap, ...previous.swaps] };
      });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
    forget(id: number) {
      queryClient.setQueryData<{ swaps: Swap[] }>(queryKeys.swaps.list(), (previous) =>
        previous ? { swaps: previous.swaps.filter((s) => s.id !== id) } : previous,
      );
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  };
}

export function useCreateSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: (input: SwapRequest) => api.post<Swap>('/api/swaps', input),
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useUpdateSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: Partial<SwapRequest> }) => api.patch<Swap>(`/api/swaps/${id}`, input),
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useSetSwapPublished() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: ({ id, published }: { id: number; published: boolean }) => api.post<Swap>(`/api/swaps/${id}/${published ? 'publish' : 'unpublish'}`),
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useDeleteSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/swaps/${id}`),
    onSuccess: (_nothing, id) => cache.forget(id),
  });
}
