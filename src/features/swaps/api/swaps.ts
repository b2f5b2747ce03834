import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Swap, SwapRequest, SwapsResponse } from '../../../../shared/schemas/swaps';
import { createSwap, deleteSwap, setSwapPublished, swapsQuery, updateSwap } from '../../../lib/api/swaps';
import { queryKeys } from '../../../lib/query-keys';

export function useSwaps() {
  return useQuery({ ...swapsQuery(), select: (data) => data.swaps });
}

function useSwapCache() {
  const queryClient = useQueryClient();
  return {
    /** put the server's copy of one swap in the list: in its place when known, first when new */
    store(swap: Swap) {
      queryClient.setQueryData<SwapsResponse>(queryKeys.swaps.list(), (previous) => {
        if (!previous) return previous;
        const known = previous.swaps.some((s) => s.id === swap.id);
        return { swaps: known ? previous.swaps.map((s) => (s.id === swap.id ? swap : s)) : [swap, ...previous.swaps] };
      });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
    forget(id: number) {
      queryClient.setQueryData<SwapsResponse>(queryKeys.swaps.list(), (previous) =>
        previous ? { swaps: previous.swaps.filter((s) => s.id !== id) } : previous,
      );
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  };
}

export function useCreateSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: createSwap,
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useUpdateSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: Partial<SwapRequest> }) => updateSwap(id, input),
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useSetSwapPublished() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: ({ id, published }: { id: number; published: boolean }) => setSwapPublished(id, published),
    onSuccess: (swap) => cache.store(swap),
  });
}

export function useDeleteSwap() {
  const cache = useSwapCache();
  return useMutation({
    mutationFn: deleteSwap,
    onSuccess: (_nothing, id) => cache.forget(id),
  });
}
