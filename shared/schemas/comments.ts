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
