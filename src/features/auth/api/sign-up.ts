import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { User } from '../../../lib/user';
import type { RegisterInput } from '../schemas';
import { replaceSessionUser } from './session-cache';

/** Creates the account; the server signs the new person in (201 with the user). */
export function signUp(input: RegisterInput): Promise<User> {
  return api.post<User>('/api/auth/register', input);
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (user) => replaceSessionUser(queryClient, user),
  });
}
