import { useMutation, useQueryClient } from '@tanstack/react-query';
import { isApiError } from '../../../lib/api-client';
import { updateRecipe } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export type { UpdateRecipeInput } from '../../../lib/api/recipes';

export function useUpdateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}

/** The recipe was changed elsewhere since it was read (another tab, another device). */
export function isRevisionConflict(error: unknown): boolean {
  return isApiError(error) && error.status === 409;
}
