import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signOut } from '../../../lib/api/auth';
import { replaceSessionUser } from './session-cache';

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => replaceSessionUser(queryClient, null),
  });
}
