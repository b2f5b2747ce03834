import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LabelFoodInput } from '../../../../shared/schemas/foods';
import { createLabelFood, updateLabelFood } from '../../../lib/api/foods';
import { queryKeys } from '../../../lib/query-keys';

/** POST /api/foods (a new food) or PATCH /api/foods/:id (an edit); searches and lists refresh after. */
export function useSaveLabelFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number | null; input: LabelFoodInput }) => (id === null ? createLabelFood(input) : updateLabelFood(id, input)),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
