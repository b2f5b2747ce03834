import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';
import type { User } from '../../../lib/user';

/** The signed-in person, or null when signed out (`GET /api/auth/session` answers 200 either way). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  const { user } = await api.get<{ user: User | null }>('/api/auth/session', { signal });
  return user;
}

export const meQueryOptions = queryOptions({
  queryKey: queryKeys.auth.me,
  queryFn: ({ signal }) => fetchMe(signal),
  staleTime: 5 * 60_000,
});

export function useMe() {
  return useQuery(meQueryOptions);
}
