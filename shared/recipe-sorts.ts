/** The orders the recipe book lists recipes in (zod-free, so the book's first visit need not load zod). */
export const RECIPE_SORTS = ['updated', 'title', 'kcal', 'protein'] as const;
export type RecipeSort = (typeof RECIPE_SORTS)[number];
