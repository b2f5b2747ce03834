import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SWAP_STATUSES } from '../../../../shared/schemas/coaching';
import type { FoodSummary } from '../../../../shared/schemas/analyze';
import { api } from '../../../lib/api-client';
import { coachKeys } from '../coach-keys';

export type SwapStatus = (typeof SWAP_STATUSES)[number];

/** The food a swap puts on the plate, with its figures per 100 g. */
export interface SwapTargetFood extends FoodSummary {
  kcalPer100g: number;
  proteinPer100g: number;
}

/** One approved swap as GET /api/swaps returns it. */
export interface Swap {
  id: number;
  coachId: number;
  fromFood: FoodSummary | null;
  fromRole: string | null;
  toFood: SwapTargetFood | null;
  volumeRatio: number;
  note: string;
  tags: string[];
  status: SwapStatus;
  updatedAt: string;
}

/** What POST /api/swaps and PATCH /api/swaps/:id take. */
export interface SwapRequest {
  fromFoodId: number | null;
  fromRole: string | null;
  toFoodId: number;
  volumeRatio: number;
  note: string;
  tags: string[];
  status?: SwapStatus;
}

export function listSwaps(signal?: AbortSignal): Promise<{ swaps: Swap[] }> {
  return api.get<{ swaps: Swap[] }>('/api/swaps', { signal });
}

export function useSwaps() {
  return useQuery({ queryKey: coachKeys.swaps, queryFn: ({ signal }) => listSwaps(signal), select: (data) => data.swaps });
}

function useSwapCache() {
  const queryClient = useQueryClient();
  return {
    /** put the server's copy of one swap in the list: in its place when known, first when new */
    store(swap: Swap) {
      queryClient.setQueryData<{ swaps: Swap[] }>(coachKeys.swaps, (previous) => {
        if (!previous) return previous;
        const known = previous.swaps.some((s) => s.id === swap.id);
        return { swaps: known ? previous.swaps.map((s) => (s.id === swap.id ? swap : s)) : [swap, ...previous.swaps] };
      });
      void queryClient.invalidateQueries({ queryKey: coachKeys.swaps });
    },
    forget(id: number) {
      queryClient.setQueryData<{ swaps: Swap[] }>(coachKeys.swaps, (previous) => (previous ? { swaps: previous.swaps.filter((s) => s.id !== id) } : previous));
      void queryClient.invalidateQueries({ queryKey: coachKeys.swaps });
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
