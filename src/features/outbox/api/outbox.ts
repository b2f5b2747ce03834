import { useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html?: string;
  receivedAt: string;
}

/** Newest first, whatever order the server keeps them in. */
export function newestFirst(messages: readonly OutboxMessage[]): OutboxMessage[] {
  return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}

/** The development outbox. It only exists outside production; there the server answers 404. */
export function useOutbox() {
  return useQuery({
    queryKey: queryKeys.admin.outbox(),
    queryFn: ({ signal }) => api.get<{ messages: OutboxMessage[] }>('/api/dev/outbox', { signal }),
    select: (data) => newestFirst(data.messages),
    // Mail arrives while the page is open (a coach inviting in another tab).
    refetchInterval: 10_000,
  });
}
