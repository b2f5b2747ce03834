import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export interface DeleteRecipeInput {
  id: number;
  revision: number;
}

export function deleteRecipe({ id, revision }: DeleteRecipeInput): Promise<{ id: number; deleted: true; revision: number }> {
  return api.delete(`/api/recipes/${id}`, { revision });
}

export function useDeleteRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRecipe,
    onSuccess: (_answer, { id }) => {
      queryClient.removeQueries({ queryKey: queryKeys.recipes.detail(id) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.recipes.list() });
    },
  });
}
