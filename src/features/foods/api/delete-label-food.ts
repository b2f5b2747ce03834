import { useMutation, useQueryClient } from '@tanstack/react-query';
import { deleteLabelFood } from '../../../lib/api/foods';
import { queryKeys } from '../../../lib/query-keys';

/** DELETE /api/foods/:id; `hidden` when saved versions use the food and keep it. */
export function useDeleteLabelFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLabelFood,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
