import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { User } from '../../../lib/user';
import type { LoginInput } from '../schemas';
import { replaceSessionUser } from './session-cache';

export function signIn(input: LoginInput): Promise<User> {
  return api.post<User>('/api/auth/login', input);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => replaceSessionUser(queryClient, user),
  });
}
