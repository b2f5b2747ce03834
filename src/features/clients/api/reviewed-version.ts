import { useQuery } from '@tanstack/react-query';
import { recipeQuery, versionQuery } from '../../../lib/api/recipes';

/** A client's recipe, read-only for their coach: the same read and cache as the owner's recipe page. */
export function useReviewedRecipe(recipeId: number | null) {
  return useQuery(recipeQuery(recipeId));
}

export function useReviewedVersion(recipeId: number | null, number: number | null) {
  return useQuery(versionQuery(recipeId, number));
}
