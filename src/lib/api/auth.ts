import { queryOptions } from '@tanstack/react-query';
import type { ChangePasswordInput, LoginInput, RegisterInput, UpdateMeInput } from '../../../shared/schemas/auth';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';
import type { User } from '../user';

/** The signed-in person, or null when signed out (`GET /api/auth/session` answers 200 either way, so a signed-out visit has no failed request). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  const { user } = await api.get<{ user: User | null }>('/api/auth/session', { signal });
  return user;
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

/** The session stays signed in; every other session of the account ends on the server. */
export function changePassword(input: ChangePasswordInput): Promise<{ ok: true }> {
  return api.post<{ ok: true }>('/api/auth/password', input);
}

export function deleteAccount(password: string): Promise<void> {
  return api.delete<void>('/api/auth/me', { password });
}
