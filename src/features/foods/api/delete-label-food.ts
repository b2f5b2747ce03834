import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** DELETE /api/foods/:id; `hidden` when saved versions use the food and keep it. */
export function useDeleteLabelFood() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<{ deleted: true; hidden: boolean }>(`/api/foods/${id}`),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.foods.all }),
  });
}
