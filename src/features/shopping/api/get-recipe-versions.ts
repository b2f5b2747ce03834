import { useQuery } from '@tanstack/react-query';
import { recipeQuery } from '../../../lib/api/recipes';

/** One recipe's saved versions, oldest first; a null id asks nothing. Cached with the recipe page's detail. */
export function useRecipeVersions(id: number | null) {
  return useQuery({ ...recipeQuery(id), select: (recipe) => recipe.versions });
}
