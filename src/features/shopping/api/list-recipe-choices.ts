import { useQuery } from '@tanstack/react-query';
import { recipeListQuery } from '../../../lib/api/recipes';

/** The cook's recipes by title, to pick saved versions from: the recipe book's list, sorted by title. */
export function useRecipeChoices() {
  return useQuery({ ...recipeListQuery('', 'title'), select: (body) => body.recipes });
}
