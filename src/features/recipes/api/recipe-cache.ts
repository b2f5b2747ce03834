import type { QueryClient } from '@tanstack/react-query';
import type { RecipeDetail, VersionDetail } from '../../../../shared/schemas/recipes';
import { queryKeys } from '../../../lib/query-keys';

/** A fresh copy of a recipe from the server: show it at once and let every list catch up. */
export function storeRecipe(queryClient: QueryClient, recipe: RecipeDetail) {
  queryClient.setQueryData(queryKeys.recipes.detail(recipe.id), recipe);
  void queryClient.invalidateQueries({ queryKey: queryKeys.recipes.list() });
}

/** A new version changes the recipe's timeline, its latest figures and the lists. */
export function storeVersion(queryClient: QueryClient, recipeId: number, version: VersionDetail) {
  queryClient.setQueryData(queryKeys.recipes.version(recipeId, version.number), version);
  void queryClient.invalidateQueries({ queryKey: queryKeys.recipes.detail(recipeId), exact: true });
  void queryClient.invalidateQueries({ queryKey: queryKeys.recipes.list() });
}
