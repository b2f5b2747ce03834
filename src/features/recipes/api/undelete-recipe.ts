import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { storeRecipe } from './recipe-cache';

/** Undo of a delete: the recipe comes back with every version. */
export function undeleteRecipe(id: number): Promise<RecipeDetail> {
  return api.post<RecipeDetail>(`/api/recipes/${id}/undelete`);
}

export function useUndeleteRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: undeleteRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
