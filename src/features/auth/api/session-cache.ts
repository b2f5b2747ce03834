import type { QueryClient } from '@tanstack/react-query';
import { resetCsrfToken } from '../../../lib/api-client';
import { queryArea, queryKeys } from '../../../lib/query-keys';
import type { User } from '../../../lib/user';

/**
 * The session changed (signed in, signed up or out): the CSRF token belongs to the old
 * session and anything cached for the previous person must not be shown to the next.
 */
export function replaceSessionUser(queryClient: QueryClient, user: User | null): void {
  resetCsrfToken();
  queryClient.removeQueries({ predicate: (query) => queryArea(query.queryKey) !== 'auth' });
  queryClient.setQueryData<User | null>(queryKeys.auth.me, user);
}
