import { useQuery } from '@tanstack/react-query';
import type { FoodDetail } from '../../../../shared/schemas/analyze';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export function getFood(id: number, signal?: AbortSignal): Promise<FoodDetail> {
  return api.get<FoodDetail>(`/api/foods/${id}`, { signal });
}

/** One catalogue food with its nutrients per 100 g and household portions; null id asks nothing. */
export function useFood(id: number | null) {
  return useQuery({
    queryKey: queryKeys.foods.detail(id ?? 'none'),
    queryFn: ({ signal }) => getFood(id as number, signal),
    enabled: id !== null && Number.isInteger(id) && id > 0,
    staleTime: 30 * 60_000,
  });
}
