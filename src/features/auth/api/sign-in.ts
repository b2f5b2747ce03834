import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signIn } from '../../../lib/api/auth';
import { replaceSessionUser } from './session-cache';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => replaceSessionUser(queryClient, user),
  });
}
