import { queryOptions } from '@tanstack/react-query';
import type { LoginInput, RegisterInput, UpdateMeInput } from '../../../shared/schemas/auth';
import { api, isApiError } from '../api-client';
import { queryKeys } from '../query-keys';
import type { User } from '../user';

/** The signed-in person, or null when signed out (the server answers 401, which is not an error here). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  try {
    return await api.get<User>('/api/auth/me', { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQuery = queryOptions({
  queryKey: queryKeys.auth.me,
  queryFn: ({ signal }) => fetchMe(signal),
  staleTime: 5 * 60_000,
});

export function signIn(input: LoginInput): Promise<User> {
  return api.post<User>('/api/auth/login', input);
}

/** Creates the account; the server signs the new person in (201 with the user). */
export function signUp(input: RegisterInput): Promise<User> {
  return api.post<User>('/api/auth/register', input);
}

export async function signOut(): Promise<void> {
  await api.post<unknown>('/api/auth/logout');
}

export function updateMe(input: UpdateMeInput): Promise<User> {
  return api.patch<User>('/api/auth/me', input);
}

/** Always 202, whether or not the address has an account, so the answer reveals nothing. */
export function requestPasswordReset(email: string): Promise<{ ok: true; message?: string }> {
  return api.post<{ ok: true; message?: string }>('/api/auth/password-reset', { email });
}

/** 404 for a link that was never valid; 410 for one used or expired. */
export function confirmPasswordReset(input: { token: string; password: string }): Promise<{ ok: true }> {
  return api.post<{ ok: true }>('/api/auth/password-reset/confirm', input);
}
