import { useQuery } from '@tanstack/react-query';
import type { OutboxMessage } from '../../../../shared/schemas/outbox';
import { outboxQuery } from '../../../lib/api/admin';

export type { OutboxMessage };

/** Newest first, whatever order the server keeps them in. */
export function newestFirst(messages: readonly OutboxMessage[]): OutboxMessage[] {
  return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}

/** The development outbox. It only exists outside production; there the server answers 404. */
export function useOutbox() {
  return useQuery({
    ...outboxQuery(),
    select: (data) => newestFirst(data.messages),
    // Mail arrives while the page is open (a coach inviting in another tab).
    refetchInterval: 10_000,
  });
}
