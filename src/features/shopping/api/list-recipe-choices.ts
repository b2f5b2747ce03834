import { useQuery } from '@tanstack/react-query';
import type { RecipeSummary } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** The cook's recipes by title, to pick saved versions from. Same key and shape as the recipe book's list. */
export function useRecipeChoices() {
  return useQuery({
    queryKey: [...queryKeys.recipes.list(), { q: '', sort: 'title' }],
    queryFn: ({ signal }) => api.get<{ recipes: RecipeSummary[] }>('/api/recipes?sort=title', { signal }),
    select: (body) => body.recipes,
  });
}
