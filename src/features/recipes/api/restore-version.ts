import { useMutation, useQueryClient } from '@tanstack/react-query';
import { restoreVersion } from '../../../lib/api/recipes';
import { storeVersion } from './recipe-cache';

export type { RestoreVersionInput } from '../../../lib/api/recipes';

export function useRestoreVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreVersion,
    onSuccess: (version, { recipeId }) => storeVersion(queryClient, recipeId, version),
  });
}
