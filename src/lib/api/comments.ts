import { queryOptions } from '@tanstack/react-query';
import type { CommentsResponse, UnreadComments } from '../../../shared/schemas/comments';
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

export function fetchUnreadComments(signal?: AbortSignal): Promise<UnreadComments> {
  return api.get<UnreadComments>('/api/comments/unread', { signal });
}

/** The signed-in cook's unread comments from their coach, for the badges. */
export function unreadCommentsQuery() {
  return queryOptions({ queryKey: queryKeys.comments.unread(), queryFn: ({ signal }) => fetchUnreadComments(signal) });
}

/** The owner opened the thread: its comments are read. The answer is what is left unread. */
export function markCommentsRead(recipeId: number, number: number): Promise<UnreadComments> {
  return api.post<UnreadComments>(`${commentsPath(recipeId, number)}/read`);
}
