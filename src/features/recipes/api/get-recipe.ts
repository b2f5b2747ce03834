import { useQuery } from '@tanstack/react-query';
import { recipeQuery } from '../../../lib/api/recipes';

/** One recipe with its timeline of versions; a null id asks nothing. */
export function useRecipe(id: number | null) {
  return useQuery(recipeQuery(id));
}
