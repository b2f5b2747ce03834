import { useMutation } from '@tanstack/react-query';
import { deleteAccount } from '../../../lib/api/auth';

/** On success the caller loads a fresh page: nothing cached for the deleted account survives. */
export function useDeleteAccount() {
  return useMutation({ mutationFn: deleteAccount });
}
