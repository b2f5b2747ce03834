import { queryOptions } from '@tanstack/react-query';
import type { Swap, SwapRequest, SwapsResponse } from '../../../shared/schemas/swaps';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

export function fetchSwaps(signal?: AbortSignal): Promise<SwapsResponse> {
  return api.get<SwapsResponse>('/api/swaps', { signal });
}

/** A coach's whole library, or a client's coach's published swaps. */
export function swapsQuery() {
  return queryOptions({ queryKey: queryKeys.swaps.list(), queryFn: ({ signal }) => fetchSwaps(signal) });
}

export function createSwap(input: SwapRequest): Promise<Swap> {
  return api.post<Swap>('/api/swaps', input);
}

export function updateSwap(id: number, input: Partial<SwapRequest>): Promise<Swap> {
  return api.patch<Swap>(`/api/swaps/${id}`, input);
}

export function setSwapPublished(id: number, published: boolean): Promise<Swap> {
  return api.post<Swap>(`/api/swaps/${id}/${published ? 'publish' : 'unpublish'}`);
}

export function deleteSwap(id: number): Promise<void> {
  return api.delete<void>(`/api/swaps/${id}`);
}
