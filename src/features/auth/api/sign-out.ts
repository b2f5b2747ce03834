import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { replaceSessionUser } from './session-cache';

export async function signOut(): Promise<void> {
  await api.post<unknown>('/api/auth/logout');
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => replaceSessionUser(queryClient, null),
  });
}
