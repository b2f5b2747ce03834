import { useMutation, useQueryClient } from '@tanstack/react-query';
import { duplicateRecipe } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export function useDuplicateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
