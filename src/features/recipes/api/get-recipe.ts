import { useQuery } from '@tanstack/react-query';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export function getRecipe(id: number, signal?: AbortSignal): Promise<RecipeDetail> {
  return api.get<RecipeDetail>(`/api/recipes/${id}`, { signal });
}

/** One recipe with its timeline of versions; a null id asks nothing. */
export function useRecipe(id: number | null) {
  return useQuery({
    queryKey: queryKeys.recipes.detail(id ?? 'none'),
    queryFn: ({ signal }) => getRecipe(id as number, signal),
    enabled: id !== null,
  });
}
