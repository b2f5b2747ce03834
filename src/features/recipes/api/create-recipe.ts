import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createRecipe } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export type { CreateRecipeInput } from '../../../lib/api/recipes';

/**
 * Saves a new recipe: `mutate(input: CreateRecipeInput)` → the RecipeDetail (201).
 * To keep a rewrite of a recipe that is not in the book yet, create the recipe from the text as
 * written first, then save the rewrite onto it with useSaveVersion.
 */
export function useCreateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
