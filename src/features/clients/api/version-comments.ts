import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { addComment, commentsQuery, markCommentsRead, unreadCommentsQuery } from '../../../lib/api/comments';
import { queryKeys } from '../../../lib/query-keys';

export type { VersionComment } from '../../../../shared/schemas/comments';

export function useVersionComments(recipeId: number, number: number) {
  return useQuery({ ...commentsQuery(recipeId, number), select: (data) => data.comments });
}

export function useAddVersionComment(recipeId: number, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => addComment(recipeId, number, body),
    onSuccess: (data) => {
      queryClient.setQueryData(queryKeys.comments.thread(recipeId, number), data);
      // The versions list counts comments.
      void queryClient.invalidateQueries({ queryKey: queryKeys.clients.details() });
    },
  });
}

/** The signed-in cook's unread comments (only asked for on the cook's own recipe page). */
export function useUnreadComments(enabled: boolean) {
  return useQuery({ ...unreadCommentsQuery(), enabled });
}

/** The owner has the thread in view: its comments are read; the answer refreshes every badge. */
export function useMarkCommentsRead(recipeId: number, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => markCommentsRead(recipeId, number),
    onSuccess: (unread) => queryClient.setQueryData(queryKeys.comments.unread(), unread),
  });
}
