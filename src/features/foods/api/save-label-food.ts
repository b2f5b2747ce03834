import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LabelFoodInput, SavedFoodResponse } from '../../../../shared/schemas/foods';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** POST /api/foods (a new food) or PATCH /api/foods/:id (an edit); searches and lists refresh after. */
export function useSaveLabelFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number | null; input: LabelFoodInput }) =>
      id === null ? api.post<SavedFoodResponse>('/api/foods', input) : api.patch<SavedFoodResponse>(`/api/foods/${id}`, input),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
