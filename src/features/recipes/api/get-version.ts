import { useQuery } from '@tanstack/react-query';
import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { versionKey } from './recipe-cache';

export function getVersion(recipeId: number, number: number, signal?: AbortSignal): Promise<VersionDetail> {
  return api.get<VersionDetail>(`/api/recipes/${recipeId}/versions/${number}`, { signal });
}

/** One saved version with its lines and nutrients; null for either part asks nothing. */
export function useRecipeVersion(recipeId: number | null, number: number | null) {
  return useQuery({
    queryKey: versionKey(recipeId ?? 0, number ?? 0),
    queryFn: ({ signal }) => getVersion(recipeId as number, number as number, signal),
    enabled: recipeId !== null && number !== null,
    // A saved version is never edited; restoring copies it forward as a new number.
    staleTime: Infinity,
  });
}
