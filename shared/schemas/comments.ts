import type { UserRole } from './auth';

/** A comment on a saved version, by its owner or the owner's coach. */
export interface VersionComment {
  id: number;
  body: string;
  author: { id: number; displayName: string; role: UserRole };
  createdAt: string;
}

/** GET and POST /api/recipes/:id/versions/:number/comments: the whole thread, oldest first. */
export interface CommentsResponse {
  comments: VersionComment[];
}

/**
 * GET /api/comments/unread: comments by others (the coach) on the signed-in cook's own versions
 * that the cook has not opened yet. Opening a version's thread
 * (POST /api/recipes/:id/versions/:number/comments/read, which answers the same shape) clears its count.
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
