import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { RecipeDetail, updateRecipeSchema } from '../../../../shared/schemas/recipes';
import { api, isApiError } from '../../../lib/api-client';
import { storeRecipe } from './recipe-cache';

/** `revision` is the one the cook read; a stale one is refused with 409 and nothing changes. */
export type UpdateRecipeInput = z.input<typeof updateRecipeSchema> & { id: number };

export function updateRecipe({ id, ...body }: UpdateRecipeInput): Promise<RecipeDetail> {
  return api.patch<RecipeDetail>(`/api/recipes/${id}`, body);
}

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
