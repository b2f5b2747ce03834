import { queryOptions } from '@tanstack/react-query';
import type { CommentsResponse } from '../../../shared/schemas/comments';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

function commentsPath(recipeId: number, number: number) {
  return `/api/recipes/${recipeId}/versions/${number}/comments`;
}

export function fetchComments(recipeId: number, number: number, signal?: AbortSignal): Promise<CommentsResponse> {
  return api.get<CommentsResponse>(commentsPath(recipeId, number), { signal });
}

/** The thread on one saved version, oldest first. */
export function commentsQuery(recipeId: number, number: number) {
  return queryOptions({ queryKey: queryKeys.comments.thread(recipeId, number), queryFn: ({ signal }) => fetchComments(recipeId, number, signal) });
}

/** Adds a comment; the answer is the whole thread. */
export function addComment(recipeId: number, number: number, body: string): Promise<CommentsResponse> {
  return api.post<CommentsResponse>(commentsPath(recipeId, number), { body });
}
