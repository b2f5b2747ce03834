import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';
import type { User } from '../../../lib/user';

/** The signed-in person, or null when signed out (the server answers 401, which is not an error here). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  try {
    return await api.get<User>('/api/auth/me', { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = queryOptions({
  queryKey: queryKeys.auth.me,
  queryFn: ({ signal }) => fetchMe(signal),
  staleTime: 5 * 60_000,
});

export function useMe() {
  return useQuery(meQueryOptions);
}
