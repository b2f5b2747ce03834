import { useQuery } from '@tanstack/react-query';
import type { RecipeDetail, VersionDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { clientsKeys } from '../clients-keys';

/** A client's recipe, read-only for their coach. */
export function useReviewedRecipe(recipeId: number | null) {
  return useQuery({
    queryKey: clientsKeys.recipe(recipeId ?? 0),
    queryFn: ({ signal }) => api.get<RecipeDetail>(`/api/recipes/${recipeId}`, { signal }),
    enabled: recipeId !== null,
  });
}

export function useReviewedVersion(recipeId: number | null, number: number | null) {
  return useQuery({
    queryKey: clientsKeys.version(recipeId ?? 0, number ?? 0),
    queryFn: ({ signal }) => api.get<VersionDetail>(`/api/recipes/${recipeId}/versions/${number}`, { signal }),
    enabled: recipeId !== null && number !== null,
    // A saved version never changes.
    staleTime: Infinity,
  });
}
