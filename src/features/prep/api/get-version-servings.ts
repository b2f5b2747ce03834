import { useQuery } from '@tanstack/react-query';
import { recipeQuery } from '../../../lib/api/recipes';

/**
 * How many servings a saved version was written for: the prep page's starting batch size when the
 * address names none. Reads the recipe detail, cached under the same key as the recipe page.
 */
export function useVersionServings(id: number | null, number: number | null, enabled: boolean) {
  const recipe = recipeQuery(id);
  return useQuery({
    ...recipe,
    enabled: enabled && id !== null,
    select: (detail) => detail.versions.find((v) => v.number === number)?.servings ?? null,
  });
}
