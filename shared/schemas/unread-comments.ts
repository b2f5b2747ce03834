/**
 * GET /api/comments/unread: comments by others (the coach) on the signed-in cook's own versions
 * that the cook has not opened yet. Opening a version's thread
 * (POST /api/recipes/:id/versions/:number/comments/read) clears its count.
 */
export interface UnreadComments {
  total: number;
  recipes: UnreadOnRecipe[];
}

export interface UnreadOnRecipe {
  recipeId: number;
  title: string;
  unread: number;
  versions: { number: number; unread: number }[];
}
