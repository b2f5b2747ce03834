import { useQuery } from '@tanstack/react-query';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** One recipe's saved versions, oldest first; a null id asks nothing. Cached with the recipe page's detail. */
export function useRecipeVersions(id: number | null) {
  return useQuery({
    queryKey: queryKeys.recipes.detail(id ?? 'none'),
    queryFn: ({ signal }) => api.get<RecipeDetail>(`/api/recipes/${id}`, { signal }),
    enabled: id !== null,
    select: (recipe) => recipe.versions,
  });
}
