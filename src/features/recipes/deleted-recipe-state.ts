/** History state the recipe page leaves when it deletes a recipe, so the book can offer to undo it. */
export interface DeletedRecipeState {
  deletedRecipe: { id: number; title: string };
}

const isObject = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

// A plain check rather than zod: the recipe book's first visit does without zod.
export function deletedRecipeFrom(state: unknown): DeletedRecipeState['deletedRecipe'] | null {
  if (!isObject(state) || !isObject(state.deletedRecipe)) return null;
  const recipe = state.deletedRecipe;
  return typeof recipe.id === 'number' && Number.isFinite(recipe.id) && typeof recipe.title === 'string'
    ? (recipe as DeletedRecipeState['deletedRecipe'])
    : null;
}
