import { useMutation, useQueryClient } from '@tanstack/react-query';
import { importRecipe } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export const IMPORT_MAX_BYTES = 1024 * 1024;
export const IMPORT_EXTENSIONS = ['.txt', '.md', '.json', '.jsonld'] as const;

/** Why a file can't be imported before it is sent, or null when it may go. */
export function importFileProblem(file: File): string | null {
  const name = file.name.toLowerCase();
  if (!IMPORT_EXTENSIONS.some((ext) => name.endsWith(ext))) {
    return 'Choose a .txt, .md, .json or .jsonld file.';
  }
  if (file.size > IMPORT_MAX_BYTES) return 'That file is larger than 1 MB.';
  if (file.size === 0) return 'That file is empty.';
  return null;
}

export function useImportRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importRecipe,
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
