import { useQuery } from '@tanstack/react-query';
import { versionQuery } from '../../../lib/api/recipes';

/** One saved version with its lines and nutrients; null for either part asks nothing. */
export function useRecipeVersion(recipeId: number | null, number: number | null) {
  return useQuery(versionQuery(recipeId, number));
}
