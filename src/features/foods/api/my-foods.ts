import { useQuery } from '@tanstack/react-query';
import type { MyFood } from '../../../../shared/schemas/foods';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** GET /api/foods/mine: the foods you entered from labels, then your coach's. */
export function useMyFoods() {
  return useQuery({
    queryKey: queryKeys.foods.mine(),
    queryFn: ({ signal }) => api.get<{ foods: MyFood[] }>('/api/foods/mine', { signal }).then((r) => r.foods),
  });
}
