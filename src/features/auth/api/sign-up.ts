import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signUp } from '../../../lib/api/auth';
import { replaceSessionUser } from './session-cache';

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (user) => replaceSessionUser(queryClient, user),
  });
}
