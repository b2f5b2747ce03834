/** History state the recipe page leaves when it deletes a recipe, so the book can offer to undo it. */
export interface DeletedRecipeState {
  deletedRecipe: { id: number; title: string };
}

export function deletedRecipeFrom(state: unknown): DeletedRecipeState['deletedRecipe'] | null {
  if (!state || typeof state !== 'object' || !('deletedRecipe' in state)) return null;
  const value = (state as DeletedRecipeState).deletedRecipe;
  return value && typeof value.id === 'number' && typeof value.title === 'string' ? value : null;
}
