import { useMutation, useQueryClient } from '@tanstack/react-query';
import { deleteRecipe } from '../../../lib/api/recipes';
import { queryKeys } from '../../../lib/query-keys';

export type { DeleteRecipeInput } from '../../../lib/api/recipes';

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
