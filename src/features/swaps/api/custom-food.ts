import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FoodDetail } from '../../../../shared/schemas/analyze';
import type { CustomFoodInput } from '../../../../shared/schemas/coaching';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { CustomFoodInput };

/** A coach's food from a package label; the server stores it per 100 g. */
export function useCreateCustomFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CustomFoodInput) => api.post<FoodDetail>('/api/foods', input),
    // Searches cached before it existed would leave it out.
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
