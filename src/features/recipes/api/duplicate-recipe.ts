import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { storeRecipe } from './recipe-cache';

/** A new recipe whose first version is a copy of this one's newest. */
export function duplicateRecipe(id: number): Promise<RecipeDetail> {
  return api.post<RecipeDetail>(`/api/recipes/${id}/duplicate`);
}

export function useDuplicateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
