import { useMutation, useQueryClient } from '@tanstack/react-query';
import { saveVersion } from '../../../lib/api/recipes';
import { storeVersion } from './recipe-cache';

export type { SaveVersionInput } from '../../../lib/api/recipes';

/** Adds a version to a recipe: `mutate(input: SaveVersionInput)` → the new VersionDetail (201), numbered after the newest. */
export function useSaveVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveVersion,
    onSuccess: (version, input) => storeVersion(queryClient, input.recipeId, version),
  });
}
