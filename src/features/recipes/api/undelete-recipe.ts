import { useMutation, useQueryClient } from '@tanstack/react-query';
import { undeleteRecipe } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export function useUndeleteRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: undeleteRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
