import { z } from 'zod';

/** History state the recipe page leaves when it deletes a recipe, so the book can offer to undo it. */
export interface DeletedRecipeState {
  deletedRecipe: { id: number; title: string };
}

const stateSchema = z.looseObject({ deletedRecipe: z.looseObject({ id: z.number(), title: z.string() }) });

export function deletedRecipeFrom(state: unknown): DeletedRecipeState['deletedRecipe'] | null {
  const parsed = stateSchema.safeParse(state);
  return parsed.success ? parsed.data.deletedRecipe : null;
}
