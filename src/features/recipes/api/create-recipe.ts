import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { RecipeDetail, createRecipeSchema } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { storeRecipe } from './recipe-cache';

/**
 * What POST /api/recipes takes:
 * - `title` (1–200 characters) and `servings` (whole number, 1–100);
 * - `notes?`, `method?`: free text, up to 20,000 characters each;
 * - the ingredients, one of
 *   - `text`: pasted lines, one ingredient a line (the server reads, matches and weighs each), or
 *   - `lines`: `[{ input, foodId?, grams? }]` as typed, or `[{ food: { id }, grams, input? }]` as a rewrite returns them.
 * The ingredients become version 1, kind "original" ("As written").
 */
export type CreateRecipeInput = z.input<typeof createRecipeSchema>;

export function createRecipe(input: CreateRecipeInput): Promise<RecipeDetail> {
  return api.post<RecipeDetail>('/api/recipes', input);
}

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
