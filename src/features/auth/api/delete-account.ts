import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function deleteAccount(password: string): Promise<void> {
  return api.delete<void>('/api/auth/me', { password });
}

/** On success the caller loads a fresh page: nothing cached for the deleted account survives. */
export function useDeleteAccount() {
  return useMutation({ mutationFn: deleteAccount });
}
