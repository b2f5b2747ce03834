import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { RecipeSummary } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const RECIPE_SORTS = ['updated', 'title', 'kcal', 'protein'] as const;
export type RecipeSort = (typeof RECIPE_SORTS)[number];

export function isRecipeSort(value: unknown): value is RecipeSort {
  return typeof value === 'string' && (RECIPE_SORTS as readonly string[]).includes(value);
}

export function listRecipes(q: string, sort: RecipeSort, signal?: AbortSignal): Promise<{ recipes: RecipeSummary[] }> {
  const params = new URLSearchParams({ sort });
  if (q) params.set('q', q);
  return api.get<{ recipes: RecipeSummary[] }>(`/api/recipes?${params}`, { signal });
}

/** The signed-in cook's recipes whose title holds `q`, in the order `sort` asks for. */
export function useRecipes(q: string, sort: RecipeSort) {
  const query = q.trim();
  return useQuery({
    queryKey: [...queryKeys.recipes.list(), { q: query, sort }],
    queryFn: ({ signal }) => listRecipes(query, sort, signal),
    select: (body) => body.recipes,
    // Keep the last rows on screen while the next search's answer arrives.
    placeholderData: keepPreviousData,
  });
}
