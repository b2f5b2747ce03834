import { useQuery } from '@tanstack/react-query';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/**
 * How many servings a saved version was written for: the prep page's starting batch size when the
 * address names none. Reads the recipe detail, cached under the same key as the recipe page.
 */
export function useVersionServings(id: number | null, number: number | null, enabled: boolean) {
  return useQuery({
    queryKey: queryKeys.recipes.detail(id ?? 'none'),
    queryFn: ({ signal }) => api.get<RecipeDetail>(`/api/recipes/${id}`, { signal }),
    enabled: enabled && id !== null,
    select: (recipe) => recipe.versions.find((v) => v.number === number)?.servings ?? null,
  });
}
