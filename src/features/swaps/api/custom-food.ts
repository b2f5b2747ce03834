import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CustomFoodInput } from '../../../../shared/schemas/coaching';
import { createLabelFood } from '../../../lib/api/foods';
import { queryKeys } from '../../../lib/query-keys';

export type { CustomFoodInput };

/** A coach's food from a package label; the server stores it per 100 g. */
export function useCreateCustomFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLabelFood,
    // Searches cached before it existed would leave it out.
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
