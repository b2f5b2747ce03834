import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { RECIPE_SORTS, type RecipeSort } from '../../../../shared/recipe-sorts';
import { recipeListQuery } from '../../../lib/api/recipes';

export { RECIPE_SORTS, type RecipeSort };

export function isRecipeSort(value: unknown): value is RecipeSort {
  return typeof value === 'string' && (RECIPE_SORTS as readonly string[]).includes(value);
}

/** The signed-in cook's recipes whose title holds `q`, in the order `sort` asks for. */
export function useRecipes(q: string, sort: RecipeSort) {
  return useQuery({
    ...recipeListQuery(q, sort),
    select: (body) => body.recipes,
    // Keep the last rows on screen while the next search's answer arrives.
    placeholderData: keepPreviousData,
  });
}
