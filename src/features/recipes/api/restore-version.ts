import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { storeVersion } from './recipe-cache';

export interface RestoreVersionInput {
  recipeId: number;
  number: number;
}

/** Copies version `number` forward as the newest; nothing in between is lost. */
export function restoreVersion({ recipeId, number }: RestoreVersionInput): Promise<VersionDetail> {
  return api.post<VersionDetail>(`/api/recipes/${recipeId}/restore/${number}`);
}

export function useRestoreVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreVersion,
    onSuccess: (version, { recipeId }) => storeVersion(queryClient, recipeId, version),
  });
}
