import { useQuery } from '@tanstack/react-query';
import { unreadCommentsQuery } from '../../lib/api/comments';
import { useAuth } from '../auth-context';

/** Unread comments from a coach on the signed-in cook's versions; asked again every minute. */
export function useUnreadCommentTotal(): number {
  const { user } = useAuth();
  const unread = useQuery({ ...unreadCommentsQuery(), enabled: user?.role === 'cook', refetchInterval: 60_000 });
  return user?.role === 'cook' ? (unread.data?.total ?? 0) : 0;
}
